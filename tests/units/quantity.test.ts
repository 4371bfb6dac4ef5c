// core/units/quantity.ts: the one reader of typed quantities and the factors of every unit.
//
// Conversion factors are checked against NIST Special Publication 811 (2008 edition), "Guide for
// the Use of the International System of Units (SI)", Appendix B.8, "Factors for units listed
// alphabetically" (7 significant figures there; the values below are quoted from memory of that
// table, so each is also confirmed by the exact definition it rounds: 1 in = 0.0254 m,
// 1 lb = 0.45359237 kg, g_n = 9.80665 m/s²).
import { describe, expect, it } from 'vitest';
import { convertQuantity, readQuantity, toSI, unitFactor, unitSystem, systemUnitsValid, zeroWithinRounding, KINDS, QUANTITY_KINDS, type QuantityKind } from '../../core/units/index.ts';

/** [unit, kind, NIST SP 811 B.8 factor to SI (7 figures), exact definition]. */
const NIST_B8: readonly (readonly [string, QuantityKind, number, number])[] = [
  ['in', 'length', 2.54e-2, 0.0254],
  ['ft', 'length', 3.048e-1, 0.3048],
  ['lbf', 'force', 4.448222, 0.45359237 * 9.80665],
  ['kip', 'force', 4.448222e3, 1000 * 0.45359237 * 9.80665],
  ['psi', 'stress', 6.894757e3, (0.45359237 * 9.80665) / 0.0254 ** 2],
  ['ksi', 'stress', 6.894757e6, (1000 * 0.45359237 * 9.80665) / 0.0254 ** 2],
  ['psf', 'stress', 4.788026e1, (0.45359237 * 9.80665) / 0.3048 ** 2],
  ['lbf·in', 'moment', 1.129848e-1, 0.45359237 * 9.80665 * 0.0254],
  ['lbf·ft', 'moment', 1.355818, 0.45359237 * 9.80665 * 0.3048],
  ['kip·ft', 'moment', 1.355818e3, 1000 * 0.45359237 * 9.80665 * 0.3048],
  ['lbf/ft', 'lineLoad', 1.459390e1, (0.45359237 * 9.80665) / 0.3048],
  ['lbf/in', 'lineLoad', 1.751268e2, (0.45359237 * 9.80665) / 0.0254],
  ['lb/ft³', 'density', 1.601846e1, 0.45359237 / 0.3048 ** 3],
  ['lb/ft', 'massPerLength', 1.488164, 0.45359237 / 0.3048],
  ['lbf·in²', 'flexuralStiffness', 2.869815e-3, 0.45359237 * 9.80665 * 0.0254 ** 2],
];

describe('factors against NIST SP 811 Appendix B.8', () => {
  it.each(NIST_B8)('1 %s (%s) is %d in SI to the 7 figures of the table, and equals its definition to 2 ulp', (unit, kind, nist, exact) => {
    const f = unitFactor(unit, kind);
    expect(f).not.toBeNull();
    expect(Math.abs(f! - nist) / nist).toBeLessThan(5e-7);
    expect(Math.abs(f! - exact) / exact).toBeLessThan(5e-16);
  });

  it('SI prefixes and metric units are exact: 1 kN·m = 1000 N·m, 1 MPa = 1e6 Pa, 1 kN·m² = 1e3 N·m², 1 N/mm = 1000 N/m (SI brochure, exact)', () => {
    expect(unitFactor('kN·m', 'moment')).toBe(1000);
    expect(unitFactor('MPa', 'stress')).toBe(1e6);
    expect(unitFactor('kN·m²', 'flexuralStiffness')).toBe(1000);
    expect(unitFactor('N/mm', 'lineLoad')).toBe(1000);
    expect(unitFactor('kg/m3', 'density')).toBe(1);
  });

  it('a weight per length in kg/m is mass under standard gravity: 1 kg/m = 9.80665 N/m (g_n, exact by definition)', () => {
    expect(unitFactor('kg/m', 'weightPerLength')).toBe(9.80665);
    // lb/ft as a weight is lbf/ft exactly: 1 lbf is 1 lb under g_n.
    expect(Math.abs(unitFactor('lb/ft', 'weightPerLength')! / unitFactor('lbf/ft', 'lineLoad')! - 1)).toBeLessThan(3e-16);
  });

  it('every unit offered for every kind is one the reader knows', () => {
    for (const k of QUANTITY_KINDS) for (const u of KINDS[k].units) expect(unitFactor(u, k), `${u} as ${k}`).not.toBeNull();
  });
});

