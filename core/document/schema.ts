/**
 * Validation of the current document format (version DOCUMENT_VERSION, a SectionFile) with
 * valibot, plus the checks that span several fields (unique section ids and names, unique part
 * ids within a section, bulge counts, material references, cut-out roles on subtract parts only,
 * joints naming two parts of their own section once). The version 1 layout (one section, parts
 * at the top) and the version 2 layout (sections, no cut-out roles or joints) are kept here too,
 * for their migrations.
 *
 * Every problem becomes a DocumentIssue with a JSON path in the user's file
 * (`sections[1].parts[2].placement.rotationDeg`) and an "expected …, got …" sentence. Unknown keys are
 * rejected (a misspelt key would otherwise silently fall back to nothing), except inside
 * material entries, whose fields belong to the materials module.
 *
 * Not checked here: whether the geometry is valid (core/geometry does that when the section is
 * composed) or whether a `shape` names a registered part type (core/section reports that).
 */
import * as v from 'valibot';
import { STRESS_UNITS } from '../units/types.ts';
import { CUTOUT_ROLES, DOCUMENT_FORMAT, MEMBER_SUPPORTS, DOCUMENT_VERSION, type JointSetting, type MaterialRef, type MemberInputs, type Part, type SectionFile } from './types.ts';

export interface DocumentIssue {
  /** JSON path in the file, e.g. 'parts[2].placement.rotationDeg'; '' for the whole file. */
  readonly path: string;
  /** One sentence: what was expected and what was found. */
  readonly message: string;
  /** 1-based line and column, for JSON syntax errors. */
  readonly line?: number;
  readonly column?: number;
}

const FINITE = 'a finite number';
const finite = (what = FINITE) => v.pipe(v.number(what), v.finite(what));
const positive = (what: string) => v.pipe(v.number(what), v.finite(what), v.gtValue(0, what));
const text = (what = 'a string') => v.string(what);
// strictTuple: [100, 0, 100, 50] (a missing "],[") or a 3-D point is an error, never read as [100, 0].
const point = v.strictTuple([finite(), finite()], 'a point [x, y] of exactly two finite numbers');
const checkedRing = v.array(point, 'an array of points [x, y]');
/** A ring already exactly as the format wants it, passed through as it is. */
const cleanRing = v.custom<[number, number][]>(() => true);
/** Every item an array of exactly two finite numbers (one tight loop, no allocation). */
function isCleanRing(input: unknown): boolean {
  if (!Array.isArray(input)) return false;
  for (let i = 0; i < input.length; i++) {
    const p: unknown = input[i];
    if (!Array.isArray(p) || p.length !== 2 || !Number.isFinite(p[0]) || !Number.isFinite(p[1])) return false;
  }
  return true;
}
// A million-vertex ring through v.array(point) costs a copy of every point and several objects
// per point (most of the time and garbage of reading a large document); a clean ring is checked
// in one loop and kept, and only a ring with a problem goes through the schema that names it.
const ring = v.lazy((input) => (isCleanRing(input) ? cleanRing : checkedRing));
const bulges = v.array(finite('a finite bulge (tan of a quarter of the arc sweep)'), 'an array of bulges, one per segment');

const placement = v.strictObject(
  {
    x: finite(),
    y: finite(),
    rotationDeg: finite('a finite number (degrees)'),
    mirror: v.boolean('true or false'),
  },
  'a placement object { x, y, rotationDeg, mirror }',
);

const common = {
  id: v.pipe(text('a non-empty string'), v.minLength(1, 'a non-empty string')),
  name: text(),
  placement,
  operation: v.picklist(['add', 'subtract'], '"add" or "subtract"'),
  material: v.nullable(text('a material id (string) or null')),
  visible: v.boolean('true or false'),
};

/** Version 3 adds a cut-out's role (subtract parts only; checked across fields). */
const roleField = { cutoutRole: v.optional(v.picklist(CUTOUT_ROLES, `a cut-out role: ${CUTOUT_ROLES.map((r) => `"${r}"`).join(' or ')}`)) };

