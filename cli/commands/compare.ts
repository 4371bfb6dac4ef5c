/**
 * `sectionsmith compare FILE [FILE…] [--baseline NAME] [--sort COL] [--span L --load W]
 * [--min-ix X] [--limit N] [--unit U] [--csv OUT] [--json]`: alternatives side by side. Every
 * section of every FILE is one alternative, in file order: one document holding several
 * sections compares them; several one-section files compare as before. An alternative is
 * named by its section's name; names that occur in more than one file are given the file's
 * name in front ("a.json: Deeper web") so each stays distinct.
 */
import { writeOutputFile } from '../output.ts';
import { comparisonSheet } from '../../core/export/xlsx.ts';
import { writeXlsxOutput } from '../xlsx.ts';
import { reportHtml } from '../../core/report/index.ts';
import { anyTarget, COLUMN_HEADINGS, COMPARE_COLUMNS, CompareError, compareDocuments, comparisonCsv, comparisonSvg, columnHeading, columnUnit, columnValue, lightestMeeting, sharedLoadShown, sortAlternatives, stiffnessRanking, type Alternative, type CompareColumn, type Comparison, type Pick, type Targets } from '../../core/compare/index.ts';
import { STRESS_FACTOR_MEANING } from '../../core/member/verdict.ts';
import { allSectionViews, documentFromJson, parseDocument, type SectionDocument } from '../../core/document/index.ts';
import { looksLikeDxf } from '../../core/dxf/index.ts';
import { documentFromDxfText } from '../load.ts';
import { formatSig, fromSI, isLengthUnit, readQuantity, unitSystem, type QuantityKind } from '../../core/units/index.ts';
import { CAUTION, EXIT_BAD_INPUT, EXIT_OK, type CliIo, type Command, type FlagValues } from '../command.ts';

function positive(flag: string, text: string | boolean | undefined): number | undefined {
  if (typeof text !== 'string') return undefined;
  const v = Number(text);
  if (!(Number.isFinite(v) && v > 0)) throw new CompareError(`--${flag}: expected a positive number, got ${JSON.stringify(text)}`);
  return v;
}

/** A positive quantity flag through core/units' one reader, in `unit` (bare numbers are read in `bare`). */
function positiveQuantity(flag: string, text: string | boolean | undefined, kind: QuantityKind, bare: string, unit: string): number | undefined {
  if (typeof text !== 'string') return undefined;
  const r = readQuantity(text, { label: `--${flag}`, kind, unit: bare });
  if (!r.ok) throw new CompareError(r.message);
  if (!(r.si > 0)) throw new CompareError(`--${flag}: expected a positive value, got ${JSON.stringify(text)}`);
  return fromSI(r.si, kind, unit);
}

/** A value as its column shows it (core keeps EIx, weight and deflections in SI). */
const shown = (c: Comparison, k: CompareColumn, v: number | null): number | null => (v === null ? null : columnValue(k, v, c.unit));

/** "span 6000 mm, uniform load 30 kN/m (of which live 10 kN/m)" in the comparison unit's system. */
function beamWords(c: Comparison): string {
  const load = sharedLoadShown(c);
  if (c.beam === null || load === null) return '';
  const g = (v: number): string => formatSig(v, 6);
  return `simply supported span ${g(c.beam.span)} ${c.unit}, uniform load ${g(load.value)} ${load.unit}${load.live !== undefined ? ` (of which live ${g(load.live)} ${load.unit})` : ''}`;
}

/** Every value of the comparison in the unit its column states, and those units (for --json). */
function shownComparison(c: Comparison, alternatives: readonly Alternative[]) {
  const units = Object.fromEntries(COMPARE_COLUMNS.map((k) => [k, columnUnit(k, c.unit)]));
  const load = sharedLoadShown(c);
  const lineLoad = unitSystem(c.unit).units.lineLoad;
  return {
    ...c,
    units: { ...units, 'beam.span': c.unit, 'beam.load': lineLoad, 'beam.live': lineLoad, ratios: '-' },
    beam: c.beam === null || load === null ? null : { span: c.beam.span, load: load.value, ...(load.live !== undefined ? { live: load.live } : {}) },
    alternatives: alternatives.map((a) => ({ ...a, values: Object.fromEntries(COMPARE_COLUMNS.map((k) => [k, shown(c, k, a.values[k])])) })),
  };
}

