/**
 * Simplification of dense boundary chains for the finite-element model only.
 *
 * An outline imported from a drawing or a scan can carry thousands of vertices along a curve;
 * the mesher would follow every one and solve far finer than the error budget needs. Here each
 * chain of the planar graph between two anchors is reduced by Douglas–Peucker (Douglas &
 * Peucker 1973, "Algorithms for the reduction of the number of points required to represent a
 * digitized line"): a vertex is dropped only when it lies within the tolerance δ(x, y) of the
 * chord that replaces it. Anchors are never dropped: points shared by more than two segments
 * (touching parts, T-junctions), points where the winding of the chain changes, and points on
 * exact arcs (their chord error is budgeted separately, docs/methods.md §7.8). Every chain keeps at
 * least one interior point, so two chains between the same anchors never collapse onto one
 * chord, and a closed loop without anchors is split into three chains.
 *
 * Only the mesh sees the result; the exact properties are still integrated over the user's
 * outline. The geometric change is measured, not assumed: graphMoments integrates both graphs
 * exactly (Green's theorem, docs/methods.md §1.1), and every replaced run records the area between it
 * and its chord so that the torsion module can estimate the change of J (core/torsion).
 * Not guaranteed: a chord may cross a boundary that is closer than δ; the triangulation then
 * rejects the graph (MeshInputError) and the caller falls back to a smaller tolerance.
 */
import type { PlanarGraph } from './planar-input.ts';
import { outside } from '../invariant.ts';

export interface SimplifiedGraph {
  readonly graph: PlanarGraph;
  /**
   * Per replaced run, six numbers: chord end points xa, ya, xb, yb; the material area the chord
   * adds (negative where it cuts material away); and Σ|fan triangle area| between run and chord.
   */
  readonly runs: Float64Array;
  readonly inputPoints: number;
  readonly keptPoints: number;
}

/** Net winding of segment s walked away from point p (material on the left when > 0). */
function walkNet(g: PlanarGraph, s: number, from: number): number {
  const net = g.segNet[s] ?? outside(g.segNet, s);
  return g.segA[s] === from ? net : -net;
}

function otherEnd(g: PlanarGraph, s: number, p: number): number {
  return g.segA[s] === p ? (g.segB[s] ?? outside(g.segB, s)) : (g.segA[s] ?? outside(g.segA, s));
}

interface Incidence {
  readonly start: Int32Array;
  readonly seg: Int32Array;
}

function incidence(g: PlanarGraph, n: number): Incidence {
  const start = new Int32Array(n + 1);
  for (let s = 0; s < g.segA.length; s++) {
    start[(g.segA[s] ?? outside(g.segA, s)) + 1]!++;
    start[(g.segB[s] ?? outside(g.segB, s)) + 1]!++;
  }
  for (let i = 0; i < n; i++) start[i + 1]! += start[i]!;
  const fill = start.slice(0, n);
  const seg = new Int32Array(2 * g.segA.length);
  for (let s = 0; s < g.segA.length; s++) {
    seg[fill[(g.segA[s] ?? outside(g.segA, s))]!++] = s;
    seg[fill[(g.segB[s] ?? outside(g.segB, s))]!++] = s;
  }
  return { start, seg };
}

/** Points that every simplification keeps. */
function anchorsOf(g: PlanarGraph, inc: Incidence, n: number): Uint8Array {
  const anchor = new Uint8Array(n);
  for (let p = 0; p < n; p++) {
    const from = inc.start[p]!;
    if (inc.start[p + 1]! - from !== 2 || g.onArc[p]) {
      anchor[p] = 1;
      continue;
    }
    const s1 = inc.seg[from]!;
    const s2 = inc.seg[from + 1]!;
    // Entering along s1 and leaving along s2 must carry the same winding.
    if (-walkNet(g, s1, p) !== walkNet(g, s2, p)) anchor[p] = 1;
  }
  return anchor;
}

