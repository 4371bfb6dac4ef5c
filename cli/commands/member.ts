/**
 * `sectionsmith member FILE --span L --support S [--point P [--at A]] [--uniform W] [--E VALUE] …`:
 * a beam check of the section in FILE (core/member), with its stiffness from core/materials.
 *
 * Input: every flag that is a quantity goes through core/units' one reader (readQuantity), so
 * `--span 20ft`, `--span 6.1m`, `--span 13'-9"`, `--uniform 30kN/m`, `--point 2kip`, `--E 29000ksi`
 * and `--density 490lb/ft3` all work. A bare number keeps the unit --help states: lengths in the
 * document unit; N, N per document unit, MPa and kg/m3 for mm, cm and m documents; lbf, lbf per
 * document unit, psi and lb/ft3 for in and ft documents.
 * Output (text and JSON) in the document's unit system (core/units/systems.ts): span and positions
 * in the document unit, deflections in mm or in, forces kN or kip, line loads kN/m or kip/ft,
 * moments kN·m or kip·ft, stresses MPa or ksi, EI kN·m² or kip·in². The JSON names the unit of
 * every key in "units". Computation runs in SI.
 */
import { compositeProperties, type MaterialPiece } from '../../core/materials/composite.ts';
import { materialPiecesFromDocument } from '../../core/materials/document.ts';
import { documentReferenceModulus } from '../../core/materials/reference.ts';
import { FORCE_UNITS, forceToNewtons, parseQuantity, QuantityError, STRESS_UNITS, stressToPascals, type DensityUnit, type ForceUnit, type StressUnit } from '../../core/materials/quantities.ts';
import type { MaterialSI } from '../../core/materials/schema.ts';
import { SUPPORTS, type Support } from '../../core/member/beam.ts';
import { CAUTION as MEMBER_CAUTION, type MemberResult } from '../../core/member/check.ts';
import { COMMON_LIVE_RATIO, COMMON_TOTAL_RATIO, DEFLECTION_LIMIT_MEANING, STRESS_FACTOR_MEANING, type Criterion, type StressLimits } from '../../core/member/verdict.ts';
import { sectionMemberCheck } from '../../core/member/section-member.ts';
import { convertLength, formatSig, fromSI, parseQuantityOrThrow, unitSystem, zeroWithinRounding, type LengthUnit, type QuantityKind, type UnitSystem } from '../../core/units/index.ts';
import { EXIT_BAD_INPUT, EXIT_FLAGGED, EXIT_OK, type CliIo, type Command, type FlagLists, type FlagSpec, type FlagValues } from '../command.ts';
import { DXF_INPUT_FLAGS, dxfReadOptions, loadSectionArgument, type LoadedSection } from '../load.ts';
import { sectionWarnings } from './joints-results.ts';

export const MEMBER_FLAGS: readonly FlagSpec[] = [
  { name: 'span', type: 'string', value: 'L', description: 'span (required), e.g. 6000, 6m, 20ft, 13\'-9"; a bare number is in the document unit; a cantilever\'s length' },
  { name: 'support', type: 'string', value: 'S', description: 'simple | cantilever | fixed | propped (required)' },
  { name: 'point', type: 'string', value: 'P', description: 'point load, downward; N, kN, lbf or kip (default N metric, lbf in/ft)' },
  { name: 'at', type: 'string', value: 'A', description: 'position of the point load from the left (fixed) end, document unit; default midspan (cantilever: the free end)' },
  { name: 'uniform', type: 'string', value: 'W', description: 'uniform load over the span, downward; e.g. 2kN/m, 300lbf/ft (default: N or lbf per document unit)' },
  { name: 'E', type: 'string', value: 'VALUE', description: 'modulus for a single-material shape; Pa, kPa, MPa, GPa, psi, ksi (default MPa metric, psi in/ft)' },
  { name: 'density', type: 'string', value: 'RHO', description: 'with --E and --self-weight: density, kg/m3 or lb/ft3 (default kg/m3 metric, lb/ft3 in/ft)' },
  { name: 'self-weight', type: 'boolean', description: 'add the section\'s own weight (from the material densities) to the uniform load' },
  { name: 'live', type: 'string', value: 'W', description: 'live uniform load, downward, added to --uniform for the total (same units as --uniform)' },
  { name: 'live-point', type: 'string', value: 'P', description: 'live point load, downward (same units as --point)' },
  { name: 'live-at', type: 'string', value: 'A', description: 'position of the live point load, document unit; default midspan (cantilever: the free end)' },
  { name: 'limit', type: 'string', value: 'N', description: 'deflection limit under total load, span/N (default 240: IBC Table 1604.3, common practice); a cantilever uses 2 × its length' },
  { name: 'live-limit', type: 'string', value: 'N', description: 'deflection limit under live load, span/N (default 360: IBC Table 1604.3, common practice); checked when a live load is given' },
  { name: 'stress-factor', type: 'string', value: 'F', description: 'stress limit = F × the material\'s strength basis (fy; reference Fb for wood); default 1 = the strength itself, no safety factor' },
  { name: 'allowable', type: 'string', value: '[MAT=]S', description: 'typed allowable bending stress (e.g. 24ksi), for every material or for material id MAT; wins over --stress-factor', multiple: true },
  { name: 'shear-allowable', type: 'string', value: '[MAT=]S', description: 'typed allowable shear stress, for every material or for material id MAT (default for steel: F × 0.6 fy)', multiple: true },
  { name: 'unit', type: 'string', value: 'U', description: 'GeoJSON, and DXF without $INSUNITS, only: the length unit of its coordinates, in|ft|mm|cm|m' },
  { name: 'section', type: 'string', value: 'NAME', description: 'documents with several sections (alternatives): the one to check (default: the first)' },
  { name: 'json', type: 'boolean', description: 'print one JSON object instead of the text report' },
  ...DXF_INPUT_FLAGS,
];

