/**
 * Raw area integrals of rings and regions: A, ∫x dA, ∫y dA, ∫x² dA, ∫y² dA, ∫xy dA.
 *
 * Method: Green's theorem in fan form, ∬ f dA = 1/(k+2) ∮ f (x dy − y dx) for a monomial f of
 * degree k (docs/methods.md §1.1). Straight edges use the exact vertex sums of §1.1. Circular arcs
 * (bulge ≠ 0) use composite 8-point Gauss–Legendre in t along the arc, in panels of at most
 * 0.5 rad, with points in half-angle form so the far centre never enters (§2.4; see SMALL_SWEEP):
 * for a polynomial integrand of this degree that is exact up to rounding.
 *
 * Winding: the input is a NORMALISED region (outer rings counter-clockwise, holes clockwise,
 * core/geometry/types.ts); holes then contribute negatively by themselves. Rings are not
 * re-oriented or repaired here.
 *
 * Local origin: every sum is taken in coordinates x − ox, y − oy (§1.3). regionIntegrals defaults
 * to the FIRST VERTEX of the first outer ring (the second choice of §1.3), so a section far from the
 * drawing origin keeps its digits (local coordinates are then at most the section's size). The
 * bounding-box centre would need an extra pass over every vertex, which alone costs about half of
 * the Green's-theorem pass on a 1,000,000-vertex ring (tests/bench/properties.bench.ts); pass
 * vertexBoxCentre(region) explicitly when that origin is wanted. The result states its origin;
 * only centroids need it added back.
 *
 * Accuracy: straight edges exact up to rounding (~n·ε); arcs at rounding level for every sweep up
 * to r/c ≈ 1e6 (docs/methods.md §2.4). Measured against 40-digit references (mpmath) for a lone circular
 * segment swept over 0.3–2 rad, the worst case for cancellation: A, ȳ, Iy and the centroidal Ix
 * within 2e−14 relative (worst seen 4.6e−15, on Ix; tests/properties/arc-precision.test.ts).
 * Not guaranteed: meaningful values for self-intersecting rings (winding-weighted, §1.1).
 */
import { invariant } from '../invariant.ts';
import type { Region, Ring } from '../geometry/types.ts';
import type { RawIntegrals } from './types.ts';
import { arcFromBulge, isStraight } from './arc.ts';

/**
 * The widest panel of the arc quadrature, in radians. The 8-point rule on the fan-form integrand
 * (a trigonometric polynomial of degree 3 in the sweep) has a truncation error below ~1e−20
 * relative on a 0.5 rad panel (error term Δ¹⁷·3¹⁶·(8!)⁴/(17·(16!)³)). A closed form about the
 * centre was used above 0.5 rad until issue 18: it subtracts a sector and a triangle, and lost
 * up to 5 digits of a thin segment's centroidal Ix between 0.5 and 1.5 rad (4.4e−11 relative at a
 * bulge of 1/7), so every arc now takes ⌈|sweep|/0.5⌉ panels (at most 13 for a full turn).
 */
const SMALL_SWEEP = 0.5;

// 8-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4; digits from
// memory; checked to integrate x^k, k ≤ 14 even, to 5e−16, and by the segment oracle of
// tests/properties/arcs.test.ts).
const GL_X = [
  -0.9602898564975363, -0.7966664774136267, -0.525532409916329, -0.1834346424956498, 0.1834346424956498,
  0.525532409916329, 0.7966664774136267, 0.9602898564975363,
];
const GL_W = [
  0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.362683783378362, 0.362683783378362,
  0.3137066458778873, 0.2223810344533745, 0.1012285362903763,
];

/** Accumulator layout, true units: A, Qx=∫y, Qy=∫x, Ixx=∫y², Iyy=∫x², Ixy=∫xy. */
type Acc = Float64Array;

