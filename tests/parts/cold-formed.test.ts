/**
 * Cold-formed parts (core/parts/cold-formed.ts) against the closed-form LINEAR METHOD of AISI
 * S100 (North American Specification for the Design of Cold-Formed Steel Structural Members)
 * as worked in the AISI Cold-Formed Steel Design Manual, Part I: the section is its mid-thickness
 * line, each bend a circular arc of radius R + t/2, and every property is t times a line
 * integral (a 90° arc has length 1.57r, centroid 0.637r from its centre and I = 0.149r³ about its
 * own axes: the Manual's rounded values of πr/2, 2r/π and (π/4 − 2/π)r³, from memory). The line
 * integrals below are exact calculus, written independently of the code under test.
 *
 * The linear method drops the terms in t³; the exact geometry keeps them. Both are shown:
 * - A is the same in both (an annular sector of mean radius rc and width t has area θ·rc·t);
 * - Ix of a section symmetric about x differs by exactly t³/12 × (length of the horizontal flats)
 *   plus, for each bend of centre height yc, 2|yc|·t³/12·|∫sinφ dφ| + rc·t³/4·∫sin²φ dφ
 *   (the t³ parts of ∫ρ²dρ and ∫ρ³dρ over the thickness);
 * - everything else within 2(t/b)², b the narrowest overall dimension (the dropped t³ terms
 *   over the kept ones are of that order: a flat of width b loses b·t³/12 against t·b³/12).
 * Dimensions are our own (a mezzanine joist, a purlin, a furring hat, a wall track), not a
 * manufacturer's.
 */
import { describe, expect, it } from 'vitest';
import { regionBounds } from '../../core/geometry/bounds.ts';
import { validateRegion } from '../../core/geometry/validate.ts';
import { getPartType } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { linearMethod, midLine, type P } from './aisi-linear.ts';

function exact(shape: string, params: Record<string, number>): { region: Region; p: ReturnType<typeof sectionProperties> } {
  const built = getPartType(shape)!.region(params);
  expect(built.diagnostics).toEqual([]);
  expect(validateRegion(built.region)).toEqual([]);
  return { region: built.region, p: sectionProperties(built.region) };
}

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
/** The linear method's stated closeness: 2(t/b)², b the narrowest overall dimension. */
const within = (t: number, b: number): number => 2 * (t / b) ** 2;

describe('lipped channel (mezzanine joist D 8, B 2.5, L 0.625, t 0.075, R 0.1125 in) against the AISI linear method', () => {
  const [D, B, L, t, R] = [8, 2.5, 0.625, 0.075, 0.1125];
  const rc = R + t / 2;
  // Mid-line with sharp corners: web at x = t/2, flanges at ±(D − t)/2, lips at x = B − t/2 down to L from the outside face.
  const path: P[] = [[B - t / 2, D / 2 - L], [B - t / 2, D / 2 - t / 2], [t / 2, D / 2 - t / 2], [t / 2, -D / 2 + t / 2], [B - t / 2, -D / 2 + t / 2], [B - t / 2, -D / 2 + L]];
  const { line, bends } = midLine(path, rc);
  const lin = linearMethod(line, t);
  const { region, p } = exact('lipped-channel', { D, B, L, t, R });

  it('is D deep and B wide out-to-out (exact bounds)', () => {
    const b = regionBounds(region)!;
    expect(b.maxY - b.minY).toBeCloseTo(D, 12);
    expect(b.maxX - b.minX).toBeCloseTo(B, 12);
  });

  it('A equals t × mid-line length exactly (annular-sector identity); the linear method gives the same A', () => {
    expect(p.area).toBeCloseTo(lin.A, 12);
  });

  it('Ix exceeds the linear method by exactly the dropped t³ terms (flats t³/12·l, bends 2|yc|t³/12 + rc·t³·π/16)', () => {
    const flats = 2 * (B - t - 2 * rc);
    let bendTerms = 0;
    for (const b of bends) {
      const S = Math.abs(Math.cos(b.from) - Math.cos(b.to));
      const SS = (b.to - b.from) / 2 - (Math.sin(2 * b.to) - Math.sin(2 * b.from)) / 4;
      bendTerms += (2 * Math.abs(b.centre[1]) * t ** 3 * S) / 12 + (rc * t ** 3 * SS) / 4;
    }
    const dropped = (t ** 3 * flats) / 12 + bendTerms;
    // Shown both: exact vs linear, and the known difference.
    expect(p.Ix - lin.Ix).toBeCloseTo(dropped, 10);
    expect(rel(p.Ix, lin.Ix)).toBeLessThan(1e-3);
  });

  it('x̄ and Iy within 2(t/B)² = 0.18 % of the linear method; Ixy = 0 by symmetry', () => {
    expect(rel(p.cx, lin.cx)).toBeLessThan(within(t, B));
    expect(rel(p.Iy, lin.Iy)).toBeLessThan(within(t, B));
    expect(Math.abs(p.Ixy)).toBeLessThan(1e-9 * p.Ix);
  });
});

