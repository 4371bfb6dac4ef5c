// Shear stress τ = V·Q/(I·t) in each part and beside each joint (core/joints/shear-stress.ts).
// References:
//  - solid rectangle: τmax = 1.5·V/A at the neutral axis (common practice; Gere & Timoshenko,
//    Mechanics of Materials, shear stresses in rectangular beams);
//  - welded I: τ in the web at the neutral axis = V·Q/(Ix·tw), Q = Af·(d − tf)/2 + tw·hw²/8 by
//    hand; in the flange beside the web V·((b − tw)/2·tf)·(d − tf)/2/(Ix·tf) (Gere & Timoshenko,
//    shear stresses in the flanges of thin-walled beams);
//  - box girder: the neutral-axis cut runs through both webs, τ = V·Q/(Ix·2tw), exact by symmetry;
//  - unsymmetric Z: the general form with Ixy against exact rationals worked by hand;
//  - flitch beam (two 2x10, NDS Supplement Table 1A dressed 1.5 × 9.25 in, E 1.6e6 psi; a
//    3/8 × 9 in steel plate, E 29e6 psi; values from memory as in the material library): τ_i =
//    n_i·V·Q_n/(I_n·Σ n_j·t_j), the transformed section (Gere & Timoshenko) by hand.
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { JointSetting, Part, SectionDocument } from '../../core/document/types.ts';
import { jointShearFlows, shearStressAt, shearStresses, shearStressProfile } from '../../core/joints/index.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number, material: string | null = null): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: at(x, y), width, height,
});
const doc = (parts: readonly Part[], extra: Partial<SectionDocument> = {}, unit: 'mm' | 'in' = 'mm'): SectionDocument => ({ ...newDocument(unit, 'test'), parts, ...extra });
const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);
const tauOf = (r: ReturnType<typeof shearStresses>, label: string) => r?.parts.find((p) => p.label === label);

describe('solid rectangle: τmax = 1.5·V/A (common practice; Gere & Timoshenko)', () => {
  it('100 × 300 mm under Vy = 120 kN: 1.5 · 120 000 / 30 000 = 6 N/mm², at the neutral axis', () => {
    const r = shearStresses(doc([rect('bar', 100, 300, 40, -25)]), { Vy: 120_000, Vx: 0 });
    const p = tauOf(r, 'bar');
    expect(rel(p?.tauMax ?? 0, 6)).toBeLessThan(1e-9);
    expect(p?.cut?.orientation).toBe('horizontal');
    expect(Math.abs((p?.cut?.at ?? NaN) - -25)).toBeLessThan(1e-9);
  });

  it('under Vx = 90 kN the same rule across the other way: 1.5 · 90 000 / 30 000 = 4.5 N/mm² on a vertical cut', () => {
    const p = tauOf(shearStresses(doc([rect('bar', 100, 300, 0, 0)]), { Vy: 0, Vx: 90_000 }), 'bar');
    expect(rel(p?.tauMax ?? 0, 4.5)).toBeLessThan(1e-9);
    expect(p?.cut?.orientation).toBe('vertical');
  });
});

