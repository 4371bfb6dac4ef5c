/**
 * Plastic neutral axis (PNA) and plastic modulus for bending with the PNA in any direction
 * (docs/methods.md §5), for one region or for several weighted regions (materials).
 *
 * Geometry: the PNA is parallel to t = (cos θ, sin θ); its normal is n = (−sin θ, cos θ) and each
 * point has the coordinate s = n·p. θ = 0° gives s = y (bending about x); θ = −90° gives s = x
 * (bending about y). The PNA is the line s = d, reported in the region's own coordinates.
 *
 * Balance: Σ w_i A_i(s > d) − Σ w_i A_i(s < d) = N (tension positive), N = 0 by default.
 * Result: d, Σ w_i ∫ |s − d| dA (the plastic modulus Z for one region with w = 1; the plastic
 * moment when the weights are yield strengths), and Σ w_i ∫ sign(s − d)·(t·p) dA, the moment
 * about the perpendicular direction (Z_⊥, §5.1; independent of the origin only when N = 0 —
 * it is reported about the coordinate origin).
 *
 * Area on one side: each ring is clipped against the half-plane s ≥ d (Sutherland–Hodgman,
 * §5.2). Arcs are split at their intersections with the line (§2.5) and stay exact arcs; exit and
 * entry points are joined along the cut line. Zero-width bridges along the cut cancel exactly.
 *
 * Finding d (§5.3): g(d) = Σ w(A₊ − A₋) − N is continuous and non-increasing. Breakpoints are
 * the projections of all vertices and arc extreme points; bisection over them brackets the root.
 * Polygons only: g is exactly quadratic between breakpoints and the root is solved in closed form.
 * With arcs: Brent's method inside the bracket to |Δd| ≤ 1e−12·(s_max − s_min), cap 200.
 * Plateau (no material between two pieces): the middle of the zero interval is reported.
 *
 * Assumes normalised regions (outer CCW, holes CW) and positive, finite weights.
 * Sums are taken about one local origin for all pieces (bounding-box centre, §1.3).
 */
import type { Degrees, Region, Ring } from '../geometry/types.ts';
import { arcFromBulge, arcPointOffset, isStraight, ringProjectionRange, sweepOffsetOfAngle, type ArcGeometry } from './arc.ts';
import { ringIntegrals, vertexBoxCentre } from './integrals.ts';

export interface WeightedRegion {
  readonly region: Region;
  /** Positive weight, e.g. a yield strength (N/mm²) for a plastic moment. */
  readonly weight: number;
}

export type PnaMethod = 'quadratic' | 'brent' | 'breakpoint' | 'plateau';

export interface WeightedPlasticAxis {
  /** Direction of the PNA, CCW from +x. */
  readonly angleDeg: number;
  /** Unit normal n = (−sin θ, cos θ); s = n·p. */
  readonly normalX: number;
  readonly normalY: number;
  /** The PNA is the line n·p = d. */
  readonly d: number;
  /** Σ w_i ∫ |s − d| dA. */
  readonly moment: number;
  /** Σ w_i ∫ sign(s − d)·(t·p) dA about the coordinate origin. */
  readonly perpendicularMoment: number;
  /** Σ w_i A_i on the side s > d and on the side s < d. */
  readonly weightedAreaPlus: number;
  readonly weightedAreaMinus: number;
  readonly axialForce: number;
  readonly method: PnaMethod;
  /** Clipping passes used to find d. */
  readonly evaluations: number;
  /** g(d) = Σ w(A₊ − A₋) − N at the returned d. */
  readonly residual: number;
  readonly converged: boolean;
  /** Present for method 'plateau': the interval of d over which the balance holds. */
  readonly plateau?: readonly [number, number];
}

export interface PlasticAxis extends WeightedPlasticAxis {
  /** Plastic modulus ∫ |s − d| dA. */
  readonly Z: number;
  /** ∫ sign(s − d)·(t·p) dA (docs/methods.md §5.1). */
  readonly Zperp: number;
  /** True when |Zperp| > 1e−9·Z: the plastic moment is not parallel to the PNA. */
  readonly momentNotParallel: boolean;
  readonly areaPlus: number;
  readonly areaMinus: number;
  /** s-centroids of the two halves. */
  readonly centroidPlus: number;
  readonly centroidMinus: number;
}

const BRENT_CAP = 200;
const RELATIVE_TOLERANCE = 1e-12;

interface LocalRing {
  readonly xy: Float64Array;
  readonly bulge: Float64Array | undefined;
  readonly weight: number;
  /** Signed integrals of the whole ring about the local origin: A, ∫s, ∫t. */
  readonly A: number;
  readonly Qs: number;
  readonly Qt: number;
}

interface Frame {
  readonly nx: number;
  readonly ny: number;
  readonly tx: number;
  readonly ty: number;
}

/** cos and sin of an angle in degrees, exact at multiples of 90° so symmetric cases stay clean. */
function cosSinDegrees(angle: number): [number, number] {
  const a = ((angle % 360) + 360) % 360;
  if (a === 0) return [1, 0];
  if (a === 90) return [0, 1];
  if (a === 180) return [-1, 0];
  if (a === 270) return [0, -1];
  const r = (a * Math.PI) / 180;
  return [Math.cos(r), Math.sin(r)];
}

function checkPieces(pieces: readonly WeightedRegion[], axialForce: number): void {
  if (pieces.length === 0) throw new RangeError('plastic neutral axis: no pieces given');
  pieces.forEach((p, i) => {
    if (!(Number.isFinite(p.weight) && p.weight > 0)) {
      throw new RangeError(`plastic neutral axis: piece ${i} has weight ${p.weight}; weights must be positive and finite`);
    }
    if (p.region.length === 0) throw new RangeError(`plastic neutral axis: piece ${i} has an empty region`);
  });
  if (!Number.isFinite(axialForce)) throw new RangeError(`plastic neutral axis: axial force ${axialForce} is not finite`);
}

