/**
 * `sectionsmith check` as a process: repeated --map and --tolerance flags all count, per-property
 * tolerances from the command line, --out REPORT.csv, and the exit codes 0 (pass), 1 (flagged),
 * 2 (bad input), 3 (internal error, never 1) listed by --help.
 *
 * Table rows: the W shapes of the AISC Shapes Database v15.0 subset (tests/fixtures/aisc-v15-subset.csv,
 * AISC Nov 2017), which pass at 1 % for A and 1.5 % for I, S, Z, r (tests/check/cli.test.ts,
 * SOURCES.md caveats: 3 significant figures, fillet r = kdes − tf).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { mapItems } from '../../cli/commands/check.ts';

const CLI = new URL('../../cli/sectionsmith.mjs', import.meta.url).pathname;
const THROWS = new URL('../cli/children/stdout-throws.mjs', import.meta.url).pathname;
const LATE = new URL('../cli/children/late-throw.mjs', import.meta.url).pathname;
const FIXTURE = new URL('../fixtures/aisc-v15-subset.csv', import.meta.url).pathname;

function run(args: string[], preload?: string): { code: number; out: string; err: string } {
  const argv = preload === undefined ? [CLI, ...args] : ['--import', preload, CLI, ...args];
  try {
    return { code: 0, out: execFileSync('node', argv, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }), err: '' };
  } catch (e) {
    const x = e as { status: number; stdout: string; stderr: string };
    return { code: x.status, out: x.stdout, err: x.stderr };
  }
}

const dir = mkdtempSync(join(tmpdir(), 'check-flags-'));
const all = Papa.parse<string[]>(readFileSync(FIXTURE, 'utf8'), { header: false, skipEmptyLines: true }).data;
const header = all[0]!;
const wRows = all.slice(1).filter((r) => /^W\d/.test(r[0]!));
const KEEP = ['label', 'shape_type', 'd_in', 'bf_in', 'tw_in', 'tf_in', 'kdes_in', 'A_in2', 'Ix_in4', 'Zx_in3'];
/** The W rows with only the KEEP columns, headers renamed by `rename`, one cell edited by `edit`. */
function table(name: string, rename: Record<string, string> = {}, edit?: (row: string[], col: (h: string) => number) => void): string {
  const at = (h: string): number => KEEP.indexOf(h);
  const rows = wRows.map((r) => KEEP.map((h) => r[header.indexOf(h)]!));
  rows.forEach((r) => edit?.(r, at));
  const path = join(dir, name);
  writeFileSync(path, Papa.unparse([KEEP.map((h) => rename[h] ?? h), ...rows]));
  return path;
}
const PASSING = ['--tolerance', '1.5%', '--tolerance', 'A=1%'];

