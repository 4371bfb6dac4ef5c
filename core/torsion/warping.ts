/**
 * Saint-Venant warping function on a straight-sided T6 mesh, and the section constants from it
 * (docs/methods.md §7.1–7.5; Pilkey 2002, torsion and warping chapters).
 *
 * Coordinates X, Y are relative to the mesh centroid. Ip, Ix, Iy, Ixy and the centroid are
 * integrated over the same mesh (docs/methods.md §7.2: mixing exact-arc Ip with a chord mesh would
 * exceed the FE error). J = Ip − Fᵀω (evaluated as the energy functional, see below); the Trefftz shear centre from ∫Xω, ∫Yω; Cw = ∫ω_S² about
 * the shear centre. One material: G cancels; several: every element integral is weighted by
 * QuadraticMesh.weights (G_e/G_ref, docs/methods.md §7.7). Disconnected components twist independently: J
 * adds; each component's ω is given zero mean, so xs, ys and Cw then treat the pieces as
 * warping freely, with no shear connection between them.
 */
import { elementStiffnessAndLoad, MASS_T6, shapeDerivatives, elementGeometry } from './element.ts';
import { csrIndex, csrMultiply, csrPattern, pcgSolve, type Preconditioner } from './sparse.ts';
import { outside } from '../invariant.ts';

export interface QuadraticMesh {
  /** All node coordinates: corners first (same indices as the T3 mesh), then mid-side nodes. */
  readonly xy: Float64Array;
  /** Six node indices per element: corners CCW, then mid-sides 0–1, 1–2, 2–0. */
  readonly elements: Int32Array;
  /**
   * Per element, its shear modulus over the reference one, G_e/G_ref (docs/methods.md §7.7); absent
   * means one material (all 1). K_e, F_e, the mass matrix and the section integrals are scaled
   * by it, so J, the centroid, Ix, Iy, the shear centre and Cw are all G-weighted.
   */
  readonly weights?: Float64Array | undefined;
}

/** Adds one mid-side node per edge (shared by the two triangles on it). */
export function quadraticMesh(xy: Float64Array, triangles: Int32Array): QuadraticMesh {
  const n = xy.length / 2;
  const out = Array.from(xy);
  const mid = new Map<number, number>();
  const midpoint = (a: number, b: number): number => {
    const key = Math.min(a, b) * n + Math.max(a, b);
    let m = mid.get(key);
    if (m === undefined) {
      m = out.length / 2;
      out.push(((xy[2 * a] ?? outside(xy, 2 * a)) + (xy[2 * b] ?? outside(xy, 2 * b))) / 2, ((xy[2 * a + 1] ?? outside(xy, 2 * a + 1)) + (xy[2 * b + 1] ?? outside(xy, 2 * b + 1))) / 2);
      mid.set(key, m);
    }
    return m;
  };
  const el = new Int32Array((triangles.length / 3) * 6);
  for (let t = 0; t < triangles.length / 3; t++) {
    const a = triangles[3 * t] ?? outside(triangles, 3 * t);
    const b = triangles[3 * t + 1] ?? outside(triangles, 3 * t + 1);
    const c = triangles[3 * t + 2] ?? outside(triangles, 3 * t + 2);
    el.set([a, b, c, midpoint(a, b), midpoint(b, c), midpoint(c, a)], 6 * t);
  }
  return { xy: Float64Array.from(out), elements: el };
}

/**
 * The same mesh with nodes renumbered by reverse Cuthill–McKee (docs/methods.md §7.9): neighbours get
 * nearby numbers, which keeps the incomplete factor (and Gauss–Seidel sweeps) effective and the memory access local.
 */
