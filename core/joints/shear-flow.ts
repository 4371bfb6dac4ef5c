/**
 * Shear flow at the joints: q = V·Q/I per joint, for a vertical shear Vy and a horizontal shear
 * Vx, in the general form for unsymmetric sections (Gere & Timoshenko, Mechanics of Materials,
 * shear flow; Boresi, unsymmetric bending), from the flexure formula of docs/methods.md §9.1:
 *
 *   q = [(Vy·Iy − Vx·Ixy)·Qx + (Vx·Ix − Vy·Ixy)·Qy] / (Ix·Iy − Ixy²)
 *
 * with Qx = ∫Y dA and Qy = ∫X dA of the material cut off by the joint, about the centroid.
 * Several materials: every area is weighted by n = E/E_ref (the transformed section,
 * docs/methods.md §6), so Q, I and the centroid are E-weighted. Positive q flows from the
 * cut-off side across the joint; the sign only says which way.
 *
 * What a joint cuts off: the parts are nodes of a graph whose edges are the connected joints
 * (every kind but "not connected") and overlaps. When removing a joint separates the graph, the
 * cut-off material is the side with fewer parts (ties: the joint's first part's side). When it does not (a closed cell,
 * e.g. a box girder's flange welded to two webs), each of the two parts on its own is tried as the
 * cut-off side, all its connected joints sharing its shear flow equally; the larger share is
 * reported and marked `equalShare`. Equal sharing is exact for a section symmetric about the
 * load's line (the usual box girder); otherwise it is an assumption the output states, since a
 * closed cell needs a compatibility analysis (Bredt–Batho) this module does not do. The segments
 * of one joint share its q equally in the same way.
 *
 * Units: V in newtons; lengths in the document unit; q in newtons per document unit of length.
 * Assumes the parts act together in bending (the transformed section of all visible parts).
 */
import type { SectionDocument } from '../document/types.ts';
import { BooleanError, differenceRegions } from '../geometry/index.ts';
import type { Region } from '../geometry/types.ts';
import { builtInMaterial, documentMaterials, materialInSI } from '../materials/index.ts';
import { regionIntegrals, vertexBoxCentre } from '../properties/index.ts';
import type { RawIntegrals } from '../properties/types.ts';
import { isFastenerHole, partLabel } from '../section/index.ts';
import { partsActingTogether } from './groups.ts';
import type { Joint } from './contacts.ts';

export interface ShearLoads {
  /** Shear along +y and +x, newtons. */
  readonly Vy: number;
  readonly Vx: number;
}

export interface TransformedSection {
  readonly cx: number;
  readonly cy: number;
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
  readonly A: number;
}

export interface JointShearFlow {
  readonly joint: Joint;
  /** Labels of the parts cut off by the joint (Q is theirs). */
  readonly cutOff: readonly string[];
  /** Q of the cut-off material about the centroid (E-weighted), document unit³. */
  readonly Qx: number;
  readonly Qy: number;
  /** Shear flow of this joint from Vy alone, Vx alone, and both: N per document unit. */
  readonly qVy: number;
  readonly qVx: number;
  readonly q: number;
  /** How many joints share the cut-off material's flow (1 for a joint that alone cuts it off). */
  readonly sharedBy: number;
  readonly equalShare: boolean;
  /** Per contact segment: q / number of segments (equal share when there are several). */
  readonly qPerSegment: number;
  /** Average shear stress in the material at the joint, |q| / contact length (N per unit²). */
  readonly tau: number;
  readonly note: string;
}

export interface ShearFlowResult {
  readonly section: TransformedSection;
  readonly flows: readonly JointShearFlow[];
  readonly warnings: readonly string[];
}

export interface PartMaterial {
  readonly index: number;
  readonly label: string;
  /** Modular ratio E / E_ref (1 when no part has a material). */
  readonly n: number;
  /** Young's modulus in Pa, or null when the part has no material. */
  readonly E: number | null;
  /** The part's own gross material (later parts and voids cut out, fastener holes kept), document unit. */
  readonly region: Region;
  readonly raw: RawIntegrals;
}

