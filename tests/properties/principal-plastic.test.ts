/**
 * Plastic moduli about the principal axes, Z1 (PNA along axis 1) and Z2: by the closed form for a
 * rectangle, Z = b·h²/4 (Gere & Timoshenko, Mechanics of Materials, fully plastic rectangle),
 * with the rectangle turned so its axes are nowhere near x and y; and, for a doubly symmetric
 * section whose Ixy comes out as rounding rather than 0, equal to Zx and Zy (identity: the
 * symmetry axes are principal axes, Timoshenko & Gere).
 */
import { describe, expect, it } from 'vitest';
import { normaliseRegion } from '../../core/geometry/normalise.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import { expectRel, poly, ring } from './helpers.ts';

describe('Z1 and Z2', () => {
  it('a 30 × 10 rectangle turned 30° and moved 5 km away: Z1 = h·b²/4 = 2250, Z2 = b·h²/4 = 750', () => {
    const [c, s] = [Math.cos(Math.PI / 6), Math.sin(Math.PI / 6)];
    const corners = [[-15, -5], [15, -5], [15, 5], [-15, 5]].flatMap(([x, y]) => [5000 + c * x! - s * y!, -3000 + s * x! + c * y!]);
    const p = sectionProperties(normaliseRegion([poly(ring(corners))]));
    expectRel(p.I1, (10 * 30 ** 3) / 12, 1e-9);
    expectRel(p.Z1, (10 * 30 * 30) / 4, 1e-9);
    expectRel(p.Z2, (30 * 10 * 10) / 4, 1e-9);
  });
  it('an 8,000-gon inscribed in a 400 × 200 ellipse: θ within 1e−9° of an axis and Z1, Z2 equal Zy, Zx', () => {
    const n = 8000;
    const pts: number[] = [];
    for (let i = 0; i < n; i++) pts.push(1000 + 200 * Math.cos((2 * Math.PI * i) / n), 500 + 100 * Math.sin((2 * Math.PI * i) / n));
    const p = sectionProperties(normaliseRegion([poly(ring(pts))]));
    const off = Math.abs(((p.thetaDeg % 90) + 90) % 90);
    expect(Math.min(off, 90 - off)).toBeLessThan(1e-9);
    // Axis 1 carries the larger I: Iy here (the long side is along x), so the PNA of Z1 runs along y.
    expect(p.Z1).toBe(p.Zy);
    expect(p.Z2).toBe(p.Zx);
    // Zx against the ellipse's 2·(πab/2)·4b/(3π) = 4ab²/3 (half-ellipse area and centroid, Gere & Timoshenko,
    // Appendix D centroid table): within the inscribed 8,000-gon's shortfall, about 3e−7, so 1e−6.
    expectRel(p.Zx, (4 * 200 * 100 * 100) / 3, 1e-6);
  });
});
