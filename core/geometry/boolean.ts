/**
 * Union, difference and intersection of regions — the only adapter to polygon-clipping 0.15.7
 * (pinned exactly in package.json; STYLE.md §3).
 *
 * Units: the document's length unit. Input winding: any (the library does not rely on it).
 * Output: normalised (normalise.ts): outer rings counter-clockwise, holes clockwise; the adapter
 *   asserts that winding after normalising (a failure is a bug: InvariantError).
 * Arcs: each bulge arc is flattened to chords with sagitta ≤ maxSagitta — by default
 *   DEFAULT_SAGITTA_RATIO = 1e-6 × the larger side of the two inputs' joint bounding box
 *   (finer than 1e-4 × size). Every flattened vertex is recorded with its arc and its piece
 *   number. polygon-clipping keeps the input vertices that survive bit for bit, so after clipping
 *   each run of consecutive output vertices that are flattened points of the same arc (matched by
 *   exact coordinates, each step between neighbouring pieces, all in one direction) becomes ONE
 *   arc segment again, with bulge tan(sweep/4) from the sweep between the run's first and last
 *   point (the original bulge itself when the run is the whole arc). An untouched arc therefore
 *   comes back exact; a partly kept arc comes back as an exact arc of the same circle.
 * Error bound where another part cuts an arc: the cut point lies on a chord, and the chord piece
 *   between the cut and the next flattened point stays straight. Per cut arc piece the area error
 *   is at most the area between that chord and its arc, ≤ (2/3)·s·c ≤ s·c, s = maxSagitta,
 *   c = the chord length (a circular segment is at most 2/3 of its bounding s × c rectangle).
 * Library rounding: polygon-clipping snaps a coordinate to a previously seen one within a
 *   relative 2⁻⁵² (its own rounder). The adapter applies the same snapping to the inputs first
 *   (snapMap), so the library sees only distinct values and returns input vertices unchanged;
 *   input coordinates may move by that one-ulp snap, no more.
 * Errors: bad input (non-finite numbers) and the library's own exceptions ("Infinite loop…",
 *   "Unable to complete output ring…", invalid input) become a BooleanError naming the
 *   operation, the context and the parts. Size: the library's runaway guard stops at 1,000,000
 *   queued sweep events (two per segment), so inputs of more than about 500,000 segments after
 *   flattening fail with a BooleanError. Does not: validate (validateRegion first).
 * Source: polygon-clipping (M. Fogel), a Martínez–Rueda–Feito sweep; docs/methods.md §2.6.
 */
import polygonClipping from 'polygon-clipping';
import type { MultiPolygon as PcMultiPolygon, Polygon as PcPolygon, Ring as PcRing } from 'polygon-clipping';
import { invariant } from '../invariant.ts';
import { regionBounds } from './bounds.ts';
import { flattenRing, type FlatRing } from './flatten.ts';
import { normaliseRing } from './normalise.ts';
import { arcOfSegment, ringSignedArea } from './ring.ts';
import type { Diagnostic, Polygon, Region, Ring } from './types.ts';

export { flattenRing } from './flatten.ts';
export type { FlatRing } from './flatten.ts';

export const DEFAULT_SAGITTA_RATIO = 1e-6;

export type BooleanOperation = 'union' | 'difference' | 'intersection';

/** Who is asking: shown in the error when the operation fails. */
export interface BooleanNames {
  /** What the caller was doing, e.g. 'composing section "footbridge girder"'. */
  readonly context?: string;
  /** The parts behind the two operands, in order. */
  readonly parts: readonly string[];
}

/** Used when the caller names nothing; the error then names only the operation. */
const NO_NAMES: BooleanNames = { parts: [] };

export interface BooleanOptions {
  /** Chord tolerance for flattening arcs; default DEFAULT_SAGITTA_RATIO × size of the inputs. */
  readonly maxSagitta?: number;
}

export class BooleanError extends Error {
  override readonly name = 'BooleanError';
  readonly operation: BooleanOperation;
  readonly parts: readonly string[];
  readonly context: string | undefined;
  override readonly cause: unknown;

