/**
 * regionIntegrals on a 1,000,000-vertex straight-edged ring against a bare Float64Array
 * Green's-theorem loop (six accumulators, one pass, origin at zero) measured in the same run.
 * Target: ratio ≤ 1.5 (issue target for the properties engine).
 */
import { regionIntegrals } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { medianMs, type BenchLine } from './report.ts';

const N = 1_000_000;

/** A star-shaped ring around (1000, 2000) with a gently varying radius. */
function bigRing(): Float64Array {
  const xy = new Float64Array(2 * N);
  for (let i = 0; i < N; i++) {
    const t = (2 * Math.PI * i) / N;
    const r = 100 + 10 * Math.sin(7 * t);
    xy[2 * i] = 1000 + r * Math.cos(t);
    xy[2 * i + 1] = 2000 + r * Math.sin(t);
  }
  return xy;
}

/** The baseline: the plain vertex sums of METHODS §1.1, nothing else. */
function bareGreen(xy: Float64Array): number {
  const n = xy.length >> 1;
  let xp = xy[2 * n - 2]!, yp = xy[2 * n - 1]!;
  let a = 0, qx = 0, qy = 0, ixx = 0, iyy = 0, ixy = 0;
  for (let i = 0; i < 2 * n; i += 2) {
    const x = xy[i]!, y = xy[i + 1]!;
    const c = xp * y - x * yp;
    a += c;
    qx += (yp + y) * c;
    qy += (xp + x) * c;
    ixx += (yp * yp + yp * y + y * y) * c;
    iyy += (xp * xp + xp * x + x * x) * c;
    ixy += (xp * y + 2 * (xp * yp + x * y) + x * yp) * c;
    xp = x;
    yp = y;
  }
  return a + qx + qy + ixx + iyy + ixy;
}

export async function bench(): Promise<BenchLine[]> {
  const xy = bigRing();
  const region: Region = [{ outer: { xy }, holes: [] }];
  let sink = 0;
  const base = medianMs(() => { sink += bareGreen(xy); }, 15, 3);
  const ours = medianMs(() => { sink += regionIntegrals(region).A; }, 15, 3);
  const base2 = medianMs(() => { sink += bareGreen(xy); }, 15, 3);
  const baseline = Math.min(base, base2);
  return [
    {
      name: 'props-1M-vertex-ring',
      value: ours,
      unit: 'ms',
      baseline,
      baselineUnit: 'ms',
      ratio: ours / baseline,
      detail: `vertices=${N} (regionIntegrals with local-origin pass vs bare Green loop)${Number.isFinite(sink) ? '' : ' non-finite'}`,
    },
  ];
}
