/**
 * Parts stay correct when placed: rotating a part by θ obeys the second-moment tensor law, and
 * mirroring (x → −x) keeps A, Ix, Iy and changes the sign of Ixy (Gere & Timoshenko, Mechanics of
 * Materials, §12.8–12.9; docs/methods.md §3). Placement through core/geometry transformRegion.
 */
import { describe, expect, it } from 'vitest';
import { transformRegion } from '../../core/geometry/index.ts';
import { getPartType } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';

const PARTS: readonly (readonly [string, Record<string, number>])[] = [
  ['angle', { d: 5, b: 3, t: 0.5, r: 0.4, rt: 0.2 }],
  ['z-shape', { d: 8, bf: 3, tw: 0.25, tf: 0.3, r: 0.25 }],
  ['channel', { d: 6, bf: 2.03, tw: 0.314, tf: 0.343, r: 0.33, slope: 2 / 12 }],
  ['rect-tube', { H: 12, B: 6, t: 0.465 }],
  ['tee', { d: 6.11, bf: 6.49, tw: 0.23, tf: 0.38, r: 0.3 }],
  ['lipped-z', { D: 8, B: 2.5, B2: 2.25, L: 0.9, t: 0.075, R: 0.1875, lipAngle: 50 }],
  ['lipped-channel', { D: 8, B: 2.5, B2: 2, L: 0.625, t: 0.075, R: 0.1125 }],
];

function region(shape: string, params: Record<string, number>): Region {
  return getPartType(shape)!.region(params).region;
}

describe('parts under rotation and mirroring', () => {
  for (const [shape, params] of PARTS) {
    for (const deg of [30, 90, 137.5]) {
      it(`${shape} rotated ${deg}°: Ix' = I_avg + I_diff·cos2θ + Ixy·sin2θ, Ixy' = −I_diff·sin2θ + Ixy·cos2θ, A and I1, I2 unchanged`, () => {
        const base = sectionProperties(region(shape, params));
        const turned = sectionProperties(transformRegion(region(shape, params), { x: 3, y: -2, rotationDeg: deg, mirror: false }));
        const t = (2 * deg * Math.PI) / 180;
        const avg = (base.Ix + base.Iy) / 2;
        const diff = (base.Ix - base.Iy) / 2;
        const scale = base.Ix + base.Iy;
        // Rotating the body by +θ is rotating the axes by −θ in the transformation law.
        expect(Math.abs(turned.Ix - (avg + diff * Math.cos(t) + base.Ixy * Math.sin(t))) / scale).toBeLessThan(1e-11);
        expect(Math.abs(turned.Iy - (avg - diff * Math.cos(t) - base.Ixy * Math.sin(t))) / scale).toBeLessThan(1e-11);
        expect(Math.abs(turned.Ixy - (-diff * Math.sin(t) + base.Ixy * Math.cos(t))) / scale).toBeLessThan(1e-11);
        expect(Math.abs(turned.area / base.area - 1)).toBeLessThan(1e-12);
        expect(Math.abs(turned.I1 - base.I1) / scale).toBeLessThan(1e-11);
        expect(Math.abs(turned.I2 - base.I2) / scale).toBeLessThan(1e-11);
      });
    }

    it(`${shape} mirrored: same A, Ix, Iy; Ixy changes sign; centroid x changes sign`, () => {
      const base = sectionProperties(region(shape, params));
      const mirrored = sectionProperties(transformRegion(region(shape, params), { x: 0, y: 0, rotationDeg: 0, mirror: true }));
      const scale = base.Ix + base.Iy;
      expect(Math.abs(mirrored.area / base.area - 1)).toBeLessThan(1e-12);
      expect(Math.abs(mirrored.Ix - base.Ix) / scale).toBeLessThan(1e-12);
      expect(Math.abs(mirrored.Iy - base.Iy) / scale).toBeLessThan(1e-12);
      expect(Math.abs(mirrored.Ixy + base.Ixy) / scale).toBeLessThan(1e-12);
      expect(Math.abs(mirrored.cx + base.cx)).toBeLessThan(1e-12);
    });
  }
});
