/**
 * Rolled and flanged shapes with exact root fillets: i-shape, channel, tee, z-shape, angle,
 * double-angle.
 *
 * Units: the caller's length unit (defaults are inches, roughly a W14X90 / C9X15 / L4X4X1/2).
 * Symbols: d depth, bf flange width, tw web thickness, tf flange thickness (the AVERAGE thickness
 *   when a slope is given), r root fillet radius between web and flange, slope the rise over run
 *   of a tapered inner flange face (2:12 = 0.1667 for S shapes and C channels, from memory of the
 *   AISC Manual Part 1; it is not in the AISC database). Angles: legs d (along y) and b (along x),
 *   thickness t, root radius r (or k, heel to the fillet toe, r = k − t), toe radius rt.
 * Taper: the average thickness tf is taken at the middle of the flange outstand, so the face runs
 *   from tf + slope·o/2 at the web to tf − slope·o/2 at the toe, o being the outstand (AISC Manual
 *   Part 1 convention for sloped flanges, from memory).
 * Winding: outer rings counter-clockwise; the flange–web fillets are concave and so run clockwise
 *   about their centres (negative bulge), toe roundings convex and CCW (docs/methods.md §2.4).
 * Toes of the flanges are sharp: rolled toe roundings are small and not tabulated.
 * Local origins (also in each type's `origin`): see the types below.
 */
import type { Diagnostic, Point, Polygon } from '../geometry/types.ts';
import type { PartType } from './registry-types.ts';
import { roundedRing, roundingClashes, type Corner } from './outline.ts';
import { complain, formatNumber, readParams, badParameter, type Values } from './params.ts';

type Built = { region: Polygon[]; diagnostics: readonly Diagnostic[] };
const failed = (diagnostics: readonly Diagnostic[]): Built => ({ region: [], diagnostics });

/** Flange thickness at the web face and at the toe for an average thickness tf over outstand o. */
function flangeThicknesses(tf: number, slope: number, outstand: number): { atWeb: number; atToe: number } {
  return { atWeb: tf + (slope * outstand) / 2, atToe: tf - (slope * outstand) / 2 };
}

/** A ring from corners, or a diagnostic naming the radius that does not fit. */
function ringOrClash(partType: string, corners: readonly Corner[], radiusName: string, diagnostics: Diagnostic[]): Polygon | undefined {
  const clashes = roundingClashes(corners);
  if (clashes.length > 0) {
    const c = clashes[0]!;
    diagnostics.push(
      badParameter(partType, `${radiusName} does not fit: the roundings need ${formatNumber(c.needed)} along an edge only ${formatNumber(c.edgeLength)} long`),
    );
    return undefined;
  }
  return { outer: roundedRing(corners), holes: [] };
}

const flangedParams = [
  { key: 'd', label: 'depth', defaultIn: 14 },
  { key: 'bf', label: 'flange width', defaultIn: 14.5 },
  { key: 'tw', label: 'web thickness', defaultIn: 0.44 },
  { key: 'tf', label: 'flange thickness (average if sloped)', defaultIn: 0.71 },
  { key: 'r', label: 'root fillet radius (0 = sharp, as welded plates)', defaultIn: 0, optional: true },
  { key: 'slope', label: 'inner flange slope, rise over run (0 = parallel)', defaultIn: 0, optional: true, quantity: 'ratio' },
  { key: 'rt', label: 'flange toe radius, inner corner of each toe (0 = sharp)', defaultIn: 0, optional: true },
] as const;

interface Flanged {
  d: number;
  bf: number;
  tw: number;
  tf: number;
  r: number;
  slope: number;
  rt: number;
}

