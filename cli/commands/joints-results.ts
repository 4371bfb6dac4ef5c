/**
 * The joints part of `sectionsmith props`: separate pieces and overlaps (always, for documents),
 * every joint with its length, parts and kind, and with --shear (Vy) / --shear-x (Vx) the shear
 * flow each joint carries, the average shear stress there and what it asks of the weld or the
 * fasteners (core/joints). Forces are typed quantities (100kN, 22kip); q is printed in N/mm
 * (metric documents) or kip/in (inch and foot documents), legs and pitches in mm or in.
 * Capacities are the user's inputs (--fastener-capacity) or the cited clauses (AISC 360-22
 * §J2.4); the local code governs.
 */
import type { SectionDocument } from '../../core/document/types.ts';
import { FORCE_UNITS, STRESS_UNITS, forceToNewtons, parseQuantity, QuantityError, stressToPascals } from '../../core/materials/quantities.ts';
import { fastenerPitch, intermittentFillet, jointKindText, jointShearFlows, minimumFilletLeg, partsActingTogether, requiredFilletLeg, type DesignMethod } from '../../core/joints/index.ts';
import { convertLength, formatSig, type LengthUnit } from '../../core/units/index.ts';
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
    const q = parseQuantity(text, FORCE_UNITS, 'N', `--${name}`);
    return forceToNewtons(q.value, q.unit);
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

/** Joint rows and JSON for a document; errors name the flag. */
export function jointResults(doc: SectionDocument, flags: FlagValues, unit: LengthUnit): { json: Record<string, unknown>; rows: Rows; errors: string[] } {
  const errors: string[] = [];
  const Vy = force(flags, 'shear'), Vx = force(flags, 'shear-x'), R = force(flags, 'fastener-capacity');
  for (const v of [Vy, Vx, R]) if (typeof v === 'string') errors.push(v);
  const method = (flags.method ?? 'LRFD') as string;
  if (method !== 'LRFD' && method !== 'ASD') errors.push(`--method: expected LRFD or ASD, got ${JSON.stringify(method)}`);
  let fexx = stressToPascals(70, 'ksi');
  if (typeof flags.fexx === 'string') {
    try {
      const q = parseQuantity(flags.fexx, STRESS_UNITS, 'MPa', '--fexx');
      fexx = stressToPascals(q.value, q.unit);
      if (!(fexx > 0)) errors.push(`--fexx: expected a positive strength, got ${flags.fexx}`);
    } catch (err) {
      if (!(err instanceof QuantityError)) throw err;
      errors.push(err.message);
    }
  }
  if (errors.length > 0) return { json: {}, rows: [], errors };
  const acting = partsActingTogether(doc);
  const L = (v: number, p = 1): number => convertLength(v, doc.unit, unit, p);
  const g = (v: number): string => formatSig(v, 4);
  const json: Record<string, unknown> = {
    warnings: acting.warnings,
    pieces: acting.groups.length,
    joints: acting.joints.map((j) => ({ parts: j.labels, length: L(j.length), segments: j.segments.map((s) => ({ x0: L(s.x0), y0: L(s.y0), x1: L(s.x1), y1: L(s.y1), length: L(s.length) })), kind: j.kind, kindText: jointKindText(j.kind), isDefault: j.isDefault })),
  };
  const rows: Rows = acting.joints.map((j) => [`joint`, g(L(j.length)), unit, `${j.labels[0]} | ${j.labels[1]}: ${jointKindText(j.kind)}${j.isDefault ? ' (default)' : ''}`] as const);
  if (typeof Vy !== 'number' && typeof Vx !== 'number') return { json, rows, errors };
  const flows = jointShearFlows(doc, { Vy: typeof Vy === 'number' ? Vy : 0, Vx: typeof Vx === 'number' ? Vx : 0 });
  if (flows === null) return { json, rows, errors };
  const us = unit === 'in' || unit === 'ft';
  // q in N per document unit → N/m → N/mm or kip/in.
  const perMetre = (q: number): number => q / convertLength(1, doc.unit, 'm');
  const qShown = (q: number): number => (us ? perMetre(q) * 0.0254 / 4448.2216152605 : perMetre(q) / 1000);
  const lenShown = (m: number): number => (us ? m / 0.0254 : m * 1000);
  const qUnit = us ? 'kip/in' : 'N/mm', lenUnit = us ? 'in' : 'mm';
  json.shear = {
    Vy: typeof Vy === 'number' ? Vy : 0, Vx: typeof Vx === 'number' ? Vx : 0, forceUnit: 'N', qUnit, lengthUnit: lenUnit, method, FEXX_Pa: fexx, note: JOINTS_NOTE,
    joints: flows.flows.map((f) => {
      const qm = perMetre(f.q);
      const weld = f.joint.kind.type === 'welded' && f.joint.kind.weld !== 'groove';
      const lines = f.joint.kind.type === 'welded' && f.joint.kind.weld === 'fillet-one-side' ? 1 : 2;
      const leg = weld ? requiredFilletLeg(qm, fexx, lines, method as DesignMethod) : null;
      const out: Record<string, unknown> = { parts: f.joint.labels, kind: jointKindText(f.joint.kind), q: qShown(f.q), qVy: qShown(f.qVy), qVx: qShown(f.qVx), cutOff: f.cutOff, sharedBy: f.sharedBy, equalShare: f.equalShare, note: f.note };
      if (leg !== null) {
        out.filletLines = lines;
        out.requiredLeg = lenShown(leg);
        const t = thinner(doc, f.joint.partIds);
        const min = t === null ? 0 : minimumFilletLeg(convertLength(t, doc.unit, 'm'), us ? 'us' : 'metric');
        if (t !== null) out.minimumLeg = { thinnerPart: L(t), leg: lenShown(min), source: 'AISC 360-22 Table J2.4 (from memory)' };
        const inter = intermittentFillet(qm, Math.max(leg, min), fexx, lines, method as DesignMethod, us ? 'us' : 'metric');
        out.intermittent = { leg: lenShown(Math.max(leg, min)), segment: lenShown(inter.segment), pitch: lenShown(inter.pitch) };
      }
      if (f.joint.kind.type === 'fastened' && typeof R === 'number') out.largestPitch = lenShown(fastenerPitch(qm, f.joint.kind.rows, R));
      return out;
    }),
  };
  for (const j of (json.shear as { joints: Record<string, unknown>[] }).joints) {
    const leg = j.requiredLeg === undefined ? '' : `, fillet leg ≥ ${g(j.requiredLeg as number)} ${lenUnit} (${method}, ${j.filletLines as number} line${j.filletLines === 1 ? '' : 's'})`;
    const pitch = j.largestPitch === undefined ? '' : `, pitch ≤ ${g(j.largestPitch as number)} ${lenUnit}`;
    rows.push(['q', g(j.q as number), qUnit, `${(j.parts as string[]).join(' | ')}${leg}${pitch}${j.equalShare ? ' (equal share assumed)' : ''}`]);
  }
  return { json, rows, errors };
}
