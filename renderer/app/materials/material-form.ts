/**
 * The material form's pure logic: typed text ⇄ a stored Material (core/materials/schema.ts),
 * and the document changes the materials editor makes (save, delete, assign).
 *
 * Text is kept exactly as typed; a draft becomes a Material only when every field reads and the
 * valibot MaterialSchema accepts it, so bad input never changes the document. Each problem is
 * returned under the field it belongs to, naming the field and what is wrong.
 *
 * Units: stresses (E, G, fy, fu, Emin, Fb) in the material's own stress unit, as stored; density
 * typed in kg/m³ or lb/ft³ and stored in kg/m³ (exact factor, core/materials/quantities.ts).
 * A field whose text is unchanged since the form was filled keeps the stored number and its
 * source exactly; a changed value drops the old per-value source (it no longer describes the
 * number) and takes the form's "source of the values" text, if any.
 */
import * as v from 'valibot';
import type { MaterialRef, SectionDocument } from '../../../core/document/types.ts';
import {
  BUILT_IN_MATERIALS,
  builtInMaterial,
  densityToKgPerM3,
  kgPerM3To,
  MATERIAL_KINDS,
  MaterialSchema,
  parseQuantity,
  pascalsTo,
  QuantityError,
  STRENGTH_BASES,
  stressToPascals,
  STRESS_UNITS,
  type DensityUnit,
  type Material,
  type MaterialKind,
  type SourcedField,
  type StrengthBasis,
  type StressUnit,
} from '../../../core/materials/index.ts';
import { readQuantity } from '../../../core/units/index.ts';
import { partLabel } from '../../../core/section/index.ts';

/** The numeric fields, in form order. */
export const NUMBER_FIELDS = ['E', 'G', 'nu', 'density', 'fy', 'fu', 'Emin', 'Fb'] as const satisfies readonly SourcedField[];
export type NumberField = (typeof NUMBER_FIELDS)[number];
export type FormField = NumberField | 'name';

export const DENSITY_UNITS: readonly DensityUnit[] = ['kg/m3', 'lb/ft3'];

export interface MaterialDraft {
  readonly name: string;
  readonly kind: MaterialKind;
  readonly stressUnit: StressUnit;
  readonly densityUnit: DensityUnit;
  readonly strengthBasis: StrengthBasis;
  readonly text: Readonly<Record<NumberField, string>>;
  readonly note: string;
  /** Source written against every value the user changed or typed. */
  readonly source: string;
  readonly fromMemory: boolean;
}

/** What the form was filled from: the stored numbers and the text shown for them. */
export interface DraftOrigin {
  readonly material: Material;
  readonly shown: Readonly<Record<NumberField, string>>;
  /** The draft as first filled (its units). */
  readonly draft: MaterialDraft;
}

const EMPTY_TEXT: Record<NumberField, string> = { E: '', G: '', nu: '', density: '', fy: '', fu: '', Emin: '', Fb: '' };

/** Unit system of a document: inch-pound for in and ft, else SI. */
export const imperialUnit = (doc: SectionDocument): boolean => doc.unit === 'in' || doc.unit === 'ft';

/** A blank draft in the document's unit system (MPa and kg/m³, or ksi and lb/ft³). */
export function blankDraft(doc: SectionDocument): MaterialDraft {
  const imperial = imperialUnit(doc);
  return {
    name: '', kind: 'other', stressUnit: imperial ? 'ksi' : 'MPa', densityUnit: imperial ? 'lb/ft3' : 'kg/m3',
    strengthBasis: 'yield', text: EMPTY_TEXT, note: '', source: '', fromMemory: false,
  };
}

/**
 * A stored number as the form shows it: eight significant figures, trailing zeros dropped
 * (7849.0471 for 490 lb/ft³ in kg/m³). Left as shown, the field keeps the stored number exactly.
 */
const numberText = (x: number | undefined): string => (x === undefined ? '' : String(Number(x.toPrecision(8))));