class UsageError extends Error {}

interface OutputUnits {
  readonly length: LengthUnit;
  readonly force: ForceUnit;
  readonly stress: StressUnit;
  readonly density: DensityUnit;
}

const imperial = (u: LengthUnit): boolean => u === 'in' || u === 'ft';
const outputUnits = (u: LengthUnit): OutputUnits => (imperial(u) ? { length: u, force: 'lbf', stress: 'psi', density: 'lb/ft3' } : { length: u, force: 'N', stress: 'MPa', density: 'kg/m3' });

/** A quantity flag in SI (m, N, N/m, Pa, kg/m³), or undefined when absent; QuantityError names the flag. */
export function quantityFlag(flags: FlagValues, name: string, kind: QuantityKind, bareUnit: string): number | undefined {
  const text = flags[name];
  return typeof text !== 'string' ? undefined : parseQuantityOrThrow(text, { label: `--${name}`, kind, unit: bareUnit });
}

/** A length flag (20ft, 6m, 13'-9", or a bare number in the document unit) in the document unit. */
function lengthFlag(flags: FlagValues, name: string, unit: LengthUnit): number | undefined {
  const m = quantityFlag(flags, name, 'length', unit);
  return m === undefined ? undefined : convertLength(m, 'm', unit);
}

function stringFlag(flags: FlagValues, name: string): string | undefined {
  const v = flags[name];
  return typeof v === 'string' ? v : undefined;
}

/** A line load "2kN/m", "300lbf/ft" → N per metre; a bare number is the default force per document unit. */
function lineLoadNPerM(flags: FlagValues, name: string, units: OutputUnits): number | undefined {
  return quantityFlag(flags, name, 'lineLoad', `${units.force}/${units.length}`);
}

function densityKgPerM3(flags: FlagValues, units: OutputUnits): number | undefined {
  const rho = quantityFlag(flags, 'density', 'density', units.density === 'kg/m3' ? 'kg/m³' : 'lb/ft³');
  if (rho !== undefined && rho < 0) throw new UsageError(`--density: must not be negative, got ${stringFlag(flags, 'density') ?? ''}`);
  return rho;
}

interface Pieces {
  readonly pieces: readonly MaterialPiece[];
  readonly from: 'document materials' | '--E';
}

