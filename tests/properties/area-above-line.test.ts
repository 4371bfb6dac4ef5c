// Area and first moment above a horizontal cut (areaAboveLine), as used for the shear formula's
// Q = ∫_above (y − c) dA. Closed forms: rectangle b·h cut at mid-depth, Q = b·h²/8 (Gere &
// Timoshenko, shear formula); solid circle cut through its centre, Q = 2r³/3 (Gere &
// Timoshenko); and an identity: the parts above and below a cut add up to the whole.
import { describe, expect, it } from 'vitest';
import { ringFromPoints } from '../../core/geometry/ring.ts';
import type { Region } from '../../core/geometry/types.ts';
import { areaAboveLine } from '../../core/properties/plastic.ts';
import { regionIntegrals } from '../../core/properties/integrals.ts';

const rect = (x0: number, y0: number, b: number, h: number): Region => [{ outer: ringFromPoints([[x0, y0], [x0 + b, y0], [x0 + b, y0 + h], [x0, y0 + h]]), holes: [] }];
/** Circle of radius r centred at (cx, cy): two semicircles, bulge 1 each, counter-clockwise. */
const circle = (cx: number, cy: number, r: number): Region => [{ outer: { xy: new Float64Array([cx + r, cy, cx - r, cy]), bulge: new Float64Array([1, 1]) }, holes: [] }];

describe('areaAboveLine', () => {
  it('a 120 × 300 rectangle cut at mid-depth: A = b·h/2, Q = b·h²/8', () => {
    const r = areaAboveLine(rect(-7, 40, 120, 300), 190);
    expect(r.area).toBeCloseTo(120 * 150, 9);
    expect(r.firstMoment / ((120 * 300 ** 2) / 8)).toBeCloseTo(1, 13);
  });
  it('a circle of radius 35 cut through its centre: Q = 2r³/3 (arcs exact)', () => {
    const r = areaAboveLine(circle(500, -20, 35), -20);
    expect(r.area / ((Math.PI * 35 ** 2) / 2)).toBeCloseTo(1, 13);
    expect(r.firstMoment / ((2 * 35 ** 3) / 3)).toBeCloseTo(1, 13);
  });
  it('nothing above the top, the whole section below the bottom', () => {
    expect(areaAboveLine(rect(0, 0, 10, 20), 25).area).toBe(0);
    const whole = areaAboveLine(rect(0, 0, 10, 20), -5);
    expect(whole.area).toBeCloseTo(200, 12);
    expect(whole.firstMoment).toBeCloseTo(200 * 15, 10); // ∫(y + 5) dA = A·(ȳ + 5)
  });
  it('above plus below a cut gives the whole area and first moment (an L with a hole, cut at 33.3)', () => {
    const region: Region = [{ outer: ringFromPoints([[0, 0], [80, 0], [80, 12], [12, 12], [12, 100], [0, 100]]), holes: [ringFromPoints([[3, 50], [3, 60], [8, 60], [8, 50]])] }];
    const c = 33.3;
    const above = areaAboveLine(region, c);
    // Below the cut is above it once the section is turned upside down (y → −y, the cut to −c).
    const flipped: Region = region.map((p) => ({ outer: ringFromPoints(pointsOf(p.outer.xy).map(([x, y]) => [x, -y] as [number, number]).reverse()), holes: p.holes.map((h) => ringFromPoints(pointsOf(h.xy).map(([x, y]) => [x, -y] as [number, number]).reverse())) }));
    const below = areaAboveLine(flipped, -c);
    const whole = regionIntegrals(region, 0, c);
    expect(above.area + below.area).toBeCloseTo(whole.A, 9);
    expect(above.firstMoment - below.firstMoment).toBeCloseTo(whole.Qx, 7);
  });
});

function pointsOf(xy: Float64Array): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < xy.length; i += 2) out.push([xy[i]!, xy[i + 1]!]);
  return out;
}