/** Fan-triangle (O, P, Q) integrals of one straight edge, added to acc (docs/methods.md §1.1). */
function addEdge(x0: number, y0: number, x1: number, y1: number, acc: Acc): void {
  const c = x0 * y1 - x1 * y0;
  acc[0]! += c / 2;
  acc[1]! += ((y0 + y1) * c) / 6;
  acc[2]! += ((x0 + x1) * c) / 6;
  acc[3]! += ((y0 * y0 + y0 * y1 + y1 * y1) * c) / 12;
  acc[4]! += ((x0 * x0 + x0 * x1 + x1 * x1) * c) / 12;
  acc[5]! += ((x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c) / 24;
}

/**
 * Arc contribution: composite 8-point Gauss–Legendre of the fan form (1.1) along the arc, in
 * panels of at most SMALL_SWEEP (docs/methods.md §2.4). Points are taken from the arc's start in
 * half-angle form, P(τ) = Ps + 2r·sin(τ/2)·(−sin(t0 + τ/2), cos(t0 + τ/2)), so the centre (far
 * away on a flat arc) never enters, and no large sector and triangle are subtracted.
 */
function addArc(xs: number, ys: number, xe: number, ye: number, b: number, acc: Acc): void {
  const arc = arcFromBulge(xs, ys, xe, ye, b);
  const r = arc.radius;
  const dt = arc.sweep;
  const panels = Math.max(1, Math.ceil(Math.abs(dt) / SMALL_SWEEP));
  const h = dt / panels; // one panel's sweep; dτ = (h/2) dξ within it
  let a = 0, qx = 0, qy = 0, ixx = 0, iyy = 0, ixy = 0;
  for (let p = 0; p < panels; p++) {
    for (let k = 0; k < 8; k++) {
      const tau = h * (p + (1 + GL_X[k]!) / 2);
      const chord = 2 * r * Math.sin(tau / 2);
      const mid = arc.t0 + tau / 2;
      const x = xs - chord * Math.sin(mid);
      const y = ys + chord * Math.cos(mid);
      const t = arc.t0 + tau;
      // x dy − y dx = r (x cos t + y sin t) dt on the circle.
      const w = GL_W[k]! * r * (x * Math.cos(t) + y * Math.sin(t));
      a += w;
      qx += y * w;
      qy += x * w;
      ixx += y * y * w;
      iyy += x * x * w;
      ixy += x * y * w;
    }
  }
  const half = h / 2;
  acc[0]! += (half * a) / 2;
  acc[1]! += (half * qx) / 3;
  acc[2]! += (half * qy) / 3;
  acc[3]! += (half * ixx) / 4;
  acc[4]! += (half * iyy) / 4;
  acc[5]! += (half * ixy) / 4;
}

/** Hot path for a ring of straight edges: one pass, six accumulators, no allocation (docs/methods.md §1.4). */
function straightRingSums(xy: Float64Array, ox: number, oy: number, acc: Acc): void {
  const n = xy.length >> 1;
  let xp = xy[2 * n - 2]! - ox;
  let yp = xy[2 * n - 1]! - oy;
  let a = 0, qx = 0, qy = 0, ixx = 0, iyy = 0, ixy = 0;
  for (let i = 0; i < 2 * n; i += 2) {
    const x = xy[i]! - ox;
    const y = xy[i + 1]! - oy;
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
  acc[0]! += a / 2;
  acc[1]! += qx / 6;
  acc[2]! += qy / 6;
  acc[3]! += ixx / 12;
  acc[4]! += iyy / 12;
  acc[5]! += ixy / 24;
}

/** Ring with some arcs: straight edges and arcs segment by segment. */
function mixedRingSums(xy: Float64Array, bulge: Float64Array, ox: number, oy: number, acc: Acc): void {
  const n = xy.length >> 1;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = xy[2 * i]! - ox;
    const y0 = xy[2 * i + 1]! - oy;
    const x1 = xy[2 * j]! - ox;
    const y1 = xy[2 * j + 1]! - oy;
    const b = bulge[i]!;
    if (isStraight(b)) addEdge(x0, y0, x1, y1, acc);
    else addArc(x0, y0, x1, y1, b, acc);
  }
}

function checkRing(ring: Ring, where: string): void {
  const n = ring.xy.length >> 1;
  invariant(ring.xy.length % 2 === 0, `${where}: xy has odd length ${ring.xy.length}`);
  invariant(n >= 2, `${where}: a ring needs at least 2 vertices, got ${n}`);
  invariant(
    ring.bulge === undefined || ring.bulge.length === n,
    `${where}: bulge has ${ring.bulge?.length} entries for ${n} vertices`,
  );
}

function sumRing(ring: Ring, ox: number, oy: number, acc: Acc): void {
  if (ring.bulge === undefined) straightRingSums(ring.xy, ox, oy, acc);
  else mixedRingSums(ring.xy, ring.bulge, ox, oy, acc);
}

function toRaw(acc: Acc, ox: number, oy: number, where: string): RawIntegrals {
  const [A = 0, Qx = 0, Qy = 0, Ixx = 0, Iyy = 0, Ixy = 0] = acc;
  invariant(
    [A, Qx, Qy, Ixx, Iyy, Ixy].every(Number.isFinite),
    `${where}: integrals are not finite (non-finite coordinate or bulge in the input)`,
  );
  return { originX: ox, originY: oy, A, Qx, Qy, Ixx, Iyy, Ixy };
}

/** Raw integrals of one ring about the origin (ox, oy); sign follows the ring's winding. */
export function ringIntegrals(ring: Ring, ox: number, oy: number): RawIntegrals {
  checkRing(ring, 'ringIntegrals');
  const acc = new Float64Array(6);
  sumRing(ring, ox, oy, acc);
  return toRaw(acc, ox, oy, 'ringIntegrals');
}

/** Centre of the bounding box of all vertices of the region (the local origin of docs/methods.md §1.3). */
export function vertexBoxCentre(region: Region): [number, number] {
  let xMin = Infinity, xMax = -Infinity, yMin = Infinity, yMax = -Infinity;
  for (const polygon of region) {
    for (const ring of [polygon.outer, ...polygon.holes]) {
      const xy = ring.xy;
      for (let i = 0; i < xy.length; i += 2) {
        const x = xy[i]!;
        const y = xy[i + 1]!;
        if (x < xMin) xMin = x;
        if (x > xMax) xMax = x;
        if (y < yMin) yMin = y;
        if (y > yMax) yMax = y;
      }
    }
  }
  invariant(xMin <= xMax && yMin <= yMax, 'vertexBoxCentre: the region has no vertices');
  return [(xMin + xMax) / 2, (yMin + yMax) / 2];
}

/**
 * Raw integrals of a normalised region (sum over all outer rings and holes) about (ox, oy);
 * when either is omitted, about the first vertex of the first outer ring (local origin, §1.3).
 */
export function regionIntegrals(region: Region, ox?: number, oy?: number): RawIntegrals {
  invariant(region.length > 0, 'regionIntegrals: the region has no polygons');
  let x0 = ox;
  let y0 = oy;
  if (x0 === undefined || y0 === undefined) {
    const xy = region[0]!.outer.xy;
    invariant(xy.length >= 2, 'regionIntegrals: polygon 0 outer ring has no vertices');
    [x0, y0] = [xy[0]!, xy[1]!];
  }
  const acc = new Float64Array(6);
  region.forEach((polygon, p) => {
    checkRing(polygon.outer, `regionIntegrals: polygon ${p} outer ring`);
    sumRing(polygon.outer, x0, y0, acc);
    polygon.holes.forEach((hole, h) => {
      checkRing(hole, `regionIntegrals: polygon ${p} hole ${h}`);
      sumRing(hole, x0, y0, acc);
    });
  });
  return toRaw(acc, x0, y0, 'regionIntegrals');
}
