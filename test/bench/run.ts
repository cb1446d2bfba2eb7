/**
 * `npm run bench`: runs every benchmark listed here, one after another, each in its own
 * process so one's memory use does not colour the next. Add new benchmark files to the list.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const benches = [
  'buildings.bench.ts',
  'rocking.bench.ts',
  'storage.bench.ts',
  'storage-browser.bench.ts',
  'exchange.bench.ts',
  'map.bench.ts',
  'cli.bench.ts',
  'vibration.bench.ts',
  'first-screen.bench.ts',
];

const only = process.argv.slice(2);
let failed = 0;
for (const file of benches) {
  if (only.length > 0 && !only.some((o) => file.includes(o))) continue;
  const path = fileURLToPath(new URL(file, import.meta.url));
  if (!existsSync(path)) {
    console.log(`\n— ${file}: not present, skipped`);
    continue;
  }
  console.log(`\n=== ${file}`);
  const r = spawnSync(process.execPath, ['--expose-gc', '--import', 'tsx', path], {
    stdio: 'inherit',
  });
  if (r.status !== 0) failed += 1;
}
process.exit(failed > 0 ? 1 : 0);
