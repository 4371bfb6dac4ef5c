/**
 * Region → planar straight-line graph for the mesher.
 *
 * Every ring is flattened (flatten.ts) and oriented so that material lies on its left (outer rings
 * counter-clockwise, holes clockwise, the Region contract's winding). Coincident vertices of
 * different rings are merged within 1e-9 × the bounding-box diagonal, so touching parts share
 * nodes; a vertex lying on another ring's edge splits that edge (T-junction). Each undirected
 * edge keeps its net winding (+1 per use a→b, −1 per use b→a): a shared edge between two touching
 * parts has net 0 and is interior to the material. What it does not do: repair self-intersections
 * or overlaps; those surface later as MeshInputError from the triangulation.
 */
import type { Polygon, Region } from '../geometry/types.ts';
import { flattenRingChords, polylineSignedArea } from './flatten.ts';
import { MeshInputError } from './types.ts';
import { outside } from '../invariant.ts';

export interface PlanarGraph {
  /** Point coordinates (x, y pairs). */
  readonly xy: number[];
  /** Segment end points with segA[i] < segB[i]. */
  readonly segA: number[];
  readonly segB: number[];
  /** Net winding of segment i in the direction segA → segB (material on the left when > 0). */
  readonly segNet: number[];
  /** Per polygon: material area and bounding box [xmin, ymin, xmax, ymax]. */
  readonly pieces: { readonly area: number; readonly box: readonly [number, number, number, number] }[];
  readonly diagonal: number;
  readonly maxChordSweep: number;
  /** Per point: 1 when it lies on an exact arc (kept by simplify.ts, whose chords are already budgeted). */
  readonly onArc: Uint8Array;
}

interface OrientedRing {
  readonly xy: number[];
  readonly onArc: number[];
  readonly polygon: number;
  readonly ring: number;
}

function checkedRing(p: Polygon, polygon: number, ring: number, maxSweep: number): { xy: number[]; onArc: number[]; sweep: number; area: number } {
  const r = ring < 0 ? p.outer : p.holes[ring];
  const where = ring < 0 ? `polygon ${polygon}, outer ring` : `polygon ${polygon}, hole ${ring}`;
  // Two vertices are enough when an arc closes the ring (a full circle is two bulge-1 arcs).
  const hasArc = r?.bulge?.some((b) => b !== 0) ?? false;
  if (!r || r.xy.length % 2 !== 0 || r.xy.length < (hasArc ? 4 : 6)) {
    throw new MeshInputError({ code: 'too-few-points', message: `${where} needs at least 3 vertices (2 when an arc closes it)`, polygon, ring });
  }
  for (let i = 0; i < r.xy.length; i++) {
    const bulge = i < r.xy.length / 2 ? (r.bulge ? (r.bulge[i] ?? outside(r.bulge, i)) : 0) : 0;
    if (!Number.isFinite(r.xy[i]) || !Number.isFinite(bulge)) {
      const vertex = Math.floor(i / 2) % (r.xy.length / 2);
      throw new MeshInputError({ code: 'non-finite', message: `${where}, vertex ${vertex} has a non-finite coordinate or bulge`, polygon, ring, vertex });
    }
  }
  const flat = flattenRingChords(r, maxSweep);
  const area = polylineSignedArea(flat.xy);
  if (!(Math.abs(area) > 0)) {
    throw new MeshInputError({ code: 'zero-area', message: `${where} encloses no area`, polygon, ring });
  }
  // Material on the left: outer CCW (area > 0), hole CW (area < 0).
  const wantPositive = ring < 0;
  const keep = (area > 0) === wantPositive;
  const xy = keep ? flat.xy : reversedPolyline(flat.xy);
  const onArc = keep ? flat.onArc : [...flat.onArc].reverse();
  return { xy, onArc, sweep: flat.maxChordSweep, area: wantPositive ? Math.abs(area) : -Math.abs(area) };
}

