/**
 * Modal analysis of fixed-base shear buildings: all periods, frequencies, roof-normalised
 * mode shapes, participation factors and effective mass ratios, by implicit QL on the
 * symmetric tridiagonal form.
 */
export { shearBuildingModes } from './shear-building-modes.js';
export type { ShearBuildingModes } from './shear-building-modes.js';
export { symmetricTridiagonalEigen } from './tridiagonal-eigen.js';
