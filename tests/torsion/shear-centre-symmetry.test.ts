/**
 * The finite-element shear centre of a symmetric section lies on its axis of symmetry (Timoshenko
 * & Goodier, Theory of Elasticity, torsion chapter; Pilkey 2002, §6.2: the shear centre lies on
 * every axis of symmetry). What was seen: a shear centre of 0.0001392 mm on a symmetric plate.
 * core/torsion/symmetry.ts puts it on the axis when the exact geometry is symmetric and the
 * finite-element distance is within the solver's own error estimate; it never moves the shear
 * centre of a section that is not symmetric.
 * Sections are our own: a trailer-frame flat bar off the origin, a channel, an unequal angle, a
 * mezzanine flitch beam (timber, steel plate, timber) and the same beam with one joist of steel.
 */
import { describe, expect, it } from 'vitest';
import { compositeTorsionAnalysis, torsionConstants } from '../../core/torsion/index.ts';
import { mirrorsOntoItself, snapShearCentre } from '../../core/torsion/symmetry.ts';
import { polygon, rectangle } from './shapes.ts';
import { filletedWShape } from './w-shape.ts';

describe('shear centre on the axis of symmetry', () => {
  it('a flat bar 120 × 9 mm with its corner at (13, 7): xs = 73 and ys = 11.5 exactly (the bar\'s mid-lines)', () => {
    const r = torsionConstants([rectangle(13, 7, 133, 16)]);
    expect(r.xs).toBe(73);
    expect(r.ys).toBe(11.5);
  });

  it('a channel 100 deep, flanges 50 × 8, web 6 (symmetric about y = 50 only): ys = 50 exactly; xs stays off the web, left of it (thin-walled theory: e > 0 outside the back)', () => {
    const channel = polygon([[0, 0], [50, 0], [50, 8], [6, 8], [6, 92], [50, 92], [50, 100], [0, 100]]);
    const r = torsionConstants([channel]);
    expect(r.ys).toBe(50);
    // The shear centre of a channel lies on the far side of the web from the flanges (Gere & Timoshenko §6.9).
    expect(r.xs).toBeLessThan(0);
  });

  it('an unequal angle 80 × 50 × 8 has no axis of symmetry: neither coordinate is snapped to its box middle', () => {
    const angle = polygon([[0, 0], [50, 0], [50, 8], [8, 8], [8, 80], [0, 80]]);
    const r = torsionConstants([angle]);
    expect(r.xs).not.toBe(25);
    expect(r.ys).not.toBe(40);
    // The shear centre of an angle is near the meeting of the legs' mid-lines (Gere & Timoshenko §6.9): (4, 4).
    expect(Math.hypot(r.xs - 4, r.ys - 4)).toBeLessThan(4);
  });

  it('a flitch beam, two 38 × 235 joists either side of a 10 × 220 steel plate: both coordinates snapped (every material mirrors onto itself)', () => {
    const timber = { region: [rectangle(-43, -117.5, -5, 117.5), rectangle(5, -117.5, 43, 117.5)], G: 0.5e9 };
    const steel = { region: [rectangle(-5, -110, 5, 110)], G: 77e9 };
    const r = compositeTorsionAnalysis([timber, steel]).result;
    expect(r.xs).toBe(0);
    expect(r.ys).toBe(0);
  });

  it('the same beam with its right joist steel is not symmetric by material: xs keeps the finite-element value, ys (still symmetric) is snapped', () => {
    const pieces = [
      { region: [rectangle(-43, -117.5, -5, 117.5)], G: 0.5e9 },
      { region: [rectangle(-5, -110, 5, 110), rectangle(5, -117.5, 43, 117.5)], G: 77e9 },
    ];
    const r = compositeTorsionAnalysis(pieces).result;
    expect(r.ys).toBe(0);
    // G-weighted: the stiff side pulls the shear centre right, far beyond any error estimate.
    expect(r.xs).toBeGreaterThan(5);
  });

  it('a W14X90 with its root fillets as exact arcs (AISC Shapes Database v15.0 dimensions): xs = ys = 0, the web and flange mid-lines', () => {
    const r = torsionConstants([filletedWShape({ d: 14, bf: 14.5, tw: 0.44, tf: 0.71, r: 1.31 - 0.71 })]);
    expect([r.xs, r.ys]).toEqual([0, 0]);
  });

  it('the mirror test reads exact geometry: a bar 1e-6 out of square is not symmetric, and a distance beyond the estimate is kept', () => {
    const square = [rectangle(0, 0, 10, 2)];
    const skew = [polygon([[0, 0], [10, 0], [10, 2 + 1e-6], [0, 2]])];
    expect(mirrorsOntoItself([square], 'vertical', 5)).toBe(true);
    expect(mirrorsOntoItself([skew], 'vertical', 5)).toBe(false);
    // 0.01 off the axis with a coarse-to-fine change of 0.001 and a relative error of 1e-5 × size 10: kept.
    expect(snapShearCentre([square], { xs: 5.01, ys: 1, xsCoarse: 5.011, ysCoarse: 1, relativeError: 1e-5 }).xs).toBe(5.01);
    expect(snapShearCentre([square], { xs: 5.0001, ys: 1.00001, xsCoarse: 5.0003, ysCoarse: 1, relativeError: 1e-5 })).toEqual({ xs: 5, ys: 1 });
  });
});
