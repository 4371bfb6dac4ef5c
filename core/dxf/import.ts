/**
 * DXF import: text → closed loops → material and holes → a Sectionsmith document.
 *
 * Units: the drawing's unit comes from the header's $INSUNITS (1 in, 2 ft, 4 mm, 5 cm, 6 m; the
 *   AutoCAD DXF Reference, HEADER section). When it is absent or 0 ("unitless") the caller must
 *   say (`unit`); a unit Sectionsmith documents do not use (yards, microns, …) is an error.
 *   Coordinates are kept as written: no conversion.
 * Tolerances, both named in the result:
 *   joining   gaps up to `joinTolerance` (default JOIN_RATIO = 1e-6 of the drawing's diagonal)
 *             between ends of lines and arcs are closed and reported; segments no longer than it
 *             are refused (chains.ts);
 *   chords    ELLIPSE and SPLINE are drawn with chords within `chordTolerance` (curves.ts).
 * Material and holes: loops are nested by containment; a loop inside no other, or inside a hole,
 *   is material (an outer boundary); a loop directly inside material is a hole of it. So a loop in
 *   a hole is material again. Crossing or overlapping loops are refused through
 *   core/geometry's validateRegion, with the entities named.
 * Imported holes are voids: they are holes of the polygon part, with no fastener role.
 * Errors never touch an open document: the caller gets either a whole document or messages.
 * Each message names the entity type, handle and layer (and block, when inserted) and what is wrong.
 */
import { DOCUMENT_FORMAT, DOCUMENT_VERSION, type CutoutRole, type PolygonPart, type SectionFile } from '../document/types.ts';
import type { Diagnostic, Polygon, Region, Ring } from '../geometry/types.ts';
import { pointInRing, ringBounds, ringSignedArea, unionRegions, validateRegion, BooleanError } from '../geometry/index.ts';
import { reverseRing } from '../geometry/ring.ts';
import type { LengthUnit } from '../units/types.ts';
import { joinPaths, type Loop } from './chains.ts';
import { describeRef, drawingPaths, type EntityRef } from './curves.ts';
import { parseDxfText, type DxfDrawing } from './parse.ts';

export const JOIN_RATIO = 1e-6;

/** $INSUNITS codes that are document units (AutoCAD DXF Reference, HEADER: $INSUNITS). */
const INSUNITS: Readonly<Record<number, LengthUnit>> = { 1: 'in', 2: 'ft', 4: 'mm', 5: 'cm', 6: 'm' };
const INSUNITS_NAMES: Readonly<Record<number, string>> = {
  3: 'miles', 7: 'kilometres', 8: 'microinches', 9: 'mils', 10: 'yards', 11: 'ångströms', 12: 'nanometres', 13: 'microns',
  14: 'decimetres', 15: 'decametres', 16: 'hectometres', 17: 'gigametres', 18: 'astronomical units', 19: 'light years', 20: 'parsecs',
  21: 'US survey feet', 22: 'US survey inches', 23: 'US survey yards', 24: 'US survey miles',
};

export type DxfErrorCode = 'not-dxf' | 'unit-missing' | 'unit-unsupported' | 'layer-unknown' | 'entity' | 'chain' | 'crossing' | 'no-geometry';

export interface DxfError {
  readonly code: DxfErrorCode;
  readonly message: string;
  readonly entity?: EntityRef;
}

export interface DxfImportOptions {
  /** The drawing's unit when $INSUNITS does not give one. */
  readonly unit?: LengthUnit;
  /** Layers to read; undefined = every layer. */
  readonly layers?: readonly string[];
  readonly chordTolerance?: number;
  readonly joinTolerance?: number;
  /** 'parts': one part per outer loop (default); 'one': the loops united into one part when they touch. */
  readonly grouping?: 'parts' | 'one';
}

export interface DxfLayerInfo {
  readonly name: string;
  /** Geometry entities on it (LINE, ARC, CIRCLE, polylines, ELLIPSE, SPLINE, also inside blocks). */
  readonly entities: number;
}

