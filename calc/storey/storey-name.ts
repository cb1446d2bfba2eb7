/**
 * A storey for people. Surveys index storeys from 0 (the ground storey); people and the
 * survey form count from 1, so index 0 reads "storey 1 (ground)".
 */
export function storeyName(index: number): string {
  if (!Number.isInteger(index) || index < 0) return `storey ${String(index)}`;
  return index === 0 ? 'storey 1 (ground)' : `storey ${index + 1}`;
}