/** Checks shared by I, channel, tee and Z: web narrower than the flange, flanges thinner than d/2. */
function checkFlanged(partType: string, v: Flanged, outstand: number, flanges: 1 | 2, diagnostics: Diagnostic[]): void {
  const { atWeb, atToe } = flangeThicknesses(v.tf, v.slope, outstand);
  complain(diagnostics, partType, v.tw >= v.bf, `tw = ${formatNumber(v.tw)} is not less than bf = ${formatNumber(v.bf)}`);
  const limit = flanges === 2 ? v.d / 2 : v.d;
  const what = flanges === 2 ? `half of d = ${formatNumber(v.d)}` : `d = ${formatNumber(v.d)}`;
  if (v.slope === 0) complain(diagnostics, partType, v.tf >= limit, `tf = ${formatNumber(v.tf)} is not less than ${what}`);
  else complain(diagnostics, partType, atWeb >= limit, `the flange at the web (tf + slope × outstand / 2 = ${formatNumber(atWeb)}) is not less than ${what}`);
  complain(diagnostics, partType, v.slope > 0 && atToe <= 0, `slope = ${formatNumber(v.slope)} leaves no flange at the toe (tf − slope × outstand / 2 = ${formatNumber(atToe)})`);
}

function iCorners(v: Flanged): Corner[] {
  const h = v.d / 2;
  const w = v.bf / 2;
  const a = v.tw / 2;
  const { atWeb, atToe } = flangeThicknesses(v.tf, v.slope, w - a);
  const sharp = (at: Point): Corner => ({ at, radius: 0 });
  const fillet = (at: Point): Corner => ({ at, radius: v.r });
  const toe = (at: Point): Corner => ({ at, radius: v.rt });
  return [
    sharp([-w, -h]), sharp([w, -h]), toe([w, -h + atToe]), fillet([a, -h + atWeb]),
    fillet([a, h - atWeb]), toe([w, h - atToe]), sharp([w, h]), sharp([-w, h]),
    toe([-w, h - atToe]), fillet([-a, h - atWeb]), fillet([-a, -h + atWeb]), toe([-w, -h + atToe]),
  ];
}

function flangedRegion(partType: PartType, corners: (v: Flanged) => Corner[], outstand: (v: Flanged) => number, flanges: 1 | 2, params: Values): Built {
  const { values, diagnostics } = readParams(partType.id, partType.params, params);
  if (diagnostics.length > 0) return failed(diagnostics);
  const v = { slope: 0, rt: 0, ...values } as unknown as Flanged;
  checkFlanged(partType.id, v, outstand(v), flanges, diagnostics);
  if (diagnostics.length > 0) return failed(diagnostics);
  const radii = v.rt > 0 ? `root radius r = ${formatNumber(v.r)} with toe radius rt = ${formatNumber(v.rt)}` : `root radius r = ${formatNumber(v.r)}`;
  const polygon = ringOrClash(partType.id, corners(v), radii, diagnostics);
  return polygon === undefined ? failed(diagnostics) : { region: [polygon], diagnostics };
}

export const iShape: PartType = {
  id: 'i-shape',
  label: 'I or H shape',
  origin: 'centre of the bounding box (the centroid); web on the y axis, flanges horizontal',
  params: flangedParams,
  region: (params) => flangedRegion(iShape, iCorners, (v) => (v.bf - v.tw) / 2, 2, params),
};

function channelCorners(v: Flanged): Corner[] {
  const h = v.d / 2;
  const { atWeb, atToe } = flangeThicknesses(v.tf, v.slope, v.bf - v.tw);
  const sharp = (at: Point): Corner => ({ at, radius: 0 });
  const fillet = (at: Point): Corner => ({ at, radius: v.r });
  const toe = (at: Point): Corner => ({ at, radius: v.rt });
  return [
    sharp([0, -h]), sharp([v.bf, -h]), toe([v.bf, -h + atToe]), fillet([v.tw, -h + atWeb]),
    fillet([v.tw, h - atWeb]), toe([v.bf, h - atToe]), sharp([v.bf, h]), sharp([0, h]),
  ];
}

