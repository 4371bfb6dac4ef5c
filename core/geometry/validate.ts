/**
 * Validation of a region: what is wrong with the user's geometry, and where (STYLE.md §5).
 * Returns typed diagnostics; never repairs, never throws on bad data.
 *
 * Checks, per ring (ring −1 = outer, k = hole k; vertex indices are the caller's own):
 *   non-finite   a coordinate is NaN or ±Infinity;
 *   bad-bulge    a bulge is not finite, the bulge array's length differs from the vertex count,
 *                or a non-zero bulge sits on a zero-length segment;
 *   too-large    |coordinate| > MAX_COORDINATE = 1e9 in any unit (1000 km in mm): beyond that a
 *                double keeps too few digits for second moments (docs/methods.md §1.3);
 *   (arcs are checked too: the ring's exact box, arcs included, must lie within ±MAX_COORDINATE,
 *   since a huge bulge between two near points draws a huge arc);
 *   too-small    the larger side of the ring's box is below MIN_EXTENT = 1e-9 in any unit;
 *   too-few-points  fewer than 3 distinct vertices — except that 2 distinct vertices joined by
 *                at least one arc (a circle, a D shape) are a proper ring;
 *   zero-area    |signed area| ≤ ZERO_AREA_RATIO (1e-12) × (larger side of the ring's box)²;
 *   self-intersection  two non-adjacent segments of one ring meet (crossing, touching at a
 *                vertex, or overlapping), or adjacent segments double back over each other;
 * per polygon and region:
 *   hole-outside a hole crosses its outer ring, or lies outside it;
 *   overlap      two holes of one polygon overlap, or two polygons (pieces) overlap.
 * Touching between different rings (at a point, or along a shared edge) is allowed: pieces may
 * touch, and a hole may touch its outer ring.
 *
 * Method: every ring is flattened (arcs to chords of sagitta ≤ 1e-6 × region size, flatten.ts);
 * all segments of the region go through one sweep along the longer side of the box (sweep.ts:
 * bucketed by their lower end, an active list pruned as the sweep passes), and each pair whose
 * boxes overlap gets the exact orient2d contact test (predicates.ts). Cost: O(n) for the
 * bucketing plus O(n·k), k = active segments (a few for ordinary section outlines).
 * Measured (npm run bench -- geometry): a 1,000,000-vertex circle-like ring validates in
 *   0.21–0.47 s warm on a shared 2-core machine at load ~16–17, 1.35–1.6× a native sort of its
 *   1,000,000 x coordinates measured in the same run.
 * Containment (hole in outer, holes in each other, pieces in each other), once no crossing was
 * found: with no contact at all between two boundaries, one vertex decides exactly (exact
 * point-in-ring test, predicates.ts); when they touch, up to 4096 vertices and segment midpoints
 * of the inner ring are located.
 *
 * Does not guarantee: arcs are checked on their flattening, so two boundaries closer than the
 * chord tolerance near an arc may be misjudged; containment between touching boundaries is
 * decided by the sampled points (exact for straight rings of up to 2048 vertices when every
 * contact is a shared whole segment or a point that is a vertex of both rings). Reports at most MAX_CONTACT_DIAGNOSTICS contact problems.
 * Sources: docs/methods.md §1.1 ("Harmful input"), §2.6; Shamos & Hoey (1976) for sweep-based
 * intersection detection; Shewchuk (1997) for orient2d.
 */
import type { Diagnostic, DiagnosticCode, Point, Region, Ring } from './types.ts';
import { ringBounds, type Bounds } from './bounds.ts';
import { flattenRing } from './flatten.ts';
import { ringSignedArea } from './ring.ts';
import { contactPoint, leftTurn, pointInRing, segmentContact, CONTACT_CROSS, CONTACT_NONE, CONTACT_OVERLAP, type Contact } from './predicates.ts';
import { sweepPairs } from './sweep.ts';

export const MAX_COORDINATE = 1e9;
/**
 * The smallest ring a section may hold, as the larger side of its box, in any unit: below it the
 * fourth powers in second moments head for underflow (a 1e-100 plate gave I = 0 and null shape
 * factors), so such a ring is refused rather than computed to a silent 0.
 */
