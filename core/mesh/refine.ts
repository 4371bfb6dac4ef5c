/**
 * Delaunay refinement (Ruppert 1995; Chew's second algorithm; Shewchuk's exposition) of a
 * constrained Delaunay triangulation, done in batches: each round re-triangulates all points
 * (cdt.ts), classifies triangles by winding number, then
 *   1. splits every boundary segment whose diametral circle holds the apex of an adjacent
 *      material triangle (encroachment), and
 *   2. inserts the circumcentres of triangles that are too large for the size field, and the
 *      off-centres (Üngör) of triangles whose smallest angle is below the target, choosing an independent set of them (no two in
 *      the same or adjacent triangles) so one round never inserts near-duplicate points.
 *      A circumcentre that encroaches a segment, or is hidden behind one, splits that segment
 *      instead (Ruppert's rule).
 * Triangles whose smallest angle sits between two boundary segments (a sharp input corner) are
 * not refined for angle, only for size; this keeps small input angles from looping.
 * Guards: at most MAX_ROUNDS rounds and options.maxPoints points, else MeshRefinementError.
 */
import { constrainedTriangulation, type ConstrainedTriangulation } from './cdt.ts';
import type { SizeField } from './size-field.ts';
import { MeshCancelledError, MeshRefinementError } from './types.ts';
import { outside } from '../invariant.ts';

export interface RefineInput {
  readonly xy: number[];
  readonly segA: number[];
  readonly segB: number[];
  readonly segNet: number[];
}

export interface RefineSettings {
  readonly size: SizeField;
  readonly minAngleRad: number;
  readonly maxPoints: number;
  readonly onProgress?: ((fraction: number) => boolean | void) | undefined;
}

export interface RefinedTriangles {
  readonly xy: Float64Array;
  /** CCW corner triples of the material triangles (indices into xy). */
  readonly triangles: Int32Array;
  readonly rounds: number;
  readonly insertedPoints: number;
  readonly badTriangles: number;
}

const MAX_ROUNDS = 400;
/** Circumradius of an equilateral triangle of edge h is h/√3; allow 15 % over that. */
const SIZE_RADIUS_RATIO = 1.15 / Math.sqrt(3);
const KEY = 4_194_304; // 2^22: segment keys a·KEY + b stay exact in doubles for < 2^31 points

const next = (e: number): number => (e % 3 === 2 ? e - 2 : e + 1);
const prev = (e: number): number => (e % 3 === 0 ? e + 2 : e - 1);

interface Round {
  readonly cdt: ConstrainedTriangulation;
  readonly sign: Int8Array;
  readonly inside: Uint8Array;
  readonly segOf: Map<number, number>;
}

function segmentKeyMap(w: RefineInput): Map<number, number> {
  const m = new Map<number, number>();
  for (let s = 0; s < w.segA.length; s++) m.set((w.segA[s] ?? outside(w.segA, s)) * KEY + (w.segB[s] ?? outside(w.segB, s)), s);
  return m;
}

function segmentOfEdge(r: Round, a: number, b: number): number {
  return r.segOf.get(Math.min(a, b) * KEY + Math.max(a, b)) ?? -1;
}

/** Net winding gained crossing from the right of a→b to its left (0 for unconstrained edges). */
function netAcross(w: RefineInput, r: Round, e: number): number {
  if (!r.cdt.isConstrained(e)) return 0;
  const a = r.cdt.triangles[e] ?? outside(r.cdt.triangles, e);
  const b = r.cdt.triangles[next(e)] ?? outside(r.cdt.triangles, next(e));
  const s = segmentOfEdge(r, a, b);
  if (s < 0) return 0;
  const net = w.segNet[s] ?? outside(w.segNet, s);
  return a < b ? net : -net;
}

function orient(xy: ArrayLike<number>, a: number, b: number, px: number, py: number): number {
  const ax = xy[2 * a] ?? outside(xy, 2 * a);
  const ay = xy[2 * a + 1] ?? outside(xy, 2 * a + 1);
  return ((xy[2 * b] ?? outside(xy, 2 * b)) - ax) * (py - ay) - ((xy[2 * b + 1] ?? outside(xy, 2 * b + 1)) - ay) * (px - ax);
}

