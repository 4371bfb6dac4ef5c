/**
 * Reading opened text as a document: a Sectionsmith document (core/document) or a GeoJSON
 * shape (core/geojson), whose coordinates are taken in the current document unit, one outline
 * part per polygon (holes kept as its holes). Every problem comes back as plain sentences.
 * `file` is the whole file (every section); `doc` is its first section's view, for callers that
 * take one section (allSectionViews(file) gives them all).
 */
import { allSectionViews, fileFromSection, parseDocument, parseJson, newDocument, type SectionDocument, type SectionFile, type PolygonPart } from '../../core/document/index.ts';
import { regionFromDocument } from '../../core/section/index.ts';
import { isGeoJson, regionFromGeoJson } from '../../core/geojson.ts';
import type { Ring } from '../../core/geometry/types.ts';
import type { LengthUnit } from '../../core/units/index.ts';

export type OpenResult = { readonly ok: true; readonly file: SectionFile; readonly doc: SectionDocument; readonly note?: string } | { readonly ok: false; readonly errors: readonly string[] };

function points(ring: Ring): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < ring.xy.length; i += 2) out.push([ring.xy[i] as number, ring.xy[i + 1] as number]);
  return out;
}

function stem(name: string): string {
  return name.replace(/\.(section\.json|geojson|json)$/i, '') || 'Imported shape';
}

export function documentFromText(text: string, fileName: string, unit: LengthUnit): OpenResult {
  const json = parseJson(text);
  if (json.ok && isGeoJson(json.value)) {
    const r = regionFromGeoJson(json.value);
    if (!r.ok) return { ok: false, errors: r.errors.map((e) => `${fileName}: ${e.message}`) };
    const parts: PolygonPart[] = r.region.map((poly, k) => ({
      id: `part-${k + 1}`,
      name: r.region.length === 1 ? stem(fileName) : `${stem(fileName)} ${k + 1}`,
      type: 'polygon',
      operation: 'add',
      material: null,
      visible: true,
      placement: { x: 0, y: 0, rotationDeg: 0, mirror: false },
      outer: points(poly.outer),
      holes: poly.holes.map(points),
    }));
    const doc: SectionDocument = { ...newDocument(unit, stem(fileName)), parts };
    const file = fileFromSection(doc);
    const far = outOfRange(file, fileName);
    if (far.length > 0) return { ok: false, errors: far };
    return { ok: true, file, doc, note: `GeoJSON coordinates read in ${unit}, the document unit.` };
  }
  const parsed = parseDocument(text, fileName);
  if (!parsed.ok) return { ok: false, errors: parsed.errors.map((e) => (e.line !== undefined ? `${e.message}` : e.message)) };
  const far = outOfRange(parsed.file, fileName);
  if (far.length > 0) return { ok: false, errors: far };
  return { ok: true, file: parsed.file, doc: parsed.document, ...(parsed.migratedFrom !== null ? { note: `Read from document version ${parsed.migratedFrom}; it will be saved in the current version.` } : {}) };
}

/**
 * Parts beyond the coordinate limits (core/geometry MAX_COORDINATE, MIN_EXTENT), in the words the
 * command line uses: such a file is refused on opening, as `sectionsmith props` refuses it,
 * rather than opened into a view that cannot be drawn (a part at 1e20 froze the editor).
 */
function outOfRange(file: SectionFile, fileName: string): string[] {
  const out: string[] = [];
  for (const { name, doc } of allSectionViews(file)) {
    for (const d of regionFromDocument(doc).diagnostics) {
      if (d.code === 'too-large' || d.code === 'too-small') out.push(`${fileName}${file.sections.length > 1 ? ` (section "${name}")` : ''}: ${d.message}`);
    }
  }
  return out;
}
