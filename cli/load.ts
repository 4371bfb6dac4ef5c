/**
 * Reading a section file for the commands: a Sectionsmith document or a GeoJSON area, into
 * section properties. Every problem becomes a message that names the file and the place
 * (line/column for JSON syntax, the JSON path for structure, part/ring/vertex for geometry).
 * A document may hold several sections (alternatives): the first is read unless one is named
 * (--section NAME); an unknown name is an error that lists the names the file has.
 */
import { documentFromJson, findSection, parseJson, sectionView, type SectionDocument } from '../core/document/index.ts';
import type { Diagnostic, Region } from '../core/geometry/types.ts';
import { normaliseRegion, validateRegion } from '../core/geometry/index.ts';
import { geoJsonPathOf, isGeoJson, regionFromGeoJson } from '../core/geojson.ts';
import { sectionProperties } from '../core/properties/index.ts';
import type { SectionProperties } from '../core/properties/types.ts';
import { type ComposedPart, sectionFromDocument } from '../core/section/index.ts';
import { isLengthUnit, type LengthUnit } from '../core/units/index.ts';
import type { CliIo } from './command.ts';

export interface LoadedSection {
  readonly kind: 'document' | 'geojson';
  /** The section's name for a document (the file name for GeoJSON). */
  readonly name: string;
  /** Documents: the chosen section's one-section view, the document's own name, and which section of how many. */
  readonly doc?: SectionDocument;
  readonly documentName?: string;
  readonly sectionIndex?: number;
  readonly sectionCount?: number;
  readonly unit: LengthUnit;
  readonly region: Region;
  readonly properties: SectionProperties;
  /** Parts used / left out (documents only; 0 for GeoJSON). */
  readonly parts: number;
  readonly hiddenParts: number;
}

export type LoadResult = { readonly ok: true; readonly section: LoadedSection } | { readonly ok: false; readonly messages: readonly string[] };

/** The JSON path of a diagnostic inside a document part (vertex paths only for polygon parts); `list` is the parts' path in the file. */
function partPath(list: string, composed: ComposedPart, d: Diagnostic): string {
  const base = `${list}[${composed.index}]`;
  if (composed.part.type !== 'polygon' || d.ring === undefined) return base;
  const ring = d.ring < 0 ? `${base}.outer` : `${base}.holes[${d.ring}]`;
  return d.vertex === undefined ? ring : `${ring}[${d.vertex}]`;
}

/** How a person names the sections: "A", "B", "C". */
export function sectionNames(names: readonly string[]): string {
  return names.map((n) => JSON.stringify(n)).join(', ');
}

function fromDocument(file: string, value: unknown, sectionName: string | undefined): LoadResult {
  const parsed = documentFromJson(value);
  if (!parsed.ok) return { ok: false, messages: parsed.errors.map((e) => `${file}: ${e.message}`) };
  const whole = parsed.file;
  const chosen = sectionName === undefined ? whole.sections[0] : findSection(whole, sectionName);
  if (!chosen) {
    return { ok: false, messages: [`${file}: --section: no section named ${JSON.stringify(sectionName)}; the sections are ${sectionNames(whole.sections.map((s) => s.name))}`] };
  }
  const index = whole.sections.indexOf(chosen);
  const doc = sectionView(whole, chosen.id);
  // Paths as in the user's file: a file read from the one-section layout has its parts at the top.
  const list = parsed.migratedFrom !== null && parsed.migratedFrom < 2 ? 'parts' : `sections[${index}].parts`;
  const result = sectionFromDocument(doc);
  if (result.properties === null) {
    const messages: string[] = [];
    const perPart = new Set<Diagnostic>();
    for (const composed of result.parts) {
      for (const d of composed.diagnostics) {
        perPart.add(d);
        messages.push(`${file}: ${partPath(list, composed, d)}: ${d.message}`);
      }
    }
    for (const d of result.diagnostics) if (!perPart.has(d)) messages.push(`${file}: ${d.message}`);
    return { ok: false, messages };
  }
  return {
    ok: true,
    section: {
      kind: 'document', name: doc.name, doc, documentName: whole.name, sectionIndex: index, sectionCount: whole.sections.length,
      unit: doc.unit, region: result.region, properties: result.properties, parts: result.parts.length, hiddenParts: result.hiddenParts,
    },
  };
}

/** A GeoJSON file read into a region, before validation; the parsed JSON is not kept. */
interface GeoJsonRead {
  readonly kind: 'geojson';
  readonly unit: LengthUnit;
  readonly region: Region;
  readonly sources: readonly string[];
}