export function bandOrdered(q: QuadraticMesh): QuadraticMesh {
  const n = q.xy.length / 2;
  const pattern = csrPattern(n, q.elements, 6);
  const degree = (i: number): number => (pattern.rowStart[i + 1] ?? outside(pattern.rowStart, i + 1)) - (pattern.rowStart[i] ?? outside(pattern.rowStart, i));
  const order: number[] = [];
  const placed = new Uint8Array(n);
  // Start each component from its lowest-degree node (a cheap stand-in for a peripheral one).
  const starts = Array.from({ length: n }, (_, i) => i).sort((a, b) => degree(a) - degree(b));
  for (const start of starts) {
    if (placed[start]) continue;
    placed[start] = 1;
    order.push(start);
    for (let h = order.length - 1; h < order.length; h++) {
      const v = order[h] ?? outside(order, h);
      const nbrs: number[] = [];
      for (let p = pattern.rowStart[v] ?? outside(pattern.rowStart, v); p < (pattern.rowStart[v + 1] ?? outside(pattern.rowStart, v + 1)); p++) {
        const u = pattern.col[p] ?? outside(pattern.col, p);
        if (!placed[u]) {
          placed[u] = 1;
          nbrs.push(u);
        }
      }
      nbrs.sort((a, b) => degree(a) - degree(b));
      for (const u of nbrs) order.push(u);
    }
  }
  order.reverse();
  const newId = new Int32Array(n);
  order.forEach((old, k) => (newId[old] = k));
  const xy = new Float64Array(2 * n);
  order.forEach((old, k) => {
    xy[2 * k] = q.xy[2 * old] ?? outside(q.xy, 2 * old);
    xy[2 * k + 1] = q.xy[2 * old + 1] ?? outside(q.xy, 2 * old + 1);
  });
  return { xy, elements: q.elements.map((v) => (newId[v] ?? outside(newId, v))), weights: q.weights };
}

/** Corner triangles of the nested refinement: each T6 split into its four children. */
export function childTriangles(q: QuadraticMesh): Int32Array {
  const e = q.elements;
  const out = new Int32Array((e.length / 6) * 12);
  for (let t = 0; t < e.length / 6; t++) {
    const [n0, n1, n2, n3, n4, n5] = [0, 1, 2, 3, 4, 5].map((k) => (e[6 * t + k] ?? outside(e, 6 * t + k))) as [number, number, number, number, number, number];
    out.set([n0, n3, n5, n3, n1, n4, n5, n4, n2, n3, n4, n5], 12 * t);
  }
  return out;
}

/** Parent area coordinates of the six nodes of each of the four children (childTriangles order). */
const CHILD_NODES: readonly (readonly (readonly [number, number, number])[])[] = (() => {
  const P: (readonly [number, number, number])[] = [[1, 0, 0], [0, 1, 0], [0, 0, 1], [0.5, 0.5, 0], [0, 0.5, 0.5], [0.5, 0, 0.5]];
  const kids = [[0, 3, 5], [3, 1, 4], [5, 4, 2], [3, 4, 5]];
  const avg = (p: readonly number[], q: readonly number[]): [number, number, number] => [((p[0] ?? outside(p, 0)) + (q[0] ?? outside(q, 0))) / 2, ((p[1] ?? outside(p, 1)) + (q[1] ?? outside(q, 1))) / 2, ((p[2] ?? outside(p, 2)) + (q[2] ?? outside(q, 2))) / 2];
  return kids.map((kid) => {
    const A = P[(kid[0] ?? outside(kid, 0))] ?? outside(P, (kid[0] ?? outside(kid, 0)));
    const B = P[(kid[1] ?? outside(kid, 1))] ?? outside(P, (kid[1] ?? outside(kid, 1)));
    const C = P[(kid[2] ?? outside(kid, 2))] ?? outside(P, (kid[2] ?? outside(kid, 2)));
    return [A, B, C, avg(A, B), avg(B, C), avg(C, A)];
  });
})();

