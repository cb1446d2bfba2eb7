/**
 * Grainline calculation core: pure TypeScript, SI units inside (m, kg, N, s, rad; spectral
 * accelerations in g). Runs unchanged in browsers, workers and Node. Each folder's index.ts
 * lists what it offers.
 */
export { CALC_VERSION } from './version.js';
export * from './units/index.js';
export * from './survey/index.js';
export * from './spectra/index.js';
export * from './period/index.js';
export * from './modal/index.js';
export * from './storey/index.js';
export * from './rocking/index.js';
export * from './damage/index.js';
export * from './screening/index.js';
export * from './vibration/index.js';
