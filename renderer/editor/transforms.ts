/**
 * Transforms of document parts, as pure functions SectionDocument → SectionDocument.
 * Everything works on placements (translation, rotation, mirror), so parametric parts stay
 * parametric: a rotated rectangle is still a rectangle with its width and height.
 * Section coordinates, y up; angles in degrees, counter-clockwise.
 */
import type { Part, Placement, SectionDocument } from '../../core/document/types.ts';
import type { Box, PartOutline, Vec } from './geometry.ts';
import { outlineBox } from './geometry.ts';

/** Angles kept in (−180, 180] so documents stay readable after many turns. */
export function normaliseDegrees(deg: number): number {
  let a = deg % 360;
  if (a <= -180) a += 360;
  if (a > 180) a -= 360;
  return a === 0 ? 0 : a;
}

function mapParts(doc: SectionDocument, ids: readonly string[], fn: (p: Part) => Part): SectionDocument {
  const set = new Set(ids);
  return { ...doc, parts: doc.parts.map((p) => (set.has(p.id) ? fn(p) : p)) };
}

function withPlacement(p: Part, placement: Placement): Part {
  return { ...p, placement };
}

export function translateParts(doc: SectionDocument, ids: readonly string[], dx: number, dy: number): SectionDocument {
  return mapParts(doc, ids, (p) => withPlacement(p, { ...p.placement, x: p.placement.x + dx, y: p.placement.y + dy }));
}

/** Exact quarter turns stay exact: cos/sin of multiples of 90° are taken as 0 and ±1. */
function cosSin(deg: number): [number, number] {
  const n = normaliseDegrees(deg);
  if (n === 0) return [1, 0];
  if (n === 90) return [0, 1];
  if (n === 180) return [-1, 0];
  if (n === -90) return [0, -1];
  const a = (n * Math.PI) / 180;
  return [Math.cos(a), Math.sin(a)];
}

/** Rotate about a pivot: world' = R(φ)(world − c) + c, so rotation adds φ and the origin turns about c. */
export function rotateParts(doc: SectionDocument, ids: readonly string[], deg: number, pivot: Vec): SectionDocument {
  const [c, s] = cosSin(deg);
  return mapParts(doc, ids, (p) => {
    const dx = p.placement.x - pivot[0];
    const dy = p.placement.y - pivot[1];
    return withPlacement(p, {
      ...p.placement,
      x: pivot[0] + c * dx - s * dy,
      y: pivot[1] + s * dx + c * dy,
      rotationDeg: normaliseDegrees(p.placement.rotationDeg + deg),
    });
  });
}

/**
 * Mirror about the vertical line x = at ('left-right') or the horizontal line y = at ('top-bottom').
 * With F the reflection, F·R(θ)·M equals R(−θ)·M' (vertical) or R(180° − θ)·M' (horizontal),
 * where M' toggles the part's mirror flag.
 */
export function mirrorParts(doc: SectionDocument, ids: readonly string[], axis: 'left-right' | 'top-bottom', at: number): SectionDocument {
  return mapParts(doc, ids, (p) => {
    const { x, y, rotationDeg, mirror } = p.placement;
    return axis === 'left-right'
      ? withPlacement(p, { x: 2 * at - x, y, rotationDeg: normaliseDegrees(-rotationDeg), mirror: !mirror })
      : withPlacement(p, { x, y: 2 * at - y, rotationDeg: normaliseDegrees(180 - rotationDeg), mirror: !mirror });
  });
}

export function deleteParts(doc: SectionDocument, ids: readonly string[]): SectionDocument {
  const set = new Set(ids);
  return { ...doc, parts: doc.parts.filter((p) => !set.has(p.id)) };
}

export function uniquePartId(doc: SectionDocument, stem = 'part'): string {
  const used = new Set(doc.parts.map((p) => p.id));
  let n = doc.parts.length + 1;
  while (used.has(`${stem}-${n}`)) n++;
  return `${stem}-${n}`;
}

/** Copies placed after the originals in the list, offset by (dx, dy); returns the new ids too. */
export function duplicateParts(doc: SectionDocument, ids: readonly string[], dx: number, dy: number): { doc: SectionDocument; ids: string[] } {
  let out = doc;
  const newIds: string[] = [];
  for (const id of ids) {
    const p = out.parts.find((q) => q.id === id);
    if (!p) continue;
    const copyId = uniquePartId(out);
    newIds.push(copyId);
    const copy: Part = { ...p, id: copyId, name: `${p.name} copy`, placement: { ...p.placement, x: p.placement.x + dx, y: p.placement.y + dy } };
    out = { ...out, parts: [...out.parts, copy] };
  }
  return { doc: out, ids: newIds };
}

export type AlignEdge = 'left' | 'right' | 'top' | 'bottom' | 'centre-x' | 'centre-y';

/** Align each selected part's bounding box to the same edge (or centre line) of the selection's box. */
export function alignParts(doc: SectionDocument, ids: readonly string[], edge: AlignEdge, outlines: readonly PartOutline[]): SectionDocument {
  const chosen = outlines.filter((o) => ids.includes(o.partId));
  const all = outlineBox(chosen);
  if (!all) return doc;
  let out = doc;
  for (const o of chosen) {
    const b = outlineBox([o]) as Box;
    const [dx, dy] = alignOffset(edge, b, all);
    if (dx !== 0 || dy !== 0) out = translateParts(out, [o.partId], dx, dy);
  }
  return out;
}

function alignOffset(edge: AlignEdge, b: Box, all: Box): [number, number] {
  switch (edge) {
    case 'left':
      return [all.xMin - b.xMin, 0];
    case 'right':
      return [all.xMax - b.xMax, 0];
    case 'bottom':
      return [0, all.yMin - b.yMin];
    case 'top':
      return [0, all.yMax - b.yMax];
    case 'centre-x':
      return [(all.xMin + all.xMax) / 2 - (b.xMin + b.xMax) / 2, 0];
    case 'centre-y':
      return [0, (all.yMin + all.yMax) / 2 - (b.yMin + b.yMax) / 2];
  }
}

