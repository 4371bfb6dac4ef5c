/**
 * Cold-formed steel parts: a sheet of constant thickness t bent to shape with an inside bend
 * radius R: lipped channel (C with stiffening lips, equal or unequal flanges), lipped Z (equal or
 * unequal flanges, lip angle), hat, and plain track (unlipped C).
 *
 * Units: the caller's length unit; the lip angle in degrees.
 * Dimensions (the usual product-table convention, common practice): depth D, flange widths B and
 *   lip L are OUT-TO-OUT, measured to the outside faces; t the base-metal thickness; R the INSIDE
 *   bend radius, the same at every bend. A lip at angle θ to its flange (90° = square) has its tip
 *   L from the flange's outside face measured square to the flange, so its centreline runs
 *   (L − t/2)/sin θ; for θ ≠ 90° the flange width B is taken to the point where the flange's and
 *   the lip's centrelines meet, plus t/2 (as for a square lip).
 * Geometry: the mid-thickness line is a polyline with sharp corners; each bend is an exact
 *   circular arc of centreline radius R + t/2, inside face R and outside face R + t (a ring
 *   offset of a circle is a circle about the same centre, so both faces are exact arcs:
 *   AISI S100 and the AISI Cold-Formed Steel Design Manual use the same bend model). The outline
 *   runs out along one face and back along the other; the ends are square cuts.
 * Winding: counter-clockwise outer ring; a bend's outside arc is convex (CCW), its inside arc
 *   concave (CW), as docs/methods.md §2.4 requires.
 * Local origins: given in each type's `origin`.
 * Does not guarantee: that unusual proportions (a lip longer than the depth, a bend radius larger
 *   than a flange) make sense; edges too short for their bends are reported by parameter.
 */
import type { Diagnostic, Point, Polygon } from '../geometry/types.ts';
import type { PartType } from './registry-types.ts';
import { roundedRing, roundingClashes, type Corner } from './outline.ts';
import { badParameter, complain, formatNumber, readParams, type Values } from './params.ts';

type Built = { region: Polygon[]; diagnostics: readonly Diagnostic[] };

/** Unit normal to the left of the direction a → b. */
function leftNormal(a: Point, b: Point): Point {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  return [-dy / len, dx / len];
}

/** Where the lines p + s·u and q + s·v meet (they are not parallel: consecutive strip edges turn). */
function meet(p: Point, u: Point, q: Point, v: Point): Point {
  const den = u[0] * v[1] - u[1] * v[0];
  const s = ((q[0] - p[0]) * v[1] - (q[1] - p[1]) * v[0]) / den;
  return [p[0] + s * u[0], p[1] + s * u[1]];
}

/** The polyline offset by `side` (+ to the left of travel) with its corners, each corner's turn sign. */
function offsetSide(path: readonly Point[], side: number): { points: Point[]; turns: number[] } {
  const points: Point[] = [];
  const turns: number[] = [];
  for (let i = 0; i < path.length; i++) {
    const here = path[i]!;
    if (i === 0 || i === path.length - 1) {
      const [a, b] = i === 0 ? [here, path[1]!] : [path[i - 1]!, here];
      const n = leftNormal(a, b);
      points.push([here[0] + side * n[0], here[1] + side * n[1]]);
      turns.push(0);
      continue;
    }
    const prev = path[i - 1]!;
    const next = path[i + 1]!;
    const n1 = leftNormal(prev, here);
    const n2 = leftNormal(here, next);
    const u: Point = [here[0] - prev[0], here[1] - prev[1]];
    const v: Point = [next[0] - here[0], next[1] - here[1]];
    points.push(meet([prev[0] + side * n1[0], prev[1] + side * n1[1]], u, [here[0] + side * n2[0], here[1] + side * n2[1]], v));
    turns.push(Math.sign(u[0] * v[1] - u[1] * v[0]));
  }
  return { points, turns };
}

/**
 * The outline of a strip of thickness t along a sharp-cornered mid-thickness path, every corner
 * bent with inside radius R. Corners on the inside of a turn get R, on the outside R + t.
 */
