/**
 * The `grainline` command line (bin/grainline.mjs runs this file through tsx). Commands:
 * `screen` (see screen-command.ts), `--help`, `--version`. `runCli` takes the arguments and
 * an I/O object and resolves to the exit status, so tests run it in memory.
 */
import { pathToFileURL } from 'node:url';
import { CALC_VERSION, RESULT_VERSION } from '../calc/index.js';
import { USAGE } from './help.js';
import { processIo, type CliIo } from './io.js';
import { screenCommand } from './screen-command.js';

/** Runs the command line with `args` (without node and the script); resolves to the exit status. */
export async function runCli(args: readonly string[], io: CliIo): Promise<number> {
  if (args.length === 0 || args.includes('--help') || args.includes('-h') || args[0] === 'help') {
    await (args.length === 0 ? io.err : io.out)(USAGE);
    return args.length === 0 ? 2 : 0;
  }
  if (args.includes('--version')) {
    await io.out(`grainline calculation ${CALC_VERSION}, result version ${RESULT_VERSION}\n`);
    return 0;
  }
  const [command, ...rest] = args;
  if (command !== 'screen') {
    await io.err(`grainline: unknown command "${command}". Try: grainline --help\n`);
    return 2;
  }
  const files: string[] = [];
  let json = false;
  let quick = false;
  let colour: boolean | null = null;
  let onlyFiles = false;
  for (const a of rest) {
    if (!onlyFiles && a === '--') onlyFiles = true;
    else if (!onlyFiles && a === '--json') json = true;
    else if (!onlyFiles && a === '--quick') quick = true;
    else if (!onlyFiles && (a === '--color' || a === '--colour')) colour = true;
    else if (!onlyFiles && (a === '--no-color' || a === '--no-colour')) colour = false;
    else if (!onlyFiles && a.startsWith('-') && a !== '-') {
      await io.err(`grainline screen: unknown option "${a}". Try: grainline --help\n`);
      return 2;
    } else files.push(a);
  }
  if (files.length === 0) {
    await io.err(
      'grainline screen: name at least one file (or "-" for standard input). Try: grainline --help\n',
    );
    return 2;
  }
  const useColour = colour ?? (io.stdoutIsTerminal && io.env['NO_COLOR'] === undefined);
  return screenCommand({ files, json, quick, colour: useColour && !json }, io);
}

const entry = process.argv[1];
if (entry !== undefined && import.meta.url === pathToFileURL(entry).href) {
  runCli(process.argv.slice(2), processIo()).then(
    (code) => {
      process.exitCode = code;
    },
    (e: unknown) => {
      process.stderr.write(`grainline: ${(e as Error).stack ?? String(e)}\n`);
      process.exitCode = 2;
    },
  );
}