/** The coarse quadratic field, exactly represented on the nested fine mesh (fine = childTriangles + quadraticMesh). */
export function prolongate(coarse: QuadraticMesh, fine: QuadraticMesh, values: Float64Array): Float64Array {
  const out = new Float64Array(fine.xy.length / 2);
  for (let t = 0; t < coarse.elements.length / 6; t++) {
    for (let k = 0; k < 4; k++) {
      const nodes = CHILD_NODES[k] ?? outside(CHILD_NODES, k);
      nodes.forEach(([l1, l2, l3], j) => {
        const N = [l1 * (2 * l1 - 1), l2 * (2 * l2 - 1), l3 * (2 * l3 - 1), 4 * l1 * l2, 4 * l2 * l3, 4 * l3 * l1];
        let v = 0;
        for (let i = 0; i < 6; i++) v += (N[i] ?? outside(N, i)) * (values[(coarse.elements[6 * t + i] ?? outside(coarse.elements, 6 * t + i))] ?? outside(values, (coarse.elements[6 * t + i] ?? outside(coarse.elements, 6 * t + i))));
        out[(fine.elements[6 * (4 * t + k) + j] ?? outside(fine.elements, 6 * (4 * t + k) + j))] = v;
      });
    }
  }
  return out;
}

export interface SolveSettings {
  readonly tolerance: number;
  readonly maxIterations: number;
  /** Clock for the phase times, ms (the caller's; core has no timer of its own). */
  readonly now?: (() => number) | undefined;
  readonly initial?: Float64Array | undefined;
  readonly preconditioner?: Preconditioner | undefined;
  readonly onProgress?: ((fraction: number) => boolean | void) | undefined;
}

export interface WarpingSolution {
  readonly J: number;
  readonly Cw: number;
  /** Shear centre, section coordinates. */
  readonly xs: number;
  readonly ys: number;
  readonly xc: number;
  readonly yc: number;
  readonly area: number;
  /** Centroidal ∫Y², ∫X², ∫XY and Ip over the mesh. */
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
  readonly Ip: number;
  /** Warping function about the centroid, zero mean per component (nodal values). */
  readonly omega: Float64Array;
  /** Nodal load vector F (for the identity checks ΣF = 0, ωᵀKω = Fᵀω). */
  readonly load: Float64Array;
  /** ωᵀKω at the solution. */
  readonly energy: number;
  readonly iterations: number;
  readonly relativeResidual: number;
  readonly components: number;
  readonly componentOfNode: Int32Array;
  /** Wall time of each phase, ms, by SolveSettings.now (0 without a clock). */
  readonly phaseMs: { readonly assemble: number; readonly solve: number; readonly post: number };
}

function componentsOf(nodes: number, elements: Int32Array): { count: number; of: Int32Array } {
  const parent = Int32Array.from({ length: nodes }, (_, i) => i);
  const find = (i: number): number => {
    let r = i;
    while ((parent[r] ?? outside(parent, r)) !== r) r = parent[r] ?? outside(parent, r);
    while ((parent[i] ?? outside(parent, i)) !== r) {
      const nx = parent[i] ?? outside(parent, i);
      parent[i] = r;
      i = nx;
    }
    return r;
  };
  for (let t = 0; t < elements.length; t += 6) {
    const a = find(elements[t] ?? outside(elements, t));
    for (let k = 1; k < 6; k++) {
      const b = find(elements[t + k] ?? outside(elements, t + k));
      if (a !== b) parent[b] = a;
    }
  }
  const label = new Int32Array(nodes).fill(-1);
  const of = new Int32Array(nodes);
  let count = 0;
  for (let i = 0; i < nodes; i++) {
    const r = find(i);
    if ((label[r] ?? outside(label, r)) < 0) label[r] = count++;
    of[i] = label[r] ?? outside(label, r);
  }
  return { count, of };
}

interface Moments {
  area: number;
  xc: number;
  yc: number;
}

