/**
 * Materials as plain, user-editable data, and their validation (valibot).
 *
 * A stored Material fills the MaterialRef slot of core/document/types.ts. Its stresses (E, G,
 * fy, fu, Emin, Fb) are in the material's own `stressUnit`, so a user can type ksi or MPa and read
 * the same numbers back; density is always kg/m³ (the MaterialRef contract). Use
 * `materialInSI` to get Pa and kg/m³ for computation.
 *
 * `fy` is the strength used for first yield and the plastic moment. For steel and aluminium it
 * is the tensile yield strength; for wood and plastics no yield plateau exists and `fy` holds a
 * reference strength (`strengthBasis` says which), so a plastic moment for them is only a
 * comparison figure, never a capacity.
 */
import * as v from 'valibot';
import { STRESS_UNITS, stressToPascals, type StressUnit } from './quantities.ts';

export const MATERIAL_KINDS = ['steel', 'aluminium', 'sawn-lumber', 'engineered-wood', 'plastic', 'other'] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

export const STRENGTH_BASES = ['yield', 'reference-bending', 'tensile'] as const;
export type StrengthBasis = (typeof STRENGTH_BASES)[number];

/** Which fields a per-value source note may describe. */
export const SOURCED_FIELDS = ['E', 'G', 'nu', 'density', 'fy', 'fu', 'Emin', 'Fb'] as const;
export type SourcedField = (typeof SOURCED_FIELDS)[number];

const positive = (what: string) => v.pipe(v.number(`${what} must be a number`), v.finite(`${what} must be finite`), v.gtValue(0, `${what} must be greater than 0`));

export const MaterialSchema = v.pipe(
  v.object({
    id: v.pipe(v.string(), v.nonEmpty('material id must not be empty')),
    name: v.pipe(v.string(), v.nonEmpty('material name must not be empty')),
    kind: v.picklist(MATERIAL_KINDS, `kind must be one of ${MATERIAL_KINDS.join(', ')}`),
    stressUnit: v.picklist(STRESS_UNITS, `stressUnit must be one of ${STRESS_UNITS.join(', ')}`),
    E: positive('E'),
    G: v.optional(positive('G')),
    nu: v.optional(v.pipe(v.number(), v.finite(), v.gtValue(-1, 'nu must exceed -1'), v.check((x) => x < 0.5, 'nu must be below 0.5'))),
    density: v.pipe(v.number('density must be a number'), v.finite('density must be finite'), v.minValue(0, 'density must not be negative')),
    fy: positive('fy'),
    strengthBasis: v.picklist(STRENGTH_BASES, `strengthBasis must be one of ${STRENGTH_BASES.join(', ')}`),
    fu: v.optional(positive('fu')),
    Emin: v.optional(positive('Emin')),
    Fb: v.optional(positive('Fb')),
    /** Per-value source, e.g. { E: "AISC 360-16 §B... (from memory)" }. */
    sources: v.optional(v.record(v.picklist(SOURCED_FIELDS), v.string())),
    /** True when any value was entered from memory rather than read from the source. */
    fromMemory: v.optional(v.boolean()),
    note: v.optional(v.string()),
  }),
  v.check((m) => m.G !== undefined || m.nu !== undefined, 'give G or nu (Poisson ratio)'),
);

export type Material = v.InferOutput<typeof MaterialSchema>;

/** A material with every stress in Pa and density in kg/m³; G derived from ν when absent. */
export interface MaterialSI {
  readonly id: string;
  readonly name: string;
  readonly kind: MaterialKind;
  readonly E: number;
  readonly G: number;
  readonly density: number;
  readonly fy: number;
  readonly strengthBasis: StrengthBasis;
  readonly fu?: number;
  readonly Emin?: number;
  readonly Fb?: number;
}

export interface MaterialIssue {
  /** Index in the list validated, or -1 for a single material. */
  readonly index: number;
  readonly id?: string;
  readonly message: string;
}

const toPa = (value: number, unit: StressUnit): number => stressToPascals(value, unit);
const STRESS_FIELDS = ['E', 'G', 'fy', 'fu', 'Emin', 'Fb'] as const;

/** Validates unknown input as a Material; the message names the material and the field. */
export function validateMaterial(input: unknown, index = -1): { material?: Material; issues: MaterialIssue[] } {
  const result = v.safeParse(MaterialSchema, input);
  const id = typeof input === 'object' && input !== null && 'id' in input ? String((input as { id: unknown }).id) : undefined;
  if (result.success) {
    // Finite as typed but not in pascals (1e308 GPa): refused here, where the field can be named.
    const m = result.output;
    const overflow = STRESS_FIELDS.find((f) => m[f] !== undefined && !Number.isFinite(toPa(m[f], m.stressUnit)));
    if (overflow === undefined) return { material: m, issues: [] };
    return { issues: [{ index, ...(id !== undefined ? { id } : {}), message: `material "${m.id}" field ${overflow}: ${m[overflow]} ${m.stressUnit} is too large (it overflows when converted to pascals)` }] };
  }
  const issues = result.issues.map((issue) => {
    const path = issue.path?.map((p) => String(p.key)).join('.') ?? '';
    const where = `material ${id !== undefined ? `"${id}"` : index >= 0 ? `#${index}` : ''}`.trim();
    return { index, ...(id !== undefined ? { id } : {}), message: `${where}${path ? ` field ${path}` : ''}: ${issue.message}` };
  });
  return { issues };
}


/** Converts a validated material to SI; G = E / (2(1 + ν)) when only ν is given (isotropic elasticity). */
export function materialInSI(m: Material): MaterialSI {
  const E = toPa(m.E, m.stressUnit);
  const G = m.G !== undefined ? toPa(m.G, m.stressUnit) : E / (2 * (1 + (m.nu as number)));
  return {
    id: m.id,
    name: m.name,
    kind: m.kind,
    E,
    G,
    density: m.density,
    fy: toPa(m.fy, m.stressUnit),
    strengthBasis: m.strengthBasis,
    ...(m.fu !== undefined ? { fu: toPa(m.fu, m.stressUnit) } : {}),
    ...(m.Emin !== undefined ? { Emin: toPa(m.Emin, m.stressUnit) } : {}),
    ...(m.Fb !== undefined ? { Fb: toPa(m.Fb, m.stressUnit) } : {}),
  };
}