export function bentStripCorners(path: readonly Point[], t: number, R: number): Corner[] {
  const right = offsetSide(path, -t / 2);
  const left = offsetSide(path, t / 2);
  // A left turn has the left face inside: radius R there, R + t on the right face.
  const radius = (turn: number, face: 'left' | 'right'): number => (turn === 0 ? 0 : (turn > 0) === (face === 'left') ? R : R + t);
  const corners: Corner[] = right.points.map((at, i) => ({ at, radius: radius(right.turns[i]!, 'right') }));
  for (let i = left.points.length - 1; i >= 0; i--) corners.push({ at: left.points[i]!, radius: radius(left.turns[i]!, 'left') });
  return corners;
}

function stripRegion(partType: string, path: readonly Point[], t: number, R: number, diagnostics: Diagnostic[]): Built {
  const corners = bentStripCorners(path, t, R);
  const clashes = roundingClashes(corners);
  if (clashes.length > 0) {
    const c = clashes[0]!;
    diagnostics.push(badParameter(partType, `the bends (inside radius R = ${formatNumber(R)}, t = ${formatNumber(t)}) need ${formatNumber(c.needed)} along an edge only ${formatNumber(c.edgeLength)} long`));
    return { region: [], diagnostics };
  }
  return { region: [{ outer: roundedRing(corners), holes: [] }], diagnostics };
}

const RADIANS = Math.PI / 180;

/** The lip's end on the mid-thickness line, from the flange's centreline corner, turning toward `inward` (±1 in y). */
function lipEnd(corner: Point, along: number, inward: number, L: number, t: number, angleDeg: number): Point {
  const theta = angleDeg * RADIANS;
  const length = (L - t / 2) / Math.sin(theta);
  return [corner[0] + along * length * Math.cos(theta), corner[1] + inward * length * Math.sin(theta)];
}

function checkCommon(partType: string, v: Record<string, number>, diagnostics: Diagnostic[]): void {
  const { D, t } = v as { D: number; t: number };
  complain(diagnostics, partType, 2 * t >= D, `t = ${formatNumber(t)} leaves no web in D = ${formatNumber(D)}`);
  for (const key of ['B', 'B2'] as const) {
    const b = v[key];
    if (b !== undefined) complain(diagnostics, partType, b <= t, `${key} = ${formatNumber(b)} is not more than the thickness t = ${formatNumber(t)}`);
  }
  const L = v['L'];
  if (L !== undefined && L > 0) complain(diagnostics, partType, L <= t / 2, `L = ${formatNumber(L)} is not more than t/2 = ${formatNumber(t / 2)} (use L = 0 for no lip)`);
  const angle = v['lipAngle'];
  if (angle !== undefined) complain(diagnostics, partType, !(angle >= 15 && angle <= 165), `lipAngle = ${formatNumber(angle)}° must lie between 15° and 165°`);
}

const thickness = { key: 't', label: 'base-metal thickness', defaultIn: 0.075 } as const;
const insideRadius = { key: 'R', label: 'inside bend radius (0 = sharp)', defaultIn: 0.1125, optional: true } as const;
const lipAngle = { key: 'lipAngle', label: 'lip angle to its flange, degrees (90 = square)', defaultIn: 90, optional: true, quantity: 'ratio' } as const;

function build(partType: PartType, params: Values, path: (v: Record<string, number>) => Point[]): Built {
  const { values, diagnostics } = readParams(partType.id, partType.params, params);
  if (diagnostics.length > 0) return { region: [], diagnostics };
  const v: Record<string, number> = { ...values };
  if (v['B2'] === undefined && partType.params.some((p) => p.key === 'B2')) v['B2'] = v['B']!;
  checkCommon(partType.id, v, diagnostics);
  if (diagnostics.length > 0) return { region: [], diagnostics };
  return stripRegion(partType.id, path(v), v['t']!, v['R']!, diagnostics);
}

/** Mid-thickness path of a C, from the top lip (or top flange tip) round the web to the bottom one. */
function channelPath(v: Record<string, number>): Point[] {
  const { D, B, B2, t } = v as { D: number; B: number; B2: number; t: number };
  const L = v['L'] ?? 0;
  const angle = v['lipAngle'] ?? 90;
  const top: Point = [B - t / 2, D / 2 - t / 2];
  const bottom: Point = [B2 - t / 2, -D / 2 + t / 2];
  const web: Point[] = [[t / 2, D / 2 - t / 2], [t / 2, -D / 2 + t / 2]];
  // Without lips the flanges end in square cuts at their full width.
  if (L === 0) return [[B, top[1]], ...web, [B2, bottom[1]]];
  return [lipEnd(top, 1, -1, L, t, angle), top, ...web, bottom, lipEnd(bottom, 1, 1, L, t, angle)];
}