export const MIN_EXTENT = 1e-9;
/** The largest |bulge| (tan of a quarter of the sweep): 1e12 is a full circle but for 4e-12 rad. */
export const MAX_BULGE = 1e12;
export const ZERO_AREA_RATIO = 1e-12;
export const FLATTEN_RATIO = 1e-6;
export const MAX_CONTACT_DIAGNOSTICS = 50;

export interface ValidationContext {
  readonly part?: string;
}

/** Where a diagnostic points, in the caller's indices. */
interface Place {
  readonly polygon: number;
  readonly ring: number;
}

/** A ring cleaned of repeated vertices, with each kept vertex's index in the caller's ring. */
interface CleanRing {
  readonly place: Place;
  readonly ring: Ring;
  readonly original: Uint32Array;
  readonly bounds: Bounds;
  /** Zero area: kept for the contact sweep, left out of containment tests. */
  readonly degenerate?: boolean;
}

function ringName(place: Place): string {
  return place.ring < 0 ? `polygon ${place.polygon}, outer ring` : `polygon ${place.polygon}, hole ${place.ring}`;
}

function fmt(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(6))) : String(v);
}

function makeDiagnostic(code: DiagnosticCode, what: string, ctx: ValidationContext, place: Place, vertex?: number, at?: Point): Diagnostic {
  const prefix = ctx.part !== undefined ? `Part "${ctx.part}", ${ringName(place)}` : ringName(place)[0]?.toUpperCase() + ringName(place).slice(1);
  const where = at !== undefined && Number.isFinite(at[0]) && Number.isFinite(at[1]) ? ` at (${fmt(at[0])}, ${fmt(at[1])})` : '';
  const d: Diagnostic = { code, message: `${prefix}: ${what}${where}.`, polygon: place.polygon, ring: place.ring };
  return {
    ...d,
    ...(ctx.part !== undefined ? { part: ctx.part } : {}),
    ...(vertex !== undefined ? { vertex } : {}),
    ...(at !== undefined && Number.isFinite(at[0]) && Number.isFinite(at[1]) ? { at } : {}),
  };
}

function vertexAt(ring: Ring, i: number): Point {
  return [ring.xy[2 * i] ?? NaN, ring.xy[2 * i + 1] ?? NaN];
}

/** Number problems (non-finite, bulge, too large); returns the first one found, or null. */
function numericProblem(ring: Ring, ctx: ValidationContext, place: Place): Diagnostic | null {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  let firstLarge = -1;
  for (let i = 0; i < 2 * n; i++) {
    const v = xy[i] ?? NaN;
    if (!Number.isFinite(v)) {
      const k = i >> 1;
      const [x, y] = vertexAt(ring, k);
      return makeDiagnostic('non-finite', `vertex ${k} has a coordinate that is not a finite number (${x}, ${y})`, ctx, place, k);
    }
    if (firstLarge < 0 && Math.abs(v) > MAX_COORDINATE) firstLarge = i >> 1;
  }
  if (bulge !== undefined) {
    const problem = bulgeProblem(ring, bulge, ctx, place);
    if (problem !== null) return problem;
  }
  if (firstLarge >= 0) {
    return makeDiagnostic('too-large', `vertex ${firstLarge} lies beyond ±${MAX_COORDINATE} from the origin, too far for reliable section properties`, ctx, place, firstLarge, vertexAt(ring, firstLarge));
  }
  return null;
}

function bulgeProblem(ring: Ring, bulge: Float64Array, ctx: ValidationContext, place: Place): Diagnostic | null {
  const n = ring.xy.length >> 1;
  if (bulge.length !== n) return makeDiagnostic('bad-bulge', `the ring has ${n} vertices but ${bulge.length} bulges`, ctx, place);
  for (let i = 0; i < n; i++) {
    const b = bulge[i] ?? 0;
    if (b === 0) continue;
    if (!Number.isFinite(b)) return makeDiagnostic('bad-bulge', `the bulge of the segment from vertex ${i} is not a finite number (${b})`, ctx, place, i, vertexAt(ring, i));
    const [x0, y0] = vertexAt(ring, i), [x1, y1] = vertexAt(ring, (i + 1) % n);
    if (x0 === x1 && y0 === y1) return makeDiagnostic('bad-bulge', `the segment from vertex ${i} has zero length but a bulge of ${b}`, ctx, place, i, [x0, y0]);
    // radius = chord·(1 + b²)/(4|b|): past this the radius itself overflows and no extent can be found.
    if (!(Math.abs(b) <= MAX_BULGE)) return makeDiagnostic('bad-bulge', `the bulge of the segment from vertex ${i} is ${b}, beyond ±${MAX_BULGE}: its arc's radius overflows (a bulge of 1 is a half circle)`, ctx, place, i, [x0, y0]);
  }
  return null;
}

