/**
 * Compare, timber (issue 13, "what was seen"): over a 165.35 in span under w = 0.3 kip/ft the
 * "lightest meeting targets" went to a 2-ply 2x12 whose bending stress is 1.35 ksi, 150 % of its
 * reference Fb of 900 psi, and the flitch beam (two 2x10 and a 3/8 × 9 in plate) that does pass
 * was not chosen; the flitch beam was ranked by its geometric Ix beside all-timber options.
 *
 * Sources: dressed sizes 1.5 × 11.25 and 1.5 × 9.25 in (NDS Supplement 2018, Table 1A);
 * Douglas Fir-Larch No. 2: E = 1,600,000 psi, Fb = 900 psi (NDS Supplement Table 4A, from
 * memory); A36 steel E = 29,000 ksi, Fy = 36 ksi (AISC, from memory). Closed forms (Gere &
 * Timoshenko): M = wL²/8, σ = M/S with S = b·h²/6 for a rectangle, δ = 5wL⁴/(384·EI).
 *
 * Hand calculation, 2-ply 2x12 (b = 3 in, h = 11.25 in):
 *   w = 0.3 kip/ft = 25 lbf/in;  M = 25 · 165.35² / 8 = 85,440.2 lbf·in
 *   S = 3 · 11.25² / 6 = 63.28125 in³;  σ = M/S = 1350.2 psi = 150.0 % of Fb 900 psi → fails.
 * Flitch beam: EI = 1.6e6 · 2 · 1.5 · 9.25³/12 + 29e6 · 0.375 · 9³/12 = 9.7724e8 lbf·in²
 *   (transformed-section method); wood stress M·E_w·c/EI = 85,440 · 1.6e6 · 4.625 / 9.7724e8 = 647 psi (72 %),
 *   steel 85,440 · 29e6 · 4.5 / 9.7724e8 = 11,410 psi (32 % of 36 ksi) → passes;
 *   δ = 5 · 25 · 165.35⁴ / (384 · 9.7724e8) = 0.249 in ≤ L/360 = 0.459 in.
 */
import { describe, expect, it } from 'vitest';
import { compareDocuments, comparisonCsv, lightestMeeting, stiffnessRanking } from '../../core/compare/index.ts';
import type { Part, SectionDocument } from '../../core/document/index.ts';
import { builtInMaterial } from '../../core/materials/library.ts';

const LBF = 4.4482216152605; // N per lbf (exact by definition)
const IN = 0.0254; // m per inch (exact)
const w = (25 * LBF) / IN; // 25 lbf/in in N/m
const span = 165.35;

function plate(id: string, x0: number, width: number, height: number, material: string): Part {
  return { id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: { x: x0 + width / 2, y: 0, rotationDeg: 0, mirror: false }, width, height };
}

function doc(name: string, parts: Part[]): SectionDocument {
  return { format: 'sectionsmith-section', version: 1, name, unit: 'in', defaultMaterial: null, materials: [builtInMaterial('df-l-no2')!, builtInMaterial('astm-a36')!], parts };
}

const twoPly2x12 = doc('2-ply 2x12', [plate('ply 1', 0, 1.5, 11.25, 'df-l-no2'), plate('ply 2', 1.5, 1.5, 11.25, 'df-l-no2')]);
const twoPly2x10 = doc('2-ply 2x10', [plate('ply 1', 0, 1.5, 9.25, 'df-l-no2'), plate('ply 2', 1.5, 1.5, 9.25, 'df-l-no2')]);
const flitch = doc('flitch 2x10 + 3/8 x 9 plate', [plate('2x10 left', 0, 1.5, 9.25, 'df-l-no2'), plate('plate', 1.5, 0.375, 9, 'astm-a36'), plate('2x10 right', 1.875, 1.5, 9.25, 'df-l-no2')]);

