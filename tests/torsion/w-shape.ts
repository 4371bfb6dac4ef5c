/**
 * Test helper: a rolled W shape with quarter-circle root fillets, built from the tabulated
 * dimensions d, bf, tw, tf and the fillet radius r = kdes − tf (the modelling convention named
 * in the AISC Shapes Database notes; AISC gives no radius). Centred on the origin, web on the
 * y axis. Outer ring counter-clockwise; each concave fillet runs clockwise about its centre,
 * bulge −tan(22.5°) (DXF bulge = tan(sweep/4), docs/methods.md §2.4).
 */
import type { Polygon } from '../../core/geometry/types.ts';

export interface WDimensions {
  readonly d: number;
  readonly bf: number;
  readonly tw: number;
  readonly tf: number;
  readonly r: number;
}

export function filletedWShape({ d, bf, tw, tf, r }: WDimensions): Polygon {
  const X = bf / 2;
  const Y = d / 2;
  const w = tw / 2;
  const f = -Math.tan(Math.PI / 8);
  // [x, y, bulge of the segment that starts here]
  const v: [number, number, number][] = [
    [-X, -Y, 0], [X, -Y, 0], [X, -Y + tf, 0], [w + r, -Y + tf, f], [w, -Y + tf + r, 0],
    [w, Y - tf - r, f], [w + r, Y - tf, 0], [X, Y - tf, 0], [X, Y, 0], [-X, Y, 0], [-X, Y - tf, 0],
    [-w - r, Y - tf, f], [-w, Y - tf - r, 0], [-w, -Y + tf + r, f], [-w - r, -Y + tf, 0], [-X, -Y + tf, 0],
  ];
  return {
    outer: { xy: Float64Array.from(v.flatMap(([x, y]) => [x, y])), bulge: Float64Array.from(v.map(([, , b]) => b)) },
    holes: [],
  };
}
