/**
 * The plain-text table of `grainline screen`: one row per survey, columns of fixed width,
 * the posting as symbol + word (readable without colour and in print), with an optional
 * colour taken from the app's posting style.
 */
import type { PostingLevel, ScreeningResult } from '../calc/index.js';
import { postingStyles } from '../web/app/posting-style.js';

export interface Column {
  title: string;
  width: number;
  align: 'left' | 'right';
}

export const COLUMNS: readonly Column[] = [
  { title: '#', width: 6, align: 'right' },
  { title: 'Address or id', width: 42, align: 'left' },
  { title: 'System', width: 18, align: 'left' },
  { title: 'Period x / y (s)', width: 16, align: 'left' },
  { title: 'D/C', width: 6, align: 'right' },
  { title: 'Damage', width: 9, align: 'left' },
  { title: 'Posting', width: 15, align: 'left' },
  { title: 'Flags', width: 5, align: 'left' },
];

/** Cuts or pads `text` to `width` characters (code points), marking a cut with "…". */
export function fit(text: string, width: number, align: 'left' | 'right' = 'left'): string {
  // Control characters (from imported text) would break the layout or drive the terminal.
  const chars = [...text].map((c) => {
    const code = c.codePointAt(0) ?? 0;
    return code < 0x20 || (code >= 0x7f && code < 0xa0) ? ' ' : c;
  });
  const cut = chars.length > width ? [...chars.slice(0, width - 1), '…'] : chars;
  const pad = ' '.repeat(width - cut.length);
  return align === 'left' ? cut.join('') + pad : pad + cut.join('');
}

function row(cells: readonly string[]): string {
  return COLUMNS.map((c, i) => fit(cells[i] ?? '', c.width, c.align))
    .join('  ')
    .trimEnd();
}

export function headerLines(): string[] {
  return [row(COLUMNS.map((c) => c.title)), COLUMNS.map((c) => '─'.repeat(c.width)).join('  ')];
}

function hexToRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** ANSI 24-bit foreground in the posting's border colour (web/app/posting-style.ts). */
function coloured(level: PostingLevel, text: string): string {
  const [r, g, b] = hexToRgb(postingStyles[level].border);
  return `\u001b[1;38;2;${r};${g};${b}m${text}\u001b[0m`;
}

function period(x: number | null): string {
  return x === null ? '–' : x.toFixed(2);
}

/** One table row for a screened survey. */
export function resultRow(
  label: string,
  name: string,
  result: ScreeningResult,
  colour: boolean,
): string {
  const s = result.summary;
  const dc = s.governingDemandToCapacity;
  const postingText = `${result.posting.symbol} ${result.posting.word}`;
  const line = row([
    label,
    name,
    s.system,
    `${period(s.periodS.x)} / ${period(s.periodS.y)}`,
    dc === null ? '–' : dc.toFixed(2),
    result.damage.word,
    postingText,
    result.needsAssessment ? 'DA' : '',
  ]);
  if (!colour) return line;
  // Colour only the posting cell, after the layout is fixed.
  const cell = fit(postingText, COLUMNS[6]!.width).trimEnd();
  return line.replace(cell, coloured(result.posting.level, cell));
}

/** One table row for a survey that could not be read or screened. */
export function failedRow(label: string, name: string): string {
  return row([label, name, 'not screened: see the messages', '', '', '', '', '']);
}
