/**
 * Sections (alternatives) of a file and the one-section view the computing code takes.
 *
 * A SectionFile (version 3) holds document-wide fields (name, unit, materials, default
 * material) and one or more sections, each with its own parts and joint kinds. Everything that computes or
 * edits a single section (core/section, core/materials, core/member, core/export, the editor's
 * tools) takes a SectionDocument: `sectionView` makes one from a section, `withSectionView`
 * writes an edited one back. Both are pure and share structure (a view's `parts` is the
 * section's own array; an unchanged file is returned as the same object).
 *
 * Rules kept here so every caller keeps a file valid (schema.ts checks the same on reading):
 *   - section ids and names are unique; names are not blank;
 *   - a file has at least one section;
 *   - the unit is document-wide: a view cannot change it (convert the whole file instead);
 *   - materials are document-wide: a view's materials become the file's, and a part in another
 *     section whose material was removed through the view falls back to the default (null), as
 *     it would in the section being edited;
 *   - a joint kind names two parts of its own section: when a view comes back without one of
 *     them (the part was deleted), that joint's setting goes with it.
 * Asking for a section id that is not in the file is a bug and throws (core/invariant.ts);
 * names typed by people are looked up with `findSection`, which returns null.
 */
import { invariant } from '../invariant.ts';
import type { LengthUnit } from '../units/types.ts';
import { DOCUMENT_FORMAT, DOCUMENT_VERSION, SECTION_VIEW_VERSION, type JointSetting, type MemberInputs, type Part, type Section, type SectionDocument, type SectionFile } from './types.ts';

/** The section with this id; throws if there is none (a caller's bug). */
export function sectionById(file: SectionFile, sectionId: string): Section {
  const s = file.sections.find((x) => x.id === sectionId);
  invariant(s, `no section with id ${JSON.stringify(sectionId)} in "${file.name}" (ids: ${file.sections.map((x) => x.id).join(', ')})`);
  return s;
}

/** One section as a one-section document: its name and parts, with the file's unit and materials. */
export function sectionView(file: SectionFile, sectionId: string): SectionDocument {
  const s = sectionById(file, sectionId);
  const ref = file.referenceModulus;
  return {
    format: DOCUMENT_FORMAT, version: SECTION_VIEW_VERSION, name: s.name, unit: file.unit, parts: s.parts, materials: file.materials, defaultMaterial: file.defaultMaterial,
    ...(ref !== undefined ? { referenceModulus: ref } : {}), ...(s.joints !== undefined ? { joints: s.joints } : {}),
    ...(s.member !== undefined ? { member: s.member } : {}), ...(s.stress !== undefined ? { stress: s.stress } : {}),
  };
}

/** The joint settings that still name two parts of `parts` (a deleted part takes its joints with it). */
export function jointsOfParts(joints: readonly JointSetting[] | undefined, parts: readonly Part[]): readonly JointSetting[] | undefined {
  if (joints === undefined) return undefined;
  const ids = new Set(parts.map((p) => p.id));
  const kept = joints.filter((j) => ids.has(j.parts[0]) && ids.has(j.parts[1]));
  return kept.length === joints.length ? joints : kept;
}

/** The member case without allowables for materials the file no longer has (they go with their material). */
export function memberOfMaterials(member: MemberInputs | undefined, known: ReadonlySet<string>): MemberInputs | undefined {
  if (member?.allowables === undefined || member.allowables.every((a) => known.has(a.material))) return member;
  return { ...member, allowables: member.allowables.filter((a) => known.has(a.material)) };
}

/** The inputs a section or view carries besides its parts (member case, stress forces). */
type Inputs = Pick<Section, 'member' | 'stress'>;

/** A section object from its parts, name, joints and inputs (joints left out when there are none to keep). */
function sectionOf(id: string, name: string, parts: readonly Part[], joints: readonly JointSetting[] | undefined, inputs: Inputs = {}): Section {
  const kept = jointsOfParts(joints, parts);
  const extra = { ...(inputs.member !== undefined ? { member: inputs.member } : {}), ...(inputs.stress !== undefined ? { stress: inputs.stress } : {}) };
  return kept !== undefined && kept.length > 0 ? { id, name, parts, joints: kept, ...extra } : { id, name, parts, ...extra };
}

/** The view of the first section (what a command reads when no section is named). */
export function firstSectionView(file: SectionFile): SectionDocument {
  const first = file.sections[0];
  invariant(first, `"${file.name}" has no sections`);
  return sectionView(file, first.id);
}

/** Every section as { name, doc }, in file order: the list a comparison takes. */
export function allSectionViews(file: SectionFile): { readonly name: string; readonly doc: SectionDocument }[] {
  return file.sections.map((s) => ({ name: s.name, doc: sectionView(file, s.id) }));
}

/**
 * The section a person named: an exact name first, else the one name equal ignoring case and
 * surrounding spaces, else an exact id. Null when none matches (the caller lists the names).
 */
export function findSection(file: SectionFile, nameOrId: string): Section | null {
  const exact = file.sections.find((s) => s.name === nameOrId);
  if (exact) return exact;
  const key = nameOrId.trim().toLowerCase();
  const loose = file.sections.filter((s) => s.name.trim().toLowerCase() === key);
  if (loose.length === 1) return loose[0] as Section;
  return file.sections.find((s) => s.id === nameOrId) ?? null;
}

