#!/usr/bin/env node
// The `sectionsmith` command. Runs cli/main.ts from a bundle that cli/bundle.mjs keeps in step
// with the sources (rebuilt whenever any input changed), or, where no bundle can be made, from
// the TypeScript sources through tsx. Either way it works right after `npm ci`, with no build step.
import { fileURLToPath } from 'node:url';
import { loadCli } from './bundle.mjs';

// A defect outside runCli (start-up, a late asynchronous throw) exits 3 like any internal error
// (cli/command.ts EXIT_BUG), never Node's default 1, which `check` uses for "rows flagged".
const EXIT_BUG = 3;
const bug = (error) => {
  process.stderr.write(`sectionsmith: internal error (please report it): ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(EXIT_BUG);
};
process.on('uncaughtException', bug);
process.on('unhandledRejection', bug);

try {
  let cli = await loadCli();
  if (cli === null) {
    const { register } = await import('tsx/esm/api');
    // Our own tsconfig, whatever the working directory (a tsconfig there must not change how we run).
    register({ tsconfig: fileURLToPath(new URL('../tsconfig.json', import.meta.url)) });
    cli = await import('./main.ts');
  }
  process.exitCode = await cli.runCli(process.argv.slice(2), cli.processIo());
} catch (error) {
  bug(error);
}
