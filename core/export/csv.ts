/**
 * CSV of a section's properties (RFC 4180): a header row and one row of values.
 *
 * Columns: section name, unit, every property the catalogue (core/properties/catalogue.ts) shows
 * in CSV, with its unit in the header (`Ix [in^4]`, `thetaDeg [deg]`), then optional torsion
 * values, then the caution. Numbers are in plain powers of the document unit at full precision
 * (the shortest text that reads back as the same double), the same numbers as `sectionsmith props
 * --json`; rounding residue (below 1e-9 of the property's natural scale) is written as 0.
 *
 * Escaping: a cell with a comma, semicolon, tab, quote, CR or LF is quoted and its quotes doubled. Text cells
 * that a spreadsheet would run as a formula (starting with = + - @, tab or CR; OWASP "CSV
 * injection", common practice) get a leading apostrophe. Number cells are never altered (a
 * negative number is not a formula). Lines end with CRLF, as RFC 4180 says.
 */
import { CAUTION } from '../member/check.ts';
import { catalogueFor, PROPERTY_CATALOGUE, shownValue, TORSION_CATALOGUE, type CatalogueKind } from '../properties/catalogue.ts';
import type { SectionProperties } from '../properties/types.ts';
import type { LengthUnit } from '../units/types.ts';
import { QUANTITY_POWER } from '../units/index.ts';

export interface CsvInput {
  readonly name: string;
  readonly unit: LengthUnit;
  readonly properties: SectionProperties;
  /** Torsion constant, warping constant and shear centre, when computed (document unit⁴, unit⁶, unit). */
  readonly torsion?: { readonly J: number; readonly Cw: number; readonly xs?: number; readonly ys?: number } | null;
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

/** The unit in a CSV header: plain powers of the document unit, 'deg' for angles, '-' for ratios. */
export function csvUnit(kind: CatalogueKind, unit: LengthUnit): string {
  return kind === 'angle' ? 'deg' : kind === 'ratio' ? '-' : unitLabel(unit, QUANTITY_POWER[kind]);
}

export function propertiesCsv(input: CsvInput): string {
  const p = input.properties;
  const header = ['section', 'unit'];
  const values = [csvTextCell(input.name), input.unit];
  for (const row of catalogueFor('csv', PROPERTY_CATALOGUE)) {
    header.push(`${row.key} [${csvUnit(row.kind, input.unit)}]`);
    values.push(csvNumberCell(shownValue(row.kind, p[row.key], p)));
  }
  header.push('isotropic');
  values.push(p.isotropic ? 'true' : 'false');
  const t = input.torsion;
  if (t) {
    for (const row of catalogueFor('csv', TORSION_CATALOGUE)) {
      const v = t[row.key];
      if (v === undefined) continue;
      header.push(`${row.key} [${csvUnit(row.kind, input.unit)}]`);
      values.push(csvNumberCell(shownValue(row.kind, v, p)));
    }
  }
  header.push('caution');
  values.push(csvTextCell(CAUTION));
  return `${header.map(csvTextCell).join(',')}\r\n${values.join(',')}\r\n`;
}