function text(c: Comparison, order: readonly CompareColumn[], sortBy: CompareColumn, pick: Pick | null): string {
  const g = (v: number | null): string => (v === null ? '-' : formatSig(v, 4));
  const head = ['alternative', ...order.map((k) => columnHeading(k, c.unit))];
  const alts = sortAlternatives(c, sortBy);
  const rows = alts.map((a) => [a.name, ...order.map((k) => `${g(shown(c, k, a.values[k]))} (${a.ratios[k] === null ? '-' : `${formatSig(a.ratios[k], 3)}×`})`)]);
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (r: readonly string[]): string => r.map((v, i) => v.padEnd(widths[i]!)).join('  ');
  const beam = c.beam === null ? '' : `; ${beamWords(c)}`;
  const out = [`${c.alternatives.length} alternatives; ratios (×) to "${c.baseline}"; sorted by ${COLUMN_HEADINGS[sortBy]}${beam}`, '', line(head), ...rows.map(line)];
  out.push('', `stiffness ranking by ${c.stiffnessColumn} (${c.stiffnessNote}): ${stiffnessRanking(c).map((a, i) => `${i + 1}. ${a.name}`).join(', ')}`);
  for (const a of c.alternatives) for (const n of a.notes) out.push(`  ${a.name}: ${n}`);
  if (pick !== null) {
    out.push('', pick.choice === null ? 'no alternative meets every target' : `lightest meeting every target (by ${pick.by === 'A' ? 'area: no weight for every alternative' : 'weight'}): ${pick.choice.name}`);
    for (const v of pick.verdicts) if (!v.meets) out.push(`  ${v.name} does not meet: ${v.failures.map((f) => f.message).join('; ')}`);
  }
  if (c.beam !== null) out.push('', `Stress limits: ${STRESS_FACTOR_MEANING}`);
  out.push('', `CAUTION: ${CAUTION}`, '');
  return out.join('\n');
}