/** Winding number of each triangle by a breadth-first walk from the convex hull (outside = 0). */
function classify(w: RefineInput, cdt: ConstrainedTriangulation, coords: Float64Array): Round {
  const tri = cdt.triangles;
  const count = tri.length / 3;
  const sign = new Int8Array(count);
  for (let t = 0; t < count; t++) {
    const c = tri[3 * t + 2] ?? outside(tri, 3 * t + 2);
    sign[t] = orient(coords, (tri[3 * t] ?? outside(tri, 3 * t)), (tri[3 * t + 1] ?? outside(tri, 3 * t + 1)), (coords[2 * c] ?? outside(coords, 2 * c)), (coords[2 * c + 1] ?? outside(coords, 2 * c + 1))) > 0 ? 1 : -1;
  }
  const round: Round = { cdt, sign, inside: new Uint8Array(count), segOf: segmentKeyMap(w) };
  const winding = new Int32Array(count);
  const seen = new Uint8Array(count);
  const queue: number[] = [];
  for (let e = 0; e < tri.length; e++) {
    const t = Math.floor(e / 3);
    if ((cdt.halfedges[e] ?? outside(cdt.halfedges, e)) >= 0 || seen[t]) continue;
    seen[t] = 1;
    winding[t] = (sign[t] ?? outside(sign, t)) * netAcross(w, round, e);
    queue.push(t);
  }
  for (let q = 0; q < queue.length; q++) {
    const t = queue[q] ?? outside(queue, q);
    for (let k = 0; k < 3; k++) {
      const e = 3 * t + k;
      const f = cdt.halfedges[e] ?? outside(cdt.halfedges, e);
      const u = Math.floor(f / 3);
      if (f < 0 || seen[u]) continue;
      seen[u] = 1;
      winding[u] = (winding[t] ?? outside(winding, t)) - (sign[t] ?? outside(sign, t)) * netAcross(w, round, e);
      queue.push(u);
    }
  }
  for (let t = 0; t < count; t++) round.inside[t] = winding[t] !== 0 ? 1 : 0;
  return round;
}

/** Segments whose diametral circle holds the apex of an adjacent material triangle. */
function encroachedSegments(r: Round, coords: Float64Array, into: Set<number>): void {
  const tri = r.cdt.triangles;
  for (let e = 0; e < tri.length; e++) {
    if (!r.inside[Math.floor(e / 3)] || !r.cdt.isConstrained(e)) continue;
    const a = tri[e] ?? outside(tri, e);
    const b = tri[next(e)] ?? outside(tri, next(e));
    const c = tri[prev(e)] ?? outside(tri, prev(e));
    const ux = (coords[2 * a] ?? outside(coords, 2 * a)) - (coords[2 * c] ?? outside(coords, 2 * c));
    const uy = (coords[2 * a + 1] ?? outside(coords, 2 * a + 1)) - (coords[2 * c + 1] ?? outside(coords, 2 * c + 1));
    const vx = (coords[2 * b] ?? outside(coords, 2 * b)) - (coords[2 * c] ?? outside(coords, 2 * c));
    const vy = (coords[2 * b + 1] ?? outside(coords, 2 * b + 1)) - (coords[2 * c + 1] ?? outside(coords, 2 * c + 1));
    if (ux * vx + uy * vy < -1e-12 * Math.hypot(ux, uy) * Math.hypot(vx, vy)) {
      const s = segmentOfEdge(r, a, b);
      if (s >= 0) into.add(s);
    }
  }
}

interface Circle {
  readonly x: number;
  readonly y: number;
  readonly r: number;
  readonly sinMin: number;
  /** Index 0..2 of the shortest edge (from corner k to corner k + 1). */
  readonly shortest: number;
}

