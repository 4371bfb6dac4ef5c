/**
 * Reading a section file for the commands: a Sectionsmith document or a GeoJSON area, into
 * section properties. Every problem becomes a message that names the file and the place
 * (line/column for JSON syntax, the JSON path for structure, part/ring/vertex for geometry).
 * A document may hold several sections (alternatives): the first is read unless one is named
 * (--section NAME); an unknown name is an error that lists the names the file has.
 */
import { CUTOUT_ROLES, documentFromJson, findSection, parseJson, textTooLong, sectionView, type CutoutRole, type SectionDocument } from '../core/document/index.ts';
import type { Diagnostic, Region } from '../core/geometry/types.ts';
import { normaliseRegion, validateRegion } from '../core/geometry/index.ts';
import { geoJsonPathOf, isGeoJson, regionFromGeoJson } from '../core/geojson.ts';
import { sectionProperties } from '../core/properties/index.ts';
import type { SectionProperties } from '../core/properties/types.ts';
import type { NetSectionProperties } from '../core/properties/index.ts';
import { type ComposedPart, sectionFromDocument } from '../core/section/index.ts';
import { isLengthUnit, type LengthUnit } from '../core/units/index.ts';
import { documentFromDxf, importDxf, looksLikeDxf } from '../core/dxf/index.ts';
import type { CliIo, FlagLists, FlagSpec, FlagValues } from './command.ts';
import { fileErrorReason } from './output.ts';

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
  /** Documents with fastener holes: the net section and its properties (properties above are gross). */
  readonly net?: { readonly region: Region; readonly properties: NetSectionProperties; readonly holes: number };
  /** The composed parts (documents only), for joints and pieces. */
  readonly composedParts?: readonly ComposedPart[];
  /** Parts used / left out (documents only; 0 for GeoJSON). */
  readonly parts: number;
  readonly hiddenParts: number;
  /** A DXF drawing read as a document: what the import says (unit, gaps closed, approximations, ignored entities). */
  readonly importNotes?: readonly string[];
}

/** How to read a DXF drawing (flags --layer, --parts, --chord, --join). */
export interface DxfReadOptions {
  readonly layers?: readonly string[];
  readonly grouping?: 'parts' | 'one';
  readonly chordTolerance?: number;
  readonly joinTolerance?: number;
}

/** The flags of every command that reads a section FILE, for DXF drawings. */
export const DXF_INPUT_FLAGS: readonly FlagSpec[] = [
  { name: 'layer', type: 'string', value: 'NAME', multiple: true, description: 'DXF input: read only this layer (default: every layer with geometry)' },
  { name: 'parts', type: 'string', value: 'each|one', description: 'DXF input: one part per outer loop (each, default), or loops that touch united into one part (one)' },
  { name: 'chord', type: 'string', value: 'TOL', description: 'DXF input: chord tolerance for ELLIPSE and SPLINE, in drawing units (default 1e-4 of each curve\'s size)' },
  { name: 'join', type: 'string', value: 'TOL', description: 'DXF input: largest gap closed between line and arc ends, in drawing units (default 1e-6 of the drawing\'s diagonal)' },
];

/** The DXF reading options from the flags, or a message naming the bad flag. */
export function dxfReadOptions(flags: FlagValues, lists: FlagLists | undefined): DxfReadOptions | string {
  const tolerance = (name: string): number | undefined | string => {
    const v = flags[name];
    if (v === undefined) return undefined;
    const n = typeof v === 'string' ? Number(v) : Number.NaN;
    return Number.isFinite(n) && n > 0 ? n : `--${name}: expected a positive length in drawing units, got ${JSON.stringify(v)}`;
  };
  const chord = tolerance('chord');
  const join = tolerance('join');
  if (typeof chord === 'string') return chord;
  if (typeof join === 'string') return join;
  const parts = flags.parts;
  if (parts !== undefined && parts !== 'each' && parts !== 'one') return `--parts: expected each or one, got ${JSON.stringify(parts)}`;
  const layers = lists?.layer ?? [];
  return {
    ...(layers.length > 0 ? { layers } : {}),
    ...(parts === 'one' ? { grouping: 'one' as const } : {}),
    ...(chord !== undefined ? { chordTolerance: chord } : {}),
    ...(join !== undefined ? { joinTolerance: join } : {}),
  };
}

