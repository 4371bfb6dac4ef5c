/**
 * `npm run bench`: runs every tests/bench/*.bench.ts module in name order. Each module exports
 * `bench(): Promise<BenchLine[]>`; lines are printed as they come, in the format of report.ts.
 * Usage: npm run bench [-- NAME-FILTER]
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { printBench, type BenchLine } from './report.ts';

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2] ?? '';
const files = readdirSync(here).filter((f) => f.endsWith('.bench.ts') && f.includes(filter)).sort();
let failed = false;
for (const file of files) {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { bench: () => Promise<BenchLine[]> };
  try {
    for (const line of await mod.bench()) printBench(line);
  } catch (err) {
    failed = true;
    console.error(`bench: ${file} failed: ${err instanceof Error ? err.message : String(err)}`);
  }
}
if (files.length === 0) console.error(`bench: no bench file matches "${filter}"`);
process.exitCode = failed || files.length === 0 ? 1 : 0;
