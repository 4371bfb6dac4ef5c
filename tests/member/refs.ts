/** Reads a closed-form reference CSV (columns case, params, quantity, value, source). */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';

export interface RefRow {
  readonly case: string;
  readonly params: string;
  readonly quantity: string;
  readonly value: number;
  readonly source: string;
}

export function readRefs(fileUrl: URL): RefRow[] {
  const text = readFileSync(fileUrl, 'utf8');
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
  return parsed.data.map((r) => ({
    case: r.case ?? '', params: r.params ?? '', quantity: r.quantity ?? '', value: Number(r.value), source: r.source ?? '',
  }));
}

/** The value of one row; throws naming the case and quantity when it is missing. */
export function refValue(rows: readonly RefRow[], caseName: string, quantity: string): number {
  const row = rows.find((r) => r.case === caseName && r.quantity === quantity);
  if (row === undefined) throw new Error(`reference row ${caseName}/${quantity} not found`);
  return row.value;
}