function piecesFor(section: LoadedSection, flags: FlagValues, units: OutputUnits): Pieces | string[] {
  const eText = stringFlag(flags, 'E');
  if (eText !== undefined) {
    const e = parseQuantity(eText, STRESS_UNITS, units.stress, '--E');
    const E = stressToPascals(e.value, e.unit);
    if (!(E > 0 && Number.isFinite(E))) throw new UsageError(`--E: the modulus must be positive and finite in pascals, got ${eText}`);
    const rho = densityKgPerM3(flags, units);
    // No strength is known for a bare modulus: first yield and strength ratios are not reported.
    const material: MaterialSI = { id: '--E', name: `E = ${eText}`, kind: 'other', E, G: E / 2.6, density: rho ?? NaN, fy: NaN, strengthBasis: 'yield' };
    return { pieces: [{ region: section.region, material, label: 'section' }], from: '--E' };
  }
  const doc = section.doc;
  if (doc === undefined) return ['the shape has no materials: give the modulus with --E (e.g. --E 200GPa or --E 29000ksi)'];
  if (doc.materials.length === 0 && doc.defaultMaterial === null && doc.parts.every((p) => p.material === null)) {
    return ['the document has no materials: assign materials to its parts, or give the modulus with --E'];
  }
  const found = materialPiecesFromDocument(doc);
  const problems = [...found.issues, ...found.diagnostics.map((d) => d.message)];
  return problems.length > 0 ? problems : { pieces: found.pieces, from: 'document materials' };
}

interface MemberReport {
  readonly result: MemberResult;
  readonly units: OutputUnits;
  readonly span: number;
  readonly support: Support;
  readonly EI: number;
  readonly selfWeight?: number;
  readonly stiffnessFrom: string;
  readonly pieces: readonly MaterialPiece[];
  /** Separate pieces and overlapping parts (cli/commands/joints-results.ts sectionWarnings). */
  readonly warnings?: readonly string[];
}

function ratioFlag(flags: FlagValues, name: string, fallback: number): number {
  const text = stringFlag(flags, name);
  if (text === undefined) return fallback;
  const value = Number(text);
  if (!(text.trim() !== '' && Number.isFinite(value) && value > 0)) throw new UsageError(`--${name}: expected a positive ratio such as ${fallback}, got ${JSON.stringify(text)}`);
  return value;
}

/** `--allowable 24ksi` (every material) or `--allowable a992=24ksi` (one material id) → Pa per material id. */
function allowables(flag: string, values: readonly string[], pieces: readonly MaterialPiece[], units: OutputUnits): Map<string, number> | undefined {
  if (values.length === 0) return undefined;
  const ids = [...new Set(pieces.map((p) => p.material.id))];
  const out = new Map<string, number>();
  for (const item of values) {
    const eq = item.lastIndexOf('=');
    const id = eq < 0 ? null : item.slice(0, eq).trim();
    const q = parseQuantity(eq < 0 ? item : item.slice(eq + 1), STRESS_UNITS, units.stress, `--${flag}`);
    const pa = stressToPascals(q.value, q.unit);
    if (!(pa > 0)) throw new UsageError(`--${flag} ${item}: the stress must be positive`);
    if (id !== null && !ids.includes(id)) throw new UsageError(`--${flag} ${item}: no material "${id}" in the section; its materials: ${ids.join(', ')}`);
    for (const target of id === null ? ids : [id]) out.set(target, pa);
  }
  return out;
}

function stressLimitsOf(flags: FlagValues, lists: FlagLists, pieces: readonly MaterialPiece[], units: OutputUnits): StressLimits {
  const factorText = stringFlag(flags, 'stress-factor');
  const factor = factorText === undefined ? undefined : Number(factorText);
  if (factor !== undefined && !(factorText!.trim() !== '' && Number.isFinite(factor) && factor > 0)) throw new UsageError(`--stress-factor: expected a positive number such as 0.6, got ${JSON.stringify(factorText)}`);
  const allowable = allowables('allowable', lists.allowable ?? [], pieces, units);
  const shearAllowable = allowables('shear-allowable', lists['shear-allowable'] ?? [], pieces, units);
  return { ...(factor !== undefined ? { factor } : {}), ...(allowable !== undefined ? { allowable } : {}), ...(shearAllowable !== undefined ? { shearAllowable } : {}) };
}

function pointLoad(flags: FlagValues, force: string, atFlag: string, span: number, support: string, units: OutputUnits): { P: number; a: number }[] {
  const text = stringFlag(flags, force);
  const at = lengthFlag(flags, atFlag, units.length);
  if (at !== undefined && text === undefined) throw new UsageError(`--${atFlag} needs --${force}`);
  if (at !== undefined && (at < 0 || at > span)) throw new UsageError(`--${atFlag}: ${at} is outside the span 0…${span} (document unit)`);
  if (text === undefined) return [];
  const p = parseQuantity(text, FORCE_UNITS, units.force, `--${force}`);
  return [{ P: forceToNewtons(p.value, p.unit), a: at ?? (support === 'cantilever' ? span : span / 2) }];
}

