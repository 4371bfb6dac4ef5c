/**
 * Prismatic Euler–Bernoulli beam under point loads and a full-span uniform load: exact
 * piecewise-polynomial solution (Macaulay brackets) for four support cases.
 *
 * Axis: x from the left end, 0 ≤ x ≤ L. Loads act downward when positive (force, and force per
 * length); deflection is reported downward positive. Sagging moment is positive.
 * Supports: 'simple' (pin at 0, roller at L); 'cantilever' (fixed at 0, free at L);
 * 'fixed' (fixed at both ends); 'propped' (fixed at 0, pinned at L).
 *
 * Method: EI·y(x) = Y0 + T0·x + M0·x²/2 + V0·x³/6 − Σ P⟨x − a⟩³/6 − w·x⁴/24 (y up), with the
 * four end values (Y0, T0, M0, V0) fixed by the four boundary conditions of the support case:
 * a 4×4 linear system, made dimensionless by powers of L and solved with partial pivoting.
 * This reproduces the AISC Manual beam diagrams and Roark's beam tables for every case, at
 * any load position, by superposition (linear elasticity).
 * Maximum deflection: the slope is a cubic on each load-free interval; the zeros of the moment
 * (a quadratic, solved exactly) split it into monotone pieces, so every root of the slope is
 * bracketed and found by bisection (cap 200 halvings, tolerance 1e−14·L; the iteration count and
 * residual are reported). Maximum moment: exact, at an end, a load point or where V = 0.
 * Units: any consistent set (e.g. N, mm, N/mm, N·mm²). Does not: include shear deformation
 * (unconservative for short, deep or sandwich beams), second-order effects or a varying EI.
 * Sources: docs/methods.md §10; Gere & Timoshenko, Mechanics of Materials (Macaulay's method);
 * Roark's Formulas for Stress and Strain, Table 8.1; AISC Manual Part 3 beam diagrams.
 */
import { invariant } from '../invariant.ts';

export type Support = 'simple' | 'cantilever' | 'fixed' | 'propped';
export const SUPPORTS: readonly Support[] = ['simple', 'cantilever', 'fixed', 'propped'];

export interface PointLoad {
  /** Force, downward positive. */
  readonly P: number;
  /** Position from the left end (the fixed end of a cantilever or propped cantilever). */
  readonly a: number;
}

export interface BeamCase {
  readonly span: number;
  readonly support: Support;
  readonly EI: number;
  readonly points: readonly PointLoad[];
  /** Full-span uniform load, force per length, downward positive. */
  readonly uniform: number;
}

export interface BeamSolution {
  readonly beam: BeamCase;
  /** EI·y(0), EI·y'(0), M(0), V(0) (y up; V0 is the left reaction, upward positive). */
  readonly Y0: number;
  readonly T0: number;
  readonly M0: number;
  readonly V0: number;
}

/** What is wrong with the beam input, plainly; empty when it is usable. */
export function beamCaseIssues(b: BeamCase): string[] {
  const issues: string[] = [];
  if (!(Number.isFinite(b.span) && b.span > 0)) issues.push(`span must be a positive number, got ${b.span}`);
  if (!(Number.isFinite(b.EI) && b.EI > 0)) issues.push(`EI must be a positive number, got ${b.EI}`);
  if (!Number.isFinite(b.uniform)) issues.push(`uniform load must be a finite number, got ${b.uniform}`);
  if (!SUPPORTS.includes(b.support)) issues.push(`support must be one of ${SUPPORTS.join(', ')}, got ${String(b.support)}`);
  b.points.forEach((p, i) => {
    if (!Number.isFinite(p.P)) issues.push(`point load ${i + 1}: force must be a finite number, got ${p.P}`);
    if (!(Number.isFinite(p.a) && p.a >= 0 && p.a <= b.span)) issues.push(`point load ${i + 1}: position ${p.a} is outside the span 0…${b.span}`);
  });
  if (issues.length === 0 && !loadTermsFinite(b)) {
    issues.push(`span ${b.span} with these loads is beyond what the arithmetic can hold (w·L⁴ or P·L³ overflows, so every result would be NaN); check the span's and the loads' units`);
  }
  return issues;
}

