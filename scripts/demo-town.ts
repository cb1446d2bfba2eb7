/**
 * The demo town: `npm run demo` writes test/fixtures/demo/demo-town.geojson.
 *
 * Corrow Vale is an invented town (invented streets, addresses, inspectors; coordinates
 * around an arbitrary point with no real place depicted) after an invented scenario
 * earthquake: no data from any real event. Its 48 buildings cover every structural system,
 * every damage state and every posting level, among them rocking CLT walls, a soft-storey
 * house over parking and cripple-wall houses. Buildings are built from archetypes with
 * seeded variation (mulberry32, test/bench/prng.ts), and every verdict comes from `screen()`
 * itself; the script stops if the town no longer covers every outcome.
 *
 * The file is written with web/exchange's GeoJSON export, so the app imports it as any
 * other exchange file.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import {
  CALC_VERSION,
  DAMAGE_STATES,
  POSTING_LEVELS,
  screen,
  type ChecklistEntry,
  type ConnectorInput,
  type ResidualDriftInput,
  type RockingInput,
  type SpectrumSpec,
  type StoreyInput,
  type StructuralSystem,
  type UpliftInput,
  type WallInput,
  type WallType,
} from '../calc/index.js';
import type { SurveyRecord } from '../forms/schema/index.js';
import { geoJsonExport } from '../web/exchange/geojson-export.js';
import { mulberry32 } from '../test/bench/prng.js';

/** Where the generated file goes (relative to the repository root). */
export const DEMO_TOWN_PATH = 'test/fixtures/demo/demo-town.geojson';

/** Seed of the town: change it and the buildings vary, the coverage stays. */
export const DEMO_SEED = 20_310_611;

/** Centre of the invented town: an arbitrary point in farmland, no real place depicted. */
export const DEMO_CENTRE = { lat: 45.0213, lon: -123.6187 } as const;

/** Fixed clock, so the file is the same on every run. */
const SURVEY_DAY = Date.parse('2031-06-11T07:00:00.000Z');
const EXPORTED_AT = new Date('2031-06-13T18:00:00.000Z');

const TOWN = 'Corrow Vale';
const STREETS = [
  'Millrace Lane',
  'Lantern Row',
  'Copperbeech Road',
  'Sawpit Lane',
  'Tollgate Rise',
  'Fennel Close',
  'Weir Walk',
  'Cooperage Lane',
  'Kindling Street',
  'Otterbank Road',
];
const INSPECTORS = ['A. Marrow', 'L. Fenwick', 'D. Osei', 'K. Varga', 'N. Brook'];

type Rand = () => number;

interface Ctx {
  rand: Rand;
  between: (lo: number, hi: number) => number;
  /** A round figure: `step` apart. */
  round: (x: number, step: number) => number;
}

/** The ground shaking zones of the scenario, as shaking-map values (invented). */
type Zone = 'hill' | 'town' | 'flats';

function eventHazard(ctx: Ctx, zone: Zone): SpectrumSpec {
  // Invented scenario: firm ground on the hill, the old town, soft river flats.
  const pga = { hill: 0.12, town: 0.3, flats: 0.5 }[zone] * ctx.between(0.9, 1.1);
  return {
    kind: 'event',
    pga: ctx.round(pga, 0.01),
    sa03: ctx.round(pga * 2.3, 0.01),
    sa10: ctx.round(pga * 1.1, 0.01),
  };
}

/** A design spectrum an engineer typed in (ASCE 7-16 values of our own choosing). */
const DESIGN_SPECTRUM: SpectrumSpec = { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 };

interface Plan {
  x: number;
  y: number;
}

function storeys(
  n: number,
  heightM: number,
  area: number,
  floor: StoreyInput['floorConstruction'],
): StoreyInput[] {
  return Array.from({ length: n }, (_, i) => ({
    heightM,
    floorAreaM2: area,
    floorConstruction: i === 0 ? 'on-grade' : floor,
    unitWeightPa: null,
  }));
}

interface WallSpec {
  type: WallType;
  lengthM: number;
  /** Position of the wall line: 0 or 1 (the two sides) or between, as a share of the plan. */
  at: number;
  heightM?: number | null;
  connectors?: ConnectorInput | null;
  rocking?: RockingInput | null;
  devices?: WallInput['devices'];
  user?: { shear: number; stiffness: number };
}

