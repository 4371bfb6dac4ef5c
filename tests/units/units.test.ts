// core/units: exact length factors, display conversions and significant-figure formatting.
// Reference values come from the definitions (1 in = 25.4 mm exactly, 1 ft = 12 in: NIST SP 811,
// Appendix B, from memory for the document number) and exact decimal arithmetic.
import { describe, expect, it } from 'vitest';
import {
  convertLength,
  defaultDisplaySet,
  DISPLAY_UNITS,
  formatSig,
  fromDisplay,
  LENGTH_UNITS,
  lengthFactor,
  plainDisplaySet,
  toDisplay,
} from '../../core/units/index.ts';

describe('length factors', () => {
  it('1 in is exactly 25.4 mm and 1 ft is exactly 304.8 mm (the double nearest each decimal)', () => {
    expect(convertLength(1, 'in', 'mm')).toBe(25.4);
    expect(convertLength(1, 'ft', 'mm')).toBe(304.8);
    expect(convertLength(1, 'ft', 'in')).toBe(12);
    expect(convertLength(1, 'm', 'mm')).toBe(1000);
    expect(convertLength(1, 'cm', 'mm')).toBe(10);
  });

  it('powers are formed exactly: 1 in⁴ = 416231.4256 mm⁴ and 1 in² = 645.16 mm² (exact decimals 25.4⁴, 25.4²)', () => {
    expect(convertLength(1, 'in', 'mm', 4)).toBe(416231.4256);
    expect(convertLength(1, 'in', 'mm', 2)).toBe(645.16);
    expect(convertLength(1, 'in', 'mm', 3)).toBe(16387.064);
    // 25.4⁶ = 268535866.540096 exactly (exact decimal arithmetic).
    expect(convertLength(1, 'in', 'mm', 6)).toBe(268535866.540096);
    // 304.8⁶ = 801843800914862.014464 exactly (exact decimal arithmetic): the nearest double is
    // 801843800914862, whereas the naive 304.8 ** 6 rounds six times and lands on …862.25.
    expect(lengthFactor('ft', 'mm', 6)).toBe(801843800914862);
  });

  it('mm → in is the double nearest 1/25.4 = 5/127, and m⁴ → mm⁴ is exactly 1e12', () => {
    expect(lengthFactor('mm', 'in')).toBe(5 / 127);
    expect(lengthFactor('m', 'mm', 4)).toBe(1e12);
    expect(lengthFactor('mm', 'm', 6)).toBe(1e-18);
  });

  it('a factor and its inverse multiply to 1 within 2 ulp for every unit pair and power 1..6', () => {
    for (const a of LENGTH_UNITS) {
      for (const b of LENGTH_UNITS) {
        for (const p of [1, 2, 3, 4, 6]) {
          const product = lengthFactor(a, b, p) * lengthFactor(b, a, p);
          expect(Math.abs(product - 1)).toBeLessThanOrEqual(4.5e-16);
        }
      }
    }
  });

  it('converting through a third unit equals converting directly (transitivity, within 3 ulp)', () => {
    const v = 1234.5678;
    for (const [a, b, c] of [['in', 'cm', 'ft'], ['ft', 'mm', 'm'], ['m', 'in', 'cm']] as const) {
      for (const p of [1, 4, 6]) {
        const direct = convertLength(v, a, c, p);
        const via = convertLength(convertLength(v, a, b, p), b, c, p);
        expect(Math.abs(via - direct) / Math.abs(direct)).toBeLessThan(7e-16);
      }
    }
  });

  it('negative powers invert: in⁻¹ → mm⁻¹ is 1/25.4', () => {
    expect(lengthFactor('in', 'mm', -1)).toBe(5 / 127);
  });
});

describe('display units', () => {
  it('mm documents show 10⁶ mm⁴, 10³ mm³ and 10⁹ mm⁶; in documents in⁴, in³, in⁶ (common practice)', () => {
    const mm = defaultDisplaySet('mm');
    expect([mm.length.label, mm.area.label, mm.modulus.label, mm.inertia.label, mm.warping.label]).toEqual(['mm', 'mm²', '10³ mm³', '10⁶ mm⁴', '10⁹ mm⁶']);
    const inch = defaultDisplaySet('ft');
    expect([inch.area.label, inch.modulus.label, inch.inertia.label, inch.warping.label]).toEqual(['in²', 'in³', 'in⁴', 'in⁶']);
    expect(defaultDisplaySet('cm').inertia.label).toBe('cm⁴');
  });

  it('1 in⁴ shows as 0.4162314256 (10⁶ mm⁴) and 41.62314256 cm⁴ (25.4⁴/10⁶ and 2.54⁴, exact decimals)', () => {
    const mega = DISPLAY_UNITS.inertia.find((d) => d.label === '10⁶ mm⁴');
    const cm4 = DISPLAY_UNITS.inertia.find((d) => d.label === 'cm⁴');
    expect(mega && toDisplay(1, 'in', mega)).toBeCloseTo(0.4162314256, 15);
    expect(cm4 && toDisplay(1, 'in', cm4)).toBeCloseTo(41.62314256, 13);
  });

  it('fromDisplay undoes toDisplay for every display unit (round trip within 4 ulp)', () => {
    for (const list of Object.values(DISPLAY_UNITS)) {
      for (const d of list) {
        for (const unit of LENGTH_UNITS) {
          const v = 98765.4321;
          const back = fromDisplay(toDisplay(v, unit, d), unit, d);
          expect(Math.abs(back - v) / v).toBeLessThan(9e-16);
        }
      }
    }
  });

  it('the plain display set uses the unit itself with no scale', () => {
    const s = plainDisplaySet('m');
    expect([s.area.label, s.inertia.label, s.inertia.scale]).toEqual(['m²', 'm⁴', 1]);
  });
});

describe('formatSig', () => {
  it('keeps significant trailing zeros and pads large integers', () => {
    expect(formatSig(12, 4)).toBe('12.00');
    expect(formatSig(12345, 3)).toBe('12300');
    expect(formatSig(0.000123456, 3)).toBe('0.000123');
    expect(formatSig(416231.4256, 6)).toBe('416231');
  });

  it('never prints "-0": zero of either sign is "0"', () => {
    expect(formatSig(-0, 4)).toBe('0');
    expect(formatSig(0, 4)).toBe('0');
  });

  it('rounds half away at the last figure as toExponential does and carries into a new digit', () => {
    expect(formatSig(999.96, 4)).toBe('1000');
    expect(formatSig(-1.23456, 3)).toBe('-1.23');
  });

  it('switches to e-notation below 1e-4 and from 1e9 up, by default', () => {
    expect(formatSig(4.2e-7, 2)).toBe('4.2e-7');
    expect(formatSig(1.23456e12, 4)).toBe('1.235e12');
    expect(formatSig(123456789, 4)).toBe('123500000');
  });

  it('groups thousands only when asked', () => {
    expect(formatSig(1234567.5, 8, { grouping: ',' })).toBe('1,234,567.5');
    expect(formatSig(1234567.5, 8)).toBe('1234567.5');
  });

  it('prints non-finite values by name and rejects a bad figure count', () => {
    expect(formatSig(Number.NaN, 3)).toBe('NaN');
    expect(formatSig(-Infinity, 3)).toBe('-Infinity');
    expect(() => formatSig(1, 0)).toThrow(/1..17/);
  });
});
