/**
 * `checkTable` on 2,000 rows: AISC v15.0 W and HSS shapes (core/catalogue published dimensions,
 * repeated to 2,000 rows) with A, Ix, Sx, Zx, Iy columns, in a CSV written to a temporary
 * directory and read back. Target: at most 5 s (ratio = time / 5 s, must stay ≤ 1). The
 * baseline line is the same CSV parsed by papaparse with every number read, without rebuilding.
 *
 * `check-1e6-rows`: the same rows repeated to 1,000,000 (about 110 MB of CSV) through
 * checkTableRows, the streaming check that keeps no row (maxRows raised to 10⁶: the default limit
 * of MAX_TABLE_ROWS is for user tables). Baseline, in the same run: papaparse reading the same
 * text with every number read. The repeated shapes are computed once each (the check's property
 * cache), so this measures the per-row cost of reading, mapping, label and catalogue checks and
 * comparing; a table of distinct shapes costs the check-2000-rows figure per row. Linearity: the
 * detail gives the cost per row at 10⁵ and 10⁶ rows (equal for linear cost).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { standardCatalogue } from '../../core/catalogue/index.ts';
import { checkTable, checkTableRows } from '../../core/check/index.ts';
import { shapeRegion } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import { medianMs, type BenchLine } from './report.ts';

const ROWS = 2000;
const TARGET_MS = 5000;

const MILLION = 1_000_000;

function tableText(rows = ROWS): string {
  const entries = standardCatalogue().entries.filter((e) => e.family === 'W' || (e.family === 'HSS' && e.shape === 'rect-tube'));
  const lines = ['label,type,d_in,bf_in,tw_in,tf_in,kdes_in,Ht_in,B_in,tnom_in,tdes_in,A_in2,Ix_in4,Sx_in3,Zx_in3,Iy_in4'];
  const distinct = Math.min(rows, ROWS);
  for (let i = 0; i < distinct; i++) {
    const e = entries[i % entries.length]!;
    const p = sectionProperties(shapeRegion(e.shape, e.params, 'in').region);
    const d = e.dimensions;
    const v = (k: string): string => (d[k] === undefined ? '' : String(d[k]));
    const g = (x: number): string => x.toPrecision(3);
    lines.push([e.designation, e.family, v('d'), v('bf'), v('tw'), v('tf'), v('kdes'), v('Ht'), v('B'), v('tnom'), v('tdes'), g(p.area), g(p.Ix), g(Math.min(p.SxTop, p.SxBottom)), g(p.Zx), g(p.Iy)].join(','));
  }
  const body = lines.slice(1).join('\n');
  return `${lines[0]}\n${Array.from({ length: Math.ceil(rows / distinct) }, () => body).join('\n')}\n`;
}

/** Wall time of one run of `fn`, ms. */
function onceMs(fn: () => unknown): number {
  const t0 = performance.now();
  fn();
  return performance.now() - t0;
}

function streamedCheck(text: string, rows: number): { ms: number; flagged: number; read: number } {
  let flagged = 0;
  let read = 0;
  const ms = onceMs(() => {
    const r = checkTableRows(text, { tolerances: { default: 0.01 }, maxRows: rows }, (row) => {
      if (row.flagged) flagged++;
    });
    read = r.summary.rowsRead;
  });
  return { ms, flagged, read };
}

function parseNumbersMs(text: string): number {
  return onceMs(() => {
    let sum = 0;
    Papa.parse<string[]>(text, {
      header: false,
      step: (r) => {
        for (const c of r.data) sum += Number(c) || 0;
      },
    });
    return sum;
  });
}

export async function bench(): Promise<BenchLine[]> {
  const dir = mkdtempSync(join(tmpdir(), 'check-bench-'));
  try {
    const file = join(dir, 'table.csv');
    writeFileSync(file, tableText());
    let flagged = -1;
    const ms = medianMs(() => {
      const r = checkTable(readFileSync(file, 'utf8'), { tolerances: { default: 0.01 } });
      flagged = r.summary.rowsFlagged;
    }, 3, 1);
    const parseOnly = medianMs(() => {
      const rows = Papa.parse<string[]>(readFileSync(file, 'utf8'), { header: false }).data;
      let sum = 0;
      for (const r of rows) for (const c of r) sum += Number(c) || 0;
      return sum;
    }, 5, 1);
    const million = tableText(MILLION);
    const tenth = million.slice(0, million.indexOf('\n', Math.floor(million.length / 10)) + 1);
    const small = streamedCheck(tenth, MILLION);
    const big = streamedCheck(million, MILLION);
    const parse = parseNumbersMs(million);
    const perRow = (ms: number, rows: number): string => `${((ms * 1000) / rows).toFixed(1)} µs`;
    return [
      { name: 'check-1e6-rows', value: big.ms / 1000, unit: 's', baseline: parse / 1000, baselineUnit: 's (papaparse, numbers read)', ratio: big.ms / parse, detail: `${big.read} rows read, ${big.flagged} flagged; per row ${perRow(big.ms, big.read)} at 10⁶, ${perRow(small.ms, small.read)} at ${small.read} rows; ${(million.length / 1e6).toFixed(0)} MB of CSV` },
      { name: 'check-2000-rows', value: ms, unit: 'ms', baseline: TARGET_MS, baselineUnit: 'ms (target)', ratio: ms / TARGET_MS, detail: `rows flagged ${flagged}; parse-only ${parseOnly.toFixed(1)} ms` },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
