// `grainline screen` on the demo town and on broken inputs: a wrong type, missing geometry,
// a NaN, an empty file, a non-JSON file, a 50 MB file; exit codes; --help; the bin entry from
// another working directory. Results are compared with screen() run directly.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, createWriteStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { screen } from '../../calc/index.js';
import type { CliIo } from '../../cli/io.js';
import { runCli } from '../../cli/main.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const demoPath = join(root, 'test/fixtures/demo/demo-town.geojson');
const demoText = readFileSync(demoPath, 'utf8');
const demo = JSON.parse(demoText) as {
  type: string;
  grainline: unknown;
  features: Array<{
    type: string;
    geometry: unknown;
    properties: { record: Record<string, unknown> & { building: { system: string } } };
  }>;
};
const temp = mkdtempSync(join(tmpdir(), 'grainline-cli-'));
afterAll(() => rmSync(temp, { recursive: true, force: true }));

/** Runs the command line in memory; `files` maps names to contents (else real files are read). */
async function run(args: string[], files: Record<string, string | Buffer> = {}) {
  let out = '';
  let err = '';
  const io: CliIo = {
    out: async (t) => {
      out += t;
    },
    err: async (t) => {
      err += t;
    },
    async open(path): Promise<AsyncIterable<Buffer | string>> {
      const content = files[path];
      if (content !== undefined) {
        const bytes = typeof content === 'string' ? Buffer.from(content) : content;
        // Cut into small chunks so items straddle chunk boundaries.
        const chunks: Buffer[] = [];
        for (let i = 0; i < bytes.length; i += 4096) chunks.push(bytes.subarray(i, i + 4096));
        return (async function* () {
          yield* chunks;
        })();
      }
      const handle = await open(path, 'r');
      return handle.createReadStream();
    },
    stdoutIsTerminal: false,
    env: {},
  };
  const code = await runCli(args, io);
  return { code, out, err };
}

function collection(features: unknown[]): string {
  return JSON.stringify({ type: 'FeatureCollection', grainline: demo.grainline, features });
}

const lightFrame = demo.features.filter(
  (f) => f.properties.record.building.system === 'light-frame',
);

describe('grainline screen on the demo town', () => {
  it('prints one row per building with system, period, D/C, damage state and posting, and exits 0', async () => {
    const r = await run(['screen', demoPath]);
    expect(r.code).toBe(0);
    const lines = r.out.trimEnd().split('\n');
    expect(lines[0]).toMatch(
      /#\s+Address or id\s+System\s+Period x \/ y \(s\)\s+D\/C\s+Damage\s+Posting/,
    );
    expect(lines).toHaveLength(2 + demo.features.length);
    expect(lines[2]).toMatch(
      /^\s+0\s+\d+ \w+ .*light-frame\s+\d\.\d\d \/ \d\.\d\d\s+\d\.\d\d\s+\w+\s+(○ Open|◐ Limited entry|■ Keep out)/,
    );
    expect(r.err).toBe(`${demo.features.length} screened, 0 failed.\n`);
  });

  it('prints with --json the same results screen() gives, one entry per feature', async () => {
    const r = await run(['screen', '--json', demoPath]);
    expect(r.code).toBe(0);
    const entries = JSON.parse(r.out) as Array<{
      index: number;
      ok: boolean;
      source: string;
      result: unknown;
    }>;
    expect(entries).toHaveLength(demo.features.length);
    entries.forEach((e, i) => {
      expect(e).toMatchObject({ index: i, ok: true, source: 'feature' });
      // The stored result of the demo came from screen() too: the CLI reproduces it.
      expect(e.result).toEqual(
        demo.features[i]!.properties.record['result'] &&
          (demo.features[i]!.properties.record['result'] as { result: unknown }).result,
      );
    });
    const again = screen(demo.features[3]!.properties.record as never);
    expect(entries[3]!.result).toEqual(JSON.parse(JSON.stringify(again)));
  });

  it('reads a JSON array of survey records and of bare calculation inputs', async () => {
    const input = JSON.parse(
      readFileSync(join(root, 'test/fixtures/buildings/two-storey-house.json'), 'utf8'),
    ) as unknown;
    const record = lightFrame[0]!.properties.record;
    const r = await run(['screen', '--json', 'list.json'], {
      'list.json': JSON.stringify([record, input]),
    });
    expect(r.code).toBe(0);
    const entries = JSON.parse(r.out) as Array<{ source: string; ok: boolean }>;
    expect(entries.map((e) => [e.ok, e.source])).toEqual([
      [true, 'record'],
      [true, 'input'],
    ]);
  });

  it('reads standard input for "-"', async () => {
    const r = await run(['screen', '-'], { '-': collection(lightFrame.slice(0, 2)) });
    expect(r.code).toBe(0);
    expect(r.err).toBe('2 screened, 0 failed.\n');
  });
});