function circumcircle(coords: Float64Array, tri: Uint32Array, t: number): Circle {
  const i0 = tri[3 * t] ?? outside(tri, 3 * t);
  const i1 = tri[3 * t + 1] ?? outside(tri, 3 * t + 1);
  const i2 = tri[3 * t + 2] ?? outside(tri, 3 * t + 2);
  const ax = coords[2 * i0] ?? outside(coords, 2 * i0);
  const ay = coords[2 * i0 + 1] ?? outside(coords, 2 * i0 + 1);
  const bx = (coords[2 * i1] ?? outside(coords, 2 * i1)) - ax;
  const by = (coords[2 * i1 + 1] ?? outside(coords, 2 * i1 + 1)) - ay;
  const cx = (coords[2 * i2] ?? outside(coords, 2 * i2)) - ax;
  const cy = (coords[2 * i2 + 1] ?? outside(coords, 2 * i2 + 1)) - ay;
  const d = 2 * (bx * cy - by * cx);
  const b2 = bx * bx + by * by;
  const c2 = cx * cx + cy * cy;
  const ox = (cy * b2 - by * c2) / d;
  const oy = (bx * c2 - cx * b2) / d;
  const r = Math.hypot(ox, oy);
  const l = [Math.sqrt(b2), Math.hypot(cx - bx, cy - by), Math.sqrt(c2)];
  let shortest = 0;
  for (let k = 1; k < 3; k++) if ((l[k] ?? outside(l, k)) < (l[shortest] ?? outside(l, shortest))) shortest = k;
  return { x: ax + ox, y: ay + oy, r, sinMin: (l[shortest] ?? outside(l, shortest)) / (2 * r), shortest };
}

/**
 * Walks the straight line from triangle t's centroid to (px, py). Returns the triangle holding
 * the point, or −(1 + half-edge) of the constrained edge that hides it, or null at the step cap.
 */
function walkTo(r: Round, coords: Float64Array, t: number, px: number, py: number): number | null {
  const tri = r.cdt.triangles;
  const c = (k: number): number => (tri[3 * t + k] ?? outside(tri, 3 * t + k));
  const gx = ((coords[2 * c(0)] ?? outside(coords, 2 * c(0))) + (coords[2 * c(1)] ?? outside(coords, 2 * c(1))) + (coords[2 * c(2)] ?? outside(coords, 2 * c(2)))) / 3;
  const gy = ((coords[2 * c(0) + 1] ?? outside(coords, 2 * c(0) + 1)) + (coords[2 * c(1) + 1] ?? outside(coords, 2 * c(1) + 1)) + (coords[2 * c(2) + 1] ?? outside(coords, 2 * c(2) + 1))) / 3;
  let cur = t;
  let entered = -1;
  for (let step = 0; step < 10_000; step++) {
    let exit = -1;
    for (let k = 0; k < 3 && exit < 0; k++) {
      const e = 3 * cur + k;
      if (e === entered) continue;
      const a = tri[e] ?? outside(tri, e);
      const b = tri[next(e)] ?? outside(tri, next(e));
      if ((r.sign[cur] ?? outside(r.sign, cur)) * orient(coords, a, b, px, py) >= 0) continue;
      const oa = (px - gx) * ((coords[2 * a + 1] ?? outside(coords, 2 * a + 1)) - gy) - (py - gy) * ((coords[2 * a] ?? outside(coords, 2 * a)) - gx);
      const ob = (px - gx) * ((coords[2 * b + 1] ?? outside(coords, 2 * b + 1)) - gy) - (py - gy) * ((coords[2 * b] ?? outside(coords, 2 * b)) - gx);
      if (oa * ob <= 0) exit = e;
    }
    if (exit < 0) return cur;
    if (r.cdt.isConstrained(exit)) return -(1 + exit);
    const f = r.cdt.halfedges[exit] ?? outside(r.cdt.halfedges, exit);
    if (f < 0) return -(1 + exit);
    entered = f;
    cur = Math.floor(f / 3);
  }
  return null;
}