function runCheck(section: LoadedSection, pieces: Pieces, flags: FlagValues, units: OutputUnits, lists: FlagLists): MemberReport {
  const u = section.unit;
  const span = lengthFlag(flags, 'span', u);
  if (span === undefined) throw new UsageError('--span is required (e.g. 6000 in the document unit, or 6m, 20ft)');
  const support = stringFlag(flags, 'support');
  if (support === undefined || !(SUPPORTS as readonly string[]).includes(support)) throw new UsageError(`--support: expected ${SUPPORTS.join(', ')}, got ${JSON.stringify(support ?? '')}`);
  if (!(span > 0)) throw new UsageError(`--span: expected a positive length, got ${span}`);
  const points = pointLoad(flags, 'point', 'at', span, support, units);
  const uniform = lineLoadNPerM(flags, 'uniform', units) ?? 0;
  const livePoints = pointLoad(flags, 'live-point', 'live-at', span, support, units);
  const liveText = stringFlag(flags, 'live');
  const liveUniform = lineLoadNPerM(flags, 'live', units) ?? 0;
  const limitRatio = ratioFlag(flags, 'limit', COMMON_TOTAL_RATIO);
  const liveLimitRatio = ratioFlag(flags, 'live-limit', COMMON_LIVE_RATIO);
  const selfWeight = flags['self-weight'] === true;
  if (selfWeight && pieces.pieces.some((p) => !Number.isFinite(p.material.density))) throw new UsageError('--self-weight with --E needs --density');
  const stressLimits = stressLimitsOf(flags, lists, pieces.pieces, units);
  const checked = sectionMemberCheck(pieces.pieces, u, {
    span, support: support as Support, points, uniform, selfWeight, samples: 100, limitRatio, liveLimitRatio, stressLimits,
    ...(liveText !== undefined || livePoints.length > 0 ? { live: { uniform: liveUniform, points: livePoints } } : {}),
  });
  if (!checked.ok) throw new UsageError(checked.issues.join('; '));
  return {
    result: checked.result, units, span, support: support as Support, EI: checked.composite.EIx,
    ...(checked.selfWeight !== undefined ? { selfWeight: checked.selfWeight } : {}), stiffnessFrom: pieces.from, pieces: pieces.pieces,
  };
}

/** SI result values → the document's unit system (core/units/systems.ts). */
function converters(s: UnitSystem) {
  return {
    len: (metres: number): number => fromSI(metres, 'length', s.length),
    deflection: (metres: number): number => fromSI(metres, 'length', s.deflection),
    force: (n: number): number => fromSI(n, 'force', s.units.force),
    moment: (nm: number): number => fromSI(nm, 'moment', s.units.moment),
    lineLoad: (nPerM: number): number => fromSI(nPerM, 'lineLoad', s.units.lineLoad),
    stress: (pa: number): number => fromSI(pa, 'stress', s.units.stress),
    EI: (nm2: number): number => fromSI(nm2, 'flexuralStiffness', s.units.flexuralStiffness),
  };
}

/** The unit of every key of the member JSON ("a.b" for nested keys, "stresses[].x" for list items). */
export function memberJsonUnits(s: UnitSystem): Record<string, string> {
  const l = s.length, d = s.deflection, u = s.units;
  return {
    span: l, EI: u.flexuralStiffness, deflectionMax: d, deflectionAt: l, spanOverDeflection: '-', momentMax: u.moment, momentAt: l,
    'momentSagging.value': u.moment, 'momentSagging.at': l, 'momentHogging.value': u.moment, 'momentHogging.at': l,
    reactionLeft: u.force, momentLeft: u.moment, uniformTotal: u.lineLoad, selfWeight: u.lineLoad,
    'stresses[].maxTension': u.stress, 'stresses[].maxTensionAt.x': l, 'stresses[].maxTensionAt.y': l,
    'stresses[].maxCompression': u.stress, 'stresses[].maxCompressionAt.x': l, 'stresses[].maxCompressionAt.y': l, 'stresses[].strengthRatio': '-',
    'limit.ratio': '-', 'limit.limitLength': l, 'limit.allowed': d, liveDeflectionMax: d, 'shearMax.value': u.force, 'shearMax.at': l,
    'verdict.criteria[].demand': `${d} for deflections, ${u.stress} for stresses`, 'verdict.criteria[].limit': `${d} for deflections, ${u.stress} for stresses`, 'verdict.criteria[].ratio': '-', 'deflectionSearch.iterations': '-', 'deflectionSearch.residual': '-',
  };
}

