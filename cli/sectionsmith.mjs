#!/usr/bin/env node
// The `sectionsmith` command. Registers tsx so the TypeScript sources run as they are right
// after `npm ci` (no build step), then hands the arguments to cli/main.ts.
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

// Our own tsconfig, whatever the working directory (a tsconfig there must not change how we run).
register({ tsconfig: fileURLToPath(new URL('../tsconfig.json', import.meta.url)) });
const { runCli, processIo } = await import('./main.ts');
process.exitCode = await runCli(process.argv.slice(2), processIo());
