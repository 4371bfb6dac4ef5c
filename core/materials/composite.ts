/**
 * Transformed (E-weighted) section of several materials (docs/methods.md §6) and its plastic
 * capacity by yield-force balance (§5.1).
 *
 * Input: pieces that do NOT overlap (resolve overlaps first, core/materials/document.ts), each a
 * normalised region in the document's length unit with a material in SI (Pa, kg/m³).
 * Reference modulus: E_ref as given, else the first piece's E. n_i = E_i / E_ref.
 *
 * Sums (docs/methods.md §6, stable form): raw integrals of every piece about one local origin (the
 * vertex-box centre of all pieces, §1.3), then
 *   EA = Σ E_i A_i,  (x_E, y_E) = Σ E_i (Qy_i, Qx_i) / EA,
 *   EIx = Σ E_i [Ix_i + A_i (yc_i − y_E)²], EIy and EIxy likewise,
 * principal axes of the EI tensor by §3, A_tr = EA/E_ref, I_tr = EI/E_ref.
 *
 * Units out: geometric values (centroid, fibres, A_tr, I_tr, moduli) in the document unit;
 * EA in N, EI in N·m², moments in N·m, mass per length kg/m, weight per length N/m and lb/ft.
 * Lengths are converted only through core/units.
 *
 * Per-material elastic modulus: EIx / (E_i c_i) with c_i the extreme distance of material i from
 * the E-weighted centroid, measured in y (x for EIy); the first-yield moment of material i is
 * fy_i times it (restrained bending). `firstYield` also gives the free-bending first-yield
 * moment from the full strain plane (§6), which differs when EIxy ≠ 0.
 *
 * Plastic: the PNA balances Σ fy_i A_i(s > d) = Σ fy_i A_i(s < d) (+ N), Mp = Σ fy_i ∫|s − d| dA,
 * computed by core/properties (plasticNeutralAxisWeighted). For wood and plastics `fy` is a
 * reference strength, so their Mp is a comparison figure only (flagged in `plasticCautions`).
 * Tolerance: §11 (1e−12 for the E-weighted sums; the PNA per core/properties).
 */
import { extremeAlong } from '../geometry/bounds.ts';
import type { Degrees, Region } from '../geometry/types.ts';
import { invariant } from '../invariant.ts';
import { regionIntegrals, vertexBoxCentre } from '../properties/integrals.ts';
import { plasticNeutralAxisWeighted } from '../properties/plastic.ts';
import { principalAxes } from '../properties/principal.ts';
import { stressExtremes, strainPlane, type SectionStiffness } from '../stress/normal-stress.ts';
import { convertLength, type LengthUnit } from '../units/index.ts';
import { kgPerMetreToLbPerFoot, STANDARD_GRAVITY } from './quantities.ts';
import type { MaterialSI } from './schema.ts';

export interface MaterialPiece {
  readonly region: Region;
  readonly material: MaterialSI;
  /** Part name for messages and tables. */
  readonly label?: string;
}

export interface PieceResult {
  readonly label: string;
  readonly materialId: string;
  readonly n: number;
  readonly area: number;
  readonly transformedArea: number;
  readonly cx: number;
  readonly cy: number;
  readonly yTop: number;
  readonly yBottom: number;
  readonly xLeft: number;
  readonly xRight: number;
  /** Extreme distances from the E-weighted centroid: max |y − y_E| and max |x − x_E|. */
  readonly cY: number;
  readonly cX: number;
  /** EIx/(E_i·cY) and EIy/(E_i·cX), document unit³. */
  readonly Sx: number;
  readonly Sy: number;
  /** fy_i·Sx and fy_i·Sy in N·m (restrained bending about x and about y). */
  readonly firstYieldMx: number;
  readonly firstYieldMy: number;
  readonly massPerLength: number;
}

export interface CompositeProperties {
  readonly unit: LengthUnit;
  readonly eRef: number;
  readonly eRefFrom: 'given' | 'first piece';
  readonly EA: number;
  /** E-weighted centroid, document unit. */
  readonly cx: number;
  readonly cy: number;
  readonly EIx: number;
  readonly EIy: number;
  readonly EIxy: number;
  readonly EI1: number;
  readonly EI2: number;
  readonly thetaDeg: number;
  readonly isotropic: boolean;
  /** Transformed to E_ref: document unit² and unit⁴. */
  readonly transformedArea: number;
  readonly transformedIx: number;
  readonly transformedIy: number;
  readonly transformedIxy: number;
  readonly massPerLength: number;
  readonly weightPerLength: number;
  readonly weightPerLengthLbPerFt: number;
  readonly pieces: readonly PieceResult[];
  /** Stiffness in the document unit with E in Pa (EA in Pa·unit², EI in Pa·unit⁴) for core/stress. */
  readonly stiffness: SectionStiffness;
}