type Converters = ReturnType<typeof converters>;

/** A criterion's demand and limit in the output units (length for deflections, stress for stresses). */
function criterionJson(c: Criterion, k: Converters): Record<string, unknown> {
  const to = (v: number | undefined): number | undefined => (v === undefined ? undefined : c.kind.startsWith('deflection') ? k.deflection(v) : k.stress(v));
  return { criterion: c.label, kind: c.kind, status: c.status, demand: to(c.demand), limit: to(c.limit), ratio: c.ratio, limitBasis: c.limitBasis, ...(c.reason !== undefined ? { reason: c.reason } : {}) };
}

function criterionLine(c: Criterion, k: Converters, s: UnitSystem): string {
  const g = (v: number): string => formatSig(v, 4);
  const unit = c.kind.startsWith('deflection') ? s.deflection : s.units.stress;
  const to = (v: number): number => (c.kind.startsWith('deflection') ? k.deflection(v) : k.stress(v));
  if (c.status === 'not checked') return `  NOT CHECKED  ${c.label}: ${c.reason ?? ''}`;
  const ratio = c.ratio === undefined ? '-' : `${formatSig(c.ratio * 100, 3)} %`;
  return `  ${c.status === 'pass' ? 'pass       ' : 'FAIL       '}  ${c.label}: ${g(to(c.demand ?? NaN))} ${unit} of ${g(to(c.limit ?? NaN))} ${unit} (${c.limitBasis}) = ${ratio}`;
}

function reportJson(file: string, r: MemberReport): Record<string, unknown> {
  const system = unitSystem(r.units.length);
  const k = converters(system);
  const res = r.result;
  return {
    file,
    caution: MEMBER_CAUTION,
    units: memberJsonUnits(system),
    convention: 'x from the left end (the fixed end for cantilever and propped); loads and deflections downward positive; sagging moment positive; stresses tension positive',
    support: r.support,
    span: r.span,
    stiffnessFrom: r.stiffnessFrom,
    EI: k.EI(r.EI),
    deflectionMax: k.deflection(res.deflectionMax),
    deflectionAt: k.len(res.deflectionAt),
    spanOverDeflection: res.spanOverDeflection,
    momentMax: k.moment(res.momentMax),
    momentAt: k.len(res.momentAt),
    momentSagging: { value: k.moment(res.momentSagging.value), at: k.len(res.momentSagging.at) },
    momentHogging: { value: k.moment(res.momentHogging.value), at: k.len(res.momentHogging.at) },
    reactionLeft: k.force(res.reactions.left),
    momentLeft: k.moment(res.reactions.leftMoment),
    uniformTotal: k.lineLoad(res.uniformTotal),
    ...(r.selfWeight !== undefined ? { selfWeight: k.lineLoad(r.selfWeight) } : {}),
    stresses: res.stresses.map((s) => ({
      material: s.name,
      maxTension: k.stress(s.maxTension), maxTensionAt: { x: k.len(s.maxTensionAt.x), y: k.len(s.maxTensionAt.y) },
      maxCompression: k.stress(s.maxCompression), maxCompressionAt: { x: k.len(s.maxCompressionAt.x), y: k.len(s.maxCompressionAt.y) },
      ...(s.strengthRatio !== undefined ? { strengthRatio: s.strengthRatio, strengthRatioOf: s.strengthLabel } : {}),
    })),
    ...(res.limit !== undefined ? { limit: { ratio: res.limit.ratio, limitLength: k.len(res.limit.limitLength), allowed: k.deflection(res.limit.allowed), passes: res.limit.passes, verdict: res.limit.verdict } } : {}),
    ...(res.liveDeflectionMax !== undefined ? { liveDeflectionMax: k.deflection(res.liveDeflectionMax) } : {}),
    shearMax: { value: k.force(res.shearMax.value), at: k.len(res.shearMax.at) },
    verdict: {
      passes: res.verdict.passes,
      summary: res.verdict.summary,
      governing: res.verdict.governing?.label ?? null,
      criteria: res.verdict.criteria.map((c) => criterionJson(c, k)),
      deflectionLimits: DEFLECTION_LIMIT_MEANING,
      stressLimits: STRESS_FACTOR_MEANING,
    },
    deflectionSearch: res.deflectionSolve,
    warnings: r.warnings ?? [],
    cautions: res.cautions,
  };
}

