/**
 * The selected part's dimension lines on the drawing (dimension-model.ts says which): extension
 * lines from the part, the dimension line with end ticks, and its label, which goes to the label
 * placer with the drawing's other labels so none covers another.
 */
import type { ReactElement } from 'react';
import { Line } from 'react-konva';
import type { Part } from '../../../core/document/types.ts';
import type { LengthUnit } from '../../../core/units/types.ts';
import type { PartOutline, Vec } from '../../editor/geometry.ts';
import { toScreen, type View } from '../../controller/view.ts';
import { COLOURS } from './palette.ts';
import { label } from './label-request.ts';
import type { LabelBox, LabelRequest } from './labels.ts';
import { selectionDimensions } from './dimension-model.ts';

export function selectionDimensionOverlay(parts: readonly Part[], outlines: readonly PartOutline[], selection: readonly string[], unit: LengthUnit, view: View): { items: ReactElement[]; labels: LabelRequest[]; reserved: LabelBox[] } {
  const dims = selectionDimensions(parts, outlines, selection, unit);
  const items: ReactElement[] = [];
  const labels: LabelRequest[] = [];
  for (const d of dims.lines) {
    const a = toScreen(view, d.a);
    const b = toScreen(view, d.b);
    // Screen y is down: the section normal (nx, ny) points (nx, −ny) on screen.
    const n: Vec = [d.normal[0], -d.normal[1]];
    const len = Math.hypot(n[0], n[1]) || 1;
    const u: Vec = [n[0] / len, n[1] / len];
    const at = (p: Vec, k: number): [number, number] => [p[0] + u[0] * k, p[1] + u[1] * k];
    const [a1, b1] = [at(a, d.offset), at(b, d.offset)];
    const along: Vec = [b1[0] - a1[0], b1[1] - a1[1]];
    const l = Math.hypot(along[0], along[1]) || 1;
    // Oblique ticks at 45°, the architectural mark, readable at any size.
    const t: Vec = [(along[0] / l + u[0]) * 4, (along[1] / l + u[1]) * 4];
    items.push(<Line key={`${d.id}-e1`} points={[...at(a, 3), ...at(a, d.offset + 5)]} stroke={COLOURS.selectionDimension} strokeWidth={0.8} />);
    items.push(<Line key={`${d.id}-e2`} points={[...at(b, 3), ...at(b, d.offset + 5)]} stroke={COLOURS.selectionDimension} strokeWidth={0.8} />);
    items.push(<Line key={`${d.id}-l`} points={[...a1, ...b1]} stroke={COLOURS.selectionDimension} strokeWidth={1} />);
    for (const [k, p] of [a1, b1].entries()) items.push(<Line key={`${d.id}-t${k}`} points={[p[0] - t[0], p[1] - t[1], p[0] + t[0], p[1] + t[1]]} stroke={COLOURS.selectionDimension} strokeWidth={1.4} />);
    const mid: Vec = [(a1[0] + b1[0]) / 2, (a1[1] + b1[1]) / 2];
    const req = label(d.id, d.text, mid, [], 1, 11, COLOURS.selectionDimension);
    // Preferred: centred on the line, on its outer side.
    const out = (k: number): [number, number] => [-req.width / 2 + u[0] * (k + req.width / 2), -req.height / 2 + u[1] * (k + req.height / 2)];
    labels.push({ ...req, offsets: [out(3), out(-req.height - 6)] });
  }
  if (dims.callout) {
    const s = toScreen(view, dims.callout.anchor);
    labels.push(label(dims.callout.id, dims.callout.text, s, [[28, -40], [28, 4], [-20, -56]], 2, 11, COLOURS.selectionDimension, 'bold'));
  }
  return { items, labels, reserved: [] };
}
