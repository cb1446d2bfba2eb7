/**
 * The closed lists of choices a survey uses, as zod enums. The calculation's types
 * (calc/survey/survey-input.ts) are the authority; test/unit/schema-contract.test.ts checks
 * at compile time that each list here is exactly the calc union, neither more nor less.
 */
import { z } from './zod-config.js';

export const directionSchema = z.enum(['x', 'y']);

export const structuralSystemSchema = z.enum([
  'light-frame',
  'mass-timber-panel',
  'rocking-wall',
  'heavy-timber-frame',
]);

export const codeLevelSchema = z.enum(['pre-code', 'low', 'moderate', 'high', 'unknown']);

export const occupancySchema = z.enum([
  'single-family',
  'multi-family',
  'commercial',
  'industrial',
  'public-assembly',
  'essential-facility',
]);

export const floorConstructionSchema = z.enum([
  'light-timber',
  'timber-concrete',
  'clt',
  'on-grade',
]);

export const roofConstructionSchema = z.enum(['light', 'heavy-tile', 'clt', 'green']);

export const wallTypeSchema = z.enum([
  'wsp-150',
  'wsp-100',
  'wsp-75',
  'wsp-50',
  'gypsum',
  'diagonal-boards',
  'unsheathed',
  'clt-bracketed',
  'rocking',
  'user',
]);

export const supplementalDeviceSchema = z.enum([
  'viscous-damper',
  'inerter',
  'clutch',
  'friction',
  'other',
]);

export const driftMethodSchema = z.enum(['offset', 'tilt', 'phone-tilt', 'estimate']);

export const checklistItemSchema = z.enum([
  'cracked-or-split-members',
  'fastener-withdrawal',
  'hold-down-or-bracket-damage',
  'sill-plate-sliding',
  'foundation-movement',
  'leaning-cripple-wall-or-soft-storey',
  'falling-hazard',
  'ground-failure',
]);

export const severitySchema = z.enum(['minor', 'severe']);

export const ec8GroundSchema = z.enum(['A', 'B', 'C', 'D', 'E']);

/** Record metadata: who fixed the location, and which visit this is. */
export const locationSourceSchema = z.enum(['gps', 'map', 'typed']);
export const inspectionKindSchema = z.enum(['first', 'reinspection']);
