/**
 * A point list (pasted from a spreadsheet or typed in the coordinates dialog) → a polygon part,
 * through the command line's own reader (core/parts/points.ts parsePointList: tab, comma,
 * semicolon or space separated, optional header, optional third column bulge or radius) and
 * core's geometry checks (validateRegion: crossings, zero area, limits). The numbers are in the
 * document's unit. The part is placed at the centre of its points' box, wound counter-clockwise
 * (normaliseRegion), arcs kept exact as bulges. Errors name the line, the column or the point.
 */
import type { PolygonPart, SectionDocument } from '../../core/document/types.ts';
import { normaliseRegion, validateRegion } from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { parsePointList, type ThirdColumn } from '../../core/parts/points.ts';

export type OutlineFromList = { readonly ok: true; readonly part: PolygonPart; readonly note: string } | { readonly ok: false; readonly errors: readonly string[] };

export function outlineFromPointList(text: string, third: 'auto' | ThirdColumn, doc: SectionDocument, operation: 'add' | 'subtract'): OutlineFromList {
  if (text.trim() === '') return { ok: false, errors: ['Paste or type the points, one x y per line.'] };
  const list = parsePointList(text, third === 'auto' ? undefined : third);
  if (!list.ok) return { ok: false, errors: list.errors.map((e) => e.message) };
  const xy = Float64Array.from(list.points.flat());
  const arcs = list.bulges.some((b) => b !== 0);
  const raw: Region = [{ outer: arcs ? { xy, bulge: Float64Array.from(list.bulges) } : { xy }, holes: [] }];
  const problems = validateRegion(raw);
  if (problems.length > 0) return { ok: false, errors: problems.map((d) => `${d.vertex !== undefined ? `point ${d.vertex + 1}: ` : ''}${d.message}`) };
  const ring = normaliseRegion(raw)[0]?.outer;
  if (!ring) return { ok: false, errors: ['the points enclose no area'] };
  const n = ring.xy.length / 2;
  let xMin = Infinity, xMax = -Infinity, yMin = Infinity, yMax = -Infinity;
  for (let i = 0; i < n; i++) {
    const x = ring.xy[2 * i] as number, y = ring.xy[2 * i + 1] as number;
    xMin = Math.min(xMin, x); xMax = Math.max(xMax, x); yMin = Math.min(yMin, y); yMax = Math.max(yMax, y);
  }
  const ox = (xMin + xMax) / 2, oy = (yMin + yMax) / 2;
  const outer = Array.from({ length: n }, (_, i) => [(ring.xy[2 * i] as number) - ox, (ring.xy[2 * i + 1] as number) - oy] as const);
  const bulges = ring.bulge ? Array.from(ring.bulge) : undefined;
  const part: PolygonPart = {
    id: '', name: `Pasted outline ${doc.parts.length + 1}`, type: 'polygon', operation, material: null, visible: true,
    placement: { x: ox, y: oy, rotationDeg: 0, mirror: false },
    outer,
    ...(bulges !== undefined && bulges.some((b) => b !== 0) ? { outerBulges: bulges } : {}),
    holes: [],
    ...(operation === 'subtract' ? { cutoutRole: 'void' as const } : {}),
  };
  const arcNote = list.third !== null ? `, third column read as ${list.third === 'bulge' ? 'bulges' : 'arc radii'}` : '';
  return { ok: true, part, note: `${operation === 'subtract' ? 'Cut' : 'Added'} an outline of ${list.points.length} points in ${doc.unit}${list.header ? ' (header row skipped)' : ''}${arcNote}` };
}
