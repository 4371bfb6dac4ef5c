/**
 * Composition: a document's parts → one region → section properties.
 *
 * For each VISIBLE part, in document order: its local geometry (polygon with optional bulges;
 * rectangle centred on the local origin; circle as two semicircular arcs, exact; or a standard
 * shape from core/parts), placed by its Placement (mirror, rotate, translate — core/geometry's
 * transformRegion), normalised and validated. Then the parts are combined in document order:
 * "add" is a union with what came before, "subtract" a difference.
 *
 * Choice: hidden parts (visible: false) are EXCLUDED from the computed section. Visibility is an
 * editing aid, and the numbers must describe what the user sees; the count of hidden parts is
 * returned so every output can say that some were left out.
 *
 * Fast paths (the editor recomputes this while dragging; no Boolean library call when none is
 * needed, and the exact arcs are kept): the first add part is taken as it is; an add part whose
 * box is clear of every piece so far is appended as a new piece; a subtract part that is one
 * polygon without holes, whose box is clear of every boundary segment of exactly one piece and
 * whose first vertex lies inside that piece's material, becomes a new hole of that piece; a
 * subtract part clear of everything is a no-op. Anything else goes to the Boolean adapter.
 * The box test is conservative (an arc's box is its chord's box grown by its sagitta, or the
 * whole circle's box when it sweeps more than 180°), so a fast path is only taken when it is
 * exact.
 *
 * Does not: fix bad geometry (a part with diagnostics stops the composition; the diagnostics
 * carry the part's name); use materials (single-material geometry; core/materials weighs parts).
 */
import type { Part, SectionDocument } from '../document/types.ts';
import type { Diagnostic, Polygon, Region, Ring } from '../geometry/types.ts';
import { BooleanError, differenceRegions, normaliseRegion, transformRegion, unionRegions, validateRegion } from '../geometry/index.ts';
import { shapeRegion } from '../parts/index.ts';
import { sectionProperties } from '../properties/index.ts';
import type { SectionProperties } from '../properties/types.ts';
import type { LengthUnit } from '../units/types.ts';

export interface ComposedPart {
  readonly part: Part;
  /** Index in doc.parts. */
  readonly index: number;
  /** The part placed in section coordinates, normalised (empty when it has diagnostics). */
  readonly region: Region;
  /** This part's own geometry problems (also listed in Composition.diagnostics). */
  readonly diagnostics: readonly Diagnostic[];
}

export interface Composition {
  /** The combined section; empty when any diagnostic stopped the composition. */
  readonly region: Region;
  readonly parts: readonly ComposedPart[];
  readonly diagnostics: readonly Diagnostic[];
  /** Parts left out because visible is false. */
  readonly hiddenParts: number;
  /** How many combinations needed the Boolean adapter (0 when every step took a fast path). */
  readonly booleanCalls: number;
}

export interface SectionResult extends Composition {
  /** null when there are diagnostics (no numbers are given for bad geometry). */
  readonly properties: SectionProperties | null;
}

/** How a part is named in diagnostics: its name, else its position in the list. */
export function partLabel(part: Part, index: number): string {
  return part.name.trim() !== '' ? part.name : `parts[${index}]`;
}

function ringOf(points: readonly (readonly [number, number])[], bulges?: readonly number[]): Ring {
  const xy = new Float64Array(points.length * 2);
  points.forEach(([x, y], i) => {
    xy[2 * i] = x;
    xy[2 * i + 1] = y;
  });
  return bulges && bulges.some((b) => b !== 0) ? { xy, bulge: Float64Array.from(bulges) } : { xy };
}

/** The part's exact geometry in its local coordinates. */
export function localRegion(part: Part, unit: LengthUnit): { region: Region; diagnostics: readonly Diagnostic[] } {
  switch (part.type) {
    case 'rectangle': {
      const w = part.width / 2;
      const h = part.height / 2;
      return { region: [{ outer: { xy: Float64Array.of(-w, -h, w, -h, w, h, -w, h) }, holes: [] }], diagnostics: [] };
    }
    case 'circle': {
      // Two semicircles, bulge tan(180°/4) = 1 each: exact, no polygon approximation.
      const r = part.diameter / 2;
      return { region: [{ outer: { xy: Float64Array.of(r, 0, -r, 0), bulge: Float64Array.of(1, 1) }, holes: [] }], diagnostics: [] };
    }
    case 'polygon': {
      const outer = ringOf(part.outer, part.outerBulges);
      const holes = part.holes.map((h, k) => ringOf(h, part.holeBulges?.[k]));
      return { region: [{ outer, holes }], diagnostics: [] };
    }
    case 'shape':
      return shapeRegion(part.shape, part.params, unit);
  }
}