export const lippedChannel: PartType = {
  id: 'lipped-channel',
  label: 'Cold-formed lipped channel (C with lips)',
  origin: 'outside face of the web on the y axis at mid-depth; flanges towards +x',
  params: [
    { key: 'D', label: 'depth, out-to-out', defaultIn: 8 },
    { key: 'B', label: 'top flange width, out-to-out', defaultIn: 2.5 },
    { key: 'B2', label: 'bottom flange width, out-to-out (default B)', defaultIn: 2.5, optional: true, defaultRule: 'B' },
    { key: 'L', label: 'lip length, out-to-out', defaultIn: 0.625 },
    thickness,
    insideRadius,
    lipAngle,
  ],
  region: (params) => build(lippedChannel, params, channelPath),
};

export const track: PartType = {
  id: 'track',
  label: 'Cold-formed track (plain channel, no lips)',
  origin: 'outside face of the web on the y axis at mid-depth; flanges towards +x',
  params: [
    { key: 'D', label: 'depth, out-to-out', defaultIn: 6.125 },
    { key: 'B', label: 'flange width, out-to-out', defaultIn: 1.25 },
    { key: 'B2', label: 'bottom flange width, out-to-out (default B)', defaultIn: 1.25, optional: true, defaultRule: 'B' },
    thickness,
    insideRadius,
  ],
  region: (params) => build(track, params, channelPath),
};

/** Mid-thickness path of a lipped Z: top flange to +x, bottom flange to −x, web centred on x = 0. */
function zPath(v: Record<string, number>): Point[] {
  const { D, B, B2, L, t } = v as { D: number; B: number; B2: number; L: number; t: number };
  const angle = v['lipAngle'] ?? 90;
  // B is measured from the web's outside face (x = −t/2 for the top flange) to the lip's outside face.
  const top: Point = [B - t, D / 2 - t / 2];
  const bottom: Point = [-(B2 - t), -D / 2 + t / 2];
  const web: Point[] = [[0, D / 2 - t / 2], [0, -D / 2 + t / 2]];
  if (L === 0) return [[B - t / 2, top[1]], ...web, [-(B2 - t / 2), bottom[1]]];
  return [lipEnd(top, 1, -1, L, t, angle), top, ...web, bottom, lipEnd(bottom, -1, 1, L, t, angle)];
}

export const lippedZ: PartType = {
  id: 'lipped-z',
  label: 'Cold-formed Z with lips',
  origin: 'centre of the web at mid-depth; top flange towards +x, bottom flange towards −x',
  params: [
    { key: 'D', label: 'depth, out-to-out', defaultIn: 8 },
    { key: 'B', label: 'top flange width, out-to-out', defaultIn: 2.5 },
    { key: 'B2', label: 'bottom flange width, out-to-out (default B)', defaultIn: 2.5, optional: true, defaultRule: 'B' },
    { key: 'L', label: 'lip length, out-to-out, square to the flange (0 = no lip)', defaultIn: 0.9, optional: true },
    thickness,
    insideRadius,
    { ...lipAngle, defaultIn: 50 },
  ],
  region: (params) => build(lippedZ, params, zPath),
};

/** Mid-thickness path of a hat: brims at the bottom pointing out, the crown on top. */
function hatPath(v: Record<string, number>): Point[] {
  const { D, B, Bb, t } = v as { D: number; B: number; Bb: number; t: number };
  const x = B / 2 - t / 2;
  const crown = D / 2 - t / 2;
  const brim = -D / 2 + t / 2;
  return [[-(B / 2 + Bb), brim], [-x, brim], [-x, crown], [x, crown], [x, brim], [B / 2 + Bb, brim]];
}

export const hat: PartType = {
  id: 'hat',
  label: 'Cold-formed hat',
  origin: 'centre of the crown width at mid-depth; crown on top, brims at the bottom pointing outwards',
  params: [
    { key: 'D', label: 'depth, out-to-out', defaultIn: 3 },
    { key: 'B', label: 'crown width, out-to-out', defaultIn: 2 },
    { key: 'Bb', label: 'brim width, from the outside face of the web', defaultIn: 1.25 },
    thickness,
    insideRadius,
  ],
  region(params: Values): Built {
    const built = build(hat, params, hatPath);
    return built;
  },
};
