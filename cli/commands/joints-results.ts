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
import { fastenerPitch, intermittentFillet, jointKindText, jointShearFlows, minimumFilletLeg, partsActingTogether, plyShares, requiredFilletLeg, SEPARATE_PIECES_NOTE, shearStresses, SHEAR_CUTS_METHOD, type DesignMethod, type SeparateTorsion } from '../../core/joints/index.ts';
import { convertLength, convertQuantity, formatSig, isImperial, parseQuantityOrThrow, QuantityError, unitSystem, type LengthUnit } from '../../core/units/index.ts';
import type { FlagSpec, FlagValues } from '../command.ts';

export const JOINT_FLAGS: readonly FlagSpec[] = [
  { name: 'shear', type: 'string', value: 'V', description: 'vertical shear Vy, e.g. 100kN or 22kip (default unit N): adds the shear flow q = V·Q/I of every joint, the stress at it and the weld or fastener it needs' },
  { name: 'shear-x', type: 'string', value: 'V', description: 'horizontal shear Vx, as --shear' },
  { name: 'fexx', type: 'string', value: 'S', description: 'with --shear: electrode strength FEXX for fillet welds, e.g. 70ksi or 490MPa (default 70ksi, E70)' },
  { name: 'method', type: 'string', value: 'LRFD|ASD', description: 'with --shear: weld strength by LRFD (φ = 0.75) or ASD (Ω = 2.00), AISC 360-22 §J2.4 (default LRFD; V is then the factored shear)' },
  { name: 'fastener-capacity', type: 'string', value: 'R', description: 'with --shear: design capacity of one fastener in shear (your number for your code), e.g. 20kN: gives the largest pitch of fastened joints' },
];

export const JOINTS_NOTE = 'Weld and fastener numbers: capacities are your inputs or the cited clauses (AISC 360-22 §J2.4, Table J2.4); the local code governs.';

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

/** The output units of the joints results, all from core/units for the output length unit. */
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