/** x → −x with bulges negated, vertex order kept (so indices stay the user's own). */
function mirroredLocal(region: Region): Region {
  const flip = (ring: Ring): Ring => {
    const xy = Float64Array.from(ring.xy);
    for (let i = 0; i < xy.length; i += 2) xy[i] = -(xy[i] ?? 0);
    return ring.bulge ? { xy, bulge: ring.bulge.map((b) => -b) } : { xy };
  };
  return region.map((p) => ({ outer: flip(p.outer), holes: p.holes.map(flip) }));
}

/**
 * A part placed, validated and normalised; diagnostics name the part. The mirror is applied here
 * without re-ordering vertices and validation runs BEFORE normalisation, so ring and vertex
 * indices in diagnostics are the user's own while coordinates are section coordinates.
 */
export function placedPart(part: Part, index: number, unit: LengthUnit): { region: Region; diagnostics: readonly Diagnostic[] } {
  const label = partLabel(part, index);
  const local = localRegion(part, unit);
  if (local.diagnostics.length > 0) {
    return { region: [], diagnostics: local.diagnostics.map((d) => ({ ...d, part: label, message: `part "${label}": ${d.message}` })) };
  }
  const { mirror, ...rigid } = part.placement;
  const placed = transformRegion(mirror ? mirroredLocal(local.region) : local.region, { ...rigid, mirror: false });
  const diagnostics = validateRegion(placed, { part: label });
  return diagnostics.length > 0 ? { region: [], diagnostics } : { region: normaliseRegion(placed), diagnostics: [] };
}

// ---------------------------------------------------------------------------------------------
// Conservative boxes for the fast paths

interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

const EMPTY_BOX = (): Box => ({ minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity });

function boxesOverlap(a: Box, b: Box): boolean {
  // Touching boxes count as overlapping: shared edges must go through the Boolean adapter
  // only if they could overlap in area, but staying conservative costs little.
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}

/** Box of segment i of a ring, grown to contain its arc (conservatively). */
function segmentBox(ring: Ring, i: number, out: Box): Box {
  const { xy } = ring;
  const n = xy.length >> 1;
  const j = (i + 1) % n;
  const x0 = xy[2 * i] ?? 0, y0 = xy[2 * i + 1] ?? 0, x1 = xy[2 * j] ?? 0, y1 = xy[2 * j + 1] ?? 0;
  out.minX = Math.min(x0, x1);
  out.maxX = Math.max(x0, x1);
  out.minY = Math.min(y0, y1);
  out.maxY = Math.max(y0, y1);
  const b = Math.abs(ring.bulge?.[i] ?? 0);
  if (b !== 0) {
    const chord = Math.hypot(x1 - x0, y1 - y0);
    // |b| ≤ 1: the arc lies within its sagitta |b|·c/2 of the chord. |b| > 1: within the circle,
    // radius c(1 + b²)/(4|b|), whose box is at most the chord box grown by the diameter.
    const grow = b <= 1 ? (b * chord) / 2 : (chord * (1 + b * b)) / (2 * b);
    out.minX -= grow;
    out.minY -= grow;
    out.maxX += grow;
    out.maxY += grow;
  }
  return out;
}

function ringBox(ring: Ring): Box {
  const box = EMPTY_BOX();
  const seg = EMPTY_BOX();
  const n = ring.xy.length >> 1;
  for (let i = 0; i < n; i++) {
    segmentBox(ring, i, seg);
    if (seg.minX < box.minX) box.minX = seg.minX;
    if (seg.minY < box.minY) box.minY = seg.minY;
    if (seg.maxX > box.maxX) box.maxX = seg.maxX;
    if (seg.maxY > box.maxY) box.maxY = seg.maxY;
  }
  return box;
}

function regionBox(region: Region): Box {
  const box = EMPTY_BOX();
  for (const p of region) {
    const b = ringBox(p.outer);
    box.minX = Math.min(box.minX, b.minX);
    box.minY = Math.min(box.minY, b.minY);
    box.maxX = Math.max(box.maxX, b.maxX);
    box.maxY = Math.max(box.maxY, b.maxY);
  }
  return box;
}

function ringClearOf(ring: Ring, box: Box): boolean {
  const seg = EMPTY_BOX();
  const n = ring.xy.length >> 1;
  for (let i = 0; i < n; i++) if (boxesOverlap(segmentBox(ring, i, seg), box)) return false;
  return true;
}

/** Even-odd crossing test against the chords; valid here because the point is outside every segment box. */
function insideRing(ring: Ring, x: number, y: number): boolean {
  const { xy } = ring;
  const n = xy.length >> 1;
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = xy[2 * i] ?? 0, yi = xy[2 * i + 1] ?? 0, xj = xy[2 * j] ?? 0, yj = xy[2 * j + 1] ?? 0;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function reversedAsHole(ring: Ring): Ring {
  const n = ring.xy.length >> 1;
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    xy[2 * i] = ring.xy[2 * (n - 1 - i)] ?? 0;
    xy[2 * i + 1] = ring.xy[2 * (n - 1 - i) + 1] ?? 0;
  }
  if (!ring.bulge) return { xy };
  // Reversed segment k runs from old vertex n−1−k to n−2−k: old segment n−2−k, bulge negated.
  const bulge = new Float64Array(n);
  for (let k = 0; k < n; k++) bulge[k] = -(ring.bulge[(2 * n - 2 - k) % n] ?? 0);
  return { xy, bulge };
}

