/**
 * The long run of the random-document suite (tests/hardening/random-documents.test.ts runs 10⁴
 * in `npm test`): 10⁵ documents, valid and corrupted, through load, validate, compose,
 * properties and the exports, with a seed of its own, counting failures (expected 0). The value
 * is the time per document; the baseline is parsing the same texts alone.
 */
import fc from 'fast-check';
import type { BenchLine } from './report.ts';
import { randomDocumentText, runPipeline } from '../hardening/random-documents.ts';

const RUNS = 100_000;
const SEED = 1_800_000 + 18;

export async function bench(): Promise<BenchLine[]> {
  const texts = fc.sample(randomDocumentText, { seed: SEED, numRuns: RUNS }).map((d) => d.text);
  let failures = 0;
  let first = '';
  const t0 = performance.now();
  for (const text of texts) {
    try {
      runPipeline(text);
    } catch (err) {
      failures += 1;
      if (first === '') first = `${err instanceof Error ? err.message : String(err)} on ${text.slice(0, 200)}`;
    }
  }
  const ms = performance.now() - t0;
  const p0 = performance.now();
  for (const text of texts) {
    try { JSON.parse(text); } catch { /* a truncated text: refused by the pipeline too */ }
  }
  const parseMs = performance.now() - p0;
  return [{
    name: 'fuzz-documents-1e5',
    value: (ms / RUNS) * 1000,
    unit: 'µs/doc',
    baseline: (parseMs / RUNS) * 1000,
    baselineUnit: 'µs/doc (JSON.parse alone)',
    ratio: ms / parseMs,
    detail: `${RUNS} documents, ${failures} failures${first ? `; first: ${first}` : ''}`,
  }];
}