  constructor(operation: BooleanOperation, names: BooleanNames, reason: string, cause?: unknown) {
    const who = names.parts.length > 0 ? ` of parts ${names.parts.map((p) => `"${p}"`).join(' and ')}` : '';
    const where = names.context !== undefined ? ` while ${names.context}` : '';
    super(`The ${operation}${who} failed${where}: ${reason}`);
    this.operation = operation;
    this.parts = [...names.parts];
    this.context = names.context;
    this.cause = cause;
  }

  /** The same failure as a diagnostic for the editor and the command line. */
  toDiagnostic(): Diagnostic {
    return { code: 'boolean-failed', message: this.message, ...(this.parts[0] !== undefined ? { part: this.parts[0] } : {}) };
  }
}

/** One arc of the input, and the number of equal-angle pieces it was flattened into. */
interface ArcRecord {
  readonly bulge: number;
  readonly sweep: number;
  readonly pieces: number;
}

/** A flattened point on an arc: which arc, and which piece boundary (0 … pieces). */
interface ArcPoint {
  readonly arc: number;
  readonly piece: number;
}

/** Exact-coordinate index of flattened arc points (an arc's end vertices belong to two arcs). */
type ArcIndex = Map<number, Map<number, ArcPoint[]>>;

interface Flattening {
  readonly arcs: ArcRecord[];
  readonly index: ArcIndex;
}

function addArcPoint(index: ArcIndex, x: number, y: number, p: ArcPoint): void {
  let row = index.get(x);
  if (row === undefined) index.set(x, (row = new Map()));
  const list = row.get(y);
  if (list === undefined) row.set(y, [p]);
  else list.push(p);
}

function ringToPc(ring: Ring, tol: number, f: Flattening): PcRing {
  if (ring.bulge === undefined) return pcRingFromFlat(ring.xy);
  const flat: FlatRing = flattenRing(ring, tol);
  const firstArcOf = new Map<number, number>();
  for (let i = 0; i < flat.pieces.length; i++) {
    const arc = arcOfSegment(ring, i);
    if (arc === null) continue;
    firstArcOf.set(i, f.arcs.length);
    f.arcs.push({ bulge: ring.bulge[i] ?? 0, sweep: arc.sweep, pieces: flat.pieces[i] ?? 1 });
  }
  const total = flat.segment.length;
  for (let k = 0; k < total; k++) {
    const seg = flat.segment[k] ?? 0, piece = flat.piece[k] ?? 0;
    const x = flat.xy[2 * k] ?? 0, y = flat.xy[2 * k + 1] ?? 0;
    const own = firstArcOf.get(seg);
    if (own !== undefined) addArcPoint(f.index, x, y, { arc: own, piece });
    // An original vertex is also the last piece boundary of the previous segment's arc.
    const prevSeg = (seg + flat.pieces.length - 1) % flat.pieces.length;
    const prev = firstArcOf.get(prevSeg);
    if (piece === 0 && prev !== undefined) addArcPoint(f.index, x, y, { arc: prev, piece: flat.pieces[prevSeg] ?? 1 });
  }
  return pcRingFromFlat(flat.xy);
}

/** polygon-clipping's own "equal within rounding" test on one coordinate (its cmp, epsilon 2⁻⁵²). */
function libraryEqual(a: number, b: number): boolean {
  const eps = Number.EPSILON;
  if (-eps < a && a < eps && -eps < b && b < eps) return true;
  const d = a - b;
  return d * d < eps * eps * a * b;
}

/**
 * Maps every value to a representative so that no two representatives are libraryEqual.
 * Why: the library snaps a coordinate to a previously seen value within its rounding test
 * (e.g. the x of two mirror-image arc points one ulp apart). Snapping beforehand, ourselves, means
 * the library sees only distinct values and returns the input vertices bit for bit, so the arc
 * points can be recognised by exact comparison.
 */
function snapMap(values: readonly number[]): Map<number, number> {
  const sorted = [...new Set([0, ...values])].sort((a, b) => a - b);
  const map = new Map<number, number>();
  let rep: number | undefined;
  for (const v of sorted) {
    if (rep === undefined || !libraryEqual(rep, v)) rep = v;
    map.set(v, rep);
  }
  // Zero is the library's own seed: values it would snap to zero go to zero here too.
  for (const v of sorted) if (libraryEqual(v, 0)) map.set(v, 0);
  return map;
}