export interface ImportedPolygon {
  readonly outer: Ring;
  readonly holes: readonly Ring[];
  /** Layers its boundaries came from. */
  readonly layers: readonly string[];
}

export interface DxfImport {
  readonly unit: LengthUnit;
  readonly unitFrom: 'file' | 'caller';
  readonly polygons: readonly ImportedPolygon[];
  readonly layers: readonly DxfLayerInfo[];
  readonly joinTolerance: number;
  /** Gaps closed, approximations made, entities ignored: every line should be shown to the user. */
  readonly notes: readonly string[];
  readonly ignored: readonly { readonly type: string; readonly count: number }[];
}

export type DxfImportResult = { readonly ok: true; readonly value: DxfImport } | { readonly ok: false; readonly errors: readonly DxfError[]; readonly layers: readonly DxfLayerInfo[] };

/** What a DXF says about itself before importing: its unit (null when it has none) and layers. */
export interface DxfSummary {
  readonly unit: LengthUnit | null;
  /** Why `unit` is null: absent, unitless, or a unit documents do not use. */
  readonly unitNote: string;
  readonly layers: readonly DxfLayerInfo[];
}

/** True when the text looks like an ASCII DXF (for choosing a reader by content, not only by name). */
export function looksLikeDxf(text: string): boolean {
  return /^\s*(0\s*[\r\n]+\s*SECTION|999\s*[\r\n])/.test(text.slice(0, 200));
}

function unitOf(drawing: DxfDrawing): { unit: LengthUnit | null; code: number | null; note: string } {
  const raw = drawing.header.$INSUNITS;
  if (typeof raw !== 'number') return { unit: null, code: null, note: 'the file has no $INSUNITS (drawing unit)' };
  const unit = INSUNITS[raw];
  if (unit !== undefined) return { unit, code: raw, note: `$INSUNITS = ${raw} (${unit})` };
  if (raw === 0) return { unit: null, code: 0, note: 'the file says its unit is "unitless" ($INSUNITS = 0)' };
  return { unit: null, code: raw, note: `$INSUNITS = ${raw}${INSUNITS_NAMES[raw] !== undefined ? ` (${INSUNITS_NAMES[raw]})` : ''} is not a unit Sectionsmith documents use (in, ft, mm, cm, m)` };
}

function layerList(map: ReadonlyMap<string, number>): DxfLayerInfo[] {
  return [...map.entries()].map(([name, entities]) => ({ name, entities })).sort((a, b) => a.name.localeCompare(b.name));
}

/** The unit and layers of a DXF, for asking the user before importing; null when it cannot be read. */
export function summariseDxf(text: string): { ok: true; summary: DxfSummary } | { ok: false; message: string } {
  const parsed = parseDxfText(text);
  if (!parsed.ok) return { ok: false, message: parsed.message };
  const unit = unitOf(parsed.drawing);
  const curves = drawingPaths(parsed.drawing.entities, parsed.drawing.blocks);
  return { ok: true, summary: { unit: unit.unit, unitNote: unit.note, layers: layerList(curves.layers) } };
}

const fmt = (v: number): string => Number(v.toPrecision(6)).toString();

function toRing(loop: Loop): Ring {
  const xy = Float64Array.from(loop.xy);
  return loop.bulge.some((b) => b !== 0) ? { xy, bulge: Float64Array.from(loop.bulge) } : { xy };
}

interface Nested {
  readonly polygons: { outer: number; holes: number[] }[];
  readonly errors: DxfError[];
}