type FastStep = { readonly region: Region } | null;

/** Tries to combine without the Boolean adapter; null means "needs the adapter". */
function fastCombine(acc: Region, part: Region, operation: Part['operation']): FastStep {
  const partBox = regionBox(part);
  const touched = acc.map((p) => boxesOverlap(ringBox(p.outer), partBox));
  if (!touched.some(Boolean)) return operation === 'add' ? { region: [...acc, ...part] } : { region: acc };
  if (operation === 'add' || part.length !== 1) return null;
  const cutter = part[0] as Polygon;
  if (cutter.holes.length > 0 || touched.filter(Boolean).length !== 1) return null;
  const k = touched.indexOf(true);
  const host = acc[k] as Polygon;
  const boxOf = ringBox(cutter.outer);
  if (!ringClearOf(host.outer, boxOf) || !host.holes.every((h) => ringClearOf(h, boxOf))) return null;
  const x = cutter.outer.xy[0] ?? 0, y = cutter.outer.xy[1] ?? 0;
  if (!insideRing(host.outer, x, y) || host.holes.some((h) => insideRing(h, x, y))) return null;
  const grown: Polygon = { outer: host.outer, holes: [...host.holes, reversedAsHole(cutter.outer)] };
  return { region: acc.map((p, i) => (i === k ? grown : p)) };
}

function combineStep(acc: Region, placed: ComposedPart, doneLabels: readonly string[], docName: string): { region: Region; boolean: boolean; diagnostic?: Diagnostic } {
  const fast = fastCombine(acc, placed.region, placed.part.operation);
  if (fast) return { region: fast.region, boolean: false };
  const label = partLabel(placed.part, placed.index);
  const before = doneLabels.length === 1 ? (doneLabels[0] as string) : `the parts before it (${doneLabels.join(', ')})`;
  const names = { context: `composing section "${docName}"`, parts: [before, label] };
  try {
    const region = placed.part.operation === 'add' ? unionRegions(acc, placed.region, names) : differenceRegions(acc, placed.region, names);
    return { region, boolean: true };
  } catch (err) {
    if (!(err instanceof BooleanError)) throw err;
    return { region: acc, boolean: true, diagnostic: { ...err.toDiagnostic(), part: label } };
  }
}

/** The document's visible parts combined into one region, with every problem found. */
export function regionFromDocument(doc: SectionDocument): Composition {
  const parts: ComposedPart[] = [];
  const diagnostics: Diagnostic[] = [];
  let hiddenParts = 0;
  doc.parts.forEach((part, index) => {
    if (!part.visible) {
      hiddenParts++;
      return;
    }
    const placed = placedPart(part, index, doc.unit);
    diagnostics.push(...placed.diagnostics);
    parts.push({ part, index, region: placed.region, diagnostics: placed.diagnostics });
  });
  if (diagnostics.length > 0) return { region: [], parts, diagnostics, hiddenParts, booleanCalls: 0 };

  let region: Region = [];
  let booleanCalls = 0;
  const done: string[] = [];
  for (const placed of parts) {
    const label = partLabel(placed.part, placed.index);
    if (placed.part.operation === 'subtract' && done.length === 0) {
      diagnostics.push({ code: 'empty-section', part: label, message: `part "${label}" subtracts, but no add part comes before it in the list, so there is nothing to cut` });
      continue;
    }
    const step = done.length === 0 ? { region: placed.region, boolean: false } : combineStep(region, placed, done, doc.name);
    if ('diagnostic' in step && step.diagnostic) diagnostics.push(step.diagnostic);
    if (step.boolean) booleanCalls++;
    region = step.region;
    done.push(label);
  }
  if (diagnostics.length === 0 && region.length === 0) {
    const why = doc.parts.length === 0 ? 'the document has no parts' : hiddenParts === doc.parts.length ? 'every part is hidden' : 'the subtract parts remove all of it';
    diagnostics.push({ code: 'empty-section', message: `the section has no area: ${why}` });
  }
  return { region: diagnostics.length > 0 ? [] : region, parts, diagnostics, hiddenParts, booleanCalls };
}

/** Composition and properties; properties are null when anything is wrong. */
export function sectionFromDocument(doc: SectionDocument): SectionResult {
  const composed = regionFromDocument(doc);
  const properties = composed.diagnostics.length === 0 ? sectionProperties(composed.region) : null;
  return { ...composed, properties };
}