describe('grainline screen on broken input', () => {
  const good = lightFrame[0]!;
  const withRecord = (change: (rec: Record<string, unknown>) => void) => {
    const f = structuredClone(good);
    change(f.properties.record);
    return f;
  };

  it('reports an item of the wrong type by its index with the reason, screens the others, and exits 1', async () => {
    const wrongField = withRecord((rec) => {
      (rec['building'] as { storeys: Array<{ heightM: unknown }> }).storeys[0]!.heightM = '2.7 m';
    });
    const wrongSystem = withRecord((rec) => {
      (rec['building'] as { system: string }).system = 'steel-frame';
    });
    const polygon = { ...structuredClone(good), type: 'Polygon' };
    const text = collection([good, 42, wrongField, polygon, wrongSystem, good]);
    const r = await run(['screen', 'in.geojson'], { 'in.geojson': text });
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/in\.geojson: item 1: item 1 is a number/);
    expect(r.err).toMatch(/item 2 .*building\.storeys\.0\.heightM/);
    expect(r.err).toMatch(/item 3 .*GeoJSON "Polygon"/);
    expect(r.err).toMatch(/item 4 .*building\.system/);
    expect(r.err).toMatch(/2 screened, 4 failed\./);
    const rows = r.out.trimEnd().split('\n').slice(2);
    expect(rows).toHaveLength(6);
    expect(rows[1]).toMatch(/not screened/);
    expect(rows[5]).toMatch(/Open|Limited|Keep out/);
  });

  it('reports a Feature with missing geometry for a located survey', async () => {
    const f = structuredClone(good) as Record<string, unknown>;
    delete f['geometry'];
    const r = await run(['screen', '--json', 'in.geojson'], {
      'in.geojson': collection([f, good]),
    });
    expect(r.code).toBe(1);
    const entries = JSON.parse(r.out) as Array<{ ok: boolean; reasons?: string[] }>;
    expect(entries[0]!.ok).toBe(false);
    expect(entries[0]!.reasons?.join(' ')).toMatch(/geometry|location/i);
    expect(entries[1]!.ok).toBe(true);
  });

  it('reports an item holding NaN (not JSON) by its index and goes on', async () => {
    const text = collection([good, good]).replace(/"heightM":([0-9.]+)/, '"heightM":NaN');
    const r = await run(['screen', 'in.geojson'], { 'in.geojson': text });
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/item 0: item 0 is not valid JSON/);
    expect(r.err).toMatch(/1 screened, 1 failed\./);
  });

  it('reports a NaN slipped into a bare calculation input as a field error, not a crash', async () => {
    const input = JSON.parse(
      readFileSync(join(root, 'test/fixtures/buildings/two-storey-house.json'), 'utf8'),
    ) as {
      building: { planXM: unknown };
    };
    input.building.planXM = 'NaN';
    const r = await run(['screen', 'list.json'], { 'list.json': JSON.stringify([input]) });
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/building\.planXM/);
  });

  it('refuses an empty file with exit 2', async () => {
    const r = await run(['screen', 'empty.json'], { 'empty.json': '' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/empty\.json: the file is empty/);
  });

  it('refuses a file that is not JSON with exit 2', async () => {
    const r = await run(['screen', 'notes.csv'], { 'notes.csv': 'address,posting\n1 Lane,open\n' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not JSON/);
  });

  it('refuses a file cut short, after screening what came before, with exit 2', async () => {
    const text = collection([good, good]);
    const r = await run(['screen', 'cut.geojson'], {
      'cut.geojson': text.slice(0, Math.floor(text.length * 0.75)),
    });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/1 screened/);
    expect(r.err).toMatch(/ends/);
  });

  it('refuses another program’s format and a file missing from disk', async () => {
    const other = JSON.stringify({
      type: 'FeatureCollection',
      grainline: { format: 'other-tool' },
      features: [good],
    });
    expect((await run(['screen', 'o.geojson'], { 'o.geojson': other })).code).toBe(2);
    const missing = await run(['screen', join(temp, 'no-such-file.geojson')]);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/cannot be read/);
  });

  it('screens a single Feature file', async () => {
    const r = await run(['screen', 'one.geojson'], { 'one.geojson': JSON.stringify(good) });
    expect(r.code).toBe(0);
    expect(r.err).toBe('1 screened, 0 failed.\n');
  });
});

