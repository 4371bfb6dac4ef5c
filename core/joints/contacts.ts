/**
 * Joints: where two parts of a section meet along a line. A joint is every contact segment
 * between the outlines of two visible add parts (their placed regions, core/section/compose.ts),
 * with the kind the user gave it (core/document/types.ts JointSetting) or its default.
 *
 * Contact: a straight boundary segment of one part and a straight boundary segment of the other
 * lie on one line within the tolerance, run in opposite directions (material on opposite sides:
 * normalised rings keep the material on their left), and overlap for more than the tolerance.
 * Tolerance: JOINT_TOLERANCE_RATIO × the size of the section (the larger side of the box of all
 * add parts), so it scales with the drawing and absorbs the rounding of rotated placements
 * (~1e−13 of the size) but never joins parts a visible gap apart.
 *
 * Default kind: welded (fillet weld on both sides) between two metal parts (material kind steel
 * or aluminium), not connected otherwise. A part with no material at all (neither its own nor a
 * document default) is taken as metal, the common case of a steel fabricator's sketch, and the
 * joint says so in `defaultReason`.
 *
 * Does not: find contact along arcs (a round bar touching a plate meets it at a point, not a
 * line; concentric arcs in contact are not detected); subtract void cut-outs that run across a
 * contact line (the contact is the outlines' own).
 */
import type { JointKind, JointSetting, SectionDocument } from '../document/types.ts';
import type { Region, Ring } from '../geometry/types.ts';
import { regionBounds } from '../geometry/index.ts';
import { builtInMaterial, documentMaterials } from '../materials/index.ts';
import { partLabel, type ComposedPart } from '../section/index.ts';

/** Contact tolerance as a fraction of the section size. */
export const JOINT_TOLERANCE_RATIO = 1e-6;

export interface ContactSegment {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
  readonly length: number;
}

export interface Joint {
  /** Indices into the composition's parts (ComposedPart[]), a before b in document order. */
  readonly a: number;
  readonly b: number;
  readonly partIds: readonly [string, string];
  readonly labels: readonly [string, string];
  readonly segments: readonly ContactSegment[];
  /** Sum of the segment lengths, document unit. */
  readonly length: number;
  readonly kind: JointKind;
  /** True when the user gave no kind (the default applies). */
  readonly isDefault: boolean;
  /** Why the default is what it is (empty when the user chose the kind). */
  readonly defaultReason: string;
}

const METAL_KINDS = new Set(['steel', 'aluminium']);

/** Whether each part is metal: its material's kind, or metal when no material is given at all. */
function partMetal(doc: SectionDocument, parts: readonly ComposedPart[]): Map<number, { metal: boolean; why: string }> {
  const { materials } = documentMaterials(doc);
  const out = new Map<number, { metal: boolean; why: string }>();
  parts.forEach((p, k) => {
    const id = p.part.material ?? doc.defaultMaterial;
    if (id === null) return void out.set(k, { metal: true, why: 'no material given: taken as metal' });
    const m = materials.get(id) ?? builtInMaterial(id);
    if (m === undefined) return void out.set(k, { metal: true, why: `material "${id}" not found: taken as metal` });
    out.set(k, { metal: METAL_KINDS.has(m.kind), why: m.kind });
  });
  return out;
}

/** The default joint kind between two parts, and why. */
function defaultKind(ma: { metal: boolean; why: string }, mb: { metal: boolean; why: string }): { kind: JointKind; reason: string } {
  if (ma.metal && mb.metal) return { kind: { type: 'welded', weld: 'fillet-both-sides' }, reason: `default between two metal parts (${ma.why}; ${mb.why})` };
  return { kind: { type: 'not-connected' }, reason: `default where a part is not metal (${ma.why}; ${mb.why})` };
}

interface Seg {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Straight segments of every ring of a region (arc segments are left out). */
function straightSegments(region: Region): Seg[] {
  const out: Seg[] = [];
  const add = (ring: Ring): void => {
    const n = ring.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      if ((ring.bulge?.[i] ?? 0) !== 0) continue;
      const j = (i + 1) % n;
      out.push({ x0: ring.xy[2 * i] as number, y0: ring.xy[2 * i + 1] as number, x1: ring.xy[2 * j] as number, y1: ring.xy[2 * j + 1] as number });
    }
  };
  for (const p of region) {
    add(p.outer);
    p.holes.forEach(add);
  }
  return out;
}

