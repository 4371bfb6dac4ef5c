// Random Sectionsmith documents, valid and invalid, and the pipeline every one is taken through:
// text → load (parse, migrate, validate) → every section composed → properties → CSV and SVG.
// Shared by tests/hardening/random-documents.test.ts (10⁴ cases, fixed seed, in `npm test`) and
// tests/bench/fuzz.bench.ts (10⁵ cases). Issue 18 §3.
import fc from 'fast-check';
import { parseDocument, allSectionViews, type SectionDocument } from '../../core/document/index.ts';
import { propertiesCsv, sectionSvg } from '../../core/export/index.ts';
import { BooleanError } from '../../core/geometry/boolean.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';

type Point = [number, number];
type Json = Record<string, unknown>;

const coordinate = fc.double({ min: -500, max: 500, noNaN: true, noDefaultInfinity: true });
const size = fc.double({ min: 0.5, max: 300, noNaN: true, noDefaultInfinity: true });
const placement = fc.record({
  x: coordinate,
  y: coordinate,
  rotationDeg: fc.oneof(fc.constantFrom(0, 90, 180, -90), fc.double({ min: -180, max: 180, noNaN: true })),
  mirror: fc.boolean(),
});

/** A star-shaped polygon around the origin (valid by construction), 3–12 vertices, counter-clockwise. */
const starPolygon = fc.array(fc.double({ min: 5, max: 200, noNaN: true }), { minLength: 3, maxLength: 12 }).map((radii): Point[] =>
  radii.map((r, i) => [r * Math.cos((2 * Math.PI * i) / radii.length), r * Math.sin((2 * Math.PI * i) / radii.length)]),
);
/** Any points at all: often self-intersecting or degenerate, which must be refused cleanly. */
const anyPoints = fc.array(fc.tuple(coordinate, coordinate), { minLength: 0, maxLength: 8 }).map((ps): Point[] => ps.map(([x, y]) => [x, y]));

const common = (id: string) => ({
  id: fc.constant(id),
  name: fc.string({ maxLength: 12 }),
  placement,
  operation: fc.constantFrom('add', 'add', 'add', 'subtract'),
  material: fc.constant(null),
  visible: fc.constantFrom(true, true, true, false),
});

const part = (id: string): fc.Arbitrary<Json> => fc.oneof(
  fc.record({ ...common(id), type: fc.constant('rectangle'), width: size, height: size }),
  fc.record({ ...common(id), type: fc.constant('circle'), diameter: size }),
  fc.record({ ...common(id), type: fc.constant('polygon'), outer: fc.oneof(starPolygon, starPolygon, anyPoints), holes: fc.constant([]) }),
  fc.record({ ...common(id), type: fc.constant('shape'), shape: fc.constant('plate'), params: fc.record({ b: size, t: size }) }),
  fc.record({
    ...common(id), type: fc.constant('shape'), shape: fc.constant('i-shape'),
    params: fc.record({ d: fc.double({ min: 4, max: 40, noNaN: true }), bf: fc.double({ min: 2, max: 20, noNaN: true }), tw: fc.double({ min: 0.1, max: 1.5, noNaN: true }), tf: fc.double({ min: 0.1, max: 1.5, noNaN: true }) }),
  }),
);

const validFile: fc.Arbitrary<Json> = fc.tuple(fc.constantFrom('mm', 'cm', 'm', 'in', 'ft'), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 2 })).chain(([unit, parts, sections]) =>
  fc.tuple(...Array.from({ length: sections }, () => fc.tuple(...Array.from({ length: parts }, (_, k) => part(`p${k + 1}`))))).map((list) => ({
    format: 'sectionsmith-section',
    version: 3,
    name: 'random',
    unit,
    materials: [],
    defaultMaterial: null,
    sections: list.map((ps, s) => ({ id: `s${s + 1}`, name: `alternative ${s + 1}`, parts: ps })),
  })),
);

/** What a broken value may be replaced with. */
const junk = fc.oneof(
  fc.constant(null), fc.constant('oops'), fc.constant(-1), fc.constant(0), fc.constant(1e308), fc.constant(-1e308),
  fc.constant(1e-320), fc.constant([]), fc.constant({}), fc.constant([1, 2, 3]), fc.constant('constructor'), fc.constant(true),
);

/** Every path to a value inside a JSON value. */
function paths(value: unknown, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (Array.isArray(value)) value.forEach((v, i) => { out.push([...prefix, i]); paths(v, [...prefix, i], out); });
  else if (typeof value === 'object' && value !== null) for (const [k, v] of Object.entries(value)) { out.push([...prefix, k]); paths(v, [...prefix, k], out); }
  return out;
}

