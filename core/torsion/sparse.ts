/**
 * Symmetric sparse matrices in compressed-row form (CSR, Float64Array/Int32Array) and a
 * conjugate-gradient solver preconditioned with incomplete Cholesky IC(0) (symmetric
 * Gauss–Seidel on request; see Preconditioner) for the singular, consistent Neumann system of the
 * warping function (docs/methods.md §7.4, §7.9).
 * The null space is the constants on each connected component: the right-hand side is made
 * orthogonal to it (per-component mean removed) and the iterate's per-component mean is removed
 * at the end. Stops at ‖r‖/‖F‖ ≤ tolerance or throws TorsionSolveError at the iteration cap.
 */
import { invariant, outside } from '../invariant.ts';
import { TorsionCancelledError, TorsionSolveError } from './errors.ts';

export interface Csr {
  readonly n: number;
  readonly rowStart: Int32Array;
  readonly col: Int32Array;
  readonly value: Float64Array;
}

/** Sparsity pattern of the node-to-node coupling of elements with `per` nodes each. */
export function csrPattern(n: number, elements: Int32Array, per: number): Csr {
  const count = elements.length / per;
  const elemStart = new Int32Array(n + 1);
  for (let k = 0; k < elements.length; k++) elemStart[elements[k]! + 1]!++;
  for (let i = 0; i < n; i++) elemStart[i + 1]! += elemStart[i]!;
  const fill = elemStart.slice(0, n);
  const elemOf = new Int32Array(elements.length);
  for (let e = 0; e < count; e++) {
    for (let k = 0; k < per; k++) {
      const v = elements[e * per + k]!;
      elemOf[fill[v]!++] = e;
    }
  }
  const mark = new Int32Array(n).fill(-1);
  const rowStart = new Int32Array(n + 1);
  // Upper bound: each incidence of node i in an element adds at most `per` columns to row i.
  const cols = new Int32Array(elements.length * per);
  let used = 0;
  for (let i = 0; i < n; i++) {
    const first = used;
    for (let p = elemStart[i]!; p < elemStart[i + 1]!; p++) {
      const e = elemOf[p]!;
      for (let k = 0; k < per; k++) {
        const j = elements[e * per + k]!;
        if (mark[j] !== i) {
          mark[j] = i;
          // Insertion keeps the (short) row sorted.
          let q = used++;
          while (q > first && cols[q - 1]! > j) {
            cols[q] = cols[q - 1]!;
            q--;
          }
          cols[q] = j;
        }
      }
    }
    rowStart[i + 1] = used;
  }
  return { n, rowStart, col: cols.slice(0, used), value: new Float64Array(used) };
}

/** Position of column j in row i (binary search; the pattern must contain it). */
export function csrIndex(a: Csr, i: number, j: number): number {
  let lo = a.rowStart[i] ?? outside(a.rowStart, i);
  let hi = (a.rowStart[i + 1] ?? outside(a.rowStart, i + 1)) - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = a.col[mid] ?? outside(a.col, mid);
    if (c === j) return mid;
    if (c < j) lo = mid + 1;
    else hi = mid - 1;
  }
  return -1;
}

// Hot loops below index typed arrays inside their bounds; `!` drops the undefined that
// noUncheckedIndexedAccess adds, without a per-element `??` cost.
export function csrMultiply(a: Csr, x: Float64Array, out: Float64Array): void {
  const { rowStart, col, value } = a;
  for (let i = 0; i < a.n; i++) {
    let s = 0;
    const end = rowStart[i + 1]!;
    for (let p = rowStart[i]!; p < end; p++) s += value[p]! * x[col[p]!]!;
    out[i] = s;
  }
}

/** Removes the mean of v on each component (Euclidean projection off the null space). */
export function removeComponentMeans(v: Float64Array, component: Int32Array, components: number): void {
  const sum = new Float64Array(components);
  const cnt = new Float64Array(components);
  for (let i = 0; i < v.length; i++) {
    const c = component[i] ?? outside(component, i);
    sum[c] = (sum[c] ?? outside(sum, c)) + (v[i] ?? outside(v, i));
    cnt[c] = (cnt[c] ?? outside(cnt, c)) + 1;
  }
  for (let i = 0; i < v.length; i++) {
    const c = component[i] ?? outside(component, i);
    v[i] = (v[i] ?? outside(v, i)) - (sum[c] ?? outside(sum, c)) / (cnt[c] ?? outside(cnt, c));
  }
}

