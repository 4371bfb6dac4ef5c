/**
 * Test-side oracles for part geometry, independent of core/properties:
 * - exactArea: polygon area of the vertices (shoelace) plus, for every arc, the signed circular
 *   segment r²(θ − sin θ)/2 on its chord (Roark's Formulas for Stress and Strain, 7th ed.,
 *   Table A.1, circular segment), with the radius from the bulge, r = c(1 + b²)/(4|b|)
 *   (docs/methods.md §2.4).
 * - arcCentre: centre of an arc from its bulge (docs/methods.md §2.4).
 */
import type { Region, Ring } from '../../core/geometry/types.ts';

export function ringPoint(ring: Ring, i: number): [number, number] {
  const n = ring.xy.length / 2;
  const k = ((i % n) + n) % n;
  return [ring.xy[2 * k]!, ring.xy[2 * k + 1]!];
}

export function exactRingArea(ring: Ring): number {
  const n = ring.xy.length / 2;
  let area = 0;
  for (let i = 0; i < n; i++) {
    const [x0, y0] = ringPoint(ring, i);
    const [x1, y1] = ringPoint(ring, i + 1);
    area += (x0 * y1 - x1 * y0) / 2;
    const b = ring.bulge?.[i] ?? 0;
    if (b === 0) continue;
    const chord = Math.hypot(x1 - x0, y1 - y0);
    const r = (chord * (1 + b * b)) / (4 * Math.abs(b));
    const sweep = 4 * Math.atan(b);
    area += (r * r * (sweep - Math.sin(sweep))) / 2;
  }
  return area;
}

export function exactArea(region: Region): number {
  return region.reduce((s, p) => s + exactRingArea(p.outer) + p.holes.reduce((h, ring) => h + exactRingArea(ring), 0), 0);
}

/** Centre of the arc on segment i (docs/methods.md §2.4: Pc = M + ((1 − b²)/(4b))·n_L). */
export function arcCentre(ring: Ring, i: number): [number, number] {
  const [x0, y0] = ringPoint(ring, i);
  const [x1, y1] = ringPoint(ring, i + 1);
  const b = ring.bulge?.[i] ?? 0;
  const k = (1 - b * b) / (4 * b);
  return [(x0 + x1) / 2 - k * (y1 - y0), (y0 + y1) / 2 + k * (x1 - x0)];
}

export function vertexCount(region: Region): number {
  return region.reduce((s, p) => s + p.outer.xy.length / 2 + p.holes.reduce((h, ring) => h + ring.xy.length / 2, 0), 0);
}

export function relativeError(got: number, expected: number): number {
  return Math.abs(got / expected - 1);
}