export const channel: PartType = {
  id: 'channel',
  label: 'Channel',
  origin: 'back of the web on the y axis at mid-depth; flanges point towards +x',
  params: [
    { key: 'd', label: 'depth', defaultIn: 9 },
    { key: 'bf', label: 'flange width', defaultIn: 2.49 },
    { key: 'tw', label: 'web thickness', defaultIn: 0.285 },
    { key: 'tf', label: 'flange thickness (average if sloped)', defaultIn: 0.413 },
    { key: 'r', label: 'root fillet radius (0 = sharp)', defaultIn: 0, optional: true },
    { key: 'slope', label: 'inner flange slope, rise over run (0 = parallel)', defaultIn: 0, optional: true, quantity: 'ratio' },
    { key: 'rt', label: 'flange toe radius, inner corner of each toe (0 = sharp)', defaultIn: 0, optional: true },
  ],
  region: (params) => flangedRegion(channel, channelCorners, (v) => v.bf - v.tw, 2, params),
};

function teeCorners(v: Flanged): Corner[] {
  const h = v.d / 2;
  const w = v.bf / 2;
  const a = v.tw / 2;
  const { atWeb, atToe } = flangeThicknesses(v.tf, v.slope, w - a);
  const sharp = (at: Point): Corner => ({ at, radius: 0 });
  const fillet = (at: Point): Corner => ({ at, radius: v.r });
  const toe = (at: Point): Corner => ({ at, radius: v.rt });
  return [
    sharp([-a, -h]), sharp([a, -h]), fillet([a, h - atWeb]), toe([w, h - atToe]),
    sharp([w, h]), sharp([-w, h]), toe([-w, h - atToe]), fillet([-a, h - atWeb]),
  ];
}

export const tee: PartType = {
  id: 'tee',
  label: 'Tee (cut from an I, or two plates)',
  origin: 'centre of the bounding box; stem on the y axis pointing down, flange on top',
  params: [
    { key: 'd', label: 'overall depth (flange face to stem tip)', defaultIn: 7 },
    { key: 'bf', label: 'flange width', defaultIn: 14.5 },
    { key: 'tw', label: 'stem thickness', defaultIn: 0.44 },
    { key: 'tf', label: 'flange thickness (average if sloped)', defaultIn: 0.71 },
    { key: 'r', label: 'root fillet radius (0 = sharp, as welded plates)', defaultIn: 0, optional: true },
    { key: 'slope', label: 'inner flange slope, rise over run (0 = parallel)', defaultIn: 0, optional: true, quantity: 'ratio' },
    { key: 'rt', label: 'flange toe radius, inner corner of each toe (0 = sharp)', defaultIn: 0, optional: true },
  ],
  region: (params) => flangedRegion(tee, teeCorners, (v) => (v.bf - v.tw) / 2, 1, params),
};

function zCorners(v: Flanged): Corner[] {
  const h = v.d / 2;
  const a = v.tw / 2;
  const reach = v.bf - a;
  const sharp = (at: Point): Corner => ({ at, radius: 0 });
  const fillet = (at: Point): Corner => ({ at, radius: v.r });
  return [
    sharp([-reach, -h]), sharp([a, -h]), fillet([a, h - v.tf]), sharp([reach, h - v.tf]),
    sharp([reach, h]), sharp([-a, h]), fillet([-a, -h + v.tf]), sharp([-reach, -h + v.tf]),
  ];
}

export const zShape: PartType = {
  id: 'z-shape',
  label: 'Z shape',
  origin: 'centre of the web (the centroid, by point symmetry); top flange towards +x, bottom flange towards −x',
  params: [
    { key: 'd', label: 'depth', defaultIn: 8 },
    { key: 'bf', label: 'flange width (from the back of the web)', defaultIn: 3 },
    { key: 'tw', label: 'web thickness', defaultIn: 0.25 },
    { key: 'tf', label: 'flange thickness', defaultIn: 0.25 },
    { key: 'r', label: 'root fillet radius (0 = sharp)', defaultIn: 0, optional: true },
  ],
  region: (params) => flangedRegion(zShape, zCorners, (v) => v.bf - v.tw, 2, params),
};

interface AngleValues {
  d: number;
  b: number;
  t: number;
  r: number;
  rt: number;
}

