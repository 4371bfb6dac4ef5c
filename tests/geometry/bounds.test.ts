import { describe, expect, it } from 'vitest';
import { extremeAlong, regionBounds, ringFromPoints } from '../../core/geometry/index.ts';
import { circle, piece, square } from './helpers.ts';

describe('regionBounds', () => {
  it('reaches the arc extreme points of a circle of two arcs: centre ± r on both axes (docs/methods.md §2.4)', () => {
    const b = regionBounds([piece(circle(3, -2, 5))]);
    expect(b?.minX).toBeCloseTo(-2, 13);
    expect(b?.maxX).toBeCloseTo(8, 13);
    expect(b?.minY).toBeCloseTo(-7, 13);
    expect(b?.maxY).toBeCloseTo(3, 13);
  });

  it('uses only the end points when the extreme direction is outside the swept interval', () => {
    // Quarter arc from (5,0) to (0,5) about the origin (sweep 0 → π/2), closed through (0,0) and (5,-1):
    // directions −x and −y lie outside the sweep, so minX and minY come from vertices, exactly.
    const quarter = ringFromPoints([[5, 0], [0, 5], [0, 0], [5, -1]], [Math.tan(Math.PI / 8), 0, 0, 0]);
    const b = regionBounds([piece(quarter)]);
    expect(b?.minX).toBe(0);
    expect(b?.minY).toBe(-1);
    expect(b?.maxX).toBeCloseTo(5, 14);
    expect(b?.maxY).toBeCloseTo(5, 14);
    // A bulge of tan(π/16) from (5,0) to (0,5) is a shallow arc about a far centre: no axis direction
    // falls inside its sweep of π/4, so its box is the box of its end points.
    const shallow = ringFromPoints([[5, 0], [0, 5], [0, 0]], [Math.tan(Math.PI / 16), 0, 0]);
    expect(regionBounds([piece(shallow)])).toEqual({ minX: 0, minY: 0, maxX: 5, maxY: 5 });
  });

  it('takes the union of the pieces and is null for an empty region', () => {
    expect(regionBounds([piece(square(0, 0, 1, 1)), piece(square(4, -3, 6, -1))])).toEqual({ minX: 0, minY: -3, maxX: 6, maxY: 1 });
    expect(regionBounds([])).toBeNull();
  });
});

describe('extremeAlong', () => {
  it('finds the circle point at 45°: projection r on the unit direction, ±r on the opposite side', () => {
    const u = Math.SQRT1_2;
    const e = extremeAlong([piece(circle(0, 0, 2))], u, u);
    expect(e?.max).toBeCloseTo(2, 13);
    expect(e?.min).toBeCloseTo(-2, 13);
    expect(e?.maxAt[0]).toBeCloseTo(Math.SQRT2, 13);
    expect(e?.maxAt[1]).toBeCloseTo(Math.SQRT2, 13);
  });

  it('finds the corner of a square along its diagonal: (a/2)·√2 for side a (geometry)', () => {
    const u = Math.SQRT1_2;
    const e = extremeAlong([piece(square(-1, -1, 1, 1))], u, -u);
    expect(e?.max).toBeCloseTo(Math.SQRT2, 15);
    expect(e?.maxAt).toEqual([1, -1]);
    expect(e?.minAt).toEqual([-1, 1]);
  });

  it('ignores holes (they lie inside the outer ring)', () => {
    const plate = [piece(square(0, 0, 10, 10), [ringFromPoints([[2, 2], [2, 4], [4, 4], [4, 2]])])];
    expect(extremeAlong(plate, 1, 0)).toMatchObject({ max: 10, min: 0 });
  });
});