function meshCentroid(q: QuadraticMesh): Moments {
  let area = 0;
  let sx = 0;
  let sy = 0;
  const e = q.elements;
  // Local origin at the first node keeps the sums well conditioned (docs/methods.md §1.3).
  const ox = q.xy[0] ?? outside(q.xy, 0);
  const oy = q.xy[1] ?? outside(q.xy, 1);
  for (let t = 0; t < e.length; t += 6) {
    const xs = [0, 1, 2].map((k) => (q.xy[2 * (e[t + k] ?? outside(e, t + k))] ?? outside(q.xy, 2 * (e[t + k] ?? outside(e, t + k)))) - ox);
    const ys = [0, 1, 2].map((k) => (q.xy[2 * (e[t + k] ?? outside(e, t + k)) + 1] ?? outside(q.xy, 2 * (e[t + k] ?? outside(e, t + k)) + 1)) - oy);
    const a = (elementGeometry(xs, ys).twiceArea / 2) * ((q.weights ? (q.weights[t / 6] ?? outside(q.weights, t / 6)) : 1));
    area += a;
    sx += (a * ((xs[0] ?? outside(xs, 0)) + (xs[1] ?? outside(xs, 1)) + (xs[2] ?? outside(xs, 2)))) / 3;
    sy += (a * ((ys[0] ?? outside(ys, 0)) + (ys[1] ?? outside(ys, 1)) + (ys[2] ?? outside(ys, 2)))) / 3;
  }
  return { area, xc: ox + sx / area, yc: oy + sy / area };
}

/** M·v over the mesh (closed-form element mass matrices), returned as a nodal vector. */
function massTimes(q: QuadraticMesh, X: Float64Array, Y: Float64Array, v: Float64Array): Float64Array {
  const out = new Float64Array(v.length);
  const e = q.elements;
  const local = new Float64Array(6);
  for (let t = 0; t < e.length; t += 6) {
    const a = e[t]!;
    const b = e[t + 1]!;
    const c = e[t + 2]!;
    const twice = (X[b]! - X[a]!) * (Y[c]! - Y[a]!) - (X[c]! - X[a]!) * (Y[b]! - Y[a]!);
    const s = (twice / 2 / 180) * ((q.weights ? (q.weights[t / 6] ?? outside(q.weights, t / 6)) : 1));
    for (let j = 0; j < 6; j++) local[j] = v[e[t + j]!]!;
    for (let i = 0; i < 6; i++) {
      let acc = 0;
      for (let j = 0; j < 6; j++) acc += MASS_T6[6 * i + j]! * local[j]!;
      out[e[t + i]!]! += s * acc;
    }
  }
  return out;
}

const dotv = (a: Float64Array, b: Float64Array): number => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += (a[i] ?? outside(a, i)) * (b[i] ?? outside(b, i));
  return s;
};

/** Exact ∫X², ∫Y², ∫XY over a straight-sided triangle (corner formulas). */
function triangleSecondMoments(x: readonly number[], y: readonly number[], area: number): [number, number, number] {
  const [x1 = 0, x2 = 0, x3 = 0] = x;
  const [y1 = 0, y2 = 0, y3 = 0] = y;
  const xx = (area / 6) * (x1 * x1 + x2 * x2 + x3 * x3 + x1 * x2 + x2 * x3 + x3 * x1);
  const yy = (area / 6) * (y1 * y1 + y2 * y2 + y3 * y3 + y1 * y2 + y2 * y3 + y3 * y1);
  const xy = (area / 12) * (2 * x1 * y1 + 2 * x2 * y2 + 2 * x3 * y3 + x1 * y2 + x2 * y1 + x1 * y3 + x3 * y1 + x2 * y3 + x3 * y2);
  return [xx, yy, xy];
}

