/**
 * DXF entities → paths in world coordinates (WCS x, y), with exact arcs where the file has them.
 *
 * Units: the drawing's own units (no conversion here). Angles: ARC angles in degrees as written,
 * ELLIPSE parameters in radians as written.
 * Arcs: LWPOLYLINE/POLYLINE bulges are kept as bulges (exact); ARC and CIRCLE become bulged
 *   segments (an ARC over 180° is split at its middle, so no bulge exceeds 1 in size; a CIRCLE is
 *   two semicircles). These stay exact under INSERT transforms that are similarities (uniform
 *   scale, rotation, mirroring: a mirror flips the bulge's sign).
 * Approximated, within a chord tolerance the notes name: ELLIPSE, SPLINE (B-spline, rational
 *   when it has weights, evaluated by de Boor's algorithm: Piegl & Tiller, The NURBS Book, 2nd ed.,
 *   §2.3 and §4.2), and an arc under a non-uniform INSERT scale (then an ellipse). The chord
 *   deviation of a circle of radius a over a parameter step Δ is a(1 − cos(Δ/2)) (common
 *   practice); an affine image of it deviates by at most the map's largest stretch times that.
 * OCS (the object coordinate system of ARC, CIRCLE, LWPOLYLINE, 2D POLYLINE and INSERT): built by
 *   the DXF reference's "arbitrary axis algorithm" (AutoCAD DXF Reference, "Object Coordinate
 *   Systems (OCS)"). Only extrusions along ±Z lie in the drawing's plane; Z = −1 mirrors x.
 *   LINE, ELLIPSE and SPLINE are written in WCS.
 * INSERT: block geometry p → insertion point + R(rotation)·(S(scale)·(p − block base) + array
 *   offset), in the INSERT's OCS; nested to a depth of 16; an entity on layer "0" inside a block
 *   takes the INSERT's layer (DXF rule).
 * Does not: join paths (chains.ts), check them (import.ts), or read 3D solids, meshes or regions
 *   (refused as geometry with the entity named).
 */
import type { DxfBlockRecord, DxfEntityRecord, DxfGroup } from './parse.ts';

/** Which entity a path or a problem comes from, as the user can find it in their CAD program. */
export interface EntityRef {
  readonly type: string;
  readonly handle: string | null;
  readonly layer: string;
  /** The block it was inserted from (nested blocks joined by " > "), if any. */
  readonly block?: string;
}

/** An open or closed chain of segments; bulge[k] belongs to segment k (vertex k → k+1). */
export interface Path {
  readonly xy: number[];
  readonly bulge: number[];
  readonly closed: boolean;
  readonly ref: EntityRef;
}

export interface CurveIssue {
  readonly ref: EntityRef;
  readonly message: string;
}

export interface CurveOptions {
  /** Chord tolerance for approximated curves, in drawing units; default 1e-4 of each curve's size. */
  readonly chordTolerance?: number;
  /** Layers to read (effective layer, after INSERT's layer "0" rule); undefined = all. */
  readonly layers?: ReadonlySet<string>;
}

export interface CurveResult {
  readonly paths: Path[];
  readonly errors: CurveIssue[];
  /** Approximations made, one line each (entity, chord tolerance, segment count). */
  readonly approximations: string[];
  /** Entities not used as geometry, by type (TEXT, DIMENSION, HATCH, …). */
  readonly ignored: Map<string, number>;
  /** Geometry entities found per effective layer (before the layer choice). */
  readonly layers: Map<string, number>;
}

/** Relative chord tolerance used when the caller gives none. */
export const DEFAULT_CHORD_RATIO = 1e-4;
const MAX_INSERT_DEPTH = 16;
const MAX_APPROX_SEGMENTS = 100_000;

/** x' = a·x + c·y + e, y' = b·x + d·y + f. */
interface Affine {
  readonly a: number; readonly b: number; readonly c: number; readonly d: number; readonly e: number; readonly f: number;
}
const IDENTITY: Affine = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

