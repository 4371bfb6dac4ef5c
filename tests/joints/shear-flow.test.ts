// Shear flow at joints, q = V·Q/I, and what it asks of welds and fasteners. References:
//  - welded I, flange to web: q = V·Af·(d − tf)/2 / Ix (Gere & Timoshenko, Mechanics of
//    Materials, shear flow in built-up beams), Ix by b·h³/12 + A·d²;
//  - box girder, each of the two web-to-flange welds: V·Q_flange/(2·Ix) (Gere, built-up box beam);
//  - unsymmetric (Z-like) section: the general form with Ixy, against exact rationals worked by hand;
//  - fillet welds: AISC 360-22 §J2.4 hand calculation written out below.
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { fastenerPitch, intermittentFillet, jointShearFlows, minimumFilletLeg, requiredFilletLeg } from '../../core/joints/index.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material: null, visible: true, placement: at(x, y), width, height,
});
const doc = (parts: readonly Part[]): SectionDocument => ({ ...newDocument('mm', 'test'), parts });
const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

describe('welded I: flange-to-web q = V·Af·(d − tf)/2/Ix', () => {
  // Flanges 300 × 20, web 10 × 560: d = 600, tf = 20. V = 500 kN.
  const d = doc([rect('top', 300, 20, 0, 290), rect('web', 10, 560, 0, 0), rect('bottom', 300, 20, 0, -290)]);
  const Ix = (10 * 560 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 6000 * 290 ** 2);
  const q = (500_000 * 6000 * (600 - 20)) / 2 / Ix; // N/mm

  it(`each flange weld carries ${q.toFixed(2)} N/mm; the web is cut off by neither joint alone`, () => {
    const r = jointShearFlows(d, { Vy: 500_000, Vx: 0 });
    expect(r?.flows.map((f) => f.cutOff)).toEqual([['top'], ['bottom']]);
    expect(rel(Math.abs(r?.flows[0]?.q ?? 0), q)).toBeLessThan(1e-12);
    expect(rel(Math.abs(r?.flows[1]?.q ?? 0), q)).toBeLessThan(1e-12);
    expect(rel(r?.section.Ix ?? 0, Ix)).toBeLessThan(1e-12);
    // τ at the joint: q over the 10 mm contact.
    expect(rel(r?.flows[0]?.tau ?? 0, q / 10)).toBeLessThan(1e-12);
  });
});

describe('box girder: web-to-flange welds', () => {
  // Top and bottom plates 400 × 20 across two webs 12 × 500 at x = ±150: a closed cell, symmetric.
  const d = doc([rect('top', 400, 20, 0, 260), rect('left web', 12, 500, -150, 0), rect('right web', 12, 500, 150, 0), rect('bottom', 400, 20, 0, -260)]);
  const Ix = 2 * ((12 * 500 ** 3) / 12) + 2 * ((400 * 20 ** 3) / 12 + 8000 * 260 ** 2);
  const each = (300_000 * 8000 * 260) / Ix / 2;

  it(`each of the four welds carries V·Q_flange/(2·Ix) = ${each.toFixed(2)} N/mm, stated as an equal share`, () => {
    const r = jointShearFlows(d, { Vy: 300_000, Vx: 0 });
    expect(r?.flows).toHaveLength(4);
    for (const f of r?.flows ?? []) {
      expect(rel(Math.abs(f.q), each)).toBeLessThan(1e-12);
      expect([f.sharedBy, f.equalShare]).toEqual([2, true]);
      expect(f.note).toMatch(/closed cell: "(top|bottom)" is cut off by 2 joints/);
    }
  });
});