/**
 * An array: `count` copies of the parts `ids`, the k-th moved by k·(dx, dy) from the originals
 * (so count 2 with a pitch of one ply's thickness builds a 3-ply member). Copies are named
 * "<name> 2", "<name> 3", … and placed after the originals; returns the new ids in order.
 */
export function arrayParts(doc: SectionDocument, ids: readonly string[], count: number, dx: number, dy: number): { doc: SectionDocument; ids: string[] } {
  if (!Number.isInteger(count) || count < 1) throw new Error(`arrayParts: count must be a whole number ≥ 1, got ${count}`);
  let out = doc;
  const newIds: string[] = [];
  for (let k = 1; k <= count; k++) {
    for (const id of ids) {
      const p = doc.parts.find((q) => q.id === id);
      if (!p) continue;
      const copyId = uniquePartId(out);
      newIds.push(copyId);
      const copy: Part = { ...p, id: copyId, name: `${p.name} ${k + 1}`, placement: { ...p.placement, x: p.placement.x + k * dx, y: p.placement.y + k * dy } };
      out = { ...out, parts: [...out.parts, copy] };
    }
  }
  return { doc: out, ids: newIds };
}

export type DistributeMode = 'centres' | 'gaps' | 'touch';

/**
 * Spread the parts `ids` along x or y by their bounding boxes, in the order of their lower edge:
 * - 'centres': the first and last stay; the centres between are equally spaced;
 * - 'gaps': the first and last stay; the gaps between neighbouring boxes are made equal;
 * - 'touch': the first stays; each next box starts where the one before ends (plies side by side).
 */
export function distributeParts(doc: SectionDocument, ids: readonly string[], axis: 'x' | 'y', mode: DistributeMode, outlines: readonly PartOutline[]): SectionDocument {
  const lo = (b: Box): number => (axis === 'x' ? b.xMin : b.yMin);
  const hi = (b: Box): number => (axis === 'x' ? b.xMax : b.yMax);
  const boxes = outlines
    .filter((o) => ids.includes(o.partId))
    .map((o) => ({ id: o.partId, box: outlineBox([o]) as Box }))
    .sort((a, b) => lo(a.box) - lo(b.box) || hi(a.box) - hi(b.box));
  if (boxes.length < 2 || (mode !== 'touch' && boxes.length < 3)) return doc;
  const first = boxes[0] as { id: string; box: Box };
  const last = boxes[boxes.length - 1] as { id: string; box: Box };
  const targets: number[] = []; // new lower edge of each box
  if (mode === 'touch') {
    let at = lo(first.box);
    for (const b of boxes) {
      targets.push(at);
      at += hi(b.box) - lo(b.box);
    }
  } else if (mode === 'centres') {
    const c0 = (lo(first.box) + hi(first.box)) / 2;
    const c1 = (lo(last.box) + hi(last.box)) / 2;
    boxes.forEach((b, i) => targets.push(c0 + ((c1 - c0) * i) / (boxes.length - 1) - (hi(b.box) - lo(b.box)) / 2));
  } else {
    const sizes = boxes.reduce((sum, b) => sum + hi(b.box) - lo(b.box), 0);
    const gap = (hi(last.box) - lo(first.box) - sizes) / (boxes.length - 1);
    let at = lo(first.box);
    for (const b of boxes) {
      targets.push(at);
      at += hi(b.box) - lo(b.box) + gap;
    }
  }
  let out = doc;
  boxes.forEach((b, i) => {
    const d = (targets[i] as number) - lo(b.box);
    if (d !== 0) out = translateParts(out, [b.id], axis === 'x' ? d : 0, axis === 'y' ? d : 0);
  });
  return out;
}

/** Move parts up (toward the end, drawn last) or down in the list by one place. */
export function reorderPart(doc: SectionDocument, id: string, direction: -1 | 1): SectionDocument {
  const i = doc.parts.findIndex((p) => p.id === id);
  const j = i + direction;
  if (i < 0 || j < 0 || j >= doc.parts.length) return doc;
  const parts = [...doc.parts];
  [parts[i], parts[j]] = [parts[j] as Part, parts[i] as Part];
  return { ...doc, parts };
}

/**
 * Re-express every length in another unit through `scale` (from core/units), so the physical
 * section is unchanged. `isLengthParam(shape, key)` says which standard-part parameters are
 * lengths (core/parts ParamSpec.quantity); ratios, counts and nominal sizes stay as they are.
 */
export function scaleDocumentLengths(doc: SectionDocument, scale: (v: number) => number, isLengthParam: (shape: string, key: string) => boolean = () => true): SectionDocument {
  const pt = (p: readonly [number, number]): [number, number] => [scale(p[0]), scale(p[1])];
  const parts = doc.parts.map((p): Part => {
    const placement = { ...p.placement, x: scale(p.placement.x), y: scale(p.placement.y) };
    switch (p.type) {
      case 'rectangle':
        return { ...p, placement, width: scale(p.width), height: scale(p.height) };
      case 'circle':
        return { ...p, placement, diameter: scale(p.diameter) };
      case 'polygon':
        return { ...p, placement, outer: p.outer.map(pt), holes: p.holes.map((h) => h.map(pt)) };
      case 'shape':
        return {
          ...p,
          placement,
          params: Object.fromEntries(Object.entries(p.params).map(([k, v]) => [k, isLengthParam(p.shape, k) ? scale(v) : v])),
        };
    }
  });
  return { ...doc, parts };
}