const read = (text: string, kind: QuantityKind, unit: string, label = 'field') => readQuantity(text, { label, kind, unit });
const si = (text: string, kind: QuantityKind, unit: string): number => {
  const r = read(text, kind, unit);
  if (!r.ok) throw new Error(r.message);
  return r.si;
};

describe('reading typed quantities (the forms the issue lists)', () => {
  it('4.2 m, and a bare number in the field unit (4200 in a mm field)', () => {
    expect(si('4.2 m', 'length', 'mm')).toBeCloseTo(4.2, 15);
    expect(si('4200', 'length', 'mm')).toBeCloseTo(4.2, 15);
  });

  it('feet and inches: 13\'-9" = 165 in, 13 ft 9-1/2 in = 165.5 in, 13\' 9 1/2" (exact arithmetic)', () => {
    expect(si('13\'-9"', 'length', 'mm') / 0.0254).toBeCloseTo(165, 12);
    expect(si('13 ft 9-1/2 in', 'length', 'mm') / 0.0254).toBeCloseTo(165.5, 12);
    expect(si('13\' 9 1/2"', 'length', 'm') / 0.0254).toBeCloseTo(165.5, 12);
    expect(si('-13\'-9"', 'length', 'mm') / 0.0254).toBeCloseTo(-165, 12);
    expect(si('3/4 in', 'length', 'mm')).toBeCloseTo(0.01905, 15);
  });

  it('30 kN/m and 2 kip/ft as line loads (2 kip/ft = 2 × 4448.2216152605 / 0.3048 N/m)', () => {
    expect(si('30 kN/m', 'lineLoad', 'N/m')).toBe(30000);
    expect(si('2 kip/ft', 'lineLoad', 'kN/m')).toBeCloseTo((2 * 4448.2216152605) / 0.3048, 9);
    expect(si('2 klf', 'lineLoad', 'kN/m')).toBeCloseTo((2 * 4448.2216152605) / 0.3048, 9);
  });

  it('250 N·m, 250 N*m, 250 N m and 250 Nm are the same moment', () => {
    for (const t of ['250 N·m', '250 N*m', '250 N m', '250 Nm', '250N.m', '0.25 kN·m']) expect(si(t, 'moment', 'kN·m'), t).toBeCloseTo(250, 12);
    expect(si('250 lb-ft', 'torque', 'N·m')).toBeCloseTo(250 * 1.3558179483314004, 10);
  });

  it('1.8e6 psi, 29000 ksi and 200 GPa as moduli (29000 ksi = 199.95 GPa, NIST factor)', () => {
    expect(si('1.8e6 psi', 'stress', 'MPa')).toBeCloseTo(1.8e6 * 6894.757293168361, 3);
    expect(si('29000 ksi', 'stress', 'MPa') / 1e9).toBeCloseTo(199.948, 3);
    expect(si('200 GPa', 'stress', 'ksi')).toBe(2e11);
  });

  it('7850 kg/m3, 7850 kg/m³ and 490 lb/ft^3 as densities (490 pcf = 7849.0 kg/m³)', () => {
    expect(si('7850 kg/m3', 'density', 'lb/ft³')).toBe(7850);
    expect(si('7850 kg/m³', 'density', 'lb/ft³')).toBe(7850);
    expect(si('490 lb/ft^3', 'density', 'kg/m³')).toBeCloseTo(490 * 16.018463373960138, 9);
    // Unit weight is taken under g_n: 77 kN/m³ → 77000 / 9.80665 kg/m³.
    expect(si('77 kN/m3', 'density', 'kg/m³')).toBeCloseTo(77000 / 9.80665, 9);
  });

  it('a decimal comma and the Unicode minus are read; a leading + too', () => {
    expect(si('4,2 m', 'length', 'mm')).toBeCloseTo(4.2, 15);
    expect(si('−500 kN', 'force', 'kN')).toBe(-500000);
    expect(si('+5', 'force', 'kN')).toBe(5000);
  });
});