/** Snaps all operand coordinates (in place, they are our own copies) and re-keys the arc index. */
function snapOperands(operands: PcMultiPolygon[], f: Flattening): Flattening {
  const xs: number[] = [], ys: number[] = [];
  for (const mp of operands) for (const poly of mp) for (const ring of poly) for (const [x, y] of ring) { xs.push(x); ys.push(y); }
  const sx = snapMap(xs), sy = snapMap(ys);
  for (const mp of operands) for (const poly of mp) for (const ring of poly) for (const pt of ring) { pt[0] = sx.get(pt[0]) ?? pt[0]; pt[1] = sy.get(pt[1]) ?? pt[1]; }
  const index: ArcIndex = new Map();
  for (const [x, row] of f.index) for (const [y, list] of row) for (const p of list) addArcPoint(index, sx.get(x) ?? x, sy.get(y) ?? y, p);
  return { arcs: f.arcs, index };
}

function pcRingFromFlat(xy: Float64Array): PcRing {
  const out: PcRing = [];
  for (let i = 0; i < xy.length; i += 2) out.push([xy[i] ?? 0, xy[i + 1] ?? 0]);
  return out;
}

function regionToPc(region: Region, tol: number, f: Flattening): PcMultiPolygon {
  return region.map((p): PcPolygon => [ringToPc(p.outer, tol, f), ...p.holes.map((h) => ringToPc(h, tol, f))]);
}

/** An output edge that runs along one input arc, from piece boundary `from` to `to`. */
interface ArcEdge {
  readonly arc: number;
  readonly from: number;
  readonly to: number;
}

function arcPointsAt(index: ArcIndex, x: number, y: number): readonly ArcPoint[] {
  return index.get(x)?.get(y) ?? [];
}

/**
 * The arc an output edge runs along, if any. Only NEIGHBOURING flattened points count: an edge
 * between non-neighbours of one arc is some other straight edge (e.g. the diameter of a half disc,
 * which joins the two end points of a semicircle) and must stay straight.
 */
function edgeOnArc(here: readonly ArcPoint[], there: readonly ArcPoint[]): ArcEdge | null {
  for (const p of here) {
    for (const q of there) if (p.arc === q.arc && Math.abs(p.piece - q.piece) === 1) return { arc: p.arc, from: p.piece, to: q.piece };
  }
  return null;
}

function continues(prev: ArcEdge | null, cur: ArcEdge | null): boolean {
  return prev !== null && cur !== null && prev.arc === cur.arc && prev.to === cur.from && Math.sign(prev.to - prev.from) === Math.sign(cur.to - cur.from);
}

/** Bulge of the arc piece between piece boundaries `from` and `to` (exact original when whole). */
function runBulge(arc: ArcRecord, from: number, to: number): number {
  if (to - from === arc.pieces) return arc.bulge;
  if (from - to === arc.pieces) return -arc.bulge;
  return Math.tan((arc.sweep * (to - from)) / arc.pieces / 4);
}

/** One output ring of polygon-clipping (closed, first point repeated) with its arcs restored. */
function restoreRing(pc: PcRing, f: Flattening): Ring {
  const n = pc.length - 1;
  invariant(n >= 3, `polygon-clipping returned a ring of ${n} points`);
  const points = pc.slice(0, n);
  const at = points.map(([x, y]) => arcPointsAt(f.index, x, y));
  const edges = points.map((_, k) => edgeOnArc(at[k] ?? [], at[(k + 1) % n] ?? []));
  // Start at an edge that does not continue the previous one, so no run wraps round the start.
  let start = 0;
  while (start < n && continues(edges[(start + n - 1) % n] ?? null, edges[start] ?? null)) start++;
  if (start === n) start = 0;
  const xy: number[] = [];
  const bulge: number[] = [];
  for (let step = 0; step < n; ) {
    const k = (start + step) % n;
    const first = edges[k] ?? null;
    let last = first;
    step++;
    while (step < n && continues(last, edges[(start + step) % n] ?? null)) last = edges[(start + step++) % n] ?? null;
    const [x, y] = points[k] ?? [0, 0];
    xy.push(x, y);
    const record = first === null || last === null ? undefined : f.arcs[first.arc];
    bulge.push(record === undefined || first === null || last === null ? 0 : runBulge(record, first.from, last.to));
  }
  const ring: Ring = { xy: Float64Array.from(xy) };
  return bulge.some((b) => b !== 0) ? { ...ring, bulge: Float64Array.from(bulge) } : ring;
}

