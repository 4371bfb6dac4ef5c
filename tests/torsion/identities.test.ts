/**
 * Identities of the discrete warping problem (docs/methods.md §7.2, §7.4) and invariance under rigid
 * motion (docs/methods.md §11):
 *  - ΣF_i = 0 (Σ N_i = 1 on each element), to 1e-12 Σ|F_i|;
 *  - energy identity ωᵀKω = Fᵀω at the solution (to the solver tolerance);
 *  - the mesh integrates a polygon's area and polar moment exactly (straight-sided elements
 *    tile the polygon): b h (b² + h²)/12 for a rectangle (Gere & Timoshenko);
 *  - J and Cw unchanged by rotation and translation, the shear centre moves with the section
 *    (different meshes: agreement to the discretisation error, 0.05 % on J);
 *  - the torsional stress per unit torque of a circle peaks at 2/(π r³) on the rim
 *    (τ = T r / J, Timoshenko & Goodier); 2 % band, because nodal averaging of the piecewise-
 *    linear T6 gradient flattens the rim value a little.
 */
import { describe, expect, it } from 'vitest';
import { torsionAnalysis, torsionConstants, torsionStressField } from '../../core/torsion/index.ts';
import { disc, moved, polygon, rectangle } from './shapes.ts';

const channel = polygon([[-5, -105], [75, -105], [75, -95], [5, -95], [5, 95], [75, 95], [75, 105], [-5, 105]]);

describe('discrete identities', () => {
  const a = torsionAnalysis([channel]);
  const s = a.solution;
  it('the load vector sums to zero (|ΣF| ≤ 1e-12 Σ|F|)', () => {
    let sum = 0;
    let abs = 0;
    for (const f of s.load) {
      sum += f;
      abs += Math.abs(f);
    }
    expect(Math.abs(sum)).toBeLessThanOrEqual(1e-12 * abs);
  });
  it('energy identity ωᵀKω = Fᵀω to 1e-8 relative, and J = Ip − Fᵀω', () => {
    let fw = 0;
    s.load.forEach((f, i) => (fw += f * (s.omega[i] ?? 0)));
    expect(Math.abs(s.energy - fw)).toBeLessThan(1e-8 * fw);
    expect(Math.abs(s.Ip - fw - a.result.J)).toBeLessThan(1e-9 * a.result.J);
  });
  it('the solver met its tolerance ‖r‖/‖F‖ ≤ 1e-10', () => expect(s.relativeResidual).toBeLessThanOrEqual(1e-10));
  it('a rectangle mesh integrates area and polar moment exactly', () => {
    const r = torsionAnalysis([rectangle(3, -2, 103, 198)]).solution;
    expect(r.area).toBeCloseTo(20_000, 7);
    expect(Math.abs(r.Ip / ((100 * 200 * (100 ** 2 + 200 ** 2)) / 12) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(r.xc - 53)).toBeLessThan(1e-10);
    expect(Math.abs(r.yc - 98)).toBeLessThan(1e-10);
  });
});

describe('rigid-motion invariance', () => {
  const base = torsionConstants([channel]);
  for (const [angle, dx, dy] of [[0, 1234.5, -678.9], [Math.PI / 6, 0, 0], [2.2, -5e3, 4e3]] as const) {
    it(`rotation ${((angle * 180) / Math.PI).toFixed(0)}°, shift (${dx}, ${dy}): J, Cw unchanged; shear centre moves with the section`, () => {
      const r = torsionConstants([moved(channel, angle, dx, dy)]);
      expect(Math.abs(r.J / base.J - 1)).toBeLessThan(5e-4);
      expect(Math.abs(r.Cw / base.Cw - 1)).toBeLessThan(2e-3);
      const ex = Math.cos(angle) * base.xs - Math.sin(angle) * base.ys + dx;
      const ey = Math.sin(angle) * base.xs + Math.cos(angle) * base.ys + dy;
      expect(Math.hypot(r.xs - ex, r.ys - ey)).toBeLessThan(0.05);
    });
  }
});

describe('torsional shear stress per unit torque', () => {
  it('circle r = 25: peak |τ| within 2 % of 2/(π r³), and small at the centre', () => {
    const r = 25;
    const a = torsionAnalysis([disc(0, 0, r)]);
    const f = torsionStressField(a);
    const peak = 2 / (Math.PI * r ** 3);
    expect(Math.abs(f.maxMagnitude / peak - 1)).toBeLessThan(0.02);
    let centre = Infinity;
    for (let i = 0; i < f.magnitude.length; i++) {
      const d = Math.hypot(f.xy[2 * i] ?? 0, f.xy[2 * i + 1] ?? 0);
      if (d < 2) centre = Math.min(centre, f.magnitude[i] ?? Infinity);
    }
    expect(centre).toBeLessThan(0.1 * peak);
    expect(f.unboundedAtCorners).toBe(false);
    // The drawing triangles use every node, four per T6 element.
    expect(f.triangles.length).toBe(4 * 3 * a.result.meshElements);
    expect(new Set(f.triangles).size).toBe(a.result.meshNodes);
  });
  it('an L-shaped angle is flagged: its sharp re-entrant corner makes the true peak unbounded', () => {
    const a = torsionAnalysis([polygon([[0, 0], [100, 0], [100, 10], [10, 10], [10, 100], [0, 100]])]);
    expect(torsionStressField(a).unboundedAtCorners).toBe(true);
  });
});