/** Sparse grid of segment diametral discs, for the encroachment test of new points. */
function discGrid(w: RefineInput, cell: number): (x: number, y: number) => number[] {
  const cells = new Map<number, number[]>();
  const key = (i: number, j: number): number => i * 1_048_576 + j;
  for (let s = 0; s < w.segA.length; s++) {
    const a = w.segA[s] ?? outside(w.segA, s);
    const b = w.segB[s] ?? outside(w.segB, s);
    const mx = ((w.xy[2 * a] ?? outside(w.xy, 2 * a)) + (w.xy[2 * b] ?? outside(w.xy, 2 * b))) / 2;
    const my = ((w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1)) + (w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1))) / 2;
    const rad = Math.hypot((w.xy[2 * b] ?? outside(w.xy, 2 * b)) - (w.xy[2 * a] ?? outside(w.xy, 2 * a)), (w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1)) - (w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1))) / 2;
    for (let i = Math.floor((mx - rad) / cell); i <= Math.floor((mx + rad) / cell); i++) {
      for (let j = Math.floor((my - rad) / cell); j <= Math.floor((my + rad) / cell); j++) {
        const k = key(i, j);
        const list = cells.get(k);
        if (list) list.push(s);
        else cells.set(k, [s]);
      }
    }
  }
  return (x, y) => cells.get(key(Math.floor(x / cell), Math.floor(y / cell))) ?? [];
}

function meanSegmentLength(w: RefineInput): number {
  let sum = 0;
  for (let s = 0; s < w.segA.length; s++) {
    const a = w.segA[s] ?? outside(w.segA, s);
    const b = w.segB[s] ?? outside(w.segB, s);
    sum += Math.hypot((w.xy[2 * b] ?? outside(w.xy, 2 * b)) - (w.xy[2 * a] ?? outside(w.xy, 2 * a)), (w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1)) - (w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1)));
  }
  return sum / Math.max(1, w.segA.length);
}

function encroaches(w: RefineInput, s: number, x: number, y: number): boolean {
  const a = w.segA[s] ?? outside(w.segA, s);
  const b = w.segB[s] ?? outside(w.segB, s);
  const ax = w.xy[2 * a] ?? outside(w.xy, 2 * a);
  const ay = w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1);
  const bx = w.xy[2 * b] ?? outside(w.xy, 2 * b);
  const by = w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1);
  return (ax - x) * (bx - x) + (ay - y) * (by - y) < 0;
}

function splitSegment(w: RefineInput, s: number): void {
  const a = w.segA[s] ?? outside(w.segA, s);
  const b = w.segB[s] ?? outside(w.segB, s);
  const m = w.xy.length / 2;
  w.xy.push(((w.xy[2 * a] ?? outside(w.xy, 2 * a)) + (w.xy[2 * b] ?? outside(w.xy, 2 * b))) / 2, ((w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1)) + (w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1))) / 2);
  const net = w.segNet[s] ?? outside(w.segNet, s);
  // a < b < m: (a, m) keeps the direction of a → b, (b, m) reverses it.
  w.segB[s] = m;
  w.segA.push(b);
  w.segB.push(m);
  w.segNet.push(-net);
}

/** Splits boundary segments until each is no longer than the size field at its midpoint. */
export function presplitSegments(w: RefineInput, size: SizeField, maxPoints: number): void {
  for (let s = 0; s < w.segA.length; s++) {
    for (;;) {
      const a = w.segA[s] ?? outside(w.segA, s);
      const b = w.segB[s] ?? outside(w.segB, s);
      const ax = w.xy[2 * a] ?? outside(w.xy, 2 * a);
      const ay = w.xy[2 * a + 1] ?? outside(w.xy, 2 * a + 1);
      const bx = w.xy[2 * b] ?? outside(w.xy, 2 * b);
      const by = w.xy[2 * b + 1] ?? outside(w.xy, 2 * b + 1);
      if (Math.hypot(bx - ax, by - ay) <= size.at((ax + bx) / 2, (ay + by) / 2)) break;
      if (w.xy.length / 2 >= maxPoints) throw new MeshRefinementError(`boundary splitting reached the cap of ${maxPoints} points`, w.xy.length / 2, 0);
      splitSegment(w, s);
    }
  }
}

interface Candidate {
  readonly t: number;
  readonly c: Circle;
  /** The point to insert: the circumcentre, or the off-centre for a triangle bad in angle only. */
  readonly x: number;
  readonly y: number;
}

/**
 * Üngör's off-centre (Üngör 2004, "Off-centers: a new type of Steiner points for computing
 * size-optimal quality-guaranteed Delaunay triangulations"): on the bisector of the shortest
 * edge, at the distance where that edge subtends the target angle, when nearer than the
 * circumcentre. Fewer points than circumcentres, same quality bound.
 */
