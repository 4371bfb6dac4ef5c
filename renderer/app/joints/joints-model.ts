/**
 * View logic of the editor's joints (no React): cut-out roles, separate pieces and overlaps,
 * the joints between parts with the kinds the user gave them, and the shear flow each joint
 * carries with what it asks of its welds or fasteners. The engine is core/joints (contact
 * segments, groups, q = V·Q/I, AISC 360-22 §J2.4 fillet sizes); this module only reads the
 * typed quantities (core/units readQuantity), converts to the document's unit system and edits
 * the document as one undo step per change.
 *
 * Units: lengths in the document unit unless a name ends in `Shown` (then in `shearUnits`:
 * mm or in for legs and pitches, N/mm or kip/in for q, MPa or ksi for stresses); `…SI` values
 * are in N/m, m or Pa. Capacities are the user's inputs or the cited clauses; the local code
 * governs.
 */
import type { CutoutRole, JointKind, JointSetting, Part, SectionDocument } from '../../../core/document/types.ts';
import type { Region } from '../../../core/geometry/types.ts';
import {
  fastenerPitch, intermittentFillet, jointShearFlows, minimumFilletLeg, partsActingTogether, requiredFilletLeg,
  type ActingGroup, type DesignMethod, type Joint, type JointShearFlow, type PartOverlap,
} from '../../../core/joints/index.ts';
import { builtInMaterial, documentMaterials } from '../../../core/materials/index.ts';
import { regionIntegrals } from '../../../core/properties/index.ts';
import { BooleanError } from '../../../core/geometry/index.ts';
import { partLabel, regionFromDocument, type Composition } from '../../../core/section/index.ts';
import { convertLength } from '../../../core/units/index.ts';
import { fromSI, readQuantity } from '../../../core/units/quantity.ts';
import { isImperial } from '../../../core/units/systems.ts';
import type { Editor } from '../../editor/editor.ts';
import { flattenRing, type Vec } from '../../editor/geometry.ts';

// ---- cut-out roles ---------------------------------------------------------------------------

export interface CutoutRow {
  readonly id: string;
  readonly index: number;
  readonly label: string;
  /** What the cut-out is; a cut-out without the key is a void (core/document/types.ts). */
  readonly role: CutoutRole;
}

export const ROLE_TEXT: Readonly<Record<CutoutRole, string>> = {
  'fastener-hole': 'fastener hole (net section only)',
  void: 'void (along the member)',
};

/** Every cut-out of the section with its role. */
export function cutoutRows(doc: SectionDocument): CutoutRow[] {
  return doc.parts.flatMap((p, index) => (p.operation === 'subtract' ? [{ id: p.id, index, label: partLabel(p, index), role: p.cutoutRole ?? 'void' }] : []));
}

/** Sets a cut-out's role as one undo step. */
export function setCutoutRole(editor: Editor, id: string, role: CutoutRole): void {
  editor.updatePart(id, role === 'fastener-hole' ? 'Make a fastener hole' : 'Make a void', (p) => (p.operation === 'subtract' ? { ...p, cutoutRole: role } : p));
}

/** The part made solid or a cut-out: a role belongs to a cut-out, so making it solid drops the role. */
export function operationToggled(p: Part): Part {
  if (p.operation === 'subtract') {
    const { cutoutRole: _role, ...rest } = p;
    return { ...rest, operation: 'add' } as Part;
  }
  return { ...p, operation: 'subtract' };
}

// ---- pieces, overlaps and joints -------------------------------------------------------------

export interface JointsOverview {
  readonly composition: Composition;
  /** False when the geometry has problems (nothing else is then given). */
  readonly ready: boolean;
  /** Why joints could not be found on a valid geometry (the clipping library gave up), else null. */
  readonly problem: string | null;
  readonly joints: readonly Joint[];
  readonly overlaps: readonly PartOverlap[];
  readonly groups: readonly ActingGroup[];
  /** Separate pieces, what they are, and why torsion is then a sum with no shared shear centre. */
  readonly piecesNote: string | null;
  /** Each overlap with the two parts and the shared area. */
  readonly overlapNotes: readonly string[];
  /** Joints whose kind is the default, with why. */
  readonly defaultNotes: readonly string[];
}

const overviews = new WeakMap<SectionDocument, JointsOverview>();

