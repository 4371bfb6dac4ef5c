/**
 * The joints part of `sectionsmith props`: separate pieces and overlaps (always, for documents),
 * every joint with its length, parts and kind, the load share by EI of separate plies, and with
 * --shear (Vy) / --shear-x (Vx) the shear flow each joint carries, the stress on the joint and in
 * the parts beside it, τmax in each part, and what the joint asks of the weld or the fasteners
 * (core/joints). Forces are typed quantities (100kN, 22kip) read by core/units readQuantity.
 * Output units come from core/units for the output length unit: q in N/mm (mm, cm, m) or kip/in
 * (in, ft); legs and pitches in mm or in; τ in the unit system's stress unit (MPa or ksi); V in
 * its force unit (kN or kip); EI in its flexural stiffness unit. Capacities are the user's inputs
 * (--fastener-capacity) or the cited clauses (AISC 360-22 §J2.4); the local code governs.
 */
import type { SectionDocument } from '../../core/document/types.ts';
import type { Region } from '../../core/geometry/types.ts';
import { partsActingTogether, SEPARATE_PIECES_NOTE, type DesignMethod, type SeparateTorsion } from '../../core/joints/index.ts';
import { JOINTS_NOTE, jointsExport } from '../../core/export/joints.ts';
import { convertLength, formatSig, parseQuantityOrThrow, QuantityError, type LengthUnit } from '../../core/units/index.ts';
import type { FlagSpec, FlagValues } from '../command.ts';
import type { LoadedSection } from '../load.ts';

export const JOINT_FLAGS: readonly FlagSpec[] = [
  { name: 'shear', type: 'string', value: 'V', description: 'vertical shear Vy, e.g. 100kN or 22kip (default unit N): adds the shear flow q = V·Q/I of every joint, the stress at it and the weld or fastener it needs' },
  { name: 'shear-x', type: 'string', value: 'V', description: 'horizontal shear Vx, as --shear' },
  { name: 'fexx', type: 'string', value: 'S', description: 'with --shear: electrode strength FEXX for fillet welds, e.g. 70ksi or 490MPa (default 70ksi, E70)' },
  { name: 'method', type: 'string', value: 'LRFD|ASD', description: 'with --shear: weld strength by LRFD (φ = 0.75) or ASD (Ω = 2.00), AISC 360-22 §J2.4 (default LRFD; V is then the factored shear)' },
  { name: 'fastener-capacity', type: 'string', value: 'R', description: 'with --shear: design capacity of one fastener in shear (your number for your code), e.g. 20kN: gives the largest pitch of fastened joints' },
];

export { JOINTS_NOTE };

type Rows = (readonly [string, string, string, string])[];

function force(flags: FlagValues, name: string): number | string | undefined {
  const text = flags[name];
  if (text === undefined) return undefined;
  if (typeof text !== 'string') return `--${name}: expected a force such as 100kN`;
  try {
    return parseQuantityOrThrow(text, { label: `--${name}`, kind: 'force', unit: 'N' });
  } catch (err) {
    if (err instanceof QuantityError) return err.message;
    throw err;
  }
}

