/**
 * Which parts act together, which overlap, and into how many separate pieces the material falls.
 *
 * partsActingTogether(doc) is the one answer to "which parts twist together": two visible add
 * parts act together when they overlap (share area) or meet at a joint whose kind is not
 * "not connected" (core/joints/contacts.ts); the groups are the connected sets of that relation.
 * Parts a gap apart, or joined only by not-connected joints, are separate: torsion of the section
 * is then the sum of the groups' own torsion, each about its own shear centre, with no shared
 * shear centre (Saint-Venant torsion of separate members; Timoshenko & Goodier §§ on torsion of
 * solid sections apply to each). Each group's region is the gross section (fastener holes left
 * out, voids cut) restricted to its parts, in document units.
 *
 * Overlaps: two add parts whose interiors share area are reported with that area (the union counts
 * it once, so a duplicate part exactly on top of another adds nothing; nothing is merged silently).
 * Area threshold: OVERLAP_AREA_RATIO × size², size as in jointTolerance.
 *
 * Bending properties are always those of the parts acting together (the whole gross section);
 * callers say so where groups > 1 (see SEPARATE_PIECES_NOTE).
 */
import type { SectionDocument } from '../document/types.ts';
import type { Region } from '../geometry/types.ts';
import { BooleanError, intersectRegions, regionBounds, unionRegions } from '../geometry/index.ts';
import { regionIntegrals } from '../properties/index.ts';
import { partLabel, regionFromDocument, type ComposedPart, type Composition } from '../section/index.ts';
import { findJoints, jointKindText, jointTolerance, type Joint } from './contacts.ts';

export const OVERLAP_AREA_RATIO = 1e-9;

export interface PartOverlap {
  readonly a: number;
  readonly b: number;
  readonly labels: readonly [string, string];
  /** Shared area, document unit². */
  readonly area: number;
}

export interface ActingGroup {
  /** Indices into the composition's parts. */
  readonly parts: readonly number[];
  readonly partIds: readonly string[];
  readonly labels: readonly string[];
  /** The gross material of these parts (may be several polygons if a void cuts a part apart). */
  readonly region: Region;
}

export interface ActingGroups {
  readonly composition: Composition;
  readonly joints: readonly Joint[];
  readonly overlaps: readonly PartOverlap[];
  /** One group when everything acts together; empty when the composition has diagnostics. */
  readonly groups: readonly ActingGroup[];
  /** Plain sentences for every result view: separate pieces and why, overlaps with names and areas. */
  readonly warnings: readonly string[];
}

export const SEPARATE_PIECES_NOTE =
  'Bending properties (A, I, S, Z) assume the parts act together as one section. Separate pieces or plies that are not connected share a load in proportion to each one\'s EI.';

function signedArea(region: Region): number {
  return region.reduce((s, _p, i) => s + regionIntegrals([region[i] as Region[number]], 0, 0).A, 0);
}

/** Pairs of add parts whose interiors share area, with that area. */
export function partOverlaps(parts: readonly ComposedPart[]): PartOverlap[] {
  const tol = jointTolerance(parts);
  const minArea = OVERLAP_AREA_RATIO * (tol / 1e-6) ** 2;
  const out: PartOverlap[] = [];
  for (let a = 0; a < parts.length; a++) {
    for (let b = a + 1; b < parts.length; b++) {
      const pa = parts[a] as ComposedPart, pb = parts[b] as ComposedPart;
      if (pa.part.operation !== 'add' || pb.part.operation !== 'add') continue;
      const p = regionBounds(pa.region), q = regionBounds(pb.region);
      // Strict box overlap (wider than the tolerance): parts that only touch are joints, not overlaps.
      if (p === null || q === null || !(p.minX < q.maxX - tol && q.minX < p.maxX - tol && p.minY < q.maxY - tol && q.minY < p.maxY - tol)) continue;
      const labels = [partLabel(pa.part, pa.index), partLabel(pb.part, pb.index)] as const;
      let shared: Region;
      try {
        shared = intersectRegions(pa.region, pb.region, { context: 'finding overlapping parts', parts: [...labels] });
      } catch (err) {
        if (!(err instanceof BooleanError)) throw err;
        continue;
      }
      const area = signedArea(shared);
      if (area > minArea) out.push({ a, b, labels, area });
    }
  }
  return out;
}

