/**
 * Built-up helpers: several placed parts at once, ready to become document parts
 * (ShapePart / RectanglePart / CirclePart without id, material and visibility).
 *
 * Units: every length in the caller's document unit, except lumber nominal sizes (inches, trade
 *   names; `unit` says what the document unit is so the dressed sizes can be placed).
 * Placement follows core/document/types.ts: the part's local origin goes to (x, y); mirror is
 *   x → −x about the local y axis, applied before the CCW rotation. Local origins are those of
 *   the part types (see each type's `origin`).
 * Pieces touch face to face (cover plate on flange, plies on plate); they never overlap, so a
 *   union is not needed. `role` suggests a material ('steel' or 'timber') for the caller to map.
 * Bolt holes: a hole through a plate shows in the cross-section as a strip as wide as the hole
 *   and as deep as the plies it passes through (net-section practice; AISC 360-16 §B4.3b,
 *   common practice). Such strips are fastener holes (cutoutRole 'fastener-hole'): a net-section
 *   deduction only. Use `axis: 'z'` only for holes running along the member (round voids,
 *   cutoutRole 'void').
 */
import type { Diagnostic } from '../geometry/types.ts';
import type { CutoutRole, Placement, Operation } from '../document/types.ts';
import type { LengthUnit } from '../units/types.ts';
import { inchInUnit } from './inch.ts';
import { dressedPly } from './lumber.ts';
import { badParameter, formatNumber, type Values } from './params.ts';
import { angle, channel, iShape } from './rolled.ts';
import { plate } from './simple.ts';

interface PieceCommon {
  readonly name: string;
  readonly placement: Placement;
  readonly operation: Operation;
  readonly role?: 'steel' | 'timber';
  /** Subtract pieces: what the cut-out is (core/document/types.ts CutoutRole). */
  readonly cutoutRole?: CutoutRole;
  /** Which material of a member with several (wood I-joist: 'flange' or 'web'). */
  readonly materialRole?: string;
}

export type BuiltUpPiece =
  | (PieceCommon & { readonly type: 'shape'; readonly shape: string; readonly params: Readonly<Record<string, number>>; readonly designation?: string })
  | (PieceCommon & { readonly type: 'rectangle'; readonly width: number; readonly height: number })
  | (PieceCommon & { readonly type: 'circle'; readonly diameter: number });

export interface BuiltUp {
  readonly pieces: readonly BuiltUpPiece[];
  readonly diagnostics: readonly Diagnostic[];
}

const at = (x: number, y: number, rotationDeg = 0, mirror = false): Placement => ({ x, y, rotationDeg, mirror });

function shapePiece(name: string, shape: string, params: Values, placement: Placement, designation?: string): BuiltUpPiece {
  return { name, type: 'shape', shape, params: { ...params }, placement, operation: 'add', role: 'steel', ...(designation === undefined ? {} : { designation }) };
}

function plateDiagnostics(name: string, b: number, t: number): readonly Diagnostic[] {
  return plate.region({ b, t }).diagnostics.map((d) => ({ ...d, message: `${name}: ${d.message}` }));
}

export interface BoltHoleOptions {
  /** Hole diameter (the caller adds any allowance, e.g. 1/16 in for a standard hole). */
  readonly diameter: number;
  /** Holes along y, spaced by `pitch`; holes along x, spaced by `gauge`. Both default to 1. */
  readonly rows?: number;
  readonly columns?: number;
  readonly pitch?: number;
  readonly gauge?: number;
  /** Centre of the pattern, document coordinates. */
  readonly x: number;
  readonly y: number;
  /** Direction the holes run: 'y' through horizontal plates (flanges), 'x' through vertical ones (webs), 'z' along the member. */
  readonly axis: 'x' | 'y' | 'z';
  /** Length of material each hole passes through (its cut depth), for axis 'x' or 'y'. */
  readonly depth?: number;
  readonly name?: string;
}

