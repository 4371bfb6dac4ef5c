/**
 * Document migrations: one small `up` per version, run in order, then the result is validated
 * against the current schema (STYLE.md §6).
 *
 * Version history
 *   0  pre-release layout, used while the format was being designed and never published as a
 *      release. Kept so the migration path is exercised by a real step with its own test:
 *      `units` (not `unit`); parts carry `kind`, a flat `x`, `y`, `angle` (degrees), `flip`,
 *      and `subtract: boolean`; no ids, materials or visibility.
 *   1  the first released format: one section, `parts` at the top level beside `name`, `unit`,
 *      `materials`, `defaultMaterial`.
 *   2  several named sections (alternatives) in one file: the document-wide fields stay at the
 *      top, the parts move into `sections: [{ id, name, parts }]` (core/document/types.ts).
 *      A version 1 file becomes one section with id "s1", named after the document
 *      ("Section 1" when the document's name is blank).
 *   3  a cut-out (subtract part) has a role, `cutoutRole`: "fastener-hole" (a net-section
 *      deduction only) or "void" (missing along the member); a section may hold `joints`, the
 *      kinds the user gave the joints between its parts. Every cut-out of a version 2 file meant
 *      material missing along the member (that is how every property used it), so each one
 *      becomes a "void", written out; a version 2 file has no joints, so every joint starts at
 *      its default kind.
 *
 * A file newer than this build is rejected with "document is version 7; this build reads up to 3"
 * rather than guessed at. Each `up` receives a value already checked against its own version's
 * schema (and `check`, for rules across fields), so it can be written plainly.
 */
import * as v from 'valibot';
import { DOCUMENT_FORMAT, DOCUMENT_VERSION } from './types.ts';
import { describeValue, issuesOf, version1Issues, version1Schema, version2Issues, version2Schema, type DocumentIssue } from './schema.ts';

const finite = v.pipe(v.number('a finite number'), v.finite('a finite number'));
const point = v.tuple([finite, finite], 'a point [x, y] of two finite numbers');
const ring = v.array(point, 'an array of points [x, y]');

/** The version 0 layout, strict enough that its `up` needs no guessing. */
const version0Part = v.variant('kind', [
  v.object({ kind: v.literal('polygon'), name: v.optional(v.string('a string')), x: finite, y: finite, angle: finite, flip: v.optional(v.boolean('true or false')), subtract: v.optional(v.boolean('true or false')), outer: ring, holes: v.optional(v.array(ring, 'an array of rings')) }),
  v.object({ kind: v.literal('rectangle'), name: v.optional(v.string('a string')), x: finite, y: finite, angle: finite, flip: v.optional(v.boolean('true or false')), subtract: v.optional(v.boolean('true or false')), width: finite, height: finite }),
  v.object({ kind: v.literal('circle'), name: v.optional(v.string('a string')), x: finite, y: finite, angle: finite, flip: v.optional(v.boolean('true or false')), subtract: v.optional(v.boolean('true or false')), diameter: finite }),
], 'a version 0 part with "kind" "polygon", "rectangle" or "circle"');

const version0 = v.object({
  format: v.literal(DOCUMENT_FORMAT, `"${DOCUMENT_FORMAT}"`),
  version: v.literal(0, '0'),
  name: v.optional(v.string('a string')),
  units: v.picklist(['in', 'ft', 'mm', 'cm', 'm'], 'a length unit: "in", "ft", "mm", "cm" or "m"'),
  parts: v.array(version0Part, 'an array of parts'),
});

type Version0 = v.InferOutput<typeof version0>;

function upFrom0(doc: Version0): unknown {
  return {
    format: DOCUMENT_FORMAT,
    version: 1,
    name: doc.name ?? 'Untitled section',
    unit: doc.units,
    parts: doc.parts.map((p, i) => {
      const common = {
        id: `p${i + 1}`,
        name: p.name ?? `${p.kind} ${i + 1}`,
        placement: { x: p.x, y: p.y, rotationDeg: p.angle, mirror: p.flip ?? false },
        operation: p.subtract ? 'subtract' : 'add',
        material: null,
        visible: true,
      };
      if (p.kind === 'polygon') return { ...common, type: 'polygon', outer: p.outer, holes: p.holes ?? [] };
      if (p.kind === 'rectangle') return { ...common, type: 'rectangle', width: p.width, height: p.height };
      return { ...common, type: 'circle', diameter: p.diameter };
    }),
    materials: [],
    defaultMaterial: null,
  };
}

