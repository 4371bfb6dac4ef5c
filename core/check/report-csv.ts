/**
 * The table check as CSV (RFC 4180, CRLF line ends): one row per table row with its status,
 * findings, and for each checked property the tabulated and computed values and the deviation
 * in per cent; the caution in the last column of every row. Text cells are quoted and defused
 * against spreadsheet formulas with core/export's csvTextCell; numbers at full precision.
 */
import { csvNumberCell, csvTextCell } from '../export/csv.ts';
import { CHECKED_PROPERTIES, checkedProperty } from './columns.ts';
import type { TableCheck } from './table.ts';

const unitOf = (unit: string, power: number): string => (power === 1 ? unit : `${unit}^${power}`);

export function tableCheckCsv(check: TableCheck): string {
  const symbols = Object.keys(CHECKED_PROPERTIES).filter((s) => check.rows.some((r) => r.properties.some((p) => p.symbol === s)));
  const header = ['row', 'designation', 'type', 'status', 'findings'];
  for (const s of symbols) {
    const u = unitOf(check.unit, checkedProperty(s)!.power);
    header.push(`${s} table [${u}]`, `${s} computed [${u}]`, `${s} deviation [%]`, `${s} tolerance [%]`);
  }
  header.push('caution');
  const lines = [header.map(csvTextCell).join(',')];
  for (const r of check.rows) {
    const cells = [String(r.row), csvTextCell(r.designation), r.family ?? '', r.status, csvTextCell([...r.findings, ...(r.notCheckedReason !== undefined ? [`not checked: ${r.notCheckedReason}`] : [])].join('; '))];
    for (const s of symbols) {
      const p = r.properties.find((q) => q.symbol === s);
      if (p === undefined) cells.push('', '', '', '');
      else cells.push(csvNumberCell(p.tabulated), csvNumberCell(p.computed), csvNumberCell(p.deviation * 100), csvNumberCell(p.tolerance * 100));
    }
    cells.push(csvTextCell(check.caution));
    lines.push(cells.join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