/**
 * The ring moved to the local origin, with its integrals there. The last copy of each ring is
 * kept (weakly, so it goes with the ring): the four axes of sectionProperties share one origin,
 * and a million-vertex ring is then copied once instead of four times. Keyed by the coordinate
 * array: core never writes into a ring's arrays once made (every transform builds new ones).
 */
const localCopies = new WeakMap<Float64Array, { ox: number; oy: number; xy: Float64Array; raw: ReturnType<typeof ringIntegrals> }>();
function localCopy(ring: Ring, ox: number, oy: number): { xy: Float64Array; raw: ReturnType<typeof ringIntegrals> } {
  const cached = localCopies.get(ring.xy);
  if (cached && cached.ox === ox && cached.oy === oy) return cached;
  const xy = new Float64Array(ring.xy.length);
  for (let i = 0; i < xy.length; i += 2) {
    xy[i] = ring.xy[i]! - ox;
    xy[i + 1] = ring.xy[i + 1]! - oy;
  }
  const made = { ox, oy, xy, raw: ringIntegrals({ xy, bulge: ring.bulge }, 0, 0) };
  localCopies.set(ring.xy, made);
  return made;
}

function localRings(pieces: readonly WeightedRegion[], ox: number, oy: number, f: Frame): LocalRing[] {
  const out: LocalRing[] = [];
  for (const { region, weight } of pieces) {
    for (const polygon of region) {
      for (const ring of [polygon.outer, ...polygon.holes]) {
        const { xy, raw } = localCopy(ring, ox, oy);
        out.push({
          xy,
          bulge: ring.bulge,
          weight,
          A: raw.A,
          Qs: f.nx * raw.Qy + f.ny * raw.Qx,
          Qt: f.tx * raw.Qy + f.ty * raw.Qx,
        });
      }
    }
  }
  return out;
}

/**
 * Ascending sort of finite doubles by LSD radix sort on their IEEE-754 bit patterns (four 16-bit
 * digits; sign-flipped so unsigned order is numeric order). Linear time; the built-in typed-array
 * sort was a quarter of the run time on a million vertices. Relies on little-endian word order,
 * checked once; falls back to the built-in sort otherwise or for small arrays.
 */
const LITTLE_ENDIAN = new Uint32Array(new Float64Array([1]).buffer)[1] === 0x3ff00000;
function sortDoubles(a: Float64Array): Float64Array {
  const n = a.length;
  if (n < 4096 || !LITTLE_ENDIAN) return a.sort();
  let src = new Uint32Array(2 * n);
  src.set(new Uint32Array(a.buffer, a.byteOffset, 2 * n));
  for (let i = 0; i < 2 * n; i += 2) {
    const hi = src[i + 1]!;
    if (hi >>> 31) { src[i] = ~src[i]! >>> 0; src[i + 1] = ~hi >>> 0; } else src[i + 1] = (hi ^ 0x80000000) >>> 0;
  }
  let dst = new Uint32Array(2 * n);
  const count = new Uint32Array(65536);
  for (let pass = 0; pass < 4; pass++) {
    const word = pass >> 1, shift = (pass & 1) * 16;
    count.fill(0);
    for (let i = 0; i < n; i++) count[(src[2 * i + word]! >>> shift) & 0xffff]!++;
    let total = 0;
    for (let k = 0; k < 65536; k++) { const c = count[k]!; count[k] = total; total += c; }
    for (let i = 0; i < n; i++) {
      const at = 2 * count[(src[2 * i + word]! >>> shift) & 0xffff]!++;
      dst[at] = src[2 * i]!; dst[at + 1] = src[2 * i + 1]!;
    }
    const t = src; src = dst; dst = t;
  }
  for (let i = 0; i < 2 * n; i += 2) {
    const hi = src[i + 1]!;
    if (hi >>> 31) src[i + 1] = (hi ^ 0x80000000) >>> 0; else { src[i] = ~src[i]! >>> 0; src[i + 1] = ~hi >>> 0; }
  }
  return new Float64Array(src.buffer, 0, n);
}

/** Sorted projections s of all vertices and of arc extreme points in ±n (the breakpoints of g). */
function breakpoints(rings: readonly LocalRing[], f: Frame): Float64Array {
  let count = 0;
  for (const ring of rings) count += ring.xy.length >> 1;
  let s = new Float64Array(count);
  let used = 0;
  const push = (v: number): void => {
    if (used === s.length) { const grown = new Float64Array(2 * s.length + 4); grown.set(s); s = grown; }
    s[used++] = v;
  };
  const phiUp = Math.atan2(f.ny, f.nx);
  for (const ring of rings) {
    const n = ring.xy.length >> 1;
    if (ring.bulge === undefined) {
      const xy = ring.xy;
      for (let i = 0; i < n; i++) s[used++] = f.nx * xy[2 * i]! + f.ny * xy[2 * i + 1]!;
      continue;
    }
    for (let i = 0; i < n; i++) {
      const x = ring.xy[2 * i]!;
      const y = ring.xy[2 * i + 1]!;
      push(f.nx * x + f.ny * y);
      const b = ring.bulge?.[i] ?? 0;
      if (isStraight(b)) continue;
      const j = (i + 1) % n;
      const arc = arcFromBulge(x, y, ring.xy[2 * j]!, ring.xy[2 * j + 1]!, b);
      for (const phi of [phiUp, phiUp + Math.PI]) {
        const tau = sweepOffsetOfAngle(arc, phi);
        if (Number.isNaN(tau)) continue;
        const [px, py] = arcPointOffset(arc, tau);
        push(f.nx * (x + px) + f.ny * (y + py));
      }
    }
  }
  const sorted = sortDoubles(s.subarray(0, used));
  let m = 0;
  for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[m - 1]) sorted[m++] = sorted[i]!;
  return sorted.slice(0, m);
}