function compose(outer: Affine, inner: Affine): Affine {
  return {
    a: outer.a * inner.a + outer.c * inner.b, b: outer.b * inner.a + outer.d * inner.b,
    c: outer.a * inner.c + outer.c * inner.d, d: outer.b * inner.c + outer.d * inner.d,
    e: outer.a * inner.e + outer.c * inner.f + outer.e, f: outer.b * inner.e + outer.d * inner.f + outer.f,
  };
}
const apply = (m: Affine, x: number, y: number): [number, number] => [m.a * x + m.c * y + m.e, m.b * x + m.d * y + m.f];
const det = (m: Affine): number => m.a * m.d - m.b * m.c;
/** Largest stretch of the linear part (its largest singular value). */
function stretch(m: Affine): number {
  const p = m.a * m.a + m.b * m.b + m.c * m.c + m.d * m.d;
  const q = Math.abs(det(m));
  return Math.sqrt((p + Math.sqrt(Math.max(0, p * p - 4 * q * q))) / 2);
}
/** True when the map keeps circles circles (uniform scale, rotation, optional mirror). */
function isSimilarity(m: Affine): boolean {
  const s = Math.max(Math.abs(m.a), Math.abs(m.b), Math.abs(m.c), Math.abs(m.d));
  const eps = 1e-12 * s;
  return (Math.abs(m.a - m.d) <= eps && Math.abs(m.b + m.c) <= eps) || (Math.abs(m.a + m.d) <= eps && Math.abs(m.b - m.c) <= eps);
}

// ---------------------------------------------------------------------------------------------
// Groups

const numberAt = (groups: readonly DxfGroup[], code: number, fallback: number): number => {
  const g = groups.find(([c]) => c === code);
  return g !== undefined && typeof g[1] === 'number' && Number.isFinite(g[1]) ? g[1] : fallback;
};
const numbersAt = (groups: readonly DxfGroup[], code: number): number[] =>
  groups.filter(([c, v]) => c === code && typeof v === 'number').map(([, v]) => v as number);
const textAt = (groups: readonly DxfGroup[], code: number): string | undefined => {
  const g = groups.find(([c]) => c === code);
  return g === undefined ? undefined : String(g[1]);
};

/** The extrusion direction (210/220/230), default +Z. */
function normalOf(groups: readonly DxfGroup[]): [number, number, number] {
  return [numberAt(groups, 210, 0), numberAt(groups, 220, 0), numberAt(groups, 230, 1)];
}

/**
 * OCS → WCS in the drawing's plane for an extrusion along ±Z (arbitrary axis algorithm), or null
 * when the entity does not lie in the XY plane.
 */
function ocsMap(n: readonly [number, number, number]): Affine | null {
  const len = Math.hypot(n[0], n[1], n[2]);
  if (!(len > 0) || Math.abs(n[0]) > 1e-9 * len || Math.abs(n[1]) > 1e-9 * len) return null;
  // With N = (0, 0, ±1): Ax = Wy × N = (±1, 0, 0), Ay = N × Ax = (0, 1, 0).
  return n[2] > 0 ? IDENTITY : { a: -1, b: 0, c: 0, d: 1, e: 0, f: 0 };
}

// ---------------------------------------------------------------------------------------------
// Path building

class PathBuilder {
  readonly xy: number[] = [];
  readonly bulge: number[] = [];
  approxSegments = 0;
  constructor(private readonly m: Affine, private readonly tol: (size: number) => number) {}

  start(x: number, y: number): void {
    const [u, v] = apply(this.m, x, y);
    this.xy.push(u, v);
  }
  lineTo(x: number, y: number): void {
    this.bulge.push(0);
    this.start(x, y);
  }
  /** A bulged segment from the last point (local coordinates x0, y0) to (x, y). */
  arcTo(x0: number, y0: number, x: number, y: number, b: number): void {
    if (b === 0) return this.lineTo(x, y);
    if (isSimilarity(this.m)) {
      // A mirror turns counter-clockwise arcs clockwise.
      this.bulge.push(det(this.m) < 0 ? -b : b);
      return this.start(x, y);
    }
    // Non-uniform scale: the arc becomes an elliptical arc, drawn by chords.
    const dx = x - x0, dy = y - y0;
    const k = (1 - b * b) / (4 * b);
    const cx = (x0 + x) / 2 - k * dy, cy = (y0 + y) / 2 + k * dx;
    const r = Math.hypot(x0 - cx, y0 - cy);
    const t0 = Math.atan2(y0 - cy, x0 - cx);
    const sweep = 4 * Math.atan(b);
    const n = chordCount(Math.abs(sweep), r * stretch(this.m), this.tol(r));
    for (let i = 1; i < n; i++) {
      const t = t0 + (sweep * i) / n;
      this.lineTo(cx + r * Math.cos(t), cy + r * Math.sin(t));
    }
    this.approxSegments += n;
    this.lineTo(x, y);
  }
}

