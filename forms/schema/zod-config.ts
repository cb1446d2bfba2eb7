/**
 * Zod's global settings for the app. Imported first by every schema module.
 *
 * `jitless`: zod 4 compiles object parsers with `new Function` when it may. The app's
 * Content-Security-Policy has no 'unsafe-eval', so in the browser that probe fails and is
 * reported as a CSP violation. Turning the compiler off skips the probe, and makes Node
 * (tests, benchmarks) parse the same way the page does.
 */
import { z } from 'zod';

z.config({ jitless: true });

export { z };
