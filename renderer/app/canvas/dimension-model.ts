/**
 * Dimension lines for the selected part(s), in section coordinates (x right, y up, document
 * unit): the selection's overall width (above it) and depth (to its right); for one rotated
 * rectangle its own width and height along its edges; for one round its diameter; for one
 * standard part its main dimensions by trade symbol (d, bf, tw, tf …) as a callout. Every text
 * follows the one precision rule of dimension labels (core/units/dimension.ts). Drawing only:
 * no number here is a result.
 */
import type { Part } from '../../../core/document/types.ts';
import { getPartType } from '../../../core/parts/index.ts';
import { formatDimension } from '../../../core/units/dimension.ts';
import type { LengthUnit } from '../../../core/units/types.ts';
import { outlineBox, toWorld, type PartOutline, type Vec } from '../../editor/geometry.ts';

/** A dimension between a and b, drawn `offset` pixels away from them along `normal` (unit vector, section axes). */
export interface DimensionLine {
  readonly id: string;
  readonly a: Vec;
  readonly b: Vec;
  readonly normal: Vec;
  readonly offset: number;
  readonly text: string;
}

export interface SelectionDimensions {
  readonly lines: readonly DimensionLine[];
  /** One text (a round's diameter, a standard part's main dimensions) beside the part, or null. */
  readonly callout: { readonly id: string; readonly text: string; readonly anchor: Vec } | null;
}

const EMPTY: SelectionDimensions = { lines: [], callout: null };

/** Rotation that is a whole number of quarter turns (then the overall box already gives the part's own sizes). */
const squareToAxes = (deg: number): boolean => Math.abs(deg / 90 - Math.round(deg / 90)) < 1e-9;

export function selectionDimensions(parts: readonly Part[], outlines: readonly PartOutline[], selection: readonly string[], unit: LengthUnit): SelectionDimensions {
  const chosen = new Set(selection);
  const picked = parts.map((part, i) => ({ part, o: outlines[i] })).filter((x): x is { part: Part; o: PartOutline } => chosen.has(x.part.id) && x.o !== undefined && x.part.visible);
  if (picked.length === 0) return EMPTY;
  const box = outlineBox(picked.map((x) => x.o));
  if (!box) return EMPTY;
  const lines: DimensionLine[] = [
    { id: 'part-width', a: [box.xMin, box.yMax], b: [box.xMax, box.yMax], normal: [0, 1], offset: 22, text: formatDimension(box.xMax - box.xMin, unit) },
    { id: 'part-depth', a: [box.xMax, box.yMin], b: [box.xMax, box.yMax], normal: [1, 0], offset: 22, text: formatDimension(box.yMax - box.yMin, unit) },
  ];
  if (picked.length !== 1) return { lines, callout: null };
  const { part } = picked[0] as { part: Part; o: PartOutline };
  const topRight: Vec = [box.xMax, box.yMax];
  if (part.type === 'rectangle' && !squareToAxes(part.placement.rotationDeg)) {
    const w = part.width / 2, h = part.height / 2;
    const at = (x: number, y: number): Vec => toWorld(part.placement, [x, y]);
    const n = (x: number, y: number): Vec => {
      const o = toWorld(part.placement, [0, 0]);
      const p = toWorld(part.placement, [x, y]);
      return [p[0] - o[0], p[1] - o[1]];
    };
    lines.push({ id: 'part-b', a: at(-w, -h), b: at(w, -h), normal: n(0, -1), offset: 18, text: formatDimension(part.width, unit) });
    lines.push({ id: 'part-h', a: at(w, -h), b: at(w, h), normal: n(1, 0), offset: 18, text: formatDimension(part.height, unit) });
  }
  if (part.type === 'circle') return { lines, callout: { id: 'part-callout', text: `⌀ ${formatDimension(part.diameter, unit)}`, anchor: topRight } };
  if (part.type === 'shape') {
    const type = getPartType(part.shape);
    const specs = (type?.params ?? []).filter((s) => (s.quantity ?? 'length') === 'length' && type?.regionUnit === undefined);
    const sizes = specs.flatMap((s) => {
      const v = part.params[s.key];
      return v === undefined || (s.optional === true && v === 0) ? [] : [`${s.key} ${formatDimension(v, unit)}`];
    });
    const head = part.designation ?? type?.label ?? part.shape;
    return { lines, callout: { id: 'part-callout', text: sizes.length > 0 ? `${head}: ${sizes.join(' · ')}` : head, anchor: topRight } };
  }
  return { lines, callout: null };
}
