// Editing a survey record from the screens: every edit keeps the record valid to store,
// keeps text that is not valid yet, and marks what the app filled in.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emptySurvey, validateRecord, type SurveyRecord } from '../../forms/index.js';
import {
  DEFAULT_STOREY_HEIGHT_M,
  addStorey,
  addWall,
  applyFieldChange,
  copyWalls,
  removeTopStorey,
  removeWall,
  setAllStoreys,
  setAllStoreysPending,
  setSheathingTotal,
  setUplift,
  setWallType,
  storeyRemovalBlock,
  totalWallId,
  upliftPendingKey,
} from '../../web/screens/survey/record-edit.js';

const NOW = new Date('2025-03-04T08:00:00Z');
const fresh = (): SurveyRecord =>
  emptySurvey('device-1', NOW, '0b6f3a52-9a3e-4a36-8d1e-3c5a7c2e9f10');

function expectValid(r: SurveyRecord): void {
  const v = validateRecord(r);
  expect(v.ok ? [] : v.messages).toEqual([]);
}

describe('storeys', () => {
  it('adds a first storey with defaults that are listed as unconfirmed', () => {
    const r = addStorey(fresh());
    expect(r.building.storeys).toEqual([
      {
        heightM: DEFAULT_STOREY_HEIGHT_M,
        floorAreaM2: 100,
        floorConstruction: 'on-grade',
        unitWeightPa: null,
      },
    ]);
    expect(r.unconfirmed).toEqual(
      expect.arrayContaining([
        'building.storeys.0.heightM',
        'building.storeys.0.floorAreaM2',
        'building.storeys.0.floorConstruction',
      ]),
    );
    expectValid(r);
  });
  it('uses the plan area for the first storey when the plan size is known', () => {
    const base = fresh();
    const r = addStorey({ ...base, building: { ...base.building, planXM: 10, planYM: 8 } });
    expect(r.building.storeys[0]?.floorAreaM2).toBe(80);
  });
  it('copies the storey below into a new storey, unconfirmed', () => {
    let r = addStorey(fresh());
    r = applyFieldChange(r, {
      path: 'building.storeys.0.heightM',
      kind: 'value',
      value: 3.1,
      text: '3.1',
    });
    expect(r.unconfirmed).not.toContain('building.storeys.0.heightM');
    r = addStorey(r);
    expect(r.building.storeys[1]?.heightM).toBe(3.1);
    expect(r.building.storeys[1]?.floorConstruction).toBe('light-timber');
    expect(r.unconfirmed).toContain('building.storeys.1.heightM');
  });
  it('sets a typical height on every storey and confirms it', () => {
    let r = addStorey(addStorey(addStorey(fresh())));
    r = setAllStoreys(r, 'heightM', 2.9);
    expect(r.building.storeys.map((s) => s.heightM)).toEqual([2.9, 2.9, 2.9]);
    expect(r.unconfirmed.filter((p) => p.endsWith('heightM'))).toEqual([]);
  });
  it('keeps quick-entry text that is not valid on every storey, values untouched', () => {
    let r = addStorey(addStorey(fresh()));
    r = setAllStoreysPending(r, 'heightM', '0');
    expect(r.unparsed).toEqual({
      'building.storeys.0.heightM': '0',
      'building.storeys.1.heightM': '0',
    });
    expect(r.building.storeys.map((s) => s.heightM)).toEqual([2.7, 2.7]);
    expectValid(r);
  });
  it('refuses to remove a storey that still has walls, and says how many', () => {
    let r = addStorey(addStorey(fresh()));
    r = addWall(r, 1, 'x', 'wsp-100').record;
    expect(storeyRemovalBlock(r)).toEqual({ walls: 1, readings: 0 });
    expect(() => removeTopStorey(r)).toThrow(/storey 2 still has walls/);
  });
  it('removes the top storey with everything kept for it', () => {
    let r = addStorey(addStorey(fresh()));
    r = setAllStoreysPending(r, 'heightM', 'x');
    r = removeTopStorey(r);
    expect(r.building.storeys).toHaveLength(1);
    expect(Object.keys(r.unparsed)).toEqual(['building.storeys.0.heightM']);
    expect(r.unconfirmed.some((p) => p.startsWith('building.storeys.1'))).toBe(false);
  });
});

