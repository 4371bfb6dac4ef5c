/**
 * Tables for spreadsheets (XLSX): the properties table, the comparison and the table-check report
 * as plain rows of typed cells, the same columns as their CSV exports.
 *
 * Numbers stay numbers at full precision (a cell holds the double itself; a non-finite value is
 * written as the text "Infinity", "-Infinity" or "NaN", which a spreadsheet cannot mistake for a
 * number). Units are in the headings (`Ix [mm^4]`). Row 1 holds the caution. Text is always a
 * text cell, so text that looks like a formula ("=SUM(A1:A9)") is stored as text and never run.
 *
 * Why no XLSX bytes here: write-excel-file's entry points (node, browser, universal) return a
 * Node Buffer or stream or a DOM Blob, none of which core may use (no Node, no DOM). So core
 * builds the rows, `xlsxSheetData` puts them in that library's cell shape, and the hosts make the
 * file: cli/xlsx.ts (write-excel-file/node) and the renderer's export (write-excel-file/browser).
 */
import type { TableCheck } from '../check/table.ts';
import { CHECKED_PROPERTIES } from '../check/columns.ts';
import { columnHeading, columnValue } from '../compare/csv.ts';
import { COLUMN_HEADINGS, COMPARE_COLUMNS, stiffnessRanking, type Comparison, type Pick } from '../compare/compare.ts';
import { CAUTION } from '../member/check.ts';
import { catalogueFor, PROPERTY_CATALOGUE, shownValue, TORSION_CATALOGUE } from '../properties/catalogue.ts';
import { csvUnit, type CsvInput } from './csv.ts';

export type SheetCell = { readonly kind: 'number'; readonly value: number } | { readonly kind: 'text'; readonly value: string } | null;

export interface SheetTable {
  /** The worksheet's name (at most 31 characters, none of : \ / ? * [ ]). */
  readonly sheet: string;
  readonly rows: readonly (readonly SheetCell[])[];
}

const text = (value: string): SheetCell => ({ kind: 'text', value });
/** A number cell; NaN and infinities become text that names them. */
const num = (value: number | null | undefined): SheetCell =>
  value === null || value === undefined ? null : Number.isFinite(value) ? { kind: 'number', value } : text(Number.isNaN(value) ? 'NaN' : value > 0 ? 'Infinity' : '-Infinity');
const unitLabel = (unit: string, power: number): string => (power === 1 ? unit : `${unit}^${power}`);

function withCaution(sheet: string, caution: string, header: readonly string[], rows: readonly (readonly SheetCell[])[]): SheetTable {
  return { sheet, rows: [[text(`CAUTION: ${caution}`)], header.map(text), ...rows] };
}

/** One section's properties: the columns of core/export/csv.ts propertiesCsv. */
export function propertiesSheet(input: CsvInput): SheetTable {
  const header = ['section', 'unit'];
  const values: SheetCell[] = [text(input.name), text(input.unit)];
  const p = input.properties;
  for (const row of catalogueFor('csv', PROPERTY_CATALOGUE)) {
    header.push(`${row.key} [${csvUnit(row.kind, input.unit)}]`);
    values.push(num(shownValue(row.kind, p[row.key], p)));
  }
  header.push('isotropic');
  values.push(text(p.isotropic ? 'true' : 'false'));
  const t = input.torsion;
  if (t) {
    for (const row of catalogueFor('csv', TORSION_CATALOGUE)) {
      const v = t[row.key];
      if (v === undefined) continue;
      header.push(`${row.key} [${csvUnit(row.kind, input.unit)}]`);
      values.push(num(shownValue(row.kind, v, p)));
    }
  }
  return withCaution('Properties', CAUTION, header, [values]);
}

/** The comparison: the columns of core/compare/csv.ts comparisonCsv (with the targets' verdicts when `pick` is given). */
export function comparisonSheet(c: Comparison, pick: Pick | null = null): SheetTable {
  const rank = new Map(stiffnessRanking(c).map((a, i) => [a.name, i + 1]));
  const header = [
    'alternative', ...COMPARE_COLUMNS.flatMap((k) => [columnHeading(k, c.unit), `${COLUMN_HEADINGS[k]} / ${c.baseline}`]),
    `stiffness rank (by ${c.stiffnessColumn})`, ...(pick !== null ? ['meets the targets', 'targets not met (by how much)'] : []), 'notes',
  ];
  const rows = c.alternatives.map((a) => {
    const verdict = pick?.verdicts.find((v) => v.name === a.name);
    return [
      text(a.name), ...COMPARE_COLUMNS.flatMap((k) => [num(a.values[k] === null ? null : columnValue(k, a.values[k], c.unit)), num(a.ratios[k])]), num(rank.get(a.name)),
      ...(pick !== null ? [text(verdict?.meets === true ? (pick.choice?.name === a.name ? 'yes (lightest)' : 'yes') : 'no'), text(verdict?.failures.map((f) => f.message).join('; ') ?? '')] : []),
      text([...a.notes, ...(c.stiffnessColumn === 'EIx' ? [c.stiffnessNote] : [])].join('; ')),
    ];
  });
  return withCaution('Comparison', c.caution, header, rows);
}

/** The table check: the columns of core/check/report-csv.ts tableCheckCsv. */
export function tableCheckSheet(check: TableCheck): SheetTable {
  const symbols = Object.keys(CHECKED_PROPERTIES).filter((s) => check.rows.some((r) => r.properties.some((p) => p.symbol === s)));
  const header = ['row', 'designation', 'type', 'status', 'findings'];
  for (const s of symbols) {
    const u = unitLabel(check.unit, CHECKED_PROPERTIES[s]?.power ?? 1);
    header.push(`${s} table [${u}]`, `${s} computed [${u}]`, `${s} deviation [%]`, `${s} tolerance [%]`);
  }
  const rows = check.rows.map((r) => {
    const cells: SheetCell[] = [num(r.row), text(r.designation), text(r.family ?? '?'), text(r.status), text([...r.findings, ...(r.notCheckedReason !== undefined ? [`not checked: ${r.notCheckedReason}`] : [])].join('; '))];
    for (const s of symbols) {
      const p = r.properties.find((q) => q.symbol === s);
      if (p === undefined) cells.push(null, null, null, null);
      else cells.push(num(p.tabulated), num(p.computed), num(p.deviation * 100), num(p.tolerance * 100));
    }
    return cells;
  });
  return withCaution('Table check', check.caution, header, rows);
}

/** write-excel-file's cell shape ({ type: Number | String, value }), built without importing it. */
export type XlsxCell = { readonly type: NumberConstructor; readonly value: number } | { readonly type: StringConstructor; readonly value: string } | null;

export function xlsxSheetData(table: SheetTable): XlsxCell[][] {
  return table.rows.map((row) => row.map((cell) => (cell === null ? null : cell.kind === 'number' ? { type: Number, value: cell.value } : { type: String, value: cell.value })));
}