/** Chords needed so that a circle of radius a (after stretching) deviates by at most tol over `sweep`. */
function chordCount(sweep: number, a: number, tol: number): number {
  if (!(a > 0) || !(tol > 0)) return 1;
  const ratio = Math.min(1, tol / a);
  const step = 2 * Math.acos(1 - ratio);
  return Math.min(MAX_APPROX_SEGMENTS, Math.max(2, Math.ceil(sweep / step)));
}

// ---------------------------------------------------------------------------------------------
// Entities

interface Ctx {
  readonly blocks: ReadonlyMap<string, DxfBlockRecord>;
  readonly options: CurveOptions;
  readonly out: CurveResult;
}

/** Types read as geometry; any other type is counted as ignored, unless REFUSED. */
const GEOMETRY = new Set(['LINE', 'ARC', 'CIRCLE', 'LWPOLYLINE', 'POLYLINE', 'ELLIPSE', 'SPLINE']);
/** Types that describe area or solid geometry we cannot read: an error rather than a silent skip. */
const REFUSED = new Map<string, string>([
  ['SOLID', 'a filled 2D solid (draw its boundary as a polyline instead)'],
  ['TRACE', 'a filled trace (draw its boundary as a polyline instead)'],
  ['3DFACE', 'a 3D face'],
  ['REGION', 'a region (stored as ACIS data, which this reader does not decode; explode it to lines and arcs)'],
  ['3DSOLID', 'a 3D solid'],
  ['BODY', 'an ACIS body'],
  ['SURFACE', 'a surface'],
  ['MESH', 'a mesh'],
  ['MLINE', 'a multiline (explode it to lines)'],
]);

function describeTol(tol: number): string {
  return Number(tol.toPrecision(3)).toString();
}

function chordTolerance(ctx: Ctx, size: number): number {
  return ctx.options.chordTolerance ?? DEFAULT_CHORD_RATIO * size;
}

function emit(ctx: Ctx, ref: EntityRef, b: PathBuilder, closed: boolean): void {
  if (b.xy.length < 4 && !closed) return;
  ctx.out.paths.push({ xy: b.xy, bulge: b.bulge, closed, ref });
}

function lineEntity(ctx: Ctx, g: readonly DxfGroup[], m: Affine, ref: EntityRef): void {
  const b = new PathBuilder(m, () => 0);
  b.start(numberAt(g, 10, 0), numberAt(g, 20, 0));
  b.lineTo(numberAt(g, 11, 0), numberAt(g, 21, 0));
  ctx.out.paths.push({ xy: b.xy, bulge: b.bulge, closed: false, ref });
}

/** Bulge of an arc of `sweepDeg` degrees (counter-clockwise). */
const bulgeOfSweep = (sweepRad: number): number => Math.tan(sweepRad / 4);

function arcEntity(ctx: Ctx, g: readonly DxfGroup[], m: Affine, ref: EntityRef, full: boolean): void {
  const cx = numberAt(g, 10, 0), cy = numberAt(g, 20, 0), r = numberAt(g, 40, 0);
  if (!(r > 0)) {
    ctx.out.errors.push({ ref, message: `radius ${r} is not positive` });
    return;
  }
  const b = new PathBuilder(m, (size) => chordTolerance(ctx, size));
  if (full) {
    b.start(cx + r, cy);
    b.arcTo(cx + r, cy, cx - r, cy, 1);
    b.arcTo(cx - r, cy, cx + r, cy, 1);
    b.xy.length -= 2; // the closing vertex is not repeated
    noteChords(ctx, ref, b);
    return emit(ctx, ref, b, true);
  }
  const a0 = (numberAt(g, 50, 0) * Math.PI) / 180;
  let sweep = ((numberAt(g, 51, 360) - numberAt(g, 50, 0)) % 360 + 360) % 360;
  if (sweep === 0) sweep = 360;
  const sweepRad = (sweep * Math.PI) / 180;
  // Split arcs over a semicircle so each bulge stays within ±1 (well conditioned).
  const pieces = sweep > 180 ? 2 : 1;
  let x0 = cx + r * Math.cos(a0), y0 = cy + r * Math.sin(a0);
  b.start(x0, y0);
  for (let k = 1; k <= pieces; k++) {
    const t = a0 + (sweepRad * k) / pieces;
    const x1 = cx + r * Math.cos(t), y1 = cy + r * Math.sin(t);
    b.arcTo(x0, y0, x1, y1, bulgeOfSweep(sweepRad / pieces));
    x0 = x1;
    y0 = y1;
  }
  noteChords(ctx, ref, b);
  emit(ctx, ref, b, false);
}