/** A rows × columns grid of holes as subtract parts (strips for axis x / y, circles for z). */
export function boltHolePattern(options: BoltHoleOptions): BuiltUp {
  const { diameter, axis } = options;
  const rows = options.rows ?? 1;
  const columns = options.columns ?? 1;
  const name = options.name ?? 'hole';
  const diagnostics: Diagnostic[] = [];
  const check = (bad: boolean, message: string): void => {
    if (bad) diagnostics.push(badParameter('bolt holes', message));
  };
  check(!(diameter > 0), `diameter = ${formatNumber(diameter)} must be greater than 0`);
  check(!Number.isInteger(rows) || rows < 1, `rows = ${formatNumber(rows)} must be a whole number of at least 1`);
  check(!Number.isInteger(columns) || columns < 1, `columns = ${formatNumber(columns)} must be a whole number of at least 1`);
  check(rows > 1 && !((options.pitch ?? 0) >= diameter), `pitch = ${formatNumber(options.pitch ?? 0)} must be at least the diameter ${formatNumber(diameter)} for ${rows} rows`);
  check(columns > 1 && !((options.gauge ?? 0) >= diameter), `gauge = ${formatNumber(options.gauge ?? 0)} must be at least the diameter ${formatNumber(diameter)} for ${columns} columns`);
  check(axis !== 'z' && !((options.depth ?? 0) > 0), `depth (the thickness the holes pass through) must be greater than 0 for holes along ${axis}`);
  if (diagnostics.length > 0) return { pieces: [], diagnostics };
  const pitch = options.pitch ?? 0;
  const gauge = options.gauge ?? 0;
  const depth = options.depth ?? 0;
  const pieces: BuiltUpPiece[] = [];
  for (let i = 0; i < rows; i++) {
    for (let j = 0; j < columns; j++) {
      const placement = at(options.x + (j - (columns - 1) / 2) * gauge, options.y + (i - (rows - 1) / 2) * pitch);
      const label = rows * columns === 1 ? name : `${name} ${i * columns + j + 1}`;
      if (axis === 'z') pieces.push({ name: label, type: 'circle', diameter, placement, operation: 'subtract', cutoutRole: 'void' });
      else {
        const [width, height] = axis === 'y' ? [diameter, depth] : [depth, diameter];
        pieces.push({ name: label, type: 'rectangle', width, height, placement, operation: 'subtract', cutoutRole: 'fastener-hole' });
      }
    }
  }
  return { pieces, diagnostics };
}

export interface CoverPlatedIOptions {
  /** The I shape's dimensions (i-shape symbols) and, if it came from the catalogue, its designation. */
  readonly i: Values;
  readonly designation?: string;
  readonly top?: { readonly b: number; readonly t: number };
  readonly bottom?: { readonly b: number; readonly t: number };
  /** Holes through each flange (and its cover plate): `columns` holes at `gauge` centres, centred on the web. */
  readonly holes?: { readonly diameter: number; readonly columns: number; readonly gauge: number };
}

/** An I shape centred at the origin with cover plates on its flanges and optional flange holes. */
export function coverPlatedI(options: CoverPlatedIOptions): BuiltUp {
  const built = iShape.region(options.i);
  if (built.diagnostics.length > 0) return { pieces: [], diagnostics: built.diagnostics };
  const { d, tf, tw } = options.i as { d: number; tf: number; tw: number };
  const r = options.i['r'] ?? 0;
  const bf = options.i['bf']!;
  const slope = options.i['slope'] ?? 0;
  const flangeAtWeb = tf + (slope * (bf - tw)) / 4;
  const pieces: BuiltUpPiece[] = [shapePiece('I', 'i-shape', options.i, at(0, 0), options.designation)];
  const diagnostics: Diagnostic[] = [];
  const sides = [
    { side: 'top', plate: options.top, sign: 1 },
    { side: 'bottom', plate: options.bottom, sign: -1 },
  ] as const;
  for (const { side, plate: cover, sign } of sides) {
    const t = cover?.t ?? 0;
    if (cover !== undefined) {
      diagnostics.push(...plateDiagnostics(`${side} cover plate`, cover.b, cover.t));
      pieces.push(shapePiece(`${side} cover plate`, 'plate', { b: cover.b, t: cover.t }, at(0, sign * (d / 2 + cover.t / 2))));
    }
    if (options.holes === undefined) continue;
    const { diameter, columns, gauge } = options.holes;
    const clear = gauge / 2 - diameter / 2 - (tw / 2 + r);
    if (columns > 1 && clear < 0) diagnostics.push(badParameter('cover-plated I', `holes at gauge ${formatNumber(gauge)} cut into the web or its fillets (by ${formatNumber(-clear)})`));
    // The strip runs from the flange's thickest point to the plate's outer face; beyond the sloped face it cuts only air.
    const depth = flangeAtWeb + t;
    const centreY = sign * (d / 2 - flangeAtWeb + depth / 2);
    const holes = boltHolePattern({ diameter, columns, gauge, x: 0, y: centreY, axis: 'y', depth, name: `${side} flange hole` });
    diagnostics.push(...holes.diagnostics);
    pieces.push(...holes.pieces);
  }
  return { pieces: diagnostics.length > 0 ? [] : pieces, diagnostics };
}

export interface BoxFromChannelsOptions {
  readonly channel: Values;
  readonly designation?: string;
  /** 'toe-to-toe': flanges face each other (a closed box when gap = 0); 'back-to-back': webs face each other. */
  readonly arrangement: 'toe-to-toe' | 'back-to-back';
  /** Clear gap between the toes (toe to toe) or the backs (back to back). */
  readonly gap: number;
}

