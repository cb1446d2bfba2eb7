/**
 * Command-line benchmark: `npx tsx test/bench/cli.bench.ts` (or `npm run bench cli`).
 *
 * 1. Writes 100,000 seeded surveys (mulberry32) as one Grainline GeoJSON export, feature by
 *    feature through web/exchange's `surveyFeature`: the demo town's buildings varied in size,
 *    wall lengths and shaking, rocking-wall buildings kept to about 1 % (they are rare, and
 *    each rocking wall costs a pulse time history).
 * 2. Runs `grainline screen` (bin/grainline.mjs, as a child process) on it, with the table
 *    and with --json, and reports surveys per second, CPU time and peak memory (the child's
 *    VmHWM from /proc, sampled until it exits).
 * 3. Side by side in the same run: screen() alone in this process on 5,000 of the same
 *    surveys (the calculation's own rate: what reading, checking and writing cost on top),
 *    and, on a 10,000-survey file, the naive way (readFileSync + JSON.parse of the whole file,
 *    holding everything) against the streaming command line: peak memory of each.
 *
 * A benchmark, not a test: it prints figures and never fails on speed.
 */
import { spawn } from 'node:child_process';
import {
  createWriteStream,
  mkdtempSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { screen } from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/schema/index.js';
import { geoJsonExport, surveyFeature } from '../../web/exchange/geojson-export.js';
import { makeDemoTown } from '../../scripts/demo-town.js';
import { mulberry32 } from './prng.js';

const COUNT = 100_000;
const SMALL = 10_000;
const SCREEN_SAMPLE = 5_000;
const SEED = 20_310_700;
const ROCKING_SHARE = 0.01;

const root = fileURLToPath(new URL('../../', import.meta.url));
const bin = join(root, 'bin/grainline.mjs');
const dir = mkdtempSync(join(tmpdir(), 'grainline-bench-'));
const rand = mulberry32(SEED);

const town = makeDemoTown().map((r) => ({ ...r, result: null }));
const rocking = town.filter((r) => r.building.system === 'rocking-wall');
const others = town.filter((r) => r.building.system !== 'rocking-wall');

function uuid(): string {
  const hex = (n: number) =>
    Array.from({ length: n }, () => Math.floor(rand() * 16).toString(16)).join('');
  return `${hex(8)}-${hex(4)}-4${hex(3)}-${'89ab'[Math.floor(rand() * 4)]}${hex(3)}-${hex(12)}`;
}

/** A variant of a demo building: new id, plan and walls scaled, shaking scaled. */
function variant(i: number): SurveyRecord {
  const pool = rand() < ROCKING_SHARE ? rocking : others;
  const base = pool[Math.floor(rand() * pool.length)] as SurveyRecord;
  const size = 0.85 + 0.3 * rand();
  const walls = 0.8 + 0.4 * rand();
  const shake = 0.5 + rand();
  const r3 = (x: number) => Math.round(x * 1000) / 1000;
  const hazard =
    base.hazard === null
      ? null
      : base.hazard.kind === 'event'
        ? {
            ...base.hazard,
            pga: r3(base.hazard.pga * shake),
            sa03: r3(base.hazard.sa03 * shake),
            sa10: r3(base.hazard.sa10 * shake),
          }
        : base.hazard;
  return {
    ...base,
    id: uuid(),
    address: `${1 + (i % 400)} Bench Row ${Math.floor(i / 400)}, Corrow Vale (generated)`,
    building: {
      ...base.building,
      planXM: base.building.planXM === null ? null : r3(base.building.planXM * size),
      planYM: base.building.planYM === null ? null : r3(base.building.planYM * size),
      storeys: base.building.storeys.map((s) => ({
        ...s,
        floorAreaM2: r3(s.floorAreaM2 * size * size),
      })),
    },
    walls: base.walls.map((w) =>
      w.type === 'rocking' ? w : { ...w, lengthM: r3(w.lengthM * walls) },
    ),
    hazard,
  };
}

/** Writes `count` surveys as one export, never holding more than one feature. */
async function writeExport(path: string, count: number): Promise<{ rockingCount: number }> {
  const context = { exportedAt: new Date('2031-06-14T00:00:00.000Z'), build: 'cli-bench' };
  // Head and tail of an export from web/exchange; its "count" says 0 (the reader ignores it).
  const frame = geoJsonExport([], context).parts;
  const out = createWriteStream(path);
  const write = (text: string) =>
    out.write(text)
      ? Promise.resolve()
      : new Promise<void>((resolve) => out.once('drain', () => resolve()));
  await write(frame[0] as string);
  let rockingCount = 0;
  for (let i = 0; i < count; i++) {
    const record = variant(i);
    if (record.building.system === 'rocking-wall') rockingCount++;
    await write((i === 0 ? '' : ',\n') + JSON.stringify(surveyFeature(record)));
  }
  await write(frame[frame.length - 1] as string);
  await new Promise<void>((resolve) => out.end(() => resolve()));
  return { rockingCount };
}

interface ChildRun {
  seconds: number;
  cpuSeconds: number;
  peakMB: number;
  code: number | null;
  stderr: string;
}

/** Runs a node child, sampling its peak resident memory (VmHWM) and CPU time from /proc. */
function runChild(args: string[]): Promise<ChildRun> {
  return new Promise((resolve) => {
    const started = performance.now();
    const child = spawn(process.execPath, args, { stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    let peakKB = 0;
    let ticks = 0;
    const sample = () => {
      try {
        const status = readFileSync(`/proc/${child.pid}/status`, 'utf8');
        const m = /VmHWM:\s+(\d+)/.exec(status);
        if (m) peakKB = Math.max(peakKB, Number(m[1]));
        const stat =
          readFileSync(`/proc/${child.pid}/stat`, 'utf8').split(') ')[1]?.split(' ') ?? [];
        ticks = Math.max(ticks, Number(stat[11]) + Number(stat[12])); // utime + stime
      } catch {
        // the child has gone
      }
    };
    const timer = setInterval(sample, 50);
    child.on('exit', (code) => {
      clearInterval(timer);
      resolve({
        seconds: (performance.now() - started) / 1000,
        cpuSeconds: ticks / 100, // USER_HZ = 100 on Linux
        peakMB: peakKB / 1024,
        code,
        stderr: stderr.trim(),
      });
    });
  });
}

function mb(bytes: number): string {
  return `${(bytes / 1048576).toFixed(0)} MB`;
}

async function main(): Promise<void> {
  console.log(`Generating ${COUNT.toLocaleString('en')} surveys (seed ${SEED}) …`);
  const big = join(dir, 'surveys-100k.geojson');
  const small = join(dir, 'surveys-10k.geojson');
  const t0 = performance.now();
  const { rockingCount } = await writeExport(big, COUNT);
  await writeExport(small, SMALL);
  console.log(
    `  ${mb(statSync(big).size)} for ${COUNT.toLocaleString('en')} (${rockingCount} rocking-wall buildings), ${mb(statSync(small).size)} for ${SMALL.toLocaleString('en')}; written in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
  );

  // Baseline: the calculation alone, in this process, on the same kind of surveys.
  // CPU time, not wall time: the machine may be shared, and the child runs are compared by CPU.
  const sample = Array.from({ length: SCREEN_SAMPLE }, (_, i) => variant(COUNT + i));
  const cpu = () => {
    const u = process.cpuUsage();
    return (u.user + u.system) / 1e6;
  };
  for (const s of sample.slice(0, 200)) screen(s); // warm-up
  let t = cpu();
  for (const s of sample) screen(s);
  const screenRate = SCREEN_SAMPLE / (cpu() - t);
  t = cpu();
  for (const s of sample) screen(s, { rockingTimeHistory: false });
  const screenQuickRate = SCREEN_SAMPLE / (cpu() - t);
  console.log(
    `\nscreen() alone, in process, ${SCREEN_SAMPLE.toLocaleString('en')} surveys (CPU time):`,
  );
  console.log(
    `  with rocking time histories: ${screenRate.toFixed(0)} surveys/s; without (as --quick): ${screenQuickRate.toFixed(0)} surveys/s`,
  );
  const idle = await runChild([bin, '--version']);
  console.log(
    `  the command line's own start (--version): ${idle.cpuSeconds.toFixed(1)} s CPU, ${idle.peakMB.toFixed(0)} MB`,
  );

  const runs: [string, string[]][] = [
    ['table', ['screen', big]],
    ['--json', ['screen', '--json', big]],
    ['table --quick', ['screen', '--quick', big]],
  ];
  console.log(
    `\ngrainline screen on ${COUNT.toLocaleString('en')} surveys (child process, output to /dev/null):`,
  );
  const results: Record<string, ChildRun> = {};
  for (const [name, args] of runs) {
    const r = await runChild([bin, ...args]);
    results[name] = r;
    console.log(
      `  ${name.padEnd(14)} ${(COUNT / r.seconds).toFixed(0).padStart(6)} surveys/s wall (${r.seconds.toFixed(1)} s), ${(COUNT / r.cpuSeconds).toFixed(0).padStart(6)} surveys/s of CPU (${r.cpuSeconds.toFixed(1)} s), peak memory ${r.peakMB.toFixed(0)} MB; exit ${r.code}; "${r.stderr.split('\n').at(-1)}"`,
    );
  }
  const table = results['table'] as ChildRun;
  console.log(
    `  ratio CLI (table, CPU) / screen() alone: ${(COUNT / table.cpuSeconds / screenRate).toFixed(2)}`,
  );
  const q = results['table --quick'] as ChildRun;
  console.log(
    `  ratio CLI (table --quick, CPU) / screen() alone without time histories: ${(COUNT / q.cpuSeconds / screenQuickRate).toFixed(2)}`,
  );

  // Memory side by side on the same 10,000-survey file: naive whole-file parse vs streaming.
  const naive = join(dir, 'naive.mjs');
  writeFileSync(
    naive,
    `import { readFileSync } from 'node:fs';\nconst doc = JSON.parse(readFileSync(process.argv[2], 'utf8'));\nconsole.error(doc.features.length + ' features held');\n`,
  );
  const naiveRun = await runChild([naive, small]);
  const streamRun = await runChild([bin, 'screen', '--quick', small]);
  console.log(
    `\nPeak memory on the ${SMALL.toLocaleString('en')}-survey file (${mb(statSync(small).size)}):`,
  );
  console.log(`  readFileSync + JSON.parse only (no screening): ${naiveRun.peakMB.toFixed(0)} MB`);
  console.log(
    `  grainline screen --quick (streaming, screening): ${streamRun.peakMB.toFixed(0)} MB`,
  );
  console.log(`  ratio naive / streaming: ${(naiveRun.peakMB / streamRun.peakMB).toFixed(2)}`);
  const quick = results['table --quick'] as ChildRun;
  console.log(
    `  streaming peak, --quick, on 100,000 vs 10,000 surveys: ${(quick.peakMB / streamRun.peakMB).toFixed(2)} (about 1 when it streams)`,
  );
  rmSync(dir, { recursive: true, force: true });
}

main().catch((e: unknown) => {
  rmSync(dir, { recursive: true, force: true });
  console.error(e);
  process.exitCode = 1;
});
