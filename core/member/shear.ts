/**
 * Shear stress at the bending neutral axis of a section of one or more materials:
 * τ = V·Q/(I·t) (Gere & Timoshenko, Mechanics of Materials, shear formula), written for a
 * transformed section as the shear flow q = V·Q_E/EI with Q_E = Σ E_i·Q_i, the E-weighted first
 * moment of the material above the cut about the neutral axis.
 *
 * Across the cut the flow is shared by the materials in proportion to E_i·t_i (pieces side by
 * side, strained alike, as in a flitch beam), so the stress in material i is
 *   τ_i = E_i · V · Q_E / (EI · Σ_j E_j·t_j).
 * For one material this is V·Q/(I·t) exactly.
 *
 * Q is exact: the part of each piece above the axis is integrated by Green's theorem over the
 * parts of its edges above the line, arcs included (areaAboveLine, core/properties/plastic.ts),
 * in one pass and without Boolean clipping. The widths t_i come
 * from core/materials/widths.ts. Units: the document unit for lengths, E in Pa; Q_E is returned
 * in Pa·unit³ and Σ E·t in Pa·unit.
 * Does not: find the largest shear stress over the depth (at a thin web under a wide flange the
 * neutral axis governs, but a section whose width shrinks away from the axis can peak elsewhere;
 * the member check says so), nor treat thin-walled open sections whose shear flow runs along the
 * walls (the shear flow of the joints work covers those).
 */
import type { MaterialPiece } from '../materials/composite.ts';
import { regionWidthAt } from '../materials/widths.ts';
import { areaAboveLine } from '../properties/plastic.ts';

export interface NeutralAxisShear {
  /** Height of the cut (the E-weighted centroid), document unit. */
  readonly y: number;
  /** Σ E_i·∫_above (y − y_cut) dA, Pa·unit³. */
  readonly QE: number;
  /** Σ E_i·t_i at the cut, Pa·unit. */
  readonly Et: number;
  /** Each material's width at the cut (document unit) and modulus (Pa); only materials cut. */
  readonly cut: readonly { readonly materialId: string; readonly E: number; readonly width: number }[];
}

/** Q_E and Σ E·t at the horizontal cut y = c (normally the E-weighted centroid). */
export function neutralAxisShear(pieces: readonly MaterialPiece[], c: number): NeutralAxisShear {
  let QE = 0, Et = 0;
  const byMaterial = new Map<string, { materialId: string; E: number; width: number }>();
  for (const p of pieces) {
    // First moment about the cut of the material above it: ∫ (y − c) dA.
    QE += p.material.E * areaAboveLine(p.region, c).firstMoment;
    const width = regionWidthAt(p.region, c);
    if (width > 0) {
      Et += p.material.E * width;
      const prev = byMaterial.get(p.material.id);
      byMaterial.set(p.material.id, { materialId: p.material.id, E: p.material.E, width: (prev?.width ?? 0) + width });
    }
  }
  return { y: c, QE, Et, cut: [...byMaterial.values()] };
}
