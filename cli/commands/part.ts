/**
 * `sectionsmith part TYPE key=value … [--json] [--unit U]` and
 * `sectionsmith part --designation NAME [--json] [--unit U]`: the section properties of one
 * standard part. All numbers come from core (core/parts, core/catalogue, core/properties); this
 * file parses arguments, converts units for output (core/units) and lays out text.
 *
 * Units: TYPE dimensions are read in --unit (default in), or in their own unit (d=14in, through
 * core/units readQuantity), and the results are reported in --unit;
 * lumber's b and d are nominal inch sizes whatever the unit. A designation's dimensions are the
 * catalogue's (inches); --unit only changes the reporting unit.
 * The JSON keys of the properties are those of `props` (propertiesInUnit, from the property catalogue).
 * The readable table is a small formatter of its own: props' table is private to its file.
 */
import { partFromDesignation, type CatalogueEntry } from '../../core/catalogue/index.ts';
import { normaliseRegion, validateRegion } from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { sectionDxf } from '../../core/dxf/index.ts';
import { parsePointList } from '../../core/parts/points.ts';
import { writeOutputFile } from '../output.ts';
import { getPartType, partTypes, shapeRegion } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import { convertLength, defaultDisplaySet, formatSig, fromSI, isLengthUnit, QUANTITY_POWER, readQuantity, toDisplay, type LengthUnit } from '../../core/units/index.ts';
import { CAUTION, EXIT_BAD_INPUT, EXIT_OK, type CliIo, type Command, type FlagSpec, type FlagValues } from '../command.ts';
import { catalogueFor, PROPERTY_CATALOGUE, shownValue } from '../../core/properties/catalogue.ts';
import { propertiesInUnit, propertyUnits } from './props.ts';

export const PART_FLAGS: readonly FlagSpec[] = [
  { name: 'designation', type: 'string', value: 'NAME', description: 'a catalogue designation (AISC v15.0 shape such as W14X90, or lumber such as 2x10) instead of TYPE' },
  { name: 'json', type: 'boolean', description: 'print one JSON object (the keys of props) instead of the table' },
  { name: 'unit', type: 'string', value: 'U', description: 'length unit in|ft|mm|cm|m of bare-number dimensions and of the results (default in); a dimension may carry its own unit (d=14in)' },
  { name: 'points', type: 'string', value: 'FILE', description: 'with TYPE outline: the outline\'s points, one x y per line (tab, semicolon, comma or space separated; header optional)' },
  { name: 'third', type: 'string', value: 'bulge|radius', description: 'with --points: what a third column is, when its header does not say (bulge = tan(sweep/4); radius of a minor arc, + counter-clockwise)' },
  { name: 'dxf', type: 'string', value: 'OUT', description: 'also write the part as a DXF drawing (outline on layer SECTION, centroid, principal axes, property table with the caution)' },
];

/** A decimal ("0.75"), a fraction ("3/4") or a mixed number ("1-1/2"); NaN otherwise. */
export function parseDimension(text: string): number {
  const mixed = /^(\d+)-(\d+)\/(\d+)$/.exec(text);
  if (mixed !== null) return Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  const fraction = /^(\d+)\/(\d+)$/.exec(text);
  if (fraction !== null) return Number(fraction[1]) / Number(fraction[2]);
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text) ? Number(text) : Number.NaN;
}

/**
 * One `key=value` dimension: a length through core/units readQuantity (a bare number in --unit,
 * or with its own unit: d=14in, tw=3/8", d=355.6mm, d=1'-2"), returned in --unit; slopes, counts
 * and lumber's nominal inch sizes are plain numbers and take no unit.
 */
