/**
 * Parametric part types: exact geometry (vertex counts, arc sense, tangency, areas by an
 * independent formula), closed-form section properties, and diagnostics for bad dimensions.
 * Sources are named beside each check.
 */
import { describe, expect, it } from 'vitest';
import { validateRegion } from '../../core/geometry/index.ts';
import { defaultParams, getPartType, paramsInUnit, partTypes, shapeRegion } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { arcCentre, exactArea, relativeError, ringPoint, vertexCount } from './oracle.ts';

function build(shape: string, params: Record<string, number>): Region {
  const built = getPartType(shape)!.region(params);
  expect(built.diagnostics).toEqual([]);
  return built.region;
}

function messages(shape: string, params: Record<string, number>): string {
  return getPartType(shape)!.region(params).diagnostics.map((d) => d.message).join(' | ');
}

describe('every part type', () => {
  it('lists the ten trade part types, the double angle, the four cold-formed parts and glulam, LVL, PSL, each with a documented origin', () => {
    expect(partTypes().map((t) => t.id)).toEqual(['plate', 'round-bar', 'pipe', 'rect-tube', 'i-shape', 'channel', 'angle', 'double-angle', 'tee', 'z-shape', 'lumber', 'lipped-channel', 'lipped-z', 'hat', 'track', 'glulam', 'lvl', 'psl']);
    for (const t of partTypes()) expect(t.origin, t.id).toMatch(/\w/);
  });

  it('builds a valid region with counter-clockwise outer rings from its defaults', () => {
    for (const t of partTypes()) {
      const region = build(t.id, defaultParams(t));
      expect(validateRegion(region), t.id).toEqual([]);
      for (const p of region) expect(exactArea([{ outer: p.outer, holes: [] }]), t.id).toBeGreaterThan(0);
      // The exact-arc area of core/properties equals the independent shoelace + circular-segment sum.
      expect(relativeError(sectionProperties(region).area, exactArea(region)), t.id).toBeLessThan(1e-12);
    }
  });

  it('reports an unknown dimension, a missing one, a non-finite one and a non-positive one by symbol', () => {
    expect(messages('plate', { b: 12, t: 0.5, bb: 3 })).toContain('unknown dimension "bb"');
    expect(messages('plate', { b: 12 })).toContain('t (thickness) is missing');
    expect(messages('plate', { b: Number.NaN, t: 1 })).toContain('b = NaN is not a finite number');
    expect(messages('plate', { b: -2, t: 1 })).toContain('b = -2 must be greater than 0');
  });
});

