/**
 * `sectionsmith props FILE [--json] [--unit U]`: the section properties of a document or a
 * GeoJSON file. All numbers come from core (core/section, core/properties); this file only
 * converts units for output (through core/units) and lays out text.
 *
 * Units: a document's numbers are reported in its own unit unless --unit asks for another;
 * a GeoJSON file has no unit, so --unit is required and says what its coordinates are.
 * Extra flags (e.g. a torsion option) go in PROPS_FLAGS and add their rows and keys in
 * `extraResults`; nothing else needs to change.
 */
import type { SectionProperties } from '../../core/properties/types.ts';
import { compositeTorsionAnalysis, MeshInputError, MeshRefinementError, TorsionSolveError, torsionConstants, type ShearPiece, type TorsionResult } from '../../core/torsion/index.ts';
import { builtInMaterial, documentMaterials, materialPiecesFromDocument } from '../../core/materials/index.ts';
import type { SectionDocument } from '../../core/document/types.ts';
import { catalogueFor, NET_CATALOGUE, PROPERTY_CATALOGUE, shownValue, TORSION_CATALOGUE, type CatalogueKind } from '../../core/properties/catalogue.ts';
import { convertLength, defaultDisplaySet, formatSig, fromSI, QUANTITY_POWER, toDisplay, unitSystem, type LengthUnit, type Quantity } from '../../core/units/index.ts';
import { cutParts, sectionDxf } from '../../core/dxf/index.ts';
import { CAUTION, EXIT_BAD_INPUT, EXIT_OK, type CliIo, type Command, type FlagLists, type FlagSpec, type FlagValues } from '../command.ts';
import { DXF_INPUT_FLAGS, dxfReadOptions, loadSectionArgument, type LoadedSection } from '../load.ts';
import { writeOutputFile } from '../output.ts';
import { propertiesSheet } from '../../core/export/xlsx.ts';
import { writeXlsxOutput } from '../xlsx.ts';
import { materialPropsResults } from './member.ts';
import { JOINT_FLAGS, JOINTS_NOTE, jointResults, regionPiecesResults, withTorsionPieces } from './joints-results.ts';
import { torsionByJointGroups, type SeparateTorsion } from '../../core/joints/index.ts';

export const PROPS_FLAGS: readonly FlagSpec[] = [
  { name: 'json', type: 'boolean', description: 'print one JSON object (keys below) instead of the table' },
  { name: 'unit', type: 'string', value: 'U', description: 'length unit in|ft|mm|cm|m: for GeoJSON the unit of its coordinates (required); for a document the unit to report in (default: its own)' },
  { name: 'eref', type: 'string', value: 'VALUE', description: 'documents with materials: reference modulus for the transformed section, e.g. 200GPa or 29000ksi (default: the document\'s referenceModulus, else the first part\'s E)' },
  { name: 'section', type: 'string', value: 'NAME', description: 'documents with several sections (alternatives): the one to report (default: the first)' },
  { name: 'cutout-role', type: 'string', value: 'PART=ROLE', description: 'treat cut-out PART (name or id) as ROLE for this run: fastener-hole (net-section deduction only) or void (missing along the member); the file is not changed', multiple: true },
  { name: 'torsion', type: 'boolean', description: 'add finite-element torsion: J, Cw, shear centre xs, ys, meshElements, jRelativeError (several materials: G-weighted, with GJ)' },
  { name: 'dxf', type: 'string', value: 'OUT', description: 'also write the section as a DXF drawing: outline (layer SECTION), centroid, principal axes and a property table with the caution' },
  { name: 'xlsx', type: 'string', value: 'OUT', description: 'also write the properties table as XLSX (numbers at full precision in plain powers of the section\'s unit, units in the headings, the caution in row 1)' },
  { name: 'dxf-parts', type: 'boolean', description: 'with --dxf: also each part laid flat in its own coordinates, with its holes, on a layer PART-<name> (for cutting)' },
  ...DXF_INPUT_FLAGS,
  ...JOINT_FLAGS,
];

