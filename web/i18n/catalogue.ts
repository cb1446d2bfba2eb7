/**
 * The message catalogue: every piece of UI text, by key. Components never hold text of their
 * own; they call `t(key, params)`. A second language is a second catalogue with the same keys.
 */
import { app } from './en/app.js';
import { screens } from './en/screens.js';
import { posting } from './en/posting.js';
import { fields } from './en/fields.js';
import { result } from './en/result.js';
import { map } from './en/map.js';
import { instruments } from './en/instruments.js';

/**
 * English catalogue. Each area of the app adds its own section file under en/ and spreads it
 * here, so parallel work does not collide in one file.
 */
export const en = {
  ...app,
  ...screens,
  ...posting,
  ...fields,
  ...result,
  ...map,
  ...instruments,
} as const;

export type MessageKey = keyof typeof en;
export type Catalogue = Record<MessageKey, string>;
