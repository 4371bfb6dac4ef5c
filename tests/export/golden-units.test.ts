/**
 * Golden exports of an inch document and a metric document (issue 11, Tests): every column
 * heading carries its unit, and every value is checked against a hand calculation.
 *
 * The sections are our own trailer-frame crossmembers, a hollow rectangle B × H less a centred
 * b × h opening, placed with its centre at (X, Y). Closed forms (exact arithmetic; Gere &
 * Timoshenko, Mechanics of Materials, §12.3–12.5 and App. D; plastic moduli: each half's first
 * moment about the axis, Zx = (B·H² − b·h²)/4):
 *   A = BH − bh, x̄ = X, ȳ = Y, Ix = (BH³ − bh³)/12, Iy = (HB³ − hb³)/12, Ixy = 0, Ip = Ix + Iy,
 *   I1 = Ix, I2 = Iy, θ = 0 (H > B), r = √(I/A), Sx = Ix/(H/2), Sy = Iy/(B/2),
 *   Zx = (BH² − bh²)/4, Zy = (HB² − hb²)/4, PNA through the centre, Zx/Sx and Zy/Sy,
 *   extents X ± B/2, Y ± H/2.
 * Inch: 6 × 10 less 4 × 8 in, centre (3, 5) (its corner at the origin).
 * Metric: 150 × 250 less 100 × 200 mm, centre (75, 125).
 * Display units (common practice, core/units defaultDisplaySet): in, in², in³, in⁴ for inch
 * documents; mm, mm², 10³ mm³, 10⁶ mm⁴ for mm documents.
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/types.ts';
import { propertiesCsv } from '../../core/export/csv.ts';
import { sectionSvg } from '../../core/export/svg.ts';
import { propertiesSheet } from '../../core/export/xlsx.ts';
import { catalogueFor, PROPERTY_CATALOGUE } from '../../core/properties/catalogue.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { defaultDisplaySet } from '../../core/units/index.ts';
import { sectionReportInput } from '../../renderer/app/report/report-input.ts';
import { rectangle } from './sections.ts';

interface Case {
  readonly unit: 'in' | 'mm';
  readonly B: number; readonly H: number; readonly b: number; readonly h: number; readonly X: number; readonly Y: number;
  /** CSV heading units per kind (plain powers). */
  readonly csv: Readonly<Record<string, string>>;
  /** Display units per kind and their factor from plain powers of the document unit. */
  readonly shown: Readonly<Record<string, readonly [label: string, per: number]>>;
}

const CASES: readonly Case[] = [
  {
    unit: 'in', B: 6, H: 10, b: 4, h: 8, X: 3, Y: 5,
    csv: { length: 'in', area: 'in^2', modulus: 'in^3', inertia: 'in^4', angle: 'deg', ratio: '-' },
    shown: { length: ['in', 1], area: ['in²', 1], modulus: ['in³', 1], inertia: ['in⁴', 1], angle: ['°', 1], ratio: ['', 1] },
  },
  {
    unit: 'mm', B: 150, H: 250, b: 100, h: 200, X: 75, Y: 125,
    csv: { length: 'mm', area: 'mm^2', modulus: 'mm^3', inertia: 'mm^4', angle: 'deg', ratio: '-' },
    shown: { length: ['mm', 1], area: ['mm²', 1], modulus: ['10³ mm³', 1e3], inertia: ['10⁶ mm⁴', 1e6], angle: ['°', 1], ratio: ['', 1] },
  },
];

/** Every catalogue property of the hollow rectangle, by hand. */
function byHand(c: Case): Record<string, number> {
  const { B, H, b, h, X, Y } = c;
  const A = B * H - b * h;
  const Ix = (B * H ** 3 - b * h ** 3) / 12;
  const Iy = (H * B ** 3 - h * b ** 3) / 12;
  const Sx = Ix / (H / 2);
  const Sy = Iy / (B / 2);
  const Zx = (B * H ** 2 - b * h ** 2) / 4;
  const Zy = (H * B ** 2 - h * b ** 2) / 4;
  return {
    area: A, cx: X, cy: Y, Ix, Iy, Ixy: 0, Ip: Ix + Iy, I1: Ix, I2: Iy, thetaDeg: 0,
    rx: Math.sqrt(Ix / A), ry: Math.sqrt(Iy / A), r1: Math.sqrt(Ix / A), r2: Math.sqrt(Iy / A),
    SxTop: Sx, SxBottom: Sx, SyLeft: Sy, SyRight: Sy, S1Plus: Sx, S1Minus: Sx, S2Plus: Sy, S2Minus: Sy,
    Zx, Zy, Z1: Zx, Z2: Zy, pnaY: Y, pnaX: X, shapeFactorX: Zx / Sx, shapeFactorY: Zy / Sy,
    xMin: X - B / 2, xMax: X + B / 2, yMin: Y - H / 2, yMax: Y + H / 2,
  };
}