export const PART_TYPES = ['polygon', 'rectangle', 'circle', 'shape'] as const;

/** The part object of a format version: versions 1 and 2 have no cutoutRole. */
function partSchema(withRole: boolean) {
  const base = withRole ? { ...common, ...roleField } : common;
  const polygonPart = v.strictObject({
    ...base,
    type: v.literal('polygon'),
    outer: ring,
    outerBulges: v.optional(bulges),
    holes: v.array(ring, 'an array of rings'),
    holeBulges: v.optional(v.array(bulges, 'an array of bulge arrays, one per hole')),
  }, 'a part object');
  const rectanglePart = v.strictObject({
    ...base,
    type: v.literal('rectangle'),
    width: positive('a positive finite number'),
    height: positive('a positive finite number'),
  }, 'a part object');
  const circlePart = v.strictObject({
    ...base,
    type: v.literal('circle'),
    diameter: positive('a positive finite number'),
  }, 'a part object');
  const shapePart = v.strictObject({
    ...base,
    type: v.literal('shape'),
    shape: v.pipe(text('a part type name'), v.minLength(1, 'a part type name')),
    params: v.record(v.string(), finite(), 'an object of dimensions { symbol: number }'),
    designation: v.optional(text()),
  }, 'a part object');
  return v.variant('type', [polygonPart, rectanglePart, circlePart, shapePart], `a part object with "type" one of ${PART_TYPES.map((t) => `"${t}"`).join(', ')}`);
}

const partV2 = partSchema(false);
const part = partSchema(true);

const jointKind = v.variant('type', [
  v.strictObject({ type: v.literal('welded'), weld: v.picklist(['fillet-one-side', 'fillet-both-sides', 'groove'], '"fillet-one-side", "fillet-both-sides" or "groove"') }, 'a welded joint { type, weld }'),
  v.strictObject({
    type: v.literal('fastened'),
    fastener: v.picklist(['bolt', 'nail', 'screw'], '"bolt", "nail" or "screw"'),
    rows: v.pipe(v.number('a whole number of rows, at least 1'), v.integer('a whole number of rows, at least 1'), v.minValue(1, 'a whole number of rows, at least 1')),
    pitch: v.optional(positive('a positive finite pitch (document unit)')),
  }, 'a fastened joint { type, fastener, rows, pitch? }'),
  v.strictObject({ type: v.literal('glued') }, 'a glued joint { type }'),
  v.strictObject({ type: v.literal('not-connected') }, 'a joint { type: "not-connected" }'),
], 'a joint kind with "type" one of "welded", "fastened", "glued", "not-connected"');

const jointSetting = v.strictObject({
  parts: v.tuple([v.pipe(text('a part id'), v.minLength(1, 'a part id')), v.pipe(text('a part id'), v.minLength(1, 'a part id'))], 'two part ids [a, b]'),
  kind: jointKind,
}, 'a joint object { parts: [a, b], kind }');

const material = v.looseObject({ id: v.pipe(text('a non-empty string'), v.minLength(1, 'a non-empty string')), name: text() }, 'a material object { id, name, … }');

const referenceModulus = v.union(
  [
    v.strictObject({ material: v.pipe(text('a material id'), v.minLength(1, 'a material id')) }),
    v.strictObject({ value: positive('a positive finite modulus'), unit: v.picklist(STRESS_UNITS, `a stress unit: ${STRESS_UNITS.map((u) => `"${u}"`).join(', ')}`) }),
  ],
  'a reference modulus { material: id } or { value, unit }',
);

const nonBlank = (what: string) => v.pipe(text(what), v.check((t) => t.trim().length > 0, what));

const unit = v.picklist(['in', 'ft', 'mm', 'cm', 'm'], 'a length unit: "in", "ft", "mm", "cm" or "m"');

