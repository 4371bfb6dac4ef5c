/**
 * Sanity bands against thin-walled formulas (docs/methods.md §8; approximate by nature, so ~2–3 %
 * bands, never tight targets):
 *  - channel shear centre e = 3 b² t_f/(6 b t_f + h t_w) outside the web (Gere & Timoshenko,
 *    Mechanics of Materials), and Cw = t_f b³ h²/12 · (3 b t_f + 2 h t_w)/(6 b t_f + h t_w)
 *    (AISC Design Guide 9; from memory), centre-line dimensions h = 200, b = 75, t = 10;
 *  - doubly symmetric I: Cw = Iy h0²/4 (AISC Design Guide 9), Iy of the plates exact;
 *  - closed rectangular tube: Bredt J = 4 A_m²/∮ds/t = 2 t b² h²/(b + h) on the mid-line
 *    (Timoshenko & Goodier), error O(t/b);
 *  - equal angle: shear centre on the symmetry line x = y (exact), near the mid-line
 *    intersection (t/2, t/2) (thin-wall).
 */
import { describe, expect, it } from 'vitest';
import { torsionConstants } from '../../core/torsion/index.ts';
import { polygon, rectangle } from './shapes.ts';

describe('channel (web centre-line on x = 0, flanges toward +x)', () => {
  const h = 200;
  const b = 75;
  const t = 10;
  const channel = polygon([[-t / 2, -h / 2 - t / 2], [b, -h / 2 - t / 2], [b, -h / 2 + t / 2], [t / 2, -h / 2 + t / 2], [t / 2, h / 2 - t / 2], [b, h / 2 - t / 2], [b, h / 2 + t / 2], [-t / 2, h / 2 + t / 2]]);
  const r = torsionConstants([channel]);
  it('shear centre lies outside the web at x = −e within 2 %, on the symmetry axis', () => {
    const e = (3 * b * b * t) / (6 * b * t + h * t);
    expect(r.xs).toBeLessThan(-t / 2);
    expect(Math.abs(-r.xs / e - 1)).toBeLessThan(0.02);
    expect(Math.abs(r.ys)).toBeLessThan(1e-6 * h);
  });
  it('Cw within 2 % of the thin-wall formula', () => {
    const cw = ((t * b ** 3 * h ** 2) / 12) * ((3 * b * t + 2 * h * t) / (6 * b * t + h * t));
    expect(Math.abs(r.Cw / cw - 1)).toBeLessThan(0.02);
  });
});

describe('doubly symmetric I 200 × 15 flanges, 10 web, D = 315', () => {
  it('Cw within 1 % of Iy·h0²/4 with h0 = D − tf', () => {
    const bf = 200;
    const tf = 15;
    const tw = 10;
    const D = 315;
    const y = D / 2;
    const I = polygon([[-bf / 2, -y], [bf / 2, -y], [bf / 2, -y + tf], [tw / 2, -y + tf], [tw / 2, y - tf], [bf / 2, y - tf], [bf / 2, y], [-bf / 2, y], [-bf / 2, y - tf], [-tw / 2, y - tf], [-tw / 2, -y + tf], [-bf / 2, -y + tf]]);
    const Iy = (2 * tf * bf ** 3) / 12 + ((D - 2 * tf) * tw ** 3) / 12;
    const r = torsionConstants([I]);
    expect(Math.abs(r.Cw / ((Iy * (D - tf) ** 2) / 4) - 1)).toBeLessThan(0.01);
  });
});

describe('closed rectangular tube 200 × 100 × 5 (outer)', () => {
  it('J within 2 % of Bredt 2 t b² h²/(b + h) on the mid-line, and far above the open-section value', () => {
    const t = 5;
    const tube = { outer: rectangle(0, 0, 200, 100).outer, holes: [rectangle(t, t, 200 - t, 100 - t).outer] };
    const r = torsionConstants([tube]);
    const bm = 200 - t;
    const hm = 100 - t;
    const bredt = (2 * t * bm * bm * hm * hm) / (bm + hm);
    expect(Math.abs(r.J / bredt - 1)).toBeLessThan(0.02);
    expect(r.J).toBeGreaterThan(50 * ((2 * (bm + hm) * t ** 3) / 3));
  });
});

describe('equal angle 100 × 100 × 10, heel at the origin', () => {
  it('shear centre on the line x = y, within t of the mid-line intersection (t/2, t/2)', () => {
    const r = torsionConstants([polygon([[0, 0], [100, 0], [100, 10], [10, 10], [10, 100], [0, 100]])]);
    expect(Math.abs(r.xs - r.ys)).toBeLessThan(1e-6 * 100);
    expect(Math.hypot(r.xs - 5, r.ys - 5)).toBeLessThan(10);
  });
});