const pos = (x: number): number => (x > 0 ? x : 0);

/** Whether the largest terms of the solution (w·L⁴, P·L³, and L⁴ itself) are finite doubles. */
function loadTermsFinite(b: BeamCase): boolean {
  const L = b.span;
  const L3 = L * L * L;
  let total = L3 * L * Math.max(1, Math.abs(b.uniform));
  for (const p of b.points) total += Math.abs(p.P) * L3;
  return Number.isFinite(total);
}

/** Load terms at x: Σ P⟨x−a⟩ⁿ/n! + w xⁿ⁺²/(n+2)! for the deflection (n = 3) down to shear (n = 0). */
function loadTerm(b: BeamCase, x: number, order: 0 | 1 | 2 | 3): number {
  const fact = [1, 1, 2, 6, 24, 120];
  let sum = (b.uniform * x ** (order + 1)) / (fact[order + 1] as number);
  for (const p of b.points) {
    const d = x - p.a;
    sum += order === 0 ? (d >= 0 ? p.P : 0) : (p.P * pos(d) ** order) / (fact[order] as number);
  }
  return sum;
}

type Row = [number, number, number, number, number];

/** Boundary rows in scaled unknowns u = (Y0, T0·L, M0·L², V0·L³), each equation times Lᵏ. */
function boundaryRows(b: BeamCase): Row[] {
  const L = b.span;
  const y0: Row = [1, 0, 0, 0, 0];
  const t0: Row = [0, 1, 0, 0, 0];
  const m0: Row = [0, 0, 1, 0, 0];
  const yL: Row = [1, 1, 1 / 2, 1 / 6, loadTerm(b, L, 3)];
  const tL: Row = [0, 1, 1, 1 / 2, loadTerm(b, L, 2) * L];
  const mL: Row = [0, 0, 1, 1, loadTerm(b, L, 1) * L * L];
  const vL: Row = [0, 0, 0, 1, loadTerm(b, L, 0) * L * L * L];
  switch (b.support) {
    case 'simple': return [y0, m0, yL, mL];
    case 'cantilever': return [y0, t0, mL, vL];
    case 'fixed': return [y0, t0, yL, tL];
    case 'propped': return [y0, t0, yL, mL];
  }
}

function solve4(rows: Row[]): [number, number, number, number] {
  const m = rows.map((r) => [...r]);
  for (let c = 0; c < 4; c++) {
    let p = c;
    for (let r = c + 1; r < 4; r++) if (Math.abs(m[r]![c]!) > Math.abs(m[p]![c]!)) p = r;
    [m[c], m[p]] = [m[p]!, m[c]!];
    const pivot = m[c]![c]!;
    invariant(pivot !== 0, 'beam: singular boundary conditions');
    for (let r = c + 1; r < 4; r++) {
      const f = m[r]![c]! / pivot;
      for (let k = c; k < 5; k++) m[r]![k]! -= f * m[c]![k]!;
    }
  }
  const u = [0, 0, 0, 0];
  for (let r = 3; r >= 0; r--) {
    let s = m[r]![4]!;
    for (let k = r + 1; k < 4; k++) s -= m[r]![k]! * u[k]!;
    u[r] = s / m[r]![r]!;
  }
  return [u[0]!, u[1]!, u[2]!, u[3]!];
}

/** Solves the beam; throws (invariant) on input that `beamCaseIssues` would reject. */
export function solveBeam(b: BeamCase): BeamSolution {
  const issues = beamCaseIssues(b);
  invariant(issues.length === 0, `solveBeam: ${issues.join('; ')}`);
  const L = b.span;
  const [Y0, t, m, v] = solve4(boundaryRows(b));
  return { beam: b, Y0, T0: t / L, M0: m / (L * L), V0: v / (L * L * L) };
}