/** Nests loops by containment: parent = the smallest loop containing one of its vertices. */
function nestLoops(rings: readonly Ring[], loops: readonly Loop[]): Nested {
  const order = rings.map((r, i) => ({ i, area: Math.abs(ringSignedArea(r)), box: ringBounds(r) })).sort((a, b) => b.area - a.area);
  const parent = new Array<number>(rings.length).fill(-1);
  const depth = new Array<number>(rings.length).fill(0);
  const errors: DxfError[] = [];
  for (let a = 0; a < order.length; a++) {
    const inner = order[a];
    if (!inner) continue;
    const ring = rings[inner.i] as Ring;
    for (let b = a - 1; b >= 0; b--) {
      const outer = order[b];
      if (!outer) continue;
      if (outer.box.minX > inner.box.minX || outer.box.maxX < inner.box.maxX || outer.box.minY > inner.box.minY || outer.box.maxY < inner.box.maxY) continue;
      const n = ring.xy.length / 2;
      let side: 1 | 0 | -1 = 0;
      for (let k = 0; k < n && side === 0; k++) side = pointInRing(rings[outer.i] as Ring, ring.xy[2 * k] ?? 0, ring.xy[2 * k + 1] ?? 0);
      if (side === 0) {
        const ra = (loops[inner.i] as Loop).segmentRefs[0], rb = (loops[outer.i] as Loop).segmentRefs[0];
        if (ra && rb) errors.push({ code: 'crossing', entity: ra, message: `${describeRef(ra)}: its loop lies on the loop of ${describeRef(rb)} (the same boundary drawn twice?)` });
        break;
      }
      if (side === 1) {
        parent[inner.i] = outer.i;
        depth[inner.i] = (depth[outer.i] ?? 0) + 1;
        break;
      }
    }
  }
  const polygons: { outer: number; holes: number[] }[] = [];
  const polygonOf = new Map<number, number>();
  for (const { i } of order) {
    if ((depth[i] ?? 0) % 2 === 0) {
      polygonOf.set(i, polygons.length);
      polygons.push({ outer: i, holes: [] });
    } else {
      polygons[polygonOf.get(parent[i] ?? -1) ?? -1]?.holes.push(i);
    }
  }
  return { polygons, errors };
}

/** A validation diagnostic (crossing loops, …) in the file's words: the entity of the segment it points at. */
function crossingError(d: Diagnostic, loopOf: (polygon: number, ring: number) => Loop | undefined): DxfError {
  const loop = loopOf(d.polygon ?? 0, d.ring ?? -1);
  const ref = loop?.segmentRefs[Math.max(0, d.vertex ?? 0)] ?? loop?.segmentRefs[0];
  const what = d.code === 'self-intersection' ? 'the loop crosses itself' : d.code === 'hole-outside' || d.code === 'overlap' ? 'loops cross or overlap' : 'bad loop';
  const at = d.at ? ` near (${fmt(d.at[0])}, ${fmt(d.at[1])})` : '';
  return ref ? { code: 'crossing', entity: ref, message: `${describeRef(ref)}: ${what}${at}: ${d.message}` } : { code: 'crossing', message: `${what}${at}: ${d.message}` };
}

