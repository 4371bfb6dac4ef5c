/**
 * `checkTable` on 2,000 rows: AISC v15.0 W and HSS shapes (core/catalogue published dimensions,
 * repeated to 2,000 rows) with A, Ix, Sx, Zx, Iy columns, in a CSV written to a temporary
 * directory and read back. Target: at most 5 s (ratio = time / 5 s, must stay ≤ 1). The
 * baseline line is the same CSV parsed by papaparse with every number read, without rebuilding.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { standardCatalogue } from '../../core/catalogue/index.ts';
import { checkTable } from '../../core/check/index.ts';
import { shapeRegion } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import { medianMs, type BenchLine } from './report.ts';

const ROWS = 2000;
const TARGET_MS = 5000;

function tableText(): string {
  const entries = standardCatalogue().entries.filter((e) => e.family === 'W' || (e.family === 'HSS' && e.shape === 'rect-tube'));
  const lines = ['label,type,d_in,bf_in,tw_in,tf_in,kdes_in,Ht_in,B_in,tnom_in,tdes_in,A_in2,Ix_in4,Sx_in3,Zx_in3,Iy_in4'];
  for (let i = 0; i < ROWS; i++) {
    const e = entries[i % entries.length]!;
    const p = sectionProperties(shapeRegion(e.shape, e.params, 'in').region);
    const d = e.dimensions;
    const v = (k: string): string => (d[k] === undefined ? '' : String(d[k]));
    const g = (x: number): string => x.toPrecision(3);
    lines.push([e.designation, e.family, v('d'), v('bf'), v('tw'), v('tf'), v('kdes'), v('Ht'), v('B'), v('tnom'), v('tdes'), g(p.area), g(p.Ix), g(Math.min(p.SxTop, p.SxBottom)), g(p.Zx), g(p.Iy)].join(','));
  }
  return `${lines.join('\n')}\n`;
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
    return [
      { name: 'check-2000-rows', value: ms, unit: 'ms', baseline: TARGET_MS, baselineUnit: 'ms (target)', ratio: ms / TARGET_MS, detail: `rows flagged ${flagged}; parse-only ${parseOnly.toFixed(1)} ms` },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
