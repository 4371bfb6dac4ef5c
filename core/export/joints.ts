/**
 * The joints of a section for every output (CLI, CSV, SVG, report): separate pieces and
 * overlaps, each joint with its length, the parts either side and its kind, the EI share of
 * separate plies, and under shear forces Vy, Vx each joint's shear flow q, the stress on and
 * beside it, what it asks of the weld or the fasteners, and τmax per part (core/joints).
 *
 * Units: every factor and label comes from core/units for the output length unit: q in N/mm
 * (mm, cm, m) or kip/in (in, ft); weld legs and pitches in mm or in; τ in the unit system's
 * stress unit (MPa or ksi); V in its force unit (kN or kip); EI in its flexural stiffness unit;
 * joint lengths and cut positions in the output length unit. Segments stay in the document unit
 * (section coordinates, for drawing).
 *
 * Capacities are the user's inputs (fastener capacity) or the cited clauses (AISC 360-22 §J2.4,
 * Table J2.4, core/joints/weld.ts); the local code governs, and every output says so (JOINTS_NOTE).
 */
import type { JointKind, SectionDocument } from '../document/types.ts';
import {
  fastenerPitch, intermittentFillet, jointKindText, jointShearFlows, minimumFilletLeg, partsActingTogether, plyShares, requiredFilletLeg, shearStresses, SHEAR_CUTS_METHOD,
  type ContactSegment, type DesignMethod, type ShearLoads,
} from '../joints/index.ts';
import { convertLength, convertQuantity, isImperial, unitSystem, type LengthUnit } from '../units/index.ts';
import { csvNumberCell, csvTextCell } from './csv.ts';

export const JOINTS_NOTE = 'Weld and fastener numbers: capacities are your inputs or the cited clauses (AISC 360-22 §J2.4, Table J2.4); the local code governs.';

/** The output units of the joints results. */
export interface JointUnits {
  readonly length: LengthUnit;
  readonly force: string;
  readonly q: string;
  readonly weld: string;
  readonly stress: string;
  readonly stiffness: string;
}

export function jointUnits(unit: LengthUnit): JointUnits {
  const sys = unitSystem(unit);
  return { length: unit, force: sys.units.force, q: isImperial(unit) ? 'kip/in' : 'N/mm', weld: isImperial(unit) ? 'in' : 'mm', stress: sys.units.stress, stiffness: sys.units.flexuralStiffness };
}

export interface JointConverters {
  readonly force: (newtons: number) => number;
  /** N per document unit → q unit. */
  readonly q: (perUnit: number) => number;
  /** N per document unit² → stress unit. */
  readonly stress: (perUnit2: number) => number;
  /** Pa·document unit⁴ → stiffness unit. */
  readonly stiffness: (paUnit4: number) => number;
  /** metres → weld unit. */
  readonly weld: (metres: number) => number;
  /** document unit^power → output unit^power. */
  readonly length: (v: number, power?: number) => number;
}

export function jointConverters(docUnit: LengthUnit, u: JointUnits): JointConverters {
  const m = convertLength(1, docUnit, 'm');
  return {
    force: (n) => convertQuantity(n, 'force', 'N', u.force),
    q: (perUnit) => convertQuantity(perUnit / m, 'lineLoad', 'N/m', u.q),
    stress: (perUnit2) => convertQuantity(perUnit2 / (m * m), 'stress', 'Pa', u.stress),
    stiffness: (paUnit4) => convertQuantity(paUnit4 * m ** 4, 'flexuralStiffness', 'N·m²', u.stiffness),
    weld: (metres) => convertQuantity(metres, 'length', 'm', u.weld),
    length: (v, power = 1) => convertLength(v, docUnit, u.length, power),
  };
}

export interface JointDesignInput {
  /** Electrode strength FEXX, Pa (default 70 ksi, E70). */
  readonly fexx?: number;
  readonly method?: DesignMethod;
  /** Capacity of one fastener in shear, N (the user's number); absent: no pitch. */
  readonly fastenerCapacity?: number;
}

