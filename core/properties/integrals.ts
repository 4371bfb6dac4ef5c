/**
 * Raw area integrals of rings and regions: A, ∫x dA, ∫y dA, ∫x² dA, ∫y² dA, ∫xy dA.
 *
 * Method: Green's theorem in fan form, ∬ f dA = 1/(k+2) ∮ f (x dy − y dx) for a monomial f of
 * degree k (docs/methods.md §1.1). Straight edges use the exact vertex sums of §1.1. Circular arcs
 * (bulge ≠ 0) use the exact decomposition edge(Ps→Pc) + sector + edge(Pc→Pe) with the binomial
 * shift of §2.2; arcs with |sweep| < 0.5 rad use 8-point Gauss–Legendre in t along the arc, with
 * points in half-angle form so the far centre never enters (§2.4; threshold: see SMALL_SWEEP).
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
 * Accuracy: straight edges exact up to rounding (~n·ε); arcs at rounding level for every sweep
 * (closed form for |sweep| ≥ 0.5, where r/c ≤ ~2; quadrature below, up to r/c ≈ 1e6, docs/methods.md §2.4).
 * Not guaranteed: meaningful values for self-intersecting rings (winding-weighted, §1.1).
 */
import { invariant } from '../invariant.ts';
import type { Region, Ring } from '../geometry/types.ts';
import type { RawIntegrals } from './types.ts';
import { arcFromBulge, isStraight } from './arc.ts';

/**
 * Below this |sweep| the arc is integrated by 8-point Gauss–Legendre instead of the closed form.
 * docs/methods.md §2.4 suggests 0.01; we use 0.5 rad because the closed form's cancellation (error growing
 * like (r/c)⁴) still costs ~1e−7 of a segment's own integrals at 0.02 rad and ~1e−11 of a 60-wide
 * ring's Ixx at 0.016 rad, while the 8-point rule on this trigonometric polynomial of degree 3 has
 * a truncation error below ~1e−20 relative at 0.5 rad (error term Δ¹⁷·3¹⁶·(8!)⁴/(17·(16!)³)).
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

/** Exact arc contribution by edge(Ps→Pc) + sector(Pc) + edge(Pc→Pe) (docs/methods.md §2.2). */
function addArcClosedForm(xs: number, ys: number, xe: number, ye: number, b: number, acc: Acc): void {
  const arc = arcFromBulge(xs, ys, xe, ye, b);
  const cx = xs + arc.centreDx;
  const cy = ys + arc.centreDy;
  const r = arc.radius;
  const dt = arc.sweep;
  const t0 = arc.t0;
  const t1 = t0 + dt;
  const S = Math.sin(t1) - Math.sin(t0);
  const C = Math.cos(t1) - Math.cos(t0);
  const S2 = Math.sin(2 * t1) - Math.sin(2 * t0);
  const Ssq = Math.sin(t1) ** 2 - Math.sin(t0) ** 2;
  const r2 = r * r;
  const r3 = r2 * r;
  const r4 = r2 * r2;
  const As = (r2 * dt) / 2;
  const ix = (r3 * S) / 3; // ∫ξ dA about the apex
  const iy = (-r3 * C) / 3; // ∫η dA
  const ixx = r4 * (dt / 8 + S2 / 16); // ∫ξ² dA
  const iyy = r4 * (dt / 8 - S2 / 16); // ∫η² dA
  const ixy = (r4 * Ssq) / 8; // ∫ξη dA
  addEdge(xs, ys, cx, cy, acc);
  acc[0]! += As;
  acc[1]! += cy * As + iy;
  acc[2]! += cx * As + ix;
  acc[3]! += cy * cy * As + 2 * cy * iy + iyy;
  acc[4]! += cx * cx * As + 2 * cx * ix + ixx;
  acc[5]! += cx * cy * As + cx * iy + cy * ix + ixy;
  addEdge(cx, cy, xe, ye, acc);
}

/** Small-sweep arc: 8-point Gauss–Legendre of the fan form (1.1) along the arc (docs/methods.md §2.4). */
function addArcQuadrature(xs: number, ys: number, xe: number, ye: number, b: number, acc: Acc): void {
  const arc = arcFromBulge(xs, ys, xe, ye, b);
  const r = arc.radius;
  const dt = arc.sweep;
  let a = 0, qx = 0, qy = 0, ixx = 0, iyy = 0, ixy = 0;
  for (let k = 0; k < 8; k++) {
    const tau = (dt * (1 + GL_X[k]!)) / 2;
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
  const h = dt / 2; // dτ = (dt/2) dξ
  acc[0]! += (h * a) / 2;
  acc[1]! += (h * qx) / 3;
  acc[2]! += (h * qy) / 3;
  acc[3]! += (h * ixx) / 4;
  acc[4]! += (h * iyy) / 4;
  acc[5]! += (h * ixy) / 4;
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
    else if (Math.abs(4 * Math.atan(b)) < SMALL_SWEEP) addArcQuadrature(x0, y0, x1, y1, b, acc);
    else addArcClosedForm(x0, y0, x1, y1, b, acc);
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