describe('refusals name the field and the text', () => {
  it('a force typed into a length field', () => {
    const r = read('10 kN', 'length', 'mm', 'span L');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe('span L: "10 kN" is a force, not a length; use mm, cm, m, in, ft');
  });

  it('an unknown unit', () => {
    const r = read('3 furlong', 'length', 'mm', 'span L');
    expect(!r.ok && r.message).toBe('span L: unknown unit "furlong" in "3 furlong"; use mm, cm, m, in, ft');
  });

  it('an empty value, and text that is no number', () => {
    const e = read('  ', 'force', 'kN', 'point load P');
    expect(!e.ok && e.message).toMatch(/^point load P: enter a value .*kN/);
    const n = read('lots', 'force', 'kN', 'point load P');
    expect(!n.ok && n.message).toMatch(/^point load P: "lots" is not a number/);
  });

  it('a comma that may be a thousands separator is refused as ambiguous, not guessed', () => {
    const r = read('12,000', 'length', 'mm', 'span L');
    expect(!r.ok && r.message).toMatch(/^span L: "12,000" is ambiguous/);
  });

  it('a moment in a stress field, a stress in a force field, a division by zero', () => {
    expect(read('5 kN·m', 'stress', 'MPa', 'E').ok).toBe(false);
    expect(read('5 MPa', 'force', 'kN', 'N').ok).toBe(false);
    expect(read('1/0 in', 'length', 'mm', 'b').ok).toBe(false);
  });

  it('only lengths come in parts: "5 kN 3 N" is refused', () => {
    expect(read('5 kN 3 N', 'force', 'kN', 'P').ok).toBe(false);
  });
});

describe('unit systems follow the document unit', () => {
  it('in and ft documents: kip, kip/ft, kip·ft, ksi, kip·in², lb/ft, lb/ft³; mm, cm, m: kN, kN/m, kN·m, MPa, kN·m², kg/m, kg/m³', () => {
    for (const u of ['in', 'ft'] as const) {
      const s = unitSystem(u);
      expect([s.units.force, s.units.lineLoad, s.units.moment, s.units.stress, s.units.flexuralStiffness, s.units.weightPerLength, s.units.density, s.deflection]).toEqual(['kip', 'kip/ft', 'kip·ft', 'ksi', 'kip·in²', 'lb/ft', 'lb/ft³', 'in']);
      expect(systemUnitsValid(s)).toBe(true);
    }
    for (const u of ['mm', 'cm', 'm'] as const) {
      const s = unitSystem(u);
      expect([s.units.force, s.units.lineLoad, s.units.moment, s.units.stress, s.units.flexuralStiffness, s.units.weightPerLength, s.units.density, s.deflection]).toEqual(['kN', 'kN/m', 'kN·m', 'MPa', 'kN·m²', 'kg/m', 'kg/m³', 'mm']);
      expect(systemUnitsValid(s)).toBe(true);
    }
  });

  it('the user\'s choices: lbf, psi, kip·ft²; N and kN/m', () => {
    const i = unitSystem('in', { imperialForce: 'lbf', imperialStress: 'psi', imperialStiffnessLength: 'ft' });
    expect([i.units.force, i.units.moment, i.units.stress, i.units.flexuralStiffness]).toEqual(['lbf', 'lbf·ft', 'psi', 'lbf·ft²']);
    expect(systemUnitsValid(unitSystem('in', { imperialStiffnessLength: 'ft' }))).toBe(true);
    const m = unitSystem('m', { metricForce: 'N', metricWeight: 'kN/m' });
    expect([m.units.force, m.units.moment, m.units.weightPerLength, m.units.flexuralStiffness]).toEqual(['N', 'N·m', 'kN/m', 'N·m²']);
    expect(systemUnitsValid(m)).toBe(true);
  });

  it('convertQuantity: 15 kN/m is 1.02788 kip/ft (15000 × 0.3048 / 4448.2216152605, exact arithmetic)', () => {
    expect(convertQuantity(15, 'lineLoad', 'kN/m', 'kip/ft')).toBeCloseTo((15000 * 0.3048) / 4448.2216152605, 12);
    expect(toSI(1, 'moment', 'kip·ft')).toBeCloseTo(4448.2216152605 * 0.3048, 9);
  });
});

describe('rounding residue', () => {
  it('below 1e-9 of the natural scale is 0; at or above it stays', () => {
    expect(zeroWithinRounding(6.07e-14, 104e6)).toBe(0);
    expect(zeroWithinRounding(-2.842e-14, 300)).toBe(0);
    expect(zeroWithinRounding(1e-6, 300)).toBe(1e-6);
    expect(zeroWithinRounding(0.5, 0)).toBe(0.5);
  });
});
