/**
 * The member verdict covers every criterion it names (issue 13, "what was seen": stresses above
 * yield were shown only in small grey text while the red/green verdict covered deflection only).
 *
 * Closed forms (Gere & Timoshenko, Mechanics of Materials): simply supported span under a
 * uniform load w — M = wL²/8 at midspan, δ = 5wL⁴/(384EI), V = wL/2 at the supports; bending
 * stress σ = M·c/I; shear stress at the neutral axis of a rectangle τ = V·Q/(I·t) = 1.5·V/A.
 * Flitch beam EI by the transformed section (NDS and the AISC Manual describe the method:
 * each material's width scaled by its modular ratio, then I of the transformed section).
 */
import { describe, expect, it } from 'vitest';
import { materialInSI } from '../../core/materials/schema.ts';
import { BUILT_IN_MATERIALS } from '../../core/materials/library.ts';
import { compositeProperties } from '../../core/materials/composite.ts';
import { sectionMemberCheck } from '../../core/member/section-member.ts';
import { mat, rect, rel } from '../materials/helpers.ts';

/** lb·in² → N·m² (1 lbf = 4.4482216152605 N, 1 in = 0.0254 m, both exact by definition). */
const convertEI = (lbIn2: number): number => lbIn2 * 4.4482216152605 * 0.0254 ** 2;

const steel = mat('steel', 200e9, 355e6, 7850);
const bar = [{ region: rect(0, 0, 100, 200), material: steel, label: 'bar' }];
// 100 × 200 mm bar: I = b h³/12, c = 0.1 m, A = 0.02 m² (exact arithmetic).
const I = (0.1 * 0.2 ** 3) / 12, c = 0.1, A = 0.02, L = 6, EI = 200e9 * I;

describe('member verdict: bending stress against a limit, in every material', () => {
  it('a bar at 182 % of fy (σ = M·c/I, M = wL²/8) FAILS on bending stress, which is named as governing with its ratio', () => {
    const w = (1.82 * 355e6 * I / c) * 8 / (L * L);
    const r = sectionMemberCheck(bar, 'mm', { span: 6000, support: 'simple', points: [], uniform: w, selfWeight: false, limitRatio: 60 });
    if (!r.ok) throw new Error(r.issues.join('; '));
    const v = r.result.verdict;
    expect(v.passes).toBe(false);
    expect(v.governing?.kind).toBe('bending');
    expect(rel(v.governing!.ratio!, 1.82)).toBeLessThan(1e-9);
    expect(v.governing!.limitBasis).toMatch(/1 × yield strength fy \(default factor\)/);
    expect(v.summary).toMatch(/^FAILS: bending stress in steel governs at 182 %/);
  });

  it('a user factor of 0.6 makes the limit 0.6 fy (ratio = σ / (0.6 fy)); a typed allowable wins over the factor', () => {
    const w = (0.5 * 355e6 * I / c) * 8 / (L * L); // σ = 0.5 fy
    const base = { span: 6000, support: 'simple' as const, points: [], uniform: w, selfWeight: false };
    const factored = sectionMemberCheck(bar, 'mm', { ...base, stressLimits: { factor: 0.6 } });
    const typed = sectionMemberCheck(bar, 'mm', { ...base, stressLimits: { factor: 0.6, allowable: new Map([['steel', 150e6]]) } });
    if (!factored.ok || !typed.ok) throw new Error('unexpected issues');
    const bend = (x: typeof factored): number => x.ok ? x.result.verdict.criteria.find((k) => k.kind === 'bending')!.ratio! : NaN;
    expect(rel(bend(factored), 0.5 / 0.6)).toBeLessThan(1e-9);
    expect(rel(bend(typed), (0.5 * 355e6) / 150e6)).toBeLessThan(1e-9);
    expect(typed.ok && typed.result.verdict.passes).toBe(false);
  });

  it('a material without a strength is "not checked" with the reason, never a silent pass', () => {
    const noStrength = [{ region: rect(0, 0, 100, 200), material: { ...steel, fy: NaN } }];
    const r = sectionMemberCheck(noStrength, 'mm', { span: 6000, support: 'simple', points: [], uniform: 1000, selfWeight: false, limitRatio: 240 });
    if (!r.ok) throw new Error('unexpected');
    const bending = r.result.verdict.criteria.find((k) => k.kind === 'bending')!;
    expect(bending.status).toBe('not checked');
    expect(bending.reason).toMatch(/no strength/);
    expect(r.result.verdict.summary).toMatch(/not checked: bending stress/);
  });
});

