/**
 * The stored record and the calculation's input cannot drift apart. The type assertions
 * below are checked by `npx tsc -p test`: if the schema stops producing something
 * assignable to `SurveyInput`, or an enum gains or loses a member on either side, this file
 * stops compiling. The runtime part checks a parsed fixture carries every calc field.
 */
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import type {
  ChecklistItem,
  CodeLevel,
  DriftMethod,
  FloorConstruction,
  Occupancy,
  RoofConstruction,
  Severity,
  StructuralSystem,
  SupplementalDevice,
  SurveyInput,
  WallType,
} from '../../calc/survey/index.js';
import type { Ec8Ground, SpectrumSpec } from '../../calc/spectra/index.js';
import {
  checklistItemSchema,
  codeLevelSchema,
  driftMethodSchema,
  ec8GroundSchema,
  floorConstructionSchema,
  occupancySchema,
  parseStoredRecord,
  roofConstructionSchema,
  severitySchema,
  spectrumSpecSchema,
  structuralSystemSchema,
  supplementalDeviceSchema,
  surveyRecordSchema,
  wallTypeSchema,
  type SurveyRecord,
} from '../../forms/schema/index.js';
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

/** `true` only when `From` can be passed where `To` is expected. */
type Assignable<From, To> = [From] extends [To] ? true : false;
/** `true` only when A and B are the same type. */
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

// The contract: a stored record can be handed to the calculation as it is.
const recordIsSurveyInput: Assignable<z.infer<typeof surveyRecordSchema>, SurveyInput> = true;
const namedTypeIsInferred: Same<SurveyRecord, z.infer<typeof surveyRecordSchema>> = true;
const hazardMatches: Same<z.infer<typeof spectrumSpecSchema>, SpectrumSpec> = true;

// Each choice list is exactly the calc union: no member more, none less.
const enumsMatch: [
  Same<z.infer<typeof structuralSystemSchema>, StructuralSystem>,
  Same<z.infer<typeof codeLevelSchema>, CodeLevel>,
  Same<z.infer<typeof occupancySchema>, Occupancy>,
  Same<z.infer<typeof floorConstructionSchema>, FloorConstruction>,
  Same<z.infer<typeof roofConstructionSchema>, RoofConstruction>,
  Same<z.infer<typeof wallTypeSchema>, WallType>,
  Same<z.infer<typeof supplementalDeviceSchema>, SupplementalDevice>,
  Same<z.infer<typeof driftMethodSchema>, DriftMethod>,
  Same<z.infer<typeof checklistItemSchema>, ChecklistItem>,
  Same<z.infer<typeof severitySchema>, Severity>,
  Same<z.infer<typeof ec8GroundSchema>, Ec8Ground>,
] = [true, true, true, true, true, true, true, true, true, true, true];

/** Every key of SurveyInput, listed so the runtime check below covers all of them. */
const SURVEY_INPUT_KEYS = ['building', 'walls', 'observations', 'hazard', 'measured'] as const;
const keysAreComplete: Same<(typeof SURVEY_INPUT_KEYS)[number], keyof SurveyInput> = true;

describe('record ↔ calculation contract', () => {
  it('compiles the type assertions (checked by tsc -p test)', () => {
    expect([recordIsSurveyInput, namedTypeIsInferred, hazardMatches, keysAreComplete]).toEqual([
      true,
      true,
      true,
      true,
    ]);
    expect(enumsMatch.every(Boolean)).toBe(true);
  });

  it('hands every SurveyInput field of a parsed record to a function typed for SurveyInput', () => {
    const parsed = parseStoredRecord(v2);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.messages));
    const asInput = (input: SurveyInput) => SURVEY_INPUT_KEYS.map((k) => input[k]);
    const values = asInput(parsed.record);
    expect(values.every((v) => v !== undefined)).toBe(true);
    expect(values[0]).toEqual(v2.building);
  });
});