/** True when two consecutive vertices (the last and the first included) are the same point. */
function hasRepeats(xy: Float64Array): boolean {
  const n = xy.length >> 1;
  let px = xy[2 * n - 2]!, py = xy[2 * n - 1]!;
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i]!, y = xy[2 * i + 1]!;
    if (x === px && y === py) return true;
    px = x; py = y;
  }
  return false;
}

/** Drops exactly repeated consecutive vertices and a repeated closing vertex, keeping indices. */
function cleanRing(ring: Ring, place: Place): CleanRing {
  const src = ring.xy;
  const n = src.length >> 1;
  if (ring.bulge === undefined && n > 1 && !hasRepeats(src)) {
    // Nothing to drop (the usual case): the ring as it is, read-only from here on.
    const original = new Uint32Array(n);
    for (let i = 0; i < n; i++) original[i] = i;
    return { place, ring: { xy: src }, original, bounds: ringBounds(ring) };
  }
  const keep = new Uint32Array(n);
  // groupEnd[k]: the last of the copies of kept vertex k; its segment is the one leaving the group.
  const groupEnd = new Uint32Array(n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    const last = m > 0 ? (keep[m - 1] ?? 0) : -1;
    if (last >= 0 && src[2 * last] === src[2 * i] && src[2 * last + 1] === src[2 * i + 1]) {
      groupEnd[m - 1] = i;
      continue;
    }
    keep[m] = i;
    groupEnd[m] = i;
    m++;
  }
  const first = keep[0] ?? 0;
  while (m > 1) {
    const last = keep[m - 1] ?? 0;
    if (src[2 * last] !== src[2 * first] || src[2 * last + 1] !== src[2 * first + 1]) break;
    m--;
  }
  const xy = new Float64Array(2 * m);
  for (let k = 0; k < m; k++) {
    const v = keep[k] ?? 0;
    xy[2 * k] = src[2 * v] ?? 0;
    xy[2 * k + 1] = src[2 * v + 1] ?? 0;
  }
  const original = keep.slice(0, m);
  let clean: Ring = { xy };
  if (ring.bulge !== undefined) {
    const bulge = new Float64Array(m);
    for (let k = 0; k < m; k++) bulge[k] = ring.bulge[groupEnd[k] ?? 0] ?? 0;
    if (bulge.some((b) => b !== 0)) clean = { xy, bulge };
  }
  return { place, ring: clean, original, bounds: ringBounds(clean) };
}

/** Index of the vertex that starts the segment with the largest |bulge| (0 for a straight ring). */
function largestBulge(ring: Ring): number {
  const bulge = ring.bulge;
  if (bulge === undefined) return 0;
  let at = 0;
  for (let i = 1; i < bulge.length; i++) if (Math.abs(bulge[i]!) > Math.abs(bulge[at]!)) at = i;
  return at;
}

function shapeProblem(c: CleanRing, ctx: ValidationContext): Diagnostic | null {
  const n = c.original.length;
  const hasArcs = c.ring.bulge !== undefined;
  if (n < 2 || (n === 2 && !hasArcs)) {
    return makeDiagnostic('too-few-points', `it has ${n} distinct point${n === 1 ? '' : 's'}; a ring needs at least 3 (or 2 joined by an arc)`, ctx, c.place, 0, n > 0 ? vertexAt(c.ring, 0) : undefined);
  }
  const b = c.bounds;
  const reach = Math.max(Math.abs(b.minX), Math.abs(b.maxX), Math.abs(b.minY), Math.abs(b.maxY));
  // `!(≤)` so that a NaN reach (an arc whose radius overflowed) is refused too.
  if (!(reach <= MAX_COORDINATE)) {
    return makeDiagnostic('too-large', `its arcs (bulges) reach ${fmt(reach)} from the origin, beyond ±${MAX_COORDINATE}, too far for reliable section properties`, ctx, c.place, largestBulge(c.ring), vertexAt(c.ring, largestBulge(c.ring)));
  }
  const size = Math.max(b.maxX - b.minX, b.maxY - b.minY);
  if (size < MIN_EXTENT) {
    return makeDiagnostic('too-small', `it is ${fmt(size)} across, below the smallest size of ${MIN_EXTENT} (any unit): its second moments would underflow`, ctx, c.place, 0, vertexAt(c.ring, 0));
  }
  if (Math.abs(ringSignedArea(c.ring)) <= ZERO_AREA_RATIO * size * size) {
    return makeDiagnostic('zero-area', 'it encloses no area (all its points lie on one line or it folds back on itself)', ctx, c.place, 0, vertexAt(c.ring, 0));
  }
  return null;
}