/** Per-unit-length mass of a piece: ρ·A with A in m² (docs/methods.md §6). */
const massOf = (area: number, unit: LengthUnit, density: number): number => density * convertLength(area, unit, 'm', 2);

export function compositeProperties(pieces: readonly MaterialPiece[], unit: LengthUnit, eRef?: number): CompositeProperties {
  invariant(pieces.length > 0, 'compositeProperties: no pieces');
  const ref = eRef ?? pieces[0]!.material.E;
  invariant(Number.isFinite(ref) && ref > 0, `compositeProperties: E_ref must be positive, got ${ref}`);
  const [ox, oy] = vertexBoxCentre(pieces.flatMap((p) => p.region));
  const raw = pieces.map((p) => regionIntegrals(p.region, ox, oy));
  let EA = 0, EQx = 0, EQy = 0;
  raw.forEach((r, i) => {
    const E = pieces[i]!.material.E;
    invariant(r.A > 0, `compositeProperties: piece "${pieces[i]!.label ?? i}" has no area`);
    EA += E * r.A; EQx += E * r.Qx; EQy += E * r.Qy;
  });
  // Local E-weighted centroid (about the local origin), then the stable parallel-axis sums.
  const xL = EQy / EA, yL = EQx / EA;
  let EIx = 0, EIy = 0, EIxy = 0;
  raw.forEach((r, i) => {
    const E = pieces[i]!.material.E;
    const xc = r.Qy / r.A, yc = r.Qx / r.A;
    const Ix = r.Ixx - r.A * yc * yc, Iy = r.Iyy - r.A * xc * xc, Ixy = r.Ixy - r.A * xc * yc;
    EIx += E * (Ix + r.A * (yc - yL) ** 2);
    EIy += E * (Iy + r.A * (xc - xL) ** 2);
    EIxy += E * (Ixy + r.A * (xc - xL) * (yc - yL));
  });
  const cx = xL + ox, cy = yL + oy;
  const stiffness: SectionStiffness = { EA, cx, cy, EIx, EIy, EIxy };
  const m2 = convertLength(1, unit, 'm', 2), m4 = convertLength(1, unit, 'm', 4), m3 = convertLength(1, unit, 'm', 3);
  const results = pieces.map((p, i) => pieceResult(p, i, raw[i]!, ox, oy, stiffness, ref, unit, m3));
  const axes = principalAxes(EIx, EIy, EIxy);
  const massPerLength = results.reduce((s, r) => s + r.massPerLength, 0);
  return {
    unit, eRef: ref, eRefFrom: eRef === undefined ? 'first piece' : 'given',
    EA: EA * m2, cx, cy, EIx: EIx * m4, EIy: EIy * m4, EIxy: EIxy * m4,
    EI1: axes.I1 * m4, EI2: axes.I2 * m4, thetaDeg: axes.thetaDeg, isotropic: axes.isotropic,
    transformedArea: EA / ref, transformedIx: EIx / ref, transformedIy: EIy / ref, transformedIxy: EIxy / ref,
    massPerLength, weightPerLength: massPerLength * STANDARD_GRAVITY, weightPerLengthLbPerFt: kgPerMetreToLbPerFoot(massPerLength),
    pieces: results, stiffness,
  };
}

function pieceResult(
  p: MaterialPiece, i: number, r: { A: number; Qx: number; Qy: number }, ox: number, oy: number,
  s: SectionStiffness, ref: number, unit: LengthUnit, m3: number,
): PieceResult {
  const ey = extremeAlong(p.region, 0, 1)!;
  const ex = extremeAlong(p.region, 1, 0)!;
  const cY = Math.max(ey.max - s.cy, s.cy - ey.min);
  const cX = Math.max(ex.max - s.cx, s.cx - ex.min);
  const E = p.material.E;
  const Sx = s.EIx / (E * cY), Sy = s.EIy / (E * cX);
  return {
    label: p.label ?? String(i + 1), materialId: p.material.id, n: E / ref,
    area: r.A, transformedArea: (r.A * E) / ref, cx: r.Qy / r.A + ox, cy: r.Qx / r.A + oy,
    yTop: ey.max, yBottom: ey.min, xLeft: ex.min, xRight: ex.max, cY, cX, Sx, Sy,
    firstYieldMx: p.material.fy * Sx * m3, firstYieldMy: p.material.fy * Sy * m3,
    massPerLength: massOf(r.A, unit, p.material.density),
  };
}

