/**
 * How a posting level and a damage state look: colour + symbol + word, so that colour-blind
 * readers and black-and-white prints can tell them apart. Grainline's own scheme:
 * - severity also rises with how much of the symbol is filled (hollow, half, solid), which
 *   survives greyscale printing;
 * - the hues come from the Okabe–Ito colour-blind-safe palette (Okabe & Ito 2008, "Color
 *   Universal Design"), never green/yellow/red.
 */
import type { DamageState, PostingLevel } from '../../calc/index.js';
import type { MessageKey } from '../i18n/index.js';

export interface LevelStyle {
  /** Text label key in the catalogue. */
  label: MessageKey;
  /** A character that reads without colour. */
  symbol: string;
  /** Fill and border colours; text colour on the fill. */
  fill: string;
  border: string;
  ink: string;
  /** 'hollow' | 'half' | 'solid', mirrored in the symbol, for greyscale. */
  fillLevel: 'hollow' | 'half' | 'solid';
}

export const postingStyles: Record<PostingLevel, LevelStyle> = {
  open: {
    label: 'posting.open',
    symbol: '○',
    fill: '#ffffff',
    border: '#0072b2', // Okabe–Ito blue
    ink: '#0b3f66',
    fillLevel: 'hollow',
  },
  limited: {
    label: 'posting.limited',
    symbol: '◐',
    fill: '#f3d6e8',
    border: '#a23b79', // darkened Okabe–Ito reddish purple, for contrast on white
    ink: '#5c1a43',
    fillLevel: 'half',
  },
  'keep-out': {
    label: 'posting.keepOut',
    symbol: '■',
    fill: '#1a1a1a',
    border: '#000000',
    ink: '#ffffff',
    fillLevel: 'solid',
  },
};

export const damageStateLabels: Record<DamageState, MessageKey> = {
  none: 'damage.none',
  slight: 'damage.slight',
  moderate: 'damage.moderate',
  extensive: 'damage.extensive',
  complete: 'damage.complete',
};
