import { requireNonNegative } from '../spectra/checks.js';

/**
 * ASCE 7-16 Table 12.8-1, coefficient for the upper limit on the calculated period Cu, by the
 * design spectral acceleration at 1 s, SD1 (in g). Rows ascending in SD1.
 */
const TABLE_12_8_1: readonly (readonly [sd1: number, cu: number])[] = [
  [0.1, 1.7],
  [0.15, 1.6],
  [0.2, 1.5],
  [0.3, 1.4],
  [0.4, 1.4],
];

/**
 * Cu of ASCE 7-16 Table 12.8-1, linearly interpolated between rows (as the table's use in
 * §12.8.2 implies), 1.7 for SD1 ≤ 0.1 g and 1.4 for SD1 ≥ 0.4 g. The period from analysis
 * is not to exceed Cu·Ta (ASCE 7-16 §12.8.2).
 *
 * @param sd1G SD1 in g (not in m/s²): finite and ≥ 0.
 */
export function upperLimitCoefficient(sd1G: number): number {
  requireNonNegative('sd1G', sd1G);
  const first = TABLE_12_8_1[0]!;
  if (sd1G <= first[0]) return first[1];
  for (let i = 1; i < TABLE_12_8_1.length; i++) {
    const [x1, y1] = TABLE_12_8_1[i]!;
    if (sd1G <= x1) {
      const [x0, y0] = TABLE_12_8_1[i - 1]!;
      return y0 + ((y1 - y0) * (sd1G - x0)) / (x1 - x0);
    }
  }
  return TABLE_12_8_1[TABLE_12_8_1.length - 1]![1];
}