/** Two equal channels, symmetric about the y axis, mid-depth on the x axis. */
export function boxFromChannels(options: BoxFromChannelsOptions): BuiltUp {
  const built = channel.region(options.channel);
  if (built.diagnostics.length > 0) return { pieces: [], diagnostics: built.diagnostics };
  if (!(options.gap >= 0)) return { pieces: [], diagnostics: [badParameter('box from channels', `gap = ${formatNumber(options.gap)} must be 0 or more`)] };
  const bf = options.channel['bf']!;
  const g = options.gap / 2;
  // The channel's local origin is the back of its web; mirroring turns its flanges towards −x.
  const [left, right] =
    options.arrangement === 'toe-to-toe' ? [at(-(g + bf), 0), at(g + bf, 0, 0, true)] : [at(-g, 0, 0, true), at(g, 0)];
  return {
    pieces: [shapePiece('left channel', 'channel', options.channel, left, options.designation), shapePiece('right channel', 'channel', options.channel, right, options.designation)],
    diagnostics: [],
  };
}

/** Two equal angles with legs d back to back across a gap, heels on the x axis. */
export function doubleAnglesBackToBack(options: { readonly angle: Values; readonly designation?: string; readonly gap: number }): BuiltUp {
  const built = angle.region(options.angle);
  if (built.diagnostics.length > 0) return { pieces: [], diagnostics: built.diagnostics };
  if (!(options.gap >= 0)) return { pieces: [], diagnostics: [badParameter('double angles', `gap = ${formatNumber(options.gap)} must be 0 or more`)] };
  const g = options.gap / 2;
  return {
    pieces: [shapePiece('left angle', 'angle', options.angle, at(-g, 0, 0, true), options.designation), shapePiece('right angle', 'angle', options.angle, at(g, 0), options.designation)],
    diagnostics: [],
  };
}

export interface FlitchBeamOptions {
  /** Nominal lumber size, inches (trade name), e.g. { b: 2, d: 12 }. */
  readonly lumber: { readonly b: number; readonly d: number };
  /** Lumber plies; a steel plate goes between each neighbouring pair (plies − 1 plates). */
  readonly plies: number;
  /** Plate thickness and depth, document unit. */
  readonly plate: { readonly t: number; readonly depth: number };
  readonly unit: LengthUnit;
}

/** Lumber plies and vertical steel plates side by side, centred at the origin, all at mid-depth. */
export function flitchBeam(options: FlitchBeamOptions): BuiltUp {
  const ply = dressedPly(options.lumber.b, options.lumber.d);
  const diagnostics: Diagnostic[] = [];
  if (ply === undefined) diagnostics.push(badParameter('flitch beam', `nominal ${formatNumber(options.lumber.b)}x${formatNumber(options.lumber.d)} lumber is not in NDS Supplement Table 1A`));
  if (!Number.isInteger(options.plies) || options.plies < 2) diagnostics.push(badParameter('flitch beam', `plies = ${formatNumber(options.plies)} must be a whole number of at least 2`));
  diagnostics.push(...plateDiagnostics('flitch plate', options.plate.depth, options.plate.t));
  if (ply === undefined || diagnostics.length > 0) return { pieces: [], diagnostics };
  const wood = ply.b * inchInUnit(options.unit);
  const tp = options.plate.t;
  const total = options.plies * wood + (options.plies - 1) * tp;
  const pieces: BuiltUpPiece[] = [];
  let x = -total / 2;
  for (let i = 0; i < options.plies; i++) {
    pieces.push({ name: `ply ${i + 1}`, type: 'shape', shape: 'lumber', params: { b: options.lumber.b, d: options.lumber.d, plies: 1 }, placement: at(x + wood / 2, 0), operation: 'add', role: 'timber' });
    x += wood;
    if (i === options.plies - 1) break;
    // A plate with width b = depth turned 90° stands upright.
    pieces.push(shapePiece(`plate ${i + 1}`, 'plate', { b: options.plate.depth, t: tp }, at(x + tp / 2, 0, 90)));
    x += tp;
  }
  return { pieces, diagnostics };
}

export interface PlateGirderOptions {
  readonly web: { readonly h: number; readonly tw: number };
  readonly top: { readonly b: number; readonly t: number };
  readonly bottom: { readonly b: number; readonly t: number };
}

/** A welded plate girder: web centred at the origin, flanges on its top and bottom edges (welds not modelled). */
export function plateGirder(options: PlateGirderOptions): BuiltUp {
  const { web, top, bottom } = options;
  const diagnostics = [...plateDiagnostics('web', web.h, web.tw), ...plateDiagnostics('top flange', top.b, top.t), ...plateDiagnostics('bottom flange', bottom.b, bottom.t)];
  if (diagnostics.length > 0) return { pieces: [], diagnostics };
  return {
    pieces: [
      shapePiece('web', 'plate', { b: web.h, t: web.tw }, at(0, 0, 90)),
      shapePiece('top flange', 'plate', { b: top.b, t: top.t }, at(0, web.h / 2 + top.t / 2)),
      shapePiece('bottom flange', 'plate', { b: bottom.b, t: bottom.t }, at(0, -web.h / 2 - bottom.t / 2)),
    ],
    diagnostics,
  };
}