export interface PcgSettings {
  readonly tolerance: number;
  readonly maxIterations: number;
  readonly component: Int32Array;
  readonly components: number;
  /** Preconditioner (default 'ic0'). */
  readonly preconditioner?: Preconditioner | undefined;
  /** Called every 32 iterations with the solve's progress 0..1; false cancels. */
  readonly onProgress?: ((fraction: number) => boolean | void) | undefined;
}

export interface PcgResult {
  readonly x: Float64Array;
  readonly iterations: number;
  readonly relativeResidual: number;
}

const dot = (a: Float64Array, b: Float64Array): number => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
};

/**
 * Preconditioner of the conjugate-gradient solve (docs/methods.md §7.9):
 *  - 'ic0' (the default): incomplete Cholesky without fill, M = L̃ L̃ᵀ with L̃ on the lower
 *    pattern of A (Saad, Iterative Methods for Sparse Linear Systems, §10.3.2), factored from
 *    A + α·diag(A) with α raised from 1e-4 until every pivot is positive (K is only
 *    semi-definite and not an M-matrix). An iteration costs a product and two triangular solves.
 *  - 'sgs': symmetric Gauss–Seidel, M = (D + L) D⁻¹ (D + U), with Eisenstat's trick (one sweep
 *    pair per iteration). Kept for the bench's measured comparison (tests/bench/torsion.bench.ts).
 */
export type Preconditioner = 'sgs' | 'ic0';

/** Triangular parts of A around its diagonal (positions diagAt), used by the Eisenstat trick. */
interface Split {
  readonly a: Csr;
  readonly diagAt: Int32Array;
  /** Diagonal of A (1 where a node has no element). */
  readonly d: Float64Array;
  readonly sqrtD: Float64Array;
}

/** u = (D + L)⁻¹ v (forward substitution). */
function lowerSolve(m: Split, v: Float64Array, u: Float64Array): void {
  const { rowStart, col, value } = m.a;
  for (let i = 0; i < m.a.n; i++) {
    let s = v[i]!;
    const end = m.diagAt[i]!;
    for (let p = rowStart[i]!; p < end; p++) s -= value[p]! * u[col[p]!]!;
    u[i] = s / m.d[i]!;
  }
}

/** u = (D + U)⁻¹ v (backward substitution). */
function upperSolve(m: Split, v: Float64Array, u: Float64Array): void {
  const { rowStart, col, value } = m.a;
  for (let i = m.a.n - 1; i >= 0; i--) {
    let s = v[i]!;
    const end = rowStart[i + 1]!;
    for (let p = m.diagAt[i]! + 1; p < end; p++) s -= value[p]! * u[col[p]!]!;
    u[i] = s / m.d[i]!;
  }
}

/** u = (D + L) v, or (D + U) v when `upper`. */
function triangularMultiply(m: Split, v: Float64Array, u: Float64Array, upper: boolean): void {
  const { rowStart, col, value } = m.a;
  for (let i = 0; i < m.a.n; i++) {
    const from = upper ? m.diagAt[i]! + 1 : rowStart[i]!;
    const to = upper ? rowStart[i + 1]! : m.diagAt[i]!;
    let s = m.d[i]! * v[i]!;
    for (let p = from; p < to; p++) s += value[p]! * v[col[p]!]!;
    u[i] = s;
  }
}

/**
 * Solves A x = f (A symmetric positive semi-definite) from the initial guess x0 by conjugate
 * gradients with the preconditioner s.preconditioner (default 'ic0'). Stops at
 * ‖f − A x‖/‖f‖ ≤ tolerance; throws TorsionSolveError at the iteration cap.
 */
export function pcgSolve(a: Csr, f: Float64Array, x0: Float64Array, s: PcgSettings): PcgResult {
  const n = a.n;
  const b = Float64Array.from(f);
  removeComponentMeans(b, s.component, s.components);
  const bnorm = Math.sqrt(dot(b, b));
  if (bnorm === 0) return { x: new Float64Array(n), iterations: 0, relativeResidual: 0 };
  const diagAt = new Int32Array(n);
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const at = csrIndex(a, i, i);
    invariant(at >= 0, `sparse matrix row ${i} has no diagonal entry`);
    diagAt[i] = at;
    const v = a.value[at]!;
    // A zero diagonal only occurs for a node no element uses; 1 keeps it decoupled.
    d[i] = v > 0 ? v : 1;
  }
  const x = (s.preconditioner ?? 'ic0') === 'ic0' ? icPcg(a, diagAt, d, b, bnorm, x0, s) : sgsPcg({ a, diagAt, d, sqrtD: d.map(Math.sqrt) }, b, bnorm, x0, s);
  removeComponentMeans(x.x, s.component, s.components);
  return x;
}