function reportText(file: string, r: MemberReport): string {
  const system = unitSystem(r.units.length);
  const k = converters(system);
  const res = r.result;
  const l = system.length, d = system.deflection, su = system.units, s = su.stress;
  const g = (v: number): string => formatSig(v, 5);
  const lines = [
    `${file}: ${r.support} span ${g(r.span)} ${l}, EI = ${g(k.EI(r.EI))} ${su.flexuralStiffness} (from ${r.stiffnessFrom})`,
    `  maximum deflection   ${g(k.deflection(res.deflectionMax))} ${d} at x = ${g(k.len(res.deflectionAt))} ${l}  (span/${g(res.spanOverDeflection)})`,
    `  maximum moment       ${g(k.moment(res.momentMax))} ${su.moment} at x = ${g(k.len(res.momentAt))} ${l}`,
    `  uniform load total   ${g(k.lineLoad(res.uniformTotal))} ${su.lineLoad}${r.selfWeight !== undefined ? ` (self-weight ${g(k.lineLoad(r.selfWeight))} included)` : ''}`,
    ...res.stresses.map((st) => `  ${st.name}: tension ${g(k.stress(st.maxTension))} ${s}, compression ${g(k.stress(st.maxCompression))} ${s}${st.strengthRatio !== undefined ? `, ${g(st.strengthRatio)} × its ${st.strengthLabel ?? 'strength'}` : ''}`),
  ];
  if (res.liveDeflectionMax !== undefined) lines.push(`  live-load deflection ${g(k.deflection(res.liveDeflectionMax))} ${d}`);
  lines.push(`  maximum shear        ${g(k.force(Math.abs(res.shearMax.value)))} ${su.force} at x = ${g(k.len(res.shearMax.at))} ${l}`);
  lines.push('', `verdict: ${res.verdict.summary}`, ...res.verdict.criteria.map((c) => criterionLine(c, k, system)));
  lines.push('', `Deflection limits: ${DEFLECTION_LIMIT_MEANING}.`, `Stress limits: ${STRESS_FACTOR_MEANING}`);
  lines.push('', ...(r.warnings ?? []).map((w) => `WARNING: ${w}`), ...res.cautions.map((c) => `CAUTION: ${c}`), '');
  return lines.join('\n');
}

function runMember(positionals: readonly string[], flags: FlagValues, io: CliIo, lists: FlagLists = {}): number {
  const loaded = loadSectionArgument(memberCommand, positionals, stringFlag(flags, 'unit'), io, flags.section, dxfReadOptions(flags, lists));
  if (!loaded) return EXIT_BAD_INPUT;
  const { file, section } = loaded;
  const units = outputUnits(section.unit);
  try {
    const pieces = piecesFor(section, flags, units);
    if (Array.isArray(pieces)) {
      io.err(pieces.map((p) => `${file}: ${p}`).join('\n') + '\n');
      return EXIT_BAD_INPUT;
    }
    const report = { ...runCheck(section, pieces, flags, units, lists), warnings: sectionWarnings(section) };
    io.out(flags.json === true ? `${JSON.stringify(reportJson(file, report), (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n` : reportText(file, report));
    // A criterion over its limit is a result that needs attention, as a flagged row is for `check`.
    return report.result.verdict.passes ? EXIT_OK : EXIT_FLAGGED;
  } catch (err) {
    if (err instanceof UsageError || err instanceof QuantityError) {
      io.err(`sectionsmith member: ${err.message}\n`);
      return EXIT_BAD_INPUT;
    }
    throw err;
  }
}

