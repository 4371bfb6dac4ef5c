/**
 * Built-up assemblies for the palette: the form of each assembly (fields by trade symbol, typed in
 * the document unit), reading and checking what was typed, building the pieces with the helpers
 * of core/parts/built-up.ts, and turning them into document parts in one step (plain names,
 * materials by role, placed at a chosen point, selected together).
 *
 * Units: every length typed is in the document unit; catalogue dimensions (inches, AISC Shapes
 *   Database v15.0) are converted through core/units and rounded to 12 significant figures so
 *   0.44 in shows as 11.176 mm. Lumber nominal sizes stay inch trade names.
 * Failure: a field that cannot be read, or a combination the helper refuses, gives a message
 *   naming the field (or the assembly when no one field is to blame); nothing is built then,
 *   so bad input never reaches the document.
 * Materials: a role (steel, lumber, engineered wood, an I-joist's flange or web) maps to a material id chosen by the user; the first
 *   choice offered is a material of that kind the document already has, else a built-in one,
 *   or none when the document uses no materials at all. Built-ins are copied into the document
 *   when used, as the materials panel does.
 * No DOM here: the component (AssemblyPicker.tsx) only renders this.
 */
import { catalogueEntry, searchCatalogue, similarDesignations, type CatalogueEntry, type Family } from '../../../core/catalogue/index.ts';
import type { Part, SectionDocument } from '../../../core/document/types.ts';
import type { Diagnostic } from '../../../core/geometry/types.ts';
import { BUILT_IN_MATERIALS } from '../../../core/materials/index.ts';
import {
  DRESSED_SIZES, boltHolePattern, boxFromChannels, coverPlatedI, doubleAnglesBackToBack, dressedPly, flitchBeam, getPartType, multiPlyLumber, plateGirder, woodIJoist, type BuiltUpPiece,
} from '../../../core/parts/index.ts';
import { convertLength, type LengthUnit } from '../../../core/units/index.ts';
import type { Editor } from '../../editor/editor.ts';
import { uniquePartId } from '../../editor/transforms.ts';
import { withMaterialStored } from '../materials/material-form.ts';
import { parseNumber } from '../shell/numbers.ts';

export type AssemblyId = 'plate-girder' | 'cover-plated-i' | 'box-from-channels' | 'double-angles' | 'flitch-beam' | 'bolt-holes' | 'glulam' | 'scl' | 'wood-i-joist' | 'multi-ply';
/**
 * What a piece is made of, each with its own material choice: steel pieces, lumber plies,
 * engineered wood (glulam, LVL, PSL), and the two materials of a wood I-joist.
 */
export type Role = 'steel' | 'timber' | 'engineered' | 'joist-flange' | 'joist-web';

/**
 * length: > 0; gap: ≥ 0; position: any number; count: a whole number ≥ min;
 * designation: a catalogue entry of `families`; choice: one of `choices`.
 */
export type FieldKind = 'length' | 'gap' | 'position' | 'count' | 'designation' | 'choice';

export interface AssemblyField {
  readonly key: string;
  /** Plain words with the trade symbol, e.g. "web thickness tw". */
  readonly label: string;
  readonly kind: FieldKind;
  /** May be left empty (the meaning of empty is in `placeholder`). */
  readonly optional?: boolean;
  readonly placeholder?: string;
  readonly min?: number;
  readonly families?: readonly Family[];
  readonly choices?: readonly { readonly value: string; readonly label: string }[];
  /** Default text in an inch document (inches) and a metric one (millimetres); counts and choices as they are. */
  readonly inch: string;
  readonly metric: string;
  /** Fields shown side by side belong to one group (a heading). */
  readonly group: string;
}

export interface AssemblySpec {
  readonly id: AssemblyId;
  readonly label: string;
  /** One line: what it builds and where its origin is. */
  readonly summary: string;
  readonly fields: readonly AssemblyField[];
  readonly roles: readonly Role[];
  /** Where its sizes and rules come from (shown beside the form). */
  readonly source?: string;
  /** A helper's message mentioning the word goes next to that field. */
  readonly blame: readonly (readonly [RegExp, string])[];
}

const centre = (what: string): AssemblyField[] => [
  { key: 'x', label: 'x', kind: 'position', inch: '0', metric: '0', group: `place ${what} at` },
  { key: 'y', label: 'y', kind: 'position', inch: '0', metric: '0', group: `place ${what} at` },
];

const I_FAMILIES: readonly Family[] = ['W', 'M', 'S', 'HP'];
const CHANNEL_FAMILIES: readonly Family[] = ['C', 'MC'];
const ANGLE_FAMILIES: readonly Family[] = ['L'];

