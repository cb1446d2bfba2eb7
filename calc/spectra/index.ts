/** Response spectra: the spectrum specification types (implementation to come). */
export type * from './spectrum-spec.js';