function offCentre(coords: Float64Array, tri: Uint32Array, t: number, c: Circle, minAngleRad: number): [number, number] {
  const p = tri[3 * t + c.shortest] ?? outside(tri, 3 * t + c.shortest);
  const q = tri[3 * t + ((c.shortest + 1) % 3)] ?? outside(tri, 3 * t + ((c.shortest + 1) % 3));
  const mx = ((coords[2 * p] ?? outside(coords, 2 * p)) + (coords[2 * q] ?? outside(coords, 2 * q))) / 2;
  const my = ((coords[2 * p + 1] ?? outside(coords, 2 * p + 1)) + (coords[2 * q + 1] ?? outside(coords, 2 * q + 1))) / 2;
  const half = Math.hypot((coords[2 * q] ?? outside(coords, 2 * q)) - (coords[2 * p] ?? outside(coords, 2 * p)), (coords[2 * q + 1] ?? outside(coords, 2 * q + 1)) - (coords[2 * p + 1] ?? outside(coords, 2 * p + 1))) / 2;
  const dc = Math.hypot(c.x - mx, c.y - my);
  const d = half / Math.tan(minAngleRad / 2);
  if (!(d < dc) || dc === 0) return [c.x, c.y];
  return [mx + ((c.x - mx) * d) / dc, my + ((c.y - my) * d) / dc];
}

function badTriangles(r: Round, coords: Float64Array, s: RefineSettings): { list: Candidate[]; angleOnly: number } {
  const tri = r.cdt.triangles;
  const sinTarget = Math.sin(s.minAngleRad);
  const list: Candidate[] = [];
  let angleOnly = 0;
  for (let t = 0; t < tri.length / 3; t++) {
    if (!r.inside[t]) continue;
    const c = circumcircle(coords, tri, t);
    const i0 = tri[3 * t] ?? outside(tri, 3 * t);
    const i1 = tri[3 * t + 1] ?? outside(tri, 3 * t + 1);
    const i2 = tri[3 * t + 2] ?? outside(tri, 3 * t + 2);
    const gx = ((coords[2 * i0] ?? outside(coords, 2 * i0)) + (coords[2 * i1] ?? outside(coords, 2 * i1)) + (coords[2 * i2] ?? outside(coords, 2 * i2))) / 3;
    const gy = ((coords[2 * i0 + 1] ?? outside(coords, 2 * i0 + 1)) + (coords[2 * i1 + 1] ?? outside(coords, 2 * i1 + 1)) + (coords[2 * i2 + 1] ?? outside(coords, 2 * i2 + 1))) / 3;
    const tooLarge = c.r > SIZE_RADIUS_RATIO * s.size.at(gx, gy);
    let tooSharp = c.sinMin < sinTarget;
    if (tooSharp && !tooLarge) {
      // Smallest angle is opposite the shortest edge; its two edges both constrained = input corner.
      const k = c.shortest;
      const inputCorner = r.cdt.isConstrained(3 * t + ((k + 1) % 3)) && r.cdt.isConstrained(3 * t + ((k + 2) % 3));
      if (inputCorner) {
        tooSharp = false;
        angleOnly++;
      }
    }
    if (tooLarge) list.push({ t, c, x: c.x, y: c.y });
    else if (tooSharp) {
      const [x, y] = offCentre(coords, tri, t, c, s.minAngleRad);
      list.push({ t, c, x, y });
    }
  }
  list.sort((p, q) => q.c.r - p.c.r);
  return { list, angleOnly };
}

