/**
 * Test helpers: simple regions built from their defining dimensions, and the Saint-Venant
 * series for a rectangle (Timoshenko & Goodier, Theory of Elasticity, torsion chapter):
 *   J = (a b³ / 3) · [1 − (192/π⁵)(b/a) Σ_{k odd} tanh(kπa/(2b)) / k⁵],  a ≥ b.
 */
import type { Polygon } from '../../core/geometry/types.ts';

export const rectangle = (x0: number, y0: number, x1: number, y1: number): Polygon => ({
  outer: { xy: new Float64Array([x0, y0, x1, y0, x1, y1, x0, y1]) },
  holes: [],
});

/** Full circle as two bulge-1 arcs (the geometry contract's convention). */
export const disc = (cx: number, cy: number, r: number): Polygon => ({
  outer: { xy: new Float64Array([cx + r, cy, cx - r, cy]), bulge: new Float64Array([1, 1]) },
  holes: [],
});

export const annulus = (r: number, ri: number): Polygon => ({
  outer: { xy: new Float64Array([r, 0, -r, 0]), bulge: new Float64Array([1, 1]) },
  holes: [{ xy: new Float64Array([ri, 0, -ri, 0]), bulge: new Float64Array([-1, -1]) }],
});

/** Polygon through the given points (as listed). */
export const polygon = (pts: readonly (readonly [number, number])[], holes: readonly (readonly (readonly [number, number])[])[] = []): Polygon => ({
  outer: { xy: Float64Array.from(pts.flat()) },
  holes: holes.map((h) => ({ xy: Float64Array.from(h.flat()) })),
});

/** Ellipse inscribed polygon with n vertices at equal parametric angles. */
export const ellipsePolygon = (a: number, b: number, n: number): Polygon =>
  polygon(Array.from({ length: n }, (_, k) => [a * Math.cos((2 * Math.PI * k) / n), b * Math.sin((2 * Math.PI * k) / n)] as const));

export function rectangleSeriesJ(width: number, height: number): number {
  const a = Math.max(width, height);
  const b = Math.min(width, height);
  let s = 0;
  for (let k = 1; k < 2001; k += 2) s += Math.tanh((k * Math.PI * a) / (2 * b)) / k ** 5;
  return ((a * b ** 3) / 3) * (1 - (192 / Math.PI ** 5) * (b / a) * s);
}

/** Rigid motion of a polygon: rotate by angle about the origin, then translate. */
export function moved(p: Polygon, angle: number, dx: number, dy: number): Polygon {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const ring = (r: Polygon['outer']): Polygon['outer'] => {
    const xy = new Float64Array(r.xy.length);
    for (let i = 0; i < xy.length; i += 2) {
      const x = r.xy[i] ?? 0;
      const y = r.xy[i + 1] ?? 0;
      xy[i] = c * x - s * y + dx;
      xy[i + 1] = s * x + c * y + dy;
    }
    return { xy, bulge: r.bulge };
  };
  return { outer: ring(p.outer), holes: p.holes.map(ring) };
}
