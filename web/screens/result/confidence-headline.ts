/**
 * The confidence statement up to its lists of missing inputs and key defaults. The result
 * screen shows the lists under "Assumed, defaulted or missing", so on screen the statement
 * stops before them. The markers are the ones calc/screening/screen.ts writes; a test reads
 * real results to keep the two in step.
 */
export function confidenceHeadline(statement: string): string {
  const cut = statement.search(/ (Missing or unusable|Key defaults):/);
  return cut === -1 ? statement : statement.slice(0, cut);
}