export function readParameter(key: string, text: string, quantity: 'length' | 'ratio' | 'count' | 'nominal-in', unit: LengthUnit): { ok: true; value: number } | { ok: false; message: string } {
  if (quantity !== 'length') {
    const value = parseDimension(text);
    const what = quantity === 'nominal-in' ? 'a nominal size in inches (e.g. 2 or 10)' : quantity === 'count' ? 'a whole number' : 'a plain ratio (rise over run)';
    return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `${key}=${text}: ${key} is ${what}, written as a number with no unit (0.75, 3/4 or 1-1/2)` };
  }
  const r = readQuantity(text, { label: key, kind: 'length', unit });
  if (!r.ok) return { ok: false, message: `${key}=${text}: ${r.message.replace(/^[^:]*: /, '')}` };
  return { ok: true, value: r.unit === unit ? r.value : fromSI(r.si, 'length', unit) };
}

interface Request {
  readonly shape: string;
  readonly params: Readonly<Record<string, number>>;
  /** Unit of the params (lumber nominal sizes aside). */
  readonly unit: LengthUnit;
  readonly entry?: CatalogueEntry;
}

type Parsed = { ok: true; request: Request } | { ok: false; message: string };

function parseTypeRequest(positionals: readonly string[], unit: LengthUnit): Parsed {
  const [shape, ...pairs] = positionals;
  if (shape === undefined) return { ok: false, message: `expected a part TYPE (${partTypes().map((t) => t.id).join(', ')}) or --designation NAME` };
  const type = getPartType(shape);
  if (type === undefined) return { ok: false, message: `no part type "${shape}"; types: ${partTypes().map((t) => t.id).join(', ')}` };
  // Keys are user text: a null-prototype object, so "constructor=5" is an unknown dimension, not "given twice".
  const params: Record<string, number> = Object.create(null) as Record<string, number>;
  for (const pair of pairs) {
    const m = /^([A-Za-z_][A-Za-z0-9_]*)=(.+)$/.exec(pair);
    if (m === null) return { ok: false, message: `"${pair}" is not key=value (e.g. d=14, d=14in or t=3/4)` };
    const spec = type.params.find((p) => p.key === m[1]);
    const read = readParameter(m[1]!, m[2]!, spec?.quantity ?? 'length', unit);
    if (!read.ok) return { ok: false, message: read.message };
    const value = read.value;
    if (Object.hasOwn(params, m[1]!)) return { ok: false, message: `${m[1]} is given twice` };
    params[m[1]!] = value;
  }
  return { ok: true, request: { shape, params, unit } };
}

function parseRequest(positionals: readonly string[], flags: FlagValues, unit: LengthUnit): Parsed {
  const designation = flags.designation;
  if (typeof designation !== 'string') return parseTypeRequest(positionals, unit);
  if (positionals.length > 0) return { ok: false, message: `--designation takes no TYPE or key=value arguments (got ${positionals.join(' ')})` };
  const found = partFromDesignation(designation);
  if (!found.ok) return { ok: false, message: found.message };
  return { ok: true, request: { shape: found.shape, params: found.params, unit: 'in', entry: found.entry } };
}

function describe(request: Request): string {
  const dims = Object.entries(request.params).map(([k, v]) => `${k}=${Number(v.toPrecision(6))}`).join(' ');
  const head = request.entry === undefined ? request.shape : `${request.entry.designation} (${request.entry.source}) as ${request.shape}`;
  return `${head}: ${dims} [${request.unit}${request.shape === 'lumber' ? '; lumber b, d nominal inches' : ''}]`;
}

function table(request: Request, p: SectionProperties, unit: LengthUnit): string {
  const display = defaultDisplaySet(unit);
  const rows = catalogueFor('cli', PROPERTY_CATALOGUE).map((row): [string, string, string] => {
    const value = shownValue(row.kind, p[row.key], p);
    if (row.kind === 'angle' || row.kind === 'ratio') return [row.key, formatSig(value, 6), row.kind === 'angle' ? 'deg' : ''];
    const shown = toDisplay(convertLength(value, request.unit, unit, QUANTITY_POWER[row.kind]), unit, display[row.kind]);
    return [row.key, formatSig(shown, 6, { grouping: ',' }), display[row.kind].label];
  });
  rows.push(['isotropic', p.isotropic ? 'yes' : 'no', '']);
  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  const notes = [...(request.entry?.modelling.map((m) => `  modelling: ${m}`) ?? []), ...(request.entry?.caveats.map((c) => `  NOTE: ${c}`) ?? [])];
  return [
    describe(request),
    'Signs: Ixy = +∫XY dA about the centroid; angles counter-clockwise from +x; coordinates about the part\'s local origin.',
    ...notes,
    '',
    ...rows.map(([k, v, u]) => `  ${k.padEnd(w0)}  ${v.padStart(w1)}  ${u}`),
    '',
    `CAUTION: ${CAUTION}`,
    '',
  ].join('\n');
}

