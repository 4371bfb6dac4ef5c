// core/dxf import: hand-written DXF fixtures (tests/fixtures/dxf/, one per entity and per error)
// read into a document, and its properties checked against closed forms. Sources beside each check:
// circle and annulus A = πr², I = πr⁴/4 (Roark, Table A.1); rectangle bh³/12 (Gere & Timoshenko,
// Appendix D); semicircle centroid 4r/(3π) and quarter circle (Roark, Table A.1); ellipse area πab
// (common practice); the rational quadratic quarter circle (weights 1, √2/2, 1: Piegl & Tiller,
// The NURBS Book, 2nd ed., Example 7.1). DXF group codes and $INSUNITS values: AutoCAD DXF Reference.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { documentFromDxf, importDxf, summariseDxf, type DxfImportOptions } from '../../core/dxf/index.ts';
import { firstSectionView, type SectionDocument } from '../../core/document/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import { sectionFromDocument } from '../../core/section/index.ts';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/dxf/${name}`, import.meta.url), 'utf8');

function imported(name: string, options: DxfImportOptions = {}, grouping: 'parts' | 'one' = 'parts'): { doc: SectionDocument; p: SectionProperties; notes: readonly string[] } {
  const r = importDxf(fixture(name), options);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  const { file, notes } = documentFromDxf(r.value, name, grouping);
  const doc = firstSectionView(file);
  const s = sectionFromDocument(doc);
  if (s.properties === null) throw new Error(s.diagnostics.map((d) => d.message).join('\n'));
  return { doc, p: s.properties, notes: [...r.value.notes, ...notes] };
}

function errorsOf(name: string, options: DxfImportOptions = {}): { code: string; message: string }[] {
  const r = importDxf(fixture(name), options);
  if (r.ok) throw new Error(`${name} imported without error`);
  return r.errors.map((e) => ({ code: e.code, message: e.message }));
}

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('DXF entities read as exact geometry', () => {
  it('a pipe drawn as two 2-vertex LWPOLYLINEs with bulge 1 has A = π(ro² − ri²) and Ix = π(ro⁴ − ri⁴)/4 to 1e-12', () => {
    const { p, doc } = imported('pipe-lwpolyline.dxf');
    expect(doc.unit).toBe('mm');
    expect(rel(p.area, Math.PI * (50 ** 2 - 40 ** 2))).toBeLessThan(1e-12);
    expect(rel(p.Ix, (Math.PI * (50 ** 4 - 40 ** 4)) / 4)).toBeLessThan(1e-12);
    // The inner loop became a hole of the outer one: one part.
    expect(doc.parts.length).toBe(1);
  });

  it('LINE and ARC chains join into a rounded rectangle (R12 file, padded group codes, no handles): A = bh − (4 − π)r²', () => {
    const { p, doc } = imported('rounded-rectangle-r12.dxf');
    expect(doc.unit).toBe('in');
    expect(rel(p.area, 100 * 60 - (4 - Math.PI) * 100)).toBeLessThan(1e-12);
    expect(p.cx).toBeCloseTo(50, 10);
    expect(p.cy).toBeCloseTo(30, 10);
  });

  it('a CIRCLE is exact: A = πr² to 1e-12, in the file\'s unit (cm)', () => {
    const { p, doc } = imported('circle.dxf');
    expect(doc.unit).toBe('cm');
    expect(rel(p.area, Math.PI * 625)).toBeLessThan(1e-12);
    expect(rel(p.Ix, (Math.PI * 25 ** 4) / 4)).toBeLessThan(1e-12);
  });

  it('an R12 POLYLINE with VERTEX bulges (a slot 80 long, r 15): A = 80·30 + πr², Ix = 80·30³/12 + πr⁴/4', () => {
    const { p } = imported('slot-polyline-r12.dxf');
    expect(rel(p.area, 80 * 30 + Math.PI * 225)).toBeLessThan(1e-12);
    expect(rel(p.Ix, (80 * 30 ** 3) / 12 + (Math.PI * 15 ** 4) / 4)).toBeLessThan(1e-12);
    expect(rel(p.cx, 40)).toBeLessThan(1e-12);
  });

  it('an ARC with extrusion (0, 0, −1) is mirrored (OCS): the half disc lies left of x = 50, cx = 50 − 4r/(3π)', () => {
    const { p } = imported('ocs-mirrored-arc.dxf');
    expect(rel(p.area, (Math.PI * 100) / 2)).toBeLessThan(1e-12);
    expect(rel(p.cx, 50 - 40 / (3 * Math.PI))).toBeLessThan(1e-12);
    expect(Math.abs(p.cy)).toBeLessThan(1e-12);
  });

  it('INSERT with scale (−2, 2) and rotation 90° maps a quarter disc (x, y) → (100 − 2y, 50 − 2x), arcs kept exact', () => {
    const { p, doc } = imported('insert-mirrored.dxf');
    const c = 40 / (3 * Math.PI);
    expect(rel(p.area, 100 * Math.PI)).toBeLessThan(1e-12);
    expect(rel(p.cx, 100 - 2 * c)).toBeLessThan(1e-12);
    expect(rel(p.cy, 50 - 2 * c)).toBeLessThan(1e-12);
    // The block's entity on layer 0 takes the INSERT's layer.
    expect(doc.parts[0]?.name).toBe('PLATES 1');
  });

  it('an ELLIPSE is drawn by chords within the chord tolerance the notes name: |A − πab| ≤ tolerance × perimeter', () => {
    const { p, notes } = imported('ellipse.dxf');
    const line = notes.find((n) => n.includes('ELLIPSE'));
    expect(line).toMatch(/chord tolerance ([0-9.e-]+)/);
    const tol = Number(/chord tolerance ([0-9.e-]+)/.exec(line ?? '')?.[1]);
    expect(tol).toBeGreaterThan(0);
    // Chords lie inside a convex curve: the area is short by at most tol × perimeter (perimeter < 2πa).
    expect(p.area).toBeLessThan(Math.PI * 50 * 20);
    expect(Math.PI * 50 * 20 - p.area).toBeLessThanOrEqual(tol * 2 * Math.PI * 50);
  });

  it('a rational quadratic SPLINE quarter circle (weights 1, √2/2, 1) closed by two LINEs: |A − πr²/4| ≤ tolerance × arc length', () => {
    const { p, notes } = imported('spline-quarter-disc.dxf');
    const line = notes.find((n) => n.includes('SPLINE'));
    expect(line).toContain('rational');
    const tol = Number(/chord tolerance ([0-9.e-]+)/.exec(line ?? '')?.[1]);
    expect(tol).toBeGreaterThan(0);
    expect(p.area).toBeLessThan((Math.PI * 100 ** 2) / 4);
    expect((Math.PI * 100 ** 2) / 4 - p.area).toBeLessThanOrEqual(tol * (Math.PI / 2) * 100);
  });

  it('a gap of 0.0001 at a corner is closed and reported with its size and the two entities', () => {
    const { p, notes } = imported('gap.dxf');
    expect(notes.some((n) => /closed a gap of 0\.0001 .*LINE handle [0-9A-F]+ on layer "PROFILE"/.test(n))).toBe(true);
    expect(Math.abs(p.area - 20000)).toBeLessThan(200 * 1e-4);
  });
});