/** Walls of one storey: lines along x (positions across y) and along y (positions across x). */
function walls(
  storey: number,
  plan: Plan,
  spec: { x: WallSpec[]; y: WallSpec[] },
  prefix = '',
): WallInput[] {
  const out: WallInput[] = [];
  for (const direction of ['x', 'y'] as const) {
    spec[direction].forEach((w, k) => {
      out.push({
        id: `${prefix}S${storey + 1}${direction.toUpperCase()}${k + 1}`,
        storey,
        direction,
        type: w.type,
        lengthM: w.lengthM,
        heightM: w.heightM ?? null,
        positionM: Math.round(w.at * (direction === 'x' ? plan.y : plan.x) * 100) / 100,
        connectors: w.connectors ?? null,
        rocking: w.rocking ?? null,
        devices: w.devices ?? [],
        userUnitShearNPerM: w.user?.shear ?? null,
        userUnitStiffnessNPerM2: w.user?.stiffness ?? null,
      });
    });
  }
  return out;
}

/** Sheathed walls on all four sides, `share` of each side's length braced. */
function boxWalls(
  storey: number,
  plan: Plan,
  type: WallType,
  share: number,
  typeY: WallType = type,
): WallInput[] {
  return walls(storey, plan, {
    x: [
      { type, lengthM: round2(plan.x * share), at: 0 },
      { type, lengthM: round2(plan.x * share), at: 1 },
    ],
    y: [
      { type: typeY, lengthM: round2(plan.y * share), at: 0 },
      { type: typeY, lengthM: round2(plan.y * share), at: 1 },
    ],
  });
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}

/** What an archetype gives: the survey fields, and a note of what the inspector found. */
interface Building {
  system: StructuralSystem;
  codeLevel: SurveyRecord['building']['codeLevel'];
  occupancy: SurveyRecord['building']['occupancy'];
  plan: Plan;
  storeys: StoreyInput[];
  roof: SurveyRecord['building']['roofConstruction'];
  walls: WallInput[];
  hazard: SpectrumSpec | null;
  checklist?: ChecklistEntry[];
  residual?: Omit<ResidualDriftInput, 'offsetM' | 'overHeightM' | 'tiltRad' | 'uncertainty'>[];
  uplift?: UpliftInput[];
  measuredHz?: number;
  notes: string;
}

function drift(
  storey: number,
  direction: 'x' | 'y',
  ratio: number,
  method: ResidualDriftInput['method'] = 'phone-tilt',
) {
  return { storey, direction, ratio, method };
}

// --- Archetypes. Each takes the context and a variant number. -------------------------

function house(
  ctx: Ctx,
  zone: Zone,
  v: { storeys: number; sheathing: WallType; share: number; code: Building['codeLevel'] },
): Building {
  const plan = { x: ctx.round(ctx.between(10, 14), 0.1), y: ctx.round(ctx.between(7.5, 10), 0.1) };
  const area = round2(plan.x * plan.y);
  return {
    system: 'light-frame',
    codeLevel: v.code,
    occupancy: 'single-family',
    plan,
    storeys: storeys(v.storeys, ctx.round(ctx.between(2.5, 2.8), 0.05), area, 'light-timber'),
    roof: ctx.rand() < 0.4 ? 'heavy-tile' : 'light',
    walls: Array.from({ length: v.storeys }, (_, s) =>
      boxWalls(s, plan, v.sheathing, v.share),
    ).flat(),
    hazard: eventHazard(ctx, zone),
    notes: '',
  };
}

/** A two- or three-storey house over a garage: the street side of the ground storey is open. */
function softStoreyHouse(ctx: Ctx, zone: Zone, upper: number): Building {
  const plan = { x: ctx.round(ctx.between(11, 13), 0.1), y: ctx.round(ctx.between(8, 9.5), 0.1) };
  const area = round2(plan.x * plan.y);
  const ground = walls(0, plan, {
    // Street side (y = 0): two garage doors leave two short piers; the back wall is full.
    x: [
      { type: 'wsp-150', lengthM: 1.2, at: 0 },
      { type: 'wsp-150', lengthM: round2(plan.x * 0.6), at: 1 },
    ],
    y: [
      { type: 'gypsum', lengthM: round2(plan.y * 0.5), at: 0 },
      { type: 'gypsum', lengthM: round2(plan.y * 0.5), at: 1 },
    ],
  });
  const above = Array.from({ length: upper }, (_, s) =>
    boxWalls(s + 1, plan, 'wsp-100', 0.6),
  ).flat();
  return {
    system: 'light-frame',
    codeLevel: 'low',
    occupancy: 'multi-family',
    plan,
    storeys: storeys(upper + 1, 2.7, area, 'light-timber'),
    roof: 'light',
    walls: [...ground, ...above],
    hazard: eventHazard(ctx, zone),
    notes: 'Parking under the living storeys; the street front of the garage is open.',
  };
}