const SIGNIFICANT = 6;

/** The unit of a catalogue kind in plain powers of `unit` (JSON and the plain table). */
export function kindUnit(kind: CatalogueKind, unit: LengthUnit): string {
  return kind === 'angle' ? 'deg' : kind === 'ratio' ? '-' : QUANTITY_POWER[kind] === 1 ? unit : `${unit}${['', '', '²', '³', '⁴', '', '⁶'][QUANTITY_POWER[kind]] ?? ''}`;
}

/**
 * Every catalogue property in `unit` (from the section's own unit), keys as in SectionProperties,
 * rounding residue as 0 (core/properties/catalogue.ts); `isotropic` as it is.
 */
export function propertiesInUnit(p: SectionProperties, from: LengthUnit, to: LengthUnit): Record<string, number | boolean> {
  const out: Record<string, number | boolean> = {};
  for (const row of catalogueFor('cli', PROPERTY_CATALOGUE)) {
    const value = shownValue(row.kind, p[row.key], p);
    out[row.key] = row.kind === 'angle' || row.kind === 'ratio' ? value : convertLength(value, from, to, QUANTITY_POWER[row.kind]);
  }
  out.isotropic = p.isotropic;
  return out;
}

/** The unit of every key propertiesInUnit writes. */
export function propertyUnits(unit: LengthUnit): Record<string, string> {
  return Object.fromEntries([...catalogueFor('cli', PROPERTY_CATALOGUE).map((r) => [r.key, kindUnit(r.kind, unit)]), ['isotropic', '-']]);
}

interface ExtraResults {
  readonly json: Record<string, unknown>;
  /** The unit of every key in `json` ('-' for pure numbers), where given. */
  readonly units?: Record<string, string>;
  readonly rows: readonly (readonly [string, string, string, string])[];
  /** Bad input found while computing them (exit code 2). */
  readonly errors: readonly string[];
}

/** Net-section rows and the JSON "net" object, where fastener holes exist. */
function netResults(section: LoadedSection, unit: LengthUnit): ExtraResults {
  const net = section.net;
  if (net === undefined) return { json: { fastenerHoles: 0 }, units: { fastenerHoles: '-' }, rows: [], errors: [] };
  const display = defaultDisplaySet(unit);
  const values: Record<string, number> = {};
  const units: Record<string, string> = { fastenerHoles: '-' };
  const rows = catalogueFor('cli', NET_CATALOGUE).map((e) => {
    const q = e.kind as Quantity;
    // Rounding residue as 0, on the gross section's scales (core/properties/catalogue.ts).
    const v = convertLength(shownValue(q, net.properties[e.key], section.properties), section.unit, unit, QUANTITY_POWER[q]);
    values[e.key] = v;
    units[`net.${e.key}`] = kindUnit(q, unit);
    return [e.symbol, formatSig(toDisplay(v, unit, display[q]), SIGNIFICANT, { grouping: ',' }), display[q].label, e.meaning] as const;
  });
  return {
    json: { fastenerHoles: net.holes, net: { ...values, note: 'net section: the gross section less its fastener holes; every other value is gross (fastener holes exist only at the fasteners)' } },
    units,
    rows: [['fastenerHoles', String(net.holes), '', 'fastener holes: deducted in the net rows only; all other values are gross'], ...rows],
    errors: [],
  };
}

function joined(...parts: readonly ExtraResults[]): ExtraResults {
  return { json: Object.assign({}, ...parts.map((p) => p.json)) as Record<string, unknown>, units: Object.assign({}, ...parts.map((p) => p.units)) as Record<string, string>, rows: parts.flatMap((p) => p.rows), errors: parts.flatMap((p) => p.errors) };
}

