// The demo town (scripts/demo-town.ts → test/fixtures/demo/demo-town.geojson): the committed
// file is what the seeded generator and screen() give today, it is valid GeoJSON for
// @placemarkio/check-geojson (a general-purpose validator from the registry), the app's
// importer accepts every feature, it covers every outcome, and the verdict of every building
// is kept in a reviewed snapshot (test/fixtures/demo/demo-town.verdicts.txt).
import { readFileSync } from 'node:fs';
import { getIssues } from '@placemarkio/check-geojson';
import { describe, expect, it } from 'vitest';
import { DAMAGE_STATES, POSTING_LEVELS, type ScreeningResult } from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/schema/index.js';
import { readExchangeText } from '../../web/exchange/geojson-import.js';
import {
  DEMO_TOWN_PATH,
  checkCoverage,
  demoTownGeoJson,
  makeDemoTown,
} from '../../scripts/demo-town.js';

const committed = readFileSync(new URL(`../../${DEMO_TOWN_PATH}`, import.meta.url), 'utf8');
const records = makeDemoTown();
const resultOf = (r: SurveyRecord) => r.result?.result as unknown as ScreeningResult;

function hazardText(r: SurveyRecord): string {
  const h = r.hazard;
  if (h === null) return 'no hazard entered';
  if (h.kind === 'event') return `event PGA ${h.pga} g, Sa(0.3) ${h.sa03} g, Sa(1.0) ${h.sa10} g`;
  if (h.kind === 'asce7') return `ASCE 7 SDS ${h.SDS} g, SD1 ${h.SD1} g`;
  return `EN 1998-1 type ${h.type} ground ${h.ground} ag ${h.ag} g`;
}

function verdictText(list: readonly SurveyRecord[]): string {
  return list
    .map((r, i) => {
      const v = resultOf(r);
      const cls = v.fragilityClass;
      const lines = [
        `#${i}  ${r.address}`,
        `    ${r.building.system}, ${r.building.storeys.length} ${r.building.storeys.length === 1 ? 'storey' : 'storeys'}, Hazus ${cls.type} ${cls.level === 'pre-code' ? 'pre-code' : `${cls.level} code`}; ${hazardText(r)}`,
        `    Notes: ${r.observations.notes || '—'}`,
        `    Damage ${v.damage.word} (predicted ${v.damage.predicted ?? 'n/a'}, observed ${v.damage.observed}) · Posting ${v.posting.symbol} ${v.posting.word} · ${v.flags.length > 0 ? `detailed assessment: ${v.flags.map((f) => f.id).join(', ')}` : 'no flags'} · confidence ${v.confidence.level}`,
        ...v.reasons.map((x) => `    - ${x}`),
      ];
      return lines.join('\n');
    })
    .join('\n\n');
}

describe('demo town', () => {
  it('is the committed file, exactly (run `npm run demo` after changing the rules)', () => {
    expect(demoTownGeoJson(records) === committed).toBe(true);
  });

  it('holds results computed by screen() of this calculation version for every building', () => {
    for (const r of records) {
      expect(r.result?.calcVersion).toBe(resultOf(r).calcVersion);
      expect(resultOf(r).resultVersion).toBe(1);
    }
  });

  it('passes @placemarkio/check-geojson', () => {
    expect(getIssues(committed)).toEqual([]);
  });

  it('is accepted feature by feature by the app importer (web/exchange)', () => {
    const parsed = readExchangeText(committed);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) {
      expect(parsed.rejected).toEqual([]);
      expect(parsed.accepted).toHaveLength(records.length);
    }
  });

  it('covers 40–60 buildings, every structural system, damage state and posting level', () => {
    expect(() => checkCoverage(records)).not.toThrow();
    const states = new Set(records.map((r) => resultOf(r).damageState));
    const postings = new Set(records.map((r) => resultOf(r).posting.level));
    expect([...DAMAGE_STATES].every((s) => states.has(s))).toBe(true);
    expect([...POSTING_LEVELS].every((p) => postings.has(p))).toBe(true);
  });

  it('includes rocking CLT walls, a soft-storey house over parking and a cripple-wall house', () => {
    expect(records.some((r) => r.walls.some((w) => w.type === 'rocking'))).toBe(true);
    const soft = records.filter((r) => /Parking under/.test(r.observations.notes));
    expect(soft.some((r) => resultOf(r).flags.some((f) => f.id === 'soft-or-weak-storey'))).toBe(
      true,
    );
    const cripple = records.filter((r) =>
      r.walls.some((w) => w.type === 'unsheathed' && w.storey === 0),
    );
    expect(cripple.some((r) => resultOf(r).flags.some((f) => f.id === 'no-racking-strength'))).toBe(
      true,
    );
  });

  it('gives every building readable reasons: sentences, no "NaN", "undefined" or "[object"', () => {
    for (const r of records) {
      const v = resultOf(r);
      expect(v.reasons.length).toBeGreaterThan(1);
      for (const text of [
        ...v.reasons,
        ...v.evidence.predicted.map((e) => e.text),
        ...v.evidence.observed.map((e) => e.text),
      ]) {
        expect(text).not.toMatch(/NaN|undefined|\[object|not known/);
      }
    }
  });

  it('keeps the verdict of every building as reviewed (snapshot)', async () => {
    await expect(verdictText(records) + '\n').toMatchFileSnapshot(
      '../fixtures/demo/demo-town.verdicts.txt',
    );
  });
});