/** Validates the region; an empty list means every check passed. */
export function validateRegion(region: Region, context: ValidationContext = {}): Diagnostic[] {
  const diagnostics: Diagnostic[] = [];
  const usable: CleanRing[] = [];
  region.forEach((polygon, p) => {
    [polygon.outer, ...polygon.holes].forEach((ring, k) => {
      const place = { polygon: p, ring: k - 1 };
      const numeric = numericProblem(ring, context, place);
      if (numeric !== null) return void diagnostics.push(numeric);
      const clean = cleanRing(ring, place);
      const shape = shapeProblem(clean, context);
      if (shape !== null) diagnostics.push(shape);
      // A zero-area ring (a figure-8, a bow-tie) still goes through the contact sweep.
      if (shape === null || shape.code === 'zero-area') usable.push(shape === null ? clean : { ...clean, degenerate: true });
    });
  });
  const contacts = contactDiagnostics(usable, context);
  diagnostics.push(...contacts.diagnostics);
  diagnostics.push(...containmentDiagnostics(usable, contacts, context));
  return diagnostics;
}

export function isRegionValid(region: Region): boolean {
  return validateRegion(region).length === 0;
}

// ---------------------------------------------------------------------------------------------
// Contacts between segments (one sweep over the whole region)

interface Segments {
  readonly x: Float64Array;
  readonly y: Float64Array;
  /** Per flattened vertex: its ring (index into `rings`), position in the flat ring, and the caller's vertex. */
  readonly ringOf: Uint32Array;
  readonly local: Uint32Array;
  readonly vertex: Uint32Array;
  readonly ringStart: Uint32Array;
  readonly ringLength: Uint32Array;
}

function regionSize(rings: readonly CleanRing[]): number {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const { bounds: b } of rings) {
    minX = Math.min(minX, b.minX);
    minY = Math.min(minY, b.minY);
    maxX = Math.max(maxX, b.maxX);
    maxY = Math.max(maxY, b.maxY);
  }
  return Math.max(maxX - minX, maxY - minY);
}

function collectSegments(rings: readonly CleanRing[]): Segments {
  const tol = FLATTEN_RATIO * regionSize(rings);
  const flats = rings.map((r) => (r.ring.bulge === undefined ? null : flattenRing(r.ring, tol)));
  const counts = rings.map((r, i) => (flats[i]?.xy.length ?? r.ring.xy.length) >> 1);
  const total = counts.reduce((a, b) => a + b, 0);
  const s: Segments = {
    x: new Float64Array(total), y: new Float64Array(total), ringOf: new Uint32Array(total), local: new Uint32Array(total),
    vertex: new Uint32Array(total), ringStart: new Uint32Array(rings.length), ringLength: Uint32Array.from(counts),
  };
  // Plain locals in the loop: a million-vertex ring goes through it on every edit.
  const { x, y, ringOf, local, vertex } = s;
  let k = 0;
  rings.forEach((r, ri) => {
    const flat = flats[ri] ?? null;
    const xy = flat?.xy ?? r.ring.xy;
    const original = r.original;
    const count = counts[ri]!;
    s.ringStart[ri] = k;
    for (let v = 0; v < count; v++, k++) {
      x[k] = xy[2 * v]!;
      y[k] = xy[2 * v + 1]!;
      ringOf[k] = ri;
      local[k] = v;
      vertex[k] = original[flat === null ? v : flat.segment[v]!]!;
    }
  });
  return s;
}