export interface JointsExportInput {
  readonly doc: SectionDocument;
  /** Output length unit (default the document's). */
  readonly unit?: LengthUnit;
  /** Vy, Vx in newtons; absent or null: joints, pieces and plies only. */
  readonly loads?: ShearLoads | null;
  readonly design?: JointDesignInput;
}

export interface JointRow {
  readonly name: string;
  readonly parts: readonly [string, string];
  readonly partIds: readonly [string, string];
  /** Output length unit. */
  readonly length: number;
  readonly kind: JointKind;
  readonly kindText: string;
  readonly isDefault: boolean;
  /** Section coordinates, document unit. */
  readonly segments: readonly ContactSegment[];
  readonly shear: JointShearRow | null;
}

export interface JointShearRow {
  /** q unit. */
  readonly q: number;
  readonly qVy: number;
  readonly qVx: number;
  readonly cutOff: readonly string[];
  readonly sharedBy: number;
  readonly equalShare: boolean;
  readonly note: string;
  /** Stress unit: on the joint plane, and in each part just beside it (null where not found). */
  readonly tauJoint: number;
  readonly tauIn: readonly [number | null, number | null];
  /** Fillet welds: weld lines, required leg, the Table J2.4 minimum and intermittent welds (weld unit). */
  readonly fillet?: {
    readonly lines: number;
    readonly requiredLeg: number;
    readonly minimum: { readonly thinnerPart: number; readonly leg: number; readonly source: string } | null;
    readonly intermittent: { readonly leg: number; readonly segment: number; readonly pitch: number };
  };
  /** Fastened joints with a capacity given: the largest pitch (weld unit). */
  readonly largestPitch?: number;
  /** What the joint needs, in words with units ('' when nothing applies). */
  readonly needs: string;
}

export interface PartShearRow {
  readonly part: string;
  /** Stress unit. */
  readonly tauMax: number;
  readonly where: string;
  readonly cut: { readonly orientation: string; readonly at: number; readonly crossed: readonly string[]; readonly width: number; readonly cutOff: readonly string[]; readonly how: string; readonly note: string; readonly q: number } | null;
}

export interface PlyRow {
  readonly parts: readonly string[];
  readonly Ix: number;
  readonly Iy: number;
  readonly EIx: number | null;
  readonly EIy: number | null;
  readonly shareX: number;
  readonly shareY: number;
}

export interface JointsExport {
  readonly unit: LengthUnit;
  readonly units: JointUnits;
  /** Separate pieces, default joint kinds, overlaps (plain sentences). */
  readonly warnings: readonly string[];
  readonly pieces: number;
  readonly joints: readonly JointRow[];
  readonly plies: { readonly note: string; readonly plies: readonly PlyRow[] } | null;
  readonly shear: {
    readonly Vy: number;
    readonly Vx: number;
    readonly method: DesignMethod;
    /** Stress unit. */
    readonly fexx: number;
    readonly parts: readonly PartShearRow[];
    readonly tauMethod: string;
  } | null;
  /** Notes every output prints with the joints: the capacities caution when there is a shear. */
  readonly notes: readonly string[];
}

/** Thickness of the thinner of two parts, where a part says it (a rectangle's smaller side, a plate's t); else null. */
function thinner(doc: SectionDocument, ids: readonly string[]): number | null {
  const t = ids.map((id) => {
    const p = doc.parts.find((x) => x.id === id);
    if (p?.type === 'rectangle') return Math.min(p.width, p.height);
    if (p?.type === 'shape' && p.shape === 'plate') return p.params['t'] ?? null;
    return null;
  });
  return t.some((x) => x === null) ? null : Math.min(...(t as number[]));
}

const sig = (v: number): string => (Number.isFinite(v) ? Number(v.toPrecision(4)).toString() : '—');