/** One round's insertions: Ruppert's rule with an independent set of circumcentres. */
function chooseInsertions(w: RefineInput, r: Round, coords: Float64Array, bad: readonly Candidate[], split: Set<number>): number[] {
  const blocked = new Uint8Array(r.inside.length);
  const discs = discGrid(w, meanSegmentLength(w));
  const points: number[] = [];
  for (const { t, x: px, y: py } of bad) {
    if (blocked[t]) continue;
    const hit = walkTo(r, coords, t, px, py);
    if (hit === null) continue;
    if (hit < 0) {
      const e = -hit - 1;
      const seg = segmentOfEdge(r, (r.cdt.triangles[e] ?? outside(r.cdt.triangles, e)), (r.cdt.triangles[next(e)] ?? outside(r.cdt.triangles, next(e))));
      if (seg >= 0) split.add(seg);
      continue;
    }
    if (blocked[hit]) continue;
    let encroaching = false;
    for (const s of discs(px, py)) {
      if (encroaches(w, s, px, py)) {
        split.add(s);
        encroaching = true;
      }
    }
    if (encroaching) continue;
    points.push(px, py);
    blocked[hit] = 1;
    blocked[t] = 1;
    for (let k = 0; k < 3; k++) {
      const f = r.cdt.halfedges[3 * hit + k] ?? outside(r.cdt.halfedges, 3 * hit + k);
      if (f >= 0) blocked[Math.floor(f / 3)] = 1;
    }
  }
  return points;
}

/**
 * Four far points around the input so that no boundary edge lies on the convex hull: nearly
 * collinear split points on hull edges make slivers that the constraint step cannot flip.
 */
function addFrame(w: RefineInput): void {
  let xmin = Infinity;
  let ymin = Infinity;
  let xmax = -Infinity;
  let ymax = -Infinity;
  for (let i = 0; i < w.xy.length; i += 2) {
    xmin = Math.min(xmin, (w.xy[i] ?? outside(w.xy, i)));
    xmax = Math.max(xmax, (w.xy[i] ?? outside(w.xy, i)));
    ymin = Math.min(ymin, (w.xy[i + 1] ?? outside(w.xy, i + 1)));
    ymax = Math.max(ymax, (w.xy[i + 1] ?? outside(w.xy, i + 1)));
  }
  const pad = Math.hypot(xmax - xmin, ymax - ymin);
  w.xy.push(xmin - pad, ymin - pad, xmax + pad, ymin - pad, xmax + pad, ymax + pad, xmin - pad, ymax + pad);
}

export function refineTriangulation(w: RefineInput, s: RefineSettings): RefinedTriangles {
  addFrame(w);
  const initialPoints = w.xy.length / 2;
  for (let round = 1; round <= MAX_ROUNDS; round++) {
    const coords = Float64Array.from(w.xy);
    const r = classify(w, constrainedTriangulation(coords, w.segA, w.segB), coords);
    const split = new Set<number>();
    encroachedSegments(r, coords, split);
    const bad = badTriangles(r, coords, s);
    const points = chooseInsertions(w, r, coords, bad.list, split);
    if (split.size === 0 && points.length === 0) {
      return finish(coords, r, round, coords.length / 2 - initialPoints, bad.angleOnly);
    }
    for (const seg of split) splitSegment(w, seg);
    for (const p of points) w.xy.push(p);
    if (w.xy.length / 2 > s.maxPoints) {
      throw new MeshRefinementError(`mesh refinement reached the cap of ${s.maxPoints} points after ${round} rounds`, w.xy.length / 2, round);
    }
    if (s.onProgress && s.onProgress(Math.min(0.95, round / (round + 8))) === false) throw new MeshCancelledError();
  }
  throw new MeshRefinementError(`mesh refinement did not settle within ${MAX_ROUNDS} rounds`, w.xy.length / 2, MAX_ROUNDS);
}

function finish(coords: Float64Array, r: Round, rounds: number, insertedPoints: number, badTriangles: number): RefinedTriangles {
  const tri = r.cdt.triangles;
  const out: number[] = [];
  for (let t = 0; t < r.inside.length; t++) {
    if (!r.inside[t]) continue;
    const a = tri[3 * t] ?? outside(tri, 3 * t);
    const b = tri[3 * t + 1] ?? outside(tri, 3 * t + 1);
    const c = tri[3 * t + 2] ?? outside(tri, 3 * t + 2);
    if ((r.sign[t] ?? outside(r.sign, t)) > 0) out.push(a, b, c);
    else out.push(a, c, b);
  }
  return { xy: coords, triangles: Int32Array.from(out), rounds, insertedPoints, badTriangles };
}