describe('walls', () => {
  it('creates, changes and (when cleared) removes a total per sheathing type', () => {
    let r = addStorey(fresh());
    r = setSheathingTotal(r, 0, 'x', 'wsp-100', 12);
    expect(r.walls).toHaveLength(1);
    expect(r.walls[0]).toMatchObject({
      id: '1X-total-wsp-100',
      lengthM: 12,
      storey: 0,
      direction: 'x',
    });
    r = setSheathingTotal(r, 0, 'x', 'wsp-100', 14.5);
    expect(r.walls[0]?.lengthM).toBe(14.5);
    r = setSheathingTotal(r, 0, 'x', 'wsp-100', null);
    expect(r.walls).toEqual([]);
    expectValid(r);
  });
  it('adds single walls with running ids per storey and direction', () => {
    let r = addStorey(addStorey(fresh()));
    r = addWall(r, 0, 'x', 'clt-bracketed').record;
    r = addWall(r, 0, 'x', 'rocking').record;
    r = addWall(r, 1, 'y', 'wsp-50').record;
    expect(r.walls.map((w) => w.id)).toEqual(['1X-1', '1X-2', '2Y-1']);
    expect(r.walls[0]?.connectors).not.toBeNull();
    expect(r.walls[2]?.rocking).toBeNull();
    expect(r.unconfirmed).toContain('walls.1.lengthM');
    expectValid(r);
  });
  it('adds the panel details when a wall becomes a rocking wall', () => {
    let r = addWall(addStorey(fresh()), 0, 'y', 'wsp-100').record;
    r = setWallType(r, 0, 'rocking');
    expect(r.walls[0]?.rocking).toEqual({
      thicknessM: null,
      selfWeightN: null,
      gravityLoadN: null,
      postTensionN: null,
    });
  });
  it('removes a wall with its uplift reading and renumbers what is kept for later walls', () => {
    let r = addStorey(fresh());
    r = addWall(r, 0, 'x', 'rocking').record;
    r = addWall(r, 0, 'x', 'rocking').record;
    r = setUplift(r, '1X-1', 0.004);
    r = applyFieldChange(r, { path: 'walls.1.positionM', kind: 'pending', text: '4..2' });
    r = removeWall(r, 0);
    expect(r.walls.map((w) => w.id)).toEqual(['1X-2']);
    expect(r.observations.uplift).toEqual([]);
    expect(r.unparsed).toEqual({ 'walls.0.positionM': '4..2' });
    expect(r.unconfirmed).toEqual(expect.arrayContaining(['walls.0.lengthM']));
    expectValid(r);
  });
  it('copies the walls of the storey below, unconfirmed, without duplicating ids', () => {
    let r = addStorey(addStorey(fresh()));
    r = setSheathingTotal(r, 0, 'x', 'gypsum', 8);
    r = addWall(r, 0, 'x', 'clt-bracketed').record;
    r = copyWalls(r, 0, 1, 'x');
    expect(r.walls.map((w) => w.id)).toEqual([
      '1X-total-gypsum',
      '1X-1',
      '2X-total-gypsum',
      '2X-1',
    ]);
    expect(r.unconfirmed).toEqual(expect.arrayContaining(['walls.2.lengthM', 'walls.3.lengthM']));
    expect(copyWalls(r, 0, 1, 'x').walls).toHaveLength(4);
  });
});

describe('uplift', () => {
  it('adds, changes and removes the gap of a wall', () => {
    let r = addWall(addStorey(fresh()), 0, 'x', 'rocking').record;
    r = { ...r, unparsed: { [upliftPendingKey('1X-1')]: 'abc' } };
    r = setUplift(r, '1X-1', 0.006);
    expect(r.observations.uplift).toEqual([{ wallId: '1X-1', gapM: 0.006 }]);
    expect(r.unparsed).toEqual({});
    r = setUplift(r, '1X-1', 0.009);
    expect(r.observations.uplift).toEqual([{ wallId: '1X-1', gapM: 0.009 }]);
    r = setUplift(r, '1X-1', null);
    expect(r.observations.uplift).toEqual([]);
  });
});

describe('field changes', () => {
  it('keeps pending text without touching the value, and a later value clears it', () => {
    let r = addStorey(fresh());
    r = applyFieldChange(r, { path: 'building.storeys.0.heightM', kind: 'pending', text: '-2' });
    expect(r.building.storeys[0]?.heightM).toBe(2.7);
    expect(r.unparsed['building.storeys.0.heightM']).toBe('-2');
    r = applyFieldChange(r, {
      path: 'building.storeys.0.heightM',
      kind: 'value',
      value: 2.5,
      text: '2.5',
    });
    expect(r.unparsed).toEqual({});
    expect(r.building.storeys[0]?.heightM).toBe(2.5);
  });
  it('does not crash on any sequence of storey and wall edits, and stays valid (fast-check)', () => {
    const op = fc.oneof(
      fc.constant({ k: 'add' as const }),
      fc.constant({ k: 'remove' as const }),
      fc.record({
        k: fc.constant('wall' as const),
        d: fc.constantFrom('x' as const, 'y' as const),
      }),
      fc.record({
        k: fc.constant('total' as const),
        v: fc.option(fc.double({ min: 0.1, max: 100, noNaN: true })),
      }),
      fc.record({
        k: fc.constant('height' as const),
        v: fc.double({ min: 0.1, max: 30, noNaN: true }),
      }),
      fc.record({ k: fc.constant('drop' as const), i: fc.nat(5) }),
    );
    fc.assert(
      fc.property(fc.array(op, { maxLength: 25 }), (ops) => {
        let r = fresh();
        for (const o of ops) {
          const n = r.building.storeys.length;
          if (o.k === 'add') r = addStorey(r);
          else if (o.k === 'remove') r = storeyRemovalBlock(r) ? r : removeTopStorey(r);
          else if (o.k === 'wall' && n > 0) r = addWall(r, n - 1, o.d, 'rocking').record;
          else if (o.k === 'total' && n > 0) r = setSheathingTotal(r, 0, 'y', 'wsp-75', o.v);
          else if (o.k === 'height' && n > 0) r = setAllStoreys(r, 'heightM', o.v);
          else if (o.k === 'drop' && r.walls.length > o.i) r = removeWall(r, o.i);
        }
        expectValid(r);
        expect(new Set(r.walls.map((w) => w.id)).size).toBe(r.walls.length);
        expect(r.walls.every((w) => w.storey < r.building.storeys.length)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
  it('names the total id of a storey and direction', () => {
    expect(totalWallId(2, 'y', 'diagonal-boards')).toBe('3Y-total-diagonal-boards');
  });
});