/** A house on a short cripple wall over a crawl space. */
function crippleWallHouse(ctx: Ctx, zone: Zone, cripple: WallType): Building {
  const plan = { x: ctx.round(ctx.between(10, 12.5), 0.1), y: ctx.round(ctx.between(7.5, 9), 0.1) };
  const area = round2(plan.x * plan.y);
  return {
    system: 'light-frame',
    codeLevel: 'pre-code',
    occupancy: 'single-family',
    plan,
    storeys: [
      { heightM: 0.9, floorAreaM2: area, floorConstruction: 'on-grade', unitWeightPa: null },
      { heightM: 2.6, floorAreaM2: area, floorConstruction: 'light-timber', unitWeightPa: null },
    ],
    roof: 'heavy-tile',
    walls: [...boxWalls(0, plan, cripple, 1), ...boxWalls(1, plan, 'diagonal-boards', 0.5)],
    hazard: eventHazard(ctx, zone),
    notes:
      cripple === 'unsheathed'
        ? 'Crawl space on a cripple wall of bare studs.'
        : 'Crawl space; the cripple wall was sheathed in a retrofit.',
  };
}

/** Connectors of the demo's CLT walls: two hold-downs at each end, brackets every metre. */
const CLT_CONNECTORS: ConnectorInput = {
  holdDownCount: 4,
  holdDownCapacityN: 90_000,
  holdDownStiffnessNPerM: 10e6,
  bracketCount: null,
  bracketCapacityN: 30_000,
  bracketStiffnessNPerM: 5e6,
};

/** A bracketed CLT wall with one angle bracket per metre (entered, not defaulted). */
function cltWall(lengthM: number, at: number): WallSpec {
  return {
    type: 'clt-bracketed',
    lengthM,
    at,
    connectors: { ...CLT_CONNECTORS, bracketCount: Math.max(2, Math.ceil(lengthM)) },
  };
}

/** A mass-timber panel block: CLT walls on hold-downs and angle brackets. */
function cltBlock(ctx: Ctx, zone: Zone | 'design', n: number, share: number): Building {
  const plan = { x: ctx.round(ctx.between(20, 28), 0.1), y: ctx.round(ctx.between(12, 16), 0.1) };
  const area = round2(plan.x * plan.y);
  const spec = cltWall;
  const all: WallInput[] = [];
  for (let s = 0; s < n; s++) {
    // A cellular plan: four wall lines each way, `share` of each line in panels.
    const lx = round2((plan.x * share) / 2);
    const ly = round2((plan.y * share) / 2);
    all.push(
      ...walls(s, plan, {
        x: [0, 0, 1 / 3, 1 / 3, 2 / 3, 2 / 3, 1, 1].map((at) => spec(lx, at)),
        y: [0, 0, 1 / 3, 1 / 3, 2 / 3, 2 / 3, 1, 1].map((at) => spec(ly, at)),
      }),
    );
  }
  return {
    system: 'mass-timber-panel',
    codeLevel: 'high',
    occupancy: 'multi-family',
    plan,
    storeys: storeys(n, 3.0, area, 'clt'),
    roof: 'clt',
    walls: all,
    hazard: zone === 'design' ? DESIGN_SPECTRUM : eventHazard(ctx, zone),
    notes: '',
  };
}

/**
 * A CLT building whose x direction is braced by post-tensioned rocking walls, the y
 * direction by bracketed CLT walls.
 */