describe('repeatable flags', () => {
  it('four --map flags all apply: headers no auto-detection knows become d, bf, tw, tf and all 7 W rows pass (exit 0)', () => {
    const path = table('renamed.csv', { d_in: 'Depth', bf_in: 'Flange width', tw_in: 'Web', tf_in: 'Flange' });
    const r = run(['check', path, ...PASSING, '--map', 'Depth=d', '--map', 'Flange width=bf', '--map', 'Web=tw', '--map', 'Flange=tf', '--json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const body = JSON.parse(r.out) as { summary: { rowsChecked: number; rowsFlagged: number }; mapping: { columns: { header: string; role: string; symbol?: string }[] } };
    expect(body.summary).toMatchObject({ rowsChecked: 7, rowsFlagged: 0 });
    const symbolOf = (h: string): string | undefined => body.mapping.columns.find((c) => c.header === h)?.symbol;
    expect(['Depth', 'Flange width', 'Web', 'Flange'].map(symbolOf)).toEqual(['d', 'bf', 'tw', 'tf']);
  });

  it('with only the last of those --map flags the web column ("Web", no symbol) stays unmapped, so no row can be built: nothing checked, exit 2 (not 0, not a pass)', () => {
    const path = table('renamed-last.csv', { d_in: 'Depth', bf_in: 'Flange width', tw_in: 'Web', tf_in: 'Flange' });
    const r = run(['check', path, ...PASSING, '--map', 'Flange=tf', '--json']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/nothing checked/);
    const body = JSON.parse(r.out) as { summary: { rowsNotChecked: number }; rows: { notCheckedReason: string }[] };
    expect(body.summary.rowsNotChecked).toBe(7);
    expect(body.rows[0]!.notCheckedReason).toMatch(/cannot build the shape: a W row needs tw/);
  });

  it('a comma inside a column name survives the comma-separated --map list ("Depth, in=d,Web=tw")', () => {
    expect(mapItems(['Depth, in=d,Web=tw', 'Flange=tf'])).toEqual(['Depth, in=d', 'Web=tw', 'Flange=tf']);
  });

  it('one column given two different targets is bad input (exit 2) naming the column', () => {
    const path = table('twice.csv', { d_in: 'Depth' });
    const r = run(['check', path, '--map', 'Depth=d', '--map', 'Depth=bf']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('column "Depth" is given two targets, d and bf');
  });

  it('a flag that is not repeatable, given twice, is refused (exit 2) instead of keeping the last', () => {
    const path = table('plain.csv');
    const r = run(['check', path, '--unit', 'in', '--unit', 'mm']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--unit was given 2 times; give it once');
  });
});

describe('per-property tolerance and the report file', () => {
  // The Zx of W14X90 raised 5 % (× 1.05). The row passes at 1.5 % (test above), so its computed
  // Zx is within [0.985, 1.015] × the published value; against the raised value the deviation is
  // within [0.985/1.05 − 1, 1.015/1.05 − 1] = [−6.19 %, −3.33 %] (exact arithmetic): beyond 1.5 %,
  // within 7 %.
  const path = table('zx.csv', {}, (row, col) => {
    if (row[0] === 'W14X90') row[col('Zx_in3')] = String(Number(row[col('Zx_in3')]) * 1.05);
  });

  it('exit 1 with W14X90 flagged on Zx alone at 1.5 %; --out writes that row as flagged with the Zx deviation and the caution', () => {
    const out = join(dir, 'report.csv');
    const r = run(['check', path, ...PASSING, '--out', out]);
    expect(r.code).toBe(1);
    expect(r.out).toContain('7 rows: 6 pass, 1 flagged, 0 not checked');
    const report = Papa.parse<Record<string, string>>(readFileSync(out, 'utf8'), { header: true, skipEmptyLines: true }).data;
    expect(report).toHaveLength(7);
    const row = report.find((x) => x.designation === 'W14X90')!;
    expect(row.status).toBe('flagged');
    const dev = Number(row['Zx deviation [%]']);
    expect(dev).toBeGreaterThanOrEqual(-6.2);
    expect(dev).toBeLessThanOrEqual(-3.3);
    expect(row.findings).toMatch(/^Zx: /);
    expect(report.filter((x) => x.status === 'pass')).toHaveLength(6);
    expect(row.caution).toMatch(/licensed engineer/);
  });

  it('--tolerance Zx=7% (a separate flag) lets that row pass while A and the others keep theirs (exit 0)', () => {
    const r = run(['check', path, ...PASSING, '--tolerance', 'Zx=7%', '--json']);
    expect(r.code).toBe(0);
    const body = JSON.parse(r.out) as { rows: { designation: string; properties: { symbol: string; tolerance: number }[] }[] };
    const tol = Object.fromEntries(body.rows.find((x) => x.designation === 'W14X90')!.properties.map((p) => [p.symbol, p.tolerance]));
    expect(tol).toEqual({ A: 0.01, Ix: 0.015, Zx: 0.07 });
  });

  it('an unknown property in --tolerance is bad input (exit 2) naming it', () => {
    const r = run(['check', path, '--tolerance', 'Qx=2%']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--tolerance Qx=2%: unknown property "Qx"');
  });
});

describe('exit codes', () => {
  it('an internal error (a write that throws) exits 3, not 1, and says to report it', () => {
    const r = run(['check', table('crash.csv'), ...PASSING], THROWS);
    expect(r.code).toBe(3);
    expect(r.err).toContain('internal error (please report it)');
    expect(r.err).toContain('simulated defect');
  });

  // Node's own exit code for an uncaught exception is 1 (Node.js documentation, "Exit codes": 1 Uncaught Fatal Exception).
  it('a defect outside the command (an uncaught asynchronous throw) also exits 3, where Node alone exits 1', () => {
    const r = run(['check', table('late.csv'), ...PASSING], LATE);
    expect(r.code).toBe(3);
    expect(r.err).toContain('internal error (please report it)');
    expect(r.err).toContain('simulated late defect');
  });

  it('--help and check --help list all four exit codes', () => {
    for (const args of [['--help'], ['check', '--help']]) {
      const r = run(args);
      expect(r.code).toBe(0);
      expect(r.out).toContain('exit codes: 0 success; 1 a result that needs attention (check: some rows flagged); 2 bad input or usage');
      expect(r.out).toContain('3 internal error');
    }
    expect(run(['check', '--help']).out).toMatch(/--map COL=TARGET +correct the column mapping \(see above\) \(may be repeated\)/);
  });
});
