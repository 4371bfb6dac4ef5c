/**
 * `sectionsmith props` on a 1,000,000-vertex GeoJSON polygon, as a process, against a bare node
 * process that reads and parses the same file and runs the Green's-theorem vertex loop
 * (docs/methods.md §1.1, about the first vertex) — the least any tool must do. Both are timed from
 * spawn to exit, alternately, median of 3; target ratio ≤ 2. The file (an ellipse of 1e6
 * vertices, ~40 MB) is generated in a temporary directory and removed afterwards.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchLine } from './report.ts';

const here = dirname(fileURLToPath(import.meta.url));
const cli = join(here, '..', '..', 'cli', 'sectionsmith.mjs');
const VERTICES = 1_000_000;

/** An ellipse 400 × 200 mm centred at (1000, 500), vertices CCW, closing position repeated. */
function ellipseGeoJson(n: number): string {
  const parts: string[] = [];
  for (let i = 0; i <= n; i++) {
    const t = (2 * Math.PI * (i % n)) / n;
    parts.push(`[${1000 + 200 * Math.cos(t)},${500 + 100 * Math.sin(t)}]`);
  }
  return `{"type":"Polygon","coordinates":[[${parts.join(',')}]]}`;
}

/** The bare baseline: parse, then six Green sums about the first vertex. */
const BARE = `
const fs = require('node:fs');
const g = JSON.parse(fs.readFileSync(process.argv[1], 'utf8'));
const r = g.coordinates[0];
const n = r.length - 1, ox = r[0][0], oy = r[0][1];
let A = 0, Qx = 0, Qy = 0, Ixx = 0, Iyy = 0, Ixy = 0;
for (let i = 0; i < n; i++) {
  const x0 = r[i][0] - ox, y0 = r[i][1] - oy, x1 = r[i + 1][0] - ox, y1 = r[i + 1][1] - oy;
  const c = x0 * y1 - x1 * y0;
  A += c; Qx += (y0 + y1) * c; Qy += (x0 + x1) * c;
  Ixx += (y0 * y0 + y0 * y1 + y1 * y1) * c; Iyy += (x0 * x0 + x0 * x1 + x1 * x1) * c;
  Ixy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c;
}
process.stdout.write(JSON.stringify({ area: A / 2, Qx: Qx / 6, Qy: Qy / 6, Ixx: Ixx / 12, Iyy: Iyy / 12, Ixy: Ixy / 24 }));
`;

function timeMs(args: readonly string[]): { ms: number; out: string } {
  const t0 = performance.now();
  const out = execFileSync(process.execPath, args, { encoding: 'utf8', maxBuffer: 1 << 24 });
  return { ms: performance.now() - t0, out };
}

const median = (xs: number[]): number => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? Number.NaN;

/** The same ellipse as a Sectionsmith document (one polygon part, steel), for props, member and compare. */
function ellipseDocument(n: number): string {
  const parts: string[] = [];
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    parts.push(`[${1000 + 200 * Math.cos(t)},${500 + 100 * Math.sin(t)}]`);
  }
  const steel = '{"id":"s","name":"steel","kind":"steel","stressUnit":"MPa","E":200000,"nu":0.3,"density":7850,"fy":345,"strengthBasis":"yield"}';
  const part = `{"id":"p1","name":"ellipse","type":"polygon","placement":{"x":0,"y":0,"rotationDeg":0,"mirror":false},"operation":"add","material":null,"visible":true,"outer":[${parts.join(',')}],"holes":[]}`;
  return `{"format":"sectionsmith-section","version":3,"name":"bench","unit":"mm","materials":[${steel}],"defaultMaterial":"s","sections":[{"id":"a","name":"A","parts":[${part}]}]}`;
}

/** The bare baseline for a document: parse, then the same six Green sums over its one outline. */
const BARE_DOCUMENT = BARE.replace('const r = g.coordinates[0];', 'const o = g.sections[0].parts[0].outer; const r = [...o, o[0]];');

/**
 * A 1e6-vertex document through props, member and compare, each against the bare parse-and-sum
 * of the same file, alternately, median of 3 (issue 18 §3: within 2× of the baseline).
 */
function documentLines(dir: string): BenchLine[] {
  const file = join(dir, 'ellipse-1e6.section.json');
  writeFileSync(file, ellipseDocument(VERTICES));
  const runs: Record<string, readonly string[]> = {
    props: ['props', file, '--json'],
    member: ['member', file, '--span', '6000', '--support', 'simple', '--uniform', '10kN/m'],
    compare: ['compare', file],
  };
  const times: Record<string, number[]> = { props: [], member: [], compare: [], bare: [] };
  for (let k = 0; k < 3; k++) {
    for (const [name, args] of Object.entries(runs)) {
      const t0 = performance.now();
      // member and compare may exit 1 (a criterion over its limit): that is a result, not a failure.
      try { execFileSync(process.execPath, [cli, ...args], { encoding: 'utf8', maxBuffer: 1 << 24 }); } catch (err) {
        if ((err as { status?: number }).status !== 1) throw err;
      }
      times[name]!.push(performance.now() - t0);
    }
    times.bare!.push(timeMs(['-e', BARE_DOCUMENT, file]).ms);
  }
  const baseline = median(times.bare!);
  return Object.keys(runs).map((name) => {
    const value = median(times[name]!);
    return { name: `cli-${name}-1e6-document`, value, unit: 'ms', baseline, baselineUnit: 'ms', ratio: value / baseline, detail: `${VERTICES}-vertex document, parse and validation included; target ratio <= 2` };
  });
}

export async function bench(): Promise<BenchLine[]> {
  const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-bench-'));
  try {
    const file = join(dir, 'ellipse-1e6.geojson');
    writeFileSync(file, ellipseGeoJson(VERTICES));
    const cliTimes: number[] = [];
    const bareTimes: number[] = [];
    let area = Number.NaN;
    let bareArea = Number.NaN;
    for (let k = 0; k < 3; k++) {
      const c = timeMs([cli, 'props', file, '--unit', 'mm', '--json']);
      cliTimes.push(c.ms);
      area = (JSON.parse(c.out) as { area: number }).area;
      const b = timeMs(['-e', BARE, file]);
      bareTimes.push(b.ms);
      bareArea = (JSON.parse(b.out) as { area: number }).area;
    }
    // Both must have computed the same section: the inscribed 1e6-gon of the ellipse.
    if (Math.abs(area - bareArea) > 1e-9 * bareArea) throw new Error(`areas differ: sectionsmith ${area}, bare loop ${bareArea}`);
    const value = median(cliTimes);
    const baseline = median(bareTimes);
    const lines: BenchLine[] = [{ name: 'cli-props-1e6-geojson', value, unit: 'ms', baseline, baselineUnit: 'ms', ratio: value / baseline, detail: `${VERTICES} vertices, validation included; target ratio <= 2` }];
    return [...lines, ...documentLines(dir)];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
