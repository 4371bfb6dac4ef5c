// The one precision rule of dimension labels (core/units/dimension.ts). Values are exact
// arithmetic: 15 in = 381 mm and 7.44 in = 188.976 mm exactly (1 in = 25.4 mm, NIST SP 811).
import { describe, expect, it } from 'vitest';
import { DIMENSION_DECIMALS, formatDimension } from '../../core/units/dimension.ts';
import { LENGTH_UNITS } from '../../core/units/types.ts';

describe('formatDimension: one precision rule per document unit', () => {
  it('writes 381 and 188.976 mm with the same number of decimals (issue 11: "381 sits next to 188.976")', () => {
    const a = formatDimension(381, 'mm');
    const b = formatDimension(188.976, 'mm');
    expect(a).toBe('381.0');
    expect(b).toBe('189.0');
    expect(a.split('.')[1]?.length).toBe(b.split('.')[1]?.length);
  });

  it('writes the same sizes in inches to 0.001 in', () => {
    expect(formatDimension(15, 'in')).toBe('15.000');
    expect(formatDimension(7.44, 'in')).toBe('7.440');
    // 3/8 in plate: 0.375 exactly.
    expect(formatDimension(0.375, 'in')).toBe('0.375');
  });

  it('keeps about a tenth of a millimetre in every unit (1 ft = 304.8 mm, 1 in = 25.4 mm exactly)', () => {
    const mmPerUnit = { mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 } as const;
    for (const unit of LENGTH_UNITS) {
      const step = 10 ** -DIMENSION_DECIMALS[unit] * mmPerUnit[unit];
      expect(step, unit).toBeGreaterThanOrEqual(0.025);
      expect(step, unit).toBeLessThanOrEqual(0.1 + 1e-12);
    }
  });

  it('every label of one unit has the same decimals, whatever its size', () => {
    for (const unit of LENGTH_UNITS) {
      const decimals = new Set([0.5, 9.525, 100, 381, 12345.678].map((v) => formatDimension(v, unit).split('.')[1]?.length));
      expect(decimals.size, unit).toBe(1);
      expect([...decimals][0], unit).toBe(DIMENSION_DECIMALS[unit]);
    }
  });

  it('writes a rounding residue as an unsigned zero, and rounds to nearest', () => {
    expect(formatDimension(-1e-14, 'mm')).toBe('0.0');
    expect(formatDimension(-0, 'm')).toBe('0.0000');
    expect(formatDimension(-12.36, 'mm')).toBe('-12.4');
    expect(formatDimension(12.34, 'mm')).toBe('12.3');
  });
});
