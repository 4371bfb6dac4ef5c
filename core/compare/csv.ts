/**
 * The comparison as CSV (RFC 4180, CRLF): one row per alternative with each value and its ratio
 * to the baseline, the stiffness rank, whether it meets the targets and, if not, each target it
 * fails and by how much; then notes and the caution. Headings say what each column is
 * (COLUMN_HEADINGS, e.g. "Sx (smaller fibre)") with its unit. Text cells through core/export's
 * csvTextCell (quoting, formula defusing); numbers at full precision.
 *
 * Units: every column heading carries its unit. Geometry in plain powers of the comparison unit;
 * EIx, weight and deflections in the comparison unit's system (core/units/systems.ts): kip·in²,
 * lb/ft and in for an in or ft comparison; kN·m², kg/m and mm for mm, cm or m. core/compare keeps
 * them in SI (N·m², N/m, m); `columnValue` converts. CSV headings use the ASCII form (in^4, kip*in^2).
 */
import { csvNumberCell, csvTextCell } from '../export/csv.ts';
import { asciiUnit, fromSI, unitSystem, type LengthUnit } from '../units/index.ts';
import { COLUMN_HEADINGS, COMPARE_COLUMNS, stiffnessRanking, type CompareColumn, type Comparison, type Pick } from './compare.ts';

const POWER: Partial<Record<CompareColumn, number>> = { A: 2, Ix: 4, Iy: 4, Sx: 3, Zx: 3, IxPerA: 2, SxPerA: 1, ZxPerA: 1, depth: 1 };
const SUPER = ['', '', '²', '³', '⁴'];

/** The unit a column is shown in (Unicode label, e.g. "in⁴", "kip·in²", "lb/ft"). */
export function columnUnit(column: CompareColumn, unit: LengthUnit): string {
  const p = POWER[column];
  if (p !== undefined) return `${unit}${SUPER[p] ?? ''}`;
  const s = unitSystem(unit);
  switch (column) {
    case 'EIx': return s.units.flexuralStiffness;
    case 'weight': return s.units.weightPerLength;
    case 'stressUse': return '1';
    default: return s.deflection;
  }
}

/** A value of core/compare (comparison unit, or SI for EIx, weight and deflections) in columnUnit. */
export function columnValue(column: CompareColumn, value: number, unit: LengthUnit): number {
  if (POWER[column] !== undefined || column === 'stressUse') return value;
  const s = unitSystem(unit);
  if (column === 'EIx') return fromSI(value, 'flexuralStiffness', s.units.flexuralStiffness);
  if (column === 'weight') return fromSI(value, 'weightPerLength', s.units.weightPerLength);
  return fromSI(value, 'length', s.deflection);
}

/** "Sx (smaller fibre) [in^3]" (ASCII unit, for CSV and terminals). */
export function columnHeading(column: CompareColumn, unit: LengthUnit): string {
  return `${COLUMN_HEADINGS[column]} [${asciiUnit(columnUnit(column, unit))}]`;
}

/** The shared loads in the comparison unit's system (kN/m or kip/ft), with their unit. */
export function sharedLoadShown(c: Comparison): { value: number; live?: number; unit: string } | null {
  if (c.beam === null) return null;
  const unit = unitSystem(c.unit).units.lineLoad;
  return { value: fromSI(c.beam.load, 'lineLoad', unit), ...(c.beam.live !== undefined ? { live: fromSI(c.beam.live, 'lineLoad', unit) } : {}), unit };
}

export function comparisonCsv(c: Comparison, pick: Pick | null = null): string {
  const rank = new Map(stiffnessRanking(c).map((a, i) => [a.name, i + 1]));
  const header = [
    'alternative', ...COMPARE_COLUMNS.flatMap((k) => [columnHeading(k, c.unit), `${COLUMN_HEADINGS[k]} / ${c.baseline}`]),
    `stiffness rank (by ${c.stiffnessColumn})`, ...(pick !== null ? ['meets the targets', 'targets not met (by how much)'] : []), 'notes', 'caution',
  ];
  const cell = (k: CompareColumn, v: number | null): string => (v === null ? '' : csvNumberCell(columnValue(k, v, c.unit)));
  const ratio = (v: number | null): string => (v === null ? '' : csvNumberCell(v));
  const rows = c.alternatives.map((a) => {
    const verdict = pick?.verdicts.find((v) => v.name === a.name);
    return [
      csvTextCell(a.name), ...COMPARE_COLUMNS.flatMap((k) => [cell(k, a.values[k]), ratio(a.ratios[k])]), String(rank.get(a.name) ?? ''),
      ...(pick !== null ? [verdict?.meets === true ? (pick.choice?.name === a.name ? 'yes (lightest)' : 'yes') : 'no', csvTextCell(verdict?.failures.map((f) => f.message).join('; ') ?? '')] : []),
      csvTextCell([...a.notes, ...(c.stiffnessColumn === 'EIx' ? [c.stiffnessNote] : [])].join('; ')), csvTextCell(c.caution),
    ].join(',');
  });
  return `${[header.map(csvTextCell).join(','), ...rows].join('\r\n')}\r\n`;
}
