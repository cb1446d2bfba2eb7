// screen() on worked cases: the fragility it reports against jstat's normal.cdf (general-
// purpose statistics library) with the Hazus medians and β typed from the method notes §7,
// C1 worked by hand from ASCE 41-17 eq. (7-29), the residual-drift thresholds of FEMA P-58
// (from memory, verify), and our own checklist and posting tables as documented.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { buildingResponse, screen } from '../../calc/index.js';
import type { ChecklistItem, SurveyInput } from '../../calc/index.js';
import { storey, survey, wall } from '../fixtures/buildings/survey-builder.js';

/** The part of jstat 1.9 used here (its docs: jStat.normal.cdf, jStat.lognormal.cdf); untyped package. */
const jStat = createRequire(import.meta.url)('jstat') as {
  normal: { cdf(x: number, mean: number, sd: number): number };
  lognormal: { cdf(x: number, mu: number, sigma: number): number };
};

/** A one-storey W1 house, 10 × 8 m, wood structural panel walls on all four sides. */
function house(over: Partial<SurveyInput> = {}): SurveyInput {
  return survey({
    storeys: [storey({ floorConstruction: 'on-grade', heightM: 2.7, floorAreaM2: 80 })],
    walls: [
      wall({ storey: 0, direction: 'x', lengthM: 4, positionM: 0, type: 'wsp-100' }),
      wall({ storey: 0, direction: 'x', lengthM: 4, positionM: 8, type: 'wsp-100' }),
      wall({ storey: 0, direction: 'y', lengthM: 3, positionM: 0, type: 'wsp-100' }),
      wall({ storey: 0, direction: 'y', lengthM: 3, positionM: 10, type: 'wsp-100' }),
    ],
    ...over,
  });
}

describe('screen(): the predicted damage state', () => {
  it('reads the peak drift against the Hazus W1 thresholds, with probabilities equal to jstat normal.cdf (Hazus-MH 2.1 Table 5.9b via the method notes: 0.4/0.99/3.06/7.5 %, β 0.84/0.86/0.89/1.04)', () => {
    const s = house({
      building: { ...house().building, codeLevel: 'moderate' },
      hazard: { kind: 'ec8', type: 1, ground: 'C', ag: 0.35 },
    });
    const r = screen(s);
    expect(r.fragilityClass).toMatchObject({ type: 'W1', level: 'moderate' });
    const p = r.damage.probabilities;
    expect(p?.basis).toBe('drift');
    const drift = p!.demand;
    const medians = [0.004, 0.0099, 0.0306, 0.075];
    const betas = [0.84, 0.86, 0.89, 1.04];
    const keys = ['slight', 'moderate', 'extensive', 'complete'] as const;
    keys.forEach((k, i) => {
      expect(p!.exceedance[k]).toBeCloseTo(
        jStat.normal.cdf(Math.log(drift / medians[i]!) / betas[i]!, 0, 1),
        12,
      );
    });
    // The median state: the last threshold the drift has passed.
    const expected = keys.filter((_, i) => drift >= medians[i]!).at(-1) ?? 'none';
    expect(r.damage.predicted).toBe(expected);
    expect(r.evidence.predicted.find((e) => e.id === 'fragility.drift')?.state).toBe(expected);
  });

  it('multiplies the elastic drift of the storey model by C1 = 1 + (μ − 1)/(a·Te²) when the walls are overloaded (ASCE 41-17 eq. 7-29, hand formula; EN 1998-1 ground C → a = 60)', () => {
    const s = house({ hazard: { kind: 'ec8', type: 1, ground: 'C', ag: 0.4 } });
    s.walls = s.walls.map((w) => ({ ...w, type: 'gypsum', lengthM: 2 }));
    const r = screen(s);
    const d = r.directions.x;
    const elastic = buildingResponse(s).x;
    const mu = Math.max(...(elastic.demandToCapacity as number[]));
    expect(mu).toBeGreaterThan(1);
    const T = Math.max(elastic.period.usedS as number, 0.2);
    const c1 = 1 + (mu - 1) / (60 * T * T);
    expect(d.inelasticFactor).toBeCloseTo(c1, 12);
    expect(d.peakDriftRatio).toBeCloseTo((elastic.demand!.driftRatios[0] as number) * c1, 12);
  });

  it('reports no predicted state and low confidence without a hazard, and lists the hazard as missing', () => {
    const r = screen(house({ hazard: null }));
    expect(r.damage.predicted).toBeNull();
    expect(r.damage.probabilities).toBeNull();
    expect(r.damageState).toBe('none');
    expect(r.confidence.level).toBe('low');
    expect(r.missingInputs.map((m) => m.field)).toContain('hazard');
  });

  it('sends a storey of bare studs (an unbraced cripple wall) to Extensive under Sa ≥ 0.2 g, with a flag', () => {
    const s = survey({
      storeys: [
        storey({ floorConstruction: 'on-grade', heightM: 0.9, floorAreaM2: 80 }),
        storey({ heightM: 2.6, floorAreaM2: 80 }),
      ],
      walls: [
        wall({ storey: 0, direction: 'x', type: 'unsheathed', lengthM: 10, positionM: 0 }),
        wall({ storey: 0, direction: 'y', type: 'unsheathed', lengthM: 8, positionM: 0 }),
        wall({ storey: 1, direction: 'x', lengthM: 4, positionM: 0 }),
        wall({ storey: 1, direction: 'y', lengthM: 3, positionM: 0 }),
      ],
      hazard: { kind: 'ec8', type: 1, ground: 'B', ag: 0.25 },
    });
    const r = screen(s);
    expect(
      r.evidence.predicted.some((e) => e.kind === 'no-racking-strength' && e.state === 'extensive'),
    ).toBe(true);
    expect(r.damageState).toBe('extensive');
    expect(r.posting.level).toBe('keep-out');
    expect(r.flags.map((f) => f.id)).toContain('no-racking-strength');
  });
});