function runCompare(positionals: readonly string[], flags: FlagValues, io: CliIo): number | Promise<number> {
  const fail = (m: string): number => {
    io.err(`sectionsmith compare: ${m}\n`);
    return EXIT_BAD_INPUT;
  };
  if (positionals.length === 0) return fail(`expected one or more document files\nusage: sectionsmith ${compareCommand.usage}`);
  if (flags.unit !== undefined && !isLengthUnit(flags.unit)) return fail(`--unit: expected in, ft, mm, cm or m, got ${JSON.stringify(flags.unit)}`);
  const sortBy = (flags.sort ?? 'A') as CompareColumn;
  if (!COMPARE_COLUMNS.includes(sortBy)) return fail(`--sort: unknown column "${String(flags.sort)}"; columns: ${COMPARE_COLUMNS.join(', ')}`);
  const found: { file: string; name: string; doc: SectionDocument }[] = [];
  for (const file of positionals) {
    let t: string;
    try {
      t = io.readFile(file);
    } catch {
      return fail(`${file}: cannot read the file`);
    }
    // A DXF drawing is read as a one-section document (its unit from $INSUNITS, else --unit).
    const dxf = /\.dxf$/i.test(file) || looksLikeDxf(t) ? documentFromDxfText(file, t, isLengthUnit(flags.unit) ? flags.unit : undefined, {}) : null;
    if (dxf !== null && !dxf.ok) return fail(dxf.messages.join('\n'));
    if (dxf !== null) io.err(dxf.notes.map((n) => `${file}: ${n}\n`).join(''));
    const parsed = dxf !== null ? documentFromJson(dxf.value) : parseDocument(t, file);
    if (!parsed.ok) return fail(parsed.errors.map((e) => e.message).join('\n'));
    for (const v of allSectionViews(parsed.file)) found.push({ file, ...v });
  }
  const count = new Map<string, number>();
  for (const f of found) count.set(f.name, (count.get(f.name) ?? 0) + 1);
  const docs: SectionDocument[] = found.map((f) => ((count.get(f.name) ?? 0) > 1 ? { ...f.doc, name: `${f.file}: ${f.name}` } : f.doc));
  const named = new Set(docs.map((d) => d.name));
  if (named.size < docs.length) return fail(`two sections in the same file share a name after all: ${docs.map((d) => JSON.stringify(d.name)).join(', ')}`);
  let xlsx: Promise<void> | null = null;
  try {
    // The span in the comparison unit (the first document's, or --unit); bare loads are N/m as before.
    const unit = typeof flags.unit === 'string' && isLengthUnit(flags.unit) ? flags.unit : found[0]?.doc.unit ?? 'mm';
    const span = positiveQuantity('span', flags.span, 'length', unit, unit);
    const load = positiveQuantity('load', flags.load, 'lineLoad', 'N/m', 'N/m');
    const live = positiveQuantity('live', flags.live, 'lineLoad', 'N/m', 'N/m');
    if ((span === undefined) !== (load === undefined)) return fail('--span and --load go together (e.g. --span 6m --load 30kN/m)');
    if (live !== undefined && load === undefined) return fail('--live needs --span and --load (the live load is part of the total --load)');
    const factor = positive('stress-factor', flags['stress-factor']);
    const c = compareDocuments(docs, {
      ...(typeof flags.unit === 'string' && isLengthUnit(flags.unit) ? { unit: flags.unit } : {}),
      ...(typeof flags.baseline === 'string' ? { baseline: flags.baseline } : {}),
      beam: span !== undefined && load !== undefined ? { span, load, ...(live !== undefined ? { live } : {}) } : null,
      ...(factor !== undefined ? { stressLimits: { factor } } : {}),
    });
    const numbers: [keyof Targets, string][] = [['minIx', 'min-ix'], ['minSx', 'min-sx'], ['minZx', 'min-zx'], ['minEIx', 'min-ei'], ['maxDepth', 'max-depth'], ['deflectionRatio', 'limit'], ['liveDeflectionRatio', 'live-limit']];
    const targets: Record<string, number | boolean> = {};
    for (const [key, flag] of numbers) {
      const v = flag === 'min-ei' ? positiveQuantity(flag, flags[flag], 'flexuralStiffness', 'N·m²', 'N·m²')
        : flag === 'max-depth' ? positiveQuantity(flag, flags[flag], 'length', unit, unit)
        : flag === 'min-ix' ? positiveQuantity(flag, flags[flag], 'inertia', `${unit}⁴`, `${unit}⁴`)
        : flag === 'min-sx' || flag === 'min-zx' ? positiveQuantity(flag, flags[flag], 'modulus', `${unit}³`, `${unit}³`)
        : positive(flag, flags[flag]);
      if (v !== undefined) targets[key] = v;
    }
    if (flags.stress === true) targets.stressWithinLimit = true;
    const pick = anyTarget(targets as Targets) ? lightestMeeting(c, targets as Targets) : null;
    if (typeof flags.csv === 'string') writeOutputFile('csv', flags.csv, comparisonCsv(c, pick));
    if (typeof flags.xlsx === 'string') xlsx = writeXlsxOutput('xlsx', flags.xlsx, comparisonSheet(c, pick));
    if (typeof flags.svg === 'string' || typeof flags.report === 'string') {
      const svg = comparisonSvg(docs, c.unit);
      if (typeof flags.svg === 'string') writeOutputFile('svg', flags.svg, svg);
      if (typeof flags.report === 'string') {
        const g = (v: number | null): string => (v === null ? '-' : formatSig(v, 4));
        const rows = sortAlternatives(c, sortBy).map((a) => [a.name, ...COMPARE_COLUMNS.map((k) => `${g(shown(c, k, a.values[k]))}${a.ratios[k] === null ? '' : ` (${formatSig(a.ratios[k], 3)}×)`}`)]);
        const targetRows = pick === null ? [] : pick.verdicts.map((v) => [v.name, v.meets ? (pick.choice?.name === v.name ? 'yes (lightest)' : 'yes') : 'no', v.failures.map((f) => f.message).join('; ')]);
        const checks = c.beam === null ? [] : c.alternatives.map((a) => `${a.name}: midspan deflection ${g(shown(c, 'deflection', a.values.deflection))} ${columnUnit('deflection', c.unit)}, ${beamWords(c)}`);
        const materials = docs.map((d) => `${d.name}: ${d.defaultMaterial ?? 'no default material'}${d.materials.length > 0 ? `; ${d.materials.map((m) => m.name).join(', ')}` : ''}`);
        writeOutputFile('report', flags.report, reportHtml({ title: `Comparison of ${c.alternatives.length} alternatives`, drawings: [svg], tables: [{ title: `Properties (ratios to "${c.baseline}"); stiffness by ${c.stiffnessColumn}: ${c.stiffnessNote}`, columns: ['alternative', ...COMPARE_COLUMNS.map((k) => columnHeading(k, c.unit))], rows }, ...(pick === null ? [] : [{ title: 'Targets', columns: ['alternative', 'meets every target', 'targets not met (by how much)'], rows: targetRows }])], materials, memberChecks: checks }));
      }
    }
    if (flags.json === true) io.out(`${JSON.stringify({ ...shownComparison(c, sortAlternatives(c, sortBy)), stiffnessRanking: stiffnessRanking(c).map((a) => a.name), pick: pick === null ? null : { name: pick.choice?.name ?? null, by: pick.by, verdicts: pick.verdicts, failing: pick.failing } }, null, 2)}\n`);
    else io.out(text(c, COMPARE_COLUMNS, sortBy, pick));
  } catch (err) {
    if (err instanceof CompareError) return fail(err.message);
    throw err;
  }
  return xlsx === null ? EXIT_OK : xlsx.then(() => EXIT_OK);
}