/** Results beyond the geometry, as JSON keys and table rows [symbol, value, unit, what]: net section, the E-weighted values of a document with materials, torsion. */
function extraResults(file: string, section: LoadedSection, flags: FlagValues, io: CliIo, unit: LengthUnit): ExtraResults {
  const joints = section.doc === undefined ? regionPiecesResults(section.region) : jointResults(section.doc, flags, unit);
  const materials = joined(netResults(section, unit), joints, materialPropsResults(file, section, flags, io, unit));
  if (flags.torsion !== true) return materials;
  const torsion = torsionResults(file, section, io, unit);
  return { json: { ...materials.json, ...torsion.json }, units: { ...materials.units, ...torsion.units }, rows: [...materials.rows, ...torsion.rows], errors: [...materials.errors, ...torsion.errors] };
}

/** The pieces of a document whose visible parts use more than one material, each with its G (Pa). */
interface TorsionMaterials {
  readonly pieces: readonly ShearPiece[];
  readonly gRef: number;
  readonly gRefName: string;
  /** Per material: id, name, G in Pa, and where G comes from. */
  readonly moduli: readonly { readonly id: string; readonly name: string; readonly G: number; readonly from: string; readonly eOverG: number }[];
}

function torsionMaterials(doc: SectionDocument): TorsionMaterials | { readonly errors: readonly string[] } | null {
  const used = new Set(doc.parts.filter((p) => p.visible && p.operation === 'add').map((p) => p.material ?? doc.defaultMaterial));
  if (used.size <= 1) return null;
  const found = materialPiecesFromDocument(doc);
  const problems = [...found.issues, ...found.diagnostics.map((d) => d.message)];
  if (problems.length > 0) return { errors: problems };
  const stored = documentMaterials(doc).materials;
  const moduli = new Map<string, TorsionMaterials['moduli'][number]>();
  for (const p of found.pieces) {
    const m = p.material;
    if (moduli.has(m.id)) continue;
    const raw = stored.get(m.id) ?? builtInMaterial(m.id);
    const from = raw?.G !== undefined ? 'typed' : `from E and ν = ${raw?.nu ?? '?'}: G = E/(2(1 + ν))`;
    moduli.set(m.id, { id: m.id, name: m.name, G: m.G, from, eOverG: m.E / m.G });
  }
  const first = found.pieces[0]!.material;
  return { pieces: found.pieces.map((p) => ({ region: p.region, G: p.material.G })), gRef: first.G, gRefName: first.name, moduli: [...moduli.values()] };
}

/** --torsion: core/torsion on the section's region; a document of several materials is G-weighted (G_ref: the first part's material). */
function torsionResults(file: string, section: LoadedSection, io: CliIo, unit: LengthUnit): ExtraResults {
  const composite = section.doc !== undefined ? torsionMaterials(section.doc) : null;
  if (composite !== null && 'errors' in composite) return { json: {}, units: {}, rows: [], errors: composite.errors.map((e) => `${file}: --torsion: ${e}`) };
  let r: TorsionResult;
  let grouped: SeparateTorsion | null = null;
  try {
    // Parts joined only by joints marked "not connected" (or apart) twist separately (core/joints).
    grouped = section.doc !== undefined ? torsionByJointGroups(section.doc) : null;
    r = grouped !== null ? grouped.combined : composite ? compositeTorsionAnalysis(composite.pieces).result : torsionConstants(section.region);
  } catch (err) {
    // Bad geometry, or a mesh/solver cap reached: say which, never a stack trace.
    if (err instanceof MeshInputError || err instanceof MeshRefinementError || err instanceof TorsionSolveError || err instanceof RangeError) {
      return { json: {}, units: {}, rows: [], errors: [`${file}: --torsion: ${err.message}`] };
    }
    throw err;
  }
  const out = withTorsionPieces(torsionRows(section, unit, r), grouped, section.unit, unit);
  return composite ? withMaterialRows(out, composite, section, unit, r) : out;
}