/** Pieces of one segment after splitting it at the line s = d; pushes start point, bulge, side. */
interface PieceList {
  x: number[];
  y: number[];
  b: number[];
  inside: boolean[];
}

function pushStraight(out: PieceList, x0: number, y0: number, x1: number, y1: number, s0: number, s1: number): void {
  if ((s0 < 0 && s1 > 0) || (s0 > 0 && s1 < 0)) {
    const f = s0 / (s0 - s1);
    out.x.push(x0, x0 + f * (x1 - x0));
    out.y.push(y0, y0 + f * (y1 - y0));
    out.b.push(0, 0);
    out.inside.push(s0 > 0, s1 > 0);
  } else {
    out.x.push(x0);
    out.y.push(y0);
    out.b.push(0);
    out.inside.push(s0 + s1 >= 0);
  }
}

/**
 * Offsets τ (in sweep order) where the arc crosses the line s = d (docs/methods.md §2.5). The closed form
 * t = ψ ± acos(·) locates a crossing only to ~ε·r along the arc, which is useless for nearly
 * straight arcs (r ≫ chord); instead the sweep is split where the arc runs parallel to the line
 * (t = ψ, ψ + π: s(τ) is monotone between), and each sign change is solved in τ with Brent's
 * method on s(τ) evaluated from the start point in half-angle form (well conditioned for any r).
 */
function arcCrossings(arc: ArcGeometry, s0: number, f: Frame): number[] {
  const psi = Math.atan2(f.ny, f.nx);
  const sAt = (tau: number): number => {
    const [px, py] = arcPointOffset(arc, tau);
    return s0 + f.nx * px + f.ny * py;
  };
  const bounds = [0, arc.sweep];
  for (const phi of [psi, psi + Math.PI]) {
    const tau = sweepOffsetOfAngle(arc, phi);
    if (!Number.isNaN(tau) && tau !== 0 && tau !== arc.sweep) bounds.push(tau);
  }
  bounds.sort((p, q) => Math.abs(p) - Math.abs(q));
  const roots: number[] = [];
  const tol = 1e-15 * Math.abs(arc.sweep);
  for (let k = 0; k + 1 < bounds.length; k++) {
    const a = bounds[k]!;
    const b = bounds[k + 1]!;
    const sa = k === 0 ? s0 : sAt(a);
    const sb = sAt(b);
    if (!((sa < 0 && sb > 0) || (sa > 0 && sb < 0))) continue;
    const r = brentRoot(sAt, a, b, sa, sb, tol);
    // A crossing that is not found to tolerance is still bracketed in [a, b]; r.d lies inside it.
    roots.push(r.d);
  }
  return roots;
}

function pushArc(out: PieceList, x0: number, y0: number, x1: number, y1: number, b: number, s0: number, f: Frame): void {
  const arc = arcFromBulge(x0, y0, x1, y1, b);
  const cuts = [0, ...arcCrossings(arc, s0, f), arc.sweep];
  for (let k = 0; k + 1 < cuts.length; k++) {
    const ta = cuts[k]!;
    const tb = cuts[k + 1]!;
    const [ax, ay] = ta === 0 ? [0, 0] : arcPointOffset(arc, ta);
    const [mx, my] = arcPointOffset(arc, (ta + tb) / 2);
    out.x.push(x0 + ax);
    out.y.push(y0 + ay);
    out.b.push(Math.tan((tb - ta) / 4));
    out.inside.push(s0 + f.nx * mx + f.ny * my >= 0);
  }
}

/** The part of a ring on the side s ≥ d, as a ring (possibly with zero-width bridges), or null. */
function clipRing(ring: LocalRing, f: Frame, d: number): Ring | null {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  const pieces: PieceList = { x: [], y: [], b: [], inside: [] };
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = xy[2 * i]!, y0 = xy[2 * i + 1]!, x1 = xy[2 * j]!, y1 = xy[2 * j + 1]!;
    const s0 = f.nx * x0 + f.ny * y0 - d;
    const b = bulge === undefined ? 0 : bulge[i]!;
    if (isStraight(b)) pushStraight(pieces, x0, y0, x1, y1, s0, f.nx * x1 + f.ny * y1 - d);
    else pushArc(pieces, x0, y0, x1, y1, b, s0, f);
  }
  const m = pieces.inside.length;
  const kept = pieces.inside.filter(Boolean).length;
  if (kept === 0) return null;
  if (kept === m && m === n) return ring; // wholly on the + side: the caller reuses its stored integrals
  const ox: number[] = [], oyy: number[] = [], ob: number[] = [];
  for (let k = 0; k < m; k++) {
    const prevInside = pieces.inside[(k + m - 1) % m]!;
    if (pieces.inside[k]) {
      ox.push(pieces.x[k]!); oyy.push(pieces.y[k]!); ob.push(pieces.b[k]!);
    } else if (prevInside) {
      // Exit point: the cut line runs straight from here to the next entry point.
      ox.push(pieces.x[k]!); oyy.push(pieces.y[k]!); ob.push(0);
    }
  }
  const out = new Float64Array(2 * ox.length);
  ox.forEach((x, k) => { out[2 * k] = x; out[2 * k + 1] = oyy[k]!; });
  return { xy: out, bulge: ob.some((v) => v !== 0) ? Float64Array.from(ob) : undefined };
}

interface Side {
  /** Σ w A, Σ w ∫s dA, Σ w ∫t dA on the side s ≥ d (local coordinates). */
  readonly A: number;
  readonly Qs: number;
  readonly Qt: number;
}

