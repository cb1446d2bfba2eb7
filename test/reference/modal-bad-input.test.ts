// Bad input to the modal solver: errors name the bad value, and no NaN ever leaves the API
// (property tests with fast-check, a general-purpose property-testing library).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shearBuildingModes } from '../../calc/index.js';

describe('shearBuildingModes refuses bad input and names it', () => {
  it('does not accept empty arrays', () => {
    expect(() => shearBuildingModes([], [])).toThrow(/masses must not be empty/);
  });
  it('does not accept mismatched lengths and says both', () => {
    expect(() => shearBuildingModes([1, 2], [3])).toThrow(/1 stiffnesses for 2 masses/);
  });
  it('does not accept a zero, negative or NaN mass and names its index and value', () => {
    expect(() => shearBuildingModes([1, 0], [1, 1])).toThrow(/masses\[1\] .* got 0/);
    expect(() => shearBuildingModes([-5, 1], [1, 1])).toThrow(/masses\[0\] .* got -5/);
    expect(() => shearBuildingModes([1, NaN], [1, 1])).toThrow(/masses\[1\] .* got NaN/);
  });
  it('does not accept a zero, negative, infinite or NaN stiffness and names it', () => {
    expect(() => shearBuildingModes([1, 1], [0, 1])).toThrow(/stiffnesses\[0\] .* got 0/);
    expect(() => shearBuildingModes([1, 1], [1, -2])).toThrow(/stiffnesses\[1\] .* got -2/);
    expect(() => shearBuildingModes([1, 1], [1, Infinity])).toThrow(
      /stiffnesses\[1\] .* got Infinity/,
    );
    expect(() => shearBuildingModes([1, 1], [NaN, 1])).toThrow(/stiffnesses\[0\] .* got NaN/);
  });
  it('does not accept values that are not arrays', () => {
    expect(() => shearBuildingModes(null as unknown as number[], [1])).toThrow(
      /masses must be an array/,
    );
  });
});

const positive = fc.double({ min: Number.MIN_VALUE, max: Number.MAX_VALUE, noNaN: true });
const anyNumber = fc.oneof(positive, fc.double(), fc.constantFrom(0, -1, NaN, Infinity, -Infinity));

describe('shearBuildingModes never returns NaN (fast-check)', () => {
  it('returns only finite numbers, or throws a RangeError, for any positive doubles', () => {
    fc.assert(
      fc.property(
        fc
          .integer({ min: 1, max: 8 })
          .chain((n) =>
            fc.tuple(
              fc.array(positive, { minLength: n, maxLength: n }),
              fc.array(positive, { minLength: n, maxLength: n }),
            ),
          ),
        ([m, k]) => {
          try {
            const r = shearBuildingModes(m, k);
            const all = [
              ...r.periods,
              ...r.frequencies,
              ...r.circularFrequencies,
              ...r.participationFactors,
              ...r.effectiveMassRatios,
              ...r.shapes.flat(),
            ];
            return all.every(Number.isFinite);
          } catch (e) {
            return e instanceof RangeError;
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
  it('always succeeds with finite results over the physical range of storeys', () => {
    // Base values of real buildings, each storey within a factor of 10–100 of them.
    const storeys = fc
      .integer({ min: 1, max: 12 })
      .chain((n) =>
        fc.tuple(
          fc.double({ min: 1e3, max: 1e6, noNaN: true }),
          fc.double({ min: 1e5, max: 1e9, noNaN: true }),
          fc.array(fc.double({ min: 0.1, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
          fc.array(fc.double({ min: 0.01, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
        ),
      );
    fc.assert(
      fc.property(storeys, ([M, K, fm, fk]) => {
        const r = shearBuildingModes(
          fm.map((f) => f * M),
          fk.map((f) => f * K),
        );
        const n = fm.length;
        return (
          r.periods.every((T) => Number.isFinite(T) && T > 0) &&
          r.shapes.flat().every(Number.isFinite) &&
          // Roof-normalised, or (a mode with nil roof motion) normalised to its peak.
          r.shapes.every((phi, j) =>
            r.roofNormalised[j] ? phi[n - 1] === 1 : Math.max(...phi.map(Math.abs)) === 1,
          )
        );
      }),
      { numRuns: 2000 },
    );
  });
  it('throws, never returns NaN, for arrays holding any number at all', () => {
    fc.assert(
      fc.property(
        fc.array(anyNumber, { maxLength: 5 }),
        fc.array(anyNumber, { maxLength: 5 }),
        (m, k) => {
          try {
            const r = shearBuildingModes(m, k);
            return r.periods.every(Number.isFinite) && r.shapes.flat().every(Number.isFinite);
          } catch (e) {
            return e instanceof RangeError || e instanceof TypeError;
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
});
