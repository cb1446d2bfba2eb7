/**
 * Reading exchange files: every Feature validated on its own (the forms/ zod schemas), bad
 * ones listed with reasons, good ones accepted, records of earlier schema versions migrated.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseStoredRecord, type SurveyRecord } from '../../forms/index.js';
import { geoJsonExport } from '../../web/exchange/geojson-export.js';
import {
  readExchangeText,
  readExchangeValue,
  readFeature,
} from '../../web/exchange/geojson-import.js';
import v1Record from '../fixtures/records/v1-two-storey-house.json' with { type: 'json' };
import { garbageArb, surveyRecordArb } from '../fixtures/records/arbitrary.js';
import { makeTown } from '../fixtures/exchange/town.js';

const MIXED = readFileSync(
  new URL('../fixtures/exchange/mixed-versions.geojson', import.meta.url),
  'utf8',
);
const context = { exportedAt: new Date('2031-05-14T18:00:00.000Z'), build: 'test' };
const exportOf = (records: SurveyRecord[]) => geoJsonExport(records, context).parts.join('');

describe('reading an exchange file', () => {
  it('accepts a file of an earlier schema version and migrates its records', () => {
    const parsed = readExchangeText(MIXED);
    if (!parsed.ok) throw new Error(parsed.reason);
    const ids = parsed.accepted.map((a) => a.record.id);
    expect(ids).toEqual([v1Record.id, '8a1e5c3d-7b29-4f60-a4d8-51c0e9f2b7a3']);
    const first = parsed.accepted[0]!;
    expect(first.fromVersion).toBe(1);
    // The same migration storage applies on read (forms/schema/migrate.ts).
    const direct = parseStoredRecord(v1Record);
    if (!direct.ok) throw new Error('fixture must parse');
    expect(first.record).toEqual(direct.record);
    expect(first.record.schemaVersion).toBe(2);
  });

  it('lists each bad feature with its reasons, and keeps the good ones', () => {
    const parsed = readExchangeText(MIXED);
    if (!parsed.ok) throw new Error(parsed.reason);
    expect(parsed.rejected.map((r) => r.index)).toEqual([2, 3, 4, 5]);
    const [badField, moved, newer, foreign] = parsed.rejected;
    expect(badField?.surveyId).toBe('5b0d8e21-3c44-4a9f-8e6b-0f1d2c3b4a59');
    expect(badField?.reasons.join(' ')).toMatch(/building\.storeys\.0\.heightM/);
    expect(badField?.reasons.join(' ')).toMatch(/ m\b/); // names the unit
    expect(moved?.reasons.join(' ')).toMatch(/not where its survey record says/);
    expect(newer?.reasons.join(' ')).toMatch(/newer version of Grainline \(record schema 99\)/);
    expect(foreign?.reasons).toEqual([
      'It carries no Grainline survey record (properties.record).',
    ]);
    expect(foreign?.surveyId).toBeNull();
  });

  it('reads back exactly what was exported', () => {
    const records = makeTown(60, { seed: 3, withoutLocation: 0.2 });
    const parsed = readExchangeText(exportOf(records));
    if (!parsed.ok) throw new Error(parsed.reason);
    expect(parsed.rejected).toEqual([]);
    expect(parsed.accepted.map((a) => a.record)).toEqual(records);
  });

  it('accepts a record saved as JSON text by a GIS tool that flattened nested values', () => {
    const [record] = makeTown(1, { seed: 4 }) as [SurveyRecord];
    const doc = JSON.parse(exportOf([record])) as {
      features: Array<{ properties: Record<string, unknown> }>;
    };
    doc.features[0]!.properties['record'] = JSON.stringify(record);
    const parsed = readExchangeValue(doc);
    if (!parsed.ok) throw new Error(parsed.reason);
    expect(parsed.accepted[0]?.record).toEqual(record);
  });

  it('accepts a point rounded in its last digits by a GIS tool, but not a moved one', () => {
    const [record] = makeTown(1, { seed: 5 }) as [SurveyRecord];
    const loc = record.location!;
    const make = (lon: number, lat: number) => ({
      type: 'Feature',
      geometry: { type: 'Point', coordinates: [lon, lat] },
      properties: { record },
    });
    expect('record' in readFeature(make(loc.lon + 4e-8, loc.lat - 4e-8), 0)).toBe(true);
    expect('record' in readFeature(make(loc.lon + 1e-4, loc.lat), 0)).toBe(false);
    // Latitude and longitude swapped is a moved point too.
    expect('record' in readFeature(make(loc.lat, loc.lon), 0)).toBe(false);
  });

  it('refuses a null geometry for a survey that has a location, and a point for one that has none', () => {
    const [located] = makeTown(1, { seed: 6 }) as [SurveyRecord];
    const unlocated = { ...located, location: null };
    const r1 = readFeature({ type: 'Feature', geometry: null, properties: { record: located } }, 0);
    const r2 = readFeature(
      {
        type: 'Feature',
        geometry: { type: 'Point', coordinates: [1, 2] },
        properties: { record: unlocated },
      },
      0,
    );
    expect('reasons' in r1 && r1.reasons[0]).toMatch(/no point/);
    expect('reasons' in r2 && r2.reasons[0]).toMatch(/no location/);
    const ok = readFeature(
      { type: 'Feature', geometry: null, properties: { record: unlocated } },
      0,
    );
    expect('record' in ok).toBe(true);
  });

  it('says why a whole file cannot be read', () => {
    const reason = (text: string) => {
      const r = readExchangeText(text);
      return r.ok ? 'ok' : r.reason;
    };
    expect(reason('not json {')).toMatch(/not JSON/);
    expect(reason('[1,2]')).toMatch(/not a GeoJSON FeatureCollection/);
    expect(reason('{"type":"FeatureCollection"}')).toMatch(/no list of features/);
    expect(
      reason('{"type":"FeatureCollection","grainline":{"format":"something-else"},"features":[]}'),
    ).toMatch(/not written by Grainline/);
    expect(
      reason(
        '{"type":"FeatureCollection","grainline":{"format":"grainline-surveys","formatVersion":7},"features":[]}',
      ),
    ).toMatch(/newer version of Grainline \(file format 7\)/);
    expect(reason('{"type":"FeatureCollection","features":[]}')).toBe('ok');
  });

  it('does not crash on garbage features, and rejects every one (fast-check)', () => {
    fc.assert(
      fc.property(garbageArb, (junk) => {
        const r = readFeature(junk, 0);
        expect('reasons' in r).toBe(true);
        const wrapped = readFeature(
          { type: 'Feature', geometry: null, properties: { record: junk } },
          1,
        );
        expect('reasons' in wrapped).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('does not crash on a record nested deep enough to exhaust a recursive parser', () => {
    let deep: unknown = 1;
    for (let i = 0; i < 20_000; i++) deep = [deep];
    const [record] = makeTown(1, { seed: 1 }) as [SurveyRecord];
    const hostile = { ...record, result: { ...record.result!, result: deep } };
    const r = readFeature({ type: 'Feature', geometry: null, properties: { record: hostile } }, 0);
    expect('reasons' in r).toBe(true);
  });

  it('accepts every valid record, whatever its text (fast-check)', () => {
    fc.assert(
      fc.property(surveyRecordArb, (record) => {
        const loc = record.location;
        const geometry = loc ? { type: 'Point', coordinates: [loc.lon, loc.lat] } : null;
        const r = readFeature({ type: 'Feature', geometry, properties: { record } }, 0);
        expect('record' in r && r.record).toEqual(record);
      }),
      { numRuns: 150 },
    );
  });
});
