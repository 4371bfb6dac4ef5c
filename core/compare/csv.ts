/**
 * The comparison as CSV (RFC 4180, CRLF): one row per alternative with each value and its ratio
 * to the baseline, the stiffness rank, whether it meets the targets and, if not, each target it
 * fails and by how much; then notes and the caution. Headings say what each column is
 * (COLUMN_HEADINGS, e.g. "Sx (smaller fibre)") with its unit. Text cells through core/export's
 * csvTextCell (quoting, formula defusing); numbers at full precision.
 */
import { csvNumberCell, csvTextCell } from '../export/csv.ts';
import { COLUMN_HEADINGS, COMPARE_COLUMNS, stiffnessRanking, type CompareColumn, type Comparison, type Pick } from './compare.ts';

export function columnUnit(column: CompareColumn, unit: string): string {
  switch (column) {
    case 'A': return `${unit}^2`;
    case 'Ix': case 'Iy': return `${unit}^4`;
    case 'Sx': case 'Zx': return `${unit}^3`;
    case 'IxPerA': return `${unit}^2`;
    case 'SxPerA': case 'ZxPerA': case 'depth': return unit;
    case 'EIx': return 'N·m^2';
    case 'weight': return 'N/m';
    case 'deflection': case 'liveDeflection': return 'm';
    case 'stressUse': return '1';
  }
}

/** "Sx (smaller fibre) [in^3]". */
export function columnHeading(column: CompareColumn, unit: string): string {
  return `${COLUMN_HEADINGS[column]} [${columnUnit(column, unit)}]`;
}

export function comparisonCsv(c: Comparison, pick: Pick | null = null): string {
  const rank = new Map(stiffnessRanking(c).map((a, i) => [a.name, i + 1]));
  const header = [
    'alternative', ...COMPARE_COLUMNS.flatMap((k) => [columnHeading(k, c.unit), `${COLUMN_HEADINGS[k]} / ${c.baseline}`]),
    `stiffness rank (by ${c.stiffnessColumn})`, ...(pick !== null ? ['meets the targets', 'targets not met (by how much)'] : []), 'notes', 'caution',
  ];
  const cell = (v: number | null): string => (v === null ? '' : csvNumberCell(v));
  const rows = c.alternatives.map((a) => {
    const verdict = pick?.verdicts.find((v) => v.name === a.name);
    return [
      csvTextCell(a.name), ...COMPARE_COLUMNS.flatMap((k) => [cell(a.values[k]), cell(a.ratios[k])]), String(rank.get(a.name) ?? ''),
      ...(pick !== null ? [verdict?.meets === true ? (pick.choice?.name === a.name ? 'yes (lightest)' : 'yes') : 'no', csvTextCell(verdict?.failures.map((f) => f.message).join('; ') ?? '')] : []),
      csvTextCell([...a.notes, ...(c.stiffnessColumn === 'EIx' ? [c.stiffnessNote] : [])].join('; ')), csvTextCell(c.caution),
    ].join(',');
  });
  return `${[header.map(csvTextCell).join(','), ...rows].join('\r\n')}\r\n`;
}
