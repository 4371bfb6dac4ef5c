/**
 * Triangle quadrature and the closed-form T6 mass matrix, checked by exact identities:
 *   ∫_T L1^a L2^b L3^c dA = 2Δ · a! b! c! / (a + b + c + 2)!   (area coordinates; Zienkiewicz,
 *   Taylor & Zhu, The Finite Element Method, exact integration formula), Δ = triangle area.
 */
import { describe, expect, it } from 'vitest';
import { DUNAVANT6, MASS_T6, MIDEDGE_RULE, shapeValues } from '../../core/torsion/element.ts';

const fact = (n: number): number => (n <= 1 ? 1 : n * fact(n - 1));
const exactUnitArea = (a: number, b: number, c: number): number => (2 * fact(a) * fact(b) * fact(c)) / fact(a + b + c + 2);

function ruleIntegral(rule: readonly (readonly [number, number, number, number])[], a: number, b: number, c: number): number {
  return rule.reduce((s, [l1, l2, l3, w]) => s + w * l1 ** a * l2 ** b * l3 ** c, 0);
}

function monomials(maxDegree: number): [number, number, number][] {
  const out: [number, number, number][] = [];
  for (let a = 0; a <= maxDegree; a++) for (let b = 0; a + b <= maxDegree; b++) for (let c = 0; a + b + c <= maxDegree; c++) out.push([a, b, c]);
  return out;
}

describe('triangle quadrature rules reproduce the area-coordinate integral identity', () => {
  it('Dunavant 6-point rule is exact for every monomial of degree ≤ 4 (to 1e-14)', () => {
    for (const [a, b, c] of monomials(4)) {
      expect(Math.abs(ruleIntegral(DUNAVANT6, a, b, c) - exactUnitArea(a, b, c))).toBeLessThan(1e-14);
    }
  });
  it('3-point mid-edge rule is exact for every monomial of degree ≤ 2 and not for L1³', () => {
    for (const [a, b, c] of monomials(2)) {
      expect(Math.abs(ruleIntegral(MIDEDGE_RULE, a, b, c) - exactUnitArea(a, b, c))).toBeLessThan(1e-15);
    }
    expect(Math.abs(ruleIntegral(MIDEDGE_RULE, 3, 0, 0) - exactUnitArea(3, 0, 0))).toBeGreaterThan(1e-3);
  });
});

describe('closed-form T6 mass matrix', () => {
  it('equals ∫ N_i N_j dA by the degree-4 rule (area 1), entry by entry to 1e-14', () => {
    const n = new Float64Array(6);
    const integral = new Float64Array(36);
    for (const [l1, l2, l3, w] of DUNAVANT6) {
      shapeValues(l1, l2, l3, n);
      for (let i = 0; i < 6; i++) for (let j = 0; j < 6; j++) integral[6 * i + j] = (integral[6 * i + j] ?? 0) + w * (n[i] ?? 0) * (n[j] ?? 0);
    }
    MASS_T6.forEach((m, k) => expect(Math.abs(m / 180 - (integral[k] ?? 0))).toBeLessThan(1e-14));
  });
  it('sums to the element area (Σ N_i = 1)', () => {
    expect(MASS_T6.reduce((s, v) => s + v, 0) / 180).toBeCloseTo(1, 14);
  });
});
