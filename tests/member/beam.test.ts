import { describe, expect, it } from 'vitest';
import {
  beamCaseIssues, beamDiagram, deflectionAt, deflectionExtremes, momentAt, momentExtremes, solveBeam,
  type BeamCase,
} from '../../core/member/beam.ts';
import { readRefs, refValue } from './refs.ts';

const refs = readRefs(new URL('../fixtures/analytic-refs-stress-member.csv', import.meta.url));
// beam_deflection rows: E = 200 000 N/mm², I = 8e7 mm⁴, L = 6000 mm, P = 20 kN, w = 10 N/mm.
const E = 200_000, I = 8e7, L = 6000, P = 20_000, w = 10;
const EI = E * I;
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

const beam = (support: BeamCase['support'], points: BeamCase['points'], uniform: number, span = L): BeamCase => ({ span, support, EI, points, uniform });
const maxDown = (b: BeamCase) => deflectionExtremes(solveBeam(b)).down;

describe('closed-form maximum deflections (analytic refs; Gere & Timoshenko, Roark, AISC Manual beam diagrams)', () => {
  const cases: [string, BeamCase, number][] = [
    ['simply_supported_centre_load', beam('simple', [{ P, a: L / 2 }], 0), L / 2],
    ['simply_supported_udl', beam('simple', [], w), L / 2],
    ['cantilever_end_load', beam('cantilever', [{ P, a: L }], 0), L],
    ['cantilever_udl', beam('cantilever', [], w), L],
    ['fixed_fixed_udl', beam('fixed', [], w), L / 2],
    ['fixed_fixed_centre_load', beam('fixed', [{ P, a: L / 2 }], 0), L / 2],
  ];
  for (const [name, b, where] of cases) {
    it(`${name}: maximum deflection equals the reference value to 1e-12 and occurs at x = ${where}`, () => {
      const d = maxDown(b);
      expect(rel(d.value, refValue(refs, 'beam_deflection', name))).toBeLessThan(1e-12);
      expect(Math.abs(d.at - where)).toBeLessThan(1e-9 * L);
    });
  }

  it('propped cantilever, uniform load: wL⁴(39 + 55√33)/(65536 EI) ≈ wL⁴/184.6EI at (1 + √33)L/16 = 0.4215L from the pinned end', () => {
    // AISC Manual beam diagram "fixed at one end, supported at the other, uniform load":
    // Δ(ξ) = w x (L³ − 3 L x² + 2 x³)/(48 EI), x from the pinned end (from memory); dΔ/dx = 0 gives
    // 8ξ³ − 9ξ² + 1 = (ξ − 1)(8ξ² − ξ − 1) = 0, so ξ = (1 + √33)/16 (exact arithmetic).
    const d = maxDown(beam('propped', [], w));
    const xi = (1 + Math.sqrt(33)) / 16;
    const expected = (w * L ** 4 * (39 + 55 * Math.sqrt(33))) / (65536 * EI);
    expect(rel(d.value, expected)).toBeLessThan(1e-12);
    expect(1 / ((d.value * EI) / (w * L ** 4))).toBeCloseTo(184.6, 1); // docs/methods.md §10 table: 184.6
    // Our fixed end is at x = 0, so the pinned end is at L.
    expect(Math.abs(L - d.at - xi * L)).toBeLessThan(1e-9 * L);
  });

  it('propped cantilever, uniform load: the whole deflected shape matches w x (L³ − 3Lx² + 2x³)/(48EI) from the pinned end', () => {
    const s = solveBeam(beam('propped', [], w));
    for (const f of [0.1, 0.25, 0.5, 0.8, 0.95]) {
      const x = f * L; // from the pinned end
      const expected = (w * x * (L ** 3 - 3 * L * x * x + 2 * x ** 3)) / (48 * EI);
      expect(rel(deflectionAt(s, L - x), expected)).toBeLessThan(1e-11);
    }
  });
});

describe('simply supported point load at a general position (Roark; Gere & Timoshenko)', () => {
  for (const f of [0.5, 0.55, 0.7, 0.9, 0.97]) {
    it(`load at a = ${f}L: Δmax = P b (L² − b²)^{3/2}/(9√3 L EI) at x = √((L² − b²)/3)`, () => {
      const a = f * L, b = L - a;
      const d = maxDown(beam('simple', [{ P, a }], 0));
      const expected = (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * L * EI);
      expect(rel(d.value, expected)).toBeLessThan(1e-12);
      expect(Math.abs(d.at - Math.sqrt((L * L - b * b) / 3))).toBeLessThan(1e-8 * L);
      expect(d.converged).toBe(true);
    });
  }

  it('the largest moment under a point load at a is P a b / L, at the load', () => {
    const a = 0.7 * L, b = L - a;
    const m = momentExtremes(solveBeam(beam('simple', [{ P, a }], 0))).sagging;
    expect(rel(m.value, (P * a * b) / L)).toBeLessThan(1e-12);
    expect(m.at).toBe(a);
  });
});