function progressCheck(s: PcgSettings, rel0: number): (it: number, rel: number) => void {
  return (it, rel) => {
    if (s.onProgress && it % 32 === 0) {
      const fraction = Math.log(rel0 / rel) / Math.log(rel0 / s.tolerance);
      if (s.onProgress(Math.min(1, Math.max(0, fraction))) === false) throw new TorsionCancelledError();
    }
  };
}

/**
 * PCG with symmetric Gauss–Seidel, M = (D + L) D⁻¹ (D + U) = C Cᵀ, C = (D + L) D^{-1/2} (SPD
 * whenever D > 0, so it suits the semi-definite K). Eisenstat's trick (Eisenstat 1981; Saad,
 * Iterative Methods for Sparse Linear Systems, §9.2) applies C⁻¹ A C⁻ᵀ with one forward and one
 * backward sweep, using A = (D + L) + (D + U) − D, so an iteration costs about one matrix product. The true
 * residual ‖f − A x‖/‖f‖ = ‖C r̂‖/‖f‖ is checked every CHECK_EVERY iterations and decides
 * convergence.
 */
function sgsPcg(m: Split, b: Float64Array, bnorm: number, x0: Float64Array, s: PcgSettings): PcgResult {
  const { a, d, sqrtD } = m;
  const n = a.n;
  const t1 = new Float64Array(n);
  const t2 = new Float64Array(n);
  // r̂ = C⁻¹ (b − A x0) = D^{1/2} (D + L)⁻¹ (b − A x0);  y = Cᵀ x0 = D^{-1/2} (D + U) x0.
  csrMultiply(a, x0, t1);
  for (let i = 0; i < n; i++) t1[i] = b[i]! - t1[i]!;
  const r = new Float64Array(n);
  lowerSolve(m, t1, r);
  for (let i = 0; i < n; i++) r[i]! *= sqrtD[i]!;
  const y = new Float64Array(n);
  triangularMultiply(m, x0, y, true);
  for (let i = 0; i < n; i++) y[i]! /= sqrtD[i]!;
  const trueResidual = (): number => {
    for (let i = 0; i < n; i++) t1[i] = r[i]! / sqrtD[i]!;
    triangularMultiply(m, t1, t2, false);
    return Math.sqrt(dot(t2, t2)) / bnorm;
  };
  const p = Float64Array.from(r);
  const q = new Float64Array(n);
  let rr = dot(r, r);
  let rel = trueResidual();
  const progress = progressCheck(s, Math.max(rel, s.tolerance * 10));
  let it = 0;
  while (rel > s.tolerance) {
    if (it >= s.maxIterations) throw new TorsionSolveError(it, rel, s.tolerance);
    // q = Â p: w = (D + U)⁻¹ D^{1/2} p;  q = D^{1/2} [w + (D + L)⁻¹ (D^{1/2} p − D w)].
    for (let i = 0; i < n; i++) t1[i] = sqrtD[i]! * p[i]!;
    upperSolve(m, t1, t2);
    for (let i = 0; i < n; i++) t1[i]! -= d[i]! * t2[i]!;
    lowerSolve(m, t1, q);
    for (let i = 0; i < n; i++) q[i] = sqrtD[i]! * (q[i]! + t2[i]!);
    const alpha = rr / dot(p, q);
    let rrNext = 0;
    for (let i = 0; i < n; i++) {
      y[i]! += alpha * p[i]!;
      const ri = (r[i]! -= alpha * q[i]!);
      rrNext += ri * ri;
    }
    const beta = rrNext / rr;
    rr = rrNext;
    for (let i = 0; i < n; i++) p[i] = r[i]! + beta * p[i]!;
    it++;
    if (it % CHECK_EVERY === 0) rel = trueResidual();
    progress(it, rel);
  }
  // x = C⁻ᵀ y = (D + U)⁻¹ D^{1/2} y.
  for (let i = 0; i < n; i++) t1[i] = sqrtD[i]! * y[i]!;
  const x = new Float64Array(n);
  upperSolve(m, t1, x);
  return { x, iterations: it, relativeResidual: rel };
}

/**
 * IC(0) factor L̃ of A + α·diag(A), stored at A's own lower positions (row i: rowStart[i]..diagAt[i],
 * the diagonal last), or null when a pivot is not positive.
 */
