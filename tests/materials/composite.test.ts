import { describe, expect, it } from 'vitest';
import { compositeProperties, firstYield, plasticCapacity } from '../../core/materials/composite.ts';
import { transformedWidths } from '../../core/materials/widths.ts';
import { readRefs, refValue } from '../member/refs.ts';
import { mat, rect, rel } from './helpers.ts';

const strip = readRefs(new URL('../fixtures/bimaterial-strip.csv', import.meta.url));
const MPa = 1e6;
const steel = mat('steel', 200_000 * MPa, 355 * MPa, 7850);
const aluminium = mat('aluminium', 70_000 * MPa, 250 * MPa, 2700);
const stripPieces = [
  { region: rect(0, 0, 50, 10), material: steel, label: 'steel bar' },
  { region: rect(0, 10, 50, 30), material: aluminium, label: 'aluminium bar' },
];

describe('bimaterial strip (methods note §5, §6; hand arithmetic by the transformed-section method, Gere & Timoshenko)', () => {
  const c = compositeProperties(stripPieces, 'mm');

  it('EA = 200000·500 + 70000·1000 N = 1.7e8 N', () => {
    expect(rel(c.EA, 1.7e8)).toBeLessThan(1e-12);
    expect(rel(c.EA, refValue(strip, 'bimaterial_strip', 'EA_N'))).toBeLessThan(1e-12);
  });

  it('E-weighted centroid y_E = (1e8·5 + 7e7·20)/1.7e8 = 190/17 mm ≈ 11.1765', () => {
    expect(rel(c.cy, 190 / 17)).toBeLessThan(1e-12);
    expect(Math.abs(c.cy - refValue(strip, 'bimaterial_strip', 'yE_mm'))).toBeLessThan(5e-5);
    expect(rel(c.cx, 25)).toBeLessThan(1e-12);
  });

  it('EIx = Σ E_i[b h³/12 + A (yc − y_E)²] ≈ 1.24314e10 N·mm² (reported in N·m²)', () => {
    const yE = 190 / 17;
    const hand = 200_000 * (50 * 10 ** 3 / 12 + 500 * (5 - yE) ** 2) + 70_000 * (50 * 20 ** 3 / 12 + 1000 * (20 - yE) ** 2); // N·mm²
    expect(rel(c.EIx, hand * 1e-6)).toBeLessThan(1e-12);
    expect(rel(hand, refValue(strip, 'bimaterial_strip', 'EIx_Nmm2'))).toBeLessThan(5e-6);
    expect(Math.abs(c.EIxy)).toBeLessThan(1e-9 * c.EIx);
  });

  it('EIy = Σ E_i h b³/12 (both bars centred on x = 25)', () => {
    const hand = (200_000 * 10 + 70_000 * 20) * 50 ** 3 / 12; // N·mm²
    expect(rel(c.EIy, hand * 1e-6)).toBeLessThan(1e-12);
  });

  it('mass per length = 7850·500e−6 + 2700·1000e−6 = 6.625 kg/m; weight = g·m', () => {
    expect(rel(c.massPerLength, refValue(strip, 'bimaterial_strip', 'mass_kg_per_m'))).toBeLessThan(1e-12);
    expect(rel(c.weightPerLength, 6.625 * 9.80665)).toBeLessThan(1e-12);
    // 1 lb = 0.45359237 kg, 1 ft = 0.3048 m (exact definitions)
    expect(rel(c.weightPerLengthLbPerFt, (6.625 * 0.3048) / 0.45359237)).toBeLessThan(1e-12);
  });

  it('modular ratios with E_ref = steel (first piece): n = 1 and 0.35; A_tr = 500 + 350 mm²', () => {
    expect(c.eRefFrom).toBe('first piece');
    expect(c.pieces.map((p) => p.n)).toEqual([1, 0.35]);
    expect(rel(c.transformedArea, 850)).toBeLessThan(1e-12);
  });

  it('an explicit E_ref = aluminium gives n = 200/70 for steel and A_tr = EA / E_ref', () => {
    const a = compositeProperties(stripPieces, 'mm', 70_000 * MPa);
    expect(rel(a.pieces[0]!.n, 200 / 70)).toBeLessThan(1e-15);
    expect(rel(a.transformedArea, 1.7e8 / 70_000)).toBeLessThan(1e-12);
    expect(rel(a.EIx, c.EIx)).toBeLessThan(1e-13); // EI does not depend on E_ref
  });

  it('per-material modulus EIx/(E_i c_i): steel c = y_E, aluminium c = 30 − y_E', () => {
    const yE = 190 / 17;
    const EIxNmm2 = c.EIx * 1e6;
    expect(rel(c.pieces[0]!.Sx, EIxNmm2 / (200_000 * yE))).toBeLessThan(1e-12);
    expect(rel(c.pieces[1]!.Sx, EIxNmm2 / (70_000 * (30 - yE)))).toBeLessThan(1e-12);
    // first yield of each material: fy_i times its modulus (N·mm → N·m)
    expect(rel(c.pieces[1]!.firstYieldMx, (250 * EIxNmm2) / (70_000 * (30 - yE)) * 1e-3)).toBeLessThan(1e-12);
  });

  it('free-bending first yield equals the restrained value for a section with EIxy = 0 (identity)', () => {
    const fy = firstYield(c, stripPieces, 'x');
    const restrained = Math.min(...c.pieces.map((p) => p.firstYieldMx));
    expect(rel(fy.moment, restrained)).toBeLessThan(1e-12);
  });

  it('plastic neutral axis by yield-force balance at y = 12.9 mm and Mp = 3 282 375 N·mm', () => {
    const p = plasticCapacity(stripPieces, 'mm', 0);
    expect(Math.abs(p.d - refValue(strip, 'bimaterial_strip', 'pna_y_mm'))).toBeLessThan(1e-9);
    expect(rel(p.Mp, refValue(strip, 'bimaterial_strip', 'Mp_Nmm') * 1e-3)).toBeLessThan(1e-10);
    expect(p.cautions).toEqual([]);
  });

  it('Mp about y: PNA at x = 25 and Mp = (355·500 + 250·1000)·50/4 N·mm (each bar b/4 lever, exact)', () => {
    const p = plasticCapacity(stripPieces, 'mm', -90);
    expect(Math.abs(p.d - 25)).toBeLessThan(1e-9);
    expect(rel(p.Mp, ((355 * 500 + 250 * 1000) * 50) / 4 * 1e-3)).toBeLessThan(1e-10);
  });

  it('a wood material (reference strength) makes the plastic moment a comparison figure, said plainly', () => {
    const wood = mat('wood', 11_000 * MPa, 6 * MPa, 500, 'reference-bending');
    const p = plasticCapacity([{ region: rect(0, 0, 40, 90), material: wood }], 'mm', 0);
    expect(p.cautions[0]).toMatch(/no yield plateau/);
    expect(rel(p.Mp, (6 * 40 * 90 ** 2) / 4 * 1e-3)).toBeLessThan(1e-10); // fy·b h²/4
  });
});

