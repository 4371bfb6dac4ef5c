/**
 * The member and stress inputs of a section (types.ts: MemberInputs, StressInputs): their
 * defaults and the values a view carries.
 *
 * Units: SI, always (m, N, N/m, N·m, Pa); never the digits shown in some unit. A section without
 * a member case gets the defaults of its document unit — a 6 m span in a metric document, a 20 ft
 * span in an inch or foot one (round numbers in each system), no load, no self-weight, the
 * deflection limits L/240 under total load and L/360 under live load of IBC Table 1604.3 for
 * floor members (common practice), and the stress limit factor 1 (the strength itself). A
 * section without stress forces has them all zero. Converting the document unit writes the
 * defaults of the old unit into the sections first (`withInputsKept`), so they keep their
 * physical value like every typed one.
 */
import type { LengthUnit } from '../units/types.ts';
import type { MemberInputs, SectionDocument, StressInputs } from './types.ts';

/** IBC Table 1604.3, floor members: L/240 total, L/360 live (common practice, from memory). */
export const DEFAULT_TOTAL_LIMIT = 240;
export const DEFAULT_LIVE_LIMIT = 360;

/** 6 m, or 20 ft = 6.096 m exactly (1 ft = 0.3048 m). */
const DEFAULT_SPAN_M: Readonly<Record<LengthUnit, number>> = { mm: 6, cm: 6, m: 6, in: 6.096, ft: 6.096 };

export function defaultMemberInputs(unit: LengthUnit): MemberInputs {
  return {
    span: DEFAULT_SPAN_M[unit], support: 'simple',
    dead: { uniform: 0, points: [] }, live: { uniform: 0, points: [] }, selfWeight: false,
    totalLimit: DEFAULT_TOTAL_LIMIT, liveLimit: DEFAULT_LIVE_LIMIT, stressFactor: 1,
  };
}

export const ZERO_STRESS_INPUTS: StressInputs = { N: 0, Mx: 0, My: 0, Vx: 0, Vy: 0 };

/** The section's member case, or the defaults of its unit. */
export const memberInputsOf = (doc: SectionDocument): MemberInputs => doc.member ?? defaultMemberInputs(doc.unit);

/** The section's stress forces, or zero. */
export const stressInputsOf = (doc: SectionDocument): StressInputs => doc.stress ?? ZERO_STRESS_INPUTS;

/** The view with its default member case written in (before the document unit changes). */
export function withInputsKept(doc: SectionDocument): SectionDocument {
  return doc.member !== undefined ? doc : { ...doc, member: defaultMemberInputs(doc.unit) };
}

/** Whether a load set carries any load. */
export const anyLoad = (m: MemberInputs): boolean =>
  m.dead.uniform !== 0 || m.live.uniform !== 0 || m.dead.points.some((p) => p.P !== 0) || m.live.points.some((p) => p.P !== 0);
