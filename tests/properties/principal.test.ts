/**
 * Principal axes, rotated and transferred second moments (docs/methods.md §1.2, §3; Gere & Timoshenko,
 * Mechanics of Materials: parallel-axis theorem, transformation equations, principal moments).
 */
import { describe, expect, it } from 'vitest';
import {
  principalAxes,
  regionIntegrals,
  secondMomentsAboutPoint,
  secondMomentsAtAngle,
  sectionProperties,
  centroidalFromIntegrals,
} from '../../core/properties/index.ts';
import { degrees } from '../../core/geometry/types.ts';
import { analyticRefs, expectRel, poly, rectRing, ref, ring } from './helpers.ts';

const rows = analyticRefs();

describe('parallel-axis transfer from the centroid (analytic_refs.csv: rectangle, right_triangle)', () => {
  it('rectangle 100 × 200 about its corner: Ix = bh³/3, Ixy = b²h²/4', () => {
    const p = sectionProperties([poly(rectRing(0, 0, 100, 200))]);
    const m = secondMomentsAboutPoint(p, 0, 0);
    expectRel(m.Ix, ref(rows, 'rectangle', 'Ix_origin'), 1e-12);
    expectRel(m.Ixy, ref(rows, 'rectangle', 'Ixy_origin'), 1e-12);
  });
  it('right triangle about its right-angle corner: Ixy = +b²h²/24', () => {
    const p = sectionProperties([poly(ring([0, 0, 120, 0, 0, 90]))]);
    expectRel(secondMomentsAboutPoint(p, 0, 0).Ixy, ref(rows, 'right_triangle', 'Ixy_origin'), 1e-12);
  });
  it('semicircle about its diameter: Ix = πr⁴/8 (analytic_refs.csv: semicircle Ix_origin)', () => {
    const p = sectionProperties([poly(ring([50, 0, -50, 0], [1, 0]))]);
    expectRel(secondMomentsAboutPoint(p, 0, 0).Ix, ref(rows, 'semicircle', 'Ix_origin'), 1e-12);
  });
});

describe('principal axes (docs/methods.md §3)', () => {
  it('I_u at θ1 equals I1, I_v equals I2 and the product vanishes (right triangle)', () => {
    const p = sectionProperties([poly(ring([0, 0, 120, 0, 0, 90]))]);
    const r = secondMomentsAtAngle(p.Ix, p.Iy, p.Ixy, degrees(p.thetaDeg));
    expectRel(r.Iu, p.I1, 1e-12);
    expectRel(r.Iv, p.I2, 1e-12);
    expectRel(r.Iuv, 0, 1e-12, p.I1);
  });
  it('θ1 is in (−90°, 90°]: Ix < Iy with Ixy = ±0 gives +90°, never −90°', () => {
    expect(principalAxes(1, 2, 0).thetaDeg).toBe(90);
    expect(principalAxes(1, 2, -0).thetaDeg).toBe(90);
    expect(principalAxes(2, 1, 0).thetaDeg).toBe(0);
    expect(Object.is(principalAxes(2, 1, 0).thetaDeg, -0)).toBe(false);
  });
  it('Ixy > 0 (area in quadrants I and III) puts the major axis at −45° when Ix = Iy; Ixy < 0 at +45°', () => {
    expect(principalAxes(5, 5, 2).thetaDeg).toBeCloseTo(-45, 12);
    expect(principalAxes(5, 5, -2).thetaDeg).toBeCloseTo(45, 12);
    expect(principalAxes(5, 5, 2).I1).toBe(7);
  });
  it('isotropy is flagged only when R ≤ 1e-12·(Ix + Iy)/2', () => {
    expect(principalAxes(1, 1, 1e-13).isotropic).toBe(true);
    expect(principalAxes(1, 1, 1e-10).isotropic).toBe(false);
  });
  it('square (isotropic) reports θ1 = 0 even when drawn rotated by 30°', () => {
    const c = Math.cos(Math.PI / 6), s = Math.sin(Math.PI / 6);
    const pts = [[0, 0], [10, 0], [10, 10], [0, 10]].flatMap(([x, y]) => [c * x! - s * y!, s * x! + c * y!]);
    const p = sectionProperties([poly(ring(pts))]);
    expect(p.isotropic).toBe(true);
    expect(p.thetaDeg).toBe(0);
    expectRel(p.I1, 10 ** 4 / 12, 1e-12);
  });
});

describe('centroidalFromIntegrals and the stated origin of raw integrals', () => {
  it('raw integrals state their origin; any origin gives the same centroidal values (1e-12)', () => {
    const region = [poly(ring([0, 0, 120, 0, 0, 90]))];
    const byDefault = regionIntegrals(region);
    expect([byDefault.originX, byDefault.originY]).toEqual([0, 0]); // first vertex of the first outer ring
    const a = centroidalFromIntegrals(regionIntegrals(region, 500, -300));
    expectRel(a.cx, ref(rows, 'right_triangle', 'xc'), 1e-12);
    expectRel(a.Ix, ref(rows, 'right_triangle', 'Ix'), 1e-12);
    expectRel(a.Ixy, ref(rows, 'right_triangle', 'Ixy'), 1e-12);
  });
  it('a non-finite vertex is reported as an invariant failure naming the integral, not returned as NaN', () => {
    expect(() => regionIntegrals([poly(ring([0, 0, Number.NaN, 0, 0, 1]))], 0, 0)).toThrow(/not finite/);
  });
});
