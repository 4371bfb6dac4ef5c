// core/parts/points.ts: a pasted point list → an outline. Expected values: rectangle A = b·h and
// Ix = b·h³/12 (Gere & Timoshenko, Appendix D); a semicircular end of radius r adds πr²/2 (Roark,
// Table A.1); a bulge of 1 is a semicircle and tan(sweep/4) in general (DXF convention, DEVELOPERS.md).
import { describe, expect, it } from 'vitest';
import { normaliseRegion } from '../../core/geometry/index.ts';
import { bulgeFromRadius, parsePointList } from '../../core/parts/points.ts';
import { sectionProperties } from '../../core/properties/index.ts';

function area(text: string, third?: 'bulge' | 'radius'): number {
  const r = parsePointList(text, third);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  const xy = Float64Array.from(r.points.flat());
  return sectionProperties(normaliseRegion([{ outer: { xy, bulge: Float64Array.from(r.bulges) }, holes: [] }])).area;
}

function errors(text: string, third?: 'bulge' | 'radius'): string[] {
  const r = parsePointList(text, third);
  return r.ok ? [] : r.errors.map((e) => e.message);
}

describe('point lists from a spreadsheet', () => {
  it('tab-, semicolon-, comma- and space-separated lists of a 40 × 10 rectangle all give A = 400', () => {
    for (const sep of ['\t', ';', ',', ' ', '  ']) expect(area(['0', '0', '40', '0', '40', '10', '0', '10'].reduce<string[]>((rows, v, i) => (i % 2 === 0 ? [...rows, v] : [...rows.slice(0, -1), `${rows[rows.length - 1] ?? ''}${sep}${v}`]), []).join('\n'))).toBe(400);
  });

  it('a header row is recognised and skipped; blank lines, # comments, a repeated closing point and CRLF are fine', () => {
    expect(area('x;y\r\n# a plate\r\n0;0\r\n\r\n40;0\r\n40;10\r\n0;10\r\n0;0\r\n')).toBe(400);
  });

  it('a bulge column (named by the header): 1 on the right end makes a semicircle, A = 40·10 + π·5²/2', () => {
    expect(Math.abs(area('x\ty\tbulge\n0\t0\t0\n40\t0\t1\n40\t10\t0\n0\t10\t0') - (400 + (Math.PI * 25) / 2))).toBeLessThan(1e-12 * 400);
  });

  it('a radius column (said by the caller): radius 5 over a chord of 10 is the same semicircle', () => {
    expect(Math.abs(area('0,0,0\n40,0,5\n40,10,0\n0,10,0', 'radius') - (400 + (Math.PI * 25) / 2))).toBeLessThan(1e-12 * 400);
    // tan(sweep/4) for a quarter circle: sweep 90° → tan(22.5°) = √2 − 1 (exact arithmetic).
    expect(bulgeFromRadius(1, Math.SQRT2)).toBeCloseTo(Math.SQRT2 - 1, 15);
  });

  it('errors name the line and the column', () => {
    expect(errors('0 0\n40 zero\n40 10')).toEqual(['line 2, column 2: "zero" is not a number']);
    expect(errors('0;0\n40;1,5\n40;10')[0]).toBe('line 2, column 2: "1,5" uses a decimal comma; write it with a decimal point');
    expect(errors('0 0\n40\n40 10')[0]).toBe('line 2, column 2: expected x and y, found only "40"');
    expect(errors('0 0 0\n40 0 0.5\n40 10 0')[0]).toMatch(/^line 1, column 3: a third column is given: say whether it is a bulge or an arc radius/);
    expect(errors('0,0,0\n40,0,4\n40,10,0', 'radius')[0]).toMatch(/^line 2, column 3: radius 4 is smaller than half the distance to the next point \(5\)/);
    expect(errors('x y z\n0 0 1')[0]).toMatch(/^line 1, column 3: the header "z" does not say/);
  });
});
