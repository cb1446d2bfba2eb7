import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  READABLE_VERSIONS,
  SCHEMA_VERSION,
  parseStoredRecord,
  surveyRecordV1Schema,
} from '../../forms/schema/index.js';
import v1 from '../fixtures/records/v1-two-storey-house.json' with { type: 'json' };
import v1Expected from '../fixtures/records/v1-two-storey-house.expected-v2.json' with { type: 'json' };
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

const FIXTURE_DIR = new URL('../fixtures/records/', import.meta.url);

/** Deep equality where numbers may differ in the last bits of a double (unit conversions). */
function expectClose(actual: unknown, expected: unknown, path = '$'): void {
  if (typeof expected === 'number' && typeof actual === 'number') {
    const tol = 1e-12 * Math.max(1, Math.abs(expected));
    if (Math.abs(actual - expected) > tol) throw new Error(`${path}: ${actual} ≠ ${expected}`);
    return;
  }
  if (typeof expected !== 'object' || expected === null) {
    expect(actual, path).toEqual(expected);
    return;
  }
  expect(typeof actual, path).toBe('object');
  const a = actual as Record<string, unknown>;
  const e = expected as Record<string, unknown>;
  expect(Object.keys(a).sort(), path).toEqual(Object.keys(e).sort());
  for (const k of Object.keys(e)) expectClose(a[k], e[k], `${path}.${k}`);
}

describe('migrations', () => {
  it('keeps a fixture of every schema version this build reads', () => {
    const files = readdirSync(FIXTURE_DIR).filter((f) =>
      /^v\d+-.*(?<!expected-v\d+)\.json$/.test(f),
    );
    const versions = new Set(
      files.map(
        (f) =>
          (JSON.parse(readFileSync(new URL(f, FIXTURE_DIR), 'utf8')) as { schemaVersion: number })
            .schemaVersion,
      ),
    );
    expect([...versions].sort()).toEqual([...READABLE_VERSIONS].sort());
    expect(READABLE_VERSIONS).toContain(SCHEMA_VERSION);
  });

  it('reads every fixture of every version into a current record', () => {
    const files = readdirSync(FIXTURE_DIR).filter((f) => f.endsWith('.json'));
    expect(files.length).toBeGreaterThanOrEqual(3);
    for (const file of files) {
      const raw: unknown = JSON.parse(readFileSync(new URL(file, FIXTURE_DIR), 'utf8'));
      const r = parseStoredRecord(raw);
      if (!r.ok) throw new Error(`${file}: ${JSON.stringify(r.messages)}`);
      expect(r.record.schemaVersion).toBe(SCHEMA_VERSION);
    }
  });

  it('the version 1 fixture is valid version 1 (so the migration test starts from real v1)', () => {
    expect(surveyRecordV1Schema.safeParse(v1).success).toBe(true);
  });

  it('lifts version 1 to version 2: mm to m, % to ratio, degrees to radians, flat lat/lon to a location', () => {
    const r = parseStoredRecord(structuredClone(v1));
    if (!r.ok) throw new Error(JSON.stringify(r.messages));
    expect(r.fromVersion).toBe(1);
    // Expected values worked by hand: 2700 mm = 2.7 m; 0.8 % = 0.008; 0.5° = π/360 rad
    // = 0.0087266462599716… rad; 3.5 mm = 0.0035 m.
    expectClose(r.record, v1Expected);
    expect(r.record.building.storeys[0]?.heightM).toBe(2.7);
    expect(r.record.observations.residualDrift[1]?.tiltRad).toBeCloseTo(Math.PI / 360, 15);
  });

  it('flags a version 1 location without a source as unconfirmed, not as the inspector’s choice', () => {
    const r = parseStoredRecord(structuredClone(v1));
    if (!r.ok) throw new Error('expected success');
    expect(r.record.location?.source).toBe('typed');
    expect(r.record.unconfirmed).toEqual(['location.source']);
  });

  it('keeps half a version 1 position as text instead of dropping it', () => {
    const half = { ...structuredClone(v1), lon: null };
    const r = parseStoredRecord(half);
    if (!r.ok) throw new Error(JSON.stringify(r.messages));
    expect(r.record.location).toBeNull();
    expect(r.record.unparsed).toEqual({ 'location.lat': '-41.2871', 'location.accuracyM': '8' });
  });

  it('reads the version 2 fixture unchanged', () => {
    const r = parseStoredRecord(structuredClone(v2));
    if (!r.ok) throw new Error(JSON.stringify(r.messages));
    expect(r.fromVersion).toBe(2);
    expect(r.record).toEqual(v2);
  });

  it('does not crash on a version 1 record that fails its own schema: it says where', () => {
    const bad = structuredClone(v1) as unknown as {
      building: { storeys: Array<{ heightMm: number }> };
    };
    (bad.building.storeys[0] as { heightMm: number }).heightMm = -5;
    const r = parseStoredRecord(bad);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reason).toBe('invalid');
    expect(r.failedAt).toBe(1);
    expect(r.messages.map((m) => m.path)).toEqual(['building.storeys.0.heightMm']);
  });

  it('refuses a record from a newer build as "newer-version", and a made-up version as unknown', () => {
    const newer = parseStoredRecord({ ...structuredClone(v2), schemaVersion: SCHEMA_VERSION + 1 });
    expect(newer.ok === false && newer.reason).toBe('newer-version');
    const unknown = parseStoredRecord({ ...structuredClone(v2), schemaVersion: 0 });
    expect(unknown.ok === false && unknown.reason).toBe('unknown-version');
    const none = parseStoredRecord({ ...structuredClone(v2), schemaVersion: '2' });
    expect(none.ok === false && none.reason).toBe('no-version');
  });

  it('does not crash on values that are not objects at all', () => {
    for (const raw of [null, undefined, 0, 'x', [], [v2], new Date(), new Map(), () => 1]) {
      const r = parseStoredRecord(raw);
      expect(r.ok).toBe(false);
    }
  });
});