const angleParams = [
  { key: 'd', label: 'leg along y', defaultIn: 4 },
  { key: 'b', label: 'leg along x', defaultIn: 4 },
  { key: 't', label: 'thickness', defaultIn: 0.5 },
  { key: 'r', label: 'root fillet radius (0 = sharp)', defaultIn: 0, optional: true },
  { key: 'rt', label: 'toe radius (0 = sharp)', defaultIn: 0, optional: true },
  { key: 'k', label: 'heel to the toe of the root fillet, as tabulated (instead of r: r = k − t)', defaultIn: 0, optional: true, defaultRule: 'r + t' },
] as const;

/** Angle values with the root radius taken from k when k is given (r = k − t), or a diagnostic. */
function angleValues(partType: string, params: Values, values: Record<string, number>, diagnostics: Diagnostic[]): AngleValues {
  const k = values['k'];
  const t = values['t']!;
  if (k !== undefined) {
    if (params['r'] !== undefined) diagnostics.push(badParameter(partType, `give either r or k, not both (r = ${formatNumber(params['r'])}, k = ${formatNumber(k)})`));
    else if (k < t) diagnostics.push(badParameter(partType, `k = ${formatNumber(k)} is less than the thickness t = ${formatNumber(t)} (k is measured from the heel)`));
    else values['r'] = k - t;
  }
  return values as unknown as AngleValues;
}

function angleCorners(v: AngleValues, x0: number, mirror: boolean): Corner[] {
  const s = mirror ? -1 : 1;
  const corners: Corner[] = [
    { at: [x0, 0], radius: 0 },
    { at: [x0 + s * v.b, 0], radius: 0 },
    { at: [x0 + s * v.b, v.t], radius: v.rt },
    { at: [x0 + s * v.t, v.t], radius: v.r },
    { at: [x0 + s * v.t, v.d], radius: v.rt },
    { at: [x0, v.d], radius: 0 },
  ];
  // Mirroring reverses the winding; trace it backwards to stay counter-clockwise.
  return mirror ? corners.reverse() : corners;
}

function angleChecks(partType: string, v: AngleValues, diagnostics: Diagnostic[]): void {
  const leg = Math.min(v.d, v.b);
  complain(diagnostics, partType, v.t >= leg, `t = ${formatNumber(v.t)} is not less than the shorter leg ${formatNumber(leg)}`);
  complain(diagnostics, partType, v.rt > v.t, `toe radius rt = ${formatNumber(v.rt)} is more than the thickness t = ${formatNumber(v.t)}`);
}

export const angle: PartType = {
  id: 'angle',
  label: 'Angle',
  origin: 'heel (outside corner) at the origin; leg d up the y axis, leg b along the x axis',
  params: angleParams,
  region(params: Values): Built {
    const { values, diagnostics } = readParams('angle', angle.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    const v = angleValues('angle', params, values, diagnostics);
    angleChecks('angle', v, diagnostics);
    if (diagnostics.length > 0) return failed(diagnostics);
    const polygon = ringOrClash('angle', angleCorners(v, 0, false), `root radius r = ${formatNumber(v.r)} with toe radius rt = ${formatNumber(v.rt)}`, diagnostics);
    return polygon === undefined ? failed(diagnostics) : { region: [polygon], diagnostics };
  },
};

export const doubleAngle: PartType = {
  id: 'double-angle',
  label: 'Double angle, back to back',
  origin: 'middle of the gap at the heels; legs d back to back up the y axis, legs b outwards along ±x',
  params: [...angleParams, { key: 'gap', label: 'gap between the backs', defaultIn: 0, optional: true }],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('double-angle', doubleAngle.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    const v = angleValues('double-angle', params, values, diagnostics) as AngleValues & { gap: number };
    angleChecks('double-angle', v, diagnostics);
    if (diagnostics.length > 0) return failed(diagnostics);
    const radius = `root radius r = ${formatNumber(v.r)} with toe radius rt = ${formatNumber(v.rt)}`;
    const right = ringOrClash('double-angle', angleCorners(v, v.gap / 2, false), radius, diagnostics);
    const left = ringOrClash('double-angle', angleCorners(v, -v.gap / 2, true), radius, diagnostics);
    return right === undefined || left === undefined ? failed(diagnostics) : { region: [left, right], diagnostics };
  },
};