/** Downward deflection at x. */
export function deflectionAt(s: BeamSolution, x: number): number {
  const eiY = s.Y0 + s.T0 * x + (s.M0 * x * x) / 2 + (s.V0 * x * x * x) / 6 - loadTerm(s.beam, x, 3);
  return -eiY / s.beam.EI;
}

/** Slope dy/dx (y up) at x. */
export function slopeAt(s: BeamSolution, x: number): number {
  return (s.T0 + s.M0 * x + (s.V0 * x * x) / 2 - loadTerm(s.beam, x, 2)) / s.beam.EI;
}

/** Bending moment at x, sagging positive. */
export function momentAt(s: BeamSolution, x: number): number {
  return s.M0 + s.V0 * x - loadTerm(s.beam, x, 1);
}

/** Shear just right of x (upward on the left part positive); at x = L the end reaction side. */
export function shearAt(s: BeamSolution, x: number): number {
  return s.V0 - loadTerm(s.beam, x, 0);
}

/** Load-free intervals: 0, the sorted load positions inside the span, L. */
export function breakpoints(b: BeamCase): number[] {
  const inner = b.points.map((p) => p.a).filter((a) => a > 0 && a < b.span);
  return [0, ...[...new Set(inner)].sort((p, q) => p - q), b.span];
}

/** Real roots of c0 + c1 x + c2 x² inside (lo, hi), stable quadratic formula. */
function quadraticRootsIn(c0: number, c1: number, c2: number, lo: number, hi: number): number[] {
  let roots: number[];
  if (c2 === 0) roots = c1 === 0 ? [] : [-c0 / c1];
  else {
    const disc = c1 * c1 - 4 * c2 * c0;
    if (disc < 0) roots = [];
    else {
      const q = -0.5 * (c1 + Math.sign(c1 || 1) * Math.sqrt(disc));
      roots = q === 0 ? [0] : [q / c2, c0 / q];
    }
  }
  return roots.filter((r) => r > lo && r < hi).sort((p, q) => p - q);
}

/** Coefficients of M(x) = c0 + c1 x + c2 x² on the load-free interval starting at lo. */
function momentCoefficients(s: BeamSolution, lo: number): [number, number, number] {
  let c0 = s.M0, c1 = s.V0;
  for (const p of s.beam.points) if (p.a <= lo) { c0 += p.P * p.a; c1 -= p.P; }
  return [c0, c1, -s.beam.uniform / 2];
}

export interface ExtremeValue {
  /** Signed value (deflection downward positive; moment sagging positive). */
  readonly value: number;
  readonly at: number;
}

export interface DeflectionExtreme extends ExtremeValue {
  readonly iterations: number;
  /** |slope| at the reported point (0 at an end with a free slope counts as converged). */
  readonly residual: number;
  readonly converged: boolean;
}

const BISECTION_CAP = 200;

function bisectSlope(s: BeamSolution, lo: number, hi: number): { x: number; iterations: number; converged: boolean } {
  const tol = 1e-14 * s.beam.span;
  let fLo = slopeAt(s, lo);
  let iterations = 0;
  while (hi - lo > tol && iterations < BISECTION_CAP) {
    const mid = 0.5 * (lo + hi);
    const fMid = slopeAt(s, mid);
    if (fMid === 0) return { x: mid, iterations, converged: true };
    if (Math.sign(fMid) === Math.sign(fLo)) { lo = mid; fLo = fMid; } else hi = mid;
    iterations++;
  }
  return { x: 0.5 * (lo + hi), iterations, converged: hi - lo <= tol };
}

