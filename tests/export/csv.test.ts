import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvNumberCell, csvTextCell, propertiesCsv } from '../../core/export/csv.ts';
import { PROPERTY_CATALOGUE } from '../../core/properties/catalogue.ts';
import type { SectionDocument } from '../../core/document/types.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { circle, document, rectangle } from './sections.ts';

function csvOf(doc: SectionDocument, torsion?: { J: number; Cw: number }): string {
  const properties = sectionFromDocument(doc).properties;
  if (!properties) throw new Error('test section has no properties');
  return propertiesCsv({ name: doc.name, unit: doc.unit, properties, ...(torsion ? { torsion } : {}) });
}

function parsed(csv: string): Record<string, string> {
  const result = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
  expect(result.errors).toEqual([]);
  expect(result.data).toHaveLength(1);
  return result.data[0] ?? {};
}

describe('CSV export', () => {
  const plate = document('trailer frame gusset', [rectangle('p', 'gusset', 4, 6)]);

  it('puts the unit in every column header: area [in^2], Ix [in^4], SxTop [in^3], cx [in], thetaDeg [deg]', () => {
    const row = parsed(csvOf(plate));
    for (const header of ['area [in^2]', 'Ix [in^4]', 'Iy [in^4]', 'SxTop [in^3]', 'Zx [in^3]', 'cx [in]', 'thetaDeg [deg]', 'shapeFactorX [-]']) {
      expect(Object.keys(row)).toContain(header);
    }
  });

  it('reads back the closed forms of a 4 × 6 in rectangle: A = 24, Ix = b·h³/12 = 72, Iy = h·b³/12 = 32, Zx = b·h²/4 = 36 (Gere & Timoshenko)', () => {
    const row = parsed(csvOf(plate));
    expect(Number(row['area [in^2]'])).toBeCloseTo(24, 12);
    expect(Number(row['Ix [in^4]'])).toBeCloseTo(72, 12);
    expect(Number(row['Iy [in^4]'])).toBeCloseTo(32, 12);
    expect(Number(row['Zx [in^3]'])).toBeCloseTo(36, 12);
    expect(row.section).toBe('trailer frame gusset');
    expect(row.caution).toMatch(/preliminary.*licensed engineer/);
  });

  it('writes full precision: every number reads back as exactly the same double', () => {
    const doc = document('gusset with hole', [rectangle('p', 'gusset', 4, 6), circle('h', 'hole', 1.3, 0.7, -1.1, 'subtract')]);
    const properties = sectionFromDocument(doc).properties;
    const row = parsed(csvOf(doc));
    for (const r of PROPERTY_CATALOGUE) {
      const header = Object.keys(row).find((h) => h.startsWith(`${r.key} [`)) ?? '';
      expect(Number(row[header])).toBe(properties?.[r.key]);
    }
  });

  it('gives the same numbers as `sectionsmith props --json` for the same document', () => {
    const doc = document('mezzanine flitch beam', [rectangle('a', 'left joist', 1.5, 9.25, -0.875), rectangle('s', 'flitch plate', 0.25, 9, 0, -0.125), rectangle('b', 'right joist', 1.5, 9.25, 0.875)]);
    const folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-csv-'));
    try {
      const file = path.join(folder, 'flitch.section.json');
      writeFileSync(file, JSON.stringify(doc));
      const cli = path.join(import.meta.dirname, '..', '..', 'cli', 'sectionsmith.mjs');
      const json = JSON.parse(execFileSync(process.execPath, [cli, 'props', file, '--json'], { encoding: 'utf8' })) as Record<string, unknown>;
      const row = parsed(csvOf(doc));
      for (const r of PROPERTY_CATALOGUE) {
        const header = Object.keys(row).find((h) => h.startsWith(`${r.key} [`)) ?? '';
        expect([r.key, Number(row[header])]).toEqual([r.key, json[r.key]]);
      }
      expect(row.isotropic).toBe(String(json.isotropic));
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });

  it('adds J and Cw columns with units when torsion results are given', () => {
    const row = parsed(csvOf(plate, { J: 1.25, Cw: 0.5 }));
    expect(row['J [in^4]']).toBe('1.25');
    expect(row['Cw [in^6]']).toBe('0.5');
  });

  it('quotes names with commas, quotes and line breaks so they round-trip through papaparse', () => {
    const name = 'box girder, "north" span\nrev 2\r\nfinal';
    const row = parsed(csvOf(document(name, [rectangle('p', 'plate', 1, 1)])));
    expect(row.section).toBe(name);
  });

  it('defuses names a spreadsheet would run as formulas (= + - @ tab CR) with a leading apostrophe', () => {
    for (const name of ['=HYPERLINK("http://x","y")', '+1+2', '-2+3', '@SUM(A1)', '\t=1', '\r=1']) {
      expect(parsed(csvOf(document(name, [rectangle('p', 'plate', 1, 1)]))).section).toBe(`'${name}`);
    }
    expect(csvTextCell('plain name')).toBe('plain name');
  });

  it('never alters a negative number cell, and writes non-finite values as words', () => {
    expect(csvNumberCell(-0.5)).toBe('-0.5');
    expect(csvNumberCell(-1e-300)).toBe('-1e-300');
    expect(csvNumberCell(Number.NaN)).toBe('NaN');
    expect(csvNumberCell(-Infinity)).toBe('-Infinity');
  });

  it('ends lines with CRLF (RFC 4180)', () => {
    const csv = csvOf(plate);
    expect(csv.split('\r\n')).toHaveLength(3);
    expect(csv.endsWith('\r\n')).toBe(true);
  });
});