function noteChords(ctx: Ctx, ref: EntityRef, b: PathBuilder): void {
  if (b.approxSegments > 0) {
    ctx.out.approximations.push(`${describeRef(ref)}: arcs under a non-uniform INSERT scale are elliptical; drawn with ${b.approxSegments} chords (chord tolerance ${ctx.options.chordTolerance !== undefined ? describeTol(ctx.options.chordTolerance) : `${DEFAULT_CHORD_RATIO} of each radius`})`);
  }
}

interface Vertex2 { readonly x: number; readonly y: number; readonly bulge: number }

function polylinePath(ctx: Ctx, vertices: readonly Vertex2[], closedFlag: boolean, m: Affine, ref: EntityRef): void {
  const bad = vertices.findIndex((v) => !Number.isFinite(v.x) || !Number.isFinite(v.y));
  if (bad >= 0) {
    ctx.out.errors.push({ ref, message: `vertex ${bad + 1} has no finite coordinates` });
    return;
  }
  let list = vertices;
  let closed = closedFlag;
  const first = list[0], last = list[list.length - 1];
  // A closed polyline that also repeats its first vertex: the repeat is the same point, not a segment.
  if (closed && list.length > 2 && first && last && first.x === last.x && first.y === last.y && last.bulge === 0) list = list.slice(0, -1);
  if (list.length < 2) {
    ctx.out.errors.push({ ref, message: `has ${list.length} vertex; a boundary needs at least 2` });
    return;
  }
  if (list.length === 2 && closed && list.every((v) => v.bulge === 0)) {
    ctx.out.errors.push({ ref, message: 'is closed over 2 vertices with straight segments: it encloses no area' });
    return;
  }
  const b = new PathBuilder(m, (size) => chordTolerance(ctx, size));
  b.start(list[0]?.x ?? 0, list[0]?.y ?? 0);
  const n = list.length;
  for (let i = 1; i < (closed ? n + 1 : n); i++) {
    const p = list[i - 1], q = list[i % n];
    if (p && q) b.arcTo(p.x, p.y, q.x, q.y, p.bulge);
  }
  if (closed) b.xy.length -= 2;
  noteChords(ctx, ref, b);
  emit(ctx, ref, b, closed);
  closed = false;
}

function lwpolylineEntity(ctx: Ctx, g: readonly DxfGroup[], m: Affine, ref: EntityRef): void {
  const vertices: { x: number; y: number; bulge: number }[] = [];
  for (const [code, value] of g) {
    const v = typeof value === 'number' ? value : Number.NaN;
    if (code === 10) vertices.push({ x: v, y: Number.NaN, bulge: 0 });
    const last = vertices[vertices.length - 1];
    if (!last) continue;
    if (code === 20) last.y = v;
    else if (code === 42) last.bulge = Number.isFinite(v) ? v : 0;
  }
  polylinePath(ctx, vertices, (numberAt(g, 70, 0) & 1) === 1, m, ref);
}

function polylineEntity(ctx: Ctx, e: DxfEntityRecord, m: Affine, ref: EntityRef): void {
  const flags = e.polylineFlags ?? 0;
  if ((flags & (16 | 64)) !== 0) {
    ctx.out.errors.push({ ref, message: `is a ${(flags & 64) !== 0 ? 'polyface mesh' : 'polygon mesh'}, not a boundary: unsupported entity type as geometry` });
    return;
  }
  const n = e.polylineNormal ?? { x: 0, y: 0, z: 1 };
  // A 3D polyline is written in WCS; a 2D one in its OCS.
  const ocs = (flags & 8) !== 0 ? IDENTITY : ocsMap([n.x, n.y, n.z]);
  if (ocs === null) return notInPlane(ctx, ref);
  // A spline-fit polyline: its fitted vertices (flag 8) are the curve; its control points (16) are not.
  const vertices = (e.vertices ?? []).filter((v) => (v.flags & 16) === 0);
  if ((flags & 4) !== 0) ctx.out.approximations.push(`${describeRef(ref)}: spline-fit POLYLINE read through its ${vertices.length} fitted vertices as drawn (straight segments)`);
  polylinePath(ctx, vertices, (flags & 1) === 1, compose(m, ocs), ref);
}

