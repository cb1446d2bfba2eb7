/**
 * CSV summary: RFC 4180 checked by parsing it back with a general-purpose parser from the
 * registry (papaparse), field by field.
 */
import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { SurveyRecord } from '../../forms/index.js';
import {
  CSV_COLUMNS,
  csvField,
  csvParts,
  spreadsheetSafeText,
} from '../../web/exchange/csv-export.js';
import { readVerdict } from '../../web/exchange/survey-verdict.js';
import { en } from '../../web/i18n/index.js';
import { surveyRecordArb } from '../fixtures/records/arbitrary.js';
import { makeTown } from '../fixtures/exchange/town.js';

function parse(records: SurveyRecord[]) {
  const text = csvParts(records).join('');
  const out = Papa.parse<Record<string, string>>(text, {
    header: true,
    // RFC 4180 §2.2: the last line may end with CRLF; papaparse reads that as an empty row.
    skipEmptyLines: true,
  });
  return { text, out };
}

/** What a cell should read as, per the export's rules. */
function expectedRow(r: SurveyRecord): Record<string, string> {
  const v = readVerdict(r);
  const s = (x: string | number | boolean | null | undefined) =>
    x === null || x === undefined ? '' : String(x);
  return {
    survey_id: r.id,
    revision: s(r.revision),
    address: spreadsheetSafeText(r.address),
    latitude: s(r.location?.lat),
    longitude: s(r.location?.lon),
    location_accuracy_m: s(r.location?.accuracyM),
    location_source: s(r.location?.source),
    inspector: spreadsheetSafeText(r.inspector),
    team: spreadsheetSafeText(r.team),
    inspection_kind: r.inspectionKind,
    surveyed_at: r.createdAt,
    updated_at: r.updatedAt,
    structural_system: r.building.system,
    code_level: r.building.codeLevel,
    occupancy: r.building.occupancy,
    storeys: s(r.building.storeys.length),
    walls: s(r.walls.length),
    posting: s(v.posting),
    damage_state: s(v.damageState),
    needs_assessment: s(v.needsAssessment),
    calc_version: s(r.result?.calcVersion),
    computed_at: s(r.result?.computedAt),
    schema_version: s(r.schemaVersion),
    photos: s(r.photos.length),
    notes: spreadsheetSafeText(r.observations.notes),
    caution: en['exchange.caution.short'],
  };
}

describe('CSV summary', () => {
  it('parses back with papaparse to one row per survey with every value', () => {
    const records = makeTown(120, { seed: 21, withoutLocation: 0.1 });
    const { out } = parse(records);
    expect(out.errors).toEqual([]);
    expect(out.meta.fields).toEqual([...CSV_COLUMNS]);
    expect(out.data).toHaveLength(records.length);
    out.data.forEach((row, i) => expect(row).toEqual(expectedRow(records[i]!)));
  });

  it('parses back with papaparse for any valid records, whatever their text (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(surveyRecordArb, { maxLength: 6 }), (records) => {
        const { out } = parse(records);
        expect(out.errors).toEqual([]);
        expect(out.data).toHaveLength(records.length);
        out.data.forEach((row, i) => expect(row).toEqual(expectedRow(records[i]!)));
      }),
      { numRuns: 80 },
    );
  });

  it('ends every line with CRLF and quotes fields with commas, quotes or line breaks (RFC 4180 §2)', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('cr\rhere')).toBe('"cr\rhere"');
    expect(csvField(null)).toBe('');
    expect(csvField(-0.25)).toBe('-0.25');
    const { text } = parse(makeTown(3, { seed: 1 }));
    expect(text.split('\r\n')).toHaveLength(5); // header, 3 rows, '' after the last CRLF
    expect(text.replace(/\r\n/g, '')).not.toMatch(/(?<!")\n/);
  });

  it('writes a header line naming each column once', () => {
    const { text } = parse([]);
    expect(text).toBe(CSV_COLUMNS.join(',') + '\r\n');
    expect(new Set(CSV_COLUMNS).size).toBe(CSV_COLUMNS.length);
  });

  it('keeps spreadsheet formulas in imported text from running, and says so only by an apostrophe', () => {
    const [r] = makeTown(1, { seed: 2 }) as [SurveyRecord];
    const hostile = {
      ...r,
      address: '=HYPERLINK("http://example.invalid","click")',
      inspector: '+1+2',
      team: '@SUM(A1)',
      observations: { ...r.observations, notes: '-2+3' },
    };
    const { out } = parse([hostile]);
    const row = out.data[0]!;
    expect(row['address']).toBe(`'=HYPERLINK("http://example.invalid","click")`);
    expect(row['inspector']).toBe(`'+1+2`);
    expect(row['team']).toBe(`'@SUM(A1)`);
    expect(row['notes']).toBe(`'-2+3`);
    // Numbers are never marked: a negative longitude stays a number.
    expect(spreadsheetSafeText('plain text')).toBe('plain text');
  });

  it('carries the short caution on every row', () => {
    const { out } = parse(makeTown(10, { seed: 8 }));
    for (const row of out.data) expect(row['caution']).toMatch(/licensed engineer/);
  });
});