/** Joints, pieces and overlaps of a section (core/joints partsActingTogether), memoised by document. */
export function jointsOverview(doc: SectionDocument): JointsOverview {
  const hit = overviews.get(doc);
  if (hit) return hit;
  let a: ReturnType<typeof partsActingTogether>;
  try {
    a = partsActingTogether(doc);
  } catch (err) {
    // A geometry the clipping library cannot split must not take the editor down: say why instead.
    if (!(err instanceof BooleanError)) throw err;
    const out: JointsOverview = {
      composition: regionFromDocument(doc), ready: false, problem: err.message, joints: [], overlaps: [], groups: [],
      piecesNote: null, defaultNotes: [], overlapNotes: [],
    };
    overviews.set(doc, out);
    return out;
  }
  // core/joints/groups.ts lists its warnings in this order: pieces (at most one), default joints, overlaps.
  const defaults = a.joints.filter((j) => j.isDefault).length;
  const piecesCount = a.warnings.length - defaults - a.overlaps.length;
  const out: JointsOverview = {
    composition: a.composition,
    ready: a.composition.diagnostics.length === 0,
    problem: null,
    joints: a.joints,
    overlaps: a.overlaps,
    groups: a.groups,
    piecesNote: piecesCount > 0 ? (a.warnings[0] ?? null) : null,
    defaultNotes: a.warnings.slice(piecesCount, piecesCount + defaults),
    overlapNotes: a.warnings.slice(piecesCount + defaults),
  };
  overviews.set(doc, out);
  return out;
}

/** One key per pair of part ids, in either order. */
export function jointKey(ids: readonly string[]): string {
  return [...ids].sort().join('\u0000');
}

/** The document with the kind of the joint between two parts set, or back to its default (null). */
export function withJointKind(doc: SectionDocument, ids: readonly [string, string], kind: JointKind | null): SectionDocument {
  const key = jointKey(ids);
  const others = (doc.joints ?? []).filter((j) => jointKey(j.parts) !== key);
  const joints: JointSetting[] = kind === null ? others : [...others, { parts: [ids[0], ids[1]], kind }];
  if (joints.length === 0) {
    const { joints: _gone, ...rest } = doc;
    return rest;
  }
  return { ...doc, joints };
}

/** Sets a joint's kind as one undo step (null: back to the default). */
export function setJointKind(editor: Editor, ids: readonly [string, string], kind: JointKind | null): void {
  editor.replaceDocument(kind === null ? 'Joint kind back to default' : 'Set joint kind', (doc) => withJointKind(doc, ids, kind));
}

/** Length of the chord of `region` along the line through p in direction d (unit), containing p; null when p is outside. */
function chord(region: Region, p: Vec, d: Vec): number | null {
  const ts: number[] = [];
  for (const poly of region) {
    for (const ring of [poly.outer, ...poly.holes]) {
      const pts: Vec[] = [];
      for (let i = 0; i < ring.xy.length; i += 2) pts.push([ring.xy[i] as number, ring.xy[i + 1] as number]);
      const flat = flattenRing(pts, ring.bulge ? Array.from(ring.bulge) : undefined);
      for (let i = 0; i < flat.length; i++) {
        const a = flat[i] as Vec, b = flat[(i + 1) % flat.length] as Vec;
        const ex = b[0] - a[0], ey = b[1] - a[1];
        const den = d[0] * ey - d[1] * ex;
        if (Math.abs(den) < 1e-15 * Math.hypot(ex, ey)) continue;
        const wx = a[0] - p[0], wy = a[1] - p[1];
        const t = (wx * ey - wy * ex) / den;
        const s = (wx * d[1] - wy * d[0]) / den;
        if (s >= 0 && s < 1) ts.push(t);
      }
    }
  }
  const ahead = ts.filter((t) => t > 0);
  if (ahead.length % 2 === 0) return null;
  const lo = Math.max(...ts.filter((t) => t <= 0));
  return Math.min(...ahead) - lo;
}

/**
 * The thickness of the thinner part joined, document unit: for each part, the smaller of its
 * chords across and along the contact (measured just inside the part, at the middle of the
 * joint's longest segment); null when it cannot be measured.
 */