export function solveWarping(q: QuadraticMesh, s: SolveSettings): WarpingSolution {
  const now = s.now ?? ((): number => 0);
  const t0 = now();
  const n = q.xy.length / 2;
  const { area, xc, yc } = meshCentroid(q);
  const X = new Float64Array(n);
  const Y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    X[i] = (q.xy[2 * i] ?? outside(q.xy, 2 * i)) - xc;
    Y[i] = (q.xy[2 * i + 1] ?? outside(q.xy, 2 * i + 1)) - yc;
  }
  const K = csrPattern(n, q.elements, 6);
  const F = new Float64Array(n);
  const ke = new Float64Array(36);
  const fe = new Float64Array(6);
  const ex = new Float64Array(6);
  const ey = new Float64Array(6);
  let Iyy = 0;
  let Ixx = 0;
  let Ixy = 0;
  const e = q.elements;
  for (let t = 0; t < e.length; t += 6) {
    for (let k = 0; k < 6; k++) {
      ex[k] = X[(e[t + k] ?? outside(e, t + k))] ?? outside(X, (e[t + k] ?? outside(e, t + k)));
      ey[k] = Y[(e[t + k] ?? outside(e, t + k))] ?? outside(Y, (e[t + k] ?? outside(e, t + k)));
    }
    const a = elementStiffnessAndLoad(ex, ey, ke, fe);
    const w = (q.weights ? (q.weights[t / 6] ?? outside(q.weights, t / 6)) : 1);
    if (w !== 1) {
      for (let k = 0; k < 36; k++) ke[k]! *= w;
      for (let k = 0; k < 6; k++) fe[k]! *= w;
    }
    const [xx, yy, xy] = triangleSecondMoments([(ex[0] ?? outside(ex, 0)), (ex[1] ?? outside(ex, 1)), (ex[2] ?? outside(ex, 2))], [(ey[0] ?? outside(ey, 0)), (ey[1] ?? outside(ey, 1)), (ey[2] ?? outside(ey, 2))], a * w);
    Iyy += xx;
    Ixx += yy;
    Ixy += xy;
    for (let i = 0; i < 6; i++) {
      const ni = e[t + i] ?? outside(e, t + i);
      F[ni] = (F[ni] ?? outside(F, ni)) + (fe[i] ?? outside(fe, i));
      for (let j = 0; j < 6; j++) {
        const p = csrIndex(K, ni, (e[t + j] ?? outside(e, t + j)));
        K.value[p] = (K.value[p] ?? outside(K.value, p)) + (ke[6 * i + j] ?? outside(ke, 6 * i + j));
      }
    }
  }
  const comps = componentsOf(n, e);
  const t1 = now();
  const sol = pcgSolve(K, F, s.initial ?? new Float64Array(n), {
    tolerance: s.tolerance,
    maxIterations: s.maxIterations,
    component: comps.of,
    components: comps.count,
    preconditioner: s.preconditioner,
    onProgress: s.onProgress,
  });
  const t2 = now();
  const omega = sol.x;
  const Kw = new Float64Array(n);
  csrMultiply(K, omega, Kw);
  const energy = dotv(omega, Kw);
  const Ip = Ixx + Iyy;
  // The functional J(ω) = ∫|∇ω + (−Y, X)|² = Ip − 2Fᵀω + ωᵀKω: equal to Ip − Fᵀω at the exact
  // discrete solution, but its error in an inexact solve e is eᵀKe ≥ 0 (second order, and J
  // stays an upper bound), where Ip − Fᵀω would be first order.
  const J = Ip - 2 * dotv(F, omega) + energy;
  zeroMeanPerComponent(q, X, Y, omega, comps);
  const Mw = massTimes(q, X, Y, omega);
  const IwX = dotv(X, Mw);
  const IwY = dotv(Y, Mw);
  const Iww = dotv(omega, Mw);
  const D = Ixx * Iyy - Ixy * Ixy;
  const Xs = (Ixy * IwX - Iyy * IwY) / D;
  const Ys = (Ixx * IwX - Ixy * IwY) / D;
  const Cw = Iww - Ys * IwX + Xs * IwY;
  return {
    J, Cw, xs: xc + Xs, ys: yc + Ys, xc, yc, area, Ix: Ixx, Iy: Iyy, Ixy, Ip,
    omega, load: F, energy, iterations: sol.iterations, relativeResidual: sol.relativeResidual,
    components: comps.count, componentOfNode: comps.of,
    phaseMs: { assemble: t1 - t0, solve: t2 - t1, post: now() - t2 },
  };
}