type Version1 = v.InferOutput<typeof version1Schema>;

/** The name a version 1 document's only section gets. */
export const FIRST_SECTION_ID = 's1';

function upFrom1(doc: Version1): unknown {
  return {
    format: DOCUMENT_FORMAT,
    version: 2,
    name: doc.name,
    unit: doc.unit,
    materials: doc.materials,
    defaultMaterial: doc.defaultMaterial,
    ...(doc.referenceModulus !== undefined ? { referenceModulus: doc.referenceModulus } : {}),
    sections: [{ id: FIRST_SECTION_ID, name: doc.name.trim() === '' ? 'Section 1' : doc.name, parts: doc.parts }],
  };
}

type Version2 = v.InferOutput<typeof version2Schema>;

/** Version 2 → 3: every cut-out is read as a void, as version 2 computed it. */
function upFrom2(doc: Version2): unknown {
  return {
    ...doc,
    version: 3,
    sections: doc.sections.map((s) => ({ ...s, parts: s.parts.map((p) => (p.operation === 'subtract' ? { ...p, cutoutRole: 'void' } : p)) })),
  };
}

export interface Migration {
  /** The version this step reads; it produces version `from + 1`. */
  readonly from: number;
  readonly schema: v.GenericSchema;
  /** Rules across fields of that version, reported with the paths of that version's layout. */
  readonly check?: (doc: never) => readonly DocumentIssue[];
  readonly up: (doc: never) => unknown;
}

/** MIGRATIONS[k] upgrades version k to k + 1; its length is DOCUMENT_VERSION. */
export const MIGRATIONS: readonly Migration[] = [
  { from: 0, schema: version0, up: upFrom0 as (doc: never) => unknown },
  { from: 1, schema: version1Schema, check: version1Issues as (doc: never) => readonly DocumentIssue[], up: upFrom1 as (doc: never) => unknown },
  { from: 2, schema: version2Schema, check: version2Issues as (doc: never) => readonly DocumentIssue[], up: upFrom2 as (doc: never) => unknown },
];

export const OLDEST_READABLE_VERSION = DOCUMENT_VERSION - MIGRATIONS.length;

export type MigrationResult =
  | { readonly ok: true; readonly value: unknown; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly issues: readonly DocumentIssue[] };

/**
 * Brings a parsed document of any readable version up to DOCUMENT_VERSION (not yet validated
 * against the current schema: the caller does that, so every document takes the same path).
 */
export function migrateToCurrent(value: unknown): MigrationResult {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { ok: false, issues: [{ path: '', message: `(top level): expected a Sectionsmith document object, got ${describeValue(value)}` }] };
  }
  const version = (value as { version?: unknown }).version;
  if (typeof version !== 'number' || !Number.isInteger(version)) {
    return { ok: false, issues: [{ path: 'version', message: `version: expected a whole number (this build reads ${OLDEST_READABLE_VERSION} to ${DOCUMENT_VERSION}), got ${describeValue(version)}` }] };
  }
  if (version > DOCUMENT_VERSION) {
    return { ok: false, issues: [{ path: 'version', message: `document is version ${version}; this build reads up to ${DOCUMENT_VERSION}. Open it with a newer Sectionsmith.` }] };
  }
  if (version < OLDEST_READABLE_VERSION) {
    return { ok: false, issues: [{ path: 'version', message: `document is version ${version}; this build reads versions ${OLDEST_READABLE_VERSION} to ${DOCUMENT_VERSION}` }] };
  }
  let current: unknown = value;
  for (let k = version; k < DOCUMENT_VERSION; k++) {
    const step = MIGRATIONS[k - OLDEST_READABLE_VERSION];
    if (!step) return { ok: false, issues: [{ path: 'version', message: `no migration from version ${k}` }] };
    const issues = issuesOf(step.schema, current);
    const parsed = issues.length === 0 ? (v.parse(step.schema, current) as never) : null;
    const all = parsed !== null && step.check ? step.check(parsed) : issues;
    // Problems in the file's own layout say so; later steps check what an earlier step produced.
    if (all.length > 0) return { ok: false, issues: k === version ? all.map((i) => ({ ...i, message: `${i.message} (version ${k} layout)` })) : all };
    current = step.up(parsed as never);
  }
  return { ok: true, value: current, migratedFrom: version === DOCUMENT_VERSION ? null : version };
}