function reversedPolyline(xy: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = xy.length / 2 - 1; i >= 0; i--) out.push((xy[2 * i] ?? outside(xy, 2 * i)), (xy[2 * i + 1] ?? outside(xy, 2 * i + 1)));
  return out;
}

/**
 * Merges points closer than `tol` through a hash grid; returns index per input point. Cell keys
 * pack the low 26 bits of each cell coordinate into one exact number: two far cells may share a
 * key, which only adds candidates that the distance test then rejects.
 */
class PointMerger {
  readonly xy: number[] = [];
  private readonly cells = new Map<number, number[]>();
  constructor(private readonly tol: number) {}

  private static key(cx: number, cy: number): number {
    return (cx & 0x3ffffff) * 67_108_864 + (cy & 0x3ffffff);
  }

  add(x: number, y: number): number {
    const cx = Math.floor(x / this.tol);
    const cy = Math.floor(y / this.tol);
    for (let i = -1; i <= 1; i++) {
      for (let j = -1; j <= 1; j++) {
        const list = this.cells.get(PointMerger.key(cx + i, cy + j));
        if (list === undefined) continue;
        for (const k of list) {
          if (Math.hypot(this.xy[2 * k]! - x, this.xy[2 * k + 1]! - y) <= this.tol) return k;
        }
      }
    }
    const id = this.xy.length / 2;
    this.xy.push(x, y);
    const key = PointMerger.key(cx, cy);
    const list = this.cells.get(key);
    if (list) list.push(id);
    else this.cells.set(key, [id]);
    return id;
  }
}