/** Everything about the joints of one section, in output units; null when the section cannot be composed. */
export function jointsExport(input: JointsExportInput): JointsExport | null {
  const { doc } = input;
  const unit = input.unit ?? doc.unit;
  const acting = partsActingTogether(doc);
  if (acting.composition.diagnostics.length > 0) return null;
  const u = jointUnits(unit);
  const c = jointConverters(doc.unit, u);
  const method = input.design?.method ?? 'LRFD';
  const fexx = input.design?.fexx ?? convertQuantity(70, 'stress', 'ksi', 'Pa');
  const R = input.design?.fastenerCapacity;
  const loads = input.loads ?? null;
  const flows = loads ? jointShearFlows(doc, loads) : null;
  const stresses = loads ? shearStresses(doc, loads) : null;
  const us = isImperial(unit);
  const metre = convertLength(1, doc.unit, 'm');
  const joints = acting.joints.map((j, i): JointRow => {
    const f = flows?.flows.find((x) => x.joint.a === j.a && x.joint.b === j.b);
    const s = stresses?.joints.find((x) => x.joint.a === j.a && x.joint.b === j.b);
    let shear: JointShearRow | null = null;
    if (f) {
      const qm = f.q / metre;
      const welded = j.kind.type === 'welded' && j.kind.weld !== 'groove';
      const lines = j.kind.type === 'welded' && j.kind.weld === 'fillet-one-side' ? 1 : 2;
      let fillet: JointShearRow['fillet'];
      let needs = '';
      if (welded) {
        const leg = requiredFilletLeg(qm, fexx, lines, method);
        const t = thinner(doc, j.partIds);
        const min = t === null ? 0 : minimumFilletLeg(convertLength(t, doc.unit, 'm'), us ? 'us' : 'metric');
        const inter = intermittentFillet(qm, Math.max(leg, min), fexx, lines, method, us ? 'us' : 'metric');
        fillet = {
          lines, requiredLeg: c.weld(leg),
          minimum: t === null ? null : { thinnerPart: c.length(t), leg: c.weld(min), source: 'AISC 360-22 Table J2.4 (from memory)' },
          intermittent: { leg: c.weld(Math.max(leg, min)), segment: c.weld(inter.segment), pitch: c.weld(inter.pitch) },
        };
        const governing = fillet.minimum && fillet.minimum.leg > fillet.requiredLeg ? `; the Table J2.4 minimum governs` : '';
        needs = `fillet leg ≥ ${sig(fillet.requiredLeg)} ${u.weld} (${method}, ${lines} line${lines === 1 ? '' : 's'})${fillet.minimum ? `; Table J2.4 minimum ${sig(fillet.minimum.leg)} ${u.weld}${governing}` : ''}; or ${sig(fillet.intermittent.leg)} ${u.weld} × ${sig(fillet.intermittent.segment)} ${u.weld} at pitch ≤ ${sig(fillet.intermittent.pitch)} ${u.weld}`;
      } else if (j.kind.type === 'welded') needs = 'groove weld: its strength is that of the joined metal (check by the local code)';
      let largestPitch: number | undefined;
      if (j.kind.type === 'fastened') {
        if (R !== undefined) {
          largestPitch = c.weld(fastenerPitch(qm, j.kind.rows, R));
          needs = `${j.kind.fastener}s, ${j.kind.rows} row${j.kind.rows === 1 ? '' : 's'}: pitch ≤ ${sig(largestPitch)} ${u.weld}`;
        } else needs = 'give a capacity per fastener for the largest pitch';
      }
      if (j.kind.type === 'glued') needs = `adhesive line carries ${sig(c.stress(f.tau))} ${u.stress} on the joint plane`;
      if (j.kind.type === 'not-connected') needs = 'not connected: carries no shear';
      shear = {
        q: c.q(f.q), qVy: c.q(f.qVy), qVx: c.q(f.qVx), cutOff: f.cutOff, sharedBy: f.sharedBy, equalShare: f.equalShare, note: f.note,
        tauJoint: c.stress(f.tau), tauIn: [s?.tauIn[0] == null ? null : c.stress(s.tauIn[0]), s?.tauIn[1] == null ? null : c.stress(s.tauIn[1])],
        ...(fillet ? { fillet } : {}), ...(largestPitch !== undefined ? { largestPitch } : {}), needs,
      };
    }
    return { name: `J${i + 1}`, parts: j.labels, partIds: j.partIds, length: c.length(j.length), kind: j.kind, kindText: jointKindText(j.kind), isDefault: j.isDefault, segments: j.segments, shear };
  });
  const ply = plyShares(doc);
  const plies = ply !== null && ply.separate
    ? { note: ply.note, plies: ply.plies.map((p) => ({ parts: p.labels, Ix: c.length(p.Ix, 4), Iy: c.length(p.Iy, 4), EIx: p.EIx === null ? null : c.stiffness(p.EIx), EIy: p.EIy === null ? null : c.stiffness(p.EIy), shareX: p.shareX, shareY: p.shareY })) }
    : null;
  const shear = loads && stresses
    ? {
        Vy: c.force(loads.Vy), Vx: c.force(loads.Vx), method, fexx: convertQuantity(fexx, 'stress', 'Pa', u.stress), tauMethod: SHEAR_CUTS_METHOD,
        parts: stresses.parts.map((p): PartShearRow => ({
          part: p.label, tauMax: c.stress(p.tauMax),
          where: p.cut === null ? 'not cut' : `${p.cut.orientation} cut at ${p.cut.orientation === 'horizontal' ? 'y' : 'x'} = ${sig(c.length(p.cut.at))} ${unit} through ${p.cut.crossed.join(' + ')} (width ${sig(c.length(p.cut.width))} ${unit}${p.cut.how === 'whole line' ? ', whole line: flow shared by width' : ''})`,
          cut: p.cut === null ? null : { orientation: p.cut.orientation, at: c.length(p.cut.at), crossed: p.cut.crossed, width: c.length(p.cut.width), cutOff: p.cut.cutOff, how: p.cut.how, note: p.cut.note, q: c.q(p.cut.q) },
        })),
      }
    : null;
  return { unit, units: u, warnings: acting.warnings, pieces: acting.groups.length, joints, plies, shear, notes: shear ? [JOINTS_NOTE] : [] };
}

