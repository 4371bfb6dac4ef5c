/**
 * `sectionsmith check TABLE.csv [--type T] [--map col=target …] [--tolerance 1% …] [--unit U]
 * [--out REPORT.csv] [--json] [--mapping FILE] [--save-map FILE]`: rebuilds every row of a table
 * of shapes from its dimensions and compares the tabulated properties (core/check).
 * Exit codes: 0 every row passes; 1 some rows are flagged; 2 bad input or usage; 3 an internal
 * error (cli/command.ts), never 1, so a crash cannot read as "flagged".
 */
import { writeOutputFile } from '../output.ts';
import { tableCheckSheet } from '../../core/export/xlsx.ts';
import { writeXlsxOutput } from '../xlsx.ts';
import { checkTable, familyOf, MappingError, parseTolerances, readStoredMapping, TableInputError, tableCheckCsv, TABLE_FAMILIES, type ColumnMapping, type TableCheck } from '../../core/check/index.ts';
import { isLengthUnit } from '../../core/units/index.ts';
import { CAUTION, EXIT_BAD_INPUT, EXIT_FLAGGED, EXIT_OK, type CliIo, type Command, type FlagLists, type FlagValues } from '../command.ts';

/** Rows flagged: the table disagrees with its own dimensions somewhere (cli/command.ts). */
export { EXIT_FLAGGED };

/** Every value of a repeatable flag, each split at commas: `--tolerance 1.5%,A=1% --tolerance Zx=2%` → three items. */
const list = (values: readonly string[] | undefined): string[] => (values ?? []).flatMap((v) => v.split(',')).map((s) => s.trim()).filter((s) => s !== '');

/**
 * `--map` items: COLUMN=TARGET, several per value separated by commas, the flag repeatable. A
 * target never holds a comma, so a piece without "=" is the front of a column name that does
 * ("Ix, in4=Ix"): it is joined to the piece after it.
 */
export function mapItems(values: readonly string[]): string[] {
  const items: string[] = [];
  for (const value of values) {
    let pending = '';
    for (const piece of value.split(',')) {
      const joined = pending === '' ? piece : `${pending},${piece}`;
      if (joined.includes('=')) {
        items.push(joined.trim());
        pending = '';
      } else pending = joined;
    }
    if (pending.trim() !== '') items.push(pending.trim());
  }
  return items.filter((s) => s !== '');
}

/** Column → target, keyed by the header text as typed (a Map, so a column named "constructor" is just a name). */
function overridesOf(values: readonly string[] | undefined): Map<string, string> {
  const out = new Map<string, string>();
  for (const item of mapItems(values ?? [])) {
    const eq = item.lastIndexOf('=');
    if (eq <= 0 || eq === item.length - 1) throw new MappingError(`--map: "${item}" is not COLUMN=TARGET (e.g. "Ix (in4)=Ix" or depth=d)`);
    const column = item.slice(0, eq).trim();
    const target = item.slice(eq + 1).trim();
    const earlier = out.get(column);
    if (earlier !== undefined && earlier !== target) throw new MappingError(`--map: column "${column}" is given two targets, ${earlier} and ${target}`);
    out.set(column, target);
  }
  return out;
}

const pct = (v: number): string => `${v >= 0 ? '+' : ''}${(v * 100).toFixed(2)} %`;

export function checkText(file: string, c: TableCheck): string {
  const s = c.summary;
  const lines = [
    `${file}: ${s.rowsRead} row${s.rowsRead === 1 ? '' : 's'}: ${s.rowsPassed} pass, ${s.rowsFlagged} flagged, ${s.rowsNotChecked} not checked; ${s.propertiesChecked} tabulated values compared, ${s.propertiesFlagged} beyond tolerance (unit ${c.unit})`,
    'Each row rebuilt from its dimensions with the parts library; deviation = computed / table − 1.',
    '',
    'worst deviation of each property:',
    ...s.worst.map((w) => `  ${w.symbol.padEnd(3)} ${pct(w.deviation).padStart(9)}  row ${w.row} ${w.designation}${w.flagged ? '  FLAGGED' : ''}`),
    '',
    'rows:',
  ];
  for (const r of c.rows) {
    const worst = r.properties.reduce((a, p) => (Math.abs(p.deviation) > Math.abs(a) ? p.deviation : a), 0);
    const status = r.status === 'flagged' ? 'FLAGGED    ' : r.status === 'pass' ? 'pass       ' : 'NOT CHECKED';
    lines.push(`  ${String(r.row).padStart(4)}  ${r.designation.padEnd(16)} ${(r.family ?? '?').padEnd(4)} ${status}  ${r.properties.length} values${r.properties.length > 0 ? `, largest ${pct(worst)}` : ''}${r.familyFrom === 'designation' ? ' (family from the designation)' : ''}`);
    for (const f of r.findings) lines.push(`          ${f}`);
    if (r.notCheckedReason !== undefined) lines.push(`          not checked: ${r.notCheckedReason}`);
  }
  if (c.ignoredColumns.length > 0) {
    lines.push('', 'columns not used (not recognised, or recognised but not checked):');
    for (const col of c.ignoredColumns) lines.push(`  ${col.header}: ${col.why}`);
  }
  lines.push('', `CAUTION: ${CAUTION}`, '');
  return lines.join('\n');
}

