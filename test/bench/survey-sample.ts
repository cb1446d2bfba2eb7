/**
 * Seeded sample surveys for the storage benchmarks (Node and browser): a plausible two- or
 * three-storey survey, about 3 kB as JSON, every field valid. Pure code (no Node, no DOM),
 * so the browser benchmark's page bundles it too.
 */
import { emptySurvey, type SurveyRecord } from '../../forms/index.js';
import { mulberry32 } from './prng.js';

/** A generator of sample surveys from `seed`; the i-th call gives the same survey each run. */
export function sampleSurveys(seed: number): (i: number) => SurveyRecord {
  const rand = mulberry32(seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * rand();
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)] as T;

  function uuidFromRand(): string {
    const hex = Array.from({ length: 32 }, () => Math.floor(rand() * 16).toString(16));
    hex[12] = '4';
    hex[16] = pick(['8', '9', 'a', 'b']);
    const h = hex.join('');
    return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
  }

  return function makeSurvey(i: number): SurveyRecord {
    const t = new Date(Date.UTC(2025, 5, 1) + i * 60_000);
    const base = emptySurvey('bench-device', t, uuidFromRand());
    const storeys = 2 + Math.floor(rand() * 2);
    return {
      ...base,
      revision: 1 + Math.floor(rand() * 20),
      address: `${1 + Math.floor(rand() * 200)} Bench Street, block ${i}`,
      location: {
        lat: between(44, 46),
        lon: between(6, 9),
        accuracyM: between(3, 20),
        source: 'gps',
      },
      inspector: 'Bench Inspector',
      team: `Team ${i % 17}`,
      building: {
        ...base.building,
        system: pick(['light-frame', 'mass-timber-panel'] as const),
        planXM: between(8, 30),
        planYM: between(6, 20),
        storeys: Array.from({ length: storeys }, (_, s) => ({
          heightM: between(2.5, 3.2),
          floorAreaM2: between(60, 400),
          floorConstruction: s === 0 ? 'on-grade' : pick(['light-timber', 'clt'] as const),
          unitWeightPa: null,
        })),
      },
      walls: Array.from({ length: storeys * 2 }, (_, w) => ({
        id: `w${w}`,
        storey: Math.floor(w / 2),
        direction: w % 2 === 0 ? 'x' : 'y',
        type: pick(['wsp-100', 'wsp-75', 'gypsum', 'clt-bracketed'] as const),
        lengthM: between(2, 12),
        heightM: null,
        positionM: between(0, 20),
        connectors: null,
        rocking: null,
        devices: [],
        userUnitShearNPerM: null,
        userUnitStiffnessNPerM2: null,
      })),
      observations: {
        uplift: [],
        residualDrift: [
          {
            storey: 0,
            direction: 'x',
            ratio: between(0, 0.02),
            method: 'phone-tilt',
            offsetM: null,
            overHeightM: null,
            tiltRad: between(-0.02, 0.02),
            uncertainty: 0.001,
          },
        ],
        checklist: [{ item: 'falling-hazard', severity: 'minor' }],
        notes: 'Cracked plaster at the stair; chimney intact.',
      },
      hazard: {
        kind: 'ec8',
        type: 1,
        ground: pick(['A', 'B', 'C'] as const),
        ag: between(0.1, 0.35),
      },
      result:
        rand() < 0.7
          ? {
              calcVersion: '0.1.0',
              computedAt: t.toISOString(),
              result: {
                posting: pick(['open', 'limited', 'keep-out']),
                periodS: between(0.1, 0.5),
              },
            }
          : null,
      unconfirmed: [],
    };
  };
}
