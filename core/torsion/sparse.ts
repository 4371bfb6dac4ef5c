/**
 * Symmetric sparse matrices in compressed-row form (CSR, Float64Array/Int32Array) and a
 * conjugate-gradient solver preconditioned with symmetric Gauss–Seidel (Eisenstat's form, see
 * pcgSolve) for the singular, consistent Neumann system of the warping function (docs/methods.md §7.4,
 * §7.9, where the methods note suggests a plain diagonal (Jacobi) preconditioner instead).
 * The null space is the constants on each connected component: the right-hand side is made
 * orthogonal to it (per-component mean removed) and the iterate's per-component mean is removed
 * at the end. Stops at ‖r‖/‖F‖ ≤ tolerance or throws TorsionSolveError at the iteration cap.
 */
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
  let lo = a.rowStart[i] ?? 0;
  let hi = (a.rowStart[i + 1] ?? 0) - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = a.col[mid] ?? 0;
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
    const c = component[i] ?? 0;
    sum[c] = (sum[c] ?? 0) + (v[i] ?? 0);
    cnt[c] = (cnt[c] ?? 0) + 1;
  }
  for (let i = 0; i < v.length; i++) {
    const c = component[i] ?? 0;
    v[i] = (v[i] ?? 0) - (sum[c] ?? 0) / (cnt[c] ?? 1);
  }
}

export interface PcgSettings {
  readonly tolerance: number;
  readonly maxIterations: number;
  readonly component: Int32Array;
  readonly components: number;
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

/** Triangular parts of A around its diagonal (positions diagAt), used by the Eisenstat trick. */
interface Split {
  readonly a: Csr;
  readonly diagAt: Int32Array;
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
    const from = upper ? m.diagAt[i]! : rowStart[i]!;
    const to = upper ? rowStart[i + 1]! : m.diagAt[i]! + 1;
    let s = 0;
    for (let p = from; p < to; p++) s += value[p]! * v[col[p]!]!;
    u[i] = s;
  }
}

/**
 * Solves A x = f (A symmetric positive semi-definite) from the initial guess x0, by conjugate
 * gradients preconditioned with symmetric Gauss–Seidel, M = (D + L) D⁻¹ (D + U) = C Cᵀ with
 * C = (D + L) D^{-1/2} (SPD whenever D > 0, so it suits the semi-definite K). Eisenstat's trick
 * (Eisenstat 1981; Saad, Iterative Methods for Sparse Linear Systems, §9.2) applies
 * C⁻¹ A C⁻ᵀ with one forward and one backward sweep, using A = (D + L) + (D + U) − D, so an
 * iteration costs about one matrix product. The true residual ‖f − A x‖/‖f‖ = ‖C r̂‖/‖f‖ is
 * checked every CHECK_EVERY iterations and decides convergence.
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
    diagAt[i] = csrIndex(a, i, i);
    const v = a.value[diagAt[i]!] ?? 0;
    // A zero diagonal only occurs for a node no element uses; 1 keeps it decoupled.
    d[i] = v > 0 ? v : 1;
  }
  const m: Split = { a, diagAt, d, sqrtD: d.map(Math.sqrt) };
  const t1 = new Float64Array(n);
  const t2 = new Float64Array(n);
  // r̂ = C⁻¹ (b − A x0) = D^{1/2} (D + L)⁻¹ (b − A x0);  y = Cᵀ x0 = D^{-1/2} (D + U) x0.
  csrMultiply(a, x0, t1);
  for (let i = 0; i < n; i++) t1[i] = b[i]! - t1[i]!;
  const r = new Float64Array(n);
  lowerSolve(m, t1, r);
  for (let i = 0; i < n; i++) r[i]! *= m.sqrtD[i]!;
  const y = new Float64Array(n);
  triangularMultiply(m, x0, y, true);
  for (let i = 0; i < n; i++) y[i]! /= m.sqrtD[i]!;
  const trueResidual = (): number => {
    for (let i = 0; i < n; i++) t1[i] = r[i]! / m.sqrtD[i]!;
    triangularMultiply(m, t1, t2, false);
    return Math.sqrt(dot(t2, t2)) / bnorm;
  };
  const p = Float64Array.from(r);
  const q = new Float64Array(n);
  let rr = dot(r, r);
  let rel = trueResidual();
  const rel0 = Math.max(rel, s.tolerance * 10);
  let it = 0;
  while (rel > s.tolerance) {
    if (it >= s.maxIterations) throw new TorsionSolveError(it, rel, s.tolerance);
    // q = Â p: w = (D + U)⁻¹ D^{1/2} p;  q = D^{1/2} [w + (D + L)⁻¹ (D^{1/2} p − D w)].
    for (let i = 0; i < n; i++) t1[i] = m.sqrtD[i]! * p[i]!;
    upperSolve(m, t1, t2);
    for (let i = 0; i < n; i++) t1[i]! -= d[i]! * t2[i]!;
    lowerSolve(m, t1, q);
    for (let i = 0; i < n; i++) q[i] = m.sqrtD[i]! * (q[i]! + t2[i]!);
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
    if (s.onProgress && it % 32 === 0) {
      const fraction = Math.log(rel0 / rel) / Math.log(rel0 / s.tolerance);
      if (s.onProgress(Math.min(1, Math.max(0, fraction))) === false) throw new TorsionCancelledError();
    }
  }
  // x = C⁻ᵀ y = (D + U)⁻¹ D^{1/2} y.
  for (let i = 0; i < n; i++) t1[i] = m.sqrtD[i]! * y[i]!;
  const x = new Float64Array(n);
  upperSolve(m, t1, x);
  removeComponentMeans(x, s.component, s.components);
  return { x, iterations: it, relativeResidual: rel };
}

const CHECK_EVERY = 4;