/** Index of the end vertex of segment k (the next vertex in its ring). */
function segmentEnd(s: Segments, k: number): number {
  const ri = s.ringOf[k] ?? 0;
  const start = s.ringStart[ri] ?? 0;
  const len = s.ringLength[ri] ?? 0;
  return (s.local[k] ?? 0) + 1 === len ? start : k + 1;
}

function contactOf(s: Segments, a: number, b: number): Contact {
  const a1 = segmentEnd(s, a), b1 = segmentEnd(s, b);
  // Adjacent segments of one ring always share a vertex; only doubling back is a problem.
  if (a1 === b) return doublesBack(s, a, a1, b1) ? CONTACT_OVERLAP : CONTACT_NONE;
  if (b1 === a) return doublesBack(s, b, b1, a1) ? CONTACT_OVERLAP : CONTACT_NONE;
  return segmentContact(s.x[a] ?? 0, s.y[a] ?? 0, s.x[a1] ?? 0, s.y[a1] ?? 0, s.x[b] ?? 0, s.y[b] ?? 0, s.x[b1] ?? 0, s.y[b1] ?? 0);
}

/** Segments p→q and q→r overlap: r on the line pq and the path turns back (exact). */
function doublesBack(s: Segments, p: number, q: number, r: number): boolean {
  const px = s.x[p] ?? 0, py = s.y[p] ?? 0, qx = s.x[q] ?? 0, qy = s.y[q] ?? 0, rx = s.x[r] ?? 0, ry = s.y[r] ?? 0;
  return leftTurn(px, py, qx, qy, rx, ry) === 0 && (qx - px) * (rx - qx) + (qy - py) * (ry - qy) < 0;
}

interface ContactResult {
  readonly diagnostics: Diagnostic[];
  /** Pairs of ring indices (into the usable list) whose boundaries cross: "i,j" with i < j. */
  readonly crossed: Set<string>;
  /** Pairs of rings whose boundaries touch (at points or along edges) without crossing. */
  readonly touched: Set<string>;
}

function contactDiagnostics(rings: readonly CleanRing[], ctx: ValidationContext): ContactResult {
  const diagnostics: Diagnostic[] = [];
  const crossed = new Set<string>();
  const touched = new Set<string>();
  const seen = new Set<string>();
  if (rings.length === 0) return { diagnostics, crossed, touched };
  const s = collectSegments(rings);
  // Segment k ends at vertex k + 1, except each ring's last, which closes on the ring's first.
  const ends = new Uint32Array(s.x.length);
  for (let k = 0; k < ends.length; k++) ends[k] = k + 1;
  for (let ri = 0; ri < s.ringStart.length; ri++) {
    const start = s.ringStart[ri]!, length = s.ringLength[ri]!;
    if (length > 0) ends[start + length - 1] = start;
  }
  /** Records contact c between segments a and b; false once enough diagnostics are gathered. */
  const consider = (a: number, b: number, c: Contact): boolean => {
    if (c === CONTACT_NONE) return true;
    const ra = s.ringOf[a] ?? 0, rb = s.ringOf[b] ?? 0;
    const key = ra < rb ? `${ra},${rb}` : `${rb},${ra}`;
    if (ra !== rb && c !== CONTACT_CROSS) return void touched.add(key), true;
    if (ra !== rb && crossed.has(key)) return true;
    if (ra !== rb) crossed.add(key);
    const d = contactDiagnostic(s, rings, a, b, ctx);
    // A ring touching itself at a vertex meets the far segment with both of the vertex's segments.
    const spot = `${ra},${d.at?.[0]},${d.at?.[1]}`;
    if (seen.has(spot)) return true;
    seen.add(spot);
    diagnostics.push(d);
    return diagnostics.length < MAX_CONTACT_DIAGNOSTICS;
  };
  // Neighbouring segments of a ring always share their vertex: the only fault between them is
  // doubling back, checked here in one pass; the sweep then skips them (two of its visits per segment).
  for (let a = 0; a < ends.length; a++) {
    const a1 = ends[a] ?? 0;
    if (doublesBack(s, a, a1, ends[a1] ?? 0) && !consider(a, a1, CONTACT_OVERLAP)) return { diagnostics, crossed, touched };
  }
  sweepPairs(s.x, s.y, ends, (a, b) => (ends[a] === b || ends[b] === a ? true : consider(a, b, contactOf(s, a, b))));
  return { diagnostics, crossed, touched };
}