/** Distance from point k to the segment i–j. */
function distanceToSegment(xy: readonly number[], k: number, i: number, j: number): number {
  const ax = xy[2 * i]!;
  const ay = xy[2 * i + 1]!;
  const dx = xy[2 * j]! - ax;
  const dy = xy[2 * j + 1]! - ay;
  const px = xy[2 * k]! - ax;
  const py = xy[2 * k + 1]! - ay;
  const len2 = dx * dx + dy * dy;
  const u = len2 > 0 ? Math.max(0, Math.min(1, (px * dx + py * dy) / len2)) : 0;
  return Math.hypot(px - u * dx, py - u * dy);
}

/** Douglas–Peucker over chain[0..m]; returns the kept positions (always 0, m and at least one interior one). */
function keptPositions(xy: readonly number[], chain: readonly number[], tolerance: (x: number, y: number) => number): number[] {
  const m = chain.length - 1;
  const keep = new Uint8Array(m + 1);
  keep[0] = 1;
  keep[m] = 1;
  const stack = [0, m];
  let first = true;
  while (stack.length > 0) {
    const j = stack.pop()!;
    const i = stack.pop()!;
    if (j - i < 2) continue;
    let far = -1;
    let worst = -1;
    for (let k = i + 1; k < j; k++) {
      const d = distanceToSegment(xy, chain[k]!, chain[i]!, chain[j]!);
      if (d > worst) {
        worst = d;
        far = k;
      }
    }
    const p = chain[far]!;
    if (first || worst > tolerance(xy[2 * p]!, xy[2 * p + 1]!)) {
      keep[far] = 1;
      stack.push(i, far, far, j);
    }
    first = false;
  }
  const out: number[] = [];
  for (let k = 0; k <= m; k++) if (keep[k]) out.push(k);
  return out;
}

/**
 * Signed area of the polygon run + chord back (fan from P_i) and Σ |fan triangle area|. Walking
 * with material on the left, a counter-clockwise sliver is material the chord cuts away.
 */
function runArea(xy: readonly number[], chain: readonly number[], i: number, j: number): [number, number] {
  const p = chain[i]!;
  const ox = xy[2 * p]!;
  const oy = xy[2 * p + 1]!;
  let signed = 0;
  let sum = 0;
  for (let k = i + 1; k < j; k++) {
    const a = chain[k]!;
    const b = chain[k + 1]!;
    const t = ((xy[2 * a]! - ox) * (xy[2 * b + 1]! - oy) - (xy[2 * b]! - ox) * (xy[2 * a + 1]! - oy)) / 2;
    signed += t;
    sum += Math.abs(t);
  }
  return [signed, sum];
}

/** Walks the chains of g (anchor to anchor, then loops) and hands each to `visit` with its winding. */
function eachChain(g: PlanarGraph, inc: Incidence, anchor: Uint8Array, visit: (chain: number[], net: number) => void): void {
  const used = new Uint8Array(g.segA.length);
  const follow = (p0: number, s0: number): number[] => {
    const chain = [p0];
    let p = p0;
    let s = s0;
    for (;;) {
      used[s] = 1;
      p = otherEnd(g, s, p);
      chain.push(p);
      if (anchor[p] || p === p0) return chain;
      const from = inc.start[p]!;
      s = inc.seg[from]! === s ? inc.seg[from + 1]! : inc.seg[from]!;
    }
  };
  const n = g.xy.length / 2;
  for (let p = 0; p < n; p++) {
    if (!anchor[p]) continue;
    for (let q = inc.start[p]!; q < inc.start[p + 1]!; q++) {
      const s = inc.seg[q]!;
      if (!used[s]) visit(follow(p, s), walkNet(g, s, p));
    }
  }
  for (let s = 0; s < g.segA.length; s++) {
    if (used[s]) continue;
    const p0 = g.segA[s]!;
    const loop = follow(p0, s);
    const net = walkNet(g, s, p0);
    const m = loop.length - 1;
    const t1 = Math.floor(m / 3);
    const t2 = Math.floor((2 * m) / 3);
    visit(loop.slice(0, t1 + 1), net);
    visit(loop.slice(t1, t2 + 1), net);
    visit(loop.slice(t2), net);
  }
}