export function thicknessAtJoint(overview: JointsOverview, joint: Joint): number | null {
  const seg = [...joint.segments].sort((x, y) => y.length - x.length)[0];
  if (seg === undefined) return null;
  const u: Vec = [(seg.x1 - seg.x0) / seg.length, (seg.y1 - seg.y0) / seg.length];
  const n: Vec = [-u[1], u[0]];
  const m: Vec = [(seg.x0 + seg.x1) / 2, (seg.y0 + seg.y1) / 2];
  const delta = 1e-6 * seg.length;
  const each = [joint.a, joint.b].map((k) => {
    const region = overview.composition.parts[k]?.region ?? [];
    for (const sign of [1, -1]) {
      const p: Vec = [m[0] + sign * n[0] * delta, m[1] + sign * n[1] * delta];
      const across = chord(region, p, n), along = chord(region, p, u);
      if (across !== null && along !== null) return Math.min(across, along);
    }
    return null;
  });
  return each.some((t) => t === null) ? null : Math.min(...(each as number[]));
}

// ---- shear flow and what it asks of the joint ------------------------------------------------

/** A typed quantity and the unit a bare number in it means (the field's unit when it was typed). */
export interface QuantityText {
  readonly text: string;
  readonly unit: string;
}

export interface ShearTexts {
  readonly Vy: QuantityText;
  readonly Vx: QuantityText;
  /** Electrode strength FEXX for fillet welds. */
  readonly fexx: QuantityText;
  /** Design capacity of one fastener in shear, the user's number for the method and code used. */
  readonly capacity: QuantityText;
  readonly method: DesignMethod;
}

export interface ShearUnits {
  readonly imperial: boolean;
  readonly force: string;
  readonly stress: string;
  /** Shear flow. */
  readonly q: string;
  /** Weld legs, segments and pitches. */
  readonly leg: string;
}

/** Units of the joint results for a document unit: kip, ksi, kip/in, in; or kN, MPa, N/mm, mm (common practice). */
export function shearUnits(unit: SectionDocument['unit']): ShearUnits {
  return isImperial(unit) ? { imperial: true, force: 'kip', stress: 'ksi', q: 'kip/in', leg: 'in' } : { imperial: false, force: 'kN', stress: 'MPa', q: 'N/mm', leg: 'mm' };
}

export const METHOD_TEXT: Readonly<Record<DesignMethod, string>> = {
  LRFD: 'LRFD: φ = 0.75 (V factored)',
  ASD: 'ASD: Ω = 2.00 (V at service)',
};

export const JOINTS_CAUTION =
  'Preliminary. Weld and fastener numbers use your inputs or the cited clauses (AISC 360-22 §J2.4 and Table J2.4, §J2.2b for intermittent welds); the local code governs, and a licensed engineer verifies the design.';

export interface WeldDesign {
  /** Fillet lines along the joint (1 or 2). */
  readonly lines: number;
  readonly requiredShown: number;
  /** Thinner part joined and the Table J2.4 minimum leg for it; null when the thickness could not be measured. */
  readonly thinnerShown: number | null;
  readonly minimumShown: number | null;
  /** The leg used for the intermittent weld: the larger of required and minimum. */
  readonly legShown: number;
  readonly segmentShown: number;
  /** Largest pitch of intermittent segments (Infinity when q = 0). */
  readonly pitchShown: number;
}

export interface FastenerDesign {
  readonly rows: number;
  /** Largest pitch s = rows·R/q; null when no capacity was typed. */
  readonly largestPitchShown: number | null;
  /** The user's own pitch from the joint kind, document unit → shown unit; and whether it is within the largest. */
  readonly pitchShown: number | null;
  readonly pitchOk: boolean | null;
}

export interface JointDesignRow {
  readonly key: string;
  readonly joint: Joint;
  readonly flow: JointShearFlow | null;
  /** q in N/m (NaN when the loads could not be read). */
  readonly qSI: number;
  readonly qShown: number;
  /** Average shear stress on the contact (|q| / contact length), shown unit. */
  readonly tauShown: number;
  readonly weld: WeldDesign | null;
  readonly fastener: FastenerDesign | null;
  /** What the row means, in words (groove weld, glue line, not connected, closed cell …). */
  readonly note: string;
}

export type ShearField = 'Vy' | 'Vx' | 'fexx' | 'capacity';

export interface JointDesign {
  readonly units: ShearUnits;
  readonly errors: Partial<Record<ShearField, string>>;
  /** True when neither Vy nor Vx is given (q is then not computed). */
  readonly needLoads: boolean;
  readonly rows: readonly JointDesignRow[];
  readonly warnings: readonly string[];
  readonly note: string;
}

const LABELS: Readonly<Record<ShearField, string>> = { Vy: 'Vy', Vx: 'Vx', fexx: 'FEXX', capacity: 'capacity per fastener' };

