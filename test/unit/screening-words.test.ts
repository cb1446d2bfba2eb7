// The words and symbols results carry are the app's: the English catalogue
// (web/i18n/en/posting.ts) and the posting style (web/app/posting-style.ts).
import { describe, expect, it } from 'vitest';
import {
  DAMAGE_STATES,
  DAMAGE_STATE_WORDS,
  POSTING_LEVELS,
  POSTING_WORDS,
} from '../../calc/index.js';
import { postingStyles, damageStateLabels } from '../../web/app/posting-style.js';
import { posting } from '../../web/i18n/en/posting.js';

describe('verdict words', () => {
  it('uses the catalogue words and meanings and the style symbols for every posting level', () => {
    for (const level of POSTING_LEVELS) {
      const style = postingStyles[level];
      expect(POSTING_WORDS[level].word).toBe(posting[style.label as keyof typeof posting]);
      expect(POSTING_WORDS[level].meaning).toBe(
        posting[`${style.label}.meaning` as keyof typeof posting],
      );
      expect(POSTING_WORDS[level].symbol).toBe(style.symbol);
    }
  });

  it('uses the catalogue names for every damage state', () => {
    for (const state of DAMAGE_STATES) {
      expect(DAMAGE_STATE_WORDS[state]).toBe(
        posting[damageStateLabels[state] as keyof typeof posting],
      );
    }
  });

  it('gives three distinct symbols and words, so the posting reads without colour', () => {
    expect(new Set(POSTING_LEVELS.map((l) => POSTING_WORDS[l].symbol)).size).toBe(3);
    expect(new Set(POSTING_LEVELS.map((l) => POSTING_WORDS[l].word)).size).toBe(3);
  });
});