describe('mezzanine flitch beam: two 2×10 Douglas Fir-Larch No. 2 plies with a 3/8 × 9 in steel plate (hand transformed section)', () => {
  // Dressed 2×10: 1.5 × 9.25 in (NDS Supplement Table 1A). E_wood = 1.6e6 psi, DF-L No. 2
  // (NDS Supplement Table 4A, from memory); E_steel = 29e6 psi (AISC, common practice).
  // Plies at x ∈ [−1.6875, −0.1875] and [0.1875, 1.6875]; plate x ∈ [−0.1875, 0.1875]; all centred on y = 0.
  const psi = 4.4482216152605 / 0.0254 ** 2; // Pa per psi (exact definitions)
  const wood = mat('df-l-no2', 1.6e6 * psi, 900 * psi, 34 * 0.45359237 / 0.3048 ** 3, 'reference-bending');
  const plateSteel = mat('a36', 29e6 * psi, 36_000 * psi, 490 * 0.45359237 / 0.3048 ** 3);
  const pieces = [
    { region: rect(-1.6875, -4.625, -0.1875, 4.625), material: wood, label: 'ply 1' },
    { region: rect(-0.1875, -4.5, 0.1875, 4.5), material: plateSteel, label: 'plate' },
    { region: rect(0.1875, -4.625, 1.6875, 4.625), material: wood, label: 'ply 2' },
  ];
  const c = compositeProperties(pieces, 'in');

  // Step 1: modular ratio with the wood as reference: n = 29e6 / 1.6e6 = 18.125.
  const n = 29e6 / 1.6e6;
  // Step 2: wood I = 2 · 1.5 · 9.25³/12 = 197.8632813 in⁴ (centroid at mid-depth by symmetry).
  const Iwood = (2 * 1.5 * 9.25 ** 3) / 12;
  // Step 3: plate I = 0.375 · 9³/12 = 22.78125 in⁴; transformed: n · 22.78125 = 412.9101563 in⁴.
  const Iplate = (0.375 * 9 ** 3) / 12;
  // Step 4: I_tr = 197.8632813 + 412.9101563 = 610.7734375 in⁴; EI = 1.6e6 · I_tr lb·in².
  const Itr = Iwood + n * Iplate;

  it('step by step: n = 18.125, I_tr = 610.7734375 in⁴ (wood reference), EI = 9.772375e8 lb·in²', () => {
    expect(n).toBe(18.125);
    expect(Itr).toBeCloseTo(610.7734375, 10);
    expect(rel(c.transformedIx, Itr)).toBeLessThan(1e-12);
    const EIlbin2 = 1.6e6 * Itr;
    expect(EIlbin2).toBeCloseTo(9.772375e8, 0);
    // lb·in² → N·m²: × 4.4482216152605 N/lbf × 0.0254² m²/in²
    expect(rel(c.EIx, EIlbin2 * 4.4482216152605 * 0.0254 ** 2)).toBeLessThan(1e-12);
    expect(Math.abs(c.cy)).toBeLessThan(1e-12);
  });

  it('step 5: elastic moduli per material, wood I_tr/4.625 = 132.0591 in³ and steel I_tr/(n·4.5) = 7.48838 in³', () => {
    expect(rel(c.pieces[0]!.Sx, Itr / 4.625)).toBeLessThan(1e-12);
    expect(rel(c.pieces[1]!.Sx, Itr / (n * 4.5))).toBeLessThan(1e-12);
    expect(Itr / 4.625).toBeCloseTo(132.0591, 3);
    expect(Itr / (n * 4.5)).toBeCloseTo(7.48838, 4);
  });

  it('step 6: the plate reaches 36 ksi at M = 36 000 · 7.48838 = 269 582 lbf·in (reported in N·m)', () => {
    const M = 36_000 * (Itr / (n * 4.5)); // lbf·in
    expect(rel(c.pieces[1]!.firstYieldMx, M * 4.4482216152605 * 0.0254)).toBeLessThan(1e-12);
  });

  it('step 7: weight = (34 · 27.75 + 490 · 3.375)/144 = 18.036 lb/ft', () => {
    const lbPerFt = (34 * 2 * 1.5 * 9.25 + 490 * 0.375 * 9) / 144;
    expect(rel(c.weightPerLengthLbPerFt, lbPerFt)).toBeLessThan(1e-12);
    expect(lbPerFt).toBeCloseTo(18.036, 3);
  });

  it('step 8: transformed width at mid-depth 3.0 + 18.125 · 0.375 in; above the plate only the wood, 3.0 in', () => {
    const [mid, above] = transformedWidths(pieces, wood.E, [0, 4.56]);
    expect(rel(mid!.transformedWidth, 3 + n * 0.375)).toBeLessThan(1e-12);
    expect(rel(mid!.width, 3.375)).toBeLessThan(1e-12);
    expect(rel(above!.transformedWidth, 3)).toBeLessThan(1e-12);
  });

  it('at the plate top edge (a vertex height) the width is the mean of just above and just below', () => {
    const [edge] = transformedWidths(pieces, wood.E, [4.5]);
    expect(rel(edge!.transformedWidth, 3 + (n * 0.375) / 2)).toBeLessThan(1e-8);
  });
});

describe('common practice: a dressed 2×6 stood on edge vs laid flat', () => {
  it('EI on edge / EI flat = (d/b)² = (5.5/1.5)² ≈ 13.44 (NDS Supplement Table 1A dressed size 1.5 × 5.5 in)', () => {
    const wood = mat('df-l', 1.1e10, 6e6, 500);
    const edge = compositeProperties([{ region: rect(0, 0, 1.5, 5.5), material: wood }], 'in');
    const flat = compositeProperties([{ region: rect(0, 0, 5.5, 1.5), material: wood }], 'in');
    expect(rel(edge.EIx / flat.EIx, (5.5 / 1.5) ** 2)).toBeLessThan(1e-12);
    expect(edge.EIx / flat.EIx).toBeGreaterThan(13);
    expect(edge.EIx / flat.EIx).toBeLessThan(14);
  });
});