export const memberCommand: Command = {
  name: 'member',
  summary: 'beam check: maximum deflection and moment, bending stress per material, a deflection limit',
  usage: 'member FILE --span L --support simple|cantilever|fixed|propped [--point P [--at A]] [--uniform W] [--live W] [--live-point P [--live-at A]] [--E VALUE] [--self-weight] [--limit N] [--live-limit N] [--stress-factor F] [--allowable [MAT=]S …] [--shear-allowable [MAT=]S …] [--json]',
  description: [
    'The section in FILE (a Sectionsmith document, or GeoJSON with --unit) as a prismatic beam bent',
    'about its x axis by downward loads. Supports: simple (pin and roller), cantilever (fixed at the',
    'left end, x = 0), fixed (both ends), propped (fixed at the left, pinned at the right).',
    'The stiffness EIx is the E-weighted one of the document\'s materials; --E gives one modulus to',
    'the whole shape instead (required for GeoJSON or a document without materials).',
    '',
    'Units: every quantity may carry its unit: --span 6m, 20ft or 13\'-9"; --point 10kN or 2kip;',
    '--uniform 2.5kN/m or 300lbf/ft; --E 200GPa or 29000ksi; --density 7850kg/m3 or 490lb/ft3. A bare',
    'number is read as before: --span and --at in the document unit; N, N per document unit, MPa and',
    'kg/m3 for mm/cm/m documents; lbf, lbf per document unit, psi and lb/ft3 for in/ft documents.',
    'Results follow the document\'s unit system: span and positions in the document unit, deflections',
    'in mm (in for in/ft), forces kN (kip), line loads kN/m (kip/ft), moments kN·m (kip·ft), stresses',
    'MPa (ksi), EI kN·m² (kip·in²).',
    '',
    'With --json: file, caution, units (the unit of every key), convention, support, span, stiffnessFrom, EI, deflectionMax,',
    'deflectionAt, spanOverDeflection, momentMax, momentAt, momentSagging, momentHogging,',
    'reactionLeft, momentLeft, uniformTotal, selfWeight (with --self-weight), stresses (per',
    'material), limit (ratio, limitLength, allowed, passes, verdict), liveDeflectionMax, shearMax,',
    'verdict (passes, summary, governing, criteria with demand, limit, ratio, limitBasis, status),',
    'deflectionSearch and cautions.',
    '',
    'The verdict judges every criterion and names the governing one, with its use ratio (demand /',
    'limit): deflection under the total load (--uniform, --point, --live…, self-weight) against',
    'span/--limit (default 240), deflection under the live load alone against span/--live-limit',
    '(default 360; "not checked" without a live load), bending stress in each material against',
    '--stress-factor × its strength basis (fy; the reference Fb for wood; default factor 1, the',
    'strength itself with no safety factor) or a typed --allowable, and the shear stress',
    'V·Q/(I·t) at the neutral axis against --shear-allowable or, for steel, factor × 0.6 fy.',
    'Exit code 1 when any criterion is over its limit, 0 when all pass; a criterion that cannot',
    'be judged (no strength known) is printed as NOT CHECKED.',
    '',
    'Deflection limits such as span/360, /240, /180, /120 are offered as common practice (IBC Table',
    '1604.3 ratios), not as code compliance; for a cantilever the limit uses twice its length.',
    'Shear deformation is ignored. The local building code and a licensed engineer govern.',
  ].join('\n'),
  flags: MEMBER_FLAGS,
  run: runMember,
};

// ---------------------------------------------------------------------------------------------
// Material results for `sectionsmith props` (EA, EI, weight per length, --eref).

export interface MaterialPropsResults {
  readonly json: Record<string, unknown>;
  readonly units: Record<string, string>;
  readonly rows: readonly (readonly [string, string, string, string])[];
  readonly errors: readonly string[];
}

/**
 * E-weighted results of a document with materials, in the report's length unit and its unit
 * system (core/units/systems.ts): EA (kN or kip), EIx, EIy, EIxy, EI1, EI2 (kN·m² or kip·in²), the
 * E-weighted centroid, transformed area and second moments (to E_ref), mass and weight per length
 * (kg/m, or lb/ft for in/ft), and each part's modular ratio; `units` names the unit of each key. `--eref VALUE`
 * (stress with unit suffix) overrides the reference modulus. Nothing is added for a shape
 * without materials; --eref then is an error.
 */