const cells = (row: readonly (string | number | null)[]): string => row.map((v) => (typeof v === 'number' ? csvNumberCell(v) : csvTextCell(v ?? ''))).join(',');

/**
 * The joints as CSV blocks to follow the properties rows (core/export/csv.ts): a blank line, then
 * a joints table, τmax per part (with a shear), the EI share of separate plies, and the warnings
 * and notes, one per row. Numbers at full precision in the units named in each header.
 */
export function jointsCsv(x: JointsExport): string {
  const u = x.units;
  const lines: string[] = [];
  const block = (rows: readonly (readonly (string | number | null)[])[]): void => {
    lines.push('', ...rows.map(cells));
  };
  if (x.joints.length > 0) {
    const header = ['joint', 'part A', 'part B', `length [${x.unit}]`, 'kind', 'default kind'];
    if (x.shear) header.push(`q [${u.q}]`, `tau on joint [${u.stress}]`, `tau in part A [${u.stress}]`, `tau in part B [${u.stress}]`, `required fillet leg [${u.weld}]`, `minimum fillet leg [${u.weld}]`, `largest fastener pitch [${u.weld}]`, 'needs');
    block([header, ...x.joints.map((j) => {
      const row: (string | number | null)[] = [j.name, j.parts[0], j.parts[1], j.length, j.kindText, j.isDefault ? 'true' : 'false'];
      const s = j.shear;
      if (x.shear) row.push(s?.q ?? null, s?.tauJoint ?? null, s?.tauIn[0] ?? null, s?.tauIn[1] ?? null, s?.fillet?.requiredLeg ?? null, s?.fillet?.minimum?.leg ?? null, s?.largestPitch ?? null, s?.needs ?? '');
      return row;
    })]);
  }
  if (x.shear) {
    block([[`shear Vy [${u.force}]`, `shear Vx [${u.force}]`, 'weld method', `FEXX [${u.stress}]`], [x.shear.Vy, x.shear.Vx, x.shear.method, x.shear.fexx]]);
    block([['part', `tau max [${u.stress}]`, 'where'], ...x.shear.parts.map((p) => [p.part, p.tauMax, p.where])]);
  }
  if (x.plies) block([['ply (parts)', 'share of vertical load (about x) [-]', 'share of horizontal load (about y) [-]', `EIx [${u.stiffness}]`, `EIy [${u.stiffness}]`], ...x.plies.plies.map((p) => [p.parts.join(' + '), p.shareX, p.shareY, p.EIx, p.EIy])]);
  const notes = [...x.warnings, ...(x.plies ? [x.plies.note] : []), ...(x.shear ? [x.shear.tauMethod] : []), ...x.notes];
  if (notes.length > 0) block([['note'], ...notes.map((n) => [n])]);
  return lines.length === 0 ? '' : `${lines.join('\r\n')}\r\n`;
}