describe('compare with a stress target: the overstressed 2-ply 2x12 is rejected, the flitch beam picked', () => {
  const c = compareDocuments([twoPly2x12, twoPly2x10, flitch], { beam: { span, load: w } });
  const pick = lightestMeeting(c, { deflectionRatio: 360, stressWithinLimit: true });

  it('the 2-ply 2x12 bending stress is M/S = 1350 psi, 150 % of Fb 900 psi, and it fails the stress target saying so', () => {
    const a = c.alternatives.find((x) => x.name === '2-ply 2x12')!;
    const M = (25 * span ** 2) / 8, S = (3 * 11.25 ** 2) / 6;
    expect(Math.abs(a.stress[0]!.ratio! / (M / S / 900) - 1)).toBeLessThan(1e-9);
    expect(a.values.stressUse! / 1.5).toBeCloseTo(1, 3);
    const verdict = pick.verdicts.find((v) => v.name === '2-ply 2x12')!;
    expect(verdict.meets).toBe(false);
    expect(verdict.failures.map((f) => f.target)).toEqual(['stress']);
    expect(verdict.failures[0]!.message).toMatch(/bending stress in Douglas Fir-Larch No\. 2 .* is 150 % of its limit .*over by 50\.0\d %/);
  });

  it('the flitch beam is the lightest meeting every target, although the 2-ply 2x12 weighs less', () => {
    expect(pick.choice?.name).toBe('flitch 2x10 + 3/8 x 9 plate');
    expect(pick.by).toBe('weight');
    const weight = (n: string): number => c.alternatives.find((x) => x.name === n)!.values.weight!;
    expect(weight('2-ply 2x12')).toBeLessThan(weight('flitch 2x10 + 3/8 x 9 plate'));
  });

  it('materials differ, so stiffness is ranked by EIx: the flitch beam (EI = 9.7724e8 lbf·in²) ranks first', () => {
    expect(c.stiffnessColumn).toBe('EIx');
    const ranking = stiffnessRanking(c).map((a) => a.name);
    expect(ranking[0]).toBe('flitch 2x10 + 3/8 x 9 plate');
    const EI = 1.6e6 * (2 * 1.5 * 9.25 ** 3) / 12 + 29e6 * (0.375 * 9 ** 3) / 12; // lbf·in²
    const fl = c.alternatives.find((x) => x.name === 'flitch 2x10 + 3/8 x 9 plate')!;
    expect(Math.abs(fl.values.EIx! / (EI * LBF * IN * IN) - 1)).toBeLessThan(1e-9);
    // Geometric Ix alone (220.6 in⁴) would rank it below the 2-ply 2x12 (356.0 in⁴).
    expect(fl.values.Ix!).toBeCloseTo(2 * 1.5 * 9.25 ** 3 / 12 + 0.375 * 9 ** 3 / 12, 9);
  });

  it('the CSV says what each column is ("Sx (smaller fibre)"), the stiffness rank, and each failing target with its margin', () => {
    const csv = comparisonCsv(c, pick);
    expect(csv).toContain('Sx (smaller fibre) [in^3]');
    expect(csv).toContain('stiffness rank (by EIx)');
    expect(csv).toMatch(/2-ply 2x12,.*,no,bending stress in Douglas Fir-Larch No\. 2 .*over by 50\.0\d %/);
    expect(csv).toMatch(/flitch 2x10 \+ 3\/8 x 9 plate,.*,yes \(lightest\)/);
  });

  it('a deflection that is not a number never meets a deflection target', () => {
    const broken = { ...c, alternatives: c.alternatives.map((a) => ({ ...a, values: { ...a.values, deflection: Number.NaN } })) };
    const p = lightestMeeting(broken, { deflectionRatio: 360 });
    expect(p.choice).toBeNull();
    expect(p.verdicts.every((v) => v.failures.some((f) => f.target === 'deflection'))).toBe(true);
  });

  it('minimums on Ix, Sx, Zx, EIx and a maximum depth fail with the amount', () => {
    const p = lightestMeeting(c, { minSx: 50, maxDepth: 10 });
    const v12 = p.verdicts.find((v) => v.name === '2-ply 2x12')!;
    expect(v12.failures.map((f) => f.message)).toEqual(['depth 11.25 in exceeds 10 in by 12.5 %']);
    const v10 = p.verdicts.find((v) => v.name === '2-ply 2x10')!;
    // Sx = 3 · 9.25² / 6 = 42.78125 in³, 14.44 % below 50.
    expect(v10.failures[0]!.message).toBe('Sx (smaller fibre) 42.78 in³ is below the minimum 50 in³ by 14.44 %');
  });
});