function ellipseEntity(ctx: Ctx, g: readonly DxfGroup[], m: Affine, ref: EntityRef): void {
  const [, , nz] = normalOf(g);
  if (ocsMap(normalOf(g)) === null) return notInPlane(ctx, ref);
  const cx = numberAt(g, 10, 0), cy = numberAt(g, 20, 0);
  const mx = numberAt(g, 11, 0), my = numberAt(g, 21, 0);
  const ratio = numberAt(g, 40, 1);
  const major = Math.hypot(mx, my);
  if (!(major > 0) || !(ratio > 0)) {
    ctx.out.errors.push({ ref, message: `major axis ${major} and axis ratio ${ratio} do not make an ellipse` });
    return;
  }
  // Minor axis = ratio · (N × major): counter-clockwise about +Z, clockwise when N = −Z.
  const sign = nz < 0 ? -1 : 1;
  const ux = mx, uy = my, vx = -sign * ratio * my, vy = sign * ratio * mx;
  const t0 = numberAt(g, 41, 0);
  let t1 = numberAt(g, 42, 2 * Math.PI);
  while (t1 <= t0) t1 += 2 * Math.PI;
  const sweep = Math.min(t1 - t0, 2 * Math.PI);
  const full = Math.abs(sweep - 2 * Math.PI) < 1e-12;
  // Largest semi-axis after the INSERT map is at most |L·[u v]|, bounded by the Frobenius norm.
  const lu = apply({ ...m, e: 0, f: 0 }, ux, uy), lv = apply({ ...m, e: 0, f: 0 }, vx, vy);
  const a = Math.hypot(lu[0], lu[1], lv[0], lv[1]);
  const tol = chordTolerance(ctx, major * stretch(m));
  const n = chordCount(sweep, a, tol);
  const b = new PathBuilder(m, () => tol);
  const at = (t: number): [number, number] => [cx + Math.cos(t) * ux + Math.sin(t) * vx, cy + Math.cos(t) * uy + Math.sin(t) * vy];
  b.start(...at(t0));
  for (let i = 1; i <= (full ? n - 1 : n); i++) b.lineTo(...at(i === n ? t0 + sweep : t0 + (sweep * i) / n));
  ctx.out.approximations.push(`${describeRef(ref)}: ELLIPSE drawn with ${n} straight chords, chord tolerance ${describeTol(tol)} (drawing units)`);
  emit(ctx, ref, b, full);
}

/** De Boor evaluation of a (rational) B-spline at u (Piegl & Tiller, Algorithm A4.1 in homogeneous form). */
function deBoor(p: number, knots: readonly number[], cw: readonly (readonly [number, number, number])[], u: number): [number, number] {
  const n = cw.length;
  let k = p;
  while (k < n - 1 && u >= (knots[k + 1] ?? Infinity)) k++;
  const d: [number, number, number][] = [];
  for (let j = 0; j <= p; j++) {
    const c = cw[k - p + j] ?? [0, 0, 1];
    d.push([c[0], c[1], c[2]]);
  }
  for (let r = 1; r <= p; r++) {
    for (let j = p; j >= r; j--) {
      const i = k - p + j;
      const lo = knots[i] ?? 0, hi = knots[i + p - r + 1] ?? 0;
      const alpha = hi === lo ? 0 : (u - lo) / (hi - lo);
      const a = d[j - 1] ?? [0, 0, 1], bb = d[j] ?? [0, 0, 1];
      d[j] = [(1 - alpha) * a[0] + alpha * bb[0], (1 - alpha) * a[1] + alpha * bb[1], (1 - alpha) * a[2] + alpha * bb[2]];
    }
  }
  const r = d[p] ?? [0, 0, 1];
  return [r[0] / r[2], r[1] / r[2]];
}