/** GJ, G_ref and each material's G with its origin, for a section of several materials. */
function withMaterialRows(out: ExtraResults, c: TorsionMaterials, section: LoadedSection, unit: LengthUnit, r: TorsionResult): ExtraResults {
  // The document's unit system (core/units): GJ as a stiffness (kip·in², kN·m²), G as a stress (ksi, MPa).
  const system = unitSystem(unit);
  const stress = system.units.stress;
  const stiffness = system.units.flexuralStiffness;
  const GJ = fromSI(c.gRef * convertLength(r.J, section.unit, 'm', 4), 'flexuralStiffness', stiffness);
  const g = (v: number): string => formatSig(v, SIGNIFICANT, { grouping: ',' });
  const shown = (pa: number): number => fromSI(pa, 'stress', stress);
  const rows: (readonly [string, string, string, string])[] = [
    ['GJ', g(GJ), stiffness, `torsional stiffness Σ G_i J_i (J above is GJ / G_ref)`],
    ['Gref', g(shown(c.gRef)), stress, `reference shear modulus: ${c.gRefName} (the first part's material)`],
    ...c.moduli.map((m) => ['G', g(shown(m.G)), stress, `${m.name}: ${m.from}`] as const),
  ];
  const ratios = c.moduli.map((m) => m.eOverG);
  const spread = Math.max(...ratios) / Math.min(...ratios) - 1;
  if (spread > 0.01) rows.push(['weighting', 'G', '', 'shear centre and Cw are G-weighted; the materials differ in E/G (Poisson ratio), so E-weighting would move them']);
  const json = { GJ, GJUnit: stiffness, gRef: shown(c.gRef), shearModulusUnit: stress, shearModuli: c.moduli.map((m) => ({ material: m.id, G: shown(m.G), from: m.from })) };
  return { json: { ...out.json, ...json }, units: { ...out.units, GJ: stiffness, gRef: stress, 'shearModuli[].G': stress }, rows: [...out.rows, ...rows], errors: out.errors };
}

function torsionRows(section: LoadedSection, unit: LengthUnit, r: TorsionResult): ExtraResults {
  const g = (v: number): string => formatSig(v, SIGNIFICANT, { grouping: ',' });
  const L = (v: number, power: number): number => convertLength(v, section.unit, unit, power);
  // J, Cw, xs, ys from the property catalogue (symbol, kind, meaning), rounding residue as 0.
  const entries = catalogueFor('cli', TORSION_CATALOGUE);
  const units: Record<string, string> = { ...Object.fromEntries(entries.map((e) => [e.key, kindUnit(e.kind, unit)])), meshElements: '-', jRelativeError: '-', torsionComponents: '-' };
  const values: Record<string, number | null> = { ...Object.fromEntries(entries.map((e) => [e.key, e.kind === 'angle' || e.kind === 'ratio' ? r[e.key] : L(shownValue(e.kind, r[e.key], section.properties), QUANTITY_POWER[e.kind])])), meshElements: r.meshElements, jRelativeError: r.jRelativeError, torsionComponents: r.components };
  const rows: (readonly [string, string, string, string])[] = [
    ...entries.map((e) => [e.key, g(values[e.key] ?? NaN), kindUnit(e.kind, unit), e.meaning] as const),
    ['meshElements', String(r.meshElements), '', '6-node triangles in the torsion mesh'],
    ['jRelativeError', formatSig(r.jRelativeError * 100, 2), '%', 'estimated error of J (refined mesh, arc chords, simplified outline)'],
  ];
  if (r.components > 1) {
    // Pieces that twist on their own have no shared shear centre or warping constant.
    rows.splice(1, 3, ['Cw, xs, ys', '—', '', 'none: the pieces are separate, so there is no shared shear centre or Cw']);
    rows[0] = ['J', g(values.J ?? NaN), `${unit}⁴`, `torsion constant: sum over ${r.components} separate pieces (finite elements)`];
    rows.push(['torsionComponents', String(r.components), '', 'separate pieces: each twists on its own, J values add']);
    Object.assign(values, { Cw: null, xs: null, ys: null });
  }
  const o = r.simplifiedOutline;
  if (!o) return { json: values, units, rows, errors: [] };
  const pct = (v: number): string => formatSig(v * 100, 2);
  rows.push(
    ['torsionOutline', `${o.inputPoints} → ${o.meshPoints}`, 'points', 'dense outline simplified for the torsion mesh only (exact properties use every point)'],
    ['torsionDeltaA', pct(o.deltaArea), '%', 'change of area of the meshed outline'],
    ['torsionDeltaIx', pct(o.deltaIx), '%', 'change of Ix of the meshed outline'],
    ['torsionDeltaIy', pct(o.deltaIy), '%', 'change of Iy of the meshed outline'],
    ['torsionDeltaJ', pct(o.jChange), '%', 'estimated change of J from the simplification (in jRelativeError)'],
  );
  return { json: { ...values, torsionOutline: o }, units: { ...units, torsionOutline: 'points; deltas as fractions' }, rows, errors: [] };
}