/** Shear flow of every joint under the typed shears, with the weld or fastener each needs. */
export function jointDesign(doc: SectionDocument, texts: ShearTexts): JointDesign {
  const units = shearUnits(doc.unit);
  const overview = jointsOverview(doc);
  const errors: Partial<Record<ShearField, string>> = {};
  const read = (field: ShearField, kind: 'force' | 'stress', optional: boolean): number | null => {
    const t = texts[field];
    if (optional && t.text.trim() === '') return null;
    const r = readQuantity(t.text, { label: LABELS[field], kind, unit: t.unit });
    if (!r.ok) {
      errors[field] = r.message;
      return null;
    }
    return r.si;
  };
  const Vy = read('Vy', 'force', true), Vx = read('Vx', 'force', true);
  const welded = overview.joints.some((j) => j.kind.type === 'welded' && j.kind.weld !== 'groove');
  const fexx = welded ? read('fexx', 'stress', false) : null;
  if (fexx !== null && !(fexx > 0)) errors.fexx = `FEXX: "${texts.fexx.text}" must be greater than 0`;
  const capacity = read('capacity', 'force', true);
  if (capacity !== null && !(capacity > 0)) errors.capacity = `capacity per fastener: "${texts.capacity.text}" must be greater than 0`;
  const loadsBad = errors.Vy !== undefined || errors.Vx !== undefined;
  const needLoads = !loadsBad && Vy === null && Vx === null;
  const result = loadsBad || needLoads || !overview.ready ? null : jointShearFlows(doc, { Vy: Vy ?? 0, Vx: Vx ?? 0 });
  const perUnitToPerMetre = 1 / convertLength(1, doc.unit, 'm');
  const legOf = (m: number): number => fromSI(m, 'length', units.leg);
  const system = units.imperial ? 'us' : 'metric';
  const rows = overview.joints.map((joint, k): JointDesignRow => {
    const flow = result?.flows[k] ?? null;
    const key = jointKey(joint.partIds);
    if (flow === null) return { key, joint, flow: null, qSI: NaN, qShown: NaN, tauShown: NaN, weld: null, fastener: null, note: '' };
    const qSI = flow.q * perUnitToPerMetre;
    const tauSI = flow.tau * perUnitToPerMetre * perUnitToPerMetre;
    const kind = joint.kind;
    let weld: WeldDesign | null = null;
    let fastener: FastenerDesign | null = null;
    let note = flow.note;
    if (kind.type === 'welded' && kind.weld !== 'groove' && fexx !== null && errors.fexx === undefined) {
      const lines = kind.weld === 'fillet-one-side' ? 1 : 2;
      const required = requiredFilletLeg(qSI, fexx, lines, texts.method);
      const t = thicknessAtJoint(overview, joint);
      const minimum = t === null ? null : minimumFilletLeg(convertLength(t, doc.unit, 'm'), system);
      const leg = Math.max(required, minimum ?? 0);
      const inter = intermittentFillet(qSI, leg, fexx, lines, texts.method, system);
      weld = {
        lines, requiredShown: legOf(required), thinnerShown: t === null ? null : convertLength(t, doc.unit, units.leg as SectionDocument['unit']),
        minimumShown: minimum === null ? null : legOf(minimum), legShown: legOf(leg), segmentShown: legOf(inter.segment), pitchShown: Number.isFinite(inter.pitch) ? legOf(inter.pitch) : Infinity,
      };
    } else if (kind.type === 'welded' && kind.weld === 'groove') {
      note = `groove weld: a complete-joint-penetration groove weld in shear is sized by the base metal (AISC 360-22 Table J2.5); check it with the local code. ${flow.note}`;
    } else if (kind.type === 'fastened') {
      const largest = capacity === null || errors.capacity !== undefined ? null : fastenerPitch(qSI, kind.rows, capacity);
      const own = kind.pitch === undefined ? null : convertLength(kind.pitch, doc.unit, 'm');
      fastener = {
        rows: kind.rows,
        largestPitchShown: largest === null ? null : Number.isFinite(largest) ? legOf(largest) : Infinity,
        pitchShown: own === null ? null : legOf(own),
        pitchOk: own === null || largest === null ? null : own <= largest * (1 + 1e-12),
      };
    } else if (kind.type === 'glued') {
      note = `glue line: average shear stress |q| / contact length; compare it with the adhesive's and the wood's shear strength for your code. ${flow.note}`;
    }
    return { key, joint, flow, qSI, qShown: fromSI(qSI, 'lineLoad', units.q), tauShown: fromSI(tauSI, 'stress', units.stress), weld, fastener, note };
  });
  return { units, errors, needLoads, rows, warnings: result?.warnings.filter((w) => !overview.defaultNotes.includes(w) && !overview.overlapNotes.includes(w) && w !== overview.piecesNote) ?? [], note: JOINTS_CAUTION };
}