function rockingBuilding(
  ctx: Ctx,
  zone: Zone,
  v: {
    n: number;
    widthM: number;
    gravityKN: number;
    postTensionKN: number;
    devices?: WallInput['devices'];
    holdDowns?: boolean;
  },
): Building {
  const plan = { x: ctx.round(ctx.between(18, 24), 0.1), y: ctx.round(ctx.between(12, 15), 0.1) };
  const area = round2(plan.x * plan.y);
  const all: WallInput[] = [];
  const thickness = 0.16;
  for (let s = 0; s < v.n; s++) {
    const rocking = (at: number): WallSpec => ({
      type: 'rocking',
      lengthM: v.widthM,
      at,
      heightM: 3.0,
      rocking: {
        thicknessM: thickness,
        // Self weight of the panel at 4.2 kN/m³ (as calc/rocking's default, EN 1991-1-1 C24).
        selfWeightN: Math.round(v.widthM * 3.0 * thickness * 4200),
        gravityLoadN: v.gravityKN * 1000,
        postTensionN: v.postTensionKN * 1000,
      },
      connectors: v.holdDowns
        ? { ...CLT_CONNECTORS, holdDownCount: 2, holdDownCapacityN: 40_000, bracketCount: 2 }
        : null,
      devices: v.devices ?? [],
    });
    all.push(
      ...walls(s, plan, {
        x: [rocking(0), rocking(0), rocking(1), rocking(1)],
        y: [0, 0.5, 1].map((at) => cltWall(4, at)),
      }),
    );
  }
  return {
    system: 'rocking-wall',
    codeLevel: 'high',
    occupancy: 'commercial',
    plan,
    storeys: storeys(v.n, 3.0, area, 'clt'),
    roof: 'clt',
    walls: all,
    hazard: eventHazard(ctx, zone),
    notes:
      v.postTensionKN > 0
        ? 'Post-tensioned CLT rocking walls along the street; bracketed CLT across.'
        : 'Free-standing CLT fin walls along the street; bracketed CLT across.',
  };
}

/** A glulam post-and-beam hall braced by steel rods or knee braces (entered as user walls). */
function timberHall(
  ctx: Ctx,
  zone: Zone,
  v: { braceShare: number; occupancy: Building['occupancy'] },
): Building {
  const plan = { x: ctx.round(ctx.between(24, 36), 0.5), y: ctx.round(ctx.between(14, 20), 0.5) };
  const area = round2(plan.x * plan.y);
  // A braced bay, per metre of bay: about 25 kN/m strength and 1.5 MN/m per m stiffness
  // (demo values of our own).
  const brace = (len: number, at: number): WallSpec => ({
    type: 'user',
    lengthM: len,
    at,
    user: { shear: 25_000, stiffness: 1.5e6 },
  });
  return {
    system: 'heavy-timber-frame',
    codeLevel: 'moderate',
    occupancy: v.occupancy,
    plan,
    storeys: storeys(1, ctx.round(ctx.between(5, 6.5), 0.5), area, 'light-timber'),
    roof: 'light',
    walls: walls(0, plan, {
      x: [brace(round2(plan.x * v.braceShare), 0), brace(round2(plan.x * v.braceShare), 1)],
      y: [brace(round2(plan.y * v.braceShare), 0), brace(round2(plan.y * v.braceShare), 1)],
    }),
    hazard: eventHazard(ctx, zone),
    notes: 'Glulam frames with braced bays.',
  };
}

/** A small apartment block of light frame. */
function apartments(
  ctx: Ctx,
  zone: Zone,
  v: { n: number; sheathing: WallType; share: number; code: Building['codeLevel'] },
): Building {
  const plan = { x: ctx.round(ctx.between(18, 24), 0.1), y: ctx.round(ctx.between(10, 13), 0.1) };
  const area = round2(plan.x * plan.y);
  const all: WallInput[] = [];
  for (let s = 0; s < v.n; s++) {
    all.push(
      ...walls(s, plan, {
        x: [
          { type: v.sheathing, lengthM: round2(plan.x * v.share), at: 0 },
          { type: 'gypsum', lengthM: round2(plan.x * 0.5), at: 0.5 },
          { type: v.sheathing, lengthM: round2(plan.x * v.share), at: 1 },
        ],
        y: [
          { type: v.sheathing, lengthM: round2(plan.y * v.share), at: 0 },
          { type: v.sheathing, lengthM: round2(plan.y * v.share), at: 0.5 },
          { type: v.sheathing, lengthM: round2(plan.y * v.share), at: 1 },
        ],
      }),
    );
  }
  return {
    system: 'light-frame',
    codeLevel: v.code,
    occupancy: 'multi-family',
    plan,
    storeys: storeys(v.n, 2.7, area, 'light-timber'),
    roof: 'light',
    walls: all,
    hazard: eventHazard(ctx, zone),
    notes: '',
  };
}