function describeInput(s: LoadedSection): string {
  if (s.kind === 'geojson') return `GeoJSON, ${s.region.length} polygon${s.region.length === 1 ? '' : 's'}, coordinates read as ${s.unit}`;
  const hidden = s.hiddenParts > 0 ? `; ${s.hiddenParts} hidden part${s.hiddenParts === 1 ? '' : 's'} left out` : '';
  const which = s.sectionCount !== undefined && s.sectionCount > 1 ? `, section "${s.name}" (${(s.sectionIndex ?? 0) + 1} of ${s.sectionCount})` : '';
  return `Sectionsmith document "${s.documentName ?? s.name}"${which}, ${s.parts} part${s.parts === 1 ? '' : 's'}${hidden}, unit ${s.unit}`;
}

function table(file: string, s: LoadedSection, unit: LengthUnit, extra: ExtraResults): string {
  const display = defaultDisplaySet(unit);
  const p = s.properties;
  const rows: (readonly [string, string, string, string])[] = catalogueFor('cli', PROPERTY_CATALOGUE).map((row) => {
    const value = shownValue(row.kind, p[row.key], p);
    if (row.kind === 'angle' || row.kind === 'ratio') return [row.key, formatSig(value, SIGNIFICANT), row.kind === 'angle' ? 'deg' : '', row.meaning];
    const shown = toDisplay(convertLength(value, s.unit, unit, QUANTITY_POWER[row.kind]), unit, display[row.kind]);
    return [row.key, formatSig(shown, SIGNIFICANT, { grouping: ',' }), display[row.kind].label, row.meaning];
  });
  rows.push(...extra.rows);
  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  const w2 = Math.max(...rows.map((r) => r[2].length));
  const lines = rows.map(([sym, val, u, what]) => `  ${sym.padEnd(w0)}  ${val.padStart(w1)}  ${u.padEnd(w2)}  ${what}`);
  const note = s.properties.isotropic ? '\n  isotropic: every centroidal axis is principal; thetaDeg is reported as 0' : '';
  return [
    `${file}: ${describeInput(s)}`,
    `Signs: Ixy = +∫XY dA about the centroid; angles counter-clockwise from +x. Centroid and extents in section coordinates.`,
    '',
    ...lines,
    note,
    ...((extra.json.warnings as readonly string[] | undefined) ?? []).map((w) => `WARNING: ${w}`),
    ...(extra.json.shear !== undefined ? [JOINTS_NOTE] : []),
    `CAUTION: ${CAUTION}`,
    '',
  ].join('\n');
}