function restorePolygon(pc: PcPolygon, f: Flattening): Polygon {
  const [outerPc, ...holesPc] = pc;
  invariant(outerPc !== undefined, 'polygon-clipping returned a polygon without an outer ring');
  const outer = normaliseRing(restoreRing(outerPc, f), 1);
  const holes = holesPc.map((h) => normaliseRing(restoreRing(h, f), -1));
  invariant(ringSignedArea(outer) > 0, 'boolean output: an outer ring is not counter-clockwise after normalising');
  for (const h of holes) invariant(ringSignedArea(h) < 0, 'boolean output: a hole is not clockwise after normalising');
  return { outer, holes };
}

/** First non-finite number in the region, described, or null. */
function nonFiniteInput(region: Region, label: string): string | null {
  for (const [p, polygon] of region.entries()) {
    for (const [k, ring] of [polygon.outer, ...polygon.holes].entries()) {
      const bad = ring.xy.findIndex((v) => !Number.isFinite(v));
      const where = `${label}, polygon ${p}, ${k === 0 ? 'outer ring' : `hole ${k - 1}`}`;
      if (bad >= 0) return `${where}: vertex ${bad >> 1} has a coordinate that is not a finite number`;
      const badBulge = ring.bulge?.findIndex((v) => !Number.isFinite(v)) ?? -1;
      if (badBulge >= 0) return `${where}: the bulge of the segment from vertex ${badBulge} is not a finite number`;
    }
  }
  return null;
}

function defaultSagitta(a: Region, b: Region): number {
  const boxes = [regionBounds(a), regionBounds(b)].filter((x) => x !== null);
  const size = Math.max(0, ...boxes.map((x) => Math.max(x.maxX - x.minX, x.maxY - x.minY)));
  return size > 0 ? DEFAULT_SAGITTA_RATIO * size : 1;
}

function runOperation(operation: BooleanOperation, a: Region, b: Region, names: BooleanNames, options: BooleanOptions): Region {
  const bad = nonFiniteInput(a, 'first operand') ?? nonFiniteInput(b, 'second operand');
  if (bad !== null) throw new BooleanError(operation, names, bad);
  const tol = options.maxSagitta ?? defaultSagitta(a, b);
  const f: Flattening = { arcs: [], index: new Map() };
  const pa = regionToPc(a, tol, f);
  const pb = regionToPc(b, tol, f);
  const snapped = snapOperands([pa, pb], f);
  let out: PcMultiPolygon;
  try {
    out = polygonClipping[operation](pa, pb);
  } catch (e) {
    throw new BooleanError(operation, names, `the clipping library stopped: ${e instanceof Error ? e.message : String(e)}`, e);
  }
  return out.map((p) => restorePolygon(p, snapped));
}

/** a ∪ b, normalised, arcs restored. Throws BooleanError when the operation cannot be done. */
export function unionRegions(a: Region, b: Region, names: BooleanNames = NO_NAMES, options: BooleanOptions = {}): Region {
  return runOperation('union', a, b, names, options);
}

/** a \ b, normalised, arcs restored. Throws BooleanError when the operation cannot be done. */
export function differenceRegions(a: Region, b: Region, names: BooleanNames = NO_NAMES, options: BooleanOptions = {}): Region {
  return runOperation('difference', a, b, names, options);
}

/** a ∩ b, normalised, arcs restored. Throws BooleanError when the operation cannot be done. */
export function intersectRegions(a: Region, b: Region, names: BooleanNames = NO_NAMES, options: BooleanOptions = {}): Region {
  return runOperation('intersection', a, b, names, options);
}