/** Joint rows and JSON for a document (core/export/joints.ts jointsExport); errors name the flag. */
export function jointResults(doc: SectionDocument, flags: FlagValues, unit: LengthUnit): { json: Record<string, unknown>; units: Record<string, string>; rows: Rows; errors: string[] } {
  const errors: string[] = [];
  const Vy = force(flags, 'shear'), Vx = force(flags, 'shear-x'), R = force(flags, 'fastener-capacity');
  for (const v of [Vy, Vx, R]) if (typeof v === 'string') errors.push(v);
  const method = (flags.method ?? 'LRFD') as string;
  if (method !== 'LRFD' && method !== 'ASD') errors.push(`--method: expected LRFD or ASD, got ${JSON.stringify(method)}`);
  let fexx: number | undefined;
  if (typeof flags.fexx === 'string') {
    try {
      fexx = parseQuantityOrThrow(flags.fexx, { label: '--fexx', kind: 'stress', unit: 'MPa' });
      if (!(fexx > 0)) errors.push(`--fexx: expected a positive strength, got ${flags.fexx}`);
    } catch (err) {
      if (!(err instanceof QuantityError)) throw err;
      errors.push(err.message);
    }
  }
  if (errors.length > 0) return { json: {}, units: {}, rows: [], errors };
  const loaded = typeof Vy === 'number' || typeof Vx === 'number';
  const x = jointsExport({
    doc, unit, loads: loaded ? { Vy: typeof Vy === 'number' ? Vy : 0, Vx: typeof Vx === 'number' ? Vx : 0 } : null,
    design: { method: method as DesignMethod, ...(fexx !== undefined ? { fexx } : {}), ...(typeof R === 'number' ? { fastenerCapacity: R } : {}) },
  });
  if (x === null) return { json: {}, units: {}, rows: [], errors };
  const u = x.units;
  const L = (v: number): number => convertLength(v, doc.unit, unit);
  const g = (v: number): string => formatSig(v, 4);
  const json: Record<string, unknown> = {
    warnings: x.warnings,
    pieces: x.pieces,
    joints: x.joints.map((j) => ({ name: j.name, parts: j.parts, length: j.length, segments: j.segments.map((s) => ({ x0: L(s.x0), y0: L(s.y0), x1: L(s.x1), y1: L(s.y1), length: L(s.length) })), kind: j.kind, kindText: j.kindText, isDefault: j.isDefault })),
  };
  const units: Record<string, string> = { warnings: '-', pieces: '-', 'joints[].length': unit, 'joints[].segments[]': unit };
  const rows: Rows = x.joints.map((j) => [`joint ${j.name}`, g(j.length), unit, `${j.parts[0]} | ${j.parts[1]}: ${j.kindText}${j.isDefault ? ' (default)' : ''}`] as const);
  if (x.plies !== null) {
    json.plies = x.plies;
    Object.assign(units, { 'plies.plies[].Ix': `${unit}⁴`, 'plies.plies[].Iy': `${unit}⁴`, 'plies.plies[].EIx': u.stiffness, 'plies.plies[].EIy': u.stiffness, 'plies.plies[].shareX': '- (fraction of a moment about x, vertical load)', 'plies.plies[].shareY': '- (fraction of a moment about y, horizontal load)' });
    for (const p of x.plies.plies) rows.push(['EI share', formatSig(p.shareX * 100, 4), '%', `${p.parts.join(' + ')}: share of a vertical load (about x) by EI; ${formatSig(p.shareY * 100, 4)} % of a horizontal load (about y)`]);
  }
  if (x.shear === null) return { json, units, rows, errors };
  json.shear = {
    Vy: x.shear.Vy, Vx: x.shear.Vx, forceUnit: u.force, qUnit: u.q, lengthUnit: u.weld, stressUnit: u.stress, method: x.shear.method, FEXX: x.shear.fexx, note: JOINTS_NOTE,
    joints: x.joints.map((j) => {
      const s = j.shear;
      if (s === null) return { parts: j.parts, kind: j.kindText };
      return {
        name: j.name, parts: j.parts, kind: j.kindText, q: s.q, qVy: s.qVy, qVx: s.qVx, cutOff: s.cutOff, sharedBy: s.sharedBy, equalShare: s.equalShare, note: s.note,
        tauJoint: s.tauJoint, tauIn: Object.fromEntries(j.parts.map((label, i) => [label, s.tauIn[i] ?? null])), needs: s.needs,
        ...(s.fillet ? { filletLines: s.fillet.lines, requiredLeg: s.fillet.requiredLeg, ...(s.fillet.minimum ? { minimumLeg: s.fillet.minimum } : {}), intermittent: s.fillet.intermittent } : {}),
        ...(s.largestPitch !== undefined ? { largestPitch: s.largestPitch } : {}),
      };
    }),
    parts: x.shear.parts.map((p) => ({ part: p.part, tauMax: p.tauMax, where: p.where, cut: p.cut })),
    tauMethod: x.shear.tauMethod,
  };
  Object.assign(units, {
    'shear.Vy': u.force, 'shear.Vx': u.force, 'shear.FEXX': u.stress,
    'shear.joints[].q': u.q, 'shear.joints[].qVy': u.q, 'shear.joints[].qVx': u.q, 'shear.joints[].tauJoint': u.stress, 'shear.joints[].tauIn': u.stress,
    'shear.joints[].requiredLeg': u.weld, 'shear.joints[].minimumLeg.leg': u.weld, 'shear.joints[].minimumLeg.thinnerPart': unit, 'shear.joints[].intermittent': u.weld, 'shear.joints[].largestPitch': u.weld,
    'shear.parts[].tauMax': u.stress, 'shear.parts[].cut.at': unit, 'shear.parts[].cut.width': unit, 'shear.parts[].cut.q': u.q,
  });
  for (const j of x.joints) {
    const s = j.shear;
    if (s === null) continue;
    rows.push(['q', g(s.q), u.q, `${j.name} ${j.parts.join(' | ')}: ${s.needs}${s.equalShare ? ' (equal share assumed)' : ''}`]);
    const beside = j.parts.map((label, i) => `${label} ${s.tauIn[i] == null ? '—' : g(s.tauIn[i] as number)}`).join(', ');
    rows.push(['τ joint', g(s.tauJoint), u.stress, `${j.name} ${j.parts.join(' | ')}: on the joint plane (|q| / contact length); beside it: ${beside} ${u.stress}`]);
  }
  for (const p of x.shear.parts) rows.push(['τmax', g(p.tauMax), u.stress, `${p.part}: ${p.where}`]);
  return { json, units, rows, errors };
}

