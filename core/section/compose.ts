/**
 * Composition: a document's parts → one region → section properties.
 *
 * For each VISIBLE part, in document order: its local geometry (polygon with optional bulges;
 * rectangle centred on the local origin; circle as two semicircular arcs, exact; or a standard
 * shape from core/parts), placed by its Placement (mirror, rotate, translate — core/geometry's
 * transformRegion), normalised and validated. Then the parts are combined in document order:
 * "add" is a union with what came before, "subtract" a difference.
 *
 * Gross and net: a cut-out whose role is 'fastener-hole' (core/document/types.ts CutoutRole) is
 * left out of `region`, the GROSS section that stiffness, deflection, torsion, plastic moduli and
 * the stress map use: a bolt hole exists only at the bolt, not along the member. Where such holes
 * exist, `net` is the section with them cut as well (every part in document order, as drawn),
 * for the net-section properties (core/properties/net.ts). Voids cut both.
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
 * subtract part clear of everything is a no-op. The other parts of a run of equal operations
 * are gathered (listed side by side when their boxes are clear, else united) and applied in ONE
 * adapter call per run, which is exact set algebra: A ∪ B ∪ C = A ∪ (B ∪ C) and
 * A − B − C = A − (B ∪ C), so the order within a run does not matter.
 * The box test is conservative (an arc's box is exact from its axis extremes, grown by 1e-9 of
 * its radius against rounding), so a fast path is only taken when it is exact.
 *
 * Does not: fix bad geometry (a part with diagnostics stops the composition; the diagnostics
 * carry the part's name); use materials (single-material geometry; core/materials weighs parts).
 */
import type { Part, SectionDocument } from '../document/types.ts';
import type { Diagnostic, Polygon, Region, Ring } from '../geometry/types.ts';
import { BooleanError, MAX_COORDINATE, MIN_EXTENT, arcContainsAngle, arcOfSegment, differenceRegions, normaliseRegion, transformRegion, unionRegions, validateRegion } from '../geometry/index.ts';
import { shapeRegion } from '../parts/index.ts';
import { netSectionProperties, sectionProperties, type NetSectionProperties } from '../properties/index.ts';
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
  /** The combined GROSS section (fastener holes left out); empty when any diagnostic stopped the composition. */
  readonly region: Region;
  /** The net section (gross less the visible fastener holes, in document order); null when there are none or on diagnostics. */
  readonly net: Region | null;
  /** Visible cut-outs whose role is 'fastener-hole'. */
  readonly fastenerHoles: number;
  readonly parts: readonly ComposedPart[];
  readonly diagnostics: readonly Diagnostic[];
  /** Parts left out because visible is false. */
  readonly hiddenParts: number;
  /** How many combinations needed the Boolean adapter (0 when every step took a fast path). */
  readonly booleanCalls: number;
}

export interface SectionResult extends Composition {
  /** Properties of the gross section; null when there are diagnostics (no numbers are given for bad geometry). */
  readonly properties: SectionProperties | null;
  /** Net-section properties, only where fastener holes exist (null otherwise, or when the net section has no area). */
  readonly netProperties: NetSectionProperties | null;
}

/** True for a subtract part whose role is a fastener hole (a net-section deduction only). */
export function isFastenerHole(part: Part): boolean {
  return part.operation === 'subtract' && part.cutoutRole === 'fastener-hole';
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
  // A part at the origin, unturned and unmirrored, keeps its local region (a fresh one): no copy of a large outline.
  const unmoved = !mirror && rigid.x === 0 && rigid.y === 0 && rigid.rotationDeg === 0;
  const placed = unmoved ? local.region : transformRegion(mirror ? mirroredLocal(local.region) : local.region, { ...rigid, mirror: false });
  if (part.type === 'rectangle' || part.type === 'circle') return placedByConstruction(placed, part, label);
  const diagnostics = validateRegion(placed, { part: label });
  return diagnostics.length > 0 ? { region: [], diagnostics } : { region: normaliseRegion(placed), diagnostics: [] };
}

/**
 * Rectangles and circles are valid by construction (the schema guarantees finite, positive
 * sizes; four corners or two semicircles cannot cross themselves), so the full validation —
 * which flattens arcs finely and costs milliseconds per hole — is skipped while dragging. Only
 * what a placement can break is checked: the distance from the origin (validateRegion's limit).
 */