describe('unsymmetric section: the general form with Ixy, exact rationals', () => {
  // A Z-like section of three rectangles: top flange 60 × 10 over x ∈ [−10, 50], y ∈ [45, 55];
  // web 10 × 90 over x ∈ [−10, 0], y ∈ [−45, 45]; bottom flange 70 × 10 over x ∈ [−70, 0], y ∈ [−55, −45].
  const d = doc([rect('top', 60, 10, 20, 50), rect('web', 10, 90, -5, 0), rect('bottom', 70, 10, -35, -50)]);
  // By hand (exact): areas 600, 900, 700; A = 2200.
  // x̄ = (600·20 + 900·(−5) + 700·(−35))/2200 = (12000 − 4500 − 24500)/2200 = −17000/2200 = −85/11
  // ȳ = (600·50 − 700·50)/2200 = −5000/2200 = −25/11
  const A = 2200, xb = -85 / 11, yb = -25 / 11;
  const rects = [
    { b: 60, h: 10, x: 20, y: 50 },
    { b: 10, h: 90, x: -5, y: 0 },
    { b: 70, h: 10, x: -35, y: -50 },
  ];
  const Ix = rects.reduce((s, r) => s + (r.b * r.h ** 3) / 12 + r.b * r.h * (r.y - yb) ** 2, 0);
  const Iy = rects.reduce((s, r) => s + (r.h * r.b ** 3) / 12 + r.b * r.h * (r.x - xb) ** 2, 0);
  const Ixy = rects.reduce((s, r) => s + r.b * r.h * (r.x - xb) * (r.y - yb), 0);
  // Top flange cut off: Qx = 600·(50 − ȳ), Qy = 600·(20 − x̄).
  const Qx = 600 * (50 - yb), Qy = 600 * (20 - xb);
  const V = 100_000, Vx = 40_000, D = Ix * Iy - Ixy * Ixy;
  const qVy = (V * Iy * Qx - V * Ixy * Qy) / D;
  const qVx = (Vx * Ix * Qy - Vx * Ixy * Qx) / D;

  it('Ixy ≠ 0, and the top flange weld carries [(Vy·Iy − Vx·Ixy)·Qx + (Vx·Ix − Vy·Ixy)·Qy]/(Ix·Iy − Ixy²)', () => {
    expect(A).toBe(600 + 900 + 700);
    expect(Math.abs(Ixy)).toBeGreaterThan(1e5);
    const r = jointShearFlows(d, { Vy: V, Vx });
    const top = r?.flows.find((f) => f.cutOff.join() === 'top');
    expect(rel(r?.section.Ixy ?? 0, Ixy)).toBeLessThan(1e-12);
    expect(rel(top?.Qx ?? 0, Qx)).toBeLessThan(1e-12);
    expect(rel(top?.Qy ?? 0, Qy)).toBeLessThan(1e-12);
    expect(rel(top?.qVy ?? 0, qVy)).toBeLessThan(1e-12);
    expect(rel(top?.qVx ?? 0, qVx)).toBeLessThan(1e-12);
    expect(rel(top?.q ?? 0, qVy + qVx)).toBeLessThan(1e-12);
    // Ignoring Ixy would be wrong here by more than 10 %.
    expect(rel(top?.qVy ?? 0, (V * Qx) / Ix)).toBeGreaterThan(0.1);
  });
});

describe('fillet welds, AISC 360-22 §J2.4, by hand', () => {
  // q = 600 N/mm = 600 000 N/m; E70 electrode FEXX = 482.6 MPa (70 ksi); fillets both sides (2 lines).
  // LRFD: w = q / (2 · 0.75 · 0.60 · 0.707 · FEXX) = 600 / (2 · 0.75 · 0.60 · 0.707 · 482.6) mm
  //         = 600 / 307.0813... = 1.95388 mm
  // ASD:  w = 2.00 · q / (2 · 0.60 · 0.707 · FEXX) = 1200 / 409.4417... = 2.93082 mm
  const FEXX = 482.6e6;
  it('required leg: LRFD 1.954 mm, ASD 2.931 mm', () => {
    expect(requiredFilletLeg(600_000, FEXX, 2, 'LRFD') * 1000).toBeCloseTo(600 / (2 * 0.75 * 0.6 * 0.707 * 482.6), 10);
    expect(requiredFilletLeg(600_000, FEXX, 2, 'LRFD') * 1000).toBeCloseTo(1.95388, 4);
    expect(requiredFilletLeg(600_000, FEXX, 2, 'ASD') * 1000).toBeCloseTo(2.93082, 4);
  });

  it('minimum size for the thinner part (Table J2.4): 10 mm plate → 5 mm; 20 mm → 8 mm; 1/2 in → 3/16 in', () => {
    expect(minimumFilletLeg(0.010, 'metric')).toBe(0.005);
    expect(minimumFilletLeg(0.020, 'metric')).toBe(0.008);
    expect(minimumFilletLeg(0.0127, 'us')).toBeCloseTo((3 / 16) * 0.0254, 12);
  });

  it('intermittent 5 mm fillets both sides, LRFD: 38 mm segments at pitch 38 · (2 · 0.75 · 0.6 · 0.707 · 482.6 · 5) / 600 mm', () => {
    const r = intermittentFillet(600_000, 0.005, FEXX, 2, 'LRFD', 'metric');
    expect(r.segment).toBe(0.038);
    expect(r.pitch * 1000).toBeCloseTo((38 * 2 * 0.75 * 0.6 * 0.707 * 482.6 * 5) / 600, 9);
  });

  it('fasteners: two rows of bolts of 40 kN each at q = 600 N/mm: largest pitch 2 · 40 000 / 600 = 133.3 mm', () => {
    expect(fastenerPitch(600_000, 2, 40_000) * 1000).toBeCloseTo(133.3333, 3);
  });
});