/** Reads a DXF into polygons (material with holes), or errors that name the entity and the problem. */
export function importDxf(text: string, options: DxfImportOptions = {}): DxfImportResult {
  const parsed = parseDxfText(text);
  if (!parsed.ok) return { ok: false, errors: [{ code: 'not-dxf', message: parsed.message }], layers: [] };
  const { drawing } = parsed;
  const u = unitOf(drawing);
  const all = drawingPaths(drawing.entities, drawing.blocks);
  const layers = layerList(all.layers);
  const fail = (errors: DxfError[]): DxfImportResult => ({ ok: false, errors, layers });
  if (u.unit === null && u.code !== null && u.code !== 0) return fail([{ code: 'unit-unsupported', message: `${u.note}: rescale the drawing to one of them in your CAD program` }]);
  const unit = u.unit ?? options.unit;
  if (unit === undefined) return fail([{ code: 'unit-missing', message: `${u.note}: say which unit its coordinates are in (in, ft, mm, cm or m)` }]);
  const wanted = options.layers;
  if (wanted !== undefined) {
    const unknown = wanted.filter((name) => !all.layers.has(name));
    if (unknown.length > 0) return fail([{ code: 'layer-unknown', message: `no geometry on layer${unknown.length === 1 ? '' : 's'} ${unknown.map((n) => `"${n}"`).join(', ')}; the layers with geometry are ${layers.map((l) => `"${l.name}" (${l.entities})`).join(', ') || 'none'}` }]);
  }
  const curves = wanted === undefined && options.chordTolerance === undefined ? all : drawingPaths(drawing.entities, drawing.blocks, {
    ...(wanted !== undefined ? { layers: new Set(wanted) } : {}), ...(options.chordTolerance !== undefined ? { chordTolerance: options.chordTolerance } : {}),
  });
  if (curves.errors.length > 0) return fail(curves.errors.map((e) => ({ code: 'entity', entity: e.ref, message: `${describeRef(e.ref)} ${e.message}` })));
  if (curves.paths.length === 0) {
    return fail([{ code: 'no-geometry', message: `no lines, arcs, circles, polylines, ellipses or splines${wanted !== undefined ? ` on layer${wanted.length === 1 ? '' : 's'} ${wanted.map((n) => `"${n}"`).join(', ')}` : ''} in model space` }]);
  }
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of curves.paths) {
    for (let k = 0; k < p.xy.length; k += 2) {
      const x = p.xy[k] ?? 0, y = p.xy[k + 1] ?? 0;
      minX = Math.min(minX, x); maxX = Math.max(maxX, x); minY = Math.min(minY, y); maxY = Math.max(maxY, y);
    }
  }
  const diagonal = Math.hypot(maxX - minX, maxY - minY);
  const joinTolerance = options.joinTolerance ?? JOIN_RATIO * diagonal;
  const chains = joinPaths(curves.paths, joinTolerance);
  if (chains.errors.length > 0) return fail(chains.errors.map((e) => ({ code: 'chain', entity: e.ref, message: e.message })));
  const rings = chains.loops.map(toRing);
  const nested = nestLoops(rings, chains.loops);
  if (nested.errors.length > 0) return fail(nested.errors);
  const region: Region = nested.polygons.map((p): Polygon => ({ outer: rings[p.outer] as Ring, holes: p.holes.map((h) => rings[h] as Ring) }));
  const loopOf = (polygon: number, ring: number): Loop | undefined => {
    const p = nested.polygons[polygon];
    return p === undefined ? undefined : chains.loops[ring < 0 ? p.outer : (p.holes[ring] ?? -1)];
  };
  const diagnostics = validateRegion(region);
  if (diagnostics.length > 0) return fail(diagnostics.map((d) => crossingError(d, loopOf)));
  const ignored = [...curves.ignored.entries()].map(([type, count]) => ({ type, count })).sort((a, b) => b.count - a.count);
  const notes = [
    `unit: ${u.unit !== null ? `${unit}, from the file's ${u.note}` : `${unit}, as given (${u.note})`}`,
    `joining tolerance ${fmt(joinTolerance)} ${unit}${options.joinTolerance === undefined ? ` (${JOIN_RATIO.toExponential(0)} of the drawing's diagonal)` : ''}: ${chains.gaps.length === 0 ? 'no gaps closed' : `${chains.gaps.length} gap${chains.gaps.length === 1 ? '' : 's'} closed, the largest ${fmt(chains.largestGap)} ${unit}`}`,
    ...chains.gaps,
    ...curves.approximations,
    ...(ignored.length > 0 ? [`ignored (not geometry): ${ignored.map((i) => `${i.count} ${i.type}`).join(', ')}`] : []),
  ];
  const polygons = nested.polygons.map((p) => ({
    outer: rings[p.outer] as Ring,
    holes: p.holes.map((h) => rings[h] as Ring),
    layers: [...new Set([p.outer, ...p.holes].flatMap((i) => (chains.loops[i] as Loop).segmentRefs.map((r) => r.layer)))],
  }));
  return { ok: true, value: { unit, unitFrom: u.unit !== null ? 'file' : 'caller', polygons, layers, joinTolerance, notes, ignored } };
}

