/**
 * regionIntegrals on a 1,000,000-vertex straight-edged ring against a bare Float64Array
 * Green's-theorem loop (six accumulators, one pass, origin at zero) measured in the same run.
 * Target: ratio ≤ 1.5 (issue target for the properties engine).
 * Second line (information, no target): every property of the contract, including four plastic
 * neutral axes, for a 10,000-vertex ring, against regionIntegrals alone on the same ring.
 */
import { regionIntegrals, sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { medianMs, type BenchLine } from './report.ts';

const N = 1_000_000;

/** A star-shaped ring around (1000, 2000) with a gently varying radius. */
function bigRing(count = N): Float64Array {
  const xy = new Float64Array(2 * count);
  for (let i = 0; i < count; i++) {
    const t = (2 * Math.PI * i) / count;
    const r = 100 + 10 * Math.sin(7 * t);
    xy[2 * i] = 1000 + r * Math.cos(t);
    xy[2 * i + 1] = 2000 + r * Math.sin(t);
  }
  return xy;
}

/** The baseline: the plain vertex sums of docs/methods.md §1.1, nothing else. */
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

function interleavedMinMs(a: () => void, b: () => void, rounds: number): [number, number] {
  let ta = Infinity, tb = Infinity;
  for (let k = 0; k < 3; k++) { a(); b(); }
  for (let k = 0; k < rounds; k++) {
    let t0 = performance.now();
    a();
    ta = Math.min(ta, performance.now() - t0);
    t0 = performance.now();
    b();
    tb = Math.min(tb, performance.now() - t0);
  }
  return [ta, tb];
}

export async function bench(): Promise<BenchLine[]> {
  const xy = bigRing();
  const region: Region = [{ outer: { xy }, holes: [] }];
  let sink = 0;
  // Interleaved runs, fastest of each: on a shared, loaded machine the minimum is the least noisy
  // estimate of the cost itself, and interleaving exposes both loops to the same load.
  const [ours, baseline] = interleavedMinMs(
    () => { sink += regionIntegrals(region).A; },
    () => { sink += bareGreen(xy); },
    25,
  );
  const small: Region = [{ outer: { xy: bigRing(10_000) }, holes: [] }];
  const full = medianMs(() => { sink += sectionProperties(small).Zx; }, 7, 2);
  const integralsOnly = medianMs(() => { sink += regionIntegrals(small).A; }, 15, 3);
  return [
    {
      name: 'props-1M-vertex-ring',
      value: ours,
      unit: 'ms',
      baseline,
      baselineUnit: 'ms',
      ratio: ours / baseline,
      detail: `vertices=${N}, fastest of 25 interleaved runs (regionIntegrals vs bare Green loop)${Number.isFinite(sink) ? '' : ' non-finite'}`,
    },
    {
      name: 'props-section-10k-vertex-ring',
      value: full,
      unit: 'ms',
      baseline: integralsOnly,
      baselineUnit: 'ms',
      ratio: full / integralsOnly,
      detail: 'sectionProperties (all fields, 4 plastic axes) vs regionIntegrals alone; information only',
    },
  ];
}
