/**
 * The English words (and the symbol) of the posting levels and damage states, for results
 * that travel without the app: the command line, exports read in a GIS. The same words as
 * the app's catalogue (web/i18n/en/posting.ts) and the same symbols as its posting style
 * (web/app/posting-style.ts); test/unit/screening-words.test.ts keeps them equal. Colours
 * stay with the app: a word and a symbol read without colour, in greyscale too.
 */
import type { DamageState } from '../damage/damage-state.js';
import type { PostingLevel } from './posting-level.js';

export interface PostingWords {
  /** The label shown with the symbol. */
  word: string;
  /** A character that reads without colour: hollow, half, solid as severity rises. */
  symbol: string;
  /** What the level asks of people, in a sentence. */
  meaning: string;
}

export const POSTING_WORDS: Readonly<Record<PostingLevel, PostingWords>> = {
  open: {
    word: 'Open',
    symbol: '○',
    meaning: 'No restriction recommended by the screening.',
  },
  limited: {
    word: 'Limited entry',
    symbol: '◐',
    meaning: 'Enter only with limits: briefly, escorted, or parts of the building.',
  },
  'keep-out': {
    word: 'Keep out',
    symbol: '■',
    meaning: 'Nobody should enter.',
  },
};

/** Hazus damage-state names. */
export const DAMAGE_STATE_WORDS: Readonly<Record<DamageState, string>> = {
  none: 'None',
  slight: 'Slight',
  moderate: 'Moderate',
  extensive: 'Extensive',
  complete: 'Complete',
};