/** The unit of each dimension given ("params.d": "in"); lumber's nominal sizes are inches by name, slopes and counts have none. */
function paramUnits(request: Request): Record<string, string> {
  const type = getPartType(request.shape);
  return Object.fromEntries(Object.keys(request.params).map((k) => {
    const q = type?.params.find((p) => p.key === k)?.quantity ?? 'length';
    return [`params.${k}`, q === 'length' ? request.unit : q === 'nominal-in' ? 'in (nominal)' : '-'];
  }));
}

function json(request: Request, p: SectionProperties, unit: LengthUnit): string {
  const body = {
    input: 'part',
    part: request.shape,
    ...(request.entry === undefined ? {} : { designation: request.entry.designation, source: request.entry.source, modelling: request.entry.modelling, caveats: request.entry.caveats }),
    params: request.params,
    paramsUnit: request.unit,
    unit,
    caution: CAUTION,
    convention: 'Ixy = +∫XY dA about the centroid; angles in degrees counter-clockwise from +x; lengths in "unit", areas unit², moduli unit³, second moments unit⁴',
    ...propertiesInUnit(p, request.unit, unit),
    units: { ...propertyUnits(unit), ...paramUnits(request) },
  };
  return `${JSON.stringify(body, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}

function runPart(positionals: readonly string[], flags: FlagValues, io: CliIo): number {
  const fail = (message: string): number => {
    io.err(`sectionsmith part: ${message}\nusage: sectionsmith ${partCommand.usage}\n`);
    return EXIT_BAD_INPUT;
  };
  const unitFlag = flags.unit;
  if (unitFlag !== undefined && !isLengthUnit(unitFlag)) return fail(`--unit: expected in, ft, mm, cm or m, got ${JSON.stringify(unitFlag)}`);
  const unit: LengthUnit = unitFlag ?? 'in';
  if (positionals[0] === 'outline') return runOutline(positionals, flags, io, unit, fail);
  if (typeof flags.points === 'string') return fail('--points goes with TYPE outline: part outline --points FILE.csv');
  const parsed = parseRequest(positionals, flags, unit);
  if (!parsed.ok) return fail(parsed.message);
  const request = parsed.request;
  const built = shapeRegion(request.shape, request.params, request.unit);
  const problems = built.diagnostics.length > 0 ? built.diagnostics : validateRegion(built.region);
  if (problems.length > 0) return fail(problems.map((d) => d.message).join('\n'));
  const properties = sectionProperties(built.region);
  if (typeof flags.dxf === 'string') writePartDxf(flags.dxf, request, built.region, properties);
  io.out(flags.json === true ? json(request, properties, unit) : table(request, properties, unit));
  return EXIT_OK;
}

function writePartDxf(out: string, request: Request, region: Region, properties: SectionProperties): void {
  const name = request.entry?.designation ?? request.shape;
  writeOutputFile('dxf', out, sectionDxf({ name, unit: request.unit, region, properties, caution: CAUTION, centroid: true, axes: true, table: true }));
}

/** `part outline --points FILE`: a closed outline from a point list, in --unit (default in). */
function runOutline(positionals: readonly string[], flags: FlagValues, io: CliIo, unit: LengthUnit, fail: (m: string) => number): number {
  if (positionals.length > 1) return fail(`outline takes its points from --points FILE, not key=value arguments (got ${positionals.slice(1).join(' ')})`);
  const file = flags.points;
  if (typeof file !== 'string') return fail('outline needs --points FILE (one x y per line)');
  const third = flags.third;
  if (third !== undefined && third !== 'bulge' && third !== 'radius') return fail(`--third: expected bulge or radius, got ${JSON.stringify(third)}`);
  let text: string;
  try {
    text = io.readFile(file);
  } catch (err) {
    return fail(`${file}: cannot read the file: ${(err as { code?: string }).code === 'ENOENT' ? 'no such file' : err instanceof Error ? err.message : String(err)}`);
  }
  const list = parsePointList(text, third);
  if (!list.ok) return fail(list.errors.map((e) => `${file}: ${e.message}`).join('\n'));
  const xy = Float64Array.from(list.points.flat());
  const ring = list.bulges.some((b) => b !== 0) ? { xy, bulge: Float64Array.from(list.bulges) } : { xy };
  const raw: Region = [{ outer: ring, holes: [] }];
  const problems = validateRegion(raw);
  if (problems.length > 0) return fail(problems.map((d) => `${file}: ${d.vertex !== undefined ? `point ${d.vertex + 1}: ` : ''}${d.message}`).join('\n'));
  const region = normaliseRegion(raw);
  const properties = sectionProperties(region);
  const request: Request = { shape: 'outline', params: {}, unit };
  if (typeof flags.dxf === 'string') writePartDxf(flags.dxf, request, region, properties);
  io.out(flags.json === true ? json(request, properties, unit) : table({ ...request, shape: `outline of ${list.points.length} points from ${file}${list.third !== null ? ` (third column: ${list.third})` : ''}` }, properties, unit));
  return EXIT_OK;
}

function typeLines(): string[] {
  return partTypes().map((t) => `  ${t.id.padEnd(13)} ${t.params.map((p) => `${p.key}${p.optional === true ? '?' : ''}`).join(' ')}  (origin: ${t.origin ?? 'see core/parts'})`);
}

export const partCommand: Command = {
  name: 'part',
  summary: 'section properties of one standard part, by dimensions or by catalogue designation',
  usage: 'part TYPE key=value … [--json] [--unit U] [--dxf OUT]  |  part --designation NAME [--json] [--unit U] [--dxf OUT]  |  part outline --points FILE [--third bulge|radius] [--unit U]',
  description: [
    'TYPE is a part type and each key=value one of its dimensions by trade symbol; values may be',
    'decimals or fractions (t=3/4, d=1-1/2). A bare number is in --unit (default in); a length may',
    'carry its own unit (d=14in, d=355.6mm, tw=3/8", d=1\'-2"), converted to --unit. Slopes, ply',
    'counts and lumber\'s nominal sizes take no unit. Optional dimensions are marked "?" (rect-tube r',
    'defaults to 2t; root and toe radii to 0; slope is rise over run, 2:12 = 0.1667):',
    ...typeLines(),
    '',
    'With --designation NAME the dimensions come from the catalogue (AISC Shapes Database v15.0',
    'published dimensions, or NDS dressed lumber such as 2x10) and the modelling conventions used',
    'are printed (e.g. root fillet r = kdes − tf). Properties are always computed from the exact',
    'geometry, never copied from a table.',
    '',
    'part outline --points FILE reads a closed outline from a point list: one x y per line, tab,',
    'semicolon, comma or space separated (what a spreadsheet copies), with or without a header;',
    'an optional third column is the segment to the next point as a bulge (tan(sweep/4)) or as the',
    'radius of a minor arc (+ counter-clockwise), named by its header ("bulge", "radius") or by',
    '--third. Errors name the line and the column. Coordinates are in --unit (default in).',
    '',
    '--dxf OUT also writes the part as a DXF drawing (see props --dxf).',
    '',
    'With --json: one object with "input" ("part"), "part", "params", "paramsUnit", "unit",',
    '"caution", "convention", "designation"/"source"/"modelling" for catalogue parts, and every',
    'property under the same keys as `props`.',
    '',
    'Bad input (unknown type, dimension or designation; impossible dimensions) exits with code 2',
    'and names the dimension and why.',
  ].join('\n'),
  flags: PART_FLAGS,
  run: runPart,
};
