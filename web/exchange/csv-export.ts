/**
 * Survey records → a CSV summary for spreadsheets (RFC 4180): a header line, one line per
 * survey, CRLF line ends, every field that holds a comma, a double quote, CR or LF enclosed
 * in double quotes, with inner quotes doubled (RFC 4180 §2).
 *
 * It is a summary, not an exchange format: the GeoJSON carries the full record. Each row
 * repeats a short caution, so a row copied elsewhere keeps it.
 *
 * Spreadsheet safety: a text cell that starts with `=`, `+`, `-`, `@`, TAB or CR would be run
 * as a formula by spreadsheet programs (the "CSV injection" problem described by OWASP). Such
 * cells are written with a leading apostrophe, which spreadsheets show as plain text. This is
 * the only change made to any value, it applies to free text only (never to numbers), and the
 * GeoJSON keeps the text exactly.
 */
import type { SurveyRecord } from '../../forms/index.js';
import { shortCaution } from './export-cautions.js';
import { CSV_MEDIA_TYPE, fileStamp } from './export-format.js';
import { readVerdict, type SurveyVerdict } from './survey-verdict.js';

type Cell = string | number | boolean | null;
type Row = (r: SurveyRecord, caution: string, v: SurveyVerdict) => Cell;

/** The columns, in order: header name and how to read it from a record. */
const COLUMNS: ReadonlyArray<readonly [string, Row]> = [
  ['survey_id', (r) => r.id],
  ['revision', (r) => r.revision],
  ['address', (r) => text(r.address)],
  ['latitude', (r) => r.location?.lat ?? null],
  ['longitude', (r) => r.location?.lon ?? null],
  ['location_accuracy_m', (r) => r.location?.accuracyM ?? null],
  ['location_source', (r) => r.location?.source ?? null],
  ['inspector', (r) => text(r.inspector)],
  ['team', (r) => text(r.team)],
  ['inspection_kind', (r) => r.inspectionKind],
  ['surveyed_at', (r) => r.createdAt],
  ['updated_at', (r) => r.updatedAt],
  ['structural_system', (r) => r.building.system],
  ['code_level', (r) => r.building.codeLevel],
  ['occupancy', (r) => r.building.occupancy],
  ['storeys', (r) => r.building.storeys.length],
  ['walls', (r) => r.walls.length],
  ['posting', (_r, _c, v) => v.posting],
  ['damage_state', (_r, _c, v) => v.damageState],
  ['needs_assessment', (_r, _c, v) => v.needsAssessment],
  ['calc_version', (r) => r.result?.calcVersion ?? null],
  ['computed_at', (r) => r.result?.computedAt ?? null],
  ['schema_version', (r) => r.schemaVersion],
  ['photos', (r) => r.photos.length],
  ['notes', (r) => text(r.observations.notes)],
  ['caution', (_r, caution) => caution],
];

/** The header names, in column order. */
export const CSV_COLUMNS: readonly string[] = COLUMNS.map(([name]) => name);

/** Marks free text so it is never taken for a spreadsheet formula (see the file header). */
export function spreadsheetSafeText(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

function text(value: string): string {
  return spreadsheetSafeText(value);
}

/** One field, quoted when RFC 4180 requires it. */
export function csvField(value: Cell): string {
  if (value === null) return '';
  const s = typeof value === 'string' ? value : String(value);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** The CSV text in parts (header, then one part per survey). */
export function csvParts(records: readonly SurveyRecord[]): string[] {
  const caution = shortCaution();
  const parts: string[] = [CSV_COLUMNS.map(csvField).join(',') + '\r\n'];
  for (const record of records) {
    const verdict = readVerdict(record);
    let line = '';
    for (let c = 0; c < COLUMNS.length; c++) {
      const column = COLUMNS[c] as (typeof COLUMNS)[number];
      if (c > 0) line += ',';
      line += csvField(column[1](record, caution, verdict));
    }
    parts.push(line + '\r\n');
  }
  return parts;
}

/** The CSV summary as a File. */
export function csvFile(records: readonly SurveyRecord[], exportedAt: Date): File {
  return new File(csvParts(records), `grainline-summary-${fileStamp(exportedAt)}.csv`, {
    type: `${CSV_MEDIA_TYPE};charset=utf-8`,
  });
}