function json(file: string, s: LoadedSection, unit: LengthUnit, extra: ExtraResults): string {
  const body = {
    file,
    input: s.kind,
    unit,
    caution: CAUTION,
    convention: 'Ixy = +∫XY dA about the centroid; angles in degrees counter-clockwise from +x; lengths in "unit", areas unit², moduli unit³, second moments unit⁴',
    ...(s.kind === 'document' ? { section: s.name, parts: s.parts, hiddenParts: s.hiddenParts } : {}),
    ...propertiesInUnit(s.properties, s.unit, unit),
    ...extra.json,
    units: { ...propertyUnits(unit), ...(s.kind === 'document' ? { parts: '-', hiddenParts: '-' } : {}), ...extra.units },
  };
  // Non-finite numbers have no JSON form; say null rather than writing invalid JSON.
  return `${JSON.stringify(body, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}

/** --dxf OUT: the section in its own unit, with the annotation layers (a path that cannot be written is bad input, exit 2). */
export function writeSectionDxf(out: string, s: LoadedSection, withParts: boolean): void {
  writeOutputFile('dxf', out, sectionDxf({
    name: s.name, unit: s.unit, region: s.region, properties: s.properties, caution: CAUTION, centroid: true, axes: true, table: true,
    ...(withParts && s.doc !== undefined ? { parts: cutParts(s.doc) } : {}),
  }));
}

function runProps(positionals: readonly string[], flags: FlagValues, io: CliIo, lists?: FlagLists): number | Promise<number> {
  const loaded = loadSectionArgument(propsCommand, positionals, typeof flags.unit === 'string' ? flags.unit : undefined, io, flags.section, dxfReadOptions(flags, lists), lists?.['cutout-role'] ?? []);
  if (!loaded) return EXIT_BAD_INPUT;
  const { file, unitFlag, section } = loaded;
  const unit = unitFlag ?? section.unit;
  const extra = extraResults(file, section, flags, io, unit);
  if (extra.errors.length > 0) {
    io.err(`${extra.errors.join('\n')}\n`);
    return EXIT_BAD_INPUT;
  }
  if (typeof flags.dxf === 'string') writeSectionDxf(flags.dxf, section, flags['dxf-parts'] === true);
  io.out(flags.json === true ? json(file, section, unit, extra) : table(file, section, unit, extra));
  if (typeof flags.xlsx === 'string') return writeXlsxOutput('xlsx', flags.xlsx, propertiesSheet({ name: section.name, unit: section.unit, properties: section.properties })).then(() => EXIT_OK);
  return EXIT_OK;
}

export const propsCommand: Command = {
  name: 'props',
  summary: 'section properties of a Sectionsmith document or a GeoJSON area',
  usage: 'props FILE [--json] [--unit U] [--section NAME] [--eref VALUE] [--cutout-role PART=ROLE …] [--torsion] [--xlsx OUT] [--dxf OUT [--dxf-parts]] [--layer NAME …] [--parts each|one]',
  description: [
    'FILE is a Sectionsmith document (.json, "format": "sectionsmith-section"), a GeoJSON',
    'Polygon, MultiPolygon, Feature or FeatureCollection (RFC 7946) whose coordinates are lengths',
    'in the unit given by --unit (first ring outer, the others holes), or an ASCII DXF drawing',
    '(R12 to 2018). Hidden document parts are left out, and the output says how many.',
    '',
    'A DXF is read from its closed boundaries: LWPOLYLINE and POLYLINE (bulges as exact arcs),',
    'LINE and ARC chains (joined within --join; each gap closed is reported), CIRCLE, and ELLIPSE',
    'and SPLINE drawn by chords within --chord; INSERTs are expanded. Loops inside loops alternate',
    'material and hole. Its unit is $INSUNITS; a drawing without one needs --unit. TEXT, DIMENSION,',
    'HATCH and the like are ignored and counted. What the import did goes to stderr.',
    '',
    '--dxf OUT writes the section as a DXF (its unit in $INSUNITS): layer SECTION (outline and',
    'holes, arcs as bulges), CENTROID, PRINCIPAL-AXES (construction lines) and PROPERTIES (a table',
    'with the caution); --dxf-parts adds each part laid flat for cutting, on a layer PART-<name>.',
    '',
    'The table shows each property with its symbol, value (6 significant figures) and unit;',
    'inch and foot sections in in, in², in³, in⁴; mm and m sections in mm, mm², 10³ mm³, 10⁶ mm⁴;',
    'cm sections in cm, cm², cm³, cm⁴.',
    '',
    'With --json: one object with "file", "input", "unit", "caution", "convention", and every',
    'property in plain powers of "unit": area, cx, cy, Ix, Iy, Ixy, Ip, I1, I2, thetaDeg, isotropic,',
    'rx, ry, r1, r2, xMin, xMax, yMin, yMax, SxTop, SxBottom, SyLeft, SyRight, S1Plus, S1Minus,',
    'S2Plus, S2Minus, Zx, Zy, Z1, Z2, pnaY, pnaX, shapeFactorX, shapeFactorY (documents add',
    '"section", "parts" and "hiddenParts").',
    '',
    'A document may hold several sections (alternatives); the first is reported unless',
    '--section NAME names another.',
    '',
    'A document whose parts have materials adds the E-weighted (transformed) section: EA (N, or',
    'lbf for in/ft), EIx, EIy, EIxy, EI1, EI2 (force·unit²), thetaEIDeg, cxE, cyE, eRef (MPa or psi),',
    'transformedArea, transformedIx, transformedIy, massPerLength (kg/m), weightPerLength (N/m, or',
    'lbf/ft for in/ft), materialUnits and per-part modular ratios "materials". The reference modulus is',
    'the document\'s referenceModulus when it has one (a material\'s E or a typed value), else the first',
    'part\'s E; --eref VALUE overrides both (unit suffix Pa, kPa, MPa, GPa, psi or ksi; default MPa or psi).',
    '',
    'Cut-outs have a role: a fastener hole (bolt, rivet or pin hole) is a net-section deduction',
    'only, so every property above, EI and torsion use the gross section; the net section is',
    'reported beside it as "net" (An, cx, cy, Ix, Iy, Ixy, SxTop, SxBottom, SyLeft, SyRight, the',
    'net centroid being the net neutral axis) with "fastenerHoles", the count. A void (the default)',
    'is missing along the member and counts everywhere. --cutout-role PART=ROLE sets a role for one',
    'run.',
    '',
    '--torsion adds finite-element torsion of the section: J (unit⁴), Cw (unit⁶,',
    'about the shear centre), the Trefftz shear centre xs, ys (section coordinates), meshElements,',
    'jRelativeError (estimated relative error of J) and torsionComponents (separate pieces).',
    'Parts of several materials are bonded where they touch and weighted by G_i/G_ref (G_ref: the',
    'first part\'s material): J is then GJ/G_ref, and "GJ" (force·unit²), "gRef" and "shearModuli"',
    '(each material\'s G and whether it was typed or derived from E and ν) are added.',
    'A dense outline (e.g. a curve imported as thousands of vertices) is simplified for the',
    'torsion mesh only, within 0.1 % of J; "torsionOutline" then gives inputPoints, meshPoints and',
    'the relative changes deltaArea, deltaIx, deltaIy and jChange (estimated, included in',
    'jRelativeError).',
    '',
    'Documents list their joints (contact segments between parts: length, parts, kind), "pieces"',
    'and "warnings" (separate pieces, default joint kinds, overlapping parts with their area); where',
    'parts are separate, "plies" gives each ply\'s share of the load by EI. --shear V / --shear-x V',
    'add "shear": per joint q, the stress on it (tauJoint) and beside it (tauIn) and what the weld',
    'or fasteners need; per part the largest τ = V·Q/(I·t) and the cut where it occurs. Parts joined',
    'only by joints marked not connected twist separately under --torsion ("torsionPieces").',
    'The unit of every key is in "units".',
    '',
    'Bad input (unreadable file, JSON syntax, schema, geometry) exits with code 2 and names the',
    'file and the place: line and column, JSON path, or part, ring and vertex.',
  ].join('\n'),
  flags: PROPS_FLAGS,
  run: runProps,
};
