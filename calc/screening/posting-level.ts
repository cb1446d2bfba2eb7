/**
 * The three levels of the recommended posting, Grainline's own vocabulary (ids only; the
 * words, colours and symbols shown to people live in the web app's posting style):
 * - `open`: no restriction is recommended by the screening;
 * - `limited`: entry only with limits (short, escorted, or to parts of the building);
 * - `keep-out`: nobody should enter.
 * A posting is a recommendation to the inspector, who decides under local rules.
 */
export const POSTING_LEVELS = ['open', 'limited', 'keep-out'] as const;

export type PostingLevel = (typeof POSTING_LEVELS)[number];

export function postingRank(level: PostingLevel): number {
  return POSTING_LEVELS.indexOf(level);
}