describe('member verdict: deflection under live and under total load, each against its own limit', () => {
  it('live L/360 and total L/240 judged separately with δ = 5wL⁴/(384EI) (IBC Table 1604.3 ratios, common practice)', () => {
    // Dead 2 kN/m, live 6 kN/m: δ_total = 5·8000·L⁴/(384 EI), δ_live = 5·6000·L⁴/(384 EI).
    const r = sectionMemberCheck(bar, 'mm', { span: 6000, support: 'simple', points: [], uniform: 2000, live: { uniform: 6000, points: [] }, selfWeight: false, limitRatio: 240, liveLimitRatio: 360 });
    if (!r.ok) throw new Error('unexpected');
    const total = r.result.verdict.criteria.find((k) => k.kind === 'deflection-total')!;
    const live = r.result.verdict.criteria.find((k) => k.kind === 'deflection-live')!;
    expect(rel(total.demand!, (5 * 8000 * L ** 4) / (384 * EI))).toBeLessThan(1e-12);
    expect(rel(live.demand!, (5 * 6000 * L ** 4) / (384 * EI))).toBeLessThan(1e-12);
    expect(rel(total.ratio!, ((5 * 8000 * L ** 4) / (384 * EI)) / (L / 240))).toBeLessThan(1e-12);
    expect(rel(live.ratio!, ((5 * 6000 * L ** 4) / (384 * EI)) / (L / 360))).toBeLessThan(1e-12);
    expect(rel(r.result.momentMax, (8000 * L * L) / 8)).toBeLessThan(1e-12);
  });

  it('no live load given: the live criterion is "not checked (no live load given)", not passed', () => {
    const r = sectionMemberCheck(bar, 'mm', { span: 6000, support: 'simple', points: [], uniform: 2000, selfWeight: false, limitRatio: 240, liveLimitRatio: 360 });
    if (!r.ok) throw new Error('unexpected');
    const live = r.result.verdict.criteria.find((k) => k.kind === 'deflection-live')!;
    expect(live.status).toBe('not checked');
    expect(live.reason).toBe('no live load given');
  });
});

describe('member verdict: shear stress at the neutral axis', () => {
  it('a rectangle: τ = V·Q/(I·t) = 1.5·V/A with V = wL/2; limit 0.6 fy (AISC 360-16 §G2.1, from memory)', () => {
    const w = 300_000;
    const r = sectionMemberCheck(bar, 'mm', { span: 6000, support: 'simple', points: [], uniform: w, selfWeight: false });
    if (!r.ok) throw new Error('unexpected');
    const tau = (1.5 * (w * L) / 2) / A;
    expect(rel(r.result.shearStresses[0]!.tau, tau)).toBeLessThan(1e-9);
    const shear = r.result.verdict.criteria.find((k) => k.kind === 'shear')!;
    expect(rel(shear.ratio!, tau / (0.6 * 355e6))).toBeLessThan(1e-9);
    expect(shear.limitBasis).toMatch(/0\.6 fy/);
  });

  it('a point load P at midspan: |V| = P/2 on either side (the shear diagram jumps by P at the load)', () => {
    const r = sectionMemberCheck(bar, 'mm', { span: 6000, support: 'simple', points: [{ P: 50_000, a: 3000 }], uniform: 0, selfWeight: false });
    if (!r.ok) throw new Error('unexpected');
    expect(rel(Math.abs(r.result.shearMax.value), 25_000)).toBeLessThan(1e-12);
  });
});

describe('flitch beam: EI by the transformed section', () => {
  it('two 2x10 Douglas Fir-Larch No. 2 (1.5 × 9.25 in) and a 3/8 × 9 in A36 plate: EI = E_w·2·b h³/12 + E_s·t d³/12', () => {
    // Hand calculation (NDS Supplement Table 1A dressed size 1.5 × 9.25 in; E_w = 1,600,000 psi
    // NDS Supplement Table 4A, from memory; E_s = 29,000 ksi, AISC, from memory):
    //   I_wood  = 2 · 1.5 · 9.25³ / 12 = 197.8633 in⁴
    //   I_plate = 0.375 · 9³ / 12      =  22.78125 in⁴   (geometric Ix = 220.64 in⁴)
    //   n = 29,000,000 / 1,600,000 = 18.125; I_transformed (wood) = 197.8633 + 18.125 · 22.78125 = 610.7735 in⁴
    //   EI = 1.6e6 · 610.78 = 9.7725e8 lb·in²
    const lib = (id: string) => materialInSI(BUILT_IN_MATERIALS.find((m) => m.id === id)!);
    const wood = lib('df-l-no2'), plate = lib('astm-a36');
    const pieces = [
      { region: rect(-0.1875 - 1.5, -4.625, -0.1875, 4.625), material: wood, label: 'left 2x10' },
      { region: rect(0.1875, -4.625, 0.1875 + 1.5, 4.625), material: wood, label: 'right 2x10' },
      { region: rect(-0.1875, -4.5, 0.1875, 4.5), material: plate, label: 'plate' },
    ];
    const cp = compositeProperties(pieces, 'in', wood.E);
    const iWood = (2 * 1.5 * 9.25 ** 3) / 12, iPlate = (0.375 * 9 ** 3) / 12;
    expect(rel(cp.transformedIx, iWood + (29e6 / 1.6e6) * iPlate)).toBeLessThan(1e-9);
    expect(rel(cp.transformedIx, 610.7735)).toBeLessThan(1e-6);
    expect(rel(cp.EIx, convertEI(1.6e6 * 610.7735))).toBeLessThan(1e-6);
  });
});
