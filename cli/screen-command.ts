/**
 * `grainline screen`: streams each input file, reads every item with the app's own checks,
 * screens it with calc's `screen()` and writes a table row or a JSON entry as soon as the item
 * is done, so memory stays flat however large the file is.
 */
import { screen, type ScreeningResult } from '../calc/index.js';
import { EXPORT_FORMAT, EXPORT_FORMAT_VERSION } from '../web/exchange/export-format.js';
import type { CliIo } from './io.js';
import { scanJsonArray, type JsonStreamEvent } from './json-array-stream.js';
import { readSurveyItem, type ReadItem } from './survey-reader.js';
import { failedRow, headerLines, resultRow } from './table.js';

export interface ScreenCommandOptions {
  files: string[];
  json: boolean;
  quick: boolean;
  colour: boolean;
}

/** Largest single item or top-level member read, in bytes (our limit, no source). */
export const MAX_ITEM_BYTES = 64 * 1024 * 1024;

interface Counts {
  screened: number;
  failed: number;
  fileErrors: number;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Checks the `type` and `grainline` members of a top-level object; a reason when wrong. */
function checkMember(key: string, value: unknown): string | null {
  if (key === 'type' && value !== 'FeatureCollection' && value !== 'Feature') {
    return `the file is a GeoJSON ${JSON.stringify(value)}, not a FeatureCollection`;
  }
  if (key === 'grainline' && isObject(value)) {
    const format = value['format'];
    const version = value['formatVersion'];
    if (format !== undefined && format !== EXPORT_FORMAT) {
      return `the file is a ${JSON.stringify(format)} file, not a Grainline export`;
    }
    if (typeof version === 'number' && version > EXPORT_FORMAT_VERSION) {
      return `the file was written in a newer layout (${version}); update Grainline to read it`;
    }
  }
  return null;
}

class Output {
  private first = true;
  constructor(
    private readonly io: CliIo,
    private readonly options: ScreenCommandOptions,
  ) {}

  async begin(): Promise<void> {
    if (this.options.json) await this.io.out('[\n');
    else await this.io.out(headerLines().join('\n') + '\n');
  }

  async end(): Promise<void> {
    if (this.options.json) await this.io.out(this.first ? ']\n' : '\n]\n');
  }

  private label(file: string, index: number): string {
    return this.options.files.length > 1 ? `${file}:${index}` : String(index);
  }

  async screened(
    file: string,
    item: Extract<ReadItem, { ok: true }>,
    result: ScreeningResult,
  ): Promise<void> {
    if (this.options.json) {
      const entry = {
        file,
        index: item.index,
        ok: true,
        source: item.source,
        id: item.id,
        address: item.address,
        result,
      };
      await this.io.out((this.first ? '' : ',\n') + JSON.stringify(entry));
      this.first = false;
      return;
    }
    const name = item.address ?? item.id ?? `${file} item ${item.index}`;
    await this.io.out(
      resultRow(this.label(file, item.index), name, result, this.options.colour) + '\n',
    );
  }

  async failed(
    file: string,
    index: number,
    id: string | null,
    address: string | null,
    reasons: string[],
  ): Promise<void> {
    await this.io.err(
      `${file}: item ${index}${address ? ` (${address})` : id ? ` (${id})` : ''}: ${reasons.join('; ')}\n`,
    );
    if (this.options.json) {
      const entry = { file, index, ok: false, id, address, reasons };
      await this.io.out((this.first ? '' : ',\n') + JSON.stringify(entry));
      this.first = false;
      return;
    }
    await this.io.out(
      failedRow(this.label(file, index), address ?? id ?? `${file} item ${index}`) + '\n',
    );
  }
}

async function screenItem(
  value: unknown,
  index: number,
  file: string,
  options: ScreenCommandOptions,
  output: Output,
  counts: Counts,
): Promise<void> {
  const item = readSurveyItem(value, index);
  if (!item.ok) {
    counts.failed++;
    await output.failed(file, index, item.id, item.address, item.reasons);
    return;
  }
  let result: ScreeningResult;
  try {
    result = screen(item.survey, { rockingTimeHistory: !options.quick });
  } catch (e) {
    counts.failed++;
    await output.failed(file, index, item.id, item.address, [
      `the calculation stopped: ${(e as Error).message}`,
    ]);
    return;
  }
  counts.screened++;
  await output.screened(file, item, result);
}

async function screenFile(
  file: string,
  io: CliIo,
  options: ScreenCommandOptions,
  output: Output,
  counts: Counts,
): Promise<void> {
  let chunks: AsyncIterable<Buffer | string>;
  try {
    chunks = await io.open(file);
  } catch (e) {
    counts.fileErrors++;
    await io.err(`${file}: cannot be read: ${(e as Error).message}\n`);
    return;
  }
  const members = new Map<string, unknown>();
  const events = scanJsonArray(chunks, {
    maxElementBytes: MAX_ITEM_BYTES,
    maxMemberBytes: MAX_ITEM_BYTES,
  });
  let shape = { topLevelArray: false, sawFeatures: false };
  try {
    for (;;) {
      const next = await events.next();
      if (next.done) {
        shape = next.value;
        break;
      }
      const e: JsonStreamEvent = next.value;
      if (e.kind === 'fatal') {
        counts.fileErrors++;
        await io.err(`${file}: ${e.reason}\n`);
        return;
      }
      if (e.kind === 'element-error') {
        counts.failed++;
        await output.failed(file, e.index, null, null, [e.reason]);
        continue;
      }
      if (e.kind === 'member') {
        let value: unknown;
        try {
          value = JSON.parse(e.text) as unknown;
        } catch {
          counts.fileErrors++;
          await io.err(`${file}: the "${e.key}" member is not valid JSON\n`);
          return;
        }
        const problem = checkMember(e.key, value);
        if (problem !== null) {
          counts.fileErrors++;
          await io.err(`${file}: ${problem}\n`);
          return;
        }
        members.set(e.key, value);
        continue;
      }
      let value: unknown;
      try {
        value = JSON.parse(e.text) as unknown;
      } catch (err) {
        counts.failed++;
        await output.failed(file, e.index, null, null, [
          `item ${e.index} is not valid JSON (${(err as Error).message})`,
        ]);
        continue;
      }
      await screenItem(value, e.index, file, options, output, counts);
    }
  } catch (e) {
    counts.fileErrors++;
    await io.err(`${file}: reading stopped: ${(e as Error).message}\n`);
    return;
  }
  if (!shape.topLevelArray && !shape.sawFeatures) {
    // A top-level object without a features list: a single Feature, or not ours.
    if (members.get('type') === 'Feature') {
      await screenItem(Object.fromEntries(members), 0, file, options, output, counts);
    } else {
      counts.fileErrors++;
      await io.err(`${file}: the file has no "features" list and is not a GeoJSON Feature\n`);
    }
  }
}

/** Runs `grainline screen`; resolves to the exit status (0, 1 or 2). */
export async function screenCommand(options: ScreenCommandOptions, io: CliIo): Promise<number> {
  const counts: Counts = { screened: 0, failed: 0, fileErrors: 0 };
  const output = new Output(io, options);
  await output.begin();
  for (const file of options.files) await screenFile(file, io, options, output, counts);
  await output.end();
  const parts = [`${counts.screened} screened`, `${counts.failed} failed`];
  if (counts.fileErrors > 0)
    parts.push(`${counts.fileErrors} file error${counts.fileErrors === 1 ? '' : 's'}`);
  await io.err(`${parts.join(', ')}.\n`);
  if (counts.fileErrors > 0) return 2;
  return counts.failed > 0 ? 1 : 0;
}
