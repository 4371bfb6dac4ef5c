// The role of holes read from a DXF drawing (core/dxf/import.ts documentFromDxf, the import
// dialog's choice). Fixture: tests/fixtures/dxf/pipe-lwpolyline.dxf, a ring of outer radius 50
// and inner radius 40 (mm). Closed forms: a disc has A = π·r² (Roark, Table A.1); the ring's
// net area is π(ro² − ri²).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { documentFromDxf, importDxf } from '../../core/dxf/index.ts';
import { firstSectionView } from '../../core/document/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const drawing = () => {
  const r = importDxf(readFileSync(new URL('../fixtures/dxf/pipe-lwpolyline.dxf', import.meta.url), 'utf8'));
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.value;
};

describe('imported holes take the role the user chose', () => {
  it('void (the default): the hole stays in its part and every property sees it', () => {
    const { file } = documentFromDxf(drawing(), 'pipe', 'parts', 'void');
    const doc = firstSectionView(file);
    expect(doc.parts).toHaveLength(1);
    const s = sectionFromDocument(doc);
    expect(rel(s.properties?.area ?? 0, Math.PI * (50 ** 2 - 40 ** 2))).toBeLessThan(1e-12);
    expect(s.netProperties).toBeNull();
  });

  it('fastener hole: a cut-out part of its own with that role; gross ignores it, the net section deducts it', () => {
    const { file, notes } = documentFromDxf(drawing(), 'pipe', 'parts', 'fastener-hole');
    const doc = firstSectionView(file);
    expect(doc.parts.map((p) => [p.operation, p.cutoutRole ?? null])).toEqual([['add', null], ['subtract', 'fastener-hole']]);
    const s = sectionFromDocument(doc);
    expect(rel(s.properties?.area ?? 0, Math.PI * 50 ** 2)).toBeLessThan(1e-12);
    expect(rel(s.netProperties?.area ?? 0, Math.PI * (50 ** 2 - 40 ** 2))).toBeLessThan(1e-12);
    expect(notes.join(' ')).toMatch(/1 hole\(s\) imported as fastener holes/);
  });
});