describe('screen(): observed evidence', () => {
  const calm = () => house({ hazard: { kind: 'ec8', type: 1, ground: 'A', ag: 0.02 } });

  it('maps residual drift by the FEMA P-58 thresholds 0.2 / 0.5 / 1 % (from memory, verify) and raises the prediction', () => {
    const cases: [number, string, string][] = [
      [0.001, 'none', 'open'],
      [0.003, 'slight', 'open'],
      [0.006, 'moderate', 'limited'],
      [0.012, 'extensive', 'keep-out'],
    ];
    for (const [ratio, state, posting] of cases) {
      const s = calm();
      s.observations.residualDrift = [
        {
          storey: 0,
          direction: 'x',
          ratio,
          method: 'offset',
          offsetM: null,
          overHeightM: null,
          tiltRad: null,
          uncertainty: null,
        },
      ];
      const r = screen(s);
      expect(r.damage.predicted).toBe('none');
      expect(r.damageState).toBe(state);
      expect(r.posting.level).toBe(posting);
    }
  });

  it('flags 0.5 % residual drift as where repair often costs more than rebuilding (McCormick et al. 2008, from memory, verify)', () => {
    const s = calm();
    s.observations.residualDrift = [
      {
        storey: 0,
        direction: 'y',
        ratio: 0.005,
        method: 'tilt',
        offsetM: null,
        overHeightM: null,
        tiltRad: 0.005,
        uncertainty: null,
      },
    ];
    const r = screen(s);
    expect(r.flags.map((f) => f.id)).toContain('residual-drift');
    expect(r.evidence.observed[0]?.text).toMatch(/repair often costs more than rebuilding/);
  });

  it('maps every checklist item to its least state as in our table (common practice, no source)', () => {
    const table: Record<ChecklistItem, [string, string]> = {
      'cracked-or-split-members': ['slight', 'extensive'],
      'fastener-withdrawal': ['moderate', 'extensive'],
      'hold-down-or-bracket-damage': ['moderate', 'extensive'],
      'sill-plate-sliding': ['moderate', 'extensive'],
      'foundation-movement': ['moderate', 'extensive'],
      'leaning-cripple-wall-or-soft-storey': ['extensive', 'complete'],
      'falling-hazard': ['slight', 'moderate'],
      'ground-failure': ['slight', 'extensive'],
    };
    for (const [item, [minor, severe]] of Object.entries(table) as [
      ChecklistItem,
      [string, string],
    ][]) {
      for (const [severity, state] of [
        ['minor', minor],
        ['severe', severe],
      ] as const) {
        const s = calm();
        s.observations.checklist = [{ item, severity }];
        expect(screen(s).damageState, `${item} ${severity}`).toBe(state);
      }
    }
  });

  it('asks for at least Limited entry for a minor falling hazard and Keep out for a severe one, whatever the damage state', () => {
    const s = calm();
    s.observations.checklist = [{ item: 'falling-hazard', severity: 'minor' }];
    expect(screen(s)).toMatchObject({ damageState: 'slight', posting: { level: 'limited' } });
    s.observations.checklist = [{ item: 'falling-hazard', severity: 'severe' }];
    expect(screen(s)).toMatchObject({ damageState: 'moderate', posting: { level: 'keep-out' } });
    s.observations.checklist = [{ item: 'ground-failure', severity: 'severe' }];
    const r = screen(s);
    expect(r.posting.level).toBe('keep-out');
    expect(r.flags.map((f) => f.id)).toContain('ground-failure');
  });

  it('reads an uplift gap of 3 mm or more under a shear wall as yielded anchorage (Moderate); less is normal slip', () => {
    const s = calm();
    const id = s.walls[0]!.id;
    s.observations.uplift = [{ wallId: id, gapM: 0.002 }];
    expect(screen(s).damageState).toBe('none');
    s.observations.uplift = [{ wallId: id, gapM: 0.005 }];
    expect(screen(s).damageState).toBe('moderate');
    s.observations.uplift = [{ wallId: 'no-such-wall', gapM: 0.005 }];
    const r = screen(s);
    expect(r.damageState).toBe('moderate');
    expect(r.missingInputs.some((m) => m.field.includes('no-such-wall'))).toBe(true);
  });

  it('never gives less than what was observed, and says when the prediction is the lower one', () => {
    const s = calm();
    s.observations.checklist = [{ item: 'sill-plate-sliding', severity: 'severe' }];
    const r = screen(s);
    expect(r.damage).toMatchObject({
      predicted: 'none',
      observed: 'extensive',
      state: 'extensive',
      governedBy: 'observed',
    });
    expect(r.reasons.join(' ')).toMatch(/prediction alone gives None/);
  });
});

describe('screen(): the posting table (ours, common practice)', () => {
  it('posts None and Slight Open, Moderate Limited entry, Extensive and Complete Keep out, as symbol and word', () => {
    const s = house({ hazard: null });
    const at = (item: ChecklistItem, severity: 'minor' | 'severe') => {
      s.observations.checklist = [{ item, severity }];
      return screen(s).posting;
    };
    expect(screen(house({ hazard: null })).posting).toMatchObject({
      level: 'open',
      word: 'Open',
      symbol: '○',
    });
    expect(at('cracked-or-split-members', 'minor')).toMatchObject({ level: 'open' });
    expect(at('fastener-withdrawal', 'minor')).toMatchObject({
      level: 'limited',
      word: 'Limited entry',
      symbol: '◐',
    });
    expect(at('fastener-withdrawal', 'severe')).toMatchObject({
      level: 'keep-out',
      word: 'Keep out',
      symbol: '■',
    });
    expect(at('leaning-cripple-wall-or-soft-storey', 'severe')).toMatchObject({
      level: 'keep-out',
    });
  });
});
