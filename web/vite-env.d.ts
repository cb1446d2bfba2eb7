/// <reference types="vite/client" />

/** Set at build time: identifies the build in settings and exports. */
declare const __BUILD_ID__: string;
