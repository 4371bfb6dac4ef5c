/**
 * The stress view's numbers: the section's stored forces (SI, core/document: StressInputs), the
 * strain plane from core/stress, extremes with their points, the neutral axis, the kern, and the
 * colour scale of the map. The input boxes read through core/units (../shell/quantity-text.ts)
 * in the document's unit system: kN, kN·m, MPa for mm/cm/m documents; kip, kip·ft, ksi for in/ft.
 *
 * Stiffness: with materials, the E-weighted section of core/materials (E in Pa, lengths in the
 * document unit); without, the geometric section with E = 1 Pa, so stresses do not depend on E.
 * Forces go to Pa·unit² (N) and Pa·unit³ (moments) so every stress comes out in Pa.
 * Sign convention (docs/methods.md §9.1): N > 0 tension; Mx > 0 tension at +Y; My > 0 tension at +X.
 */
import { stressInputsOf } from '../../../core/document/inputs.ts';
import type { SectionDocument, StressInputs } from '../../../core/document/types.ts';
import type { Point, Region } from '../../../core/geometry/types.ts';
import { compositeProperties, materialPiecesFromDocument } from '../../../core/materials/index.ts';
import type { SectionProperties } from '../../../core/properties/types.ts';
import { regionFromDocument } from '../../../core/section/index.ts';
import { averageShear, kern, neutralAxis, strainPlane, stressExtremes, type NeutralAxis, type SectionStiffness, type StrainPlane } from '../../../core/stress/index.ts';
import { convertLength, formatSig, fromSI, unitSystem } from '../../../core/units/index.ts';
import type { InputField } from '../shell/quantity-text.ts';

/** Units shown and assumed for bare numbers: the document's unit system (core/units/systems.ts). */
export function stressUnits(doc: SectionDocument): { force: string; moment: string; stress: string } {
  const u = unitSystem(doc.unit).units;
  return { force: u.force, moment: u.moment, stress: u.stress };
}

export type StressKey = keyof StressInputs;
export const STRESS_KEYS: readonly StressKey[] = ['N', 'Mx', 'My', 'Vx', 'Vy'];

/** The input box of each force: its name in messages, kind and unit. */
export function stressFields(doc: SectionDocument): Readonly<Record<StressKey, InputField>> {
  const u = stressUnits(doc);
  return {
    N: { label: 'N', kind: 'force', unit: u.force },
    Mx: { label: 'Mx', kind: 'moment', unit: u.moment },
    My: { label: 'My', kind: 'moment', unit: u.moment },
    Vx: { label: 'Vx', kind: 'force', unit: u.force },
    Vy: { label: 'Vy', kind: 'force', unit: u.force },
  };
}

export interface StressPiece {
  readonly region: Region;
  readonly E: number;
  readonly label: string;
}

export interface StressView {
  readonly plane: StrainPlane;
  readonly pieces: readonly StressPiece[];
  /** Largest and smallest stress over the section (Pa) and where. */
  readonly max: number;
  readonly maxAt: Point;
  readonly min: number;
  readonly minAt: Point;
  /** Largest |σ| (Pa), the half-range of the colour scale. */
  readonly scale: number;
  readonly axis: NeutralAxis;
  readonly kern: readonly Point[];
  readonly tauX: number;
  readonly tauY: number;
  readonly withMaterials: boolean;
  /** Per piece (one per part with a material): its own largest and smallest stress (Pa). */
  readonly perPiece: readonly { readonly label: string; readonly max: number; readonly min: number }[];
  /** The stress unit of the panel and legend. */
  readonly unit: string;
  /** The extremes as shown on the canvas, e.g. "104.0 MPa". */
  readonly labels: { readonly max: string; readonly min: string };
}

export type StressOutcome = { readonly ok: true; readonly view: StressView } | { readonly ok: false; readonly message: string };

/** The stresses under `forces` (default: the section's stored ones). */
export function computeStress(doc: SectionDocument, properties: SectionProperties | null, forces: StressInputs = stressInputsOf(doc)): StressOutcome {
  try {
    return stressOf(doc, properties, forces);
  } catch (err) {
    // A failed invariant in core is a bug or a degenerate section; say which rather than show nothing.
    return { ok: false, message: `The stresses could not be computed: ${err instanceof Error ? err.message : String(err)}` };
  }
}