/** A draft showing a stored material; `name` overrides its name (e.g. "… (copy)"). */
export function draftFromMaterial(m: Material, densityUnit: DensityUnit, name = m.name): { draft: MaterialDraft; origin: DraftOrigin } {
  const density = densityUnit === 'kg/m3' ? m.density : kgPerM3To(m.density, densityUnit);
  const shown: Record<NumberField, string> = {
    E: numberText(m.E), G: numberText(m.G), nu: numberText(m.nu), density: numberText(density),
    fy: numberText(m.fy), fu: numberText(m.fu), Emin: numberText(m.Emin), Fb: numberText(m.Fb),
  };
  const draft: MaterialDraft = {
    name, kind: m.kind, stressUnit: m.stressUnit, densityUnit, strengthBasis: m.strengthBasis,
    text: shown, note: m.note ?? '', source: '', fromMemory: m.fromMemory ?? false,
  };
  return { draft, origin: { material: m, shown, draft } };
}

export const FIELD_LABELS: Readonly<Record<FormField, string>> = {
  name: 'name',
  E: 'E (modulus of elasticity)',
  G: 'G (shear modulus)',
  nu: 'ν (Poisson ratio)',
  density: 'density',
  fy: 'fy (yield or reference strength)',
  fu: 'fu (tensile strength)',
  Emin: 'Emin (stability modulus, wood)',
  Fb: 'Fb (reference bending value, wood)',
};

const REQUIRED: readonly NumberField[] = ['E', 'density', 'fy'];
const STRESS_FIELDS: readonly NumberField[] = ['E', 'G', 'fy', 'fu', 'Emin', 'Fb'];

export type FieldErrors = Partial<Record<FormField | 'form', string>>;
export type DraftResult = { readonly ok: true; readonly material: Material } | { readonly ok: false; readonly errors: FieldErrors };

/** Reads one stress text in `unit`; a typed unit ("200 GPa") is converted to `unit`. */
function readStress(text: string, unit: StressUnit, what: string): number | string {
  try {
    const q = parseQuantity(text, STRESS_UNITS, unit, what);
    return q.unit === unit ? q.value : pascalsTo(stressToPascals(q.value, q.unit), unit);
  } catch (err) {
    if (err instanceof QuantityError) return `${err.message} (type a number in ${unit}, e.g. 200)`;
    throw err;
  }
}

/** ν as a plain ratio, through core/units' one reader. */
function readPlain(text: string, what: string): number | string {
  const r = readQuantity(text, { label: what, kind: 'ratio', unit: '–' });
  return r.ok ? r.si : r.message;
}

/** A density typed in the draft's unit or with its own ("490 lb/ft3", "7850 kg/m3"), in `unit`. */
function readDensity(text: string, unit: DensityUnit, what: string): number | string {
  const r = readQuantity(text, { label: what, kind: 'density', unit });
  return r.ok ? kgPerM3To(r.si, unit) : `${r.message} (type a number in ${unit}, e.g. ${unit === 'kg/m3' ? '7850' : '490'})`;
}

/** Each field's number (or its message), blank optional fields left out. */
function readNumbers(d: MaterialDraft, origin: DraftOrigin | null, errors: FieldErrors): Partial<Record<NumberField, number>> {
  const out: Partial<Record<NumberField, number>> = {};
  for (const f of NUMBER_FIELDS) {
    const text = d.text[f];
    if (text.trim() === '') {
      if (REQUIRED.includes(f)) errors[f] = `${FIELD_LABELS[f]}: enter a value`;
      continue;
    }
    const stored = origin?.material[f];
    // Unchanged text in the unchanged unit keeps the stored number exactly (no round trip).
    if (origin && typeof stored === 'number' && text === origin.shown[f] && unitOf(f, d) === unitOf(f, origin.draft)) {
      out[f] = stored;
      continue;
    }
    const r = STRESS_FIELDS.includes(f) ? readStress(text, d.stressUnit, FIELD_LABELS[f]) : f === 'density' ? readDensity(text, d.densityUnit, FIELD_LABELS[f]) : readPlain(text, FIELD_LABELS[f]);
    if (typeof r === 'string') errors[f] = r;
    else out[f] = f === 'density' ? densityToKgPerM3(r, d.densityUnit) : r;
  }
  return out;
}

/** The unit a field is typed in ('' for ν). */
function unitOf(f: NumberField, d: Pick<MaterialDraft, 'stressUnit' | 'densityUnit'>): string {
  if (f === 'nu') return '';
  return f === 'density' ? d.densityUnit : d.stressUnit;
}