/**
 * Straight-edged ring: A, ∫s dA and ∫t dA over the part with s ≥ d, in one pass with no clipping
 * output. In the right-handed (t, s) frame Green's theorem gives A = ∮ t ds, ∫s dA = ∮ t·s ds and
 * ∫t dA = ∮ ½t² ds (docs/methods.md §1.1); the cut line adds nothing (ds = 0 along it), so each sum runs
 * over the parts of the edges with s ≥ d, where t is linear in s and the integrals are exact:
 * ∫ t ds = Δs(ta + tb)/2, ∫ t s ds = Δs(2ta·sa + ta·sb + tb·sa + 2tb·sb)/6, ∫ ½t² ds = Δs(ta² + ta·tb + tb²)/6.
 */
function upperSideStraight(xy: Float64Array, f: Frame, d: number): [number, number, number] {
  const n = xy.length >> 1;
  const { nx, ny, tx, ty } = f;
  // Accumulators stay plain locals (no closure over them), so they are never boxed on the heap.
  let a = 0, qs = 0, qt = 0;
  const px = xy[2 * n - 2]!, py = xy[2 * n - 1]!;
  let sp = nx * px + ny * py, tp = tx * px + ty * py;
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i]!, y = xy[2 * i + 1]!;
    const sq = nx * x + ny * y, tq = tx * x + ty * y;
    // The part of the edge with s ≥ d, from (ta, sa) to (tb, sb).
    let ta = tp, sa = sp, tb = tq, sb = sq;
    const inP = sp >= d, inQ = sq >= d;
    if (inP !== inQ) {
      const tc = tp + ((d - sp) / (sq - sp)) * (tq - tp);
      if (inP) { tb = tc; sb = d; } else { ta = tc; sa = d; }
    }
    if (inP || inQ) {
      const ds = sb - sa;
      a += (ta + tb) * ds;
      qs += (2 * ta * sa + ta * sb + tb * sa + 2 * tb * sb) * ds;
      qt += (ta * ta + ta * tb + tb * tb) * ds;
    }
    sp = sq; tp = tq;
  }
  return [a / 2, qs / 6, qt / 6];
}

function upperSide(rings: readonly LocalRing[], f: Frame, d: number): Side {
  let A = 0, Qs = 0, Qt = 0;
  for (const ring of rings) {
    if (ring.bulge === undefined) {
      const [a, qs, qt] = upperSideStraight(ring.xy, f, d);
      A += ring.weight * a;
      Qs += ring.weight * qs;
      Qt += ring.weight * qt;
      continue;
    }
    const clipped = clipRing(ring, f, d);
    if (clipped === null) continue;
    const raw = clipped === ring ? null : ringIntegrals(clipped, 0, 0);
    const a = raw === null ? ring.A : raw.A;
    const qs = raw === null ? ring.Qs : f.nx * raw.Qy + f.ny * raw.Qx;
    const qt = raw === null ? ring.Qt : f.tx * raw.Qy + f.ty * raw.Qx;
    A += ring.weight * a;
    Qs += ring.weight * qs;
    Qt += ring.weight * qt;
  }
  return { A, Qs, Qt };
}

interface Root {
  readonly d: number;
  readonly method: PnaMethod;
  readonly evaluations: number;
  readonly converged: boolean;
  readonly plateau?: readonly [number, number];
}

/** Root of the quadratic through (0, g0), (½, gm), (1, g1) in [0, 1], stable formula; NaN if none. */
function quadraticRootInUnit(g0: number, gm: number, g1: number): number {
  const b = 4 * (gm - g0) - (g1 - g0);
  const c = 2 * (g1 - g0) - 4 * (gm - g0);
  const slack = 1e-9;
  const ok = (x: number): boolean => Number.isFinite(x) && x >= -slack && x <= 1 + slack;
  if (Math.abs(c) <= 1e-14 * (Math.abs(b) + Math.abs(g0))) {
    const x = -g0 / b;
    return ok(x) ? Math.min(1, Math.max(0, x)) : Number.NaN;
  }
  const disc = b * b - 4 * c * g0;
  if (disc < 0) return Number.NaN;
  const q = -(b + (b >= 0 ? 1 : -1) * Math.sqrt(disc)) / 2;
  for (const x of [q / c, g0 / q]) if (ok(x)) return Math.min(1, Math.max(0, x));
  return Number.NaN;
}

/** Brent's method (zeroin) on [a, b] with g(a) > 0 > g(b); cap BRENT_CAP, tolerance tol on d. */
function brentRoot(g: (d: number) => number, a0: number, b0: number, ga: number, gb: number, tol: number) {
  let a = a0, b = b0, fa = ga, fb = gb, c = a, fc = fa, e = b - a, dd = e;
  for (let it = 1; it <= BRENT_CAP; it++) {
    if (Math.sign(fb) === Math.sign(fc)) { c = a; fc = fa; e = b - a; dd = e; }
    if (Math.abs(fc) < Math.abs(fb)) { a = b; b = c; c = a; fa = fb; fb = fc; fc = fa; }
    const m = (c - b) / 2;
    if (Math.abs(m) <= tol || fb === 0) return { d: b, iterations: it, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number, q: number;
      if (a === c) { p = 2 * m * s; q = 1 - s; } else {
        const qq = fa / fc, r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) { e = dd; dd = p / q; } else { dd = m; e = m; }
    } else { dd = m; e = m; }
    a = b; fa = fb;
    b += Math.abs(dd) > tol ? dd : m > 0 ? tol : -tol;
    fb = g(b);
  }
  return { d: b, iterations: BRENT_CAP, converged: false };
}