describe('other closed forms (Roark Table 8.1; AISC Manual beam diagrams)', () => {
  it('cantilever with a point load at a from the fixed end: tip deflection P a²(3L − a)/(6EI)', () => {
    const a = 0.6 * L;
    const d = maxDown(beam('cantilever', [{ P, a }], 0));
    expect(rel(d.value, (P * a * a * (3 * L - a)) / (6 * EI))).toBeLessThan(1e-12);
    expect(d.at).toBe(L);
  });

  it('simple span uniform load: Mmax = wL²/8 at midspan', () => {
    const m = momentExtremes(solveBeam(beam('simple', [], w))).sagging;
    expect(rel(m.value, (w * L * L) / 8)).toBeLessThan(1e-12);
    expect(Math.abs(m.at - L / 2)).toBeLessThan(1e-9 * L);
  });

  it('fixed–fixed uniform load: end moments −wL²/12, midspan +wL²/24', () => {
    const s = solveBeam(beam('fixed', [], w));
    const m = momentExtremes(s);
    expect(rel(m.hogging.value, (-w * L * L) / 12)).toBeLessThan(1e-12);
    expect(rel(m.sagging.value, (w * L * L) / 24)).toBeLessThan(1e-12);
    expect(rel(momentAt(s, L), (-w * L * L) / 12)).toBeLessThan(1e-12);
  });

  it('fixed–fixed point load at a: end moments −P a b²/L² and −P a² b/L²', () => {
    const a = 0.3 * L, b = L - a;
    const s = solveBeam(beam('fixed', [{ P, a }], 0));
    expect(rel(momentAt(s, 0), (-P * a * b * b) / (L * L))).toBeLessThan(1e-12);
    expect(rel(momentAt(s, L), (-P * a * a * b) / (L * L))).toBeLessThan(1e-12);
  });

  it('propped cantilever uniform load: fixed-end moment −wL²/8; largest sagging 9wL²/128 at 3L/8 from the pinned end', () => {
    const m = momentExtremes(solveBeam(beam('propped', [], w)));
    expect(rel(m.hogging.value, (-w * L * L) / 8)).toBeLessThan(1e-12);
    expect(m.hogging.at).toBe(0);
    expect(rel(m.sagging.value, (9 * w * L * L) / 128)).toBeLessThan(1e-12);
    expect(Math.abs(L - m.sagging.at - (3 * L) / 8)).toBeLessThan(1e-9 * L);
  });

  it('cantilever end load: moment −PL at the fixed end', () => {
    const m = momentExtremes(solveBeam(beam('cantilever', [{ P, a: L }], 0)));
    expect(rel(m.hogging.value, -P * L)).toBeLessThan(1e-12);
    expect(m.hogging.at).toBe(0);
  });
});

describe('superposition and input checks', () => {
  it('point load plus uniform load deflects by the sum of the two separate deflections at every sample (linearity)', () => {
    for (const support of ['simple', 'cantilever', 'fixed', 'propped'] as const) {
      const both = solveBeam(beam(support, [{ P, a: 0.35 * L }], w));
      const pOnly = solveBeam(beam(support, [{ P, a: 0.35 * L }], 0));
      const wOnly = solveBeam(beam(support, [], w));
      for (const f of [0.1, 0.35, 0.6, 0.9]) {
        const x = f * L;
        expect(rel(deflectionAt(both, x), deflectionAt(pOnly, x) + deflectionAt(wOnly, x))).toBeLessThan(1e-12);
      }
    }
  });

  it('the diagram samples include both ends and every load point and satisfy the boundary conditions', () => {
    const s = solveBeam(beam('fixed', [{ P, a: 1234 }], w));
    const d = beamDiagram(s, 50);
    expect(d.x[0]).toBe(0);
    expect(d.x[d.x.length - 1]).toBe(L);
    expect(d.x).toContain(1234);
    // fixed ends: no deflection at either end (boundary condition)
    expect(Math.abs(d.deflection[0] ?? NaN)).toBeLessThan(1e-12);
    expect(Math.abs(d.deflection[d.deflection.length - 1] ?? NaN)).toBeLessThan(1e-9);
  });

  it('a point load outside the span and a non-positive EI are reported by name', () => {
    const issues = beamCaseIssues({ span: L, support: 'simple', EI: 0, points: [{ P, a: 7000 }], uniform: 0 });
    expect(issues).toEqual([
      'EI must be a positive number, got 0',
      'point load 1: position 7000 is outside the span 0…6000',
    ]);
    expect(() => solveBeam({ span: L, support: 'simple', EI, points: [{ P, a: -1 }], uniform: 0 })).toThrow(/position -1 is outside the span/);
  });
});
