/**
 * The polygonised limit of an exact-arc part converges to the arc result like O(Δφ²)
 * (docs/methods.md §11, invariance tests): the chords of an arc cut off circular segments whose area
 * is ~ r²Δφ³/12 each, so the total error scales with the sagitta r(1 − cos(Δφ/2)) ≈ rΔφ²/8.
 * Quartering the sagitta halves Δφ and should cut the error by a factor of about 4.
 */
import { describe, expect, it } from 'vitest';
import { flattenRing } from '../../core/geometry/index.ts';
import type { Region, Ring } from '../../core/geometry/types.ts';
import { getPartType } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';

function polygonised(region: Region, sagitta: number): Region {
  const flat = (ring: Ring): Ring => ({ xy: flattenRing(ring, sagitta).xy });
  return region.map((p) => ({ outer: flat(p.outer), holes: p.holes.map(flat) }));
}

const CASES: readonly (readonly [string, string, Record<string, number>])[] = [
  ['W14X90 with root fillets r = 0.6', 'i-shape', { d: 14, bf: 14.5, tw: 0.44, tf: 0.71, r: 0.6 }],
  ['pipe OD 8.625, t 0.3', 'pipe', { OD: 8.625, t: 0.3 }],
  ['HSS 12 × 6 × 0.465 with 2t corners', 'rect-tube', { H: 12, B: 6, t: 0.465 }],
];

describe('polygonised parts converge to the exact-arc values', () => {
  for (const [name, shape, params] of CASES) {
    it(`${name}: A and Ix errors fall by ~4× per quartering of the sagitta and extrapolate to the exact value`, () => {
      const region = getPartType(shape)!.region(params).region;
      const exact = sectionProperties(region);
      const sagittas = [1e-2, 2.5e-3, 6.25e-4, 1.5625e-4];
      const values = sagittas.map((s) => sectionProperties(polygonised(region, s)));
      const errors = values.map((p) => ({ A: Math.abs(p.area / exact.area - 1), Ix: Math.abs(p.Ix / exact.Ix - 1) }));
      for (let k = 1; k < errors.length; k++) {
        for (const key of ['A', 'Ix'] as const) {
          const ratio = errors[k - 1]![key] / errors[k]![key];
          // O(Δφ²): ratio → 4; the piece count is an integer ceiling, so allow 2.5–6.
          expect(ratio, `${key} ratio at sagitta ${sagittas[k]}`).toBeGreaterThan(2.5);
          expect(ratio, `${key} ratio at sagitta ${sagittas[k]}`).toBeLessThan(6);
        }
      }
      // Richardson extrapolation of the two finest levels (error ∝ sagitta, ratio 4) lands on the
      // exact-arc value far closer than either polygon does.
      const [coarse, fine] = [values[values.length - 2]!, values[values.length - 1]!];
      const limit = fine.Ix + (fine.Ix - coarse.Ix) / 3;
      expect(Math.abs(limit / exact.Ix - 1)).toBeLessThan(errors[errors.length - 1]!.Ix / 10);
    });
  }
});
