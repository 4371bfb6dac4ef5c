// `npm run test:browser`: every tests/browser/*.test.mjs in name order; each file exports async
// test functions taking { page, baseUrl, artifactsDir, context }. Prints one line per test and a
// final line "N passed, N failed" (CI reads it); exits non-zero on any failure.
// `node tests/browser/run.mjs host` runs only the files whose name contains "host".
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { runOne, startHarness, testFiles } from './harness.mjs';

const filter = process.argv[2];
let passed = 0;
let failed = 0;
let harness;
try {
  harness = await startHarness();
  for (const file of await testFiles(filter)) {
    const module = await import(pathToFileURL(file).href);
    for (const [name, test] of Object.entries(module)) {
      if (typeof test !== 'function') continue;
      const label = `${path.basename(file, '.test.mjs')} › ${name}`;
      const result = await runOne(harness, label, test);
      if (result.ok) {
        passed += 1;
        console.log(`✓ ${label} (${result.ms} ms)`);
      } else {
        failed += 1;
        console.log(`✗ ${label} (${result.ms} ms)\n    ${String(result.error?.message ?? result.error).split('\n').join('\n    ')}`);
      }
    }
  }
} catch (error) {
  failed += 1;
  console.log(`✗ browser test harness: ${error instanceof Error ? error.message : String(error)}`);
} finally {
  await harness?.stop().catch(() => undefined);
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
