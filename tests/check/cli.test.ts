/** `sectionsmith check` run as a process: exit codes 0 (pass), 1 (flagged), 2 (bad input), and the CSV report. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const CLI = new URL('../../cli/sectionsmith.mjs', import.meta.url).pathname;
const FIXTURE = new URL('../fixtures/aisc-v15-subset.csv', import.meta.url).pathname;

function run(args: string[]): { code: number; out: string; err: string } {
  try {
    return { code: 0, out: execFileSync('node', [CLI, ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }), err: '' };
  } catch (e) {
    const x = e as { status: number; stdout: string; stderr: string };
    return { code: x.status, out: x.stdout, err: x.stderr };
  }
}

describe('sectionsmith check as a process', () => {
  const dir = mkdtempSync(join(tmpdir(), 'check-cli-'));
  // W rows of the AISC v15.0 subset pass at 1 % A and 1.5 % for I, S, Z, r (SOURCES.md caveats).
  const wOnly = readFileSync(FIXTURE, 'utf8').split(/\r?\n/).filter((l, i) => i === 0 || /^W\d/.test(l)).join('\n');
  const table = join(dir, 'w.csv');
  writeFileSync(table, wOnly);

  it('exit 0 and the caution when every row passes; --out writes the per-row CSV', () => {
    const out = join(dir, 'report.csv');
    const r = run(['check', table, '--tolerance', '1.5%,A=1%', '--out', out]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('7 rows: 7 pass, 0 flagged, 0 not checked');
    expect(r.out).toContain('licensed engineer');
    expect(readFileSync(out, 'utf8').split('\r\n').filter((l) => l !== '')).toHaveLength(8);
  });

  it('exit 1 and one flagged row in the JSON when the A of W14X90 is raised 5.3 % (26.5 → 27.9)', () => {
    const bad = join(dir, 'bad.csv');
    writeFileSync(bad, wOnly.replace('W14X90,W,W14X90,F,90,26.5', 'W14X90,W,W14X90,F,90,27.9'));
    const r = run(['check', bad, '--tolerance', '1.5%,A=1%', '--json']);
    expect(r.code).toBe(1);
    const body = JSON.parse(r.out) as { summary: { rowsFlagged: number }; caution: string };
    expect(body.summary.rowsFlagged).toBe(1);
    expect(body.caution).toContain('preliminary');
  });

  it('exit 2 naming the row and column for a non-numeric cell, and for an unknown --type', () => {
    const bad = join(dir, 'nan.csv');
    writeFileSync(bad, wOnly.replace('W8X31,W,W8X31,F,31,9.13', 'W8X31,W,W8X31,F,31,abc'));
    const r = run(['check', bad]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('row 1 (W8X31), column "A_in2": "abc" is not a number');
    expect(run(['check', table, '--type', 'XYZ']).code).toBe(2);
  });
});