/** Converters from core/joints' numbers (N, N per document unit, N per unit², Pa·unit⁴, m) to the output units. */
export function jointConverters(docUnit: LengthUnit, u: JointUnits): { force: (n: number) => number; q: (perUnit: number) => number; stress: (perUnit2: number) => number; stiffness: (paUnit4: number) => number; weld: (m: number) => number; length: (v: number, power?: number) => number } {
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

/** Joint rows and JSON for a document; errors name the flag. */
export function jointResults(doc: SectionDocument, flags: FlagValues, unit: LengthUnit): { json: Record<string, unknown>; units: Record<string, string>; rows: Rows; errors: string[] } {
  const errors: string[] = [];
  const Vy = force(flags, 'shear'), Vx = force(flags, 'shear-x'), R = force(flags, 'fastener-capacity');
  for (const v of [Vy, Vx, R]) if (typeof v === 'string') errors.push(v);
  const method = (flags.method ?? 'LRFD') as string;
  if (method !== 'LRFD' && method !== 'ASD') errors.push(`--method: expected LRFD or ASD, got ${JSON.stringify(method)}`);
  let fexx = convertQuantity(70, 'stress', 'ksi', 'Pa');
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
  const acting = partsActingTogether(doc);
  const u = jointUnits(unit);
  const c = jointConverters(doc.unit, u);
  const L = c.length;
  const g = (v: number): string => formatSig(v, 4);
  const json: Record<string, unknown> = {
    warnings: acting.warnings,
    pieces: acting.groups.length,
    joints: acting.joints.map((j) => ({ parts: j.labels, length: L(j.length), segments: j.segments.map((s) => ({ x0: L(s.x0), y0: L(s.y0), x1: L(s.x1), y1: L(s.y1), length: L(s.length) })), kind: j.kind, kindText: jointKindText(j.kind), isDefault: j.isDefault })),
  };
  const units: Record<string, string> = { warnings: '-', pieces: '-', 'joints[].length': unit, 'joints[].segments[]': unit };
  const rows: Rows = acting.joints.map((j) => [`joint`, g(L(j.length)), unit, `${j.labels[0]} | ${j.labels[1]}: ${jointKindText(j.kind)}${j.isDefault ? ' (default)' : ''}`] as const);
  const plies = plyShares(doc);
  if (plies !== null && plies.separate) {
    json.plies = {
      note: plies.note,
      plies: plies.plies.map((p) => ({ parts: p.labels, Ix: L(p.Ix, 4), Iy: L(p.Iy, 4), EIx: p.EIx === null ? null : c.stiffness(p.EIx), EIy: p.EIy === null ? null : c.stiffness(p.EIy), shareX: p.shareX, shareY: p.shareY })),
    };
    Object.assign(units, { 'plies.plies[].Ix': `${unit}⁴`, 'plies.plies[].Iy': `${unit}⁴`, 'plies.plies[].EIx': u.stiffness, 'plies.plies[].EIy': u.stiffness, 'plies.plies[].shareX': '- (fraction of a moment about x, vertical load)', 'plies.plies[].shareY': '- (fraction of a moment about y, horizontal load)' });
    for (const p of plies.plies) rows.push(['EI share', formatSig(p.shareX * 100, 4), '%', `${p.labels.join(' + ')}: share of a vertical load (about x) by EI; ${formatSig(p.shareY * 100, 4)} % of a horizontal load (about y)`]);
  }
  if (typeof Vy !== 'number' && typeof Vx !== 'number') return { json, units, rows, errors };
  const loads = { Vy: typeof Vy === 'number' ? Vy : 0, Vx: typeof Vx === 'number' ? Vx : 0 };
  const flows = jointShearFlows(doc, loads);
  const stresses = shearStresses(doc, loads);
  if (flows === null || stresses === null) return { json, units, rows, errors };
  const us = isImperial(unit);
  const tauIn = new Map(stresses.joints.map((j) => [`${j.joint.a}:${j.joint.b}`, j]));
  json.shear = {
    Vy: c.force(loads.Vy), Vx: c.force(loads.Vx), forceUnit: u.force, qUnit: u.q, lengthUnit: u.weld, stressUnit: u.stress, method, FEXX: convertQuantity(fexx, 'stress', 'Pa', u.stress), note: JOINTS_NOTE,
    joints: flows.flows.map((f) => {
      const qm = convertQuantity(c.q(f.q), 'lineLoad', u.q, 'N/m');
      const weld = f.joint.kind.type === 'welded' && f.joint.kind.weld !== 'groove';
      const lines = f.joint.kind.type === 'welded' && f.joint.kind.weld === 'fillet-one-side' ? 1 : 2;
      const leg = weld ? requiredFilletLeg(qm, fexx, lines, method as DesignMethod) : null;
      const s = tauIn.get(`${f.joint.a}:${f.joint.b}`);
      const out: Record<string, unknown> = {
        parts: f.joint.labels, kind: jointKindText(f.joint.kind), q: c.q(f.q), qVy: c.q(f.qVy), qVx: c.q(f.qVx), cutOff: f.cutOff, sharedBy: f.sharedBy, equalShare: f.equalShare, note: f.note,
        tauJoint: c.stress(f.tau),
        tauIn: Object.fromEntries(f.joint.labels.map((label, i) => [label, s?.tauIn[i] == null ? null : c.stress(s.tauIn[i] as number)])),
      };
      if (leg !== null) {
        out.filletLines = lines;
        out.requiredLeg = c.weld(leg);
        const t = thinner(doc, f.joint.partIds);
        const min = t === null ? 0 : minimumFilletLeg(convertLength(t, doc.unit, 'm'), us ? 'us' : 'metric');
        if (t !== null) out.minimumLeg = { thinnerPart: L(t), leg: c.weld(min), source: 'AISC 360-22 Table J2.4 (from memory)' };
        const inter = intermittentFillet(qm, Math.max(leg, min), fexx, lines, method as DesignMethod, us ? 'us' : 'metric');
        out.intermittent = { leg: c.weld(Math.max(leg, min)), segment: c.weld(inter.segment), pitch: c.weld(inter.pitch) };
      }
      if (f.joint.kind.type === 'fastened' && typeof R === 'number') out.largestPitch = c.weld(fastenerPitch(qm, f.joint.kind.rows, R));
      return out;
    }),
    parts: stresses.parts.map((p) => ({
      part: p.label, tauMax: c.stress(p.tauMax),
      cut: p.cut === null ? null : { orientation: p.cut.orientation, at: L(p.cut.at), crossed: p.cut.crossed, width: L(p.cut.width), cutOff: p.cut.cutOff, how: p.cut.how, note: p.cut.note, q: c.q(p.cut.q) },
    })),
    tauMethod: SHEAR_CUTS_METHOD,
  };
  Object.assign(units, {
    'shear.Vy': u.force, 'shear.Vx': u.force, 'shear.FEXX': u.stress,
    'shear.joints[].q': u.q, 'shear.joints[].qVy': u.q, 'shear.joints[].qVx': u.q, 'shear.joints[].tauJoint': u.stress, 'shear.joints[].tauIn': u.stress,
    'shear.joints[].requiredLeg': u.weld, 'shear.joints[].minimumLeg.leg': u.weld, 'shear.joints[].minimumLeg.thinnerPart': unit, 'shear.joints[].intermittent': u.weld, 'shear.joints[].largestPitch': u.weld,
    'shear.parts[].tauMax': u.stress, 'shear.parts[].cut.at': unit, 'shear.parts[].cut.width': unit, 'shear.parts[].cut.q': u.q,
  });
  const lenUnit = u.weld;
  for (const j of (json.shear as { joints: Record<string, unknown>[] }).joints) {
    const leg = j.requiredLeg === undefined ? '' : `, fillet leg ≥ ${g(j.requiredLeg as number)} ${lenUnit} (${method}, ${j.filletLines as number} line${j.filletLines === 1 ? '' : 's'})`;
    const pitch = j.largestPitch === undefined ? '' : `, pitch ≤ ${g(j.largestPitch as number)} ${lenUnit}`;
    rows.push(['q', g(j.q as number), u.q, `${(j.parts as string[]).join(' | ')}${leg}${pitch}${j.equalShare ? ' (equal share assumed)' : ''}`]);
    const beside = Object.entries(j.tauIn as Record<string, number | null>).map(([k, v]) => `${k} ${v === null ? '—' : g(v)}`).join(', ');
    rows.push(['τ joint', g(j.tauJoint as number), u.stress, `${(j.parts as string[]).join(' | ')}: on the joint plane (|q| / contact length); beside it: ${beside} ${u.stress}`]);
  }
  for (const p of stresses.parts) {
    const where = p.cut === null ? 'not cut' : `${p.cut.orientation} cut at ${p.cut.orientation === 'horizontal' ? 'y' : 'x'} = ${g(L(p.cut.at))} ${unit} through ${p.cut.crossed.join(' + ')} (width ${g(L(p.cut.width))} ${unit}${p.cut.how === 'whole line' ? ', whole line: flow shared by width' : ''})`;
    rows.push(['τmax', g(c.stress(p.tauMax)), u.stress, `${p.label}: ${where}`]);
  }
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