function contactDiagnostic(s: Segments, rings: readonly CleanRing[], a: number, b: number, ctx: ValidationContext): Diagnostic {
  const a1 = segmentEnd(s, a), b1 = segmentEnd(s, b);
  const at = contactPoint(s.x[a] ?? 0, s.y[a] ?? 0, s.x[a1] ?? 0, s.y[a1] ?? 0, s.x[b] ?? 0, s.y[b] ?? 0, s.x[b1] ?? 0, s.y[b1] ?? 0);
  const ra = rings[s.ringOf[a] ?? 0], rb = rings[s.ringOf[b] ?? 0];
  const va = s.vertex[a] ?? 0, vb = s.vertex[b] ?? 0;
  if (ra === undefined || rb === undefined) throw new Error('contactDiagnostic: ring index out of range');
  if (ra === rb) {
    return makeDiagnostic('self-intersection', `the segment from vertex ${Math.min(va, vb)} meets the segment from vertex ${Math.max(va, vb)}`, ctx, ra.place, Math.min(va, vb), at);
  }
  const [inner, outer] = ra.place.ring >= rb.place.ring ? [ra, rb] : [rb, ra];
  const vInner = inner === ra ? va : vb;
  if (inner.place.polygon === outer.place.polygon && outer.place.ring < 0) {
    return makeDiagnostic('hole-outside', `the hole crosses its outer ring, from the segment at vertex ${vInner}`, ctx, inner.place, vInner, at);
  }
  if (inner.place.polygon === outer.place.polygon) {
    return makeDiagnostic('overlap', `the hole overlaps hole ${outer.place.ring}, crossing at the segment from vertex ${vInner}`, ctx, inner.place, vInner, at);
  }
  const [later, earlier] = ra.place.polygon > rb.place.polygon ? [ra, rb] : [rb, ra];
  const vLater = later === ra ? va : vb;
  return makeDiagnostic('overlap', `its boundary crosses polygon ${earlier.place.polygon} (pieces of one region may touch but not overlap), at the segment from vertex ${vLater}`, ctx, later.place, vLater, at);
}

// ---------------------------------------------------------------------------------------------
// Containment (run only between rings whose boundaries do not cross)
//
// Without any contact between two boundaries, every point of one ring is strictly inside or
// strictly outside the other, so the first sample that is not on a boundary decides exactly.
// When they touch, the samples are the inner ring's vertices and segment midpoints (up to
// THOROUGH_SAMPLES), and the verdict is as good as that sampling.

const THOROUGH_SAMPLES = 4096;

/** Where a point lies relative to some material: +1 strictly in, −1 strictly out, 0 on a boundary. */
type Locate = (x: number, y: number) => 1 | 0 | -1;

/** Samples of ring `inner` located by `locate`: whether any was strictly in, any strictly out. */
function sampleSides(inner: Ring, locate: Locate, thorough: boolean): { inside: boolean; outside: boolean } {
  const n = inner.xy.length >> 1;
  const step = thorough ? Math.max(1, Math.ceil(n / (THOROUGH_SAMPLES / 2))) : 1;
  const sides = { inside: false, outside: false };
  for (let pass = 0; pass < 2; pass++) {
    for (let i = 0; i < n; i += step) {
      const j = (i + 1) % n;
      const x = pass === 0 ? (inner.xy[2 * i] ?? 0) : ((inner.xy[2 * i] ?? 0) + (inner.xy[2 * j] ?? 0)) / 2;
      const y = pass === 0 ? (inner.xy[2 * i + 1] ?? 0) : ((inner.xy[2 * i + 1] ?? 0) + (inner.xy[2 * j + 1] ?? 0)) / 2;
      const side = locate(x, y);
      if (side === 1) sides.inside = true;
      if (side === -1) sides.outside = true;
      if ((!thorough && side !== 0) || (sides.inside && sides.outside)) return sides;
    }
  }
  return sides;
}

function boxesOverlap(a: Bounds, b: Bounds): boolean {
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}

interface Pairs {
  readonly crossed: Set<string>;
  readonly touched: Set<string>;
}

const pairKey = (i: number, j: number): string => (i < j ? `${i},${j}` : `${j},${i}`);