function stressOf(doc: SectionDocument, properties: SectionProperties | null, forces: StressInputs): StressOutcome {
  if (!properties) return { ok: false, message: 'The section needs valid geometry first.' };
  const u = stressUnits(doc);
  const { N, Mx, My, Vx, Vy } = forces;
  let stiffness: SectionStiffness;
  let pieces: StressPiece[];
  let withMaterials = false;
  const anyMaterial = doc.defaultMaterial !== null || doc.parts.some((p) => p.material !== undefined && p.material !== null);
  if (anyMaterial) {
    const mp = materialPiecesFromDocument(doc);
    if (mp.issues.length > 0 || mp.diagnostics.length > 0 || mp.pieces.length === 0) {
      return { ok: false, message: `Materials: ${[...mp.issues, ...mp.diagnostics.map((d) => d.message)].join('; ') || 'no piece with a material'}` };
    }
    stiffness = compositeProperties(mp.pieces, doc.unit).stiffness;
    pieces = mp.pieces.map((p) => ({ region: p.region, E: p.material.E, label: p.label ?? p.material.id }));
    withMaterials = true;
  } else {
    const p = properties;
    stiffness = { EA: p.area, cx: p.cx, cy: p.cy, EIx: p.Ix, EIy: p.Iy, EIxy: p.Ixy };
    pieces = [{ region: regionFromDocument(doc).region, E: 1, label: 'section' }];
  }
  // N in Pa·unit², M in Pa·unit³: then E·ε is in Pa.
  const m2 = convertLength(1, doc.unit, 'm', 2), m3 = convertLength(1, doc.unit, 'm', 3);
  const plane = strainPlane(stiffness, { N: N / m2, Mx: Mx / m3, My: My / m3 });
  let best: { max: number; maxAt: Point; min: number; minAt: Point } | null = null;
  const perPiece: { label: string; max: number; min: number }[] = [];
  for (const piece of pieces) {
    const e = stressExtremes(plane, piece.E, piece.region);
    perPiece.push({ label: piece.label, max: e.max, min: e.min });
    if (!best) best = { ...e };
    else {
      if (e.max > best.max) Object.assign(best, { max: e.max, maxAt: e.maxAt });
      if (e.min < best.min) Object.assign(best, { min: e.min, minAt: e.minAt });
    }
  }
  if (!best) return { ok: false, message: 'The section has no material to carry stress.' };
  const box = { minX: properties.xMin, minY: properties.yMin, maxX: properties.xMax, maxY: properties.yMax };
  const pad = 0.15 * Math.max(box.maxX - box.minX, box.maxY - box.minY);
  const axis = neutralAxis(plane, { minX: box.minX - pad, minY: box.minY - pad, maxX: box.maxX + pad, maxY: box.maxY + pad });
  const k = kern(pieces.flatMap((p) => p.region), stiffness);
  // Average shear V/A over the whole (geometric) area, a nominal value.
  const shear = averageShear({ N, Mx, My, Vx, Vy }, properties.area * m2);
  return {
    ok: true,
    view: { plane, pieces, perPiece, unit: u.stress, ...best, labels: { max: `${formatSig(toStressUnit(best.max, u.stress), 4)} ${u.stress}`, min: `${formatSig(toStressUnit(best.min, u.stress), 4)} ${u.stress}` }, scale: Math.max(Math.abs(best.max), Math.abs(best.min)), axis, kern: k.vertices, tauX: shear.tauX, tauY: shear.tauY, withMaterials },
  };
}

/** Pa → the given stress unit (core/units). */
export const toStressUnit = (pa: number, unit: string): number => fromSI(pa, 'stress', unit);

/** The map's palette, our own: deep slate blue (compression) through the paper colour to a burnt red-orange (tension). */
const STOPS: readonly [number, [number, number, number]][] = [
  [-1, [38, 70, 120]],
  [-0.5, [122, 152, 190]],
  [0, [246, 243, 236]],
  [0.5, [232, 160, 112]],
  [1, [178, 58, 32]],
];

/** Colour of a stress value on the symmetric scale ±`scale` (clamped). */
export function stressColour(value: number, scale: number): string {
  const t = scale > 0 ? Math.max(-1, Math.min(1, value / scale)) : 0;
  for (let i = 1; i < STOPS.length; i++) {
    const [t1, c1] = STOPS[i] as [number, [number, number, number]];
    const [t0, c0] = STOPS[i - 1] as [number, [number, number, number]];
    if (t <= t1) {
      const f = (t - t0) / (t1 - t0);
      const c = c0.map((v, j) => Math.round(v + f * ((c1[j] ?? 0) - v)));
      return `rgb(${c[0]},${c[1]},${c[2]})`;
    }
  }
  return 'rgb(178,58,32)';
}

/** CSS gradient of the whole scale, compression at the left. */
export const LEGEND_GRADIENT = `linear-gradient(to right, ${STOPS.map(([t]) => `${stressColour(t, 1)} ${((t + 1) * 50).toFixed(0)}%`).join(', ')})`;