/** A field's value in SI (Pa, kg/m³; ν as is), to tell an unchanged quantity in another unit. */
function inSI(f: NumberField, value: number, stressUnit: StressUnit): number {
  return STRESS_FIELDS.includes(f) ? stressToPascals(value, stressUnit) : value;
}

/** An id from the name (lower-case words joined by '-'), unique among `taken`. */
export function materialIdFor(name: string, taken: ReadonlySet<string>): string {
  const base = name.normalize('NFKD').replace(/[^\w\s.-]/g, '').trim().toLowerCase().replace(/[\s_.]+/g, '-').replace(/-+/g, '-').replace(/^-|-$/g, '') || 'material';
  if (!taken.has(base)) return base;
  for (let k = 2; ; k++) if (!taken.has(`${base}-${k}`)) return `${base}-${k}`;
}

/** Per-value sources kept for unchanged values; changed or new values get the form's source. */
function sourcesFor(d: MaterialDraft, origin: DraftOrigin | null, numbers: Partial<Record<NumberField, number>>): Partial<Record<SourcedField, string>> {
  const out: Partial<Record<SourcedField, string>> = {};
  for (const f of NUMBER_FIELDS) {
    if (numbers[f] === undefined) continue;
    const before = origin?.material[f];
    // The same quantity (to 1e-9, e.g. re-expressed in another unit) keeps its source.
    const unchanged = origin !== null && typeof before === 'number' && Math.abs(inSI(f, numbers[f], d.stressUnit) - inSI(f, before, origin.material.stressUnit)) <= 1e-9 * Math.abs(inSI(f, before, origin.material.stressUnit));
    const kept = unchanged ? origin.material.sources?.[f] : undefined;
    if (kept !== undefined) out[f] = kept;
    else if (d.source.trim() !== '') out[f] = d.source.trim();
  }
  return out;
}

/** Maps a valibot issue to the form field it concerns. */
function fieldOf(issue: v.BaseIssue<unknown>): FormField | 'form' {
  const key = issue.path?.[0]?.key;
  if (typeof key === 'string' && (NUMBER_FIELDS as readonly string[]).includes(key)) return key as NumberField;
  if (key === 'name') return 'name';
  return /G or nu/.test(issue.message) ? 'G' : 'form';
}

/**
 * Reads a draft as a Material for the document: `editingId` is the id of the material being
 * edited (kept), or null for a new one (an id is made from the name). `others` are the document's
 * other materials, for the unique-name check.
 */
export function materialFromDraft(d: MaterialDraft, origin: DraftOrigin | null, editingId: string | null, doc: SectionDocument): DraftResult {
  const errors: FieldErrors = {};
  const name = d.name.trim();
  if (name === '') errors.name = 'name: enter a name for the material';
  else if (doc.materials.some((m) => m.id !== editingId && m.name.trim().toLowerCase() === name.toLowerCase())) {
    errors.name = `name: this document already has a material called "${name}"; choose another name`;
  }
  const numbers = readNumbers(d, origin, errors);
  if (numbers.G === undefined && numbers.nu === undefined && errors.G === undefined && errors.nu === undefined) {
    errors.G = 'G or ν: give the shear modulus G or the Poisson ratio ν (G = E / (2(1 + ν)) for an isotropic material)';
  }
  if (d.strengthBasis === 'yield' && numbers.fu !== undefined && numbers.fy !== undefined && numbers.fu < numbers.fy) {
    errors.fu = `fu (tensile strength): ${numbers.fu} ${d.stressUnit} is below the yield strength fy = ${numbers.fy} ${d.stressUnit}`;
  }
  const taken = new Set([...doc.materials.map((m) => m.id), ...BUILT_IN_MATERIALS.map((m) => m.id)]);
  const id = editingId ?? materialIdFor(name, taken);
  const sources = sourcesFor(d, origin, numbers);
  const candidate = {
    id, name, kind: d.kind, stressUnit: d.stressUnit, strengthBasis: d.strengthBasis, ...numbers,
    ...(Object.keys(sources).length > 0 ? { sources } : {}),
    ...(d.fromMemory ? { fromMemory: true } : {}),
    ...(d.note.trim() !== '' ? { note: d.note.trim() } : {}),
  };
  // The schema runs even when some fields did not read, so every wrong field is named at once;
  // a field keeps its first message (a field that did not read is absent from the candidate).
  const parsed = v.safeParse(MaterialSchema, candidate, { abortEarly: false });
  if (parsed.success && Object.keys(errors).length === 0) return { ok: true, material: parsed.output };
  for (const issue of parsed.issues ?? []) {
    const f = fieldOf(issue);
    if (f === 'form' && Object.keys(errors).length > 0) continue;
    // The schema's own messages start with the field's key ("nu must be below 0.5"); the label says it better.
    errors[f] ??= f === 'form' ? issue.message : `${FIELD_LABELS[f]}: ${issue.message.replace(new RegExp(`^${f}\\s+`), '')}`;
  }
  return { ok: false, errors };
}