/**
 * Each visible add part's own gross material (later parts and voids win) with its modular ratio.
 * E is taken in pascals (each material's own stress unit converted, core/materials materialInSI),
 * so a steel plate typed in ksi and a timber ply typed in psi are weighted correctly.
 */
export function partMaterials(doc: SectionDocument, parts: ReturnType<typeof partsActingTogether>['composition']['parts']): { list: PartMaterial[]; warnings: string[] } {
  const { materials } = documentMaterials(doc);
  const warnings: string[] = [];
  const E = parts.map((p) => {
    const id = p.part.material ?? doc.defaultMaterial;
    const m = id === null ? undefined : (materials.get(id) ?? builtInMaterial(id));
    return m === undefined ? null : materialInSI(m).E;
  });
  const eRef = E.find((e) => e !== null) ?? null;
  const regions: Region[] = parts.map((p, k) => {
    let region = p.region;
    for (const later of parts.slice(k + 1)) {
      if (region.length === 0 || isFastenerHole(later.part)) continue;
      try {
        region = differenceRegions(region, later.region, { context: 'splitting the section by part for shear flow', parts: [partLabel(p.part, p.index), partLabel(later.part, later.index)] });
      } catch (err) {
        if (!(err instanceof BooleanError)) throw err;
      }
    }
    return region;
  });
  const [ox, oy] = vertexBoxCentre(regions.flat());
  const list: PartMaterial[] = [];
  parts.forEach((p, k) => {
    if (p.part.operation !== 'add' || (regions[k] as Region).length === 0) return;
    const e = E[k] ?? null;
    if (eRef !== null && e === null) warnings.push(`part "${partLabel(p.part, p.index)}" has no material: taken with E_ref in the transformed section`);
    list.push({ index: k, label: partLabel(p.part, p.index), n: eRef === null || e === null ? 1 : e / eRef, E: e, region: regions[k] as Region, raw: regionIntegrals(regions[k] as Region, ox, oy) });
  });
  return { list, warnings };
}

export function transformed(list: readonly PartMaterial[]): TransformedSection & { ox: number; oy: number } {
  let A = 0, Sx = 0, Sy = 0, Ixx = 0, Iyy = 0, Ixy = 0;
  for (const p of list) {
    A += p.n * p.raw.A;
    Sx += p.n * p.raw.Qx;
    Sy += p.n * p.raw.Qy;
    Ixx += p.n * p.raw.Ixx;
    Iyy += p.n * p.raw.Iyy;
    Ixy += p.n * p.raw.Ixy;
  }
  const ox = list[0]?.raw.originX ?? 0, oy = list[0]?.raw.originY ?? 0;
  const xl = Sy / A, yl = Sx / A;
  return { A, cx: ox + xl, cy: oy + yl, Ix: Ixx - A * yl * yl, Iy: Iyy - A * xl * xl, Ixy: Ixy - A * xl * yl, ox, oy };
}

/** Parts reachable from `start` over the connected joints, leaving out the joint `skip`. */
function reachable(start: number, edges: readonly Joint[], skip: Joint | null): Set<number> {
  const seen = new Set([start]);
  const stack = [start];
  while (stack.length > 0) {
    const k = stack.pop() as number;
    for (const e of edges) {
      if (e === skip) continue;
      const other = e.a === k ? e.b : e.b === k ? e.a : -1;
      if (other >= 0 && !seen.has(other)) {
        seen.add(other);
        stack.push(other);
      }
    }
  }
  return seen;
}