describe('loops become material and holes; layers and parts', () => {
  it('nested loops: outer, hole, island: A = 100² − 80² + 40², the island a part of its own; TEXT, MTEXT, HATCH, DIMENSION counted as ignored', () => {
    const { p, doc, notes } = imported('nested-loops.dxf');
    expect(rel(p.area, 100 ** 2 - 80 ** 2 + 40 ** 2)).toBeLessThan(1e-12);
    expect(doc.parts.length).toBe(2);
    const ignored = notes.find((n) => n.startsWith('ignored'));
    for (const t of ['1 TEXT', '1 MTEXT', '1 HATCH', '1 DIMENSION']) expect(ignored).toContain(t);
  });

  it('layers are listed with their entity counts, and a layer choice reads only those layers', () => {
    const s = summariseDxf(fixture('two-layers.dxf'));
    expect(s.ok && s.summary.layers).toEqual([{ name: 'FLANGE', entities: 1 }, { name: 'OTHER', entities: 1 }, { name: 'WEB', entities: 1 }]);
    expect(s.ok && s.summary.unit).toBe('mm');
    const { p, doc } = imported('two-layers.dxf', { layers: ['FLANGE', 'WEB'] });
    expect(doc.parts.map((x) => x.name)).toEqual(['FLANGE 1', 'WEB 1']);
    expect(p.area).toBe(2000);
  });

  it('several outer loops: one part each, or one part when they touch (grouping "one"); pieces apart stay separate with a note', () => {
    const one = imported('two-layers.dxf', { layers: ['FLANGE', 'WEB'] }, 'one');
    expect(one.doc.parts.length).toBe(1);
    expect(one.p.area).toBe(2000);
    const apart = imported('two-layers.dxf', {}, 'one');
    // FLANGE and WEB touch and unite; OTHER lies apart: two pieces, two parts, and a note.
    expect(apart.doc.parts.length).toBe(2);
    expect(apart.p.area).toBeCloseTo(2100, 9);
    expect(apart.notes.some((n) => n.includes('form 2 separate pieces, which cannot be one part'))).toBe(true);
  });

  it('an unknown layer is an error that lists the layers with geometry', () => {
    const [e] = errorsOf('two-layers.dxf', { layers: ['PLATE'] });
    expect(e?.code).toBe('layer-unknown');
    expect(e?.message).toContain('"FLANGE" (1), "OTHER" (1), "WEB" (1)');
  });
});