function ringPoints(ring: Ring): { points: [number, number][]; bulges: number[] | undefined } {
  const points: [number, number][] = [];
  for (let k = 0; k < ring.xy.length; k += 2) points.push([ring.xy[k] ?? 0, ring.xy[k + 1] ?? 0]);
  return { points, bulges: ring.bulge ? Array.from(ring.bulge) : undefined };
}

function polygonPart(polygon: Polygon, id: string, name: string): PolygonPart {
  const outer = ringPoints(polygon.outer);
  const holes = polygon.holes.map(ringPoints);
  const anyHoleBulge = holes.some((h) => h.bulges !== undefined);
  return {
    id, name, type: 'polygon', operation: 'add', material: null, visible: true,
    placement: { x: 0, y: 0, rotationDeg: 0, mirror: false },
    outer: outer.points,
    ...(outer.bulges !== undefined ? { outerBulges: outer.bulges } : {}),
    holes: holes.map((h) => h.points),
    ...(anyHoleBulge ? { holeBulges: holes.map((h) => h.bulges ?? h.points.map(() => 0)) } : {}),
  };
}

/**
 * The imported polygons as a one-section document: a polygon part per outer loop, named after its
 * layer, in the drawing's own coordinates; or, with grouping 'one', one part when the loops unite
 * into one piece (when they do not, the parts stay separate and a note says why).
 * Holes (loops inside an outer loop) take the role the user chose (core/document/types.ts
 * CutoutRole): 'void' keeps them as holes of their part, missing along the member; each
 * 'fastener-hole' becomes a cut-out part of its own right after its part, marked as a fastener
 * hole, so it counts in the net section only.
 */
export function documentFromDxf(imported: DxfImport, name: string, grouping: 'parts' | 'one' = 'parts', holes: CutoutRole = 'void'): { file: SectionFile; notes: string[] } {
  let polygons: readonly Polygon[] = imported.polygons;
  const notes: string[] = [];
  if (grouping === 'one' && polygons.length > 1) {
    let united: Region = [polygons[0] as Polygon];
    try {
      for (const p of polygons.slice(1)) united = unionRegions(united, [p]);
    } catch (err) {
      if (!(err instanceof BooleanError)) throw err;
      united = polygons;
    }
    if (united.length > 1) notes.push(`the ${polygons.length} outer loops form ${united.length} separate pieces, which cannot be one part: imported as ${united.length} parts, one per piece`);
    polygons = united;
  }
  const counts = new Map<string, number>();
  const parts = polygons.map((p, i) => {
    const layer = polygons === imported.polygons ? (imported.polygons[i]?.layers[0] ?? 'DXF') : 'DXF';
    const k = (counts.get(layer) ?? 0) + 1;
    counts.set(layer, k);
    if (holes === 'void' || p.holes.length === 0) return [polygonPart(p, `dxf${i + 1}`, `${layer} ${k}`)];
    const cutouts = p.holes.map((h, j): PolygonPart => ({
      ...polygonPart({ outer: reverseRing(h), holes: [] }, `dxf${i + 1}-h${j + 1}`, `${layer} ${k} hole ${j + 1}`),
      operation: 'subtract',
      cutoutRole: 'fastener-hole',
    }));
    return [polygonPart({ outer: p.outer, holes: [] }, `dxf${i + 1}`, `${layer} ${k}`), ...cutouts];
  }).flat();
  const holeCount = polygons.reduce((n, p) => n + p.holes.length, 0);
  if (holes === 'fastener-hole' && holeCount > 0) notes.push(`${holeCount} hole(s) imported as fastener holes: each a cut-out part that counts in the net section only (gross properties ignore it)`);
  const file: SectionFile = {
    format: DOCUMENT_FORMAT, version: DOCUMENT_VERSION, name, unit: imported.unit, materials: [], defaultMaterial: null,
    sections: [{ id: 's1', name, parts }],
  };
  return { file, notes };
}