function splineEntity(ctx: Ctx, g: readonly DxfGroup[], m: Affine, ref: EntityRef): void {
  if (ocsMap(normalOf(g)) === null) return notInPlane(ctx, ref);
  const p = numberAt(g, 71, 3);
  const knots = numbersAt(g, 40);
  const weights = numbersAt(g, 41);
  const xs = numbersAt(g, 10), ys = numbersAt(g, 20);
  const count = Math.min(xs.length, ys.length);
  if (count === 0) {
    ctx.out.errors.push({ ref, message: 'has fit points only (no control points); unsupported entity type as geometry: redraw it, or save it with control points' });
    return;
  }
  if (knots.length !== count + p + 1) {
    ctx.out.errors.push({ ref, message: `has ${knots.length} knots for ${count} control points of degree ${p}; a B-spline needs ${count + p + 1}` });
    return;
  }
  // Control points in homogeneous form (x·w, y·w, w), mapped by the INSERT (B-splines are affine invariant).
  const cw = Array.from({ length: count }, (_, i): [number, number, number] => {
    const w = weights.length === count ? (weights[i] ?? 1) : 1;
    const [x, y] = apply(m, xs[i] ?? 0, ys[i] ?? 0);
    return [x * w, y * w, w];
  });
  const u0 = knots[p] ?? 0, u1 = knots[count] ?? 1;
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y, w] of cw) {
    minX = Math.min(minX, x / w); maxX = Math.max(maxX, x / w); minY = Math.min(minY, y / w); maxY = Math.max(maxY, y / w);
  }
  const tol = chordTolerance(ctx, Math.hypot(maxX - minX, maxY - minY));
  const at = (u: number): [number, number] => deBoor(p, knots, cw, u);
  const pts: [number, number][] = [at(u0)];
  const spans = [...new Set(knots.slice(p, count + 1))];
  // Each knot span is cut in 4, then halved until the midpoint lies within tol of the chord.
  const refine = (ua: number, pa: [number, number], ub: number, pb: [number, number], depth: number): void => {
    const um = (ua + ub) / 2;
    const pm = at(um);
    const dx = pb[0] - pa[0], dy = pb[1] - pa[1];
    const len = Math.hypot(dx, dy);
    const dev = len > 0 ? Math.abs((pm[0] - pa[0]) * dy - (pm[1] - pa[1]) * dx) / len : Math.hypot(pm[0] - pa[0], pm[1] - pa[1]);
    if (depth < 24 && pts.length < MAX_APPROX_SEGMENTS && dev > tol) {
      refine(ua, pa, um, pm, depth + 1);
      refine(um, pm, ub, pb, depth + 1);
    } else pts.push(pb);
  };
  for (let s = 0; s + 1 < spans.length; s++) {
    const a = spans[s] ?? u0, z = spans[s + 1] ?? u1;
    for (let q = 0; q < 4; q++) {
      const ua = a + ((z - a) * q) / 4, ub = a + ((z - a) * (q + 1)) / 4;
      refine(ua, pts[pts.length - 1] ?? at(ua), ub, at(ub), 0);
    }
  }
  const first = pts[0], last = pts[pts.length - 1];
  const closed = first !== undefined && last !== undefined && pts.length > 2 && Math.hypot(first[0] - last[0], first[1] - last[1]) <= tol;
  if (closed) pts.pop();
  const b = new PathBuilder(IDENTITY, () => tol);
  pts.forEach(([x, y], i) => (i === 0 ? b.start(x, y) : b.lineTo(x, y)));
  ctx.out.approximations.push(`${describeRef(ref)}: SPLINE (degree ${p}${weights.length === count ? ', rational' : ''}) drawn with ${closed ? pts.length : pts.length - 1} straight chords, chord tolerance ${describeTol(tol)} (drawing units)`);
  emit(ctx, ref, b, closed);
}

function notInPlane(ctx: Ctx, ref: EntityRef): void {
  ctx.out.errors.push({ ref, message: 'does not lie in the drawing\'s XY plane (its extrusion direction is not ±Z): unsupported entity type as geometry' });
}