/** Stores a material: replaces the entry with the same id, or appends it. */
export function withMaterial(doc: SectionDocument, m: Material): SectionDocument {
  const at = doc.materials.findIndex((x) => x.id === m.id);
  const entry = m as unknown as MaterialRef;
  const materials = at < 0 ? [...doc.materials, entry] : doc.materials.map((x, i) => (i === at ? entry : x));
  return { ...doc, materials };
}

/**
 * Makes a material id usable by the document: a built-in id not yet stored is copied into
 * `materials` (the file then holds every value it uses, with its sources, and loads anywhere).
 */
export function withMaterialStored(doc: SectionDocument, id: string): SectionDocument {
  if (doc.materials.some((m) => m.id === id)) return doc;
  const built = builtInMaterial(id);
  return built ? withMaterial(doc, built) : doc;
}

/** The document default material set to `id` (null: none), a built-in copied in first. */
export function withDefaultMaterial(doc: SectionDocument, id: string | null): SectionDocument {
  return { ...(id === null ? doc : withMaterialStored(doc, id)), defaultMaterial: id };
}

/** One part's material set to `id` (null: the document default), a built-in copied in first. */
export function withPartMaterial(doc: SectionDocument, partId: string, id: string | null): SectionDocument {
  const d = id === null ? doc : withMaterialStored(doc, id);
  return { ...d, parts: d.parts.map((p) => (p.id === partId ? { ...p, material: id } : p)) };
}

export interface MaterialUse {
  /** Labels of parts that name this material themselves. */
  readonly parts: readonly string[];
  /** Labels of "add" parts that take the document default, when this material is the default. */
  readonly byDefault: readonly string[];
  readonly isDefault: boolean;
  readonly isReference: boolean;
}

export function materialUse(doc: SectionDocument, id: string): MaterialUse {
  const isDefault = doc.defaultMaterial === id;
  const parts: string[] = [];
  const byDefault: string[] = [];
  doc.parts.forEach((p, i) => {
    if (p.material === id) parts.push(partLabel(p, i));
    else if (p.material === null && isDefault && p.operation === 'add') byDefault.push(partLabel(p, i));
  });
  const ref = doc.referenceModulus;
  return { parts, byDefault, isDefault, isReference: ref !== undefined && 'material' in ref && ref.material === id };
}

export type DeletePlan = { readonly ok: true; readonly summary: readonly string[]; readonly apply: (doc: SectionDocument) => SectionDocument } | { readonly ok: false; readonly message: string };

const quoted = (xs: readonly string[]): string => xs.map((x) => `"${x}"`).join(', ');

/**
 * What deleting a material does. Parts that name it go to the document default; refused when
 * that would leave a part with no material (the material is the default itself, or there is no
 * default), naming the parts. A default with no part relying on it becomes "none"; an E_ref
 * chosen from it goes back to the first part's material.
 */