// ---- shear-flow diagram on plate walls --------------------------------------------------------

/** Shears read from the typed texts, newtons; null when neither is given or one cannot be read. */
export function readShears(texts: Pick<ShearTexts, 'Vy' | 'Vx'>): { Vy: number; Vx: number } | null {
  const get = (t: QuantityText, label: string): number | null | undefined => {
    if (t.text.trim() === '') return null;
    const r = readQuantity(t.text, { label, kind: 'force', unit: t.unit });
    return r.ok ? r.si : undefined;
  };
  const Vy = get(texts.Vy, 'Vy'), Vx = get(texts.Vx, 'Vx');
  if (Vy === undefined || Vx === undefined || (Vy === null && Vx === null)) return null;
  return { Vy: Vy ?? 0, Vx: Vx ?? 0 };
}

export interface DiagramStation {
  /** Point on the plate's centre line, document unit. */
  readonly x: number;
  readonly y: number;
  /** Shear flow across the wall there, N per document unit; NaN inside a joint's contact (not drawn). */
  readonly q: number;
}

export interface DiagramWall {
  readonly partId: string;
  readonly label: string;
  /** Unit normal of the wall (the diagram is drawn along it). */
  readonly nx: number;
  readonly ny: number;
  readonly stations: readonly DiagramStation[];
}

export interface ShearFlowDiagram {
  readonly walls: readonly DiagramWall[];
  /** Largest |q| drawn, N per document unit. */
  readonly qMax: number;
  /** What is not drawn and why. */
  readonly notes: readonly string[];
}

/** Slenderness from which a plate is drawn as a thin wall (length ≥ 4 × thickness; common practice for thin-walled shear flow). */
export const THIN_WALL_RATIO = 4;
const STATIONS = 48;

/**
 * The shear flow along each thin plate (a rectangle part with length ≥ THIN_WALL_RATIO × thickness),
 * q(s) = V·Q(s)/I in the general form with Ixy on the E-weighted section (the section of
 * core/joints jointShearFlows), Q(s) being the plate beyond the cut at s plus every part joined
 * to the plate beyond it (over joints that are connected). Open branches only: a plate in a closed
 * cell (a part reached from it both ways) needs a closed-cell analysis and is not drawn; nor are
 * standard shapes, or any plate when parts overlap or voids cut parts (the part regions would not
 * be the material). Gaps inside a joint's contact, where the flow leaves the wall.
 */
