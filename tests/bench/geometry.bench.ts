/**
 * validateRegion on a 1,000,000-vertex circle-like ring (gently varying radius, far from the
 * origin), against a native Float64Array sort of the ring's 1,000,000 x coordinates measured in the
 * same run: the sort is the O(n log n) floor any comparison-sort sweep would pay.
 * Target: well under a second; ratio reported against the sort.
 */
import { validateRegion } from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { medianMs, type BenchLine } from './report.ts';

const N = 1_000_000;

function bigRing(): Float64Array {
  const xy = new Float64Array(2 * N);
  for (let i = 0; i < N; i++) {
    const t = (2 * Math.PI * i) / N;
    const r = 100 * (1 + 0.01 * Math.sin(7 * t));
    xy[2 * i] = 5000 + r * Math.cos(t);
    xy[2 * i + 1] = -3000 + r * Math.sin(t);
  }
  return xy;
}

export async function bench(): Promise<BenchLine[]> {
  const xy = bigRing();
  const region: Region = [{ outer: { xy }, holes: [] }];
  const xs = new Float64Array(N);
  for (let i = 0; i < N; i++) xs[i] = xy[2 * i] ?? 0;
  const found = validateRegion(region).length;
  if (found !== 0) throw new Error(`the bench ring should be valid, got ${found} diagnostics`);
  const ms = medianMs(() => validateRegion(region), 7, 2);
  const sortMs = medianMs(() => xs.slice().sort(), 7, 2);
  return [{ name: 'geometry.validate-1M-ring', value: ms, unit: 'ms', baseline: sortMs, baselineUnit: 'ms (native sort of 1M doubles)', ratio: ms / sortMs, detail: 'target: well under 1000 ms' }];
}