function ic0Factor(a: Csr, diagAt: Int32Array, d: Float64Array, alpha: number): Float64Array | null {
  const { rowStart, col, value } = a;
  const l = new Float64Array(value.length);
  for (let i = 0; i < a.n; i++) {
    const rs = rowStart[i]!;
    const di = diagAt[i]!;
    let sq = 0;
    for (let p = rs; p < di; p++) {
      const k = col[p]!;
      const dk = diagAt[k]!;
      let v = value[p]!;
      // v −= Σ_{j<k} L̃_ij L̃_kj over the two sorted lower rows.
      let q1 = rs;
      let q2 = rowStart[k]!;
      while (q1 < p && q2 < dk) {
        const c1 = col[q1]!;
        const c2 = col[q2]!;
        if (c1 === c2) v -= l[q1++]! * l[q2++]!;
        else if (c1 < c2) q1++;
        else q2++;
      }
      const lik = v / l[dk]!;
      l[p] = lik;
      sq += lik * lik;
    }
    const pivot = d[i]! * (1 + alpha) - sq;
    if (!(pivot > 1e-12 * d[i]!)) return null;
    l[di] = Math.sqrt(pivot);
  }
  return l;
}

/** z = (L̃ L̃ᵀ)⁻¹ r. */
function icApply(a: Csr, diagAt: Int32Array, l: Float64Array, r: Float64Array, z: Float64Array): void {
  const { rowStart, col } = a;
  const n = a.n;
  for (let i = 0; i < n; i++) {
    let v = r[i]!;
    const di = diagAt[i]!;
    for (let p = rowStart[i]!; p < di; p++) v -= l[p]! * z[col[p]!]!;
    z[i] = v / l[di]!;
  }
  for (let i = n - 1; i >= 0; i--) {
    const di = diagAt[i]!;
    const zi = (z[i]! /= l[di]!);
    for (let p = rowStart[i]!; p < di; p++) z[col[p]!]! -= l[p]! * zi;
  }
}

/** Plain PCG with the IC(0) factor; convergence of the recurrence residual is confirmed on the true one. */
function icPcg(a: Csr, diagAt: Int32Array, d: Float64Array, b: Float64Array, bnorm: number, x0: Float64Array, s: PcgSettings): PcgResult {
  const n = a.n;
  let l: Float64Array | null = null;
  for (let alpha = 1e-4; l === null; alpha *= 10) {
    invariant(alpha <= 1, 'incomplete Cholesky found no positive pivots even with a diagonal shift of 1');
    l = ic0Factor(a, diagAt, d, alpha);
  }
  const x = Float64Array.from(x0);
  const r = new Float64Array(n);
  csrMultiply(a, x, r);
  for (let i = 0; i < n; i++) r[i] = b[i]! - r[i]!;
  const z = new Float64Array(n);
  icApply(a, diagAt, l, r, z);
  const p = Float64Array.from(z);
  const q = new Float64Array(n);
  let rz = dot(r, z);
  const trueResidual = (): number => {
    csrMultiply(a, x, q);
    let ss = 0;
    for (let i = 0; i < n; i++) ss += (b[i]! - q[i]!) ** 2;
    return Math.sqrt(ss) / bnorm;
  };
  let rel = Math.sqrt(dot(r, r)) / bnorm;
  const progress = progressCheck(s, Math.max(rel, s.tolerance * 10));
  let it = 0;
  while (rel > s.tolerance) {
    if (it >= s.maxIterations) throw new TorsionSolveError(it, rel, s.tolerance);
    csrMultiply(a, p, q);
    const alpha = rz / dot(p, q);
    let rr = 0;
    for (let i = 0; i < n; i++) {
      x[i]! += alpha * p[i]!;
      const ri = (r[i]! -= alpha * q[i]!);
      rr += ri * ri;
    }
    icApply(a, diagAt, l, r, z);
    const rzNext = dot(r, z);
    const beta = rzNext / rz;
    rz = rzNext;
    for (let i = 0; i < n; i++) p[i] = z[i]! + beta * p[i]!;
    it++;
    rel = Math.sqrt(rr) / bnorm;
    // The recurrence drifts from the true residual in floating point: confirm before stopping.
    if (rel <= s.tolerance) rel = trueResidual();
    progress(it, rel);
  }
  return { x, iterations: it, relativeResidual: rel };
}

const CHECK_EVERY = 4;