function placedByConstruction(placed: Region, part: Part, label: string): { region: Region; diagnostics: readonly Diagnostic[] } {
  const box = regionBox(placed);
  const reach = Math.max(Math.abs(box.minX), Math.abs(box.maxX), Math.abs(box.minY), Math.abs(box.maxY));
  const size = Math.max(box.maxX - box.minX, box.maxY - box.minY);
  if (size < MIN_EXTENT) {
    const message = `Part "${label}": it is ${size} across, below the smallest size of ${MIN_EXTENT} (any unit): its second moments would underflow.`;
    return { region: [], diagnostics: [{ code: 'too-small', part: label, message, at: [part.placement.x, part.placement.y] }] };
  }
  if (reach <= MAX_COORDINATE) return { region: normaliseRegion(placed), diagnostics: [] };
  const message = `Part "${label}": it reaches ${reach} from the origin, beyond the limit of ${MAX_COORDINATE} (too few digits would remain for second moments).`;
  return { region: [], diagnostics: [{ code: 'too-large', part: label, message, at: [part.placement.x, part.placement.y] }] };
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

/** Box of segment i of a ring, exact for arcs (axis extremes inside the sweep, docs/methods.md §2.4), grown by a hair for rounding. */
function segmentBox(ring: Ring, i: number, out: Box): Box {
  const { xy } = ring;
  const n = xy.length >> 1;
  const j = (i + 1) % n;
  const x0 = xy[2 * i] ?? 0, y0 = xy[2 * i + 1] ?? 0, x1 = xy[2 * j] ?? 0, y1 = xy[2 * j + 1] ?? 0;
  out.minX = Math.min(x0, x1);
  out.maxX = Math.max(x0, x1);
  out.minY = Math.min(y0, y1);
  out.maxY = Math.max(y0, y1);
  const arc = (ring.bulge?.[i] ?? 0) !== 0 ? arcOfSegment(ring, i) : null;
  if (arc !== null) {
    if (arcContainsAngle(arc, 0)) out.maxX = Math.max(out.maxX, arc.cx + arc.r);
    if (arcContainsAngle(arc, Math.PI)) out.minX = Math.min(out.minX, arc.cx - arc.r);
    if (arcContainsAngle(arc, Math.PI / 2)) out.maxY = Math.max(out.maxY, arc.cy + arc.r);
    if (arcContainsAngle(arc, -Math.PI / 2)) out.minY = Math.min(out.minY, arc.cy - arc.r);
    // The centre and radius carry a few ulps of rounding: grow the box so the test stays conservative.
    const hair = 1e-9 * arc.r;
    out.minX -= hair;
    out.minY -= hair;
    out.maxX += hair;
    out.maxY += hair;
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

/** Running state of the combination, in document order. */
interface Combining {
  region: Region;
  booleanCalls: number;
  readonly diagnostics: Diagnostic[];
  /** Labels of the parts combined so far. */
  readonly done: string[];
  /** Parts of the current run (same operation) that need the Boolean adapter, gathered into one region. */
  pending: { region: Region; labels: string[] } | null;
  pendingOperation: Part['operation'];
}

const quoted = (labels: readonly string[]): string => labels.join(', ');

/** Gathers a part into the pending run: pieces with clear boxes are just listed, others are united. */
function gather(state: Combining, placed: ComposedPart, label: string, docName: string): void {
  if (state.pending === null) {
    state.pending = { region: placed.region, labels: [label] };
    return;
  }
  const pending = state.pending;
  const joined = fastCombine(pending.region, placed.region, 'add');
  if (joined) {
    pending.region = joined.region;
  } else {
    state.booleanCalls++;
    try {
      pending.region = unionRegions(pending.region, placed.region, { context: `composing section "${docName}"`, parts: [quoted(pending.labels), label] });
    } catch (err) {
      if (!(err instanceof BooleanError)) throw err;
      state.diagnostics.push({ ...err.toDiagnostic(), part: label });
    }
  }
  pending.labels.push(label);
}

/**
 * Applies the pending run to the section in one Boolean call. Within a run of adds (or of
 * subtracts) the order does not matter — A ∪ B ∪ C = A ∪ (B ∪ C), A − B − C = A − (B ∪ C) — so
 * the fast-path parts of the run may already be in the section.
 */
function flush(state: Combining, docName: string): void {
  const pending = state.pending;
  state.pending = null;
  if (pending === null) return;
  const names = { context: `composing section "${docName}"`, parts: [quoted(state.done.filter((l) => !pending.labels.includes(l))), quoted(pending.labels)] };
  state.booleanCalls++;
  try {
    state.region = state.pendingOperation === 'add' ? unionRegions(state.region, pending.region, names) : differenceRegions(state.region, pending.region, names);
  } catch (err) {
    if (!(err instanceof BooleanError)) throw err;
    state.diagnostics.push({ ...err.toDiagnostic(), part: pending.labels[0] ?? '' });
  }
}

function combineParts(parts: readonly ComposedPart[], docName: string): Combining {
  const state: Combining = { region: [], booleanCalls: 0, diagnostics: [], done: [], pending: null, pendingOperation: 'add' };
  for (const placed of parts) {
    const label = partLabel(placed.part, placed.index);
    const operation = placed.part.operation;
    if (state.done.length === 0) {
      if (operation === 'subtract') {
        state.diagnostics.push({ code: 'empty-section', part: label, message: `part "${label}" subtracts, but no add part comes before it in the list, so there is nothing to cut` });
        continue;
      }
      state.region = placed.region;
    } else {
      if (operation !== state.pendingOperation) flush(state, docName);
      state.pendingOperation = operation;
      const fast = fastCombine(state.region, placed.region, operation);
      if (fast) state.region = fast.region;
      else gather(state, placed, label, docName);
    }
    state.done.push(label);
  }
  flush(state, docName);
  return state;
}

/**
 * Compositions by document object: a document is never changed in place (every edit makes a new
 * one), so the several readers of one document in one command (properties, materials, joints,
 * exports) share one composition instead of validating and combining a large outline again.
 */
const compositions = new WeakMap<SectionDocument, Composition>();

/** The document's visible parts combined into one region (gross) and, with fastener holes, the net region, with every problem found. */
export function regionFromDocument(doc: SectionDocument): Composition {
  let composition = compositions.get(doc);
  if (composition === undefined) {
    composition = composeDocument(doc);
    compositions.set(doc, composition);
  }
  return composition;
}

function composeDocument(doc: SectionDocument): Composition {
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
  const fastenerHoles = parts.filter((p) => isFastenerHole(p.part)).length;
  if (diagnostics.length > 0) return { region: [], net: null, fastenerHoles, parts, diagnostics, hiddenParts, booleanCalls: 0 };

  const combined = combineParts(fastenerHoles > 0 ? parts.filter((p) => !isFastenerHole(p.part)) : parts, doc.name);
  diagnostics.push(...combined.diagnostics);
  let { region, booleanCalls } = combined;
  if (diagnostics.length === 0 && region.length === 0) {
    const why = doc.parts.length === 0 ? 'the document has no parts' : hiddenParts === doc.parts.length ? 'every part is hidden' : 'the subtract parts remove all of it';
    diagnostics.push({ code: 'empty-section', message: `the section has no area: ${why}` });
  }
  let net: Region | null = null;
  if (fastenerHoles > 0 && diagnostics.length === 0) {
    const withHoles = combineParts(parts, doc.name);
    diagnostics.push(...withHoles.diagnostics);
    booleanCalls += withHoles.booleanCalls;
    net = withHoles.region;
  }
  if (diagnostics.length > 0) region = [];
  return { region, net: diagnostics.length > 0 ? null : net, fastenerHoles, parts, diagnostics, hiddenParts, booleanCalls };
}

/** Composition and properties (gross, and net where fastener holes exist); properties are null when anything is wrong. */
export function sectionFromDocument(doc: SectionDocument): SectionResult {
  const composed = regionFromDocument(doc);
  const ok = composed.diagnostics.length === 0;
  const properties = ok ? sectionProperties(composed.region) : null;
  const netProperties = ok && composed.net !== null && composed.net.length > 0 ? netSectionProperties(composed.net) : null;
  return { ...composed, properties, netProperties };
}