/** Splits directed edges at points lying on them (T-junctions between touching parts). */
function splitAtTJunctions(xy: readonly number[], edges: readonly number[], tol: number): number[] {
  const n = xy.length / 2;
  const px = (i: number): number => (xy[2 * i] ?? outside(xy, 2 * i));
  const py = (i: number): number => (xy[2 * i + 1] ?? outside(xy, 2 * i + 1));
  // Sort points by x so each edge only scans the points inside its x-range.
  const order = Int32Array.from({ length: n }, (_, i) => i).sort((a, b) => px(a) - px(b));
  const sortedX = Float64Array.from(order, px);
  const lowerBound = (v: number): number => {
    let lo = 0;
    let hi = sortedX.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((sortedX[mid] ?? outside(sortedX, mid)) < v) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const out: number[] = [];
  for (let e = 0; e < edges.length; e += 2) {
    const a = edges[e]!;
    const b = edges[e + 1]!;
    const dx = px(b) - px(a);
    const dy = py(b) - py(a);
    const len2 = dx * dx + dy * dy;
    let hits: { u: number; k: number }[] | null = null;
    for (let s = lowerBound(Math.min(px(a), px(b)) - tol); s < n && (sortedX[s] ?? outside(sortedX, s)) <= Math.max(px(a), px(b)) + tol; s++) {
      const k = order[s] ?? outside(order, s);
      if (k === a || k === b) continue;
      const u = ((px(k) - px(a)) * dx + (py(k) - py(a)) * dy) / len2;
      if (u <= 0 || u >= 1) continue;
      const dist = Math.abs((px(k) - px(a)) * dy - (py(k) - py(a)) * dx) / Math.sqrt(len2);
      if (dist <= tol) (hits ??= []).push({ u, k });
    }
    if (hits === null) {
      out.push(a, b);
      continue;
    }
    hits.sort((p, q) => p.u - q.u);
    let from = a;
    for (const h of hits) {
      out.push(from, h.k);
      from = h.k;
    }
    out.push(from, b);
  }
  return out;
}

export function planarGraphOfRegion(region: Region, maxSweep: number): PlanarGraph {
  if (region.length === 0) throw new MeshInputError({ code: 'empty-section', message: 'the region has no polygons to mesh' });
  const rings: OrientedRing[] = [];
  const pieces: PlanarGraph['pieces'] = [];
  let maxChordSweep = 0;
  let box: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  region.forEach((poly, pi) => {
    let area = 0;
    const pbox: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
    for (let ri = -1; ri < poly.holes.length; ri++) {
      const r = checkedRing(poly, pi, ri, maxSweep);
      maxChordSweep = Math.max(maxChordSweep, r.sweep);
      area += r.area;
      for (let i = 0; i < r.xy.length; i += 2) growBox(pbox, (r.xy[i] ?? outside(r.xy, i)), (r.xy[i + 1] ?? outside(r.xy, i + 1)));
      rings.push({ xy: r.xy, onArc: r.onArc, polygon: pi, ring: ri });
    }
    if (!(area > 0)) throw new MeshInputError({ code: 'zero-area', message: `polygon ${pi}: its holes cover its outer ring`, polygon: pi });
    pieces.push({ area, box: pbox });
    box = [Math.min(box[0], pbox[0]), Math.min(box[1], pbox[1]), Math.max(box[2], pbox[2]), Math.max(box[3], pbox[3])];
  });
  const diagonal = Math.hypot(box[2] - box[0], box[3] - box[1]);
  const tol = 1e-9 * diagonal;
  const merger = new PointMerger(tol);
  /** Directed edges as consecutive (from, to) pairs. */
  const edges: number[] = [];
  const arcPoints: number[] = [];
  for (const r of rings) {
    const ids: number[] = [];
    for (let i = 0; i < r.xy.length; i += 2) {
      const id = merger.add((r.xy[i] ?? outside(r.xy, i)), (r.xy[i + 1] ?? outside(r.xy, i + 1)));
      ids.push(id);
      if (r.onArc[i / 2]) arcPoints.push(id);
    }
    for (let i = 0; i < ids.length; i++) {
      const a = ids[i] ?? outside(ids, i);
      const b = ids[(i + 1) % ids.length] ?? outside(ids, (i + 1) % ids.length);
      if (a !== b) edges.push(a, b);
    }
  }
  const onArc = new Uint8Array(merger.xy.length / 2);
  for (const id of arcPoints) onArc[id] = 1;
  return { ...netSegments(merger.xy, splitAtTJunctions(merger.xy, edges, tol)), pieces, diagonal, maxChordSweep, onArc };
}

function growBox(b: [number, number, number, number], x: number, y: number): void {
  b[0] = Math.min(b[0], x);
  b[1] = Math.min(b[1], y);
  b[2] = Math.max(b[2], x);
  b[3] = Math.max(b[3], y);
}

function netSegments(xy: number[], edges: readonly number[]): Pick<PlanarGraph, 'xy' | 'segA' | 'segB' | 'segNet'> {
  const byKey = new Map<number, number>();
  const segA: number[] = [];
  const segB: number[] = [];
  const segNet: number[] = [];
  const n = xy.length / 2;
  for (let e = 0; e < edges.length; e += 2) {
    const p = edges[e]!;
    const q = edges[e + 1]!;
    const a = Math.min(p, q);
    const b = Math.max(p, q);
    const key = a * n + b;
    let s = byKey.get(key);
    if (s === undefined) {
      s = segA.length;
      byKey.set(key, s);
      segA.push(a);
      segB.push(b);
      segNet.push(0);
    }
    segNet[s] = (segNet[s] ?? outside(segNet, s)) + (p === a ? 1 : -1);
  }
  segNet.forEach((net, s) => {
    if (Math.abs(net) > 1) {
      const a = segA[s] ?? outside(segA, s);
      throw new MeshInputError({
        code: 'overlap',
        message: `pieces of the region overlap along the edge at (${xy[2 * a]}, ${xy[2 * a + 1]})`,
        at: [(xy[2 * a] ?? outside(xy, 2 * a)), (xy[2 * a + 1] ?? outside(xy, 2 * a + 1))],
      });
    }
  });
  return { xy, segA, segB, segNet };
}
