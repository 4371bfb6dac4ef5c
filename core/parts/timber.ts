/**
 * Engineered timber: glued-laminated timber by laminations, structural composite lumber (LVL,
 * PSL) by width and depth, and the built-up wood members whose pieces take materials by role:
 * the wood I-joist (two flanges of one material, a web of another) and multi-ply sawn lumber
 * (each ply its own part, so the joints between plies stay visible).
 *
 * Units: the caller's length unit (defaults in inches).
 * Sources:
 *   Glulam — ANSI A190.1 (structural glued laminated timber) and the NDS Supplement (AWC, 2018),
 *     Tables 1C (western species) and 1D (southern pine): laminations are 1-1/2 in thick for
 *     western species and 1-3/8 in for southern pine (from memory of those tables; common
 *     practice), standard widths 3-1/8, 5-1/8, 6-3/4, 8-3/4, 10-3/4 in (western) and 3, 5, 6-3/4,
 *     8-1/2, 10-1/2 in (southern pine), also from memory. Depth = number of laminations × their
 *     thickness. The laminations are drawn as separate touching rectangles (so the glue lines show);
 *     the section properties are those of the solid b × d rectangle.
 *   LVL, PSL — a solid b × d rectangle; the sizes are the producer's (common practice: LVL plies
 *     1-3/4 in thick, PSL 3-1/2, 5-1/4 and 7 in wide, from memory); no product's own file is used.
 *   I-joist — flanges b × h each, web of thickness tw between the flanges (common practice for
 *     section properties; the web's tongue in the flange groove is not modelled: say so).
 * Local origins: given in each type's `origin`.
 */
import type { Diagnostic, Point, Polygon } from '../geometry/types.ts';
import type { Placement } from '../document/types.ts';
import type { LengthUnit } from '../units/types.ts';
import type { BuiltUp, BuiltUpPiece } from './built-up.ts';
import type { PartType } from './registry-types.ts';
import { dressedPly } from './lumber.ts';
import { ringOf } from './outline.ts';
import { inchInUnit } from './inch.ts';
import { badParameter, complain, formatNumber, readParams, type Values } from './params.ts';

type Built = { region: Polygon[]; diagnostics: readonly Diagnostic[] };

/** Common lamination thicknesses, in (NDS Supplement Tables 1C and 1D, from memory). */
export const LAMINATION_THICKNESS_IN = { western: 1.5, southernPine: 1.375 } as const;

function rectangle(x0: number, y0: number, w: number, h: number): Polygon {
  const corners: Point[] = [[x0, y0], [x0 + w, y0], [x0 + w, y0 + h], [x0, y0 + h]];
  return { outer: ringOf(corners, [0, 0, 0, 0]), holes: [] };
}

/** The rectangle between x0..x1 and y0..y1, corners taken as given. */
function band(x0: number, x1: number, y0: number, y1: number): Polygon {
  const corners: Point[] = [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
  return { outer: ringOf(corners, [0, 0, 0, 0]), holes: [] };
}

export const glulam: PartType = {
  id: 'glulam',
  label: 'Glued-laminated timber (laminations of a stated thickness)',
  origin: 'centre of the section; width b along x, laminations stacked along y',
  params: [
    { key: 'b', label: 'width', defaultIn: 5.125 },
    { key: 'n', label: 'number of laminations', defaultIn: 8, quantity: 'count', min: 1 },
    { key: 'tl', label: 'lamination thickness (1.5 in western species, 1.375 in southern pine)', defaultIn: 1.5 },
  ],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('glulam', glulam.params, params);
    if (diagnostics.length > 0) return { region: [], diagnostics };
    const { b, n, tl } = values as { b: number; n: number; tl: number };
    const d = n * tl;
    // Each glue line computed once, so neighbouring laminations share it exactly (touch, never overlap by a rounding).
    const lines = Array.from({ length: n + 1 }, (_, i) => (i === n ? d / 2 : -d / 2 + i * tl));
    return { region: Array.from({ length: n }, (_, i) => band(-b / 2, b / 2, lines[i]!, lines[i + 1]!)), diagnostics };
  },
};