/** Version 1: one section, its parts at the top level (read only through its migration). */
export const version1Schema = v.strictObject({
  format: v.literal(DOCUMENT_FORMAT, `"${DOCUMENT_FORMAT}"`),
  version: v.literal(1, '1'),
  name: text(),
  unit,
  parts: v.array(partV2, 'an array of parts'),
  materials: v.array(material, 'an array of materials'),
  defaultMaterial: v.nullable(text('a material id (string) or null')),
  // Written by development builds between the materials editor and version 2; carried over as it is.
  referenceModulus: v.optional(referenceModulus),
}, 'a Sectionsmith document object');

const sectionV2 = v.strictObject({
  id: nonBlank('a non-empty string'),
  name: nonBlank('a non-empty name (not only spaces)'),
  parts: v.array(partV2, 'an array of parts'),
}, 'a section object { id, name, parts }');

/** Version 2: several sections, cut-outs without a role (read only through its migration). */
export const version2Schema = v.strictObject({
  format: v.literal(DOCUMENT_FORMAT, `"${DOCUMENT_FORMAT}"`),
  version: v.literal(2, '2'),
  name: text(),
  unit,
  materials: v.array(material, 'an array of materials'),
  defaultMaterial: v.nullable(text('a material id (string) or null')),
  referenceModulus: v.optional(referenceModulus),
  sections: v.pipe(v.array(sectionV2, 'an array of sections'), v.minLength(1, 'at least one section')),
}, 'a Sectionsmith document object');

// Member and stress inputs (optional in version 3): physical quantities in SI (m, N, N/m, N·m, Pa).
const pointLoad = v.strictObject({
  P: finite('a finite force in N'),
  a: v.optional(v.pipe(v.number('a position in m from the left end'), v.finite('a position in m from the left end'), v.minValue(0, 'a position in m from the left end, not negative'))),
}, 'a point load { P (N), a? (m) }');
const loadSet = v.strictObject({
  uniform: finite('a finite line load in N/m'),
  points: v.array(pointLoad, 'an array of point loads'),
}, 'a load { uniform (N/m), points }');
const allowable = v.strictObject({
  material: v.pipe(text('a material id'), v.minLength(1, 'a material id')),
  bending: v.optional(positive('a positive allowable stress in Pa')),
  shear: v.optional(positive('a positive allowable stress in Pa')),
}, 'an allowable { material, bending? (Pa), shear? (Pa) }');
const memberInputs = v.strictObject({
  span: positive('a positive span in m'),
  support: v.picklist(MEMBER_SUPPORTS, `a support: ${MEMBER_SUPPORTS.map((x) => `"${x}"`).join(', ')}`),
  dead: loadSet,
  live: loadSet,
  selfWeight: v.boolean('true or false'),
  totalLimit: positive('a positive span ratio (L/ratio)'),
  liveLimit: positive('a positive span ratio (L/ratio)'),
  stressFactor: positive('a positive factor'),
  allowables: v.optional(v.array(allowable, 'an array of allowables')),
}, 'a member case { span, support, dead, live, selfWeight, totalLimit, liveLimit, stressFactor, allowables? }');
const stressInputs = v.strictObject({
  N: finite('a finite force in N'),
  Mx: finite('a finite moment in N·m'),
  My: finite('a finite moment in N·m'),
  Vx: finite('a finite force in N'),
  Vy: finite('a finite force in N'),
}, 'stress forces { N, Mx, My, Vx, Vy } (N, N·m)');

const section = v.strictObject({
  id: nonBlank('a non-empty string'),
  name: nonBlank('a non-empty name (not only spaces)'),
  parts: v.array(part, 'an array of parts'),
  joints: v.optional(v.array(jointSetting, 'an array of joints')),
  member: v.optional(memberInputs),
  stress: v.optional(stressInputs),
}, 'a section object { id, name, parts, joints?, member?, stress? }');