function containmentDiagnostics(rings: readonly CleanRing[], pairs: Pairs, ctx: ValidationContext): Diagnostic[] {
  const out: Diagnostic[] = [];
  const outerOf = new Map<number, number>();
  rings.forEach((r, i) => { if (r.place.ring < 0) outerOf.set(r.place.polygon, i); });
  rings.forEach((r, i) => {
    const o = outerOf.get(r.place.polygon);
    const outer = o === undefined ? undefined : rings[o];
    if (r.place.ring < 0 || r.degenerate === true || o === undefined || outer === undefined || outer.degenerate === true) return;
    if (pairs.crossed.has(pairKey(i, o))) return;
    const sides = sampleSides(r.ring, (x, y) => pointInRing(outer.ring, x, y), pairs.touched.has(pairKey(i, o)));
    if (sides.outside || !sides.inside) {
      out.push(makeDiagnostic('hole-outside', 'the hole does not lie inside its outer ring', ctx, r.place, 0, vertexAt(r.ring, 0)));
    }
  });
  for (let i = 0; i < rings.length; i++) {
    for (let j = i + 1; j < rings.length; j++) {
      const a = rings[i], b = rings[j];
      if (a === undefined || b === undefined || a.degenerate === true || b.degenerate === true) continue;
      if (!boxesOverlap(a.bounds, b.bounds) || pairs.crossed.has(pairKey(i, j))) continue;
      const d = pairOverlap(i, j, rings, pairs, ctx);
      if (d !== null) out.push(d);
    }
  }
  return out;
}

/** The material of polygon p: inside its outer ring and outside all its holes. */
function materialLocator(p: number, rings: readonly CleanRing[]): Locate {
  const own = rings.filter((r) => r.place.polygon === p && r.degenerate !== true);
  return (x, y) => {
    let result: 1 | 0 | -1 = 1;
    for (const r of own) {
      const side = pointInRing(r.ring, x, y);
      if (side === 0) result = 0;
      else if (r.place.ring < 0 ? side === -1 : side === 1) return -1;
    }
    return result;
  };
}

/** Whether ring i touches any ring of polygon p. */
function touchesPolygon(i: number, p: number, rings: readonly CleanRing[], pairs: Pairs): boolean {
  return rings.some((r, k) => r.place.polygon === p && pairs.touched.has(pairKey(i, k)));
}

/** Two holes of one polygon overlapping (or coincident), or two pieces sharing material. */
function pairOverlap(i: number, j: number, rings: readonly CleanRing[], pairs: Pairs, ctx: ValidationContext): Diagnostic | null {
  const a = rings[i], b = rings[j];
  if (a === undefined || b === undefined) return null;
  const sameHoles = a.place.polygon === b.place.polygon && a.place.ring >= 0 && b.place.ring >= 0;
  const twoOuters = a.place.polygon !== b.place.polygon && a.place.ring < 0 && b.place.ring < 0;
  if (!sameHoles && !twoOuters) return null;
  const thorough = pairs.touched.has(pairKey(i, j));
  if (sameHoles) {
    const aInB = sampleSides(a.ring, (x, y) => pointInRing(b.ring, x, y), thorough);
    const bInA = sampleSides(b.ring, (x, y) => pointInRing(a.ring, x, y), thorough);
    const coincident = !aInB.inside && !aInB.outside;
    if (!aInB.inside && !bInA.inside && !coincident) return null;
    return makeDiagnostic('overlap', `the hole overlaps hole ${a.place.ring}`, ctx, b.place, 0, vertexAt(b.ring, 0));
  }
  const aInB = sampleSides(a.ring, materialLocator(b.place.polygon, rings), touchesPolygon(i, b.place.polygon, rings, pairs));
  const bInA = sampleSides(b.ring, materialLocator(a.place.polygon, rings), touchesPolygon(j, a.place.polygon, rings, pairs));
  const coincident = !aInB.inside && !aInB.outside && !bInA.inside && !bInA.outside;
  if (!aInB.inside && !bInA.inside && !coincident) return null;
  return makeDiagnostic('overlap', `the polygon overlaps polygon ${a.place.polygon} (pieces of one region may touch but not overlap)`, ctx, b.place, 0, vertexAt(b.ring, 0));
}
