/**
 * A section's stored member case (core/document: MemberInputs, in SI) as the input of the
 * member check (./section-member.ts), which takes the span and load positions in the document
 * unit. A point load without a position sits at mid-span (a cantilever's at the free end).
 * The total load is the other (dead) load plus the live load: ./check.ts adds them, and judges
 * the total against span/totalLimit and the live load alone against span/liveLimit.
 * Lengths are converted only through core/units.
 */
import type { MemberInputs, PointLoadInput } from '../document/types.ts';
import { convertLength, type LengthUnit } from '../units/index.ts';
import type { SectionMemberInput } from './section-member.ts';

export function memberCaseInput(unit: LengthUnit, m: MemberInputs): SectionMemberInput {
  const L = (metres: number): number => convertLength(metres, 'm', unit);
  const span = L(m.span);
  const at = (p: PointLoadInput): { P: number; a: number } => ({ P: p.P, a: p.a !== undefined ? L(p.a) : m.support === 'cantilever' ? span : span / 2 });
  const allowable = new Map<string, number>();
  const shearAllowable = new Map<string, number>();
  for (const a of m.allowables ?? []) {
    if (a.bending !== undefined) allowable.set(a.material, a.bending);
    if (a.shear !== undefined) shearAllowable.set(a.material, a.shear);
  }
  return {
    span, support: m.support, points: m.dead.points.filter((p) => p.P !== 0).map(at), uniform: m.dead.uniform, selfWeight: m.selfWeight,
    limitRatio: m.totalLimit, liveLimitRatio: m.liveLimit,
    live: { uniform: m.live.uniform, points: m.live.points.filter((p) => p.P !== 0).map(at) },
    // Factor 1 is the default: left out, so the verdict says "(default factor)".
    stressLimits: { ...(m.stressFactor !== 1 ? { factor: m.stressFactor } : {}), allowable, shearAllowable },
  };
}