function solidTimber(id: string, label: string, b: number, d: number): PartType {
  const type: PartType = {
    id,
    label,
    origin: 'centre of the section; width b along x, depth d along y',
    params: [
      { key: 'b', label: 'width', defaultIn: b },
      { key: 'd', label: 'depth', defaultIn: d },
    ],
    region(params: Values): Built {
      const { values, diagnostics } = readParams(id, type.params, params);
      if (diagnostics.length > 0) return { region: [], diagnostics };
      const v = values as { b: number; d: number };
      return { region: [rectangle(-v.b / 2, -v.d / 2, v.b, v.d)], diagnostics };
    },
  };
  return type;
}

export const lvl: PartType = solidTimber('lvl', 'Laminated veneer lumber (LVL), b × d', 1.75, 11.875);
export const psl: PartType = solidTimber('psl', 'Parallel strand lumber (PSL), b × d', 3.5, 11.875);

const at = (x: number, y: number, rotationDeg = 0): Placement => ({ x, y, rotationDeg, mirror: false });

export interface WoodIJoistOptions {
  /** Overall depth. */
  readonly depth: number;
  /** Flange width and depth (each flange). */
  readonly flange: { readonly b: number; readonly h: number };
  /** Web thickness. */
  readonly tw: number;
}

/**
 * A wood I-joist centred at the origin: two flange plates (material role "flange", e.g. LVL or
 * sawn lumber) and a web plate between them (role "web", e.g. OSB). Each is its own part so each
 * takes its own material (the transformed section then uses both moduli).
 */
export function woodIJoist(options: WoodIJoistOptions): BuiltUp {
  const { depth, flange, tw } = options;
  const diagnostics: Diagnostic[] = [];
  const check = (bad: boolean, message: string): void => {
    complain(diagnostics, 'wood I-joist', bad, message);
  };
  check(!(depth > 0 && flange.b > 0 && flange.h > 0 && tw > 0), 'depth, flange width, flange depth and web thickness must all be greater than 0');
  check(2 * flange.h >= depth, `the flanges (2 × ${formatNumber(flange.h)}) leave no web in the depth ${formatNumber(depth)}`);
  check(tw >= flange.b, `the web tw = ${formatNumber(tw)} is not thinner than the flange width ${formatNumber(flange.b)}`);
  if (diagnostics.length > 0) return { pieces: [], diagnostics };
  const web = depth - 2 * flange.h;
  const y = depth / 2 - flange.h / 2;
  const piece = (name: string, width: number, height: number, x0: number, y0: number, materialRole: string): BuiltUpPiece => ({ name, type: 'rectangle', width, height, placement: at(x0, y0), operation: 'add', role: 'timber', materialRole });
  return {
    pieces: [piece('top flange', flange.b, flange.h, 0, y, 'flange'), piece('web', tw, web, 0, 0, 'web'), piece('bottom flange', flange.b, flange.h, 0, -y, 'flange')],
    diagnostics,
  };
}

export interface MultiPlyOptions {
  /** Nominal size of each ply (NDS Supplement Table 1A), e.g. { b: 2, d: 10 }. */
  readonly lumber: { readonly b: number; readonly d: number };
  readonly plies: number;
  /** The document unit, for placing the dressed sizes (inches) in it. */
  readonly unit: LengthUnit;
}

/**
 * A multi-ply member of any dressed lumber size: each ply is its own lumber part, side by side
 * and centred at the origin, so the ply joints stay separate parts (for the joints' shear flow).
 */
export function multiPlyLumber(options: MultiPlyOptions): BuiltUp {
  const ply = dressedPly(options.lumber.b, options.lumber.d);
  const diagnostics: Diagnostic[] = [];
  if (ply === undefined) diagnostics.push(badParameter('multi-ply lumber', `nominal ${formatNumber(options.lumber.b)}x${formatNumber(options.lumber.d)} is not in NDS Supplement Table 1A`));
  if (!Number.isInteger(options.plies) || options.plies < 1) diagnostics.push(badParameter('multi-ply lumber', `plies = ${formatNumber(options.plies)} must be a whole number of at least 1`));
  if (ply === undefined || diagnostics.length > 0) return { pieces: [], diagnostics };
  const w = ply.b * inchInUnit(options.unit);
  const pieces: BuiltUpPiece[] = Array.from({ length: options.plies }, (_, i) => ({
    name: `ply ${i + 1}`,
    type: 'shape',
    shape: 'lumber',
    params: { b: options.lumber.b, d: options.lumber.d, plies: 1 },
    placement: at((-options.plies * w) / 2 + (i + 0.5) * w, 0),
    operation: 'add',
    role: 'timber',
  }));
  return { pieces, diagnostics };
}
