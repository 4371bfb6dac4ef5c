/**
 * Torsion of sections of several materials (perfect bond), docs/methods.md §7.7: each element weighted
 * by G_i/G_ref, J reported as GJ/G_ref.
 * References:
 *  - concentric circles: the warping of a circular section is zero, and ω = 0 also meets the
 *    interface conditions, so GJ = Σ G_i·J_i with J_i the polar moment of each ring
 *    (Timoshenko & Goodier, Theory of Elasticity, torsion of circular shafts; closed form).
 *    Arcs are meshed as chords of 2.5°: J is lower by about Δφ²/3 = 0.063 % (docs/methods.md §7.8).
 *  - rectangles: the Saint-Venant series (Timoshenko & Goodier), via tests/torsion/shapes.ts.
 *  - thin layered strip: the trial warping ω = −X·(Y − y_G) (y_G the G-weighted centroid) is
 *    quadratic, so it lies in the T6 space, and the FE J is at most its energy
 *    4·b·Σ G_i ∫(Y − y_G)² dy / G_ref (minimum principle, docs/methods.md §7.2; identity).
 * G values are inputs of the tests (any positive numbers): 79.3 and 26 GPa are steel and
 * aluminium (common practice), 12 GPa a concrete-like fill, E/16 for timber (common practice).
 */
import { describe, expect, it } from 'vitest';
import type { Polygon } from '../../core/geometry/types.ts';
import { compositeTorsionAnalysis } from '../../core/torsion/index.ts';
import { rectangle, rectangleSeriesJ } from './shapes.ts';

const disc = (r: number): Polygon => ({ outer: { xy: new Float64Array([r, 0, -r, 0]), bulge: new Float64Array([1, 1]) }, holes: [] });
const ring = (r: number, ri: number): Polygon => ({
  outer: { xy: new Float64Array([r, 0, -r, 0]), bulge: new Float64Array([1, 1]) },
  holes: [{ xy: new Float64Array([ri, 0, -ri, 0]), bulge: new Float64Array([-1, -1]) }],
});

describe('concentric circles of two shear moduli: J = Σ G_i J_i / G_ref (closed form)', () => {
  it('steel tube D = 74, d = 46 filled with a G = 12 GPa core, G_ref = steel', () => {
    const gSteel = 79.3;
    const gFill = 12;
    const exact = (Math.PI / 2) * (37 ** 4 - 23 ** 4) + (gFill / gSteel) * (Math.PI / 2) * 23 ** 4;
    const a = compositeTorsionAnalysis([{ region: [ring(37, 23)], G: gSteel }, { region: [disc(23)], G: gFill }]);
    const e = a.result.J / exact - 1;
    expect(Math.abs(e)).toBeLessThan(1e-3);
    expect(a.result.components).toBe(1);
    // Axial symmetry: the shear centre is the centre.
    expect(Math.abs(a.result.xs)).toBeLessThan(1e-6 * 74);
    expect(Math.abs(a.result.ys)).toBeLessThan(1e-6 * 74);
  });

  it('the same section referred to the core: J scales by G_steel/G_fill exactly', () => {
    const pieces = [{ region: [ring(37, 23)], G: 79.3 }, { region: [disc(23)], G: 12 }];
    const bySteel = compositeTorsionAnalysis(pieces).result.J;
    const byFill = compositeTorsionAnalysis(pieces, { referenceShearModulus: 12 }).result.J;
    expect(byFill / bySteel).toBeCloseTo(79.3 / 12, 9);
  });
});

describe('flitch beam: two timber plies bolted to a steel plate', () => {
  // Timber 45 × 240 each side (G = 11 000/16 MPa), steel plate 10 × 200 between (G = 79 300 MPa).
  const gTimber = 11000 / 16;
  const gSteel = 79300;
  const pieces = [
    { region: [rectangle(-50, -120, -5, 120)], G: gTimber },
    { region: [rectangle(-5, -100, 5, 100)], G: gSteel },
    { region: [rectangle(5, -120, 50, 120)], G: gTimber },
  ];

  it('one connected piece, shear centre at the centre (double symmetry), J above the plies twisting apart', () => {
    const a = compositeTorsionAnalysis(pieces);
    expect(a.result.components).toBe(1);
    expect(Math.abs(a.result.xs)).toBeLessThan(1e-6 * 240);
    expect(Math.abs(a.result.ys)).toBeLessThan(1e-6 * 240);
    // Bonding constrains the warping, so J cannot fall below the pieces twisting on their own
    // (Saint-Venant series for each rectangle).
    const apart = 2 * rectangleSeriesJ(45, 240) + (gSteel / gTimber) * rectangleSeriesJ(10, 200);
    expect(a.result.J).toBeGreaterThan(apart);
    // Above the plies alone means the steel counts with its G: more than the all-timber outline's plies.
    expect(a.result.J).toBeGreaterThan(2 * rectangleSeriesJ(45, 240) * 1.5);
  });
});

describe('bimetal strip: steel over aluminium, 240 × (3 + 3)', () => {
  it('J below the layered thin-strip trial energy and within the end-effect band of it; shear centre on the G-weighted centroid line', () => {
    const b = 240;
    const gSteel = 79.3;
    const gAl = 26;
    const a = compositeTorsionAnalysis([
      { region: [rectangle(0, 0, b, 3)], G: gSteel },
      { region: [rectangle(0, -3, b, 0)], G: gAl },
    ]);
    // G-weighted centroid line: y_G = (gS·1.5 − gA·1.5)/(gS + gA).
    const yG = (1.5 * (gSteel - gAl)) / (gSteel + gAl);
    const second = (g: number, y0: number, y1: number): number => (g * ((y1 - yG) ** 3 - (y0 - yG) ** 3)) / 3;
    const trial = (4 * b * (second(gSteel, 0, 3) + second(gAl, -3, 0))) / gSteel;
    expect(a.result.J).toBeLessThanOrEqual(trial * (1 + 1e-9));
    // Homogeneous strips lose about 0.63·t/b to the free ends (Roark, from memory); allow 0.7·t/b.
    expect(a.result.J).toBeGreaterThan(trial * (1 - (0.7 * 6) / b));
    expect(a.result.ys).toBeCloseTo(yG, 2);
  });
});

describe('bad input', () => {
  it('a non-positive shear modulus is refused, naming the piece', () => {
    expect(() => compositeTorsionAnalysis([{ region: [rectangle(0, 0, 1, 1)], G: 0 }])).toThrow(/piece 0: shear modulus G = 0/);
  });
});