/** Why `name` cannot name a section of `file` (other than `exceptId`), or null when it can. */
export function sectionNameProblem(file: SectionFile, name: string, exceptId: string | null = null): string | null {
  if (name.trim() === '') return 'a section name cannot be empty';
  const clash = file.sections.find((s) => s.id !== exceptId && s.name.trim() === name.trim());
  return clash ? `another section is already called ${JSON.stringify(clash.name)}` : null;
}

/** Writes an edited view of `sectionId` back: its parts and name, and the view's materials for the whole file. */
export function withSectionView(file: SectionFile, sectionId: string, view: SectionDocument): SectionFile {
  const s = sectionById(file, sectionId);
  invariant(view.unit === file.unit, `a section view cannot change the document unit (${file.unit} → ${view.unit}); convert the whole file`);
  const materialsChanged = view.materials !== file.materials || view.defaultMaterial !== file.defaultMaterial || view.referenceModulus !== file.referenceModulus;
  if (view.parts === s.parts && view.name === s.name && view.joints === s.joints && view.member === s.member && view.stress === s.stress && !materialsChanged) return file;
  if (view.name !== s.name) {
    const problem = sectionNameProblem(file, view.name, sectionId);
    invariant(problem === null, `renaming section "${s.name}": ${problem ?? ''}`);
  }
  const known = new Set(view.materials.map((m) => m.id));
  const keepMaterial = (parts: readonly Part[]): readonly Part[] =>
    parts.some((p) => p.material !== null && !known.has(p.material)) ? parts.map((p) => (p.material !== null && !known.has(p.material) ? { ...p, material: null } : p)) : parts;
  const { referenceModulus: _old, ...rest } = file;
  return {
    ...rest,
    materials: view.materials,
    defaultMaterial: view.defaultMaterial,
    ...(view.referenceModulus !== undefined ? { referenceModulus: view.referenceModulus } : {}),
    sections: file.sections.map((x) => {
      if (x.id === sectionId) return sectionOf(x.id, view.name, view.parts, view.joints, { member: materialsChanged ? memberOfMaterials(view.member, known) : view.member, stress: view.stress });
      return materialsChanged ? sectionOf(x.id, x.name, keepMaterial(x.parts), x.joints, { member: memberOfMaterials(x.member, known), stress: x.stress }) : x;
    }),
  };
}

/** A file holding one section made from a one-section document (its name names both). */
export function fileFromSection(doc: SectionDocument, sectionId = 's1'): SectionFile {
  const name = doc.name.trim() === '' ? 'Section 1' : doc.name;
  const ref = doc.referenceModulus;
  return {
    format: DOCUMENT_FORMAT, version: DOCUMENT_VERSION, name: doc.name, unit: doc.unit, materials: doc.materials, defaultMaterial: doc.defaultMaterial,
    ...(ref !== undefined ? { referenceModulus: ref } : {}),
    sections: [sectionOf(sectionId, name, doc.parts, doc.joints, doc)],
  };
}

/** An empty file in the given unit with one empty section. */
export function newSectionFile(unit: LengthUnit, name = 'Untitled section'): SectionFile {
  return { format: DOCUMENT_FORMAT, version: DOCUMENT_VERSION, name, unit, materials: [], defaultMaterial: null, sections: [{ id: 's1', name: name.trim() === '' ? 'Section 1' : name, parts: [] }] };
}

/** An id no section of the file has: s1, s2, … */
export function uniqueSectionId(file: SectionFile): string {
  const used = new Set(file.sections.map((s) => s.id));
  let n = file.sections.length + 1;
  while (used.has(`s${n}`)) n++;
  return `s${n}`;
}

/** `base` if no section has it, else "base 2", "base 3", … */
export function uniqueSectionName(file: SectionFile, base: string): string {
  const stem = base.trim() === '' ? 'Section' : base.trim();
  if (sectionNameProblem(file, stem) === null) return stem;
  let n = 2;
  while (sectionNameProblem(file, `${stem} ${n}`) !== null) n++;
  return `${stem} ${n}`;
}

/** The same file with `fn` applied to every section's view (e.g. a unit conversion), written back as a whole. */
export function mapSectionViews(file: SectionFile, fn: (view: SectionDocument) => SectionDocument): SectionFile {
  const views = file.sections.map((s) => fn(sectionView(file, s.id)));
  const first = views[0];
  invariant(first, `"${file.name}" has no sections`);
  for (const v of views) invariant(v.unit === first.unit && v.materials === first.materials && v.defaultMaterial === first.defaultMaterial && v.referenceModulus === first.referenceModulus, 'mapSectionViews: every section must come back with the same unit and materials');
  const { referenceModulus: _old, ...rest } = file;
  return { ...rest, ...(first.referenceModulus !== undefined ? { referenceModulus: first.referenceModulus } : {}), unit: first.unit, materials: first.materials, defaultMaterial: first.defaultMaterial, sections: file.sections.map((s, i) => { const view = views[i] as SectionDocument; return sectionOf(s.id, view.name, view.parts, view.joints, view); }) };
}