/**
 * Straight-edged rings only (docs/methods.md §5.3): the cut width w(s) is piecewise linear between the
 * sorted, distinct vertex projections u. Each edge P→Q with s_P ≠ s_Q adds sign(s_Q − s_P)·t(s)
 * over its s-range (∮ t ds = A in the right-handed (t, s) frame); the pieces are accumulated as
 * difference arrays, one binary search per edge end, then integrated once from the top. Returns
 * the approximate g(u_k) = 2·ΣwA₊(u_k) − W − N at every breakpoint, used only to locate the
 * bracket: the bracket is then confirmed by exact clipping evaluations, so rounding here can
 * cost evaluations but never change the answer.
 */
function sweepBalance(rings: readonly LocalRing[], f: Frame, u: Float64Array, W: number, axialForce: number): Float64Array {
  const m = u.length;
  const c0 = new Float64Array(m);
  const c1 = new Float64Array(m);
  // Index of v in u (v is one of its values), galloping from a guess: consecutive vertices of a
  // ring are usually close in s, so this is O(1) for them and O(log n) at worst.
  const indexNear = (v: number, guess: number): number => {
    let lo: number, hi: number, step = 1;
    if (u[guess]! < v) {
      lo = guess;
      while (lo + step < m && u[lo + step]! < v) { lo += step; step *= 2; }
      hi = Math.min(lo + step, m - 1);
    } else {
      hi = guess;
      while (hi - step >= 0 && u[hi - step]! >= v) { hi -= step; step *= 2; }
      lo = Math.max(hi - step, 0);
    }
    while (lo < hi) { const mid = (lo + hi) >> 1; if (u[mid]! < v) lo = mid + 1; else hi = mid; }
    return lo;
  };
  for (const ring of rings) {
    const { xy, weight } = ring;
    const n = xy.length >> 1;
    let px = xy[2 * n - 2]!, py = xy[2 * n - 1]!;
    let sp = f.nx * px + f.ny * py, tp = f.tx * px + f.ty * py;
    let ip = indexNear(sp, m >> 1);
    for (let i = 0; i < n; i++) {
      const x = xy[2 * i]!, y = xy[2 * i + 1]!;
      const sq = f.nx * x + f.ny * y, tq = f.tx * x + f.ty * y;
      const iq = indexNear(sq, ip);
      if (sp !== sq) {
        const beta = (tq - tp) / (sq - sp);
        const sign = sq > sp ? weight : -weight;
        const ia = sq > sp ? ip : iq, ib = sq > sp ? iq : ip;
        const a = sign * (tp - beta * sp), b = sign * beta;
        c0[ia] = c0[ia]! + a; c1[ia] = c1[ia]! + b; c0[ib] = c0[ib]! - a; c1[ib] = c1[ib]! - b;
      }
      px = x; py = y; sp = sq; tp = tq; ip = iq;
    }
  }
  // Prefix sums give w(s) = c0 + c1·s on interval [u_k, u_k+1]; integrate from the top.
  let a0 = 0, a1 = 0;
  for (let k = 0; k < m; k++) { a0 += c0[k]!; a1 += c1[k]!; c0[k] = a0; c1[k] = a1; }
  const g = c0;
  let above = 0;
  g[m - 1] = -W - axialForce;
  for (let k = m - 2; k >= 0; k--) {
    const lo = u[k]!, hi = u[k + 1]!;
    above += (c0[k]! + 0.5 * c1[k]! * (lo + hi)) * (hi - lo);
    g[k] = 2 * above - W - axialForce;
  }
  return g;
}

/** Total vertices from which the Newton-located bracket replaces the sorted sweep (below it, sorting is cheap). */
const NEWTON_FROM_VERTICES = 4096;
const NEWTON_CAP = 60;
const PLATEAU_WALK = 16;

/**
 * One pass over straight-edged rings: the weighted area on the side s ≥ d and the weighted cut
 * width there, with no clipping output. In the right-handed (t, s) frame A = ∮ t ds (docs/methods.md §1.1),
 * and the cut line contributes nothing (ds = 0 along it), so A₊(d) = Σ over edges of ∫ t ds over
 * the part of the edge with s ≥ d; the cut width −dA₊/dd = Σ t at upward minus downward crossings.
 */
function upperAreaAndWidth(rings: readonly LocalRing[], f: Frame, d: number): [number, number] {
  let area = 0, width = 0;
  const { nx, ny, tx, ty } = f;
  for (const ring of rings) {
    const xy = ring.xy;
    const n = xy.length >> 1;
    let a = 0, w = 0;
    const px = xy[2 * n - 2]!, py = xy[2 * n - 1]!;
    let sp = nx * px + ny * py, tp = tx * px + ty * py;
    for (let i = 0; i < n; i++) {
      const x = xy[2 * i]!, y = xy[2 * i + 1]!;
      const sq = nx * x + ny * y, tq = tx * x + ty * y;
      if (sp >= d) {
        if (sq >= d) a += 0.5 * (tp + tq) * (sq - sp);
        else {
          const tc = tp + ((d - sp) / (sq - sp)) * (tq - tp);
          a += 0.5 * (tp + tc) * (d - sp);
          w -= tc;
        }
      } else if (sq >= d) {
        const tc = tp + ((d - sp) / (sq - sp)) * (tq - tp);
        a += 0.5 * (tc + tq) * (sq - d);
        w += tc;
      }
      sp = sq; tp = tq;
    }
    area += ring.weight * a;
    width += ring.weight * w;
  }
  return [area, width];
}

/** Smallest and largest vertex projection s (straight-edged rings), by the same scan the extreme fibres use. */
function projectionRange(rings: readonly LocalRing[], f: Frame): [number, number] {
  const out: [number, number] = [Infinity, -Infinity];
  for (const { xy } of rings) ringProjectionRange(xy, undefined, 0, 0, f.nx, f.ny, out);
  return out;
}

