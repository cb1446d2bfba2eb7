/**
 * What the command line touches of the outside world, behind one interface so tests can run
 * it in memory: standard output and error (with back-pressure, so a slow reader never makes
 * output pile up in memory), input files as byte streams, and whether output is a terminal.
 */
import { open } from 'node:fs/promises';
import type { Writable } from 'node:stream';

export interface CliIo {
  out(text: string): Promise<void>;
  err(text: string): Promise<void>;
  /** The bytes of a file ("-": standard input); rejects when the file cannot be opened. */
  open(path: string): Promise<AsyncIterable<Buffer | string>>;
  /** True when standard output is a terminal. */
  stdoutIsTerminal: boolean;
  env: Record<string, string | undefined>;
}

/** Size of the chunks read from files (1 MiB): few events per chunk, little memory. */
const READ_CHUNK_BYTES = 1 << 20;

function writer(stream: Writable): (text: string) => Promise<void> {
  return (text) =>
    new Promise((resolve, reject) => {
      if (text.length === 0) return resolve();
      const ok = stream.write(text, (e) => (e ? reject(e) : undefined));
      if (ok) resolve();
      else stream.once('drain', () => resolve());
    });
}

/** The process's own streams and files. */
export function processIo(): CliIo {
  // A reader that stops early (`grainline screen … | head`) closes the pipe: stop quietly.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
  return {
    out: writer(process.stdout),
    err: writer(process.stderr),
    async open(path) {
      if (path === '-') return process.stdin;
      const handle = await open(path, 'r');
      return handle.createReadStream({ highWaterMark: READ_CHUNK_BYTES });
    },
    stdoutIsTerminal: process.stdout.isTTY === true,
    env: process.env,
  };
}