/** Connected sets of parts under "overlaps, or a joint that is connected". */
function connectedSets(count: number, links: readonly (readonly [number, number])[]): number[][] {
  const parent = Array.from({ length: count }, (_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i] as number)));
  for (const [a, b] of links) parent[find(a)] = find(b);
  const sets = new Map<number, number[]>();
  for (let i = 0; i < count; i++) {
    const r = find(i);
    sets.set(r, [...(sets.get(r) ?? []), i]);
  }
  return [...sets.values()];
}

/**
 * The material of one group: the union of its parts, less what the gross section cuts from them.
 * When no cut-out comes near the group, the gross section adds nothing to cut, so the union is the
 * answer and the intersection with the gross section is skipped: on a dense outline (300,000
 * vertices) that intersection of two nearly identical rings made the clipping library give up.
 */
function groupRegion(gross: Region, parts: readonly ComposedPart[], members: readonly number[]): Region {
  const labels = members.map((k) => partLabel((parts[k] as ComposedPart).part, (parts[k] as ComposedPart).index));
  const names = { context: 'splitting the section into the parts that act together', parts: [labels.join(', '), 'the gross section'] };
  let union: Region = [];
  for (const k of members) union = union.length === 0 ? (parts[k] as ComposedPart).region : unionRegions(union, (parts[k] as ComposedPart).region, names);
  const box = regionBounds(union);
  const cutNear = parts.some((p) => {
    if (p.part.operation === 'add') return false;
    const q = regionBounds(p.region);
    return box !== null && q !== null && q.minX <= box.maxX && box.minX <= q.maxX && q.minY <= box.maxY && box.minY <= q.maxY;
  });
  return cutNear ? intersectRegions(gross, union, names) : union;
}

const area = (x: number): string => (Math.abs(x) >= 100 ? x.toFixed(0) : x.toPrecision(4));

/**
 * Which parts act together for torsion: connected material minus joints marked "not connected".
 * Helper for torsion (sum over groups), result views and exports (warnings).
 */
export function partsActingTogether(doc: SectionDocument): ActingGroups {
  const composition = regionFromDocument(doc);
  if (composition.diagnostics.length > 0) return { composition, joints: [], overlaps: [], groups: [], warnings: [] };
  const parts = composition.parts;
  const joints = findJoints(doc, parts);
  const overlaps = partOverlaps(parts);
  const adds = parts.map((p, k) => (p.part.operation === 'add' ? k : -1)).filter((k) => k >= 0);
  const index = new Map(adds.map((k, i) => [k, i]));
  const links: [number, number][] = [
    ...overlaps.map((o) => [index.get(o.a) ?? 0, index.get(o.b) ?? 0] as [number, number]),
    ...joints.filter((j) => j.kind.type !== 'not-connected').map((j) => [index.get(j.a) ?? 0, index.get(j.b) ?? 0] as [number, number]),
  ];
  const sets = connectedSets(adds.length, links).map((s) => s.map((i) => adds[i] as number));
  const groups: ActingGroup[] = sets.map((members) => ({
    parts: members,
    partIds: members.map((k) => (parts[k] as ComposedPart).part.id),
    labels: members.map((k) => partLabel((parts[k] as ComposedPart).part, (parts[k] as ComposedPart).index)),
    region: sets.length === 1 ? composition.region : groupRegion(composition.region, parts, members),
  })).filter((g) => g.region.length > 0);
  const warnings: string[] = [];
  const pieces = composition.region.length;
  if (groups.length > 1 || pieces > 1) {
    const why = joints.some((j) => j.kind.type === 'not-connected') ? 'parts apart, or joined only by joints marked "not connected"' : 'parts that do not touch';
    const count = Math.max(groups.length, pieces);
    warnings.push(`The material falls into ${count} separate pieces (${why}): ${groups.map((g) => g.labels.join(' + ')).join('; ')}. Torsion is the sum of the pieces, each twisting about its own shear centre; there is no shared shear centre. ${SEPARATE_PIECES_NOTE}`);
  }
  for (const j of joints.filter((x) => x.isDefault)) {
    warnings.push(`Joint between "${j.labels[0]}" and "${j.labels[1]}": ${jointKindText(j.kind)} by default (${j.defaultReason}); set its kind if it is joined otherwise.`);
  }
  for (const o of overlaps) warnings.push(`Parts "${o.labels[0]}" and "${o.labels[1]}" overlap by ${area(o.area)} ${doc.unit}²: the overlap counts once (nothing is added for it). Check that this is intended (a duplicate part on top of another adds nothing).`);
  return { composition, joints, overlaps, groups, warnings };
}