/**
 * The graph with every chain reduced to the vertices that stray more than tolerance(x, y) from
 * their chord. Points and segments are renumbered; pieces, diagonal and chord sweep are kept.
 */
export function simplifiedGraph(g: PlanarGraph, tolerance: (x: number, y: number) => number): SimplifiedGraph {
  const n = g.xy.length / 2;
  const inc = incidence(g, n);
  const anchor = anchorsOf(g, inc, n);
  const newId = new Int32Array(n).fill(-1);
  const xy: number[] = [];
  const onArc: number[] = [];
  const idOf = (p: number): number => {
    if (newId[p]! < 0) {
      newId[p] = xy.length / 2;
      xy.push(g.xy[2 * p]!, g.xy[2 * p + 1]!);
      onArc.push(g.onArc[p]!);
    }
    return newId[p]!;
  };
  const segments = new Map<number, number>();
  const runs: number[] = [];
  eachChain(g, inc, anchor, (chain, net) => {
    const kept = keptPositions(g.xy, chain, tolerance);
    for (let r = 0; r + 1 < kept.length; r++) {
      const i = kept[r]!;
      const j = kept[r + 1]!;
      const a = idOf(chain[i]!);
      const b = idOf(chain[j]!);
      const key = Math.min(a, b) * 4_294_967_296 + Math.max(a, b);
      segments.set(key, (segments.get(key) ?? 0) + (a < b ? net : -net));
      if (j - i > 1) {
        const pa = chain[i]!;
        const pb = chain[j]!;
        const [signed, sum] = runArea(g.xy, chain, i, j);
        runs.push(g.xy[2 * pa]!, g.xy[2 * pa + 1]!, g.xy[2 * pb]!, g.xy[2 * pb + 1]!, -net * signed, sum);
      }
    }
  });
  const segA: number[] = [];
  const segB: number[] = [];
  const segNet: number[] = [];
  for (const [key, net] of segments) {
    segA.push(Math.floor(key / 4_294_967_296));
    segB.push(key % 4_294_967_296);
    segNet.push(net);
  }
  const graph: PlanarGraph = { xy, segA, segB, segNet, pieces: g.pieces, diagonal: g.diagonal, maxChordSweep: g.maxChordSweep, onArc: Uint8Array.from(onArc) };
  return { graph, runs: Float64Array.from(runs), inputPoints: n, keptPoints: xy.length / 2 };
}

/** Exact area integrals of the material of a graph (net-weighted segments, docs/methods.md §1.1), about the origin. */
export interface GraphMoments {
  readonly area: number;
  readonly cx: number;
  readonly cy: number;
  /** Centroidal ∫Y², ∫X², ∫XY. */
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
}

export function graphMoments(g: PlanarGraph): GraphMoments {
  // A local origin keeps the sums well conditioned (docs/methods.md §1.3).
  const ox = g.xy[0] ?? outside(g.xy, 0);
  const oy = g.xy[1] ?? outside(g.xy, 1);
  let A = 0, Qx = 0, Qy = 0, Ixx = 0, Iyy = 0, Ixy = 0;
  for (let s = 0; s < g.segA.length; s++) {
    const w = g.segNet[s]!;
    if (w === 0) continue;
    const a = g.segA[s]!;
    const b = g.segB[s]!;
    const x0 = g.xy[2 * a]! - ox, y0 = g.xy[2 * a + 1]! - oy;
    const x1 = g.xy[2 * b]! - ox, y1 = g.xy[2 * b + 1]! - oy;
    const c = w * (x0 * y1 - x1 * y0);
    A += c;
    Qx += (y0 + y1) * c;
    Qy += (x0 + x1) * c;
    Ixx += (y0 * y0 + y0 * y1 + y1 * y1) * c;
    Iyy += (x0 * x0 + x0 * x1 + x1 * x1) * c;
    Ixy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c;
  }
  A /= 2;
  const xc = Qy / 6 / A;
  const yc = Qx / 6 / A;
  return { area: A, cx: ox + xc, cy: oy + yc, Ix: Ixx / 12 - A * yc * yc, Iy: Iyy / 12 - A * xc * xc, Ixy: Ixy / 24 - A * xc * yc };
}