function runCheck(positionals: readonly string[], flags: FlagValues, io: CliIo, lists: FlagLists = {}): number | Promise<number> {
  const fail = (message: string): number => {
    io.err(`sectionsmith check: ${message}\n`);
    return EXIT_BAD_INPUT;
  };
  if (positionals.length !== 1) return fail(`expected one TABLE.csv, got ${positionals.length === 0 ? 'none' : positionals.join(' ')}\nusage: sectionsmith ${checkCommand.usage}`);
  const file = positionals[0]!;
  const unit = flags.unit ?? 'in';
  if (!isLengthUnit(unit)) return fail(`--unit: expected in, ft, mm, cm or m, got ${JSON.stringify(unit)}`);
  let type;
  if (typeof flags.type === 'string') {
    type = familyOf(flags.type);
    if (type === undefined) return fail(`--type: unknown type "${flags.type}"; known: ${TABLE_FAMILIES.join(', ')}`);
  }
  let text: string;
  try {
    text = io.readFile(file);
  } catch (err) {
    return fail(`${file}: cannot read the file: ${(err as { code?: string }).code === 'ENOENT' ? 'no such file' : err instanceof Error ? err.message : String(err)}`);
  }
  let result: TableCheck;
  try {
    let stored: ColumnMapping | undefined;
    if (typeof flags.mapping === 'string') {
      const where = flags.mapping;
      let value: unknown;
      try {
        value = JSON.parse(io.readFile(where)) as unknown;
      } catch (err) {
        return fail(`--mapping ${where}: cannot read it as JSON: ${err instanceof Error ? err.message : String(err)}`);
      }
      stored = readStoredMapping(value, `--mapping ${where}`);
    }
    result = checkTable(text, {
      unit,
      ...(type !== undefined ? { type } : {}),
      overrides: overridesOf(lists.map),
      ...(stored !== undefined ? { mapping: stored } : {}),
      tolerances: parseTolerances(list(lists.tolerance)),
      ...(flags['own-labels'] === true ? { readLabels: false } : {}),
    });
  } catch (err) {
    if (err instanceof TableInputError || err instanceof MappingError) return fail(`${file}: ${err.message}`);
    throw err;
  }
  let xlsx: Promise<void> | null = null;
  try {
    if (typeof flags.out === 'string') writeOutputFile('out', flags.out, tableCheckCsv(result));
    if (typeof flags.xlsx === 'string') xlsx = writeXlsxOutput('xlsx', flags.xlsx, tableCheckSheet(result));
    if (typeof flags['save-map'] === 'string') writeOutputFile('save-map', flags['save-map'], `${JSON.stringify(result.mapping, null, 2)}\n`);
  } catch (err) {
    return fail(`cannot write: ${err instanceof Error ? err.message : String(err)}`);
  }
  if (flags.json === true) {
    const body = { file, caution: CAUTION, unit: result.unit, summary: result.summary, rows: result.rows, ignoredColumns: result.ignoredColumns, mapping: result.mapping };
    io.out(`${JSON.stringify(body, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`);
  } else {
    io.out(checkText(file, result));
  }
  if (result.summary.rowsChecked === 0) {
    // Nothing compared is not a pass: a header-only table, or rows that could not be judged.
    io.err(`sectionsmith check: ${file}: nothing checked: ${result.summary.rowsRead === 0 ? 'the table has a header but no rows' : `none of its ${result.summary.rowsRead} rows could be compared (${[...new Set(result.rows.map((r) => r.notCheckedReason ?? ''))].join('; ')})`}\n`);
  }
  const code = result.summary.rowsChecked === 0 ? EXIT_BAD_INPUT : result.summary.rowsFlagged > 0 ? EXIT_FLAGGED : EXIT_OK;
  return xlsx === null ? code : xlsx.then(() => code);
}

