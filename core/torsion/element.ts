/**
 * Straight-sided 6-node triangle (T6) for the Saint-Venant warping function (docs/methods.md §7.3;
 * Zienkiewicz, Taylor & Zhu, The Finite Element Method, quadratic triangle).
 * Local nodes: 0, 1, 2 corners (CCW), 3 on edge 0–1, 4 on 1–2, 5 on 2–0.
 * K_e = ∫ ∇N·∇Nᵀ dA and F_e = ∫ (Y ∂N/∂X − X ∂N/∂Y) dA have degree-2 integrands: the 3-point
 * mid-edge rule is exact. M_e = ∫ N Nᵀ dA is the closed form of docs/methods.md §7.3 (degree 4).
 */
import { outside } from '../invariant.ts';

/** Area coordinates and weights (× area) of the 3-point degree-2 rule: edge mid-points. */
export const MIDEDGE_RULE: readonly (readonly [number, number, number, number])[] = [
  [0.5, 0.5, 0, 1 / 3],
  [0, 0.5, 0.5, 1 / 3],
  [0.5, 0, 0.5, 1 / 3],
];

/** Dunavant (1985) 6-point degree-4 rule [weights from docs/methods.md §7.3, verified by the tests]. */
export const DUNAVANT6: readonly (readonly [number, number, number, number])[] = (() => {
  const a1 = 0.445948490915965;
  const b1 = 0.10810301816807;
  const w1 = 0.223381589678011;
  const a2 = 0.091576213509771;
  const b2 = 0.816847572980459;
  const w2 = 0.109951743655322;
  return [
    [b1, a1, a1, w1], [a1, b1, a1, w1], [a1, a1, b1, w1],
    [b2, a2, a2, w2], [a2, b2, a2, w2], [a2, a2, b2, w2],
  ];
})();

/** Closed-form T6 mass matrix ∫ N Nᵀ dA divided by (area / 180), row-major 6 × 6. */
export const MASS_T6: readonly number[] = [
  6, -1, -1, 0, -4, 0,
  -1, 6, -1, 0, 0, -4,
  -1, -1, 6, -4, 0, 0,
  0, 0, -4, 32, 16, 16,
  -4, 0, 0, 16, 32, 16,
  0, -4, 0, 16, 16, 32,
];

/** T6 shape function values at area coordinates (l1, l2, l3), written into out[0..5]. */
export function shapeValues(l1: number, l2: number, l3: number, out: Float64Array): void {
  out[0] = l1 * (2 * l1 - 1);
  out[1] = l2 * (2 * l2 - 1);
  out[2] = l3 * (2 * l3 - 1);
  out[3] = 4 * l1 * l2;
  out[4] = 4 * l2 * l3;
  out[5] = 4 * l3 * l1;
}

export interface ElementGeometry {
  /** Twice the signed area (> 0 for CCW corners). */
  readonly twiceArea: number;
  /** ∂L_i/∂X = b[i], ∂L_i/∂Y = c[i]. */
  readonly b: readonly [number, number, number];
  readonly c: readonly [number, number, number];
}

export function elementGeometry(x: ArrayLike<number>, y: ArrayLike<number>): ElementGeometry {
  const x1 = x[0] ?? outside(x, 0), x2 = x[1] ?? outside(x, 1), x3 = x[2] ?? outside(x, 2);
  const y1 = y[0] ?? outside(y, 0), y2 = y[1] ?? outside(y, 1), y3 = y[2] ?? outside(y, 2);
  const d2 = (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);
  return {
    twiceArea: d2,
    b: [(y2 - y3) / d2, (y3 - y1) / d2, (y1 - y2) / d2],
    c: [(x3 - x2) / d2, (x1 - x3) / d2, (x2 - x1) / d2],
  };
}

/** Gradient of the six shape functions along direction coefficients g (b or c) at (l1, l2, l3). */
export function shapeDerivatives(l1: number, l2: number, l3: number, g: readonly [number, number, number], out: Float64Array): void {
  out[0] = (4 * l1 - 1) * g[0];
  out[1] = (4 * l2 - 1) * g[1];
  out[2] = (4 * l3 - 1) * g[2];
  out[3] = 4 * (l2 * g[0] + l1 * g[1]);
  out[4] = 4 * (l3 * g[1] + l2 * g[2]);
  out[5] = 4 * (l1 * g[2] + l3 * g[0]);
}

/**
 * Element stiffness (6 × 6, row-major, into ke) and load (into fe) for nodal coordinates
 * x[0..5], y[0..5] relative to the centroid (docs/methods.md §7.2 area-form right-hand side).
 */
const scratchX = new Float64Array(6);
const scratchY = new Float64Array(6);

export function elementStiffnessAndLoad(x: ArrayLike<number>, y: ArrayLike<number>, ke: Float64Array, fe: Float64Array): number {
  const g = elementGeometry(x, y);
  const area = g.twiceArea / 2;
  // Module scratch (no per-element allocation); the function never re-enters itself.
  const nx = scratchX;
  const ny = scratchY;
  ke.fill(0);
  fe.fill(0);
  for (const [l1, l2, l3, w] of MIDEDGE_RULE) {
    shapeDerivatives(l1, l2, l3, g.b, nx);
    shapeDerivatives(l1, l2, l3, g.c, ny);
    const px = l1 * (x[0] ?? outside(x, 0)) + l2 * (x[1] ?? outside(x, 1)) + l3 * (x[2] ?? outside(x, 2));
    const py = l1 * (y[0] ?? outside(y, 0)) + l2 * (y[1] ?? outside(y, 1)) + l3 * (y[2] ?? outside(y, 2));
    const wa = w * area;
    for (let i = 0; i < 6; i++) {
      const nxi = nx[i] ?? outside(nx, i);
      const nyi = ny[i] ?? outside(ny, i);
      fe[i] = (fe[i] ?? outside(fe, i)) + wa * (py * nxi - px * nyi);
      for (let j = 0; j < 6; j++) ke[6 * i + j] = (ke[6 * i + j] ?? outside(ke, 6 * i + j)) + wa * (nxi * (nx[j] ?? outside(nx, j)) + nyi * (ny[j] ?? outside(ny, j)));
    }
  }
  return area;
}