/**
 * A DXF drawing as a document (its unit from $INSUNITS, else `unit`), with the import's notes;
 * every problem names the entity, its handle and layer.
 */
export function documentFromDxfText(file: string, text: string, unit: LengthUnit | undefined, options: DxfReadOptions): { ok: true; value: unknown; notes: readonly string[] } | LoadFailure {
  const read = importDxf(text, { ...options, ...(unit !== undefined ? { unit } : {}) });
  if (!read.ok) {
    const hint = read.layers.length > 1 && options.layers === undefined && read.errors.some((e) => e.code === 'chain' || e.code === 'crossing')
      ? [`${file}: the drawing has geometry on layers ${read.layers.map((l) => `"${l.name}" (${l.entities})`).join(', ')}; --layer NAME reads only the layers that hold the section`]
      : [];
    const unitHint = read.errors.some((e) => e.code === 'unit-missing') ? ' (--unit in|ft|mm|cm|m)' : '';
    return { ok: false, messages: [...read.errors.map((e) => `${file}: ${e.message}${e.code === 'unit-missing' ? unitHint : ''}`), ...hint] };
  }
  const base = file.replace(/^.*[\\/]/, '').replace(/\.dxf$/i, '');
  const made = documentFromDxf(read.value, base, options.grouping ?? 'parts');
  const layers = read.value.layers;
  const layerNote = options.layers === undefined && layers.length > 1
    ? [`read every layer with geometry: ${layers.map((l) => `"${l.name}" (${l.entities})`).join(', ')}; --layer NAME reads only the ones you name`]
    : [];
  return { ok: true, value: made.file, notes: [...read.value.notes, ...made.notes, ...layerNote] };
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

/**
 * `--cutout-role PART=ROLE` (repeatable): the role of a cut-out for this run, PART being a part's
 * name or id in the chosen section, ROLE "fastener-hole" or "void". The file is not changed.
 */
export function withCutoutRoles(doc: SectionDocument, specs: readonly string[]): { readonly doc: SectionDocument; readonly errors: readonly string[] } {
  const errors: string[] = [];
  let parts = doc.parts;
  for (const spec of specs) {
    const eq = spec.lastIndexOf('=');
    const name = eq < 0 ? '' : spec.slice(0, eq).trim();
    const role = eq < 0 ? '' : spec.slice(eq + 1).trim();
    if (name === '' || !(CUTOUT_ROLES as readonly string[]).includes(role)) {
      errors.push(`--cutout-role: expected PART=fastener-hole or PART=void (PART a part's name or id), got ${JSON.stringify(spec)}`);
      continue;
    }
    const matches = parts.filter((p) => p.name === name || p.id === name);
    if (matches.length === 0) errors.push(`--cutout-role: no part named ${JSON.stringify(name)} in section "${doc.name}"`);
    else if (matches.some((p) => p.operation !== 'subtract')) errors.push(`--cutout-role: part ${JSON.stringify(name)} adds material; a role belongs to a cut-out (a subtract part)`);
    else parts = parts.map((p) => (matches.includes(p) ? { ...p, cutoutRole: role as CutoutRole } : p));
  }
  return { doc: parts === doc.parts ? doc : { ...doc, parts }, errors };
}

function fromDocument(file: string, value: unknown, sectionName: string | undefined, cutoutRoles: readonly string[] = []): LoadResult {
  const parsed = documentFromJson(value);
  if (!parsed.ok) return { ok: false, messages: parsed.errors.map((e) => `${file}: ${e.message}`) };
  const whole = parsed.file;
  const chosen = sectionName === undefined ? whole.sections[0] : findSection(whole, sectionName);
  if (!chosen) {
    return { ok: false, messages: [`${file}: --section: no section named ${JSON.stringify(sectionName)}; the sections are ${sectionNames(whole.sections.map((s) => s.name))}`] };
  }
  const index = whole.sections.indexOf(chosen);
  const roled = withCutoutRoles(sectionView(whole, chosen.id), cutoutRoles);
  if (roled.errors.length > 0) return { ok: false, messages: roled.errors.map((e) => `${file}: ${e}`) };
  const doc = roled.doc;
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
      unit: doc.unit, region: result.region, properties: result.properties, parts: result.parts.length, hiddenParts: result.hiddenParts, composedParts: result.parts,
      ...(result.net !== null && result.netProperties !== null ? { net: { region: result.net, properties: result.netProperties, holes: result.fastenerHoles } } : {}),
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
function readSectionFile(file: string, io: CliIo, geoJsonUnit: LengthUnit | undefined, dxfOptions: DxfReadOptions): GeoJsonRead | { readonly kind: 'document'; readonly value: unknown; readonly notes?: readonly string[] } | LoadFailure {
  let text: string;
  try {
    // Refuse a file far too large before reading it into memory at all.
    const tooLong = io.fileSize === undefined ? null : textTooLong(io.fileSize(file));
    if (tooLong !== null) return { ok: false, messages: [`${file}: ${tooLong}`] };
    text = io.readFile(file);
  } catch (err) {
    return { ok: false, messages: [`${file}: cannot read the file: ${fileErrorReason(err, 'read')}`] };
  }
  if (/\.dxf$/i.test(file) || looksLikeDxf(text)) {
    const dxf = documentFromDxfText(file, text, geoJsonUnit, dxfOptions);
    if (!dxf.ok) return dxf;
    return { kind: 'document', value: dxf.value, notes: dxf.notes };
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
export function loadSection(file: string, io: CliIo, geoJsonUnit: LengthUnit | undefined, sectionName?: string, dxfOptions: DxfReadOptions = {}, cutoutRoles: readonly string[] = []): LoadResult {
  const read = readSectionFile(file, io, geoJsonUnit, dxfOptions);
  if ('ok' in read) return read;
  if (read.kind === 'document') {
    const loaded = fromDocument(file, read.value, sectionName, cutoutRoles);
    return loaded.ok && read.notes !== undefined ? { ok: true, section: { ...loaded.section, importNotes: read.notes } } : loaded;
  }
  if (sectionName !== undefined) return { ok: false, messages: [`${file}: --section: a GeoJSON file has no named sections; --section applies to Sectionsmith documents`] };
  if (cutoutRoles.length > 0) return { ok: false, messages: [`${file}: --cutout-role: a GeoJSON file has no parts; roles apply to the cut-outs of Sectionsmith documents`] };
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
  dxfOptions: DxfReadOptions | string = {},
  cutoutRoles: readonly string[] = [],
): { readonly file: string; readonly unitFlag: LengthUnit | undefined; readonly section: LoadedSection } | null {
  if (typeof dxfOptions === 'string') {
    io.err(`sectionsmith ${command.name}: ${dxfOptions}\n`);
    return null;
  }
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
  const loaded = loadSection(file, io, unitFlag, sectionFlag, dxfOptions, cutoutRoles);
  if (!loaded.ok) {
    io.err(`${loaded.messages.join('\n')}\n`);
    return null;
  }
  // A drawing read as a section: what the import did goes to stderr, so --json output stays one object.
  if (loaded.section.importNotes !== undefined) io.err(loaded.section.importNotes.map((n) => `${file}: ${n}\n`).join(''));
  // A drawing with $INSUNITS carries its unit like a document: --unit then names the unit to report in.
  return { file, unitFlag, section: loaded.section };
}