/** Largest downward and largest upward deflection with where they occur (exact bracketing). */
export function deflectionExtremes(s: BeamSolution): { down: DeflectionExtreme; up: DeflectionExtreme } {
  const candidates: { x: number; iterations: number; converged: boolean }[] = [];
  const bp = breakpoints(s.beam);
  for (let k = 0; k + 1 < bp.length; k++) {
    const lo = bp[k] as number, hi = bp[k + 1] as number;
    const [c0, c1, c2] = momentCoefficients(s, lo);
    const cuts = [lo, ...quadraticRootsIn(c0, c1, c2, lo, hi), hi];
    for (let j = 0; j + 1 < cuts.length; j++) {
      const a = cuts[j] as number, b = cuts[j + 1] as number;
      candidates.push({ x: a, iterations: 0, converged: true });
      const fa = slopeAt(s, a), fb = slopeAt(s, b);
      if (fa === 0 || fb === 0 || Math.sign(fa) === Math.sign(fb)) continue;
      candidates.push(bisectSlope(s, a, b));
    }
  }
  candidates.push({ x: s.beam.span, iterations: 0, converged: true });
  const pick = (better: (d: number, best: number) => boolean): DeflectionExtreme => {
    let best = candidates[0] as (typeof candidates)[number];
    let bestValue = deflectionAt(s, best.x);
    for (const c of candidates) {
      const d = deflectionAt(s, c.x);
      if (better(d, bestValue)) { best = c; bestValue = d; }
    }
    const interior = best.x > 0 && best.x < s.beam.span;
    const residual = interior ? Math.abs(slopeAt(s, best.x)) : 0;
    return { value: bestValue, at: best.x, iterations: best.iterations, residual, converged: best.converged };
  };
  return { down: pick((d, b) => d > b), up: pick((d, b) => d < b) };
}

/** Largest sagging (positive) and hogging (negative) moment with where they occur (exact). */
export function momentExtremes(s: BeamSolution): { sagging: ExtremeValue; hogging: ExtremeValue } {
  const xs: number[] = [];
  const bp = breakpoints(s.beam);
  for (let k = 0; k + 1 < bp.length; k++) {
    const lo = bp[k] as number, hi = bp[k + 1] as number;
    xs.push(lo);
    const [, c1] = momentCoefficients(s, lo);
    // V = 0 where c1 − w x = 0 (dM/dx = c1 + 2 c2 x).
    if (s.beam.uniform !== 0) {
      const x = c1 / s.beam.uniform;
      if (x > lo && x < hi) xs.push(x);
    }
  }
  xs.push(s.beam.span);
  let sag: ExtremeValue = { value: momentAt(s, 0), at: 0 };
  let hog: ExtremeValue = sag;
  for (const x of xs) {
    const m = momentAt(s, x);
    if (m > sag.value) sag = { value: m, at: x };
    if (m < hog.value) hog = { value: m, at: x };
  }
  return { sagging: sag, hogging: hog };
}

export interface BeamDiagram {
  readonly x: readonly number[];
  readonly deflection: readonly number[];
  readonly moment: readonly number[];
  readonly shear: readonly number[];
}

/** Sampled shape and diagrams for drawing: `samples` even steps plus every load point and `extra` points. */
export function beamDiagram(s: BeamSolution, samples = 200, extra: readonly number[] = []): BeamDiagram {
  invariant(Number.isInteger(samples) && samples >= 2 && samples <= 100_000, 'beamDiagram: samples must be an integer in 2…100000');
  const L = s.beam.span;
  const set = new Set<number>(breakpoints(s.beam));
  for (let i = 0; i <= samples; i++) set.add((L * i) / samples);
  for (const x of extra) if (x >= 0 && x <= L) set.add(x);
  const x = [...set].sort((p, q) => p - q);
  return {
    x,
    deflection: x.map((xi) => deflectionAt(s, xi)),
    moment: x.map((xi) => momentAt(s, xi)),
    shear: x.map((xi) => shearAt(s, xi)),
  };
}