/** The largest vertex projection below x (or at x, when `orAt`); −Infinity when none. */
function breakpointBelow(rings: readonly LocalRing[], f: Frame, x: number, orAt: boolean): number {
  let best = -Infinity;
  for (const { xy } of rings) {
    for (let i = 0; i < xy.length; i += 2) {
      const v = f.nx * xy[i]! + f.ny * xy[i + 1]!;
      if ((v < x || (orAt && v === x)) && v > best) best = v;
    }
  }
  return best;
}

/** The smallest vertex projection above x; Infinity when none. */
function breakpointAbove(rings: readonly LocalRing[], f: Frame, x: number): number {
  let best = Infinity;
  for (const { xy } of rings) {
    for (let i = 0; i < xy.length; i += 2) {
      const v = f.nx * xy[i]! + f.ny * xy[i + 1]!;
      if (v > x && v < best) best = v;
    }
  }
  return best;
}

type NewtonFound =
  | { readonly kind: 'bracket'; readonly sl: number; readonly sh: number; readonly gl: number; readonly gh: number }
  | { readonly kind: 'breakpoint'; readonly d: number }
  | { readonly kind: 'plateau'; readonly low: number; readonly high: number };

/**
 * Straight-edged rings with many vertices (docs/methods.md §5.3): Newton's method on g(d) = 2A₊ − W − N,
 * g′ = −2·width, safeguarded by bisection inside [s_min, s_max], locates d in O(n) per step with
 * no sorting; then the breakpoints around it are found by linear scans and confirmed by exact
 * evaluations, with the same tests as solveBalance: g > tolerance below and < −tolerance above
 * gives the bracket in which g is exactly quadratic; |g| ≤ tolerance at one breakpoint, or at a
 * run of them (a plateau), with the neighbours outside strictly signed, gives that breakpoint or
 * plateau. Anything else (no convergence within NEWTON_CAP, a run longer than PLATEAU_WALK)
 * returns null and the caller uses the sorted sweep. So this only ever changes how the answer
 * is found, never the answer. `passes` counts the O(n) passes.
 */
function newtonBracket(
  rings: readonly LocalRing[],
  f: Frame,
  W: number,
  axialForce: number,
  Qs: number,
  g: (d: number) => number,
  zeroTol: number,
): { readonly found: NewtonFound | null; readonly passes: number } {
  let passes = 1;
  let [a, b] = projectionRange(rings, f);
  const span = b - a;
  let d = Math.min(b, Math.max(a, Qs / W));
  let converged = false;
  for (let k = 0; k < NEWTON_CAP && !converged; k++) {
    const [up, width] = upperAreaAndWidth(rings, f, d);
    passes++;
    const gd = 2 * up - W - axialForce;
    if (gd === 0) { converged = true; break; }
    if (gd > 0) a = d; else b = d;
    let next = width > 0 ? d + gd / (2 * width) : Number.NaN;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    converged = Math.abs(next - d) <= 1e-13 * span || b - a <= 1e-13 * span;
    d = next;
  }
  if (!converged) return { found: null, passes };
  const sl = breakpointBelow(rings, f, d, true), sh = breakpointAbove(rings, f, d);
  passes += 2;
  if (!Number.isFinite(sl) || !Number.isFinite(sh)) return { found: null, passes };
  const gl = g(sl), gh = g(sh);
  passes += 2;
  if (gl > zeroTol && gh < -zeroTol) return { found: { kind: 'bracket', sl, sh, gl, gh }, passes };
  // Otherwise the balance holds (within tolerance) at one or more breakpoints next to d: a vertex
  // on the PNA, common in symmetric sections, or a plateau. As in solveBalance the run of such
  // breakpoints reaches from the first with g ≤ tolerance to the last with g ≥ −tolerance; walk
  // to its ends (at most PLATEAU_WALK steps each way) and check the breakpoints just outside it.
  const within = (v: number): boolean => Math.abs(v) <= zeroTol;
  let low: number, high: number;
  if (within(gl)) {
    low = sl;
    for (let k = 0; ; k++) {
      const previous = breakpointBelow(rings, f, low, false);
      if (!Number.isFinite(previous) || k === PLATEAU_WALK) return { found: null, passes };
      const gp = g(previous);
      passes += 2;
      if (gp > zeroTol) break;
      if (!within(gp)) return { found: null, passes };
      low = previous;
    }
  } else if (gl > zeroTol && within(gh)) low = sh;
  else return { found: null, passes };
  if (within(gh)) {
    high = sh;
    for (let k = 0; ; k++) {
      const next = breakpointAbove(rings, f, high);
      if (!Number.isFinite(next) || k === PLATEAU_WALK) return { found: null, passes };
      const gn = g(next);
      passes += 2;
      if (gn < -zeroTol) break;
      if (!within(gn)) return { found: null, passes };
      high = next;
    }
  } else if (gh < -zeroTol) high = sl;
  else return { found: null, passes };
  if (low === high) return { found: { kind: 'breakpoint', d: low }, passes };
  return { found: { kind: 'plateau', low, high }, passes };
}

/**
 * Largest index i in [a, b] with pred(i), given pred(a) and pred monotone (true, then false).
 * Without a hint: plain bisection. With a hint: galloping search outward from it (a few
 * evaluations when the hint is right, O(log n) when it is not).
 */
function lastTrue(pred: (i: number) => boolean, a: number, b: number, hint?: number): number {
  let lo = a, hi = b + 1;
  if (hint !== undefined) {
    const h = Math.min(b, Math.max(a, hint));
    let step = 1;
    if (pred(h)) {
      lo = h;
      while (lo + step <= b && pred(lo + step)) { lo += step; step *= 2; }
      hi = Math.min(lo + step, b + 1);
    } else {
      hi = h;
      while (hi - step > a && !pred(hi - step)) { hi -= step; step *= 2; }
      lo = Math.max(hi - step, a);
    }
  }
  while (hi - lo > 1) { const mid = (lo + hi) >> 1; if (pred(mid)) lo = mid; else hi = mid; }
  return lo;
}