function readGeoJson(file: string, value: unknown, unit: LengthUnit | undefined): GeoJsonRead | LoadFailure {
  if (unit === undefined) {
    return { ok: false, messages: [`${file}: GeoJSON carries no length unit; say what its coordinates are with --unit in|ft|mm|cm|m`] };
  }
  const read = regionFromGeoJson(value);
  if (!read.ok) return { ok: false, messages: read.errors.map((e) => `${file}: ${e.message}`) };
  return { kind: 'geojson', unit, region: read.region, sources: read.sources };
}

function fromGeoJson(file: string, read: GeoJsonRead): LoadResult {
  // Validate before normalising, so ring and vertex indices are the file's own positions.
  const diagnostics = validateRegion(read.region);
  if (diagnostics.length > 0) {
    return { ok: false, messages: diagnostics.map((d) => `${file}: ${geoJsonPathOf(read.sources, d.polygon ?? 0, d.ring, d.vertex)}: ${d.message}`) };
  }
  const region = normaliseRegion(read.region);
  return { ok: true, section: { kind: 'geojson', name: file, unit: read.unit, region, properties: sectionProperties(region), parts: 0, hiddenParts: 0 } };
}

type LoadFailure = { readonly ok: false; readonly messages: readonly string[] };

/**
 * Reads and parses FILE. A GeoJSON file comes back as its region only: the text and the parsed
 * JSON (for a million vertices, about 100 MB of small arrays) become garbage before any
 * computing starts, so the collector does not trace them again and again during it.
 */
function readSectionFile(file: string, io: CliIo, geoJsonUnit: LengthUnit | undefined): GeoJsonRead | { readonly kind: 'document'; readonly value: unknown } | LoadFailure {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (err) {
    const code = (err as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : code === 'EACCES' ? 'permission denied' : err instanceof Error ? err.message : String(err);
    return { ok: false, messages: [`${file}: cannot read the file: ${why}`] };
  }
  const json = parseJson(text);
  if (!json.ok) return { ok: false, messages: json.errors.map((e) => `${file}: ${e.message}`) };
  if (isGeoJson(json.value)) return readGeoJson(file, json.value, geoJsonUnit);
  const format = (json.value as { format?: unknown } | null)?.format;
  if (typeof json.value === 'object' && json.value !== null && format === undefined && !('version' in json.value)) {
    return { ok: false, messages: [`${file}: not a Sectionsmith document (no "format": "sectionsmith-section") and not GeoJSON (no "type" Polygon, MultiPolygon, Feature or FeatureCollection)`] };
  }
  return { kind: 'document', value: json.value };
}

/** Reads FILE as a document (its first section, or the one named `sectionName`) or as GeoJSON (which needs `geoJsonUnit`). */
export function loadSection(file: string, io: CliIo, geoJsonUnit: LengthUnit | undefined, sectionName?: string): LoadResult {
  const read = readSectionFile(file, io, geoJsonUnit);
  if ('ok' in read) return read;
  if (read.kind === 'document') return fromDocument(file, read.value, sectionName);
  if (sectionName !== undefined) return { ok: false, messages: [`${file}: --section: a GeoJSON file has no named sections; --section applies to Sectionsmith documents`] };
  return fromGeoJson(file, read);
}

/**
 * The shared front of the commands that take one section FILE and an optional --unit: checks
 * the arguments, loads the file, and writes every problem to stderr naming the command.
 * Returns null when the command should exit with EXIT_BAD_INPUT.
 */
export function loadSectionArgument(
  command: { readonly name: string; readonly usage: string },
  positionals: readonly string[],
  unitFlag: string | undefined,
  io: CliIo,
  sectionFlag?: string | boolean,
): { readonly file: string; readonly unitFlag: LengthUnit | undefined; readonly section: LoadedSection } | null {
  if (positionals.length !== 1) {
    io.err(`sectionsmith ${command.name}: expected one FILE, got ${positionals.length === 0 ? 'none' : positionals.join(' ')}\nusage: sectionsmith ${command.usage}\n`);
    return null;
  }
  const file = positionals[0] as string;
  if (unitFlag !== undefined && !isLengthUnit(unitFlag)) {
    io.err(`sectionsmith ${command.name}: --unit: expected in, ft, mm, cm or m, got ${JSON.stringify(unitFlag)}\n`);
    return null;
  }
  if (sectionFlag !== undefined && (typeof sectionFlag !== 'string' || sectionFlag.trim() === '')) {
    io.err(`sectionsmith ${command.name}: --section: expected the name of a section, got ${typeof sectionFlag === 'string' ? JSON.stringify(sectionFlag) : 'nothing'}\n`);
    return null;
  }
  const loaded = loadSection(file, io, unitFlag, sectionFlag);
  if (!loaded.ok) {
    io.err(`${loaded.messages.join('\n')}\n`);
    return null;
  }
  return { file, unitFlag, section: loaded.section };
}