describe('bad drawings get errors naming the entity type, handle and layer, and what is wrong', () => {
  it('a chain that does not close', () => {
    const [e] = errorsOf('error-open-chain.dxf');
    expect(e?.code).toBe('chain');
    expect(e?.message).toMatch(/LINE handle [0-9A-F]+ on layer "PROFILE".*does not close: its open end at \((0|100), (0|50)\)/);
  });

  it('loops that cross', () => {
    const [e] = errorsOf('error-crossing.dxf');
    expect(e?.code).toBe('crossing');
    expect(e?.message).toMatch(/LWPOLYLINE handle [0-9A-F]+ on layer "PROFILE": loops cross/);
  });

  it('a zero-length segment', () => {
    const [e] = errorsOf('error-zero-length.dxf');
    expect(e?.code).toBe('chain');
    expect(e?.message).toMatch(/LINE handle [0-9A-F]+ on layer "PROFILE": zero-length segment at \(30, 30\)/);
  });

  it('a unit that cannot be resolved: none, unitless, or one documents do not use; --unit resolves the first two', () => {
    expect(errorsOf('error-no-unit.dxf')[0]).toMatchObject({ code: 'unit-missing', message: expect.stringContaining('no $INSUNITS') as string });
    expect(errorsOf('error-unitless.dxf')[0]).toMatchObject({ code: 'unit-missing', message: expect.stringContaining('unitless') as string });
    expect(errorsOf('error-unit-yards.dxf')[0]).toMatchObject({ code: 'unit-unsupported', message: expect.stringContaining('$INSUNITS = 10 (yards)') as string });
    expect(errorsOf('error-unit-yards.dxf', { unit: 'ft' })[0]?.code).toBe('unit-unsupported');
    const { doc, p } = imported('error-no-unit.dxf', { unit: 'in' });
    expect(doc.unit).toBe('in');
    expect(p.area).toBe(5000);
  });

  it('an entity of a type that is not supported as geometry (SOLID)', () => {
    const [e] = errorsOf('error-unsupported-solid.dxf');
    expect(e).toMatchObject({ code: 'entity', message: expect.stringMatching(/^SOLID handle 5A on layer "PROFILE" is a filled 2D solid.*unsupported entity type as geometry/) as string });
  });

  it('three ends meeting at one point (a branch)', () => {
    const [e] = errorsOf('error-branch.dxf');
    expect(e?.message).toMatch(/3 ends meet at \(100, 0\) \(LINE handle [0-9A-F]+ on layer "PROFILE"; LINE/);
  });

  it('text that is not DXF, and a binary DXF, are refused', () => {
    expect(importDxf('hello').ok).toBe(false);
    const r = importDxf('AutoCAD Binary DXF\r\n\u001a\u0000');
    expect(!r.ok && r.errors[0]?.message).toContain('binary DXF');
  });
});

const POSITIONS = new Set<string>(['cx', 'cy', 'pnaX', 'pnaY', 'xMin', 'xMax', 'yMin', 'yMax']);

describe('a plate girder drawn with LINE entities equals the same girder built from plates', () => {
  it('web 1200×12, top flange 400×25, bottom flange 500×30 (mm): every property to 1e-12 relative (scale: the section size)', () => {
    const { p } = imported('girder-lines.dxf');
    const plate = (id: string, width: number, height: number, x: number, y: number) => ({
      id, name: id, type: 'rectangle' as const, width, height, operation: 'add' as const, material: null, visible: true,
      placement: { x, y, rotationDeg: 0, mirror: false },
    });
    const plates: SectionDocument = {
      format: 'sectionsmith-section', version: 1, name: 'plates', unit: 'mm', materials: [], defaultMaterial: null,
      parts: [plate('bottom', 500, 30, 0, 15), plate('web', 12, 1200, 0, 630), plate('top', 400, 25, 0, 1242.5)],
    };
    const q = sectionFromDocument(plates).properties;
    if (q === null) throw new Error('plates did not compose');
    // The closed form for the area, from the plate sizes.
    expect(p.area).toBe(500 * 30 + 12 * 1200 + 400 * 25);
    for (const key of Object.keys(q) as (keyof SectionProperties)[]) {
      const a = p[key], b = q[key];
      if (typeof a !== 'number' || typeof b !== 'number') {
        expect(a, key).toBe(b);
        continue;
      }
      // Quantities that are zero by symmetry (cx, Ixy, thetaDeg) are compared on the section's own scale.
      const scale = Math.max(Math.abs(b), POSITIONS.has(key) ? 1255 : key === 'Ixy' ? q.Ix : key === 'thetaDeg' ? 90 : 0);
      expect(Math.abs(a - b) / scale, key).toBeLessThanOrEqual(1e-12);
    }
  });
});
