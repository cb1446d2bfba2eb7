#!/usr/bin/env node
// The `grainline` command: registers tsx (a dependency) so Node can load the TypeScript
// sources, then runs cli/main.ts. Paths are resolved from this file, so it works from any
// working directory.
import { register } from 'tsx/esm/api';

register();
const { runCli } = await import(new URL('../cli/main.ts', import.meta.url).href);
const { processIo } = await import(new URL('../cli/io.ts', import.meta.url).href);
process.exitCode = await runCli(process.argv.slice(2), processIo());
