/** English words for the posting levels and damage states (Hazus damage-state names). */
export const posting = {
  'posting.open': 'Open',
  'posting.limited': 'Limited entry',
  'posting.keepOut': 'Keep out',
  'posting.open.meaning': 'No restriction recommended by the screening.',
  'posting.limited.meaning': 'Enter only with limits: briefly, escorted, or parts of the building.',
  'posting.keepOut.meaning': 'Nobody should enter.',
  'posting.unscreened': 'Not screened',
  'damage.none': 'None',
  'damage.slight': 'Slight',
  'damage.moderate': 'Moderate',
  'damage.extensive': 'Extensive',
  'damage.complete': 'Complete',
} as const;
