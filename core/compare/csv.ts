/**
 * The comparison as CSV (RFC 4180, CRLF): one row per alternative with each value and its ratio
 * to the baseline, then notes and the caution. Text cells through core/export's csvTextCell
 * (quoting, formula defusing); numbers at full precision.
 */
import { csvNumberCell, csvTextCell } from '../export/csv.ts';
import { COMPARE_COLUMNS, type CompareColumn, type Comparison } from './compare.ts';

export function columnUnit(column: CompareColumn, unit: string): string {
  switch (column) {
    case 'A': return `${unit}^2`;
    case 'Ix': case 'Iy': return `${unit}^4`;
    case 'Sx': case 'Zx': return `${unit}^3`;
    case 'IxPerA': return `${unit}^2`;
    case 'SxPerA': case 'ZxPerA': return unit;
    case 'EIx': return 'N·m^2';
    case 'weight': return 'N/m';
    case 'deflection': return 'm';
  }
}

export function comparisonCsv(c: Comparison): string {
  const header = ['alternative', ...COMPARE_COLUMNS.flatMap((k) => [`${k} [${columnUnit(k, c.unit)}]`, `${k} / ${c.baseline}`]), 'notes', 'caution'];
  const cell = (v: number | null): string => (v === null ? '' : csvNumberCell(v));
  const rows = c.alternatives.map((a) => [csvTextCell(a.name), ...COMPARE_COLUMNS.flatMap((k) => [cell(a.values[k]), cell(a.ratios[k])]), csvTextCell(a.notes.join('; ')), csvTextCell(c.caution)].join(','));
  return `${[header.map(csvTextCell).join(','), ...rows].join('\r\n')}\r\n`;
}