describe('welded I: web, flanges and the flange-to-web joints', () => {
  // Flanges 300 × 20, web 10 × 560: d = 600, tf = 20, tw = 10. V = 500 kN.
  const d = doc([rect('top', 300, 20, 0, 290), rect('web', 10, 560, 0, 0), rect('bottom', 300, 20, 0, -290)]);
  const Ix = (10 * 560 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 6000 * 290 ** 2);
  const V = 500_000;
  const Qna = 6000 * 290 + (10 * 280 ** 2) / 2; // flange + half the web, by hand: 2 132 000 mm³
  const tauWeb = (V * Qna) / (Ix * 10);
  const tauFlange = (V * (((300 - 10) / 2) * 20) * 290) / (Ix * 20);
  const r = shearStresses(d, { Vy: V, Vx: 0 });

  it(`web: τmax = V·Q/(Ix·tw) = ${tauWeb.toFixed(3)} N/mm² at the neutral axis`, () => {
    expect(Qna).toBe(2_132_000);
    const web = tauOf(r, 'web');
    expect(rel(web?.tauMax ?? 0, tauWeb)).toBeLessThan(1e-9);
    expect(web?.cut?.cutOff).toEqual(['top', 'web (above)']);
  });

  it(`flange: τmax beside the web = V·((b − tw)/2·tf)·(d − tf)/2/(Ix·tf) = ${tauFlange.toFixed(3)} N/mm², on a vertical cut`, () => {
    for (const name of ['top', 'bottom']) {
      const f = tauOf(r, name);
      expect(rel(f?.tauMax ?? 0, tauFlange)).toBeLessThan(1e-6);
      expect(f?.cut?.orientation).toBe('vertical');
    }
  });

  it('at each joint: q/tw on the joint plane, V·Af·(d − tf)/2/(Ix·tw) in the web and /(Ix·b) in the flange beside it', () => {
    const q = (V * 6000 * 290) / Ix;
    expect(r?.joints).toHaveLength(2);
    for (const j of r?.joints ?? []) {
      expect(rel(Math.abs(j.q), q)).toBeLessThan(1e-12);
      expect(rel(j.tauJoint, q / 10)).toBeLessThan(1e-12);
      const [flange, web] = j.joint.labels[0] === 'web' ? [j.tauIn[1], j.tauIn[0]] : [j.tauIn[0], j.tauIn[1]];
      expect(rel(web ?? 0, q / 10)).toBeLessThan(1e-6);
      expect(rel(flange ?? 0, q / 300)).toBeLessThan(1e-6);
    }
  });

  it('the web is the part with the largest τ; with no load every τ is 0', () => {
    expect(Math.max(...(r?.parts.map((p) => p.tauMax) ?? []))).toBe(tauOf(r, 'web')?.tauMax);
    expect(shearStresses(d, { Vy: 0, Vx: 0 })?.parts.map((p) => p.tauMax)).toEqual([0, 0, 0]);
  });
});

describe('box girder: the neutral-axis cut runs through both webs', () => {
  // Top and bottom plates 400 × 20 across two webs 12 × 500 at x = ±150.
  const d = doc([rect('top', 400, 20, 0, 260), rect('left web', 12, 500, -150, 0), rect('right web', 12, 500, 150, 0), rect('bottom', 400, 20, 0, -260)]);
  const Ix = 2 * ((12 * 500 ** 3) / 12) + 2 * ((400 * 20 ** 3) / 12 + 8000 * 260 ** 2);
  const Q = 8000 * 260 + 2 * ((12 * 250 ** 2) / 2); // top plate + the upper halves of both webs: 2 830 000 mm³
  const V = 300_000;

  it(`τ in each web = V·Q/(Ix·2tw) = ${((V * Q) / (Ix * 24)).toFixed(3)} N/mm², said to be a whole-line cut`, () => {
    expect(Q).toBe(2_830_000);
    const r = shearStresses(d, { Vy: V, Vx: 0 });
    for (const name of ['left web', 'right web']) {
      const w = tauOf(r, name);
      expect(rel(w?.tauMax ?? 0, (V * Q) / (Ix * 24))).toBeLessThan(1e-9);
      expect(w?.cut?.how).toBe('whole line');
      expect(w?.cut?.width).toBeCloseTo(24, 9);
    }
  });
});