/** The shared stretch of two antiparallel collinear segments, or null. */
function contactOf(p: Seg, q: Seg, tol: number): ContactSegment | null {
  const L = Math.hypot(p.x1 - p.x0, p.y1 - p.y0);
  const M = Math.hypot(q.x1 - q.x0, q.y1 - q.y0);
  if (L <= tol || M <= tol) return null;
  const ux = (p.x1 - p.x0) / L, uy = (p.y1 - p.y0) / L;
  // Material on opposite sides: the segments run in opposite directions.
  if ((ux * (q.x1 - q.x0) + uy * (q.y1 - q.y0)) / M > -1 + 1e-9) return null;
  const off0 = ux * (q.y0 - p.y0) - uy * (q.x0 - p.x0);
  const off1 = ux * (q.y1 - p.y0) - uy * (q.x1 - p.x0);
  if (Math.abs(off0) > tol || Math.abs(off1) > tol) return null;
  const t0 = ux * (q.x0 - p.x0) + uy * (q.y0 - p.y0);
  const t1 = ux * (q.x1 - p.x0) + uy * (q.y1 - p.y0);
  const s = Math.max(0, Math.min(t0, t1));
  const e = Math.min(L, Math.max(t0, t1));
  if (e - s <= tol) return null;
  return { x0: p.x0 + ux * s, y0: p.y0 + uy * s, x1: p.x0 + ux * e, y1: p.y0 + uy * e, length: e - s };
}

function boxesNear(a: Region, b: Region, tol: number): boolean {
  const p = regionBounds(a), q = regionBounds(b);
  return p !== null && q !== null && p.minX <= q.maxX + tol && q.minX <= p.maxX + tol && p.minY <= q.maxY + tol && q.minY <= p.maxY + tol;
}

/** The contact tolerance of a composition: JOINT_TOLERANCE_RATIO × the larger side of the add parts' box. */
export function jointTolerance(parts: readonly ComposedPart[]): number {
  const all = parts.filter((p) => p.part.operation === 'add').flatMap((p) => p.region);
  const b = regionBounds(all);
  return b === null ? 0 : JOINT_TOLERANCE_RATIO * Math.max(b.maxX - b.minX, b.maxY - b.minY);
}

/** The user's setting for a pair of part ids, in either order. */
export function jointSettingFor(settings: readonly JointSetting[] | undefined, idA: string, idB: string): JointSetting | undefined {
  return settings?.find((s) => (s.parts[0] === idA && s.parts[1] === idB) || (s.parts[0] === idB && s.parts[1] === idA));
}

/** Every joint between two visible add parts of the composition (parts as core/section composed them). */
export function findJoints(doc: SectionDocument, parts: readonly ComposedPart[]): Joint[] {
  const tol = jointTolerance(parts);
  const metal = partMetal(doc, parts);
  // Segments are listed only for parts that have a neighbour within reach (a lone part's outline may be large).
  const segs = new Map<number, Seg[]>();
  const segsOf = (k: number): Seg[] => {
    let s = segs.get(k);
    if (s === undefined) segs.set(k, (s = straightSegments((parts[k] as ComposedPart).region)));
    return s;
  };
  const joints: Joint[] = [];
  for (let a = 0; a < parts.length; a++) {
    for (let b = a + 1; b < parts.length; b++) {
      const pa = parts[a] as ComposedPart, pb = parts[b] as ComposedPart;
      if (pa.part.operation !== 'add' || pb.part.operation !== 'add' || !boxesNear(pa.region, pb.region, tol)) continue;
      const segments: ContactSegment[] = [];
      for (const p of segsOf(a)) for (const q of segsOf(b)) {
        const c = contactOf(p, q, tol);
        if (c) segments.push(c);
      }
      if (segments.length === 0) continue;
      const setting = jointSettingFor(doc.joints, pa.part.id, pb.part.id);
      const fallback = defaultKind(metal.get(a) ?? { metal: true, why: '' }, metal.get(b) ?? { metal: true, why: '' });
      joints.push({
        a, b, partIds: [pa.part.id, pb.part.id], labels: [partLabel(pa.part, pa.index), partLabel(pb.part, pb.index)], segments,
        length: segments.reduce((s, c) => s + c.length, 0),
        kind: setting?.kind ?? fallback.kind, isDefault: setting === undefined, defaultReason: setting === undefined ? fallback.reason : '',
      });
    }
  }
  return joints;
}

/** A joint kind in words, for lists and output. */
export function jointKindText(kind: JointKind): string {
  switch (kind.type) {
    case 'welded':
      return kind.weld === 'groove' ? 'welded, groove weld' : kind.weld === 'fillet-one-side' ? 'welded, fillet weld one side' : 'welded, fillet welds both sides';
    case 'fastened':
      return `fastened: ${kind.fastener}s in ${kind.rows} row${kind.rows === 1 ? '' : 's'}${kind.pitch !== undefined ? ` at pitch ${kind.pitch}` : ''}`;
    case 'glued':
      return 'glued';
    case 'not-connected':
      return 'not connected';
  }
}
