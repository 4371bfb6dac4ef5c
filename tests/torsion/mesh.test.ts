/**
 * The mesher (core/mesh) by its contract: quality (minimum angle ≥ 20°, the Ruppert/Chew target
 * band of docs/methods.md §7.8), exact coverage of polygonal regions (holes removed), merging of
 * touching parts, element layers through thin walls, grading at re-entrant corners, typed
 * errors for bad input, caps, cancellation. Torsion checks here use the rectangle series
 * (Timoshenko & Goodier) and the fact that disconnected pieces' J values add (docs/methods.md §7.4).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { meshRegion, MeshInputError, MeshRefinementError } from '../../core/mesh/index.ts';
import { TorsionCancelledError, TorsionSolveError, torsionAnalysis, torsionConstants } from '../../core/torsion/index.ts';
import { annulus, polygon, rectangle, rectangleSeriesJ } from './shapes.ts';
import { filletedWShape } from './w-shape.ts';

function meshArea(xy: Float64Array, tri: Int32Array): number {
  let a = 0;
  for (let t = 0; t < tri.length; t += 3) {
    const [i, j, k] = [tri[t] ?? 0, tri[t + 1] ?? 0, tri[t + 2] ?? 0];
    a += ((xy[2 * j]! - xy[2 * i]!) * (xy[2 * k + 1]! - xy[2 * i + 1]!) - (xy[2 * k]! - xy[2 * i]!) * (xy[2 * j + 1]! - xy[2 * i + 1]!)) / 2;
  }
  return a;
}

describe('mesh quality and coverage', () => {
  const cases = {
    tube: [{ outer: rectangle(0, 0, 200, 100).outer, holes: [rectangle(5, 5, 195, 95).outer] }],
    'W14X90 with fillets': [filletedWShape({ d: 14, bf: 14.5, tw: 0.44, tf: 0.71, r: 0.6 })],
    annulus: [annulus(50, 40)],
    'equilateral triangle': [polygon([[0, 0], [1, 0], [0.5, Math.sqrt(3) / 2]])],
  };
  for (const [name, region] of Object.entries(cases)) {
    it(`${name}: every angle ≥ 20°, every triangle counter-clockwise`, () => {
      const m = meshRegion(region);
      expect(m.minAngleDeg).toBeGreaterThanOrEqual(20);
      for (let t = 0; t < m.triangles.length; t += 3) expect(meshArea(m.xy, m.triangles.subarray(t, t + 3))).toBeGreaterThan(0);
    });
  }
  it('a tube mesh covers exactly the material: area 200·100 − 190·90, the hole left empty', () => {
    const m = meshRegion(cases.tube);
    expect(meshArea(m.xy, m.triangles)).toBeCloseTo(200 * 100 - 190 * 90, 6);
  });
  it('at least 3 element layers through a thin wall at the default setting', () => {
    const a = torsionAnalysis([rectangle(0, 0, 10, 1)]);
    for (const x of [0.37, 2.51, 5.03, 9.71]) {
      let crossed = 0;
      for (let t = 0; t < a.triangles.length; t += 3) {
        const xs = [0, 1, 2].map((k) => a.mesh.xy[2 * (a.triangles[t + k] ?? 0)] ?? 0);
        if (Math.min(...xs) < x && Math.max(...xs) > x) crossed++;
      }
      expect(crossed).toBeGreaterThanOrEqual(3);
    }
  });
  it('elements are graded finer at a sharp re-entrant corner (mean edge there < half the leg mean)', () => {
    const m = meshRegion([polygon([[0, 0], [100, 0], [100, 10], [10, 10], [10, 100], [0, 100]])]);
    expect(m.reentrantCorners).toBe(1);
    let near = 0, nearN = 0, far = 0, farN = 0;
    for (let t = 0; t < m.triangles.length; t += 3) {
      for (let k = 0; k < 3; k++) {
        const i = m.triangles[t + k] ?? 0;
        const j = m.triangles[t + ((k + 1) % 3)] ?? 0;
        const len = Math.hypot(m.xy[2 * j]! - m.xy[2 * i]!, m.xy[2 * j + 1]! - m.xy[2 * i + 1]!);
        const d = Math.hypot(m.xy[2 * i]! - 10, m.xy[2 * i + 1]! - 10);
        if (d < 1e-9) { near += len; nearN++; }
        if (m.xy[2 * i]! > 60) { far += len; farN++; }
      }
    }
    expect(near / nearN).toBeLessThan(0.5 * (far / farN));
  });
});

describe('several pieces', () => {
  it('two touching squares are merged into one component with the J of the 2:1 rectangle (0.1 %)', () => {
    const r = torsionConstants([rectangle(0, 0, 1, 1), rectangle(1, 0, 2, 1)]);
    expect(r.components).toBe(1);
    expect(Math.abs(r.J / rectangleSeriesJ(2, 1) - 1)).toBeLessThan(1e-3);
  });
  it('a T-junction (a part touching half of another part\'s edge) is merged too', () => {
    expect(torsionConstants([rectangle(0, 0, 2, 1), rectangle(0.5, 1, 1.5, 2)]).components).toBe(1);
  });
  it('two separate squares: 2 components and J adds (2 × the square series, 0.1 %)', () => {
    const r = torsionConstants([rectangle(0, 0, 1, 1), rectangle(3, 0, 4, 1)]);
    expect(r.components).toBe(2);
    expect(Math.abs(r.J / (2 * rectangleSeriesJ(1, 1)) - 1)).toBeLessThan(1e-3);
  });
});

describe('bad input, caps and cancellation', () => {
  const codeOf = (f: () => unknown): string | undefined => {
    try {
      f();
    } catch (err) {
      return err instanceof MeshInputError ? err.diagnostic.code : `other: ${String(err)}`;
    }
    return undefined;
  };
  it('a non-finite coordinate is reported with its polygon, ring and vertex', () => {
    const bad = rectangle(0, 0, 1, 1);
    bad.outer.xy[3] = Number.NaN;
    expect(codeOf(() => meshRegion([bad]))).toBe('non-finite');
  });
  it('a self-crossing (bow-tie) ring is rejected as self-intersection', () => {
    expect(codeOf(() => meshRegion([polygon([[0, 0], [2, 2], [2, 0], [0, 1]])]))).toBe('self-intersection');
  });
  it('two identical overlapping polygons are rejected as overlap', () => {
    expect(codeOf(() => meshRegion([rectangle(0, 0, 1, 1), rectangle(0, 0, 1, 1)]))).toBe('overlap');
  });
  it('an empty region and a degenerate ring are rejected', () => {
    expect(codeOf(() => meshRegion([]))).toBe('empty-section');
    expect(codeOf(() => meshRegion([polygon([[0, 0], [1, 0], [2, 0]])]))).toBe('zero-area');
  });
  it('out-of-range torsion options are rejected as bad-parameter, naming the option', () => {
    expect(codeOf(() => torsionConstants([rectangle(0, 0, 1, 1)], { layers: 0.2 }))).toBe('bad-parameter');
    expect(() => torsionConstants([rectangle(0, 0, 1, 1)], { tolerance: 0 })).toThrow(/tolerance/);
  });
  it('the point cap throws MeshRefinementError', () => {
    expect(() => meshRegion([rectangle(0, 0, 100, 1)], { maxPoints: 50 })).toThrow(MeshRefinementError);
  });
  it('an iteration cap too small throws TorsionSolveError with its iterations and residual', () => {
    try {
      torsionConstants([rectangle(0, 0, 2, 1)], { maxIterations: 3 });
      expect.unreachable('the solve should have stopped');
    } catch (err) {
      expect(err).toBeInstanceOf(TorsionSolveError);
      const e = err as TorsionSolveError;
      expect(e.iterations).toBe(3);
      expect(e.relativeResidual).toBeGreaterThan(1e-10);
    }
  });
  it('onProgress returning false cancels with TorsionCancelledError; fractions stay in 0..1', () => {
    const seen: number[] = [];
    expect(() => torsionConstants([rectangle(0, 0, 10, 1)], { onProgress: (f) => { seen.push(f); return seen.length < 3; } })).toThrow(TorsionCancelledError);
    expect(seen.every((f) => f >= 0 && f <= 1)).toBe(true);
  });
  it('no mesher or torsion module imports earcut (earcut is not a conforming mesh)', () => {
    for (const dir of ['../../core/mesh/', '../../core/torsion/']) {
      for (const f of readdirSync(new URL(dir, import.meta.url))) {
        expect(readFileSync(new URL(dir + f, import.meta.url), 'utf8')).not.toMatch(/from ['"]earcut['"]/);
      }
    }
  });
});

describe('refineUniform', () => {
  it('splits each triangle into four similar ones: 4× the triangles, same area, same smallest angle', async () => {
    const { refineUniform, smallestAngleDeg } = await import('../../core/mesh/index.ts');
    const m = meshRegion([polygon([[0, 0], [3, 0], [3, 1], [1, 1], [1, 2], [0, 2]])]);
    const r = refineUniform(m);
    expect(r.triangles.length).toBe(4 * m.triangles.length);
    expect(meshArea(r.xy, r.triangles)).toBeCloseTo(4, 12);
    expect(smallestAngleDeg(r.xy, r.triangles)).toBeCloseTo(m.minAngleDeg, 9);
  });
});