describe('unsymmetric Z: the general form with Ixy, exact rationals', () => {
  // As in shear-flow.test.ts: top flange x ∈ [−10, 50], y ∈ [45, 55]; web x ∈ [−10, 0], y ∈ [−45, 45];
  // bottom flange x ∈ [−70, 0], y ∈ [−55, −45]. x̄ = −85/11, ȳ = −25/11 (by hand).
  const d = doc([rect('top', 60, 10, 20, 50), rect('web', 10, 90, -5, 0), rect('bottom', 70, 10, -35, -50)]);
  const xb = -85 / 11, yb = -25 / 11;
  const rects = [{ b: 60, h: 10, x: 20, y: 50 }, { b: 10, h: 90, x: -5, y: 0 }, { b: 70, h: 10, x: -35, y: -50 }];
  const Ix = rects.reduce((s, r) => s + (r.b * r.h ** 3) / 12 + r.b * r.h * (r.y - yb) ** 2, 0);
  const Iy = rects.reduce((s, r) => s + (r.h * r.b ** 3) / 12 + r.b * r.h * (r.x - xb) ** 2, 0);
  const Ixy = rects.reduce((s, r) => s + r.b * r.h * (r.x - xb) * (r.y - yb), 0);
  // The web cut at y = ȳ: the top flange and the web above ȳ (10 wide, 45 − ȳ tall, centred at x = −5).
  const h = 45 - yb;
  const Qx = 600 * (50 - yb) + (10 * h * h) / 2;
  const Qy = 600 * (20 - xb) + 10 * h * (-5 - xb);
  const V = 100_000, Vx = 40_000;
  const q = ((V * Iy - Vx * Ixy) * Qx + (Vx * Ix - V * Ixy) * Qy) / (Ix * Iy - Ixy * Ixy);

  it('τ in the web on the cut through the centroid = q/tw, with Q of the top flange and the web above ȳ', () => {
    expect(Ixy).not.toBe(0);
    const r = shearStressAt(d, { Vy: V, Vx }, 'horizontal', yb, 1);
    expect(r?.cut.cutOff).toEqual(['top', 'web (above)']);
    expect(rel(r?.cut.Qx ?? 0, Qx)).toBeLessThan(1e-12);
    expect(rel(r?.cut.Qy ?? 0, Qy)).toBeLessThan(1e-12);
    expect(rel(r?.tau ?? 0, Math.abs(q) / 10)).toBeLessThan(1e-12);
    // τmax of the web over every cut tried is at least this one.
    expect(shearStresses(d, { Vy: V, Vx })?.parts[1]?.tauMax).toBeGreaterThanOrEqual((Math.abs(q) / 10) * (1 - 1e-12));
  });

  it('the profile along the web is a set of horizontal cuts from its foot to its head', () => {
    const web = shearStressProfile(d, { Vy: V, Vx }, 5)?.find((p) => p.label === 'web');
    expect(web?.orientation).toBe('horizontal');
    expect(web?.points).toHaveLength(5);
    expect(web?.points[0]?.at).toBeCloseTo(-45, 4);
    expect(web?.points[4]?.at).toBeCloseTo(45, 4);
  });
});