/** Shear flow of every joint under Vy and Vx (see the header for the method and its limits). */
export function jointShearFlows(doc: SectionDocument, loads: ShearLoads): ShearFlowResult | null {
  const acting = partsActingTogether(doc);
  if (acting.composition.diagnostics.length > 0) return null;
  const parts = acting.composition.parts;
  const { list, warnings } = partMaterials(doc, parts);
  if (list.length === 0) return null;
  const s = transformed(list);
  const byIndex = new Map(list.map((p) => [p.index, p]));
  const D = s.Ix * s.Iy - s.Ixy * s.Ixy;
  const flowOf = (set: ReadonlySet<number>): { Qx: number; Qy: number; qVy: number; qVx: number } => {
    let Qx = 0, Qy = 0;
    for (const k of set) {
      const p = byIndex.get(k);
      if (!p) continue;
      Qx += p.n * (p.raw.Qx - p.raw.A * (s.cy - s.oy));
      Qy += p.n * (p.raw.Qy - p.raw.A * (s.cx - s.ox));
    }
    return { Qx, Qy, qVy: (loads.Vy * s.Iy * Qx - loads.Vy * s.Ixy * Qy) / D, qVx: (loads.Vx * s.Ix * Qy - loads.Vx * s.Ixy * Qx) / D };
  };
  const connected = [...acting.joints.filter((j) => j.kind.type !== 'not-connected'), ...acting.overlaps.map((o) => ({ a: o.a, b: o.b }) as Joint)];
  const labels = (set: ReadonlySet<number>): string[] => [...set].sort((x, y) => x - y).map((k) => byIndex.get(k)?.label ?? '');
  const flows = acting.joints.map((joint): JointShearFlow => {
    const segs = joint.segments.length;
    const base = { joint, sharedBy: 1, equalShare: segs > 1 };
    if (joint.kind.type === 'not-connected') {
      const z = { Qx: 0, Qy: 0, qVy: 0, qVx: 0, q: 0, qPerSegment: 0, tau: 0 };
      return { ...base, ...z, cutOff: [], equalShare: false, note: 'not connected: carries no shear; the parts either side bend on their own and share the load by EI' };
    }
    const side = reachable(joint.a, connected, joint);
    let cut: Set<number>;
    let sharedBy = 1;
    if (!side.has(joint.b)) {
      // The smaller side is the material cut off (its Q is the other side's, with the sign turned).
      const other = reachable(joint.b, connected, joint);
      cut = other.size < side.size ? other : side;
    }
    else {
      // A closed cell: try each part alone, its connected joints sharing its flow equally; keep the larger share.
      const options = [joint.a, joint.b].map((k) => {
        const set = new Set([k]);
        const n = connected.filter((e) => e.a === k || e.b === k).length;
        const f = flowOf(set);
        return { set, n, size: Math.hypot(f.qVy, f.qVx) / n };
      });
      const pick = (options[1]?.size ?? 0) > (options[0]?.size ?? 0) ? options[1] : options[0];
      cut = pick?.set ?? new Set([joint.a]);
      sharedBy = pick?.n ?? 1;
    }
    const f = flowOf(cut);
    const qVy = f.qVy / sharedBy, qVx = f.qVx / sharedBy, q = qVy + qVx;
    const equalShare = sharedBy > 1 || segs > 1;
    const note = sharedBy > 1
      ? `closed cell: "${labels(cut).join(' + ')}" is cut off by ${sharedBy} joints, taken to share its flow equally (exact when the section is symmetric about the load; otherwise a closed-cell analysis is needed)`
      : segs > 1 ? `${segs} contact segments taken to share the joint's flow equally (exact for a symmetric section)` : `cuts off ${labels(cut).join(' + ')}`;
    return { ...base, cutOff: labels(cut), Qx: f.Qx / sharedBy, Qy: f.Qy / sharedBy, qVy, qVx, q, sharedBy, equalShare, qPerSegment: q / segs, tau: Math.abs(q) / joint.length, note };
  });
  return { section: { A: s.A, cx: s.cx, cy: s.cy, Ix: s.Ix, Iy: s.Iy, Ixy: s.Ixy }, flows, warnings: [...acting.warnings, ...warnings] };
}