export const ASSEMBLIES: readonly AssemblySpec[] = [
  {
    id: 'plate-girder',
    label: 'Plate girder (welded plates)',
    summary: 'A web plate with a flange plate on its top and bottom edges; the point placed is the middle of the web. Welds are not modelled.',
    roles: ['steel'],
    blame: [],
    fields: [
      { key: 'webH', label: 'depth h', kind: 'length', inch: '36', metric: '900', group: 'web plate' },
      { key: 'webT', label: 'thickness tw', kind: 'length', inch: '3/8', metric: '10', group: 'web plate' },
      { key: 'topB', label: 'width b', kind: 'length', inch: '12', metric: '300', group: 'top flange plate' },
      { key: 'topT', label: 'thickness t', kind: 'length', inch: '1', metric: '20', group: 'top flange plate' },
      { key: 'bottomB', label: 'width b', kind: 'length', inch: '12', metric: '300', group: 'bottom flange plate' },
      { key: 'bottomT', label: 'thickness t', kind: 'length', inch: '1', metric: '20', group: 'bottom flange plate' },
      ...centre('the web centre'),
    ],
  },
  {
    id: 'cover-plated-i',
    label: 'Rolled I with cover plates',
    summary: 'A catalogue I shape with a plate on either flange (leave a plate empty for none) and optional bolt holes through each flange and its plate; the point placed is the middle of the I.',
    roles: ['steel'],
    blame: [[/gauge/, 'holeGauge'], [/columns/, 'holeColumns'], [/diameter/, 'holeD']],
    fields: [
      { key: 'shape', label: 'designation', kind: 'designation', families: I_FAMILIES, inch: 'W14X90', metric: 'W14X90', group: 'rolled I (catalogue)' },
      { key: 'topB', label: 'width b', kind: 'length', optional: true, placeholder: 'none', inch: '16', metric: '400', group: 'top cover plate' },
      { key: 'topT', label: 'thickness t', kind: 'length', optional: true, placeholder: 'none', inch: '3/4', metric: '20', group: 'top cover plate' },
      { key: 'bottomB', label: 'width b', kind: 'length', optional: true, placeholder: 'none', inch: '', metric: '', group: 'bottom cover plate' },
      { key: 'bottomT', label: 'thickness t', kind: 'length', optional: true, placeholder: 'none', inch: '', metric: '', group: 'bottom cover plate' },
      { key: 'holeD', label: 'hole diameter', kind: 'length', optional: true, placeholder: 'no holes', inch: '', metric: '', group: 'bolt holes through each flange' },
      { key: 'holeColumns', label: 'holes across', kind: 'count', min: 1, inch: '2', metric: '2', group: 'bolt holes through each flange' },
      { key: 'holeGauge', label: 'gauge g', kind: 'length', optional: true, placeholder: 'published WGi', inch: '', metric: '', group: 'bolt holes through each flange' },
      ...centre('the I centre'),
    ],
  },
  {
    id: 'box-from-channels',
    label: 'Two channels (box or back to back)',
    summary: 'Two equal catalogue channels, mirror images about the point placed, which is at mid-depth.',
    roles: ['steel'],
    blame: [[/gap/, 'gap']],
    fields: [
      { key: 'shape', label: 'designation', kind: 'designation', families: CHANNEL_FAMILIES, inch: 'C15X50', metric: 'C15X50', group: 'channel (catalogue)' },
      {
        key: 'arrangement', label: 'arrangement', kind: 'choice', inch: 'toe-to-toe', metric: 'toe-to-toe', group: 'layout',
        choices: [
          { value: 'toe-to-toe', label: 'toes facing (box)' },
          { value: 'back-to-back', label: 'webs back to back' },
        ],
      },
      { key: 'gap', label: 'clear gap', kind: 'gap', inch: '0', metric: '0', group: 'layout' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'double-angles',
    label: 'Double angles back to back',
    summary: 'Two equal catalogue angles with their longer legs back to back across a gap (as for a gusset plate); the point placed is on the heels, midway between the backs.',
    roles: ['steel'],
    blame: [[/gap/, 'gap']],
    fields: [
      { key: 'shape', label: 'designation', kind: 'designation', families: ANGLE_FAMILIES, inch: 'L5X3X1/2', metric: 'L5X3X1/2', group: 'angle (catalogue)' },
      { key: 'gap', label: 'gap between backs', kind: 'gap', inch: '3/8', metric: '10', group: 'layout' },
      ...centre('the heels'),
    ],
  },
  {
    id: 'flitch-beam',
    label: 'Flitch beam (lumber and steel plates)',
    summary: 'Lumber plies side by side with an upright steel plate between each pair, all at mid-depth; the point placed is the middle of the beam.',
    roles: ['timber', 'steel'],
    blame: [[/nominal/, 'lumber'], [/plies/, 'plies']],
    fields: [
      {
        key: 'lumber', label: 'nominal size', kind: 'choice', inch: '2x12', metric: '2x12', group: 'lumber (NDS dressed sizes)',
        choices: DRESSED_SIZES.map((s) => ({ value: s.nominal, label: `${s.nominal} (${s.b} × ${s.d} in)` })),
      },
      { key: 'plies', label: 'plies', kind: 'count', min: 2, inch: '2', metric: '2', group: 'lumber (NDS dressed sizes)' },
      { key: 'plateT', label: 'thickness t', kind: 'length', inch: '1/2', metric: '12', group: 'steel plate (each)' },
      { key: 'plateDepth', label: 'depth', kind: 'length', optional: true, placeholder: 'as the lumber', inch: '', metric: '', group: 'steel plate (each)' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'glulam',
    label: 'Glulam (laminations of a stated thickness)',
    summary: 'Glued-laminated timber: n laminations of thickness tl stacked to the depth n·tl, each drawn as its own strip so the glue lines show (the section is the solid b × n·tl rectangle); the point placed is the middle of the section.',
    source: 'ANSI A190.1 (structural glued laminated timber); NDS Supplement (AWC 2018) Tables 1C and 1D: laminations 1-1/2 in thick for western species, 1-3/8 in for southern pine; widths 3-1/8, 5-1/8, 6-3/4, 8-3/4, 10-3/4 in (western) and 3, 5, 6-3/4, 8-1/2, 10-1/2 in (southern pine) — from memory of those tables',
    roles: ['engineered'],
    blame: [],
    fields: [
      { key: 'b', label: 'width b', kind: 'length', inch: '5 1/8', metric: '130', group: 'section' },
      { key: 'n', label: 'laminations n', kind: 'count', min: 1, inch: '8', metric: '8', group: 'section' },
      { key: 'tl', label: 'lamination thickness tl (1 1/2 in western, 1 3/8 in southern pine)', kind: 'length', inch: '1 1/2', metric: '38.1', group: 'section' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'scl',
    label: 'LVL or PSL (structural composite lumber)',
    summary: 'A solid b × d member of laminated veneer lumber or parallel strand lumber; the point placed is the middle of the section. Take E, Fb and the sizes from the producer\'s published values.',
    source: 'common practice: LVL made in 1-3/4 in plies (members of 1, 2 or 3 plies side by side), PSL in 3-1/2, 5-1/4 and 7 in widths, depths 9-1/4 to 18 in (from memory); no producer\'s own data are used',
    roles: ['engineered'],
    blame: [],
    fields: [
      {
        key: 'product', label: 'product', kind: 'choice', inch: 'lvl', metric: 'lvl', group: 'member',
        choices: [
          { value: 'lvl', label: 'LVL (laminated veneer lumber)' },
          { value: 'psl', label: 'PSL (parallel strand lumber)' },
        ],
      },
      { key: 'b', label: 'width b', kind: 'length', inch: '1 3/4', metric: '45', group: 'member' },
      { key: 'd', label: 'depth d', kind: 'length', inch: '11 7/8', metric: '302', group: 'member' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'wood-i-joist',
    label: 'Wood I-joist (flanges and web)',
    summary: 'Two flanges b × h of one material (LVL or sawn lumber) and a web tw thick of another (OSB or plywood) between them, each its own part so each takes its own material; the point placed is mid-depth. The web\'s tongue in the flange groove is not modelled.',
    source: 'common practice (flanges 1-1/2 in deep and 1-3/4 to 3-1/2 in wide, webs 3/8 to 7/16 in OSB; from memory); the producer\'s published section values govern design',
    roles: ['joist-flange', 'joist-web'],
    blame: [[/flanges \(2/, 'flangeH'], [/web tw/, 'tw']],
    fields: [
      { key: 'depth', label: 'overall depth', kind: 'length', inch: '11 7/8', metric: '302', group: 'joist' },
      { key: 'flangeB', label: 'width b', kind: 'length', inch: '2 5/16', metric: '58', group: 'each flange' },
      { key: 'flangeH', label: 'depth h', kind: 'length', inch: '1 1/2', metric: '38', group: 'each flange' },
      { key: 'tw', label: 'thickness tw', kind: 'length', inch: '3/8', metric: '9.5', group: 'web' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'multi-ply',
    label: 'Multi-ply lumber (plies kept separate)',
    summary: 'Plies of one dressed lumber size side by side, each its own part, so the joints between plies are kept (for the shear flow a nailed or screwed joint must carry); the point placed is the middle.',
    source: 'NDS Supplement (AWC 2018) Table 1A, dressed sizes; plies fastened side by side: common practice',
    roles: ['timber'],
    blame: [[/nominal/, 'lumber'], [/plies/, 'plies']],
    fields: [
      {
        key: 'lumber', label: 'nominal size', kind: 'choice', inch: '2x10', metric: '2x10', group: 'lumber (NDS dressed sizes)',
        choices: DRESSED_SIZES.map((s) => ({ value: s.nominal, label: `${s.nominal} (${s.b} × ${s.d} in)` })),
      },
      { key: 'plies', label: 'plies', kind: 'count', min: 2, inch: '3', metric: '3', group: 'lumber (NDS dressed sizes)' },
      ...centre('the middle'),
    ],
  },
  {
    id: 'bolt-holes',
    label: 'Bolt holes (cut from what is there)',
    summary: 'A grid of holes cut from the parts already placed: through a flat plate (holes along y), an upright plate (along x), or running along the member (round voids).',
    roles: [],
    blame: [[/pitch/, 'pitch'], [/gauge/, 'gauge'], [/depth/, 'depth'], [/rows/, 'rows'], [/columns/, 'columns'], [/diameter/, 'holeD']],
    fields: [
      { key: 'holeD', label: 'diameter', kind: 'length', inch: '15/16', metric: '22', group: 'holes' },
      {
        key: 'axis', label: 'holes run', kind: 'choice', inch: 'y', metric: 'y', group: 'holes',
        choices: [
          { value: 'y', label: 'up through a flat plate or flange' },
          { value: 'x', label: 'across through an upright plate or web' },
          { value: 'z', label: 'along the member (round voids)' },
        ],
      },
      { key: 'depth', label: 'depth cut (plate thickness)', kind: 'length', optional: true, placeholder: 'needed unless along the member', inch: '1', metric: '20', group: 'holes' },
      { key: 'rows', label: 'rows (along y)', kind: 'count', min: 1, inch: '1', metric: '1', group: 'grid' },
      { key: 'pitch', label: 'pitch (row spacing)', kind: 'length', optional: true, placeholder: 'one row', inch: '', metric: '', group: 'grid' },
      { key: 'columns', label: 'columns (along x)', kind: 'count', min: 1, inch: '2', metric: '2', group: 'grid' },
      { key: 'gauge', label: 'gauge (column spacing)', kind: 'length', optional: true, placeholder: 'one column', inch: '5 1/2', metric: '140', group: 'grid' },
      ...centre('the grid centre'),
    ],
  },
];

export function assemblySpec(id: AssemblyId): AssemblySpec {
  const spec = ASSEMBLIES.find((a) => a.id === id);
  if (spec === undefined) throw new Error(`unknown assembly "${id}"`);
  return spec;
}

const metricUnit = (unit: LengthUnit): boolean => unit === 'mm' || unit === 'cm' || unit === 'm';

/** A length in another unit, rounded to 12 significant figures (no 11.176000000000002). */
function shown(value: number, from: LengthUnit, to: LengthUnit): number {
  return Number(convertLength(value, from, to).toPrecision(12));
}

/** The starting text of every field in the document unit (inch defaults for in/ft, millimetre ones for metric). */
export function defaultTexts(spec: AssemblySpec, unit: LengthUnit): Record<string, string> {
  const metric = metricUnit(unit);
  const base: LengthUnit = metric ? 'mm' : 'in';
  const out: Record<string, string> = {};
  for (const f of spec.fields) {
    const text = metric ? f.metric : f.inch;
    const isLength = f.kind === 'length' || f.kind === 'gap' || f.kind === 'position';
    const parsed = parseNumber(text, f.label);
    out[f.key] = isLength && text !== '' && unit !== base && parsed.ok ? String(shown(parsed.value, base, unit)) : text;
  }
  return out;
}

/**
 * Catalogue parameters (inches) in the document unit: lengths only; slopes, counts and lumber
 * nominal sizes are kept. Rounded to 12 significant figures.
 */
export function catalogueParamsInUnit(shape: string, params: Readonly<Record<string, number>>, unit: LengthUnit): Record<string, number> {
  const specs = getPartType(shape)?.params ?? [];
  const out: Record<string, number> = {};
  for (const [key, value] of Object.entries(params)) {
    const quantity = specs.find((s) => s.key === key)?.quantity ?? 'length';
    out[key] = quantity === 'length' ? shown(value, 'in', unit) : value;
  }
  return out;
}

/** Catalogue entries of the given families whose designation contains `text` (case and spaces ignored). */
export function assemblyCatalogueSearch(text: string, families: readonly Family[], limit = 12): CatalogueEntry[] {
  if (text.trim() === '') return [];
  return searchCatalogue({ text }).filter((e) => families.includes(e.family)).slice(0, limit);
}

// ---- reading the form -----------------------------------------------------------------------

export interface AssemblyBuild {
  /** Pieces in the document unit, centred as the helper places them plus the chosen point. */
  readonly pieces: readonly BuiltUpPiece[];
  /** Messages by field key. */
  readonly fieldErrors: Readonly<Record<string, string>>;
  /** Messages about the assembly as a whole. */
  readonly errors: readonly string[];
}

type Read = { values: Record<string, number | undefined>; choices: Record<string, string>; entries: Record<string, CatalogueEntry>; fieldErrors: Record<string, string> };

function readField(f: AssemblyField, text: string, read: Read): void {
  const what = `${f.group}, ${f.label}`;
  const fail = (message: string): void => {
    read.fieldErrors[f.key] = message;
  };
  if (f.kind === 'choice') {
    if (!(f.choices ?? []).some((c) => c.value === text)) fail(`${what}: "${text}" is not one of ${(f.choices ?? []).map((c) => c.value).join(', ')}`);
    else read.choices[f.key] = text;
    return;
  }
  if (f.kind === 'designation') {
    const entry = text.trim() === '' ? undefined : catalogueEntry(text);
    const families = f.families ?? [];
    if (text.trim() === '') return fail(`${what}: enter a designation (${families.join(', ')} shapes)`);
    if (entry === undefined) {
      const near = similarDesignations(text).filter((d) => families.includes(catalogueEntry(d)?.family ?? 'user'));
      return fail(`${what}: "${text}" is not in the catalogue${near.length > 0 ? `; similar: ${near.join(', ')}` : ''}`);
    }
    if (!families.includes(entry.family)) return fail(`${what}: ${entry.designation} is a ${entry.family} shape; this assembly takes ${families.join(', ')} shapes`);
    read.entries[f.key] = entry;
    return;
  }
  if (text.trim() === '' && f.optional === true) {
    read.values[f.key] = undefined;
    return;
  }
  const r = parseNumber(text, what);
  if (!r.ok) return fail(r.message);
  const v = r.value;
  if (f.kind === 'length' && !(v > 0)) return fail(`${what}: must be greater than 0, got ${text.trim()}`);
  if (f.kind === 'gap' && !(v >= 0)) return fail(`${what}: must be 0 or more, got ${text.trim()}`);
  if (f.kind === 'count' && (!Number.isInteger(v) || v < (f.min ?? 1))) return fail(`${what}: must be a whole number of at least ${f.min ?? 1}, got ${text.trim()}`);
  read.values[f.key] = v;
}

function readForm(spec: AssemblySpec, texts: Readonly<Record<string, string>>): Read {
  const read: Read = { values: {}, choices: {}, entries: {}, fieldErrors: {} };
  for (const f of spec.fields) readField(f, texts[f.key] ?? '', read);
  return read;
}

/** Both of a pair, or neither: a plate needs its width and its thickness. */
function pairOf(read: Read, spec: AssemblySpec, b: string, t: string): { b: number; t: number } | undefined {
  const vb = read.values[b];
  const vt = read.values[t];
  if (read.fieldErrors[b] !== undefined || read.fieldErrors[t] !== undefined) return undefined;
  if ((vb === undefined) !== (vt === undefined)) {
    const missing = vb === undefined ? b : t;
    const field = spec.fields.find((f) => f.key === missing) as AssemblyField;
    read.fieldErrors[missing] = `${field.group}, ${field.label}: enter it too, or clear both for no plate`;
    return undefined;
  }
  return vb === undefined || vt === undefined ? undefined : { b: vb, t: vt };
}

const num = (read: Read, key: string): number => read.values[key] as number;

function helperResult(spec: AssemblySpec, read: Read, unit: LengthUnit): { pieces: readonly BuiltUpPiece[]; diagnostics: readonly Diagnostic[] } | null {
  const entry = read.entries['shape'];
  const params = entry === undefined ? {} : catalogueParamsInUnit(entry.shape, entry.params, unit);
  switch (spec.id) {
    case 'plate-girder':
      return plateGirder({ web: { h: num(read, 'webH'), tw: num(read, 'webT') }, top: { b: num(read, 'topB'), t: num(read, 'topT') }, bottom: { b: num(read, 'bottomB'), t: num(read, 'bottomT') } });
    case 'cover-plated-i': {
      const top = pairOf(read, spec, 'topB', 'topT');
      const bottom = pairOf(read, spec, 'bottomB', 'bottomT');
      const d = read.values['holeD'];
      const published = entry?.dimensions['WGi'];
      const gauge = read.values['holeGauge'] ?? (published === undefined ? undefined : shown(published, 'in', unit));
      const columns = num(read, 'holeColumns');
      if (d !== undefined && columns > 1 && gauge === undefined) read.fieldErrors['holeGauge'] = `bolt holes through each flange, gauge g: ${entry?.designation ?? 'this shape'} has no published workable gauge; enter one`;
      if (Object.keys(read.fieldErrors).length > 0) return null;
      return coverPlatedI({
        i: params, ...(entry ? { designation: entry.designation } : {}), ...(top ? { top } : {}), ...(bottom ? { bottom } : {}),
        ...(d === undefined ? {} : { holes: { diameter: d, columns, gauge: gauge ?? 0 } }),
      });
    }
    case 'box-from-channels':
      return boxFromChannels({ channel: params, ...(entry ? { designation: entry.designation } : {}), arrangement: read.choices['arrangement'] === 'back-to-back' ? 'back-to-back' : 'toe-to-toe', gap: num(read, 'gap') });
    case 'double-angles':
      return doubleAnglesBackToBack({ angle: params, ...(entry ? { designation: entry.designation } : {}), gap: num(read, 'gap') });
    case 'flitch-beam': {
      const size = DRESSED_SIZES.find((s) => s.nominal === read.choices['lumber']);
      if (size === undefined) return null;
      const ply = dressedPly(size.nominalB, size.nominalD);
      const depth = read.values['plateDepth'] ?? (ply === undefined ? 0 : shown(ply.d, 'in', unit));
      return flitchBeam({ lumber: { b: size.nominalB, d: size.nominalD }, plies: num(read, 'plies'), plate: { t: num(read, 'plateT'), depth }, unit });
    }
    case 'glulam':
      return engineeredPiece('glulam', 'glulam', { b: num(read, 'b'), n: num(read, 'n'), tl: num(read, 'tl') });
    case 'scl': {
      const product = read.choices['product'] === 'psl' ? 'psl' : 'lvl';
      return engineeredPiece(product, product.toUpperCase(), { b: num(read, 'b'), d: num(read, 'd') });
    }
    case 'wood-i-joist':
      return woodIJoist({ depth: num(read, 'depth'), flange: { b: num(read, 'flangeB'), h: num(read, 'flangeH') }, tw: num(read, 'tw') });
    case 'multi-ply': {
      const size = DRESSED_SIZES.find((s) => s.nominal === read.choices['lumber']);
      if (size === undefined) return null;
      return multiPlyLumber({ lumber: { b: size.nominalB, d: size.nominalD }, plies: num(read, 'plies'), unit });
    }
    case 'bolt-holes': {
      const axis = read.choices['axis'] as 'x' | 'y' | 'z';
      const pitch = read.values['pitch'];
      const gauge = read.values['gauge'];
      const depth = read.values['depth'];
      return boltHolePattern({
        diameter: num(read, 'holeD'), axis, rows: num(read, 'rows'), columns: num(read, 'columns'), x: num(read, 'x'), y: num(read, 'y'),
        ...(pitch === undefined ? {} : { pitch }), ...(gauge === undefined ? {} : { gauge }), ...(depth === undefined || axis === 'z' ? {} : { depth }), name: 'bolt hole',
      });
    }
  }
}

/** One engineered-wood part (glulam, LVL, PSL) with its parameters in the document unit, or the part type's own diagnostics. */
function engineeredPiece(shape: string, name: string, params: Record<string, number>): { pieces: readonly BuiltUpPiece[]; diagnostics: readonly Diagnostic[] } {
  const diagnostics = getPartType(shape)?.region(params).diagnostics ?? [];
  if (diagnostics.length > 0) return { pieces: [], diagnostics };
  return { pieces: [{ name, type: 'shape', shape, params, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, operation: 'add', role: 'timber', materialRole: 'engineered' }], diagnostics };
}

const RENAMES: Readonly<Record<string, string>> = { web: 'web plate', 'top flange': 'top flange plate', 'bottom flange': 'bottom flange plate' };

/** The plain name a piece gets in the parts list. */
function plainName(spec: AssemblySpec, piece: BuiltUpPiece, plies: number): string {
  if (spec.id === 'plate-girder') return RENAMES[piece.name] ?? piece.name;
  if (spec.id === 'cover-plated-i' && piece.type === 'shape' && piece.shape === 'i-shape') return piece.designation ?? 'rolled I';
  if (spec.id === 'wood-i-joist') return piece.name === 'web' ? 'I-joist web' : `I-joist ${piece.name}`;
  if (spec.id === 'multi-ply') return piece.name.replace(/^ply /, 'lumber ply ');
  if (spec.id === 'flitch-beam') {
    const ply = /^ply (\d+)$/.exec(piece.name);
    if (ply) return `lumber ply ${ply[1]}`;
    const plate = /^plate (\d+)$/.exec(piece.name);
    if (plate) return plies === 2 ? 'steel plate' : `steel plate ${plate[1]}`;
  }
  return piece.name;
}

function shifted(piece: BuiltUpPiece, dx: number, dy: number): BuiltUpPiece {
  return dx === 0 && dy === 0 ? piece : { ...piece, placement: { ...piece.placement, x: piece.placement.x + dx, y: piece.placement.y + dy } };
}

/** Each helper message next to the field it names (by the spec's `blame` words), else about the whole. */
function blamed(spec: AssemblySpec, diagnostics: readonly Diagnostic[]): { fieldErrors: Record<string, string>; errors: string[] } {
  const fieldErrors: Record<string, string> = {};
  const errors: string[] = [];
  for (const d of diagnostics) {
    const key = spec.blame.find(([word]) => word.test(d.message))?.[1];
    if (key === undefined) errors.push(d.message);
    else fieldErrors[key] = fieldErrors[key] === undefined ? d.message : `${fieldErrors[key]} ${d.message}`;
  }
  return { fieldErrors, errors };
}

/** The pieces an assembly form describes, or the messages saying what is wrong and where. */
export function buildAssembly(id: AssemblyId, texts: Readonly<Record<string, string>>, unit: LengthUnit): AssemblyBuild {
  const spec = assemblySpec(id);
  const read = readForm(spec, texts);
  const refused = (): AssemblyBuild => ({ pieces: [], fieldErrors: read.fieldErrors, errors: [] });
  if (Object.keys(read.fieldErrors).length > 0) return refused();
  const built = helperResult(spec, read, unit);
  if (Object.keys(read.fieldErrors).length > 0 || built === null) return refused();
  if (built.diagnostics.length > 0) return { pieces: [], ...blamed(spec, built.diagnostics) };
  const [dx, dy] = spec.id === 'bolt-holes' ? [0, 0] : [num(read, 'x'), num(read, 'y')];
  const plies = read.values['plies'] ?? 0;
  const pieces = built.pieces.map((p) => shifted({ ...p, name: plainName(spec, p, plies) }, dx, dy));
  return { pieces, fieldErrors: {}, errors: [] };
}

// ---- materials by role ----------------------------------------------------------------------

const ROLE_KINDS: Readonly<Record<Role, readonly string[]>> = {
  steel: ['steel'],
  timber: ['sawn-lumber', 'engineered-wood'],
  engineered: ['engineered-wood'],
  'joist-flange': ['engineered-wood', 'sawn-lumber'],
  'joist-web': ['engineered-wood', 'other'],
};

/** The role whose material a piece takes: a wood I-joist's flange or web, engineered wood, else the helper's steel or timber. */
export function pieceRole(piece: BuiltUpPiece): Role | undefined {
  if (piece.materialRole === 'flange') return 'joist-flange';
  if (piece.materialRole === 'web') return 'joist-web';
  if (piece.materialRole === 'engineered') return 'engineered';
  return piece.role;
}

/** Whether the document uses materials at all (its own, a default, or any part's). */
export function documentUsesMaterials(doc: SectionDocument): boolean {
  return doc.materials.length > 0 || doc.defaultMaterial !== null || doc.parts.some((p) => p.material !== null);
}

function kindOf(doc: SectionDocument, id: string): string | undefined {
  const own = doc.materials.find((m) => m.id === id);
  if (own !== undefined) return typeof own['kind'] === 'string' ? own['kind'] : undefined;
  return BUILT_IN_MATERIALS.find((m) => m.id === id)?.kind;
}

/** Materials that suit a role: the document's own of that kind first, then the built-in ones. */
export function roleMaterialChoices(doc: SectionDocument, role: Role): { id: string; name: string }[] {
  const kinds = ROLE_KINDS[role];
  const own = doc.materials.filter((m) => kinds.includes(kindOf(doc, m.id) ?? '')).map((m) => ({ id: m.id, name: `${m.name} (this document)` }));
  const library = BUILT_IN_MATERIALS.filter((m) => kinds.includes(m.kind) && !doc.materials.some((x) => x.id === m.id)).map((m) => ({ id: m.id, name: m.name }));
  return [...own, ...library];
}

/**
 * The material a role starts with: none when the document uses no materials; else one of the
 * role's kind the document already uses or holds; else a common grade (ASTM A992 for a rolled
 * I, ASTM A36 for plates, channels and angles, Douglas Fir-Larch No. 2 for lumber; common practice).
 */
export function defaultRoleMaterial(doc: SectionDocument, role: Role, id: AssemblyId, choices: Readonly<Record<string, string>> = {}): string | null {
  if (!documentUsesMaterials(doc)) return null;
  const known = [...doc.parts.map((p) => p.material), doc.defaultMaterial, ...doc.materials.map((m) => m.id)];
  const hit = known.find((m): m is string => m !== null && ROLE_KINDS[role].includes(kindOf(doc, m) ?? ''));
  if (hit !== undefined) return hit;
  // Engineered wood: the generic built-in of the product (glulam, LVL; from memory, marked so in the
  // library); none is built in for PSL or an I-joist web (OSB, plywood): the user chooses one.
  if (role === 'engineered') return id === 'glulam' ? 'glulam-24f-1.8e' : choices['product'] === 'psl' ? null : 'lvl-2.0e';
  if (role === 'joist-flange') return 'lvl-2.0e';
  if (role === 'joist-web') return null;
  if (role === 'timber') return 'df-l-no2';
  return id === 'cover-plated-i' ? 'astm-a992' : 'astm-a36';
}

const ROLE_WORDS: Readonly<Record<Role, string>> = { steel: 'steel pieces', timber: 'lumber plies', engineered: 'engineered wood', 'joist-flange': 'flanges', 'joist-web': 'web' };

/**
 * Roles that must be given a material before placing: in a document that uses materials, a
 * wood role left at none would take the document's default material (which may be steel), so
 * an I-joist web or a PSL member without one is refused with a message saying so.
 */
export function missingRoleMaterials(doc: SectionDocument, spec: AssemblySpec, materials: Readonly<Partial<Record<Role, string | null>>>): string[] {
  if (!documentUsesMaterials(doc)) return [];
  const fallback = doc.defaultMaterial === null ? 'no material' : `the document's default material (${doc.materials.find((m) => m.id === doc.defaultMaterial)?.name ?? doc.defaultMaterial})`;
  return spec.roles
    .filter((r) => r !== 'steel' && r !== 'timber' && (materials[r] ?? null) === null)
    .map((r) => `Choose a material for the ${ROLE_WORDS[r]}: with none it would take ${fallback}, and no generic one is built in (use the producer's published values).`);
}

// ---- into the document ----------------------------------------------------------------------

function partOf(piece: BuiltUpPiece, id: string, name: string, material: string | null): Part {
  const common = { id, name, placement: piece.placement, operation: piece.operation, ...(piece.cutoutRole === undefined ? {} : { cutoutRole: piece.cutoutRole }), material, visible: true };
  switch (piece.type) {
    case 'shape':
      return { ...common, type: 'shape', shape: piece.shape, params: piece.params, ...(piece.designation === undefined ? {} : { designation: piece.designation }) };
    case 'rectangle':
      return { ...common, type: 'rectangle', width: piece.width, height: piece.height };
    case 'circle':
      return { ...common, type: 'circle', diameter: piece.diameter };
  }
}

/** "" when every name is free, else the first " (k)" that makes all of them unique in the document. */
function nameSuffix(doc: SectionDocument, names: readonly string[]): string {
  const taken = new Set(doc.parts.map((p) => p.name));
  if (!names.some((n) => taken.has(n))) return '';
  for (let k = 2; k < 10_000; k++) if (!names.some((n) => taken.has(`${n} (${k})`))) return ` (${k})`;
  throw new Error('no free name suffix below 10000');
}

/**
 * The document with the pieces appended as parts (ids unique, names made unique together, the
 * role's material on each added piece, null for cut-outs), and the new part ids in order.
 * Built-in materials used are copied into the document's materials.
 */
export function placeAssembly(doc: SectionDocument, pieces: readonly BuiltUpPiece[], materials: Readonly<Partial<Record<Role, string | null>>>): { doc: SectionDocument; ids: string[] } {
  const materialOf = (p: BuiltUpPiece): string | null => {
    const role = pieceRole(p);
    return p.operation === 'add' && role !== undefined ? (materials[role] ?? null) : null;
  };
  let working = doc;
  for (const m of new Set(pieces.map(materialOf))) if (m !== null) working = withMaterialStored(working, m);
  const suffix = nameSuffix(doc, pieces.map((p) => p.name));
  const ids: string[] = [];
  for (const piece of pieces) {
    const id = uniquePartId(working);
    ids.push(id);
    working = { ...working, parts: [...working.parts, partOf(piece, id, `${piece.name}${suffix}`, materialOf(piece))] };
  }
  return { doc: working, ids };
}

/** Places the pieces as one undo step, selected together; returns the new part ids. */
export function placeAssemblyStep(editor: Editor, label: string, pieces: readonly BuiltUpPiece[], materials: Readonly<Partial<Record<Role, string | null>>>): string[] {
  if (pieces.length === 0) return [];
  let ids: string[] = [];
  editor.run(label, (doc) => {
    const placed = placeAssembly(doc, pieces, materials);
    ids = placed.ids;
    return { doc: placed.doc, selection: placed.ids };
  });
  return ids;
}
