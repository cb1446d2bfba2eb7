/**
 * Forms: what an inspector enters and how it is checked.
 *
 * - `schema/` — the stored survey record (zod, schema version 2, SI units), migrations from
 *   every earlier version, the empty draft, validation with a sentence per field that names
 *   the unit, the "complete enough to screen" check, and the message catalogue
 *   (schema/messages.ts) that holds every sentence shown to people.
 * - `units/` — conversion between stored SI values and displayed units, reading typed
 *   quantities and formatting them (see units/index.ts).
 *
 * Form components live beside these folders and are re-exported here by their authors.
 */
export * from './schema/index.js';
export * from './units/index.js';