function insertEntity(ctx: Ctx, e: DxfEntityRecord, m: Affine, ref: EntityRef, stack: readonly string[]): void {
  const g = e.groups;
  const name = textAt(g, 2) ?? '';
  const block = ctx.blocks.get(name);
  if (!block) {
    ctx.out.errors.push({ ref, message: `inserts block "${name}", which the file does not define` });
    return;
  }
  if (stack.includes(name) || stack.length >= MAX_INSERT_DEPTH) {
    ctx.out.errors.push({ ref, message: `inserts block "${name}" inside itself (${[...stack, name].join(' > ')})` });
    return;
  }
  const ocs = ocsMap(normalOf(g));
  if (ocs === null) return notInPlane(ctx, ref);
  const sx = numberAt(g, 41, 1), sy = numberAt(g, 42, 1);
  const rot = (numberAt(g, 50, 0) * Math.PI) / 180;
  const cols = Math.max(1, numberAt(g, 70, 1)), rows = Math.max(1, numberAt(g, 71, 1));
  const cs = numberAt(g, 44, 0), rs = numberAt(g, 45, 0);
  const px = numberAt(g, 10, 0), py = numberAt(g, 20, 0);
  if (sx === 0 || sy === 0) {
    ctx.out.errors.push({ ref, message: `inserts block "${name}" at scale ${sx} × ${sy}, which flattens it` });
    return;
  }
  const cos = Math.cos(rot), sin = Math.sin(rot);
  // Exact quarter turns: cos(π/2) is 6e-17, not 0, which would tilt a 90° insert by a hair.
  const [c, s] = Math.abs(cos) < 1e-15 ? [0, Math.sign(sin)] : Math.abs(sin) < 1e-15 ? [Math.sign(cos), 0] : [cos, sin];
  for (let i = 0; i < cols; i++) {
    for (let j = 0; j < rows; j++) {
      const ox = i * cs, oy = j * rs;
      // p → P + R·(S·(p − base) + offset)
      const local: Affine = {
        a: c * sx, b: s * sx, c: -s * sy, d: c * sy,
        e: px + c * (ox - sx * block.base.x) - s * (oy - sy * block.base.y),
        f: py + s * (ox - sx * block.base.x) + c * (oy - sy * block.base.y),
      };
      const inner = compose(m, compose(ocs, local));
      const path = [...stack, name];
      for (const child of block.entities) entity(ctx, child, inner, path, ref.layer);
    }
  }
}

export function describeRef(ref: EntityRef): string {
  const where = ref.block === undefined ? '' : ` in block "${ref.block}"`;
  return `${ref.type} ${ref.handle === null ? '(no handle)' : `handle ${ref.handle}`} on layer "${ref.layer}"${where}`;
}

function entity(ctx: Ctx, e: DxfEntityRecord, m: Affine, stack: readonly string[], insertLayer: string | null): void {
  if (e.paperSpace) return;
  // DXF rule: an entity on layer "0" inside a block takes the layer of the INSERT that places it.
  const layer = insertLayer !== null && e.layer === '0' ? insertLayer : e.layer;
  const ref: EntityRef = { type: e.type, handle: e.handle, layer, ...(stack.length > 0 ? { block: stack.join(' > ') } : {}) };
  if (e.type === 'INSERT') return insertEntity(ctx, e, m, ref, stack);
  if (!GEOMETRY.has(e.type) && !REFUSED.has(e.type)) {
    ctx.out.ignored.set(e.type, (ctx.out.ignored.get(e.type) ?? 0) + 1);
    return;
  }
  ctx.out.layers.set(layer, (ctx.out.layers.get(layer) ?? 0) + 1);
  if (ctx.options.layers !== undefined && !ctx.options.layers.has(layer)) return;
  const refused = REFUSED.get(e.type);
  if (refused !== undefined) {
    ctx.out.errors.push({ ref, message: `is ${refused}: unsupported entity type as geometry` });
    return;
  }
  const g = e.groups;
  if (e.type === 'LINE') return lineEntity(ctx, g, m, ref);
  if (e.type === 'ELLIPSE') return ellipseEntity(ctx, g, m, ref);
  if (e.type === 'SPLINE') return splineEntity(ctx, g, m, ref);
  if (e.type === 'POLYLINE') return polylineEntity(ctx, e, m, ref);
  const ocs = ocsMap(normalOf(g));
  if (ocs === null) return notInPlane(ctx, ref);
  const mo = compose(m, ocs);
  if (e.type === 'ARC') return arcEntity(ctx, g, mo, ref, false);
  if (e.type === 'CIRCLE') return arcEntity(ctx, g, mo, ref, true);
  return lwpolylineEntity(ctx, g, mo, ref);
}

/** Every model-space entity (INSERTs expanded) as world-coordinate paths, with what was ignored or refused. */
export function drawingPaths(entities: readonly DxfEntityRecord[], blocks: ReadonlyMap<string, DxfBlockRecord>, options: CurveOptions = {}): CurveResult {
  const out: CurveResult = { paths: [], errors: [], approximations: [], ignored: new Map(), layers: new Map() };
  const ctx: Ctx = { blocks, options, out };
  for (const e of entities) entity(ctx, e, IDENTITY, [], null);
  return out;
}