function mutate(file: Json, pick: number, kind: number, replacement: unknown): string {
  const copy = structuredClone(file);
  const all = paths(copy);
  const path = all[pick % all.length]!;
  let parent: unknown = copy;
  for (const key of path.slice(0, -1)) parent = (parent as Record<string | number, unknown>)[key];
  const last = path[path.length - 1]!;
  const holder = parent as Record<string | number, unknown>;
  if (kind === 0) delete holder[last];
  else if (kind === 1) holder[last] = replacement;
  else if (kind === 2 && typeof last === 'string') holder[`${last}Extra`] = replacement;
  else if (kind === 3) {
    const text = JSON.stringify(copy);
    return text.slice(0, Math.floor((pick % 997) / 997 * text.length));
  } else holder[last] = replacement;
  return JSON.stringify(copy);
}

/** A document text and whether it was left valid (invalid ones may still happen to be valid). */
export const randomDocumentText: fc.Arbitrary<{ text: string; mutated: boolean; file: Json }> = fc.oneof(
  validFile.map((file) => ({ text: JSON.stringify(file), mutated: false, file })),
  fc.tuple(validFile, fc.nat(), fc.integer({ min: 0, max: 4 }), junk).map(([file, pick, kind, replacement]) => ({ text: mutate(file, pick, kind, replacement), mutated: true, file })),
);

/** Errors the project throws on purpose; anything else from the pipeline is a bug. */
const TYPED_ERRORS = [BooleanError];

export interface PipelineResult {
  /** Properties of each section that composed cleanly (null where it did not). */
  readonly properties: readonly (SectionProperties | null)[];
}

/** Runs a document text through load, validate, compose, properties and the exports; throws only on a bug. */
export function runPipeline(text: string): PipelineResult {
  const parsed = parseDocument(text, 'random.section.json');
  if (!parsed.ok) {
    if (parsed.errors.length === 0) throw new Error('a refused document must say why');
    return { properties: [] };
  }
  return { properties: allSectionViews(parsed.file).map(({ doc }) => sectionResult(doc)) };
}

function sectionResult(doc: SectionDocument): SectionProperties | null {
  try {
    const section = sectionFromDocument(doc);
    if (section.diagnostics.some((d) => d.message.trim() === '')) throw new Error('a diagnostic without a message');
    sectionSvg({ name: doc.name, unit: doc.unit, section });
    if (section.properties === null) return null;
    propertiesCsv({ name: doc.name, unit: doc.unit, properties: section.properties });
    return section.properties;
  } catch (err) {
    if (TYPED_ERRORS.some((type) => err instanceof type)) return null;
    throw err;
  }
}

/** The transforms properties must not notice (apart from the centroid's shift under translation). */
export type Invariance = 'translate' | 'rotate-vertices' | 'reverse';

/** The file with every part moved by (dx, dy), or with its polygon outlines renumbered or reversed. */
export function transformed(file: Json, how: Invariance, dx: number, dy: number, shift: number): Json {
  const copy = structuredClone(file) as { sections: { parts: Json[] }[] };
  for (const section of copy.sections) {
    for (const p of section.parts) {
      const pl = p.placement as { x: number; y: number };
      if (how === 'translate') { pl.x += dx; pl.y += dy; continue; }
      if (p.type !== 'polygon') continue;
      const outer = p.outer as Point[];
      if (outer.length === 0) continue;
      if (how === 'rotate-vertices') {
        const k = shift % outer.length;
        p.outer = [...outer.slice(k), ...outer.slice(0, k)];
      } else p.outer = [...outer].reverse();
    }
  }
  return copy as unknown as Json;
}

/** Largest relative difference of the size-invariant properties, scaled by the section's own size. */
export function propertyDifference(a: SectionProperties, b: SectionProperties, dx: number, dy: number): number {
  const L = Math.max(a.xMax - a.xMin, a.yMax - a.yMin);
  const I = Math.max(Math.abs(a.Ix), Math.abs(a.Iy), L ** 4 * 1e-12);
  const diffs = [
    Math.abs(a.area - b.area) / Math.max(Math.abs(a.area), L * L * 1e-12),
    Math.abs(a.cx + dx - b.cx) / L,
    Math.abs(a.cy + dy - b.cy) / L,
    Math.abs(a.Ix - b.Ix) / I,
    Math.abs(a.Iy - b.Iy) / I,
    Math.abs(a.Ixy - b.Ixy) / I,
  ];
  return Math.max(...diffs);
}
