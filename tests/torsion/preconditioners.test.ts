/**
 * The two preconditioners of the conjugate-gradient solve (core/torsion/sparse.ts,
 * docs/methods.md §7.9) solve the same system: checked by identities, not by stored outputs.
 *  - a singular, consistent system (the graph Laplacian of a grid with a T6-like positive
 *    off-diagonal coupling added, so it is not an M-matrix): the residual ‖f − A x‖/‖f‖,
 *    recomputed here from the matrix entries, meets the tolerance with either preconditioner,
 *    and x has zero mean (the null space of constants removed);
 *  - both give the same J for a disc, within 1e-9 relative (the solver's error enters J squared),
 *    and that J is within 0.1 % of πr⁴/2 (Timoshenko & Goodier, circular shaft).
 */
import { describe, expect, it } from 'vitest';
import { csrIndex, csrPattern, pcgSolve, type Csr, type Preconditioner } from '../../core/torsion/sparse.ts';
import { torsionConstants } from '../../core/torsion/index.ts';
import { disc } from './shapes.ts';

/** Quads of an m × m grid of nodes split into two triangles, assembled with a cotangent-like stencil. */
function gridSystem(m: number): { a: Csr; f: Float64Array } {
  const tris: number[] = [];
  for (let i = 0; i + 1 < m; i++) {
    for (let j = 0; j + 1 < m; j++) {
      const v = i * m + j;
      tris.push(v, v + 1, v + m + 1, v, v + m + 1, v + m);
    }
  }
  const elements = Int32Array.from(tris);
  const a = csrPattern(m * m, elements, 3);
  // Element matrix: a Laplacian-like [2 −1 −1; …] plus a small positive coupling on one pair.
  const ke = [[2.2, -1.2, -1], [-1.2, 2.4, -1.2], [-1, -1.2, 2.2]];
  for (let t = 0; t < elements.length; t += 3) {
    for (let r = 0; r < 3; r++) {
      for (let c = 0; c < 3; c++) {
        const p = csrIndex(a, elements[t + r]!, elements[t + c]!);
        a.value[p]! += ke[r]![c]!;
      }
    }
  }
  const f = new Float64Array(m * m);
  for (let k = 0; k < f.length; k++) f[k] = Math.sin(k * 0.37) + (k % 7) - 3;
  let mean = 0;
  for (const v of f) mean += v / f.length;
  for (let k = 0; k < f.length; k++) f[k]! -= mean;
  return { a, f };
}

describe('preconditioned conjugate gradients', () => {
  const { a, f } = gridSystem(30);
  for (const preconditioner of ['ic0', 'sgs'] as Preconditioner[]) {
    it(`${preconditioner}: ‖f − A x‖/‖f‖ ≤ 1e-10 recomputed from the entries, and x has zero mean`, () => {
      const n = a.n;
      const sol = pcgSolve(a, f, new Float64Array(n), { tolerance: 1e-10, maxIterations: 5000, component: new Int32Array(n), components: 1, preconditioner });
      let rr = 0;
      let ff = 0;
      let sum = 0;
      for (let i = 0; i < n; i++) {
        let ax = 0;
        for (let p = a.rowStart[i]!; p < a.rowStart[i + 1]!; p++) ax += a.value[p]! * sol.x[a.col[p]!]!;
        rr += (f[i]! - ax) ** 2;
        ff += f[i]! ** 2;
        sum += sol.x[i]!;
      }
      expect(Math.sqrt(rr / ff)).toBeLessThanOrEqual(1e-10);
      expect(Math.abs(sum / n)).toBeLessThan(1e-9);
      expect(sol.iterations).toBeGreaterThan(0);
    });
  }
  it('a disc r = 20: the same J with either preconditioner (1e-9), within 0.1 % of πr⁴/2 (Timoshenko & Goodier)', () => {
    const ic = torsionConstants([disc(0, 0, 20)], { preconditioner: 'ic0' }).J;
    const sgs = torsionConstants([disc(0, 0, 20)], { preconditioner: 'sgs' }).J;
    expect(Math.abs(ic / sgs - 1)).toBeLessThan(1e-9);
    expect(Math.abs(ic / ((Math.PI * 20 ** 4) / 2) - 1)).toBeLessThan(1e-3);
  });
});