export function planMaterialDelete(doc: SectionDocument, id: string): DeletePlan {
  const m = doc.materials.find((x) => x.id === id);
  if (!m) return { ok: false, message: `there is no material "${id}" in this document` };
  const use = materialUse(doc, id);
  const otherDefault = doc.defaultMaterial !== null && doc.defaultMaterial !== id ? doc.materials.find((x) => x.id === doc.defaultMaterial)?.name ?? doc.defaultMaterial : null;
  const stranded = [...(otherDefault === null ? use.parts : []), ...use.byDefault];
  if (stranded.length > 0) {
    const why = use.isDefault ? `it is the document default` : 'the document has no default material';
    return { ok: false, message: `"${m.name}" cannot be deleted: ${why}, and part${stranded.length === 1 ? '' : 's'} ${quoted(stranded)} would be left with no material. Choose another material for ${stranded.length === 1 ? 'it' : 'them'} (or another default) first.` };
  }
  const summary: string[] = [];
  if (use.parts.length > 0) summary.push(`part${use.parts.length === 1 ? '' : 's'} ${quoted(use.parts)} will use the document default, "${otherDefault}"`);
  if (use.isDefault) summary.push('the document will have no default material');
  if (use.isReference) summary.push('E_ref goes back to the first part\'s material');
  const apply = (d: SectionDocument): SectionDocument => {
    const { referenceModulus, ...rest } = d;
    const keepRef = referenceModulus !== undefined && !('material' in referenceModulus && referenceModulus.material === id);
    return {
      ...rest,
      ...(keepRef ? { referenceModulus } : {}),
      materials: d.materials.filter((x) => x.id !== id),
      defaultMaterial: d.defaultMaterial === id ? null : d.defaultMaterial,
      parts: d.parts.map((p) => (p.material === id ? { ...p, material: null } : p)),
    };
  };
  return { ok: true, summary, apply };
}

/** Twelve significant figures, trailing zeros dropped: a converted value reads cleanly. */
const converted = (x: number): string => String(Number(x.toPrecision(12)));

/**
 * The draft re-expressed in another stress unit: every stress text that reads as a number is
 * converted (exact factors), so the same physical values stay; text that does not read is kept.
 */
export function draftInStressUnit(d: MaterialDraft, unit: StressUnit): MaterialDraft {
  if (unit === d.stressUnit) return d;
  const text = { ...d.text };
  for (const f of STRESS_FIELDS) {
    const r = d.text[f].trim() === '' ? '' : readStress(d.text[f], d.stressUnit, FIELD_LABELS[f]);
    if (typeof r === 'number') text[f] = converted(pascalsTo(stressToPascals(r, d.stressUnit), unit));
  }
  return { ...d, stressUnit: unit, text };
}

/** The draft with its density re-expressed in another density unit (exact factor). */
export function draftInDensityUnit(d: MaterialDraft, unit: DensityUnit): MaterialDraft {
  if (unit === d.densityUnit) return d;
  const r = d.text.density.trim() === '' ? '' : readDensity(d.text.density, d.densityUnit, FIELD_LABELS.density);
  const density = typeof r === 'number' ? converted(kgPerM3To(densityToKgPerM3(r, d.densityUnit), unit)) : d.text.density;
  return { ...d, densityUnit: unit, text: { ...d.text, density } };
}

/**
 * A draft from a stored entry as it is, for repairing one that does not pass the schema (e.g. a
 * file edited by hand): the fields that have the right type are filled, the rest left blank for
 * the form to name. A valid entry gives the same as draftFromMaterial.
 */
export function draftFromStored(raw: MaterialRef, doc: SectionDocument): { draft: MaterialDraft; origin: DraftOrigin | null } {
  const valid = v.safeParse(MaterialSchema, raw);
  const blank = blankDraft(doc);
  if (valid.success) return draftFromMaterial(valid.output, blank.densityUnit);
  const pick = <T extends string>(value: unknown, options: readonly T[], fallback: T): T => (typeof value === 'string' && (options as readonly string[]).includes(value) ? (value as T) : fallback);
  const stressUnit = pick(raw.stressUnit, STRESS_UNITS, blank.stressUnit);
  const text = { ...blank.text };
  for (const f of NUMBER_FIELDS) {
    const x = raw[f];
    if (typeof x === 'number' && Number.isFinite(x)) text[f] = f === 'density' ? numberText(kgPerM3To(x, blank.densityUnit)) : numberText(x);
    else if (typeof x === 'string') text[f] = x;
  }
  const draft: MaterialDraft = {
    ...blank, name: raw.name, stressUnit, text,
    kind: pick(raw.kind, MATERIAL_KINDS, blank.kind),
    strengthBasis: pick(raw.strengthBasis, STRENGTH_BASES, blank.strengthBasis),
    note: typeof raw.note === 'string' ? raw.note : '',
    fromMemory: raw.fromMemory === true,
  };
  return { draft, origin: null };
}
