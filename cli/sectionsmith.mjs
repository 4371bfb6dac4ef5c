#!/usr/bin/env node
// The `sectionsmith` command. Registers tsx so the TypeScript sources run as they are right
// after `npm ci` (no build step), then hands the arguments to cli/main.ts.
import { register } from 'tsx/esm/api';

register();
const { runCli, processIo } = await import('./main.ts');
process.exitCode = await runCli(process.argv.slice(2), processIo());