/** The town plan: every building, in order. */
function townBuildings(ctx: Ctx): Building[] {
  const b: Building[] = [];
  const add = (x: Building, extra: Partial<Building> = {}) => b.push({ ...x, ...extra });
  const minor = (item: ChecklistEntry['item']): ChecklistEntry => ({ item, severity: 'minor' });
  const severe = (item: ChecklistEntry['item']): ChecklistEntry => ({ item, severity: 'severe' });

  // Houses on the hill: little shaking.
  add(house(ctx, 'hill', { storeys: 1, sheathing: 'wsp-100', share: 0.6, code: 'high' }), {
    notes: 'Nothing seen.',
  });
  add(house(ctx, 'hill', { storeys: 2, sheathing: 'wsp-100', share: 0.6, code: 'moderate' }), {
    notes: 'Nothing seen.',
  });
  add(house(ctx, 'hill', { storeys: 1, sheathing: 'wsp-150', share: 0.5, code: 'moderate' }), {
    checklist: [minor('cracked-or-split-members')],
    notes: 'Hairline cracks in the plaster at a door head.',
  });
  add(house(ctx, 'hill', { storeys: 2, sheathing: 'wsp-150', share: 0.5, code: 'low' }), {
    checklist: [minor('falling-hazard')],
    notes: 'Chimney cap loose; cordon the garden side.',
  });
  add(house(ctx, 'hill', { storeys: 1, sheathing: 'wsp-100', share: 0.6, code: 'unknown' }), {
    hazard: null,
    notes: 'Hazard not entered yet; nothing seen.',
  });
  add(house(ctx, 'hill', { storeys: 1, sheathing: 'wsp-100', share: 0.6, code: 'high' }), {
    residual: [drift(0, 'x', 0.0025)],
    notes: 'Front door sticks.',
  });

  // Houses in the old town.
  add(house(ctx, 'town', { storeys: 1, sheathing: 'wsp-75', share: 0.7, code: 'high' }), {
    notes: 'Nothing seen.',
  });
  add(house(ctx, 'town', { storeys: 2, sheathing: 'wsp-100', share: 0.55, code: 'moderate' }));
  add(house(ctx, 'town', { storeys: 2, sheathing: 'wsp-150', share: 0.45, code: 'low' }), {
    checklist: [minor('fastener-withdrawal')],
    notes: 'Nail heads pulled through the sheathing at the garage corner.',
  });
  add(house(ctx, 'town', { storeys: 1, sheathing: 'gypsum', share: 0.6, code: 'pre-code' }), {
    notes: 'Plaster-only walls.',
  });
  add(house(ctx, 'town', { storeys: 2, sheathing: 'wsp-100', share: 0.6, code: 'moderate' }), {
    checklist: [severe('falling-hazard')],
    notes: 'Brick chimney cracked through at the roof line.',
  });
  add(house(ctx, 'town', { storeys: 1, sheathing: 'wsp-100', share: 0.55, code: 'moderate' }), {
    measuredHz: 2.4,
    notes: 'Ambient vibration measured with a phone on the floor.',
  });
  add(house(ctx, 'town', { storeys: 2, sheathing: 'wsp-100', share: 0.6, code: 'high' }), {
    residual: [drift(0, 'y', 0.006), drift(1, 'y', 0.003)],
    checklist: [minor('sill-plate-sliding')],
    notes: 'The house moved about 15 mm on its sill.',
  });
  add(house(ctx, 'town', { storeys: 1, sheathing: 'wsp-150', share: 0.5, code: 'unknown' }), {
    hazard: null,
    checklist: [minor('hold-down-or-bracket-damage'), minor('cracked-or-split-members')],
    notes: 'Hazard not entered; a hold-down strap is bent.',
  });

  // Cripple-wall houses.
  add(crippleWallHouse(ctx, 'town', 'unsheathed'), {
    notes: 'Bare-stud cripple wall, nothing seen from outside.',
  });
  add(crippleWallHouse(ctx, 'flats', 'unsheathed'), {
    checklist: [minor('leaning-cripple-wall-or-soft-storey')],
    residual: [drift(0, 'x', 0.02, 'offset')],
    notes: 'The cripple wall leans towards the street.',
  });
  add(crippleWallHouse(ctx, 'flats', 'unsheathed'), {
    checklist: [severe('leaning-cripple-wall-or-soft-storey'), severe('foundation-movement')],
    notes: 'The house has slid off its cripple wall at the front.',
  });
  add(crippleWallHouse(ctx, 'town', 'wsp-100'), {
    notes: 'Retrofitted cripple wall; nothing seen.',
  });

  // Soft-storey houses over parking.
  add(softStoreyHouse(ctx, 'town', 2), { notes: 'Parking under two storeys; nothing seen yet.' });
  add(softStoreyHouse(ctx, 'flats', 2), {
    checklist: [severe('leaning-cripple-wall-or-soft-storey')],
    residual: [drift(0, 'x', 0.04, 'offset')],
    notes: 'The garage storey leans visibly; the doors are jammed.',
  });
  add(softStoreyHouse(ctx, 'hill', 1), { notes: 'Parking under one storey.' });

  // Apartments.
  add(apartments(ctx, 'hill', { n: 3, sheathing: 'wsp-75', share: 0.5, code: 'high' }), {
    notes: 'Nothing seen.',
  });
  add(apartments(ctx, 'town', { n: 3, sheathing: 'wsp-100', share: 0.45, code: 'moderate' }));
  add(apartments(ctx, 'town', { n: 4, sheathing: 'wsp-150', share: 0.4, code: 'low' }), {
    checklist: [minor('cracked-or-split-members'), minor('fastener-withdrawal')],
  });
  add(apartments(ctx, 'flats', { n: 3, sheathing: 'wsp-100', share: 0.5, code: 'moderate' }), {
    checklist: [minor('ground-failure')],
    notes: 'Sand boils in the car park.',
  });
  add(apartments(ctx, 'flats', { n: 3, sheathing: 'wsp-50', share: 0.5, code: 'high' }), {
    checklist: [severe('ground-failure'), minor('foundation-movement')],
    notes: 'Ejecta around the north wall; the slab settled at one corner.',
  });
  add(apartments(ctx, 'town', { n: 2, sheathing: 'wsp-100', share: 0.5, code: 'moderate' }), {
    residual: [drift(0, 'x', 0.012, 'offset'), drift(1, 'x', 0.004, 'offset')],
    notes: 'Plumb line at the stair: the ground storey leans.',
  });

  // Mass-timber panel blocks.
  add(cltBlock(ctx, 'hill', 5, 0.5), { notes: 'Nothing seen.' });
  add(cltBlock(ctx, 'town', 4, 0.5), { notes: 'Nothing seen.' });
  add(cltBlock(ctx, 'town', 6, 0.45), {
    checklist: [minor('hold-down-or-bracket-damage')],
    notes: 'Two angle brackets deformed at the ground storey.',
  });
  add(cltBlock(ctx, 'flats', 5, 0.45), {
    checklist: [severe('hold-down-or-bracket-damage'), minor('cracked-or-split-members')],
    uplift: [{ wallId: 'S1X1', gapM: 0.012 }],
    notes: 'Hold-down torn at the corner wall; a panel lifted.',
  });
  add(cltBlock(ctx, 'design', 4, 0.5), { notes: 'Checked against the design spectrum.' });
  add(cltBlock(ctx, 'town', 3, 0.5), {
    measuredHz: 1.2,
    notes: 'Ambient vibration recorded on the roof.',
  });

  // Rocking CLT walls.
  add(rockingBuilding(ctx, 'hill', { n: 3, widthM: 1.2, gravityKN: 100, postTensionKN: 50 }), {
    notes: 'Nothing seen.',
  });
  add(rockingBuilding(ctx, 'flats', { n: 3, widthM: 1.6, gravityKN: 200, postTensionKN: 50 }), {
    uplift: [{ wallId: 'S1X1', gapM: 0.004 }],
    notes: 'Sealant at the heel of a rocking wall torn.',
  });
  add(
    rockingBuilding(ctx, 'town', {
      n: 2,
      widthM: 1.6,
      gravityKN: 200,
      postTensionKN: 50,
      holdDowns: true,
    }),
    {
      uplift: [{ wallId: 'S1X3', gapM: 0.01 }],
      notes: 'Rocking wall lifted; the hold-down under it is stretched.',
    },
  );
  add(rockingBuilding(ctx, 'flats', { n: 3, widthM: 1.2, gravityKN: 100, postTensionKN: 80 }), {
    notes: 'Post-tensioned walls on the river flats; nothing seen from outside.',
  });
  add(rockingBuilding(ctx, 'town', { n: 1, widthM: 0.6, gravityKN: 0, postTensionKN: 0 }), {
    occupancy: 'public-assembly',
    uplift: [{ wallId: 'S1X2', gapM: 0.09 }],
    checklist: [minor('cracked-or-split-members')],
    notes: 'Pavilion: a fin wall rocked hard; crushed toe, marks show a large lift at the heel.',
  });
  add(
    rockingBuilding(ctx, 'town', {
      n: 2,
      widthM: 1.6,
      gravityKN: 200,
      postTensionKN: 100,
      devices: ['viscous-damper'],
    }),
    {
      notes: 'Dampers at the rocking-wall heels.',
    },
  );

  // Heavy-timber halls.
  add(timberHall(ctx, 'hill', { braceShare: 0.3, occupancy: 'public-assembly' }), {
    notes: 'Nothing seen.',
  });
  add(timberHall(ctx, 'town', { braceShare: 0.25, occupancy: 'industrial' }), {
    checklist: [minor('fastener-withdrawal')],
    notes: 'Brace bolts loose at two bays.',
  });
  add(timberHall(ctx, 'town', { braceShare: 0.2, occupancy: 'commercial' }), {
    checklist: [severe('cracked-or-split-members')],
    notes: 'A glulam knee brace split along its length.',
  });
  add(timberHall(ctx, 'flats', { braceShare: 0.2, occupancy: 'industrial' }), {
    checklist: [severe('ground-failure')],
    notes: 'Lateral spread towards the river; floor slab cracked through.',
  });
  add(timberHall(ctx, 'flats', { braceShare: 0.12, occupancy: 'essential-facility' }), {
    residual: [drift(0, 'y', 0.015, 'tilt')],
    notes: 'Fire station: the frames lean; doors jammed.',
  });
  add(timberHall(ctx, 'hill', { braceShare: 0.3, occupancy: 'commercial' }), {
    hazard: null,
    checklist: [minor('falling-hazard')],
    notes: 'Hazard not entered; roof-mounted sign loose.',
  });

  // More houses on the flats.
  add(house(ctx, 'flats', { storeys: 2, sheathing: 'wsp-100', share: 0.55, code: 'moderate' }));
  add(house(ctx, 'flats', { storeys: 1, sheathing: 'wsp-75', share: 0.6, code: 'high' }), {
    checklist: [minor('foundation-movement')],
    notes: 'Stepped crack in the stem wall.',
  });
  add(house(ctx, 'flats', { storeys: 2, sheathing: 'gypsum', share: 0.55, code: 'pre-code' }), {
    checklist: [severe('sill-plate-sliding'), minor('falling-hazard')],
    notes: 'Anchor bolts sheared; the house sits 40 mm off its foundation.',
  });
  return b;
}

