/**
 * CSV of a section's properties (RFC 4180): a header row and one row of values.
 *
 * Columns: section name, unit, every property of PROPERTY_ROWS with its unit in the header
 * (`Ix [in^4]`, `thetaDeg [deg]`), then optional torsion values, then the caution. Numbers are in
 * plain powers of the document unit at full precision (the shortest text that reads back as the
 * same double), the same numbers as `sectionsmith props --json`.
 *
 * Escaping: a cell with a comma, semicolon, tab, quote, CR or LF is quoted and its quotes doubled. Text cells
 * that a spreadsheet would run as a formula (starting with = + - @, tab or CR; OWASP "CSV
 * injection", common practice) get a leading apostrophe. Number cells are never altered (a
 * negative number is not a formula). Lines end with CRLF, as RFC 4180 says.
 */
import { CAUTION } from '../member/check.ts';
import type { SectionProperties } from '../properties/types.ts';
import type { LengthUnit } from '../units/types.ts';
import { QUANTITY_POWER } from '../units/index.ts';
import { PROPERTY_ROWS } from './rows.ts';

export interface CsvInput {
  readonly name: string;
  readonly unit: LengthUnit;
  readonly properties: SectionProperties;
  /** Saint-Venant torsion constant and warping constant, when computed (document unit⁴, unit⁶). */
  readonly torsion?: { readonly J: number; readonly Cw: number } | null;
}

/** A text cell: formula-like text defused, then RFC 4180 quoting. */
export function csvTextCell(text: string): string {
  const defused = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  // Quoted also when it holds a semicolon or a tab: spreadsheets in locales whose list separator
  // is ";" split there, and "x;=1+1;y" would become a formula cell.
  return /[",;\t\r\n]/.test(defused) ? `"${defused.replaceAll('"', '""')}"` : defused;
}

/** A number cell at full precision; non-finite values are written as text a reader cannot mistake. */
export function csvNumberCell(value: number): string {
  return Number.isFinite(value) ? String(value) : Number.isNaN(value) ? 'NaN' : value > 0 ? 'Infinity' : '-Infinity';
}

const unitLabel = (unit: string, power: number): string => (power === 1 ? unit : `${unit}^${power}`);

export function propertiesCsv(input: CsvInput): string {
  const header = ['section', 'unit'];
  const values = [csvTextCell(input.name), input.unit];
  for (const row of PROPERTY_ROWS) {
    const unit = row.quantity === null ? (row.plainUnit ?? '-') : unitLabel(input.unit, QUANTITY_POWER[row.quantity]);
    header.push(`${row.key} [${unit}]`);
    values.push(csvNumberCell(input.properties[row.key]));
  }
  header.push('isotropic');
  values.push(input.properties.isotropic ? 'true' : 'false');
  if (input.torsion) {
    header.push(`J [${unitLabel(input.unit, 4)}]`, `Cw [${unitLabel(input.unit, 6)}]`);
    values.push(csvNumberCell(input.torsion.J), csvNumberCell(input.torsion.Cw));
  }
  header.push('caution');
  values.push(csvTextCell(CAUTION));
  return `${header.map(csvTextCell).join(',')}\r\n${values.join(',')}\r\n`;
}