export interface FirstYield {
  /** Moment (N·m) at which the first material reaches fy, and which material. */
  readonly moment: number;
  readonly governing: string;
  /** Per piece: the moment at which that piece reaches its fy, N·m. */
  readonly perPiece: readonly { readonly label: string; readonly materialId: string; readonly moment: number }[];
}

/**
 * First yield under a moment about x (`about: 'x'`, My = 0) or about y (Mx = 0) in FREE bending:
 * the full strain plane of §6, so EIxy ≠ 0 turns the neutral axis (docs/methods.md §9.1).
 */
export function firstYield(c: CompositeProperties, pieces: readonly MaterialPiece[], about: 'x' | 'y'): FirstYield {
  // A unit moment in Pa·unit³ gives stresses in Pa per unit moment.
  const plane = strainPlane(c.stiffness, about === 'x' ? { N: 0, Mx: 1, My: 0 } : { N: 0, Mx: 0, My: 1 });
  const m3 = convertLength(1, c.unit, 'm', 3);
  const perPiece = pieces.map((p, i) => {
    const e = stressExtremes(plane, p.material.E, p.region);
    const peak = Math.max(Math.abs(e.max), Math.abs(e.min));
    return { label: p.label ?? String(i + 1), materialId: p.material.id, moment: (p.material.fy / peak) * m3 };
  });
  const min = perPiece.reduce((a, b) => (b.moment < a.moment ? b : a));
  return { moment: min.moment, governing: min.label, perPiece };
}

export interface PlasticCapacity {
  readonly angleDeg: number;
  /** PNA: the line n·p = d, n = (−sin θ, cos θ), document unit. */
  readonly d: number;
  readonly normalX: number;
  readonly normalY: number;
  /** Mp = Σ fy_i ∫|s − d| dA, N·m. */
  readonly Mp: number;
  /** Moment about the perpendicular direction, N·m (docs/methods.md §5.1). */
  readonly MpPerpendicular: number;
  readonly axialForce: number;
  readonly converged: boolean;
  readonly evaluations: number;
  readonly cautions: readonly string[];
}

/**
 * Plastic neutral axis and plastic moment with the PNA at `angleDeg` (0 = bending about x,
 * −90 = bending about y), balancing yield forces with an axial force N in newtons (tension +).
 */
export function plasticCapacity(pieces: readonly MaterialPiece[], unit: LengthUnit, angleDeg: number, axialForce = 0): PlasticCapacity {
  const m2 = convertLength(1, unit, 'm', 2), m3 = convertLength(1, unit, 'm', 3);
  // Weights are fy in Pa; areas in unit², so the force balance runs in Pa·unit².
  const axis = plasticNeutralAxisWeighted(pieces.map((p) => ({ region: p.region, weight: p.material.fy })), angleDeg as Degrees, axialForce / m2);
  const cautions: string[] = [];
  const notYield = [...new Set(pieces.filter((p) => p.material.strengthBasis !== 'yield').map((p) => p.material.name))];
  if (notYield.length > 0) cautions.push(`${notYield.join(', ')}: no yield plateau; the strength used is a reference value, so Mp is a comparison figure, not a capacity.`);
  if (Math.abs(axis.perpendicularMoment) > 1e-9 * Math.abs(axis.moment) && axialForce === 0) {
    cautions.push('The plastic moment is not parallel to the plastic neutral axis (asymmetric section).');
  }
  if (!axis.converged) cautions.push(`The plastic neutral axis search stopped after ${axis.evaluations} evaluations (residual ${axis.residual.toExponential(2)}).`);
  return {
    angleDeg, d: axis.d, normalX: axis.normalX, normalY: axis.normalY,
    Mp: axis.moment * m3, MpPerpendicular: axis.perpendicularMoment * m3, axialForce,
    converged: axis.converged, evaluations: axis.evaluations, cautions,
  };
}