describe('grainline screen on a 50 MB file', () => {
  it('streams a 50 MB export within a 120 MB heap (holding it whole would not fit) and screens every feature', async () => {
    const path = join(temp, 'big.geojson');
    const stream = createWriteStream(path);
    stream.write(
      `{"type":"FeatureCollection","grainline":${JSON.stringify(demo.grainline)},"features":[\n`,
    );
    let bytes = 0;
    let count = 0;
    while (bytes < 50 * 1024 * 1024) {
      const text =
        (count === 0 ? '' : ',\n') + JSON.stringify(lightFrame[count % lightFrame.length]);
      bytes += text.length;
      count++;
      if (!stream.write(text))
        await new Promise<void>((resolve) => stream.once('drain', () => resolve()));
    }
    stream.write('\n]}\n');
    await new Promise<void>((resolve) => stream.end(() => resolve()));
    const r = spawnSync(
      process.execPath,
      ['--max-old-space-size=120', join(root, 'bin/grainline.mjs'), 'screen', '--quick', path],
      { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024, cwd: temp },
    );
    expect(r.stderr).toBe(`${count} screened, 0 failed.\n`);
    expect(r.status).toBe(0);
    expect(r.stdout.trimEnd().split('\n')).toHaveLength(count + 2);
  }, 120_000);

  it('reports a single 50 MB item that is not a survey, without stopping', async () => {
    const big = `["${'x'.repeat(50 * 1024 * 1024)}", ${JSON.stringify(lightFrame[0])}]`;
    const path = join(temp, 'big-string.json');
    writeFileSync(path, big);
    const r = await run(['screen', path]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/item 0 is a string/);
    expect(r.err).toMatch(/1 screened, 1 failed\./);
  }, 60_000);
});

describe('grainline command line', () => {
  it('documents every option and the exit codes in --help', async () => {
    const r = await run(['--help']);
    expect(r.code).toBe(0);
    for (const word of [
      'screen',
      '--json',
      '--quick',
      '--color',
      '--no-color',
      'Exit status',
      'standard input',
      'licensed engineer',
    ]) {
      expect(r.out).toContain(word);
    }
  });

  it('exits 2 with a hint when the command line is wrong', async () => {
    expect((await run([])).code).toBe(2);
    expect((await run(['rank', 'x'])).err).toMatch(/unknown command/);
    expect((await run(['screen', '--fast', 'x'])).err).toMatch(/unknown option/);
    expect((await run(['screen'])).code).toBe(2);
  });

  it('runs through bin/grainline.mjs from another working directory', () => {
    const path = join(temp, 'two.geojson');
    writeFileSync(path, collection(lightFrame.slice(0, 2)));
    const r = spawnSync(
      process.execPath,
      [join(root, 'bin/grainline.mjs'), 'screen', 'two.geojson'],
      {
        cwd: temp,
        encoding: 'utf8',
      },
    );
    expect(r.stderr).toBe('2 screened, 0 failed.\n');
    expect(r.status).toBe(0);
    const version = spawnSync(process.execPath, [join(root, 'bin/grainline.mjs'), '--version'], {
      cwd: '/',
      encoding: 'utf8',
    });
    expect(version.stdout).toMatch(/calculation \d+\.\d+\.\d+, result version 1/);
  }, 60_000);
});
