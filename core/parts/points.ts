/**
 * A list of points pasted from a spreadsheet or a text file → one closed outline (a ring).
 *
 * Format, one point per line: x and y, separated by tabs, semicolons, commas or spaces (the
 * first of these found in the text is the separator: a spreadsheet copies tab-separated, a
 * European CSV uses semicolons). Blank lines and lines starting with # are skipped. A first line
 * that is not all numbers is a header. The decimal mark is a point; "1,5" is refused rather than
 * guessed at (it could be one and a half or fifteen hundred).
 * Optional third column, per segment from this point to the next (the last point's closes the
 * outline), meaning either:
 *   bulge   tan(sweep/4), the DXF convention (core/geometry/types.ts): 0 straight, + counter-clockwise;
 *   radius  the radius of a minor arc (sweep ≤ 180°), + turning counter-clockwise, − clockwise,
 *           0 straight; bulge = ±tan(asin(c/2r)/2) for chord c (common practice); a radius under
 *           half the chord is an error.
 * Which one: a header naming it ("bulge"; "radius" or "r"), else the caller's `third`; a third
 * column with neither is an error, never a guess.
 * Units: whatever the caller says the numbers are in; nothing is converted.
 * A last point equal to the first is the closing point, not a vertex, and is dropped.
 * Errors name the line and the column (1-based) and what is wrong. Geometry (crossings, zero
 * area) is for core/geometry's validateRegion.
 */
export type ThirdColumn = 'bulge' | 'radius';

export interface PointListIssue {
  readonly line: number;
  readonly column?: number;
  readonly message: string;
}

export type PointListResult =
  | { readonly ok: true; readonly points: readonly (readonly [number, number])[]; readonly bulges: readonly number[]; readonly third: ThirdColumn | null; readonly header: boolean }
  | { readonly ok: false; readonly errors: readonly PointListIssue[] };

const MAX_ISSUES = 20;
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function separatorOf(text: string): RegExp {
  if (text.includes('\t')) return /\t/;
  if (text.includes(';')) return /;/;
  if (text.includes(',')) return /,/;
  return /\s+/;
}

const unquote = (cell: string): string => cell.trim().replace(/^"(.*)"$/, '$1').trim();

/** Bulge of a minor arc of signed radius r over a chord of length c, or null when r < c/2. */
export function bulgeFromRadius(r: number, chord: number): number | null {
  if (r === 0) return 0;
  if (Math.abs(r) < chord / 2) return null;
  const half = Math.asin(Math.min(1, chord / (2 * Math.abs(r)))); // half the sweep
  return Math.sign(r) * Math.tan(half / 2);
}

export function parsePointList(text: string, third?: ThirdColumn): PointListResult {
  const errors: PointListIssue[] = [];
  const bad = (line: number, message: string, column?: number): void => {
    if (errors.length < MAX_ISSUES) errors.push({ line, ...(column !== undefined ? { column } : {}), message: `line ${line}${column !== undefined ? `, column ${column}` : ''}: ${message}` });
  };
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const sep = separatorOf(lines.filter((l) => l.trim() !== '' && !l.trim().startsWith('#')).join('\n'));
  const rows: { line: number; cells: string[] }[] = [];
  lines.forEach((raw, i) => {
    const t = raw.trim();
    if (t === '' || t.startsWith('#')) return;
    const cells = (sep.source === '\\s+' ? t.split(sep) : raw.split(sep)).map(unquote);
    // A trailing separator (spreadsheets add one) leaves an empty last cell.
    while (cells.length > 2 && cells[cells.length - 1] === '') cells.pop();
    rows.push({ line: i + 1, cells });
  });
  let header = false;
  let kind: ThirdColumn | null = third ?? null;
  const first = rows[0];
  if (first && !first.cells.slice(0, 2).every((c) => NUMBER.test(c))) {
    header = true;
    const name = (first.cells[2] ?? '').toLowerCase();
    if (/^bulge/.test(name)) kind = 'bulge';
    else if (/^(r|radius)\b/.test(name)) kind = 'radius';
    else if (name !== '') return { ok: false, errors: [{ line: first.line, column: 3, message: `line ${first.line}, column 3: the header "${first.cells[2] ?? ''}" does not say whether the third column is a bulge or a radius (name it "bulge" or "radius")` }] };
    rows.shift();
  }
  const points: [number, number][] = [];
  const thirds: number[] = [];
  let anyThird = false;
  for (const { line, cells } of rows) {
    if (cells.length < 2) {
      bad(line, `expected x and y, found ${cells.length === 1 ? `only "${cells[0] ?? ''}"` : 'nothing'}`, cells.length + 1);
      continue;
    }
    if (cells.length > 3) bad(line, `expected at most 3 columns (x, y, and a bulge or radius), found ${cells.length}`, 4);
    const values = cells.slice(0, 3).map((c, k) => {
      if (c === '' && k === 2) return 0;
      if (!NUMBER.test(c)) {
        bad(line, c.includes(',') && /^[+-]?\d+,\d+$/.test(c) ? `"${c}" uses a decimal comma; write it with a decimal point` : `"${c}" is not a number`, k + 1);
        return Number.NaN;
      }
      const v = Number(c);
      if (!Number.isFinite(v)) bad(line, `"${c}" is too large`, k + 1);
      return v;
    });
    if (cells.length === 3 && cells[2] !== '') anyThird = true;
    points.push([values[0] ?? Number.NaN, values[1] ?? Number.NaN]);
    thirds.push(values[2] ?? 0);
  }
  if (anyThird && kind === null) {
    const at = rows.find((r) => r.cells.length >= 3 && r.cells[2] !== '');
    bad(at?.line ?? 1, 'a third column is given: say whether it is a bulge or an arc radius (a header "x y bulge" or "x y radius", or the bulge/radius choice)', 3);
  }
  if (errors.length > 0) return { ok: false, errors };
  const last = points[points.length - 1], start = points[0];
  if (points.length > 2 && last && start && last[0] === start[0] && last[1] === start[1]) {
    points.pop();
    thirds.pop();
  }
  if (points.length < 2) return { ok: false, errors: [{ line: rows[rows.length - 1]?.line ?? 1, message: `expected at least 3 points (or 2 joined by arcs), found ${points.length}` }] };
  const bulges = thirds.map((v, i) => {
    if (kind !== 'radius') return v;
    const p = points[i] as [number, number], q = points[(i + 1) % points.length] as [number, number];
    const chord = Math.hypot(q[0] - p[0], q[1] - p[1]);
    const b = bulgeFromRadius(v, chord);
    if (b === null) bad(rows[i]?.line ?? i + 1, `radius ${v} is smaller than half the distance to the next point (${chord / 2}); no arc of that radius joins them`, 3);
    return b ?? 0;
  });
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, points, bulges, third: anyThird ? kind : null, header };
}
