/**
 * GeoJSON export: RFC 7946 structure checked by an independent validator from the registry
 * (@placemarkio/check-geojson), plus the points of the RFC the validator does not check
 * (lon/lat order, no `crs`, null geometry for surveys without location).
 */
import { getIssues } from '@placemarkio/check-geojson';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CALC_VERSION } from '../../calc/index.js';
import { SCHEMA_VERSION, type SurveyRecord } from '../../forms/index.js';
import { geoJsonExport, surveyFeature } from '../../web/exchange/geojson-export.js';
import { EXPORT_FORMAT, EXPORT_FORMAT_VERSION } from '../../web/exchange/export-format.js';
import { en } from '../../web/i18n/index.js';
import { surveyRecordArb } from '../fixtures/records/arbitrary.js';
import { makeTown } from '../fixtures/exchange/town.js';

const context = { exportedAt: new Date('2031-05-14T18:00:00.000Z'), build: 'test-build' };

function exportText(records: SurveyRecord[]): string {
  return geoJsonExport(records, context).parts.join('');
}

interface ParsedCollection {
  type: string;
  bbox?: number[];
  crs?: unknown;
  grainline: {
    format: string;
    formatVersion: number;
    schemaVersion: number;
    calcVersion: string;
    caution: string;
    count: number;
    withoutLocation: string[];
  };
  features: Array<{
    type: string;
    id: string;
    geometry: { type: string; coordinates: number[] } | null;
    properties: Record<string, unknown> & { record: SurveyRecord };
  }>;
}

describe('GeoJSON export', () => {
  it('passes @placemarkio/check-geojson for a town of 300 surveys, some without location', () => {
    const text = exportText(makeTown(300, { seed: 7, withoutLocation: 0.1 }));
    expect(getIssues(text)).toEqual([]);
  });

  it('passes @placemarkio/check-geojson for any valid records (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(surveyRecordArb, { maxLength: 5 }), (records) => {
        expect(getIssues(exportText(records))).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });

  it('is checked by a validator that does reject a broken export (the check can fail)', () => {
    const doc = JSON.parse(exportText(makeTown(3, { seed: 7 }))) as ParsedCollection;
    const broken = doc.features[1] as unknown as Record<string, unknown>;
    delete broken['properties'];
    expect(getIssues(JSON.stringify(doc)).length).toBeGreaterThan(0);
  });

  it('passes @placemarkio/check-geojson when there are no surveys at all', () => {
    const text = exportText([]);
    expect(getIssues(text)).toEqual([]);
    expect((JSON.parse(text) as ParsedCollection).features).toEqual([]);
  });

  it('writes longitude before latitude, in WGS84 degrees, with no crs member (RFC 7946 §3.1.1, §4)', () => {
    const records = makeTown(50, { seed: 3 });
    const doc = JSON.parse(exportText(records)) as ParsedCollection;
    expect(doc.crs).toBeUndefined();
    expect(doc.type).toBe('FeatureCollection');
    doc.features.forEach((f, i) => {
      const loc = records[i]?.location;
      expect(loc).toBeTruthy();
      expect(f.geometry).toEqual({ type: 'Point', coordinates: [loc?.lon, loc?.lat] });
      // The invented town lies at about 44.5° N, 11.3° E: longitude first means ~11 first.
      expect(f.geometry?.coordinates[0]).toBeCloseTo(11.35, 1);
      expect(f.geometry?.coordinates[1]).toBeCloseTo(44.51, 1);
    });
  });

  it('writes a bbox of west, south, east, north that holds every point (RFC 7946 §5)', () => {
    const records = makeTown(80, { seed: 11 });
    const doc = JSON.parse(exportText(records)) as ParsedCollection;
    const [w, s, e, n] = doc.bbox as [number, number, number, number];
    for (const r of records) {
      expect(r.location!.lon).toBeGreaterThanOrEqual(w);
      expect(r.location!.lon).toBeLessThanOrEqual(e);
      expect(r.location!.lat).toBeGreaterThanOrEqual(s);
      expect(r.location!.lat).toBeLessThanOrEqual(n);
    }
    expect(w).toBe(Math.min(...records.map((r) => r.location!.lon)));
    expect(n).toBe(Math.max(...records.map((r) => r.location!.lat)));
  });

  it('exports a survey without location as a Feature with null geometry and lists it', () => {
    const records = makeTown(40, { seed: 5, withoutLocation: 0.3 });
    const missing = records.filter((r) => r.location === null);
    expect(missing.length).toBeGreaterThan(3);
    const doc = JSON.parse(exportText(records)) as ParsedCollection;
    expect(doc.features).toHaveLength(records.length);
    expect(doc.grainline.withoutLocation).toEqual(missing.map((r) => r.id));
    for (const r of missing) {
      const f = doc.features.find((x) => x.id === r.id);
      expect(f?.geometry).toBeNull();
      expect(f?.properties.record.location).toBeNull();
    }
  });

  it('has no bbox when no survey has a location', () => {
    const doc = JSON.parse(
      exportText(makeTown(5, { seed: 2, withoutLocation: 1 })),
    ) as ParsedCollection;
    expect(doc.bbox).toBeUndefined();
    expect(doc.features.every((f) => f.geometry === null)).toBe(true);
  });

  it('carries every input, the result, both versions, the revision and the inspector', () => {
    const [record] = makeTown(1, { seed: 9 }) as [SurveyRecord];
    const doc = JSON.parse(exportText([record])) as ParsedCollection;
    const f = doc.features[0]!;
    expect(f.properties.record).toEqual(record);
    expect(f.properties.revision).toBe(record.revision);
    expect(f.properties.inspector).toBe(record.inspector);
    expect(f.properties.schemaVersion).toBe(SCHEMA_VERSION);
    expect(f.properties.calcVersion).toBe(record.result?.calcVersion);
    expect(doc.grainline).toMatchObject({
      format: EXPORT_FORMAT,
      formatVersion: EXPORT_FORMAT_VERSION,
      schemaVersion: SCHEMA_VERSION,
      calcVersion: CALC_VERSION,
      count: 1,
    });
  });

  it('carries the caution on the collection and on every feature', () => {
    const doc = JSON.parse(exportText(makeTown(10, { seed: 4 }))) as ParsedCollection;
    expect(doc.grainline.caution).toBe(en['caution.body']);
    expect(doc.grainline.caution).toMatch(/licensed engineer/);
    for (const f of doc.features) expect(f.properties.caution).toBe(en['exchange.caution.short']);
  });

  it('summarises the posting, damage state and assessment flag beside the record', () => {
    const [record] = makeTown(1, { seed: 12, unscreened: 0 }) as [SurveyRecord];
    const result = record.result?.result as Record<string, unknown>;
    const f = surveyFeature(record);
    expect(f.properties.posting).toBe(result['posting']);
    expect(f.properties.damageState).toBe(result['damageState']);
    expect(f.properties.needsAssessment).toBe(result['needsAssessment']);
  });

  it('keeps a record key named "__proto__" in its free-form result', () => {
    const [record] = makeTown(1, { seed: 1, unscreened: 0 }) as [SurveyRecord];
    const withProto = {
      ...record,
      result: {
        ...record.result!,
        result: JSON.parse('{"__proto__":{"polluted":1},"posting":"open"}') as never,
      },
    };
    const text = exportText([withProto]);
    expect(text).toContain('"__proto__":{"polluted":1}');
    expect(({} as Record<string, unknown>)['polluted']).toBeUndefined();
  });
});
