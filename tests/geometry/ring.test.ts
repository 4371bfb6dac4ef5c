import { describe, expect, it } from 'vitest';
import { arcOfSegment, reverseRing, ringFromPoints, ringSignedArea, ringVertexCount } from '../../core/geometry/index.ts';
import { circle, pointsOf, square } from './helpers.ts';

describe('ringSignedArea', () => {
  it('is +b·h for a counter-clockwise rectangle and −b·h clockwise (shoelace, exact arithmetic)', () => {
    expect(ringSignedArea(square(0, 0, 3, 2))).toBe(6);
    expect(ringSignedArea(reverseRing(square(0, 0, 3, 2)))).toBe(-6);
  });

  it('keeps its digits far from the origin: a 100 × 200 rectangle at (1.2e6, −7.7e6) has area 20 000 exactly (docs/methods.md §1.3)', () => {
    expect(ringSignedArea(square(1.2e6, -7.7e6, 1.2e6 + 100, -7.7e6 + 200))).toBe(20000);
  });

  it('gives π r² for a circle made of two bulge-1 arcs (closed form, to 1e-15 relative)', () => {
    const r = 37.5;
    expect(Math.abs(ringSignedArea(circle(12, -4, r)) / (Math.PI * r * r) - 1)).toBeLessThan(1e-15);
  });

  it('gives π r²/2 for a half disc: diameter plus one bulge-1 arc (closed form)', () => {
    // Vertices (r,0) → (−r,0) along the upper arc (CCW), then back along the diameter.
    const half = ringFromPoints([[2, 0], [-2, 0]], [1, 0]);
    expect(ringSignedArea(half)).toBeCloseTo(2 * Math.PI, 14);
  });

  it('adds the circular segment r²(θ − sin θ)/2 for a shallow arc without cancellation (Roark, circular segment)', () => {
    // Chord of length 2 from (−1,0) to (1,0); sweep θ = 4·atan(b); the segment lies below (CCW about centre above).
    const b = 1e-4;
    const theta = 4 * Math.atan(b);
    const r = (2 * (1 + b * b)) / (4 * b);
    // Series of r²(θ − sin θ)/2 to four terms, enough for θ = 4e-4 (next term ~θ⁹r²/362880).
    const series = (r * r * (theta ** 3 / 6 - theta ** 5 / 120 + theta ** 7 / 5040)) / 2;
    const shape = ringFromPoints([[-1, 0], [1, 0], [0, 1]], [b, 0, 0]);
    expect(Math.abs(ringSignedArea(shape) - (1 + series))).toBeLessThan(1e-15);
  });
});

describe('reverseRing', () => {
  it('reverses the vertices and negates the bulges so the same arcs are traced backwards (area sign flips, magnitude kept)', () => {
    const ring = ringFromPoints([[0, 0], [4, 0], [4, 3], [0, 3]], [0, 0.3, 0, -0.2]);
    const back = reverseRing(ring);
    expect(pointsOf(back)).toEqual([[0, 3], [4, 3], [4, 0], [0, 0]]);
    // Old segment 1 ((4,0)→(4,3), b 0.3) is new segment 1 ((4,3)→(4,0)) with b −0.3; old 3 ((0,3)→(0,0)) is new 3.
    expect(Array.from(back.bulge ?? [])).toEqual([0, -0.3, 0, 0.2]);
    expect(ringSignedArea(back)).toBeCloseTo(-ringSignedArea(ring), 13);
    expect(reverseRing(back)).toEqual(ring);
  });
});

describe('arcOfSegment', () => {
  it('recovers a quarter circle from bulge tan(π/8): centre (0,0), r 5, start angle 0, sweep +π/2 (docs/methods.md §2.4)', () => {
    const ring = ringFromPoints([[5, 0], [0, 5], [0, 0]], [Math.tan(Math.PI / 8), 0, 0]);
    const arc = arcOfSegment(ring, 0);
    expect(arc).not.toBeNull();
    expect(arc?.cx).toBeCloseTo(0, 13);
    expect(arc?.cy).toBeCloseTo(0, 13);
    expect(arc?.r).toBeCloseTo(5, 13);
    expect(arc?.t0).toBeCloseTo(0, 14);
    expect(arc?.sweep).toBeCloseTo(Math.PI / 2, 14);
    expect(arcOfSegment(ring, 1)).toBeNull();
  });

  it('gives a clockwise sweep for a negative bulge (centre on the other side of the chord)', () => {
    const ring = ringFromPoints([[5, 0], [0, 5], [5, 5]], [-Math.tan(Math.PI / 8), 0, 0]);
    const arc = arcOfSegment(ring, 0);
    expect(arc?.cx).toBeCloseTo(5, 13);
    expect(arc?.cy).toBeCloseTo(5, 13);
    expect(arc?.sweep).toBeCloseTo(-Math.PI / 2, 14);
  });

  it('counts vertices without the closing vertex', () => {
    expect(ringVertexCount(square(0, 0, 1, 1))).toBe(4);
    expect(ringVertexCount(circle(0, 0, 1))).toBe(2);
  });
});
