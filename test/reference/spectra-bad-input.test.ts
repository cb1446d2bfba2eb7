// Bad input to the spectra: errors name the bad value; no NaN ever comes out.
// Property tests with fast-check (a general-purpose property-testing library from the registry).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  resolvedSpectralAcceleration,
  resolveSpectrum,
  spectralAcceleration,
  spectralDisplacement,
} from '../../calc/index.js';
import type { SpectrumSpec } from '../../calc/index.js';

const ec8 = { kind: 'ec8', type: 1, ground: 'B', ag: 0.25 } as const;

describe('spectra refuse bad input and name it', () => {
  it('does not accept a negative or NaN period', () => {
    expect(() => spectralAcceleration(ec8, -0.1)).toThrow(/T must be .* got -0\.1/);
    expect(() => spectralAcceleration(ec8, NaN)).toThrow(/T must be .* got NaN/);
    expect(() => spectralDisplacement(ec8, Infinity)).toThrow(/got Infinity/);
  });
  it('does not accept a NaN or negative ag, SDS or damping', () => {
    expect(() => spectralAcceleration({ ...ec8, ag: NaN }, 1)).toThrow(/spec\.ag .* got NaN/);
    expect(() => spectralAcceleration({ ...ec8, damping: -0.01 }, 1)).toThrow(
      /spec\.damping .* got -0\.01/,
    );
    expect(() => spectralAcceleration({ kind: 'asce7', SDS: 0, SD1: 0.4, TL: 8 }, 1)).toThrow(
      /spec\.SDS .* got 0/,
    );
    expect(() => spectralAcceleration({ kind: 'event', pga: 0.1, sa03: -1, sa10: 0.1 }, 1)).toThrow(
      /spec\.sa03 .* got -1/,
    );
  });
  it('does not accept an unknown ground type or spectrum type', () => {
    expect(() => spectralAcceleration({ ...ec8, ground: 'F' as 'A' }, 1)).toThrow(
      /ground .* got F/,
    );
    expect(() => spectralAcceleration({ ...ec8, type: 3 as 1 }, 1)).toThrow(
      /type must be 1 or 2, got 3/,
    );
  });
});

const damping = fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: undefined });
const g = fc.double({ min: 0, max: 3, noNaN: true });
const specArb: fc.Arbitrary<SpectrumSpec> = fc.oneof(
  fc.record({
    kind: fc.constant('ec8' as const),
    type: fc.constantFrom(1 as const, 2 as const),
    ground: fc.constantFrom('A' as const, 'B' as const, 'C' as const, 'D' as const, 'E' as const),
    ag: g,
    damping,
  }),
  fc.record({
    kind: fc.constant('asce7' as const),
    SDS: fc.double({ min: 1e-6, max: 3, noNaN: true }),
    SD1: g,
    TL: fc.double({ min: 1e-3, max: 20, noNaN: true }),
    damping,
  }),
  fc.record({ kind: fc.constant('event' as const), pga: g, sa03: g, sa10: g, damping }),
);

describe('spectra never return NaN (fast-check)', () => {
  it('returns finite, non-negative Sa and Sd for any valid spec and period', () => {
    fc.assert(
      fc.property(specArb, fc.double({ min: 0, max: 100, noNaN: true }), (spec, T) => {
        const sa = spectralAcceleration(spec, T);
        const sd = spectralDisplacement(spec, T);
        return Number.isFinite(sa) && sa >= 0 && Number.isFinite(sd) && sd >= 0;
      }),
      { numRuns: 2000 },
    );
  });
});

describe('a resolved spectrum gives the same ordinates (fast-check)', () => {
  it('resolvedSpectralAcceleration(resolveSpectrum(spec), T) equals spectralAcceleration(spec, T)', () => {
    fc.assert(
      fc.property(specArb, fc.double({ min: 0, max: 50, noNaN: true }), (spec, T) => {
        return (
          resolvedSpectralAcceleration(resolveSpectrum(spec), T) === spectralAcceleration(spec, T)
        );
      }),
      { numRuns: 1000 },
    );
  });
});
