/**
 * Each part of a section as a fabricator cuts it: its own (local) coordinates, laid flat, with the
 * holes that cut-outs later in the document make in it.
 *
 * For every visible added part P, in document order: P's local region minus every visible
 * subtracted part that comes after it, mapped into P's local frame (the inverse of P's placement:
 * translate back, rotate back, then mirror). Parts added over P do not change how P is cut.
 * Units: the document's. Arcs stay exact (the Boolean adapter restores them).
 * Does not: split a part that a cut-out divides into pieces (they stay one entry), or nest parts.
 */
import type { SectionDocument } from '../document/types.ts';
import { differenceRegions, normaliseRegion, rotateRegion, transformRegion, translateRegion } from '../geometry/index.ts';
import type { Region } from '../geometry/types.ts';
import { localRegion, partLabel, placedPart } from '../section/compose.ts';
import type { DxfCutPart } from './write.ts';

export function cutParts(doc: SectionDocument): DxfCutPart[] {
  const out: DxfCutPart[] = [];
  doc.parts.forEach((part, index) => {
    if (!part.visible || part.operation !== 'add') return;
    const local = localRegion(part, doc.unit);
    if (local.diagnostics.length > 0) return;
    let region: Region = normaliseRegion(local.region);
    const { x, y, rotationDeg, mirror } = part.placement;
    for (let k = index + 1; k < doc.parts.length; k++) {
      const cut = doc.parts[k];
      if (!cut || !cut.visible || cut.operation !== 'subtract') continue;
      const placed = placedPart(cut, k, doc.unit);
      if (placed.diagnostics.length > 0 || placed.region.length === 0) continue;
      const back = rotateRegion(translateRegion(placed.region, -x, -y), -rotationDeg);
      const inFrame = mirror ? transformRegion(back, { x: 0, y: 0, rotationDeg: 0, mirror: true }) : back;
      region = differenceRegions(region, normaliseRegion(inFrame), { context: 'cutting parts for DXF', parts: [partLabel(part, index), partLabel(cut, k)] });
    }
    if (region.length > 0) out.push({ name: partLabel(part, index), region });
  });
  return out;
}