function solveBalance(
  g: (d: number) => number,
  s: Float64Array,
  gEnds: [number, number],
  polygonsOnly: boolean,
  zeroTol: number,
  approx?: Float64Array,
): Root {
  let evaluations = 0;
  const cache = new Map<number, number>([[0, gEnds[0]], [s.length - 1, gEnds[1]]]);
  const gi = (i: number): number => {
    let v = cache.get(i);
    if (v === undefined) { v = g(s[i]!); evaluations++; cache.set(i, v); }
    return v;
  };
  const last = s.length - 1;
  if (gi(0) <= zeroTol) return { d: s[0]!, method: 'breakpoint', evaluations, converged: true };
  const hintOf = (test: (v: number) => boolean): number | undefined => {
    if (approx === undefined) return undefined;
    let k = 0;
    while (k + 1 < approx.length && test(approx[k + 1]!)) k++;
    return k;
  };
  const lo = lastTrue((i) => gi(i) > zeroTol, 0, last - 1, hintOf((v) => v > zeroTol));
  const hi = lo + 1;
  if (gi(hi) >= -zeroTol) {
    const lo2 = lastTrue((i) => gi(i) >= -zeroTol, hi, last, hintOf((v) => v >= -zeroTol));
    if (lo2 === hi) return { d: s[hi]!, method: 'breakpoint', evaluations, converged: true };
    return { d: (s[hi]! + s[lo2]!) / 2, method: 'plateau', evaluations, converged: true, plateau: [s[hi]!, s[lo2]!] };
  }
  const sl = s[lo]!, sh = s[hi]!;
  if (polygonsOnly) {
    const gm = g((sl + sh) / 2);
    evaluations++;
    const x = quadraticRootInUnit(gi(lo), gm, gi(hi));
    if (!Number.isNaN(x)) return { d: sl + x * (sh - sl), method: 'quadratic', evaluations, converged: true };
  }
  const tol = RELATIVE_TOLERANCE * (s[last]! - s[0]!);
  const counted = (d: number): number => { evaluations++; return g(d); };
  const r = brentRoot(counted, sl, sh, gi(lo), gi(hi), tol);
  return { d: r.d, method: 'brent', evaluations, converged: r.converged };
}

interface CoreResult {
  readonly axis: WeightedPlasticAxis;
  /** s-centroids of the weighted halves, region coordinates. */
  readonly centroidPlus: number;
  readonly centroidMinus: number;
}

function plasticAxisCore(pieces: readonly WeightedRegion[], angleDeg: Degrees, axialForce: number, useSweep = true): CoreResult {
  checkPieces(pieces, axialForce);
  const [c, sn] = cosSinDegrees(angleDeg);
  const f: Frame = { nx: -sn, ny: c, tx: c, ty: sn };
  const [ox, oy] = vertexBoxCentre(pieces.flatMap((p) => p.region));
  const rings = localRings(pieces, ox, oy, f);
  const W = rings.reduce((sum, r) => sum + r.weight * r.A, 0);
  const Qs = rings.reduce((sum, r) => sum + r.weight * r.Qs, 0);
  const Qt = rings.reduce((sum, r) => sum + r.weight * r.Qt, 0);
  if (!(W > 0)) throw new RangeError(`plastic neutral axis: the weighted area is ${W}; the pieces must have positive area`);
  if (Math.abs(axialForce) > W) {
    throw new RangeError(`plastic neutral axis: axial force ${axialForce} exceeds the full-yield force ${W} of the section`);
  }
  const g = (d: number): number => 2 * upperSide(rings, f, d).A - W - axialForce;
  const polygonsOnly = rings.every((r) => r.bulge === undefined || r.bulge.every(isStraight));
  const zeroTol = 1e-12 * W;
  const vertices = rings.reduce((sum, r) => sum + (r.xy.length >> 1), 0);
  // The same g by the one-pass trapezoid sums (no clipping output): exact for straight edges.
  const gFast = (d: number): number => 2 * upperAreaAndWidth(rings, f, d)[0] - W - axialForce;
  const located = polygonsOnly && useSweep && vertices >= NEWTON_FROM_VERTICES ? newtonBracket(rings, f, W, axialForce, Qs, gFast, zeroTol) : null;
  let root: Root;
  if (located?.found?.kind === 'breakpoint') {
    root = { d: located.found.d, method: 'breakpoint', evaluations: located.passes, converged: true };
  } else if (located?.found?.kind === 'plateau') {
    const { low, high } = located.found;
    root = { d: (low + high) / 2, method: 'plateau', evaluations: located.passes, converged: true, plateau: [low, high] };
  } else if (located?.found) {
    // The same closed-form quadratic as solveBalance, on the confirmed bracket.
    const { sl, sh, gl, gh } = located.found;
    const x = quadraticRootInUnit(gl, gFast((sl + sh) / 2), gh);
    if (Number.isNaN(x)) {
      const r = brentRoot(gFast, sl, sh, gl, gh, RELATIVE_TOLERANCE * (sh - sl));
      root = { d: r.d, method: 'brent', evaluations: located.passes + 1 + r.iterations, converged: r.converged };
    } else {
      root = { d: sl + x * (sh - sl), method: 'quadratic', evaluations: located.passes + 1, converged: true };
    }
  } else {
    const s = breakpoints(rings, f);
    const approx = polygonsOnly && useSweep ? sweepBalance(rings, f, s, W, axialForce) : undefined;
    const found = solveBalance(g, s, [W - axialForce, -W - axialForce], polygonsOnly, zeroTol, approx);
    root = located ? { ...found, evaluations: found.evaluations + located.passes } : found;
  }
  const up = upperSide(rings, f, root.d);
  const lowA = W - up.A;
  const lowQs = Qs - up.Qs;
  const shiftN = f.nx * ox + f.ny * oy;
  const shiftT = f.tx * ox + f.ty * oy;
  const axis: WeightedPlasticAxis = {
    angleDeg,
    normalX: f.nx,
    normalY: f.ny,
    d: root.d + shiftN,
    moment: up.Qs - root.d * up.A + (root.d * lowA - lowQs),
    // About the coordinate origin: the local value plus the net force times the origin shift.
    perpendicularMoment: 2 * up.Qt - Qt + shiftT * (up.A - lowA),
    weightedAreaPlus: up.A,
    weightedAreaMinus: lowA,
    axialForce,
    method: root.method,
    evaluations: root.evaluations,
    residual: up.A - lowA - axialForce,
    converged: root.converged,
    ...(root.plateau ? { plateau: [root.plateau[0] + shiftN, root.plateau[1] + shiftN] as const } : {}),
  };
  return { axis, centroidPlus: up.Qs / up.A + shiftN, centroidMinus: lowQs / lowA + shiftN };
}