/** GeoJSON and DXF input (no parts, no joints): the pieces of the region, said when there are several. */
export function regionPiecesResults(region: Region): { json: Record<string, unknown>; units: Record<string, string>; rows: Rows; errors: string[] } {
  const n = region.length;
  const warnings = n > 1 ? [`The material falls into ${n} separate pieces (polygons that do not touch): ${separatePiecesText}`] : [];
  return { json: { pieces: n, warnings }, units: { pieces: '-', warnings: '-' }, rows: [], errors: [] };
}

const separatePiecesText = `torsion is the sum of the pieces, each twisting about its own shear centre, with no shared shear centre or Cw. ${SEPARATE_PIECES_NOTE}`;

/** --torsion by joint groups: the J of each piece that twists on its own, beside the sum. */
export function withTorsionPieces<T extends { json: Record<string, unknown>; units?: Record<string, string>; rows: readonly (readonly [string, string, string, string])[]; errors: readonly string[] }>(out: T, grouped: SeparateTorsion | null, from: LengthUnit, unit: LengthUnit): T {
  if (grouped === null) return out;
  const J = (v: number): number => convertLength(v, from, unit, 4);
  return {
    ...out,
    json: { ...out.json, torsionPieces: grouped.groups.map((g) => ({ parts: g.labels, J: J(g.result.J) })), torsionNote: grouped.why },
    units: { ...out.units, 'torsionPieces[].J': `${unit}⁴` },
    rows: [...out.rows, ...grouped.groups.map((g) => ['J piece', formatSig(J(g.result.J), 6, { grouping: ',' }), `${unit}⁴`, `${g.labels.join(' + ')}: twists on its own`] as const), ['torsion', '', '', grouped.why] as const],
  };
}

/** What every result of a section says about its material: separate pieces and overlapping parts (not the default-joint notes). */
export function sectionWarnings(section: LoadedSection): string[] {
  if (section.doc === undefined) return regionPiecesResults(section.region).json.warnings as string[];
  const acting = partsActingTogether(section.doc);
  const pieces = acting.warnings.filter((w) => w.startsWith('The material falls into'));
  return [...pieces, ...acting.warnings.filter((w) => w.startsWith('Parts "'))];
}