export const checkCommand: Command = {
  name: 'check',
  summary: 'check a table of shapes (CSV) against properties rebuilt from its dimensions',
  usage: 'check TABLE.csv [--type T] [--map COL=TARGET …] [--tolerance 1% …] [--unit U] [--out REPORT.csv] [--xlsx REPORT.xlsx] [--json]',
  description: [
    'Reads a CSV table of shapes (a designation column, dimension columns and tabulated property',
    'columns; the family from a type column, --type, or the designation\'s prefix W, HP, S, C …),',
    'rebuilds each row with the parts library using',
    'the catalogue conventions (W: r = kdes − tf; S, C: 2:12 flange slope; HSS and Pipe: tdes),',
    'computes A, Ix, Iy, Sx, Sy, Zx, Zy, rx, ry (angles also Iw, Iz, rz) and flags every value',
    'that differs from the table by more than its tolerance. A row is pass, flagged, or not',
    'checked (with the reason: a dimension or every value missing, or no family). Every',
    'comparison is reported, whichever fires first. Inch tables also have their',
    'designations read as AISC labels (family, nominal weight, legs, walls) and looked up in the',
    'AISC Shapes Database v15.0 (dimensions compared); --own-labels turns that off.',
    '',
    'Columns are recognised by trade symbol, in any case where case does not change the meaning,',
    'with words around it and the unit in a suffix or bracket: d_in, "Depth d (in)", "Flange',
    'width bf (in)", "Web tw (in)", "k des (in)", t, b, Ht, B, tnom, tdes, OD; A_in2, Ix_in4,',
    '"Ix [mm^4]", "Sx (10^3 mm^3)". A',
    'column without a unit is in --unit (default in). Types: W, M, HP, S, C, MC, WT, MT, ST, L,',
    'HSS, PIPE.',
    '',
    '--map corrects the mapping: COLUMN=TARGET, the flag repeated or several items separated by',
    'commas; TARGET is designation, type, ignore, a dimension or property symbol, optionally',
    'with a unit ("Depth=d:mm", "I major=Ix:10^6mm^4"). --save-map FILE writes the mapping used',
    '(JSON); --mapping FILE reads one back (--map still wins).',
    '',
    '--tolerance: a default ("1%", or a fraction "0.01"), per property ("Zx=2%") or per family',
    'and property ("MC:Iy=7%"), the flag repeated or several separated by commas; the most',
    'specific applies. Built-in defaults: A 1 %, I, S, Z, r 1.5 % (AISC prints 3 significant',
    'figures), S and C y-axis 3 %, MC up to 7 %, angles Z 2 % and Iz 2.5 %; a default you give',
    'replaces them all.',
    '',
    '--out REPORT.csv writes one row per table row (status, findings, table and computed values,',
    'deviation and tolerance in %). --json prints the summary, rows and mapping as JSON.',
    '',
    'At most 100,000 rows per table. Exit codes: 0 no row flagged (rows not checked are listed);',
    '1 some rows are flagged; 2 bad input (the message names the row and the column) or nothing',
    'checked (a header without rows, or no row could be compared); 3 an internal error.',
  ].join('\n'),
  flags: [
    { name: 'type', type: 'string', value: 'T', description: 'family of rows without a type column: W, M, HP, S, C, MC, WT, MT, ST, L, HSS, PIPE' },
    { name: 'map', type: 'string', value: 'COL=TARGET', description: 'correct the column mapping (see above)', multiple: true },
    { name: 'tolerance', type: 'string', value: 'SPEC', description: 'tolerances: 1%, Zx=2%, MC:Iy=7% (built-in defaults per family, see above)', multiple: true },
    { name: 'unit', type: 'string', value: 'U', description: 'unit of columns without one: in|ft|mm|cm|m (default in)' },
    { name: 'out', type: 'string', value: 'REPORT.csv', description: 'write the per-row report as CSV' },
    { name: 'xlsx', type: 'string', value: 'REPORT.xlsx', description: 'write the per-row report as XLSX (numbers as numbers at full precision, units in the headings, the caution in row 1)' },
    { name: 'mapping', type: 'string', value: 'FILE', description: 'read a saved column mapping (JSON)' },
    { name: 'save-map', type: 'string', value: 'FILE', description: 'write the column mapping used (JSON)' },
    { name: 'own-labels', type: 'boolean', description: "designations are a maker's own: do not read them as AISC labels" },
    { name: 'json', type: 'boolean', description: 'print JSON instead of text' },
  ],
  run: runCheck,
};
