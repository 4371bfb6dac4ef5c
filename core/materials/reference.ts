/**
 * The reference modulus E_ref of a document's transformed section (docs/methods.md §6: n_i = E_i / E_ref).
 *
 * The document may store `referenceModulus`: a material's E ({ material: id }) or a typed stress
 * ({ value, unit }). Absent, E_ref is the E of the first part with material (compositeProperties
 * does that when given no E_ref). E_ref changes only the transformed (equivalent) quantities and
 * the modular ratios, never EA, EI, the stresses or the deflections (they are E-weighted sums).
 * A stored material id that names no document or built-in material is reported, never replaced.
 * Units: E_ref in Pa.
 */
import type { SectionDocument } from '../document/types.ts';
import { documentMaterials } from './document.ts';
import { builtInMaterial } from './library.ts';
import { stressToPascals } from './quantities.ts';
import { materialInSI } from './schema.ts';

export type ReferenceModulusChoice =
  | { readonly ok: true; readonly eRef: number | undefined; readonly from: 'first piece' | 'material' | 'typed'; readonly materialName?: string }
  | { readonly ok: false; readonly message: string };

/** E_ref in Pa as the document chooses it; undefined eRef means "the first part's material". */
export function documentReferenceModulus(doc: SectionDocument): ReferenceModulusChoice {
  const ref = doc.referenceModulus;
  if (ref === undefined) return { ok: true, eRef: undefined, from: 'first piece' };
  if ('material' in ref) {
    const m = documentMaterials(doc).materials.get(ref.material) ?? builtInMaterial(ref.material);
    if (m === undefined) return { ok: false, message: `referenceModulus names material "${ref.material}", which is neither in the document nor built in (or is not a valid material)` };
    return { ok: true, eRef: materialInSI(m).E, from: 'material', materialName: m.name };
  }
  const eRef = stressToPascals(ref.value, ref.unit);
  if (!(Number.isFinite(eRef) && eRef > 0)) return { ok: false, message: `referenceModulus: expected a positive finite modulus, got ${ref.value} ${ref.unit}` };
  return { ok: true, eRef, from: 'typed' };
}