function uuid(rand: Rand): string {
  const hex = (n: number) =>
    Array.from({ length: n }, () => Math.floor(rand() * 16).toString(16)).join('');
  const variant = '89ab'[Math.floor(rand() * 4)] as string;
  return `${hex(8)}-${hex(4)}-4${hex(3)}-${variant}${hex(3)}-${hex(12)}`;
}

/** The demo town's survey records, each with its screening result. */
export function makeDemoTown(seed = DEMO_SEED): SurveyRecord[] {
  const rand = mulberry32(seed);
  const ctx: Ctx = {
    rand,
    between: (lo, hi) => lo + (hi - lo) * rand(),
    round: (x, step) => Math.round(x / step) * step,
  };
  // Floating steps like 0.1 leave tails (12.300000000000001): round to 1e-6 for tidy files.
  const tidy = ctx.round;
  ctx.round = (x, step) => Math.round(tidy(x, step) * 1e6) / 1e6;
  const buildings = townBuildings(ctx);
  const numbers = new Map<string, number>();
  return buildings.map((b, i) => {
    const street = STREETS[Math.floor(rand() * STREETS.length)] as string;
    const n = (numbers.get(street) ?? 0) + 1 + Math.floor(rand() * 4);
    numbers.set(street, n);
    // Zones: the hill to the north, the flats to the south (by the invented river).
    const zoneLat =
      b.hazard?.kind === 'event' ? (b.hazard.pga > 0.4 ? -1 : b.hazard.pga < 0.2 ? 1 : 0) : 0.5;
    const lat = DEMO_CENTRE.lat + zoneLat * 0.006 + (rand() - 0.5) * 0.005;
    const lon = DEMO_CENTRE.lon + (rand() - 0.5) * 0.014;
    const created = new Date(
      SURVEY_DAY + Math.floor(i / 12) * 86_400_000 + Math.floor(rand() * 8 * 3_600_000),
    );
    const computed = new Date(created.getTime() + 20 * 60_000);
    const record: SurveyRecord = {
      schemaVersion: 2,
      id: uuid(rand),
      revision: 1 + Math.floor(rand() * 3),
      deviceId: `demo-device-${1 + (i % 3)}`,
      createdAt: created.toISOString(),
      updatedAt: computed.toISOString(),
      address: `${n} ${street}, ${TOWN} (demo town, invented)`,
      location: {
        lat: Math.round(lat * 1e6) / 1e6,
        lon: Math.round(lon * 1e6) / 1e6,
        accuracyM: Math.round(3 + rand() * 9),
        source: 'gps',
      },
      inspector: INSPECTORS[i % INSPECTORS.length] as string,
      team: i % 2 === 0 ? 'Team Weir' : 'Team Tollgate',
      inspectionKind: 'first',
      building: {
        system: b.system,
        codeLevel: b.codeLevel,
        occupancy: b.occupancy,
        planXM: b.plan.x,
        planYM: b.plan.y,
        storeys: b.storeys,
        roofConstruction: b.roof,
        roofUnitWeightPa: null,
      },
      walls: b.walls,
      observations: {
        uplift: b.uplift ?? [],
        residualDrift: (b.residual ?? []).map((r) => ({
          ...r,
          offsetM: r.method === 'offset' ? round2(r.ratio * 2.5 * 1000) / 1000 : null,
          overHeightM: r.method === 'offset' ? 2.5 : null,
          tiltRad: r.method === 'offset' ? null : Math.atan(r.ratio),
          uncertainty: r.method === 'phone-tilt' ? 0.001 : null,
        })),
        checklist: b.checklist ?? [],
        notes: b.notes,
      },
      hazard: b.hazard,
      measured:
        b.measuredHz === undefined
          ? null
          : { frequencyHz: b.measuredHz, dampingRatio: 0.04, confidence: 0.8, direction: null },
      photos: [],
      result: null,
      lastExportedAt: null,
      instrumentRecords: [],
      unconfirmed: [],
      unparsed: {},
    };
    const result = screen(record);
    record.result = {
      calcVersion: CALC_VERSION,
      computedAt: computed.toISOString(),
      result: JSON.parse(JSON.stringify(result)) as NonNullable<SurveyRecord['result']>['result'],
    };
    return record;
  });
}

