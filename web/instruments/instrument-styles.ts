/// <reference types="vite/client" />
/**
 * Loads the instruments' stylesheet with the component that needs it (the reference gives
 * other tsconfigs, e.g. the tests', Vite's type for CSS imports).
 */
import '../styles/instruments.css';