export function shearFlowDiagram(doc: SectionDocument, loads: { Vy: number; Vx: number }): ShearFlowDiagram {
  const overview = jointsOverview(doc);
  const notes: string[] = [];
  if (!overview.ready) return { walls: [], qMax: 0, notes: ['the geometry needs attention'] };
  if (overview.overlaps.length > 0) return { walls: [], qMax: 0, notes: ['parts overlap: the diagram is not drawn until they do not'] };
  if (doc.parts.some((p) => p.visible && p.operation === 'subtract' && p.cutoutRole !== 'fastener-hole')) return { walls: [], qMax: 0, notes: ['a void cuts the parts: the diagram is drawn for plates without voids only'] };
  const flows = jointShearFlows(doc, loads);
  if (flows === null) return { walls: [], qMax: 0, notes: [] };
  const s = flows.section;
  const D = s.Ix * s.Iy - s.Ixy * s.Ixy;
  const parts = overview.composition.parts;
  // Modular ratios as core/joints/shear-flow.ts takes them: E of each part over the first E found.
  const { materials } = documentMaterials(doc);
  const E = parts.map((p) => {
    const id = p.part.material ?? doc.defaultMaterial;
    const m = id === null ? undefined : (materials.get(id) ?? builtInMaterial(id));
    return m === undefined ? null : m.E;
  });
  const eRef = E.find((e) => e !== null) ?? null;
  const nOf = (k: number): number => (eRef === null || E[k] === null || E[k] === undefined ? 1 : (E[k] as number) / eRef);
  const wholeQ = parts.map((p, k) => {
    if (p.part.operation !== 'add' || p.region.length === 0) return { Qx: 0, Qy: 0 };
    const raw = regionIntegrals(p.region);
    return { Qx: nOf(k) * (raw.Qx - raw.A * (s.cy - raw.originY)), Qy: nOf(k) * (raw.Qy - raw.A * (s.cx - raw.originX)) };
  });
  const qOf = (Qx: number, Qy: number): number => (loads.Vy * (s.Iy * Qx - s.Ixy * Qy) + loads.Vx * (s.Ix * Qy - s.Ixy * Qx)) / D;
  const edges = overview.joints.filter((j) => j.kind.type !== 'not-connected');
  const reach = (start: number, without: number): Set<number> => {
    const seen = new Set([start]);
    const stack = [start];
    while (stack.length > 0) {
      const k = stack.pop() as number;
      for (const e of edges) {
        const o = e.a === k ? e.b : e.b === k ? e.a : -1;
        if (o >= 0 && o !== without && !seen.has(o)) {
          seen.add(o);
          stack.push(o);
        }
      }
    }
    return seen;
  };
  const walls: DiagramWall[] = [];
  let qMax = 0;
  let skippedShapes = 0;
  parts.forEach((cp, k) => {
    const p = cp.part;
    if (p.operation !== 'add' || cp.region.length === 0) return;
    if (p.type !== 'rectangle') {
      skippedShapes++;
      return;
    }
    const long = Math.max(p.width, p.height), t = Math.min(p.width, p.height);
    if (long < THIN_WALL_RATIO * t) return;
    const th = (p.placement.rotationDeg * Math.PI) / 180;
    const local: Vec = p.height >= p.width ? [0, 1] : [p.placement.mirror ? -1 : 1, 0];
    const u: Vec = [local[0] * Math.cos(th) - local[1] * Math.sin(th), local[0] * Math.sin(th) + local[1] * Math.cos(th)];
    const c: Vec = [p.placement.x, p.placement.y];
    const mine = edges.filter((e) => e.a === k || e.b === k).map((e) => {
      const other = e.a === k ? e.b : e.a;
      const us = e.segments.flatMap((g) => [(g.x0 - c[0]) * u[0] + (g.y0 - c[1]) * u[1], (g.x1 - c[0]) * u[0] + (g.y1 - c[1]) * u[1]]);
      const set = reach(other, k);
      let Qx = 0, Qy = 0;
      for (const m of set) {
        Qx += wholeQ[m]?.Qx ?? 0;
        Qy += wholeQ[m]?.Qy ?? 0;
      }
      return { lo: Math.min(...us), hi: Math.max(...us), set, Qx, Qy };
    });
    const closed = mine.some((a, i) => mine.some((b, j) => j > i && [...a.set].some((m) => b.set.has(m))));
    if (closed) {
      notes.push(`"${partLabel(p, cp.index)}" is part of a closed cell: its flow needs a closed-cell analysis and is not drawn`);
      return;
    }
    const n = nOf(k);
    const eps = 1e-6 * long, tol = 1e-6 * long;
    const stations: DiagramStation[] = [];
    for (let i = 0; i <= STATIONS; i++) {
      const at = -long / 2 + eps + ((long - 2 * eps) * i) / STATIONS;
      const x = c[0] + u[0] * at, y = c[1] + u[1] * at;
      if (mine.some((m) => m.lo < at - tol && m.hi > at + tol)) {
        stations.push({ x, y, q: NaN });
        continue;
      }
      // The plate beyond the cut (from `at` to its end), then every branch joined beyond it.
      const A = t * (long / 2 - at), uc = (at + long / 2) / 2;
      const gx = c[0] + u[0] * uc, gy = c[1] + u[1] * uc;
      let Qx = n * A * (gy - s.cy), Qy = n * A * (gx - s.cx);
      for (const m of mine) {
        if (m.lo >= at) {
          Qx += m.Qx;
          Qy += m.Qy;
        }
      }
      const q = qOf(Qx, Qy);
      qMax = Math.max(qMax, Math.abs(q));
      stations.push({ x, y, q });
    }
    walls.push({ partId: p.id, label: partLabel(p, cp.index), nx: -u[1], ny: u[0], stations });
  });
  if (skippedShapes > 0) notes.push(`${skippedShapes} standard shape${skippedShapes === 1 ? '' : 's'} not drawn: the diagram covers plate parts`);
  return { walls, qMax, notes };
}
