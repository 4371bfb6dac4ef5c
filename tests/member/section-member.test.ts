import { describe, expect, it } from 'vitest';
import { sectionMemberCheck } from '../../core/member/section-member.ts';
import { plasticCapacity } from '../../core/materials/composite.ts';
import { averageShear } from '../../core/stress/normal-stress.ts';
import { mat, rect, rel } from '../materials/helpers.ts';

const steel = mat('steel', 200e9, 355e6, 7850);

describe('member check of a section (core/member/section-member.ts)', () => {
  it('self-weight of a 100 × 200 mm steel bar, g·ρ·A = 9.80665 · 7850 · 0.02 N/m, deflects 5 w L⁴/(384 EI) over a 6 m simple span', () => {
    const r = sectionMemberCheck([{ region: rect(0, 0, 100, 200), material: steel }], 'mm', { span: 6000, support: 'simple', points: [], uniform: 0, selfWeight: true });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const w = 9.80665 * 7850 * 0.02;
    const EI = 200e9 * (0.1 * 0.2 ** 3) / 12;
    expect(rel(r.selfWeight!, w)).toBeLessThan(1e-12);
    expect(rel(r.result.deflectionMax, (5 * w * 6 ** 4) / (384 * EI))).toBeLessThan(1e-12);
    // bending stress M c / I with M = w L²/8, c = 0.1 m (Gere & Timoshenko)
    expect(rel(r.result.stresses[0]!.maxTension, ((w * 36) / 8) * 0.1 / ((0.1 * 0.2 ** 3) / 12))).toBeLessThan(1e-12);
    expect(r.result.stresses[0]!.maxTensionAt.y).toBe(0); // bottom fibre, y = 0 mm
  });

  it('span/deflection and the pass/exceed verdict follow the chosen ratio (IBC Table 1604.3 ratios, common practice)', () => {
    const base = { span: 6000, support: 'simple' as const, points: [{ P: 20_000, a: 3000 }], uniform: 0, selfWeight: false };
    const region = rect(0, 0, 120, 200); // I = 8e7 mm⁴: Δ = 5.625 mm (analytic refs beam_deflection)
    const m = mat('steel', 200e9, 355e6, 7850);
    const at360 = sectionMemberCheck([{ region, material: m }], 'mm', { ...base, limitRatio: 360 });
    const at1200 = sectionMemberCheck([{ region, material: m }], 'mm', { ...base, limitRatio: 1200 });
    if (!at360.ok || !at1200.ok) throw new Error('unexpected issues');
    expect(rel(at360.result.spanOverDeflection, 6000 / 5.625)).toBeLessThan(1e-12);
    expect(at360.result.limit!.verdict).toBe('within limit'); // 5.625 ≤ 16.67 mm
    expect(at1200.result.limit!.verdict).toBe('exceeds limit'); // 5.625 > 5 mm
    expect(at360.result.cautions.join(' ')).toMatch(/not as code compliance/);
  });

  it('bad input comes back as plain issues, not an exception', () => {
    const r = sectionMemberCheck([{ region: rect(0, 0, 10, 10), material: steel }], 'mm', { span: 100, support: 'simple', points: [{ P: 1, a: 150 }], uniform: 0, selfWeight: false });
    expect(r).toEqual({ ok: false, issues: ['point load 1: position 150 mm is outside the span 0…100 mm'] });
  });
});

describe('plastic moment at any angle and average shear', () => {
  it('square a = 100 with the PNA at 30°: Mp = fy·a³(cos t/4 + sin²t/(12 cos t)) (docs/methods.md §5 square_axis_30deg, derived)', () => {
    const t = Math.PI / 6;
    const p = plasticCapacity([{ region: rect(-50, -50, 50, 50), material: steel }], 'mm', 30);
    const Z = 100 ** 3 * (Math.cos(t) / 4 + Math.sin(t) ** 2 / (12 * Math.cos(t))); // mm³
    expect(rel(p.Mp, 355e6 * Z * 1e-9)).toBeLessThan(1e-10);
    expect(Math.abs(p.d)).toBeLessThan(1e-9);
  });

  it('average shear is V/A in each direction', () => {
    expect(averageShear({ N: 0, Mx: 0, My: 0, Vx: 3000, Vy: -12_000 }, 2000)).toEqual({ tauX: 1.5, tauY: -6 });
  });
});
