/**
 * The hazard input: which response spectrum a survey is screened against.
 * Spectral ordinates are in g; periods in seconds; damping is a ratio (0.05 = 5 %).
 */

/** Ground types of EN 1998-1 §3.1.2, Table 3.1. */
export type Ec8Ground = 'A' | 'B' | 'C' | 'D' | 'E';

/**
 * EN 1998-1 §3.2.2.2 horizontal elastic spectrum. `ag` is the design ground acceleration on
 * type A ground, in g. S, TB, TC, TD default to the recommended Table 3.2 (type 1) or
 * Table 3.3 (type 2) values; a national annex may set them, so each may be given.
 */
export interface Ec8Spectrum {
  kind: 'ec8';
  type: 1 | 2;
  ground: Ec8Ground;
  ag: number;
  damping?: number | undefined;
  S?: number | undefined;
  TB?: number | undefined;
  TC?: number | undefined;
  TD?: number | undefined;
}

/** ASCE 7-16 §11.4.6 design response spectrum. SDS, SD1 in g; TL in s. */
export interface Asce7Spectrum {
  kind: 'asce7';
  SDS: number;
  SD1: number;
  TL: number;
  /** Damping ratio; ordinates at other than 5 % are scaled by the damping correction factor. */
  damping?: number | undefined;
}

/**
 * A spectrum for one event at one site, from values read off a published shaking map:
 * PGA, Sa(0.3 s) and Sa(1.0 s), all in g, at 5 % damping.
 */
export interface EventSpectrum {
  kind: 'event';
  pga: number;
  sa03: number;
  sa10: number;
  /** Damping ratio; ordinates at other than 5 % are scaled by the damping correction factor. */
  damping?: number | undefined;
}

/** Any spectrum the app can screen against. */
export type SpectrumSpec = Ec8Spectrum | Asce7Spectrum | EventSpectrum;