/** Throws unless the town covers every system, damage state and posting level. */
export function checkCoverage(records: readonly SurveyRecord[]): void {
  const systems = new Set(records.map((r) => r.building.system));
  const states = new Set<string>();
  const postings = new Set<string>();
  for (const r of records) {
    const res = r.result?.result as
      { damageState?: string; posting?: { level?: string } } | undefined;
    if (res?.damageState) states.add(res.damageState);
    if (res?.posting?.level) postings.add(res.posting.level);
  }
  const missing = [
    ...(['light-frame', 'mass-timber-panel', 'rocking-wall', 'heavy-timber-frame'] as const).filter(
      (s) => !systems.has(s),
    ),
    ...DAMAGE_STATES.filter((s) => !states.has(s)),
    ...POSTING_LEVELS.filter((p) => !postings.has(p)),
  ];
  if (missing.length > 0) throw new Error(`the demo town does not cover: ${missing.join(', ')}`);
  if (records.length < 40 || records.length > 60) {
    throw new Error(`the demo town should hold 40–60 buildings, has ${records.length}`);
  }
}

/** The GeoJSON text of the demo town. */
export function demoTownGeoJson(records: readonly SurveyRecord[]): string {
  return geoJsonExport(records, {
    exportedAt: EXPORTED_AT,
    build: 'demo-town-generator',
  }).parts.join('');
}

function main(): void {
  const records = makeDemoTown();
  checkCoverage(records);
  const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
  const path = resolve(root, DEMO_TOWN_PATH);
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, demoTownGeoJson(records));
  console.log(`${records.length} buildings of ${TOWN} written to ${DEMO_TOWN_PATH}`);
}

if (
  process.argv[1] !== undefined &&
  import.meta.url === pathToFileURL(resolve(process.argv[1])).href
) {
  main();
}