describe('lipped Z (purlin D 8, B 2.5 top / 2.25 bottom, lips 0.9 at 50°, t 0.075, R 0.1875 in) against the AISI linear method', () => {
  const [D, B, B2, L, t, R, angle] = [8, 2.5, 2.25, 0.9, 0.075, 0.1875, 50];
  const rc = R + t / 2;
  const th = (angle * Math.PI) / 180;
  const lip = (L - t / 2) / Math.sin(th);
  const top: P = [B - t, D / 2 - t / 2];
  const bottom: P = [-(B2 - t), -D / 2 + t / 2];
  const path: P[] = [[top[0] + lip * Math.cos(th), top[1] - lip * Math.sin(th)], top, [0, D / 2 - t / 2], [0, -D / 2 + t / 2], bottom, [bottom[0] - lip * Math.cos(th), bottom[1] + lip * Math.sin(th)]];
  const lin = linearMethod(midLine(path, rc).line, t);
  const { region, p } = exact('lipped-z', { D, B, B2, L, t, R, lipAngle: angle });

  it('is D deep out-to-out', () => {
    const b = regionBounds(region)!;
    expect(b.maxY - b.minY).toBeCloseTo(D, 12);
  });

  it('A equals the linear method exactly; centroid, Ix, Iy and Ixy (unequal flanges: Z has a product of inertia) within 2(t/B2)²', () => {
    const tol = within(t, B2);
    expect(p.area).toBeCloseTo(lin.A, 12);
    expect(Math.abs(p.cx - lin.cx)).toBeLessThan(tol * D);
    expect(Math.abs(p.cy - lin.cy)).toBeLessThan(tol * D);
    expect(rel(p.Ix, lin.Ix)).toBeLessThan(tol);
    expect(rel(p.Iy, lin.Iy)).toBeLessThan(tol);
    expect(rel(p.Ixy, lin.Ixy)).toBeLessThan(tol);
    expect(Math.abs(p.Ixy)).toBeGreaterThan(0.1 * p.Iy);
  });
});

describe('hat (furring D 3, crown 2, brims 1.25, t 0.06, R 0.09 in) and track (D 6.125, B 1.25, t 0.0451, R 0.0677 in)', () => {
  it('hat: A exact, Ix and Iy within 2(t/Bb)² of the AISI linear method, symmetric about y', () => {
    const [D, B, Bb, t, R] = [3, 2, 1.25, 0.06, 0.09];
    const x = B / 2 - t / 2;
    const path: P[] = [[-(B / 2 + Bb), -D / 2 + t / 2], [-x, -D / 2 + t / 2], [-x, D / 2 - t / 2], [x, D / 2 - t / 2], [x, -D / 2 + t / 2], [B / 2 + Bb, -D / 2 + t / 2]];
    const lin = linearMethod(midLine(path, R + t / 2).line, t);
    const { region, p } = exact('hat', { D, B, Bb, t, R });
    const b = regionBounds(region)!;
    expect(b.maxX - b.minX).toBeCloseTo(B + 2 * Bb, 12);
    expect(p.area).toBeCloseTo(lin.A, 12);
    expect(rel(p.Ix, lin.Ix)).toBeLessThan(within(t, Bb));
    expect(rel(p.Iy, lin.Iy)).toBeLessThan(within(t, Bb));
    expect(Math.abs(p.cx)).toBeLessThan(1e-12);
  });

  it('track (unlipped C): A exact, x̄, Ix, Iy within 2(t/B)² of the AISI linear method', () => {
    const [D, B, t, R] = [6.125, 1.25, 0.0451, 0.0677];
    const path: P[] = [[B, D / 2 - t / 2], [t / 2, D / 2 - t / 2], [t / 2, -D / 2 + t / 2], [B, -D / 2 + t / 2]];
    const lin = linearMethod(midLine(path, R + t / 2).line, t);
    const { p } = exact('track', { D, B, t, R });
    expect(p.area).toBeCloseTo(lin.A, 12);
    expect(rel(p.cx, lin.cx)).toBeLessThan(within(t, B));
    expect(rel(p.Ix, lin.Ix)).toBeLessThan(within(t, B));
    expect(rel(p.Iy, lin.Iy)).toBeLessThan(within(t, B));
  });

  it('a track bent with R = 0 is the rectangles less the outside corners of radius t: A = t(D + 2(B − t)) − 2(1 − π/4)t² exactly', () => {
    const [D, B, t] = [6, 1.5, 0.1];
    expect(exact('track', { D, B, t, R: 0 }).p.area).toBeCloseTo(t * (D + 2 * (B - t)) - 2 * (1 - Math.PI / 4) * t * t, 12);
  });
});

describe('cold-formed parts: bad dimensions are named', () => {
  const messages = (shape: string, params: Record<string, number>): string => getPartType(shape)!.region(params).diagnostics.map((d) => d.message).join(' | ');
  it('a bend radius too large for its flange, a lip not longer than t/2, a lip angle out of range, t too thick', () => {
    expect(messages('lipped-channel', { D: 8, B: 0.5, L: 0.4, t: 0.075, R: 0.5 })).toContain('the bends (inside radius R = 0.5');
    expect(messages('lipped-channel', { D: 8, B: 2.5, L: 0.03, t: 0.075 })).toContain('L = 0.03 is not more than t/2');
    expect(messages('lipped-z', { D: 8, B: 2.5, L: 0.9, t: 0.075, lipAngle: 5 })).toContain('lipAngle = 5° must lie between 15° and 165°');
    expect(messages('track', { D: 0.1, B: 1, t: 0.075 })).toContain('leaves no web');
  });
});
