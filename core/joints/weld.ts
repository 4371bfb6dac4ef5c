/**
 * What a joint's shear flow asks of its welds or fasteners. The capacities are the user's inputs
 * or the clauses cited here; the local code governs, and a licensed engineer checks the design.
 *
 * Fillet welds, AISC 360-22 §J2.4: Rn = Fnw·Awe with Fnw = 0.60·FEXX and, for an equal-leg
 * fillet, an effective throat of 0.707·w per unit length (Awe = 0.707·w·L). Per unit length of
 * joint with `lines` weld lines (2 for fillets on both sides):
 *   LRFD: φ·Rn/L = 0.75·0.60·FEXX·0.707·w·lines ≥ q  →  w = q / (0.75·0.60·0.707·FEXX·lines)
 *   ASD:  Rn/(Ω·L) = 0.60·FEXX·0.707·w·lines / 2.00 ≥ q  →  w = 2.00·q / (0.60·0.707·FEXX·lines)
 * with q the required shear flow of that method (factored loads for LRFD, service for ASD).
 * Minimum fillet size for the thinner part joined, AISC 360-22 Table J2.4 (from memory):
 *   t ≤ 6 mm (1/4 in) → 3 mm (1/8 in); ≤ 13 mm (1/2 in) → 5 mm (3/16 in); ≤ 19 mm (3/4 in) →
 *   6 mm (1/4 in); thicker → 8 mm (5/16 in).
 * Intermittent fillets (AISC 360-22 §J2.2b, from memory: a segment at least 4·w and 38 mm
 * (1 1/2 in) long): with leg w, segments of that length at pitch s carry q when
 *   s = segment · capacity per length of continuous weld / q.
 * Fasteners: the largest pitch along the joint with `rows` rows of fasteners of capacity R each
 * (the user's number, per fastener, for the method chosen): s = rows·R / q.
 *
 * Units: SI throughout (q in N/m, strengths in Pa, lengths in m, capacities in N).
 */
export type DesignMethod = 'LRFD' | 'ASD';

export const FILLET_PHI = 0.75;
export const FILLET_OMEGA = 2.0;
const THROAT = 0.707;

/** Capacity per metre of one fillet line of leg w (m): φ·0.60·FEXX·0.707·w (LRFD) or 0.60·FEXX·0.707·w/Ω (ASD). */
export function filletCapacityPerLength(leg: number, fexx: number, method: DesignMethod): number {
  const nominal = 0.6 * fexx * THROAT * leg;
  return method === 'LRFD' ? FILLET_PHI * nominal : nominal / FILLET_OMEGA;
}

/** Required equal-leg fillet size (m) for shear flow q (N/m) on `lines` weld lines. */
export function requiredFilletLeg(q: number, fexx: number, lines: number, method: DesignMethod): number {
  return Math.abs(q) / (lines * filletCapacityPerLength(1, fexx, method));
}

/** AISC 360-22 Table J2.4 minimum fillet leg (m) for the thinner part joined, thickness t (m); metric or US sizes. */
export function minimumFilletLeg(t: number, system: 'metric' | 'us'): number {
  const inch = 0.0254;
  if (system === 'us') {
    if (t <= inch / 4) return inch / 8;
    if (t <= inch / 2) return (3 * inch) / 16;
    if (t <= (3 * inch) / 4) return inch / 4;
    return (5 * inch) / 16;
  }
  if (t <= 0.006) return 0.003;
  if (t <= 0.013) return 0.005;
  if (t <= 0.019) return 0.006;
  return 0.008;
}

/** Intermittent fillets of leg w on `lines` lines: shortest segment (4w, at least 38 mm or 1.5 in) and the largest pitch carrying q. */
export function intermittentFillet(q: number, leg: number, fexx: number, lines: number, method: DesignMethod, system: 'metric' | 'us'): { segment: number; pitch: number } {
  const segment = Math.max(4 * leg, system === 'us' ? 1.5 * 0.0254 : 0.038);
  const capacity = lines * filletCapacityPerLength(leg, fexx, method);
  return { segment, pitch: Math.abs(q) > 0 ? (segment * capacity) / Math.abs(q) : Infinity };
}

/** Largest fastener pitch (m) for q (N/m) with `rows` rows of fasteners of capacity R (N) each. */
export function fastenerPitch(q: number, rows: number, capacity: number): number {
  return Math.abs(q) > 0 ? (rows * capacity) / Math.abs(q) : Infinity;
}