export const compareCommand: Command = {
  name: 'compare',
  summary: 'alternative sections side by side, ratios to a baseline, lightest meeting a target',
  usage: 'compare FILE [FILE…] [--baseline NAME] [--sort COL] [--span L --load W [--live W]] [--limit N] [--live-limit N] [--stress] [--stress-factor F] [--min-ix X] [--min-sx X] [--min-zx X] [--min-ei X] [--max-depth X] [--csv OUT] [--xlsx OUT] [--json]',
  description: [
    'Each FILE is a Sectionsmith document; each of its sections is one alternative, named by the',
    'section\'s name (one file with several sections compares them; a name found in more than',
    'one file gets "FILE: " in front). The table lists A, Ix, Iy, Sx (smaller fibre), Zx, Ix/A,',
    'Sx/A, Zx/A, the overall depth and, for documents with materials, EIx, weight and, with --span',
    'and --load (total; --live its live part), the largest deflection of a simply supported beam',
    'under total and live load and the bending stress',
    'use (σ / limit) of the worst material; each with its ratio to --baseline (default: the first',
    'alternative). --sort COL orders the rows. Where the materials differ, stiffness is ranked by',
    'EIx, not by geometric Ix. Targets (--limit, --live-limit, --stress, --min-ix, --min-sx,',
    '--min-zx, --min-ei, --max-depth) pick the lightest alternative meeting every one (by weight',
    'when all have one, else by area); each other alternative is listed with the targets it fails',
    'and by how much.',
    'Units follow the comparison unit: EIx, weight and deflections in kip·in², lb/ft and in for in/ft,',
    'kN·m², kg/m and mm for mm/cm/m; --json says the unit of every column in "units". --span, --load,',
    '--live, --max-depth, --min-ix, --min-sx, --min-zx and --min-ei take units (--span 6m or 20ft,',
    '--load 30kN/m or 2kip/ft, --min-ix 500in4 or 2.1e8mm4, --min-sx 60in3, --min-ei 40000kN*m2);',
    'bare numbers keep their old units (span and depth in the unit, Ix in unit^4, Sx and Zx in unit^3, loads in',
    'N/m, EI in N·m²).',
    '--csv OUT writes the table as CSV; --svg OUT the outlines at one scale; --report OUT.html a printable report.',
  ].join('\n'),
  flags: [
    { name: 'baseline', type: 'string', value: 'NAME', description: 'the alternative (section name) the ratios refer to (default: the first)' },
    { name: 'sort', type: 'string', value: 'COL', description: `sort column: ${COMPARE_COLUMNS.join(', ')} (default A)` },
    { name: 'unit', type: 'string', value: 'U', description: 'length unit of the table (default: the first document\'s)' },
    { name: 'span', type: 'string', value: 'L', description: 'shared simply supported span, e.g. 6m, 20ft (bare: the unit)' },
    { name: 'load', type: 'string', value: 'W', description: 'shared uniform load, total, e.g. 30kN/m, 2kip/ft (bare: N/m)' },
    { name: 'live', type: 'string', value: 'W', description: 'the live part of --load, e.g. 10kN/m (bare: N/m; for the live-load deflection)' },
    { name: 'stress-factor', type: 'string', value: 'F', description: 'bending stress limit = F × strength basis (fy; reference Fb for wood); default 1' },
    { name: 'min-ix', type: 'string', value: 'X', description: 'target: Ix at least X, e.g. 500in4 or 2.1e8mm4 (bare: unit^4)' },
    { name: 'min-sx', type: 'string', value: 'X', description: 'target: Sx (smaller fibre) at least X, e.g. 60in3 (bare: unit^3)' },
    { name: 'min-zx', type: 'string', value: 'X', description: 'target: Zx at least X, e.g. 1000cm3 (bare: unit^3)' },
    { name: 'min-ei', type: 'string', value: 'X', description: 'target: EIx at least X, e.g. 40000kN*m2 (bare: N·m^2)' },
    { name: 'max-depth', type: 'string', value: 'X', description: 'target: overall depth at most X, e.g. 12in or 300mm (bare: unit)' },
    { name: 'limit', type: 'string', value: 'N', description: 'target: deflection under total load at most span/N (e.g. 240 or 360)' },
    { name: 'live-limit', type: 'string', value: 'N', description: 'target: deflection under live load at most span/N (e.g. 360); needs --live' },
    { name: 'stress', type: 'boolean', description: 'target: bending stress at most its limit in every material (needs --span and --load)' },
    { name: 'csv', type: 'string', value: 'OUT', description: 'write the comparison as CSV' },
    { name: 'xlsx', type: 'string', value: 'OUT', description: 'write the comparison as XLSX (numbers as numbers at full precision, units in the headings, the caution in row 1)' },
    { name: 'svg', type: 'string', value: 'OUT', description: 'write the outlines side by side at one scale (SVG)' },
    { name: 'report', type: 'string', value: 'OUT.html', description: 'write a printable HTML report' },
    { name: 'json', type: 'boolean', description: 'print JSON instead of the table' },
  ],
  run: runCompare,
};