export const documentSchema = v.strictObject({
  format: v.literal(DOCUMENT_FORMAT, `"${DOCUMENT_FORMAT}"`),
  version: v.literal(DOCUMENT_VERSION, `${DOCUMENT_VERSION}`),
  name: text(),
  unit,
  materials: v.array(material, 'an array of materials'),
  defaultMaterial: v.nullable(text('a material id (string) or null')),
  referenceModulus: v.optional(referenceModulus),
  sections: v.pipe(v.array(section, 'an array of sections'), v.minLength(1, 'at least one section')),
}, 'a Sectionsmith document object');

/** A short description of a JSON value for "got …" (strings quoted, long things abbreviated). */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing (the key is missing)';
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 37)}...` : value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return `an array of ${value.length} item${value.length === 1 ? '' : 's'}`;
  if (typeof value === 'object') return 'an object';
  return typeof value;
}

/** Joins path keys the way a reader writes them: parts[2].placement.rotationDeg. */
export function jsonPath(keys: readonly (string | number)[]): string {
  let out = '';
  for (const key of keys) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += /^[A-Za-z_$][\w$]*$/.test(key) ? (out ? `.${key}` : key) : `[${JSON.stringify(key)}]`;
  }
  return out;
}

type AnyIssue = v.BaseIssue<unknown>;

function issueToDocumentIssue(issue: AnyIssue): DocumentIssue {
  const keys = (issue.path ?? []).map((item) => item.key as string | number);
  const path = jsonPath(keys);
  const where = path || '(top level)';
  const objectType = issue.type === 'strict_object' || issue.type === 'loose_object' || issue.type === 'object';
  if (objectType && issue.input === undefined && keys.length > 0) {
    const key = keys[keys.length - 1];
    const parent = jsonPath(keys.slice(0, -1)) || 'the document';
    return { path, message: `${where}: expected the key ${JSON.stringify(key)} in ${parent}, got nothing (the key is missing)` };
  }
  if (issue.type === 'strict_object' && issue.input !== undefined) {
    // valibot reports an unknown key with the key as the last path item.
    const key = keys[keys.length - 1];
    const parent = jsonPath(keys.slice(0, -1)) || 'the document';
    return { path, message: `${where}: unexpected key ${JSON.stringify(key)} in ${parent}; check its spelling against the format` };
  }
  return { path, message: `${where}: expected ${issue.message}, got ${describeValue(issue.input)}` };
}

/** Duplicate material ids, and a default material that is not in the list; returns the known ids. */
function materialIssues(materials: readonly MaterialRef[], defaultMaterial: string | null, issues: DocumentIssue[]): ReadonlySet<string> {
  const ids = new Set<string>();
  materials.forEach((m, i) => {
    if (ids.has(m.id)) issues.push({ path: `materials[${i}].id`, message: `materials[${i}].id: expected a unique id, got ${JSON.stringify(m.id)} again` });
    ids.add(m.id);
  });
  if (defaultMaterial !== null && !ids.has(defaultMaterial)) {
    issues.push({ path: 'defaultMaterial', message: `defaultMaterial: expected the id of an entry in materials or null, got ${JSON.stringify(defaultMaterial)}` });
  }
  return ids;
}

/** Part ids unique in the list, materials known, one bulge per segment; `at` is the list's path ('parts', 'sections[1].parts'). */
function partListIssues(parts: readonly Part[], at: string, materialIds: ReadonlySet<string>, issues: DocumentIssue[]): void {
  const partIds = new Set<string>();
  parts.forEach((p, i) => {
    const here = `${at}[${i}]`;
    if (partIds.has(p.id)) issues.push({ path: `${here}.id`, message: `${here}.id: expected a unique id, got ${JSON.stringify(p.id)} again` });
    partIds.add(p.id);
    if (p.material !== null && !materialIds.has(p.material)) issues.push({ path: `${here}.material`, message: `${here}.material: expected the id of an entry in materials or null, got ${JSON.stringify(p.material)}` });
    if (p.cutoutRole !== undefined && p.operation !== 'subtract') issues.push({ path: `${here}.cutoutRole`, message: `${here}.cutoutRole: a cut-out role belongs to a subtract part, but this part adds material (remove the key or make the part subtract)` });
    if (p.type !== 'polygon') return;
    if (p.outerBulges && p.outerBulges.length !== p.outer.length) {
      issues.push({ path: `${here}.outerBulges`, message: `${here}.outerBulges: expected ${p.outer.length} bulges (one per segment of outer), got ${p.outerBulges.length}` });
    }
    if (p.holeBulges) {
      if (p.holeBulges.length !== p.holes.length) {
        issues.push({ path: `${here}.holeBulges`, message: `${here}.holeBulges: expected ${p.holes.length} bulge arrays (one per hole), got ${p.holeBulges.length}` });
      } else {
        p.holeBulges.forEach((b, h) => {
          const n = p.holes[h]?.length ?? 0;
          if (b.length !== n) issues.push({ path: `${here}.holeBulges[${h}]`, message: `${here}.holeBulges[${h}]: expected ${n} bulges (one per segment of holes[${h}]), got ${b.length}` });
        });
      }
    }
  });
}

/** Joints name two different parts of their own section, and each pair once; `at` is the section's path. */
function jointIssues(joints: readonly JointSetting[], parts: readonly Part[], at: string, issues: DocumentIssue[]): void {
  const ids = new Set(parts.map((p) => p.id));
  const pairs = new Map<string, number>();
  joints.forEach((j, k) => {
    const here = `${at}.joints[${k}]`;
    j.parts.forEach((id, s) => {
      if (!ids.has(id)) issues.push({ path: `${here}.parts[${s}]`, message: `${here}.parts[${s}]: expected the id of a part of this section, got ${JSON.stringify(id)}` });
    });
    if (j.parts[0] === j.parts[1]) issues.push({ path: `${here}.parts`, message: `${here}.parts: expected two different parts, got ${JSON.stringify(j.parts[0])} twice` });
    const key = [...j.parts].sort().join('\u0000');
    const earlier = pairs.get(key);
    if (earlier !== undefined) issues.push({ path: `${here}.parts`, message: `${here}.parts: the joint between ${JSON.stringify(j.parts[0])} and ${JSON.stringify(j.parts[1])} is already given at ${at}.joints[${earlier}]` });
    else pairs.set(key, k);
  });
}

/**
 * Allowables naming a material of the file, once each. (A point load beyond the span is not a
 * file error: the member check refuses it with its position, so the case stays editable.)
 */
function memberIssues(m: MemberInputs, at: string, materialIds: ReadonlySet<string>, issues: DocumentIssue[]): void {
  const seen = new Set<string>();
  (m.allowables ?? []).forEach((x, k) => {
    const here = `${at}.member.allowables[${k}].material`;
    if (!materialIds.has(x.material)) issues.push({ path: here, message: `${here}: expected the id of an entry in materials, got ${JSON.stringify(x.material)}` });
    if (seen.has(x.material)) issues.push({ path: here, message: `${here}: ${JSON.stringify(x.material)} has an allowable already` });
    seen.add(x.material);
  });
}

/** Cross-field problems of a version 2 document (paths as in that file). */
export function version2Issues(doc: { readonly sections: readonly { readonly parts: readonly Part[] }[]; readonly materials: readonly MaterialRef[]; readonly defaultMaterial: string | null }): DocumentIssue[] {
  const issues: DocumentIssue[] = [];
  const ids = materialIssues(doc.materials, doc.defaultMaterial, issues);
  doc.sections.forEach((s, k) => partListIssues(s.parts, `sections[${k}].parts`, ids, issues));
  return issues;
}

/** Cross-field problems of a version 1 document (paths as in that file: parts[2]…). */
export function version1Issues(doc: { readonly parts: readonly Part[]; readonly materials: readonly MaterialRef[]; readonly defaultMaterial: string | null }): DocumentIssue[] {
  const issues: DocumentIssue[] = [];
  const ids = materialIssues(doc.materials, doc.defaultMaterial, issues);
  partListIssues(doc.parts, 'parts', ids, issues);
  return issues;
}

/** Problems across fields that the per-field schema cannot see. */
function crossFieldIssues(doc: SectionFile): DocumentIssue[] {
  const issues: DocumentIssue[] = [];
  const materialIds = materialIssues(doc.materials, doc.defaultMaterial, issues);
  const ref = doc.referenceModulus;
  if (ref !== undefined && 'material' in ref && !materialIds.has(ref.material)) {
    issues.push({ path: 'referenceModulus.material', message: `referenceModulus.material: expected the id of an entry in materials, got ${JSON.stringify(ref.material)}` });
  }
  const sectionIds = new Set<string>();
  const sectionNames = new Map<string, number>();
  doc.sections.forEach((s, k) => {
    const at = `sections[${k}]`;
    if (sectionIds.has(s.id)) issues.push({ path: `${at}.id`, message: `${at}.id: expected a unique section id, got ${JSON.stringify(s.id)} again` });
    sectionIds.add(s.id);
    const key = s.name.trim();
    const earlier = sectionNames.get(key);
    if (earlier !== undefined) issues.push({ path: `${at}.name`, message: `${at}.name: expected a name no other section has, got ${JSON.stringify(s.name)}, already the name of sections[${earlier}]` });
    else sectionNames.set(key, k);
    partListIssues(s.parts, `${at}.parts`, materialIds, issues);
    if (s.joints !== undefined) jointIssues(s.joints, s.parts, at, issues);
    if (s.member !== undefined) memberIssues(s.member, at, materialIds, issues);
  });
  return issues;
}

export type ValidationResult = { readonly ok: true; readonly document: SectionFile } | { readonly ok: false; readonly issues: readonly DocumentIssue[] };

/** Validates a parsed JSON value against the current format; never throws on user data. */
/**
 * The most vertices (outline points, over every section) one document may hold: a million-vertex
 * section computes in a second or two; past a few million the tool can no longer answer while
 * someone waits, so the document is refused with its count and this limit.
 */
export const MAX_DOCUMENT_VERTICES = 2_000_000;

/**
 * The refusal for more than MAX_DOCUMENT_VERTICES vertices, or null within the limit: one wording
 * for documents and GeoJSON files (`holder` is "the document holds … outline vertices" or "the file
 * holds … vertices").
 */
export function tooManyVertices(count: number, holder: 'the document holds' | 'the file holds', what: 'outline vertices' | 'vertices'): string | null {
  if (count <= MAX_DOCUMENT_VERTICES) return null;
  return `${holder} ${count.toLocaleString('en-US')} ${what}, more than this build computes (${MAX_DOCUMENT_VERTICES.toLocaleString('en-US')}); simplify or split the outlines`;
}

function vertexCount(file: SectionFile): number {
  let n = 0;
  for (const section of file.sections) {
    for (const part of section.parts) {
      if (part.type !== 'polygon') continue;
      n += part.outer.length;
      for (const hole of part.holes) n += hole.length;
    }
  }
  return n;
}

export function validateDocument(value: unknown): ValidationResult {
  const result = v.safeParse(documentSchema, value, { abortEarly: false });
  if (!result.success) return { ok: false, issues: result.issues.map(issueToDocumentIssue) };
  const document = result.output as SectionFile;
  const tooMany = tooManyVertices(vertexCount(document), 'the document holds', 'outline vertices');
  if (tooMany !== null) return { ok: false, issues: [{ path: '', message: tooMany }] };
  const issues = crossFieldIssues(document);
  return issues.length > 0 ? { ok: false, issues } : { ok: true, document };
}

/** Runs a valibot schema and converts its issues (used by the migrations for older layouts). */
export function issuesOf(schema: v.GenericSchema, value: unknown): readonly DocumentIssue[] {
  const result = v.safeParse(schema, value, { abortEarly: false });
  return result.success ? [] : result.issues.map(issueToDocumentIssue);
}