/** Shifts ω on each component so that ∫ω dA = 0 there (1ᵀMω per component). */
function zeroMeanPerComponent(q: QuadraticMesh, X: Float64Array, Y: Float64Array, omega: Float64Array, comps: { count: number; of: Int32Array }): void {
  const ones = new Float64Array(omega.length).fill(1);
  const M1 = massTimes(q, X, Y, ones);
  const Mw = massTimes(q, X, Y, omega);
  const areaOf = new Float64Array(comps.count);
  const meanOf = new Float64Array(comps.count);
  for (let i = 0; i < omega.length; i++) {
    const c = comps.of[i] ?? outside(comps.of, i);
    areaOf[c] = (areaOf[c] ?? outside(areaOf, c)) + (M1[i] ?? outside(M1, i));
    meanOf[c] = (meanOf[c] ?? outside(meanOf, c)) + (Mw[i] ?? outside(Mw, i));
  }
  for (let i = 0; i < omega.length; i++) {
    const c = comps.of[i] ?? outside(comps.of, i);
    omega[i] = (omega[i] ?? outside(omega, i)) - (meanOf[c] ?? outside(meanOf, c)) / (areaOf[c] ?? outside(areaOf, c));
  }
}

/** Nodal gradient of a T6 field, area-weighted average of the element values at each node. */
export function nodalGradient(q: QuadraticMesh, values: Float64Array): { gx: Float64Array; gy: Float64Array } {
  const n = q.xy.length / 2;
  const gx = new Float64Array(n);
  const gy = new Float64Array(n);
  const wsum = new Float64Array(n);
  const dx = new Float64Array(6);
  const dy = new Float64Array(6);
  const at: readonly (readonly [number, number, number])[] = [[1, 0, 0], [0, 1, 0], [0, 0, 1], [0.5, 0.5, 0], [0, 0.5, 0.5], [0.5, 0, 0.5]];
  const e = q.elements;
  for (let t = 0; t < e.length; t += 6) {
    const xs = [0, 1, 2].map((k) => (q.xy[2 * (e[t + k] ?? outside(e, t + k))] ?? outside(q.xy, 2 * (e[t + k] ?? outside(e, t + k)))));
    const ys = [0, 1, 2].map((k) => (q.xy[2 * (e[t + k] ?? outside(e, t + k)) + 1] ?? outside(q.xy, 2 * (e[t + k] ?? outside(e, t + k)) + 1)));
    const g = elementGeometry(xs, ys);
    const w = g.twiceArea / 2;
    at.forEach(([l1, l2, l3], k) => {
      shapeDerivatives(l1, l2, l3, g.b, dx);
      shapeDerivatives(l1, l2, l3, g.c, dy);
      let sx = 0;
      let sy = 0;
      for (let j = 0; j < 6; j++) {
        const v = values[(e[t + j] ?? outside(e, t + j))] ?? outside(values, (e[t + j] ?? outside(e, t + j)));
        sx += (dx[j] ?? outside(dx, j)) * v;
        sy += (dy[j] ?? outside(dy, j)) * v;
      }
      const node = e[t + k] ?? outside(e, t + k);
      gx[node] = (gx[node] ?? outside(gx, node)) + w * sx;
      gy[node] = (gy[node] ?? outside(gy, node)) + w * sy;
      wsum[node] = (wsum[node] ?? outside(wsum, node)) + w;
    });
  }
  for (let i = 0; i < n; i++) {
    gx[i] = (gx[i] ?? outside(gx, i)) / (wsum[i] || 1);
    gy[i] = (gy[i] ?? outside(gy, i)) / (wsum[i] || 1);
  }
  return { gx, gy };
}