/** The joints as report tables (core/report ReportTable): joints, τmax per part, EI shares, notes. */
export function jointsReportTables(x: JointsExport): { title: string; columns: string[]; rows: string[][]; textColumns: number[] }[] {
  const u = x.units;
  const f = (v: number | null | undefined): string => (v === null || v === undefined ? '—' : sig(v));
  const out: { title: string; columns: string[]; rows: string[][]; textColumns: number[] }[] = [];
  if (x.joints.length > 0) {
    const columns = ['joint', 'parts', `length (${x.unit})`, 'kind'];
    if (x.shear) columns.push(`q (${u.q})`, `τ on joint (${u.stress})`, `τ beside, A | B (${u.stress})`, 'needs');
    out.push({
      title: x.shear ? `Joints under Vy = ${sig(x.shear.Vy)} ${u.force}, Vx = ${sig(x.shear.Vx)} ${u.force} (welds ${x.shear.method}, FEXX ${sig(x.shear.fexx)} ${u.stress})` : 'Joints',
      columns,
      rows: x.joints.map((j) => {
        const row = [j.name, `${j.parts[0]} | ${j.parts[1]}`, f(j.length), `${j.kindText}${j.isDefault ? ' (default)' : ''}`];
        if (x.shear) row.push(f(j.shear?.q), f(j.shear?.tauJoint), `${f(j.shear?.tauIn[0])} | ${f(j.shear?.tauIn[1])}`, j.shear?.needs ?? '');
        return row;
      }),
      textColumns: x.shear ? [1, 3, 7] : [1, 3],
    });
  }
  if (x.shear) out.push({ title: 'Shear stress τ = V·Q/(I·t), largest in each part', columns: ['part', `τmax (${u.stress})`, 'where'], rows: x.shear.parts.map((p) => [p.part, f(p.tauMax), p.where]), textColumns: [2] });
  if (x.plies) out.push({ title: 'Separate plies: share of the load by EI', columns: ['ply (parts)', 'vertical load (about x)', 'horizontal load (about y)', `EIx (${u.stiffness})`], rows: x.plies.plies.map((p) => [p.parts.join(' + '), `${sig(p.shareX * 100)} %`, `${sig(p.shareY * 100)} %`, f(p.EIx)]), textColumns: [] });
  const notes = [...x.warnings, ...(x.plies ? [x.plies.note] : []), ...(x.shear ? [x.shear.tauMethod] : []), ...x.notes];
  if (notes.length > 0) out.push({ title: 'Pieces, overlaps and joints: notes', columns: ['note'], rows: notes.map((n) => [n]), textColumns: [0] });
  return out;
}