describe('plate, round bar, pipe, tube (exact arcs)', () => {
  it('plate b × t has 4 vertices, A = bt, Ix = bt³/12, Iy = tb³/12 (Gere & Timoshenko, App. D)', () => {
    const region = build('plate', { b: 12, t: 0.5 });
    expect(vertexCount(region)).toBe(4);
    const p = sectionProperties(region);
    expect(p.area).toBe(6);
    expect(relativeError(p.Ix, (12 * 0.5 ** 3) / 12)).toBeLessThan(1e-12);
    expect(relativeError(p.Iy, (0.5 * 12 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('a plate with corner radius r has 8 vertices, convex CCW arcs (bulge tan(π/8)) and A = bt − (4 − π)r² (exact composition)', () => {
    const region = build('plate', { b: 6, t: 2, r: 0.5 });
    expect(vertexCount(region)).toBe(8);
    const bulges = Array.from(region[0]!.outer.bulge!).filter((b) => b !== 0);
    expect(bulges).toHaveLength(4);
    for (const b of bulges) expect(b).toBeCloseTo(Math.tan(Math.PI / 8), 14);
    expect(relativeError(exactArea(region), 12 - (4 - Math.PI) * 0.25)).toBeLessThan(1e-14);
    expect(relativeError(sectionProperties(region).area, 12 - (4 - Math.PI) * 0.25)).toBeLessThan(1e-13);
  });

  it('a 2 × 2 plate with r = 1 drops its zero-length edges: 4 quarter arcs, A = π and Ix = π/4 (a unit circle)', () => {
    const region = build('plate', { b: 2, t: 2, r: 1 });
    expect(vertexCount(region)).toBe(4);
    expect(validateRegion(region)).toEqual([]);
    const p = sectionProperties(region);
    expect(relativeError(p.area, Math.PI)).toBeLessThan(1e-13);
    expect(relativeError(p.Ix, Math.PI / 4)).toBeLessThan(1e-13);
  });

  it('touching pieces stay a valid region: three lumber plies, double angle with no gap', () => {
    expect(validateRegion(build('lumber', { b: 2, d: 10, plies: 3 }))).toEqual([]);
    expect(validateRegion(build('double-angle', { d: 4, b: 4, t: 0.5, gap: 0 }))).toEqual([]);
  });

  it('round bar: 2 arc segments, A = πd²/4 and Ix = Iy = πd⁴/64 to 1e-12 (Gere & Timoshenko, App. D)', () => {
    const d = 2.75;
    const region = build('round-bar', { d });
    expect(vertexCount(region)).toBe(2);
    const p = sectionProperties(region);
    expect(relativeError(p.area, (Math.PI * d * d) / 4)).toBeLessThan(1e-12);
    expect(relativeError(p.Ix, (Math.PI * d ** 4) / 64)).toBeLessThan(1e-12);
    expect(relativeError(p.Iy, (Math.PI * d ** 4) / 64)).toBeLessThan(1e-12);
  });

  it('pipe: bore is a clockwise circle; Ix = π(OD⁴ − ID⁴)/64 and Zx = (OD³ − ID³)/6 (Roark, Table A.1)', () => {
    const OD = 8.625;
    const t = 0.3;
    const ID = OD - 2 * t;
    const region = build('pipe', { OD, t });
    const hole = region[0]!.holes[0]!;
    expect(Array.from(hole.bulge!)).toEqual([-1, -1]);
    const p = sectionProperties(region);
    expect(relativeError(p.area, (Math.PI * (OD ** 2 - ID ** 2)) / 4)).toBeLessThan(1e-12);
    expect(relativeError(p.Ix, (Math.PI * (OD ** 4 - ID ** 4)) / 64)).toBeLessThan(1e-12);
    expect(relativeError(p.Zx, (OD ** 3 - ID ** 3) / 6)).toBeLessThan(1e-9);
  });

  it('rect tube: outside radius defaults to 2t, inside radius t; A = BH − (4−π)(2t)² − [(B−2t)(H−2t) − (4−π)t²] (exact composition)', () => {
    const H = 12;
    const B = 6;
    const t = 0.465;
    const region = build('rect-tube', { H, B, t });
    expect(vertexCount(region)).toBe(16);
    const expected = B * H - (4 - Math.PI) * (2 * t) ** 2 - ((B - 2 * t) * (H - 2 * t) - (4 - Math.PI) * t * t);
    expect(relativeError(sectionProperties(region).area, expected)).toBeLessThan(1e-12);
    // The inner corner arcs run clockwise (a hole's convex-to-the-bore corners).
    for (const b of Array.from(region[0]!.holes[0]!.bulge!).filter((x) => x !== 0)) expect(b).toBeLessThan(0);
  });

  it('rect tube with r = 0 equals the difference of two rectangles: Ix = (BH³ − bh³)/12 (Gere & Timoshenko)', () => {
    const p = sectionProperties(build('rect-tube', { H: 10, B: 4, t: 0.5, r: 0 }));
    expect(relativeError(p.Ix, (4 * 1000 - 3 * 9 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('names the dimension that makes a plate, pipe or tube impossible', () => {
    expect(messages('plate', { b: 2, t: 1, r: 0.6 })).toContain('corner radius r = 0.6 is more than half of the smaller side 1');
    expect(messages('pipe', { OD: 2, t: 1 })).toContain('wall t = 1 is at least half of OD = 2');
    expect(messages('rect-tube', { H: 4, B: 2, t: 1.2 })).toContain('wall t = 1.2 is at least half of the smaller side 2');
  });
});

describe('rolled shapes', () => {
  const w = { d: 14, bf: 14.5, tw: 0.44, tf: 0.71 };

  it('sharp i-shape: 12 vertices, A = 2·bf·tf + (d − 2tf)·tw exactly (composition of rectangles)', () => {
    const region = build('i-shape', w);
    expect(vertexCount(region)).toBe(12);
    expect(relativeError(exactArea(region), 2 * 14.5 * 0.71 + (14 - 1.42) * 0.44)).toBeLessThan(1e-14);
  });

  it('filleted i-shape: 16 vertices, four CW root fillets (bulge −tan(π/8)) centred r from both the web and the flange', () => {
    const r = 0.6;
    const region = build('i-shape', { ...w, r });
    const ring = region[0]!.outer;
    expect(vertexCount(region)).toBe(16);
    const fillets = Array.from(ring.bulge!).flatMap((b, i) => (b === 0 ? [] : [i]));
    expect(fillets).toHaveLength(4);
    for (const i of fillets) {
      expect(ring.bulge![i]).toBeCloseTo(-Math.tan(Math.PI / 8), 14);
      const [cx, cy] = arcCentre(ring, i);
      // Tangent to the web face |x| = tw/2 and to the flange face |y| = d/2 − tf (docs/methods.md §2.4).
      expect(Math.abs(cx)).toBeCloseTo(0.22 + r, 12);
      expect(Math.abs(cy)).toBeCloseTo(7 - 0.71 - r, 12);
      // Both end points lie on a circle of radius r about that centre.
      for (const k of [i, i + 1]) {
        const [x, y] = ringPoint(ring, k);
        expect(Math.hypot(x - cx, y - cy)).toBeCloseTo(r, 12);
      }
    }
  });

  it('quarter-circle fillet spandrels: adding root radius r changes A by 4(1 − π/4)r² and Ix by four spandrels (closed form, derived from a square minus a quarter disc)', () => {
    const r = 0.6;
    const sharp = sectionProperties(build('i-shape', w));
    const filleted = sectionProperties(build('i-shape', { ...w, r }));
    const As = (1 - Math.PI / 4) * r * r;
    // Spandrel about its corner, v measured from the flange face into the web: ∫v dA = r³(5/6 − π/4), ∫v² dA = r⁴(1 − 5π/16).
    const Qv = r ** 3 * (5 / 6 - Math.PI / 4);
    const Ivv = r ** 4 * (1 - (5 * Math.PI) / 16);
    const y0 = 7 - 0.71;
    const spandrelIx = y0 * y0 * As - 2 * y0 * Qv + Ivv;
    expect(relativeError(filleted.area - sharp.area, 4 * As)).toBeLessThan(1e-9);
    expect(relativeError(filleted.Ix - sharp.Ix, 4 * spandrelIx)).toBeLessThan(1e-8);
  });

  it('a sloped flange keeps the area of parallel flanges of the same average tf (linear taper averaged at mid-outstand)', () => {
    const s = { d: 8, bf: 4, tw: 0.271, tf: 0.425 };
    const flat = exactArea(build('i-shape', s));
    const sloped = exactArea(build('i-shape', { ...s, slope: 2 / 12 }));
    expect(relativeError(sloped, flat)).toBeLessThan(1e-14);
  });

  it('channel, tee and z-shape areas equal their rectangle compositions (sharp corners)', () => {
    expect(relativeError(exactArea(build('channel', { d: 9, bf: 2.5, tw: 0.3, tf: 0.4 })), 2 * 2.5 * 0.4 + (9 - 0.8) * 0.3)).toBeLessThan(1e-14);
    expect(relativeError(exactArea(build('tee', { d: 7, bf: 14.5, tw: 0.44, tf: 0.71 })), 14.5 * 0.71 + (7 - 0.71) * 0.44)).toBeLessThan(1e-14);
    expect(relativeError(exactArea(build('z-shape', { d: 8, bf: 3, tw: 0.25, tf: 0.25 })), 2 * 3 * 0.25 + (8 - 0.5) * 0.25)).toBeLessThan(1e-14);
  });

  it('z-shape is centred on its centroid and has Ixy ≠ 0 with the sign of its flanges (top flange towards +x gives Ixy > 0)', () => {
    const p = sectionProperties(build('z-shape', { d: 8, bf: 3, tw: 0.25, tf: 0.25 }));
    expect(Math.abs(p.cx)).toBeLessThan(1e-12);
    expect(Math.abs(p.cy)).toBeLessThan(1e-12);
    expect(p.Ixy).toBeGreaterThan(0);
  });

  it('angle: heel at the origin, A = t(d + b − t) sharp; root fillet CW, toe roundings CCW', () => {
    expect(relativeError(exactArea(build('angle', { d: 5, b: 3, t: 0.5 })), 0.5 * 7.5)).toBeLessThan(1e-14);
    const ring = build('angle', { d: 5, b: 3, t: 0.5, r: 0.4, rt: 0.2 })[0]!.outer;
    const arcs = Array.from(ring.bulge!).filter((b) => b !== 0);
    expect(arcs.filter((b) => b < 0)).toHaveLength(1);
    expect(arcs.filter((b) => b > 0)).toHaveLength(2);
    expect(ringPoint(ring, 0)).toEqual([0, 0]);
  });

  it('angle root radius from k (heel to fillet toe): k = 0.875, t = 0.5 gives the same part as r = 0.375', () => {
    expect(build('angle', { d: 4, b: 4, t: 0.5, k: 0.875 })).toEqual(build('angle', { d: 4, b: 4, t: 0.5, r: 0.375 }));
    expect(messages('angle', { d: 4, b: 4, t: 0.5, k: 0.875, r: 0.3 })).toContain('give either r or k, not both');
    expect(messages('angle', { d: 4, b: 4, t: 0.5, k: 0.4 })).toContain('k = 0.4 is less than the thickness t = 0.5');
  });

  it('double angle: two mirrored angles whose Ixy cancels, area twice one angle', () => {
    const one = exactArea(build('angle', { d: 4, b: 3, t: 0.5 }));
    const region = build('double-angle', { d: 4, b: 3, t: 0.5, gap: 0.375 });
    expect(region).toHaveLength(2);
    expect(relativeError(exactArea(region), 2 * one)).toBeLessThan(1e-14);
    expect(Math.abs(sectionProperties(region).Ixy)).toBeLessThan(1e-12);
  });

  it('names the dimension that makes a rolled shape impossible', () => {
    expect(messages('i-shape', { d: 1.5, bf: 2, tw: 0.2, tf: 0.9 })).toContain('tf = 0.9 is not less than half of d = 1.5');
    expect(messages('i-shape', { d: 8, bf: 2, tw: 2.5, tf: 0.4 })).toContain('tw = 2.5 is not less than bf = 2');
    expect(messages('i-shape', { d: 8, bf: 4, tw: 0.3, tf: 0.4, r: 5 })).toContain('root radius r = 5 does not fit');
    expect(messages('i-shape', { d: 8, bf: 4, tw: 0.3, tf: 0.1, slope: 0.5 })).toContain('slope = 0.5 leaves no flange at the toe');
    expect(messages('tee', { d: 1, bf: 4, tw: 0.3, tf: 1 })).toContain('tf = 1 is not less than d = 1');
    expect(messages('angle', { d: 4, b: 3, t: 3 })).toContain('t = 3 is not less than the shorter leg 3');
    expect(messages('angle', { d: 4, b: 3, t: 0.5, rt: 0.6 })).toContain('toe radius rt = 0.6 is more than the thickness t = 0.5');
  });
});

describe('lumber (NDS Supplement 2018, Table 1A dressed sizes)', () => {
  it('a 2x10 is 1.5 × 9.25 in: A = 13.875 and Ix = bd³/12 = 50653/512 exactly (exact arithmetic)', () => {
    const p = sectionProperties(build('lumber', { b: 2, d: 10 }));
    expect(p.area).toBe(13.875);
    expect(relativeError(p.Ix, 50653 / 512)).toBeLessThan(1e-13);
  });

  it('three plies of 2x10 side by side: 3 rectangles touching, A = 3·13.875, Iy = (4.5)³·9.25/12', () => {
    const region = build('lumber', { b: 2, d: 10, plies: 3 });
    expect(region).toHaveLength(3);
    const p = sectionProperties(region);
    expect(p.area).toBe(3 * 13.875);
    expect(relativeError(p.Iy, (4.5 ** 3 * 9.25) / 12)).toBeLessThan(1e-13);
  });

  it('a plank laid flat (b = 10, d = 2) is 9.25 wide and 1.5 deep', () => {
    const p = sectionProperties(build('lumber', { b: 10, d: 2 }));
    expect(relativeError(p.Ix, (9.25 * 1.5 ** 3) / 12)).toBeLessThan(1e-13);
  });

  it('shapeRegion scales lumber from inches to a millimetre document by exactly 25.4 (international inch)', () => {
    const mm = sectionProperties(shapeRegion('lumber', { b: 2, d: 10 }, 'mm').region);
    expect(relativeError(mm.area, 13.875 * 25.4 * 25.4)).toBeLessThan(1e-13);
  });

  it('reports an unknown nominal size and a fractional ply count', () => {
    expect(messages('lumber', { b: 2, d: 7 })).toContain('nominal 2x7 is not in NDS Supplement Table 1A');
    expect(messages('lumber', { b: 2, d: 10, plies: 1.5 })).toContain('plies = 1.5 must be a whole number');
  });
});

describe('paramsInUnit', () => {
  it('converts only lengths: an S shape in mm keeps its 2:12 slope, lumber keeps its nominal size and plies (25.4 mm per inch)', () => {
    expect(paramsInUnit('i-shape', { d: 8, bf: 4, tw: 0.25, tf: 0.5, slope: 2 / 12 }, 'in', 'mm')).toEqual({ d: 203.2, bf: 101.6, tw: 6.35, tf: 12.7, slope: 2 / 12 });
    expect(paramsInUnit('lumber', { b: 2, d: 10, plies: 3 }, 'in', 'mm')).toEqual({ b: 2, d: 10, plies: 3 });
  });
});
