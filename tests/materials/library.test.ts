import { describe, expect, it } from 'vitest';
import { BUILT_IN_MATERIALS, builtInLibraryIssues, builtInMaterial } from '../../core/materials/library.ts';
import {
  densityToKgPerM3, forceToNewtons, kgPerMetreToLbPerFoot, newtonsTo, parseQuantity, pascalsTo, QuantityError, STRESS_UNITS, stressToPascals,
} from '../../core/materials/quantities.ts';
import { materialInSI, validateMaterial } from '../../core/materials/schema.ts';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('force, stress and density units (exact definitions: 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m, 1 lb = 0.45359237 kg)', () => {
  it('1 kip = 4448.2216152605 N and 1 kN = 1000 N', () => {
    expect(forceToNewtons(1, 'kip')).toBe(4448.2216152605);
    expect(forceToNewtons(2.5, 'kN')).toBe(2500);
    expect(rel(newtonsTo(4.4482216152605, 'lbf'), 1)).toBeLessThan(1e-15);
  });

  it('1 psi = 6894.757293168361 Pa (4.4482216152605 / 0.0254²); 1 ksi = 6.894757293168361 MPa', () => {
    expect(rel(stressToPascals(1, 'psi'), 6894.757293168361)).toBeLessThan(1e-15);
    expect(rel(pascalsTo(stressToPascals(29_000, 'ksi'), 'MPa'), 29_000 * 6.894757293168361)).toBeLessThan(1e-15);
  });

  it('490 lb/ft³ = 490 · 0.45359237 / 0.3048³ kg/m³ ≈ 7849.05; 1 kg/m = 0.3048/0.45359237 lb/ft', () => {
    expect(rel(densityToKgPerM3(490, 'lb/ft3'), (490 * 0.45359237) / 0.3048 ** 3)).toBeLessThan(1e-15);
    expect(densityToKgPerM3(490, 'lb/ft3')).toBeCloseTo(7849.05, 2);
    expect(rel(kgPerMetreToLbPerFoot(1), 0.3048 / 0.45359237)).toBeLessThan(1e-15);
  });

  it('parseQuantity reads a unit suffix, defaults a bare number, and names the flag in its errors', () => {
    expect(parseQuantity('29000ksi', STRESS_UNITS, 'MPa', '--E')).toEqual({ value: 29_000, unit: 'ksi' });
    expect(parseQuantity('200 GPa', STRESS_UNITS, 'MPa', '--E')).toEqual({ value: 200, unit: 'GPa' });
    expect(parseQuantity('1.5e5', STRESS_UNITS, 'psi', '--E')).toEqual({ value: 150_000, unit: 'psi' });
    expect(() => parseQuantity('29000 bar', STRESS_UNITS, 'MPa', '--E')).toThrow(QuantityError);
    expect(() => parseQuantity('abc', STRESS_UNITS, 'MPa', '--E')).toThrow(/--E: "abc" is not a number/);
  });
});

describe('built-in library (values with sources; from memory where marked)', () => {
  it('every built-in entry passes the same schema as a user material, and ids are unique', () => {
    expect(builtInLibraryIssues()).toEqual([]);
    expect(new Set(BUILT_IN_MATERIALS.map((m) => m.id)).size).toBe(BUILT_IN_MATERIALS.length);
  });

  it('every value of every entry names its source', () => {
    for (const m of BUILT_IN_MATERIALS) {
      for (const key of ['E', 'density', 'fy'] as const) expect(m.sources?.[key], `${m.id}.${key}`).toMatch(/\w/);
      expect(m.sources?.G ?? m.sources?.nu, `${m.id} G or nu`).toMatch(/\w/);
    }
  });

  it('ASTM A992: Fy = 50 ksi, E = 29,000 ksi, G = 11,200 ksi, 490 lb/ft³ (AISC Specification and Manual, common practice)', () => {
    const si = materialInSI(builtInMaterial('astm-a992')!);
    expect(rel(si.fy, 50_000 * 6894.757293168361)).toBeLessThan(1e-15);
    expect(rel(si.E, 29e6 * 6894.757293168361)).toBeLessThan(1e-15);
    expect(rel(si.G, 11.2e6 * 6894.757293168361)).toBeLessThan(1e-15);
    expect(rel(si.density, (490 * 0.45359237) / 0.3048 ** 3)).toBeLessThan(1e-15);
    expect(builtInMaterial('astm-a36')!.fy).toBe(36);
  });

  it('Douglas Fir-Larch No. 2 carries E = 1.6e6 psi and Emin = 580,000 psi, marked as NDS Supplement values from memory', () => {
    const m = builtInMaterial('df-l-no2')!;
    expect(m.E).toBe(1_600_000);
    expect(m.Emin).toBe(580_000);
    expect(m.strengthBasis).toBe('reference-bending');
    expect(m.sources?.E).toMatch(/NDS Supplement.*from memory/);
  });

  it('a material given ν instead of G gets G = E / (2(1 + ν)) (isotropic elasticity)', () => {
    const pvc = materialInSI(builtInMaterial('pvc-rigid')!);
    expect(rel(pvc.G, 3000e6 / (2 * 1.38))).toBeLessThan(1e-15);
  });
});

describe('user materials are validated with messages naming the material and the field', () => {
  const good = { id: 'my-steel', name: 'plate steel', kind: 'steel', stressUnit: 'MPa', E: 200_000, G: 77_000, density: 7850, fy: 355, strengthBasis: 'yield' };

  it('a complete material is accepted as typed', () => {
    expect(validateMaterial(good)).toEqual({ material: good, issues: [] });
  });

  it('a negative E, a missing G and ν, and an unknown stress unit are each reported', () => {
    expect(validateMaterial({ ...good, E: -1 }).issues[0]?.message).toBe('material "my-steel" field E: E must be greater than 0');
    const { G: _G, ...noG } = good;
    expect(validateMaterial(noG).issues[0]?.message).toMatch(/material "my-steel".*give G or nu/);
    expect(validateMaterial({ ...good, stressUnit: 'bar' }).issues[0]?.message).toMatch(/field stressUnit: stressUnit must be one of Pa, kPa, MPa, GPa, psi, ksi/);
  });
});
