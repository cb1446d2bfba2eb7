/**
 * Turns one parsed item of an input file into a survey the calculation can screen, or into
 * the reasons it cannot. Three kinds of item are read, each checked with the app's own rules:
 *
 * - a GeoJSON Feature of a Grainline export: web/exchange's `readFeature` (the record's zod
 *   schema of any version, migrated; geometry agreeing with the location);
 * - a bare survey record (`schemaVersion` present): forms' `parseStoredRecord`;
 * - a bare calculation input (`building`, `walls`, `observations`, `hazard`, `measured`):
 *   the same zod schemas the record uses for those parts.
 */
import type { SurveyInput } from '../calc/index.js';
import {
  buildingSchema,
  fieldMessages,
  measuredFrequencySchema,
  observationsSchema,
  parseStoredRecord,
  spectrumSpecSchema,
  wallSchema,
  type FieldMessage,
} from '../forms/schema/index.js';
import { z } from '../forms/schema/zod-config.js';
import { readFeature } from '../web/exchange/geojson-import.js';

/** What kind of item was read. */
export type SurveySource = 'feature' | 'record' | 'input';

export type ReadItem =
  | {
      ok: true;
      index: number;
      source: SurveySource;
      id: string | null;
      address: string | null;
      survey: SurveyInput;
    }
  | { ok: false; index: number; id: string | null; address: string | null; reasons: string[] };

/** A bare calculation input: the SurveyInput parts of a record, nothing else. */
export const surveyInputSchema = z.strictObject({
  building: buildingSchema,
  walls: z.array(wallSchema),
  observations: observationsSchema,
  hazard: spectrumSpecSchema.nullable(),
  measured: measuredFrequencySchema.nullable(),
});

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function own(obj: Record<string, unknown>, key: string): unknown {
  return Object.prototype.hasOwnProperty.call(obj, key) ? obj[key] : undefined;
}

function text(v: unknown, max = 200): string | null {
  return typeof v === 'string' && v.length > 0 ? v.slice(0, max) : null;
}

function describe(messages: readonly FieldMessage[]): string[] {
  const out = messages.map((m) => (m.path === '' ? m.message : `${m.path}: ${m.message}`));
  return out.length > 0 ? out : ['the survey is not valid'];
}

/** Reads one parsed item; never throws. */
export function readSurveyItem(value: unknown, index: number): ReadItem {
  if (!isObject(value)) {
    return {
      ok: false,
      index,
      id: null,
      address: null,
      reasons: [
        `item ${index} is ${Array.isArray(value) ? 'a list' : value === null ? 'null' : `a ${typeof value}`}, not a GeoJSON Feature, a survey record or a survey`,
      ],
    };
  }
  if (own(value, 'type') === 'Feature') {
    const r = readFeature(value, index);
    if ('record' in r) {
      return {
        ok: true,
        index,
        source: 'feature',
        id: r.record.id,
        address: text(r.record.address),
        survey: r.record,
      };
    }
    return { ok: false, index, id: r.surveyId, address: r.address, reasons: r.reasons };
  }
  if (own(value, 'schemaVersion') !== undefined) {
    const parsed = parseStoredRecord(value);
    if (parsed.ok) {
      return {
        ok: true,
        index,
        source: 'record',
        id: parsed.record.id,
        address: text(parsed.record.address),
        survey: parsed.record,
      };
    }
    const reasons =
      parsed.reason === 'newer-version'
        ? [`the record was written by a newer version (schema ${parsed.version ?? '?'})`]
        : describe(parsed.messages);
    return {
      ok: false,
      index,
      id: text(own(value, 'id'), 100),
      address: text(own(value, 'address')),
      reasons,
    };
  }
  if (own(value, 'building') !== undefined) {
    const parsed = surveyInputSchema.safeParse(value);
    if (parsed.success) {
      return { ok: true, index, source: 'input', id: null, address: null, survey: parsed.data };
    }
    return {
      ok: false,
      index,
      id: null,
      address: null,
      reasons: describe(fieldMessages(parsed.error.issues)),
    };
  }
  const type = own(value, 'type');
  return {
    ok: false,
    index,
    id: text(own(value, 'id'), 100),
    address: null,
    reasons: [
      typeof type === 'string'
        ? `item ${index} is a GeoJSON "${type.slice(0, 40)}", not a Feature of a Grainline export`
        : `item ${index} is not a GeoJSON Feature, a survey record or a survey (no "type", "schemaVersion" or "building")`,
    ],
  };
}