function doc(c: Case): SectionDocument {
  return {
    format: 'sectionsmith-section', version: 1, name: `trailer crossmember (${c.unit})`, unit: c.unit, materials: [], defaultMaterial: null,
    parts: [rectangle('o', 'outer', c.B, c.H, c.X, c.Y), rectangle('v', 'opening', c.b, c.h, c.X, c.Y, 'subtract')],
  };
}

/** Equal to 1e-12 relative, and exactly 0 where the hand value is 0 (rounding residue is exported as 0). */
function close(label: string, got: number, want: number, rel = 1e-12): void {
  if (want === 0) expect([label, got]).toEqual([label, 0]);
  else expect([label, Math.abs(got / want - 1) <= rel]).toEqual([label, true]);
}

describe.each(CASES.map((c) => [c.unit, c] as const))('golden exports of the %s document', (_unit, c) => {
  const section = sectionFromDocument(doc(c));
  const p = section.properties!;
  const want = byHand(c);

  it('the hand table covers every catalogue property', () => {
    expect(Object.keys(want).sort()).toEqual(PROPERTY_CATALOGUE.map((e) => e.key).sort());
  });

  it('CSV: every value column says its unit, and every value is the hand calculation', () => {
    const parsed = Papa.parse<Record<string, string>>(propertiesCsv({ name: 'g', unit: c.unit, properties: p }), { header: true, skipEmptyLines: true });
    const row = parsed.data[0]!;
    expect(row.unit).toBe(c.unit);
    for (const e of catalogueFor('csv', PROPERTY_CATALOGUE)) {
      const heading = `${e.key} [${c.csv[e.kind]}]`;
      expect(Object.keys(row), heading).toContain(heading);
      close(heading, Number(row[heading]), want[e.key]!);
    }
    for (const h of Object.keys(row).filter((k) => !['section', 'unit', 'isotropic', 'caution'].includes(k))) expect(h).toMatch(/ \[[^\]]+\]$/);
  });

  it('XLSX rows: the same headings with units and the same numbers as numbers', () => {
    const sheet = propertiesSheet({ name: 'g', unit: c.unit, properties: p });
    const [, header = [], values = []] = sheet.rows;
    for (const e of catalogueFor('csv', PROPERTY_CATALOGUE)) {
      const i = header.findIndex((cell) => cell?.value === `${e.key} [${c.csv[e.kind]}]`);
      expect(i, e.key).toBeGreaterThan(0);
      const cell = values[i];
      expect(cell?.kind, e.key).toBe('number');
      close(e.key, cell?.value as number, want[e.key]!);
    }
  });

  it('SVG table: each row has its symbol, its value to 4 figures in the display unit, and that unit', () => {
    const svg = sectionSvg({ name: 'g', unit: c.unit, section });
    const texts = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]!.replace(/&amp;/g, '&'));
    for (const e of catalogueFor('drawing', PROPERTY_CATALOGUE)) {
      const i = texts.indexOf(e.symbol);
      expect(i, e.symbol).toBeGreaterThanOrEqual(0);
      const [label, per] = c.shown[e.kind]!;
      expect([e.symbol, texts[i + 2]]).toEqual([e.symbol, label]);
      close(e.symbol, Number(texts[i + 1]!.replace(/[,\s]/g, '')), want[e.key]! / per, 5e-4);
    }
  });

  it('report tables: symbol, value to 6 figures, unit, meaning', () => {
    const r = sectionReportInput({ doc: doc(c), display: defaultDisplaySet(c.unit), sig: 6, torsion: null, member: null });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const rows = r.input.tables.flatMap((t) => t.rows);
    for (const e of catalogueFor('report', PROPERTY_CATALOGUE)) {
      const row = rows.find((x) => x[0] === e.symbol);
      const [label, per] = c.shown[e.kind]!;
      expect([e.symbol, row?.[2]]).toEqual([e.symbol, e.kind === 'ratio' ? '' : label]);
      close(e.symbol, Number(row?.[1]?.replace(/[,\s]/g, '')), want[e.key]! / per, 5e-6);
    }
  });
});