export function materialPropsResults(file: string, section: LoadedSection, flags: FlagValues, io: CliIo, reportUnit: LengthUnit): MaterialPropsResults {
  const none: MaterialPropsResults = { json: {}, units: {}, rows: [], errors: [] };
  const fail = (errors: string[]): MaterialPropsResults => ({ json: {}, units: {}, rows: [], errors });
  const erefText = stringFlag(flags, 'eref');
  const system = unitSystem(reportUnit);
  const noMaterials = (why: string): MaterialPropsResults => (erefText === undefined ? none : fail([`${file}: --eref: ${why}`]));
  const doc = section.doc;
  if (doc === undefined) return noMaterials('GeoJSON has no materials');
  if (doc.parts.every((p) => p.material === null) && doc.defaultMaterial === null) return noMaterials('the document has no materials assigned');
  const found = materialPiecesFromDocument(doc);
  const problems = [...found.issues, ...found.diagnostics.map((d) => d.message)];
  if (problems.length > 0) return fail(problems.map((p) => `${file}: ${p}`));
  // --eref overrides the document's stored choice (referenceModulus), which overrides the first part's E.
  const stored = documentReferenceModulus(doc);
  if (!stored.ok) return fail([`${file}: ${stored.message}`]);
  let eRef: number | undefined = stored.eRef;
  try {
    eRef = quantityFlag(flags, 'eref', 'stress', outputUnits(reportUnit).stress) ?? eRef;
    if (erefText !== undefined && !(eRef !== undefined && eRef > 0)) return fail([`--eref: the reference modulus must be positive, got ${erefText}`]);
  } catch (err) {
    if (err instanceof QuantityError) return fail([err.message]);
    throw err;
  }
  const c = compositeProperties(found.pieces, section.unit, eRef);
  const erefFrom = erefText !== undefined ? '--eref' : stored.from === 'material' ? `the document's choice: ${stored.materialName ?? 'a material'}` : stored.from === 'typed' ? "the document's typed value" : 'first part';
  const L = (v: number, p = 1): number => convertLength(v, section.unit, reportUnit, p);
  const su = system.units, u = reportUnit;
  const EI = (v: number): number => fromSI(v, 'flexuralStiffness', su.flexuralStiffness);
  // Rounding residue as 0 (core/units zeroWithinRounding): positions on the section's size, EIxy on EIx + EIy, θ on 90°.
  const pr = section.properties;
  const size = Math.max(pr.xMax - pr.xMin, pr.yMax - pr.yMin);
  const values = {
    EA: fromSI(c.EA, 'axialStiffness', su.axialStiffness), EIx: EI(c.EIx), EIy: EI(c.EIy), EIxy: EI(zeroWithinRounding(c.EIxy, c.EIx + c.EIy)), EI1: EI(c.EI1), EI2: EI(c.EI2), thetaEIDeg: zeroWithinRounding(c.thetaDeg, 90),
    cxE: L(zeroWithinRounding(c.cx, size)), cyE: L(zeroWithinRounding(c.cy, size)), eRef: fromSI(c.eRef, 'stress', su.stress),
    transformedArea: L(c.transformedArea, 2), transformedIx: L(c.transformedIx, 4), transformedIy: L(c.transformedIy, 4),
    massPerLength: fromSI(c.massPerLength, 'massPerLength', su.massPerLength), weightPerLength: fromSI(c.weightPerLength, 'weightPerLength', su.weightPerLength),
  };
  const units: Record<string, string> = {
    EA: su.axialStiffness, EIx: su.flexuralStiffness, EIy: su.flexuralStiffness, EIxy: su.flexuralStiffness, EI1: su.flexuralStiffness, EI2: su.flexuralStiffness, thetaEIDeg: 'deg',
    cxE: u, cyE: u, eRef: su.stress, transformedArea: `${u}²`, transformedIx: `${u}⁴`, transformedIy: `${u}⁴`, massPerLength: su.massPerLength, weightPerLength: su.weightPerLength, 'materials[].n': '-',
  };
  const g = (v: number): string => formatSig(v, 6, { grouping: ',' });
  const what: Readonly<Record<keyof typeof values, string>> = {
    EA: 'axial stiffness Σ E_i A_i', EIx: 'bending stiffness about the E-weighted centroid, x', EIy: 'bending stiffness, y', EIxy: 'E-weighted product (+∫E·XY dA)',
    EI1: 'major principal bending stiffness', EI2: 'minor principal bending stiffness', thetaEIDeg: 'angle of the EI1 axis, CCW from +x',
    cxE: 'E-weighted centroid x', cyE: 'E-weighted centroid y', eRef: `reference modulus (${erefFrom})`,
    transformedArea: 'transformed area EA / E_ref', transformedIx: 'transformed Ix = EIx / E_ref', transformedIy: 'transformed Iy = EIy / E_ref',
    massPerLength: 'mass per length Σ ρ_i A_i', weightPerLength: su.weightPerLength === 'kg/m' ? 'weight per length, as mass per length (kg/m)' : 'weight per length',
  };
  const rows: (readonly [string, string, string, string])[] = (Object.keys(values) as (keyof typeof values)[]).map((key) => [key, g(values[key]), units[key] ?? '', what[key]]);
  const materials = c.pieces.map((p, i) => ({ part: p.label, material: found.pieces[i]!.material.name, n: p.n }));
  for (const m of materials) rows.push([`n ${m.part}`, g(m.n), '', `modular ratio E_i / E_ref (${m.material})`]);
  return { json: { ...values, materials }, units, rows, errors: [] };
}