/**
 * Area and first moment ∫(y − c) dA of the part of `region` above the horizontal line y = c:
 * exact (arcs included), in one pass over the rings, with no Boolean clipping (the sums of
 * upperSide about an origin on the line, where the cut itself adds nothing). Used for shear
 * Q = ∫_above (y − ȳ) dA, where clipping a million-vertex outline with polygon-clipping failed.
 */
export function areaAboveLine(region: Region, c: number): { readonly area: number; readonly firstMoment: number } {
  const first = region[0]?.outer.xy;
  if (first === undefined || first.length === 0) return { area: 0, firstMoment: 0 };
  const f: Frame = { nx: 0, ny: 1, tx: 1, ty: 0 };
  const side = upperSide(localRings([{ region, weight: 1 }], first[0]!, c, f), f, 0);
  return { area: side.A, firstMoment: side.Qs };
}

/**
 * Area and first moments of the part of a region beyond a line, in one exact pass (arcs
 * included, no Boolean clipping; the same edge integrals as areaAboveLine): above y = c
 * (horizontal) or right of x = c (vertical). Moments about (ox, oy): Qx = ∫(y − oy) dA,
 * Qy = ∫(x − ox) dA. Used for the shear formula's Q (core/joints/shear-stress.ts).
 */
export function momentsBeyondLine(region: Region, orientation: 'horizontal' | 'vertical', c: number, ox: number, oy: number): { readonly A: number; readonly Qx: number; readonly Qy: number } {
  if (region.length === 0) return { A: 0, Qx: 0, Qy: 0 };
  if (orientation === 'horizontal') {
    // s = y, t = x: a right-handed (t, s) frame.
    const f: Frame = { nx: 0, ny: 1, tx: 1, ty: 0 };
    const side = upperSide(localRings([{ region, weight: 1 }], ox, oy, f), f, c - oy);
    return { A: side.A, Qx: side.Qs, Qy: side.Qt };
  }
  // s = x, t = −y: right-handed (t × s = +1).
  const f: Frame = { nx: 1, ny: 0, tx: 0, ty: -1 };
  const side = upperSide(localRings([{ region, weight: 1 }], ox, oy, f), f, c - ox);
  return { A: side.A, Qx: -side.Qt, Qy: side.Qs };
}

/**
 * PNA of several weighted regions with the PNA at angleDeg (CCW from +x), balancing
 * Σ w_i A_i(s > d) − Σ w_i A_i(s < d) = axialForce (docs/methods.md §5.1, §5.3).
 * Throws RangeError for non-positive weights, empty input or |axialForce| > Σ w_i A_i.
 */
export function plasticNeutralAxisWeighted(
  pieces: readonly WeightedRegion[],
  angleDeg: Degrees,
  axialForce = 0,
): WeightedPlasticAxis {
  return plasticAxisCore(pieces, angleDeg, axialForce).axis;
}

/**
 * The same balance found by bisection over all breakpoints, without the width sweep (each step a
 * full clipping pass). Kept as the independent check of the sweep-located bracket in the tests.
 */
export function plasticNeutralAxisWeightedByBisection(
  pieces: readonly WeightedRegion[],
  angleDeg: Degrees,
  axialForce = 0,
): WeightedPlasticAxis {
  return plasticAxisCore(pieces, angleDeg, axialForce, false).axis;
}

/** PNA and plastic modulus of one region with the PNA at angleDeg (CCW from +x), docs/methods.md §5. */
export function plasticNeutralAxis(region: Region, angleDeg: Degrees): PlasticAxis {
  const { axis, centroidPlus, centroidMinus } = plasticAxisCore([{ region, weight: 1 }], angleDeg, 0);
  return {
    ...axis,
    Z: axis.moment,
    Zperp: axis.perpendicularMoment,
    momentNotParallel: Math.abs(axis.perpendicularMoment) > 1e-9 * axis.moment,
    areaPlus: axis.weightedAreaPlus,
    areaMinus: axis.weightedAreaMinus,
    centroidPlus,
    centroidMinus,
  };
}

/** Bending about x: the PNA is horizontal, at y = pnaY (docs/methods.md §5). */
export function plasticAboutX(region: Region): { readonly pnaY: number; readonly Zx: number; readonly axis: PlasticAxis } {
  const axis = plasticNeutralAxis(region, 0 as Degrees);
  return { pnaY: axis.d, Zx: axis.Z, axis };
}

/** Bending about y: the PNA is vertical, at x = pnaX (θ = −90°, so s = x). */
export function plasticAboutY(region: Region): { readonly pnaX: number; readonly Zy: number; readonly axis: PlasticAxis } {
  const axis = plasticNeutralAxis(region, -90 as Degrees);
  return { pnaX: axis.d, Zy: axis.Z, axis };
}
