/**
 * Finding a shape by what a user types (core/catalogue findShapes): the designations are those of
 * the AISC Shapes Database v15.0 and NDS Supplement Table 1A held in the catalogue.
 */
import { describe, expect, it } from 'vitest';
import { findShapes, queryKey } from '../../core/catalogue/index.ts';

const first = (text: string): string | undefined => findShapes(text)[0]?.designation;

describe('finding a shape by typed text', () => {
  it('reads "2 x 10", "w14 90", "W14×90" and "HSS6x6x1/4" as designations', () => {
    expect(queryKey('2 x 10')).toBe('2X10');
    expect(queryKey('w14 90')).toBe('W14X90');
    expect(queryKey('W14×90')).toBe('W14X90');
    expect(queryKey(' HSS6x6x1/4 ')).toBe('HSS6X6X1/4');
  });

  it('"2x10" and "2 x 10" list the 2x10 first, and every lumber match before any steel shape', () => {
    for (const text of ['2x10', '2 x 10']) {
      const found = findShapes(text);
      expect(found[0]!.designation).toBe('2x10');
      const firstSteel = found.findIndex((e) => e.family !== 'lumber');
      const lastLumber = found.map((e) => e.family).lastIndexOf('lumber');
      if (firstSteel >= 0) expect(lastLumber).toBeLessThan(firstSteel);
    }
  });

  it('"W14x90" and "w14 90" list W14X90 first; "HSS6x6x1/4" lists HSS6X6X1/4 first', () => {
    expect(first('W14x90')).toBe('W14X90');
    expect(first('w14 90')).toBe('W14X90');
    expect(first('HSS6x6x1/4')).toBe('HSS6X6X1/4');
  });

  it('a weight that is not rolled ("W14x91") lists the nearest weights of that depth first: W14X90', () => {
    expect(first('W14x91')).toBe('W14X90');
    expect(findShapes('W14x91').every((e) => e.designation.startsWith('W14X'))).toBe(true);
  });

  it('a start of a designation lists the shapes that begin with it ("w14" → W14 shapes, no WT14…)', () => {
    const found = findShapes('w14', undefined, 100);
    expect(found.length).toBeGreaterThan(10);
    expect(found.slice(0, 10).every((e) => e.designation.startsWith('W14X'))).toBe(true);
  });

  it('nothing typed finds nothing', () => {
    expect(findShapes('  ')).toEqual([]);
  });
});