describe('flitch beam: two 2x10 and a 3/8 × 9 steel plate, transformed section', () => {
  // Plies side by side: wood x ∈ [−1.6875, −0.1875] and [0.1875, 1.6875], plate x ∈ [−0.1875, 0.1875].
  const parts = [rect('ply 1', 1.5, 9.25, -0.9375, 0, 'df-l-no2'), rect('plate', 0.375, 9, 0, 0, 'astm-a36'), rect('ply 2', 1.5, 9.25, 0.9375, 0, 'df-l-no2')];
  const bolted: JointSetting[] = [
    { parts: ['ply 1', 'plate'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } },
    { parts: ['plate', 'ply 2'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } },
  ];
  const n = 29e6 / 1.6e6; // 18.125, E_ref = the first part's (wood)
  const In = 2 * ((1.5 * 9.25 ** 3) / 12) + n * ((0.375 * 9 ** 3) / 12);
  const V = 4448.2216152605 * 5; // 5 kip in newtons (NIST SP 811: 1 lbf = 4.4482216152605 N)

  it(`Ix of the transformed section (E in psi and ksi converted) = ${In.toFixed(3)} in⁴`, () => {
    expect(rel(jointShearFlows(doc(parts, { joints: bolted }, 'in'), { Vy: V, Vx: 0 })?.section.Ix ?? 0, In)).toBeLessThan(1e-12);
  });

  it('bolted: the neutral-axis cut crosses the three plies; τ_i = n_i·V·Q_n/(I_n·Σ n·t)', () => {
    const Qn = 2 * ((1.5 * 4.625 ** 2) / 2) + n * ((0.375 * 4.5 ** 2) / 2);
    const nt = 2 * 1.5 + n * 0.375;
    const q = (V * Qn) / In; // N per inch
    const r = shearStresses(doc(parts, { joints: bolted }, 'in'), { Vy: V, Vx: 0 });
    expect(rel(tauOf(r, 'ply 1')?.tauMax ?? 0, q / nt)).toBeLessThan(1e-9);
    expect(rel(tauOf(r, 'plate')?.tauMax ?? 0, (n * q) / nt)).toBeLessThan(1e-9);
    expect(tauOf(r, 'plate')?.cut?.crossed).toEqual(['ply 1', 'plate', 'ply 2']);
  });

  it('not connected (the default, wood to steel): each ply on its own, τ = V·Q_ply/(I_n·t_ply) in reference units', () => {
    const r = shearStresses(doc(parts, {}, 'in'), { Vy: V, Vx: 0 });
    const wood = (V * ((1.5 * 4.625 ** 2) / 2)) / (In * 1.5);
    const steel = (n * V * ((0.375 * 4.5 ** 2) / 2)) / (In * 0.375);
    expect(rel(tauOf(r, 'ply 1')?.tauMax ?? 0, wood)).toBeLessThan(1e-9);
    expect(rel(tauOf(r, 'plate')?.tauMax ?? 0, steel)).toBeLessThan(1e-9);
    // Consistent with sharing V by EI: the wood ply's own 1.5·V_i/A_i with V_i = V·E·I_ply/ΣEI.
    expect(rel(wood, (1.5 * (V * ((1.5 * 9.25 ** 3) / 12)) / In) / (1.5 * 9.25))).toBeLessThan(1e-12);
  });
});

describe('round sections, exact arcs', () => {
  const circle = (id: string, diameter: number, operation: 'add' | 'subtract' = 'add'): Part => ({
    id, name: id, type: 'circle', operation, material: null, visible: true, placement: at(0, 0), diameter,
  });

  it('solid circle: τmax = 4·V/(3·A) at the neutral axis (common practice; Gere & Timoshenko), under Vy and under Vx', () => {
    const d = doc([circle('bar', 60)]);
    const A = Math.PI * 30 ** 2;
    expect(rel(tauOf(shearStresses(d, { Vy: 50_000, Vx: 0 }), 'bar')?.tauMax ?? 0, (4 * 50_000) / (3 * A))).toBeLessThan(1e-9);
    expect(rel(tauOf(shearStresses(d, { Vy: 0, Vx: 50_000 }), 'bar')?.tauMax ?? 0, (4 * 50_000) / (3 * A))).toBeLessThan(1e-9);
  });

  it('hollow circle (a void inside): V·Q/(I·t) with Q = 2/3·(ro³ − ri³), I = π/4·(ro⁴ − ri⁴), t = 2·(ro − ri), a whole-line cut', () => {
    const d = doc([circle('tube', 100), { ...circle('bore', 80, 'subtract'), cutoutRole: 'void' } as Part]);
    const ro = 50, ri = 40, V = 80_000;
    const want = (V * ((2 / 3) * (ro ** 3 - ri ** 3))) / ((Math.PI / 4) * (ro ** 4 - ri ** 4) * 2 * (ro - ri));
    const t = tauOf(shearStresses(d, { Vy: V, Vx: 0 }), 'tube');
    expect(rel(t?.tauMax ?? 0, want)).toBeLessThan(1e-9);
    expect(t?.cut?.how).toBe('whole line');
  });
});
