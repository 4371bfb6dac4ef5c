/**
 * Symmetric sparse matrices in compressed-row form (CSR, Float64Array/Int32Array) and a
 * Jacobi-preconditioned conjugate-gradient solver for the singular, consistent Neumann system
 * of the warping function (METHODS §7.4, §7.9).
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

/**
 * z = M⁻¹ r for the symmetric Gauss–Seidel preconditioner M = (D + L) D⁻¹ (D + U): a forward
 * then a backward sweep (SPD whenever D > 0, so it suits the semi-definite K).
 */
function symmetricGaussSeidel(a: Csr, diagAt: Int32Array, invDiag: Float64Array, r: Float64Array, z: Float64Array): void {
  const { rowStart, col, value } = a;
  const n = a.n;
  for (let i = 0; i < n; i++) {
    let s = r[i]!;
    const d = diagAt[i]!;
    for (let p = rowStart[i]!; p < d; p++) s -= value[p]! * z[col[p]!]!;
    z[i] = s * invDiag[i]!;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = 0;
    const end = rowStart[i + 1]!;
    for (let p = diagAt[i]! + 1; p < end; p++) s += value[p]! * z[col[p]!]!;
    z[i]! -= s * invDiag[i]!;
  }
}

/** Solves A x = f (A symmetric positive semi-definite) from the initial guess x0. */
export function pcgSolve(a: Csr, f: Float64Array, x0: Float64Array, s: PcgSettings): PcgResult {
  const n = a.n;
  const b = Float64Array.from(f);
  removeComponentMeans(b, s.component, s.components);
  const bnorm = Math.sqrt(dot(b, b));
  const x = Float64Array.from(x0);
  if (bnorm === 0) return { x: x.fill(0), iterations: 0, relativeResidual: 0 };
  const invDiag = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const d = a.value[csrIndex(a, i, i)] ?? 0;
    invDiag[i] = d > 0 ? 1 / d : 0;
  }
  const r = new Float64Array(n);
  const q = new Float64Array(n);
  csrMultiply(a, x, q);
  for (let i = 0; i < n; i++) r[i] = (b[i] ?? 0) - (q[i] ?? 0);
  const z = new Float64Array(n);
  const diagAt = new Int32Array(n);
  for (let i = 0; i < n; i++) diagAt[i] = csrIndex(a, i, i);
  const precondition = (): void => symmetricGaussSeidel(a, diagAt, invDiag, r, z);
  precondition();
  const p = Float64Array.from(z);
  let rz = dot(r, z);
  let rel = Math.sqrt(dot(r, r)) / bnorm;
  const rel0 = Math.max(rel, s.tolerance * 10);
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
    precondition();
    const rzNext = dot(r, z);
    const beta = rzNext / rz;
    rz = rzNext;
    for (let i = 0; i < n; i++) p[i] = z[i]! + beta * p[i]!;
    rel = Math.sqrt(rr) / bnorm;
    it++;
    if (s.onProgress && it % 32 === 0) {
      const fraction = Math.log(rel0 / rel) / Math.log(rel0 / s.tolerance);
      if (s.onProgress(Math.min(1, Math.max(0, fraction))) === false) throw new TorsionCancelledError();
    }
  }
  removeComponentMeans(x, s.component, s.components);
  return { x, iterations: it, relativeResidual: rel };
}
