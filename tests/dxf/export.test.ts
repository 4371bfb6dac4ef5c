// core/dxf export: the section written with @tarikjabiri/dxf and read back by core/dxf import gives
// the same properties to 1e-12 relative (an identity: the file holds the same doubles); parts are
// laid flat in their own coordinates (a rectangle part's local outline is centred on its origin,
// DEVELOPERS.md); a file written by the independent writer directly (not through our exporter) is
// read against closed forms (annulus πr², Roark Table A.1; rectangle bh). $INSUNITS codes: AutoCAD
// DXF Reference (HEADER section).
import { readFileSync } from 'node:fs';
import { DxfWriter, LWPolylineFlags, Units, point3d } from '@tarikjabiri/dxf';
import { describe, expect, it } from 'vitest';
import { cutParts, documentFromDxf, importDxf, sectionDxf, SECTION_LAYER } from '../../core/dxf/index.ts';
import { firstSectionView, parseDocument, type SectionDocument } from '../../core/document/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import { sectionFromDocument } from '../../core/section/index.ts';

const CAUTION = 'Results are preliminary: verify them with a licensed engineer and the local building code, which govern.';

function propertiesOfDxf(text: string, layers?: string[]): { p: SectionProperties; doc: SectionDocument; notes: readonly string[] } {
  const r = importDxf(text, layers ? { layers } : {});
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  const doc = firstSectionView(documentFromDxf(r.value, 'back').file);
  const s = sectionFromDocument(doc);
  if (s.properties === null) throw new Error(s.diagnostics.map((d) => d.message).join('\n'));
  return { p: s.properties, doc, notes: r.value.notes };
}

function example(): SectionDocument {
  const text = readFileSync(new URL('../../assets/examples/footbridge-box-girder.section.json', import.meta.url), 'utf8');
  const parsed = parseDocument(text, 'example');
  if (!parsed.ok) throw new Error('example did not parse');
  return firstSectionView(parsed.file);
}

function expectSameProperties(a: SectionProperties, b: SectionProperties): void {
  const size = Math.max(b.xMax - b.xMin, b.yMax - b.yMin);
  for (const key of Object.keys(b) as (keyof SectionProperties)[]) {
    const x = a[key], y = b[key];
    if (typeof x !== 'number' || typeof y !== 'number') {
      expect(x, key).toBe(y);
      continue;
    }
    // Values that are zero by symmetry are compared on the section's own scale.
    const scale = Math.max(Math.abs(y), ['cx', 'cy', 'pnaX', 'pnaY', 'xMin', 'xMax', 'yMin', 'yMax'].includes(key) ? size : key === 'Ixy' ? b.Ip : key === 'thetaDeg' ? 90 : 0);
    expect(Math.abs(x - y) / scale, key).toBeLessThanOrEqual(1e-12);
  }
}

describe('DXF export', () => {
  it('round trip of the example girder: exported with every layer and read back on layer SECTION, the same properties to 1e-12', () => {
    const doc = example();
    const s = sectionFromDocument(doc);
    if (s.properties === null) throw new Error('example did not compose');
    const text = sectionDxf({ name: doc.name, unit: doc.unit, region: s.region, properties: s.properties, parts: cutParts(doc), centroid: true, axes: true, table: true, caution: CAUTION });
    expect(text).toMatch(/\$INSUNITS\r?\n\s*70\r?\n\s*4\r?\n/);
    const back = propertiesOfDxf(text, [SECTION_LAYER]);
    expect(back.doc.unit).toBe(doc.unit);
    expectSameProperties(back.p, s.properties);
    // The annotation layers hold no boundary geometry: TEXT, POINT and XLINE are ignored on import.
    expect(back.notes.some((n) => /ignored \(not geometry\): .*TEXT.*/.test(n) && n.includes('XLINE') && n.includes('POINT'))).toBe(true);
    expect(text).toContain('CAUTION: Results are preliminary');
  });

  it('a pipe with exact arcs exports as bulged LWPOLYLINEs and comes back with A = π(ro² − ri²) to 1e-12', () => {
    const ring = (r: number, b: number) => ({ xy: Float64Array.of(r, 0, -r, 0), bulge: Float64Array.of(b, b) });
    const text = sectionDxf({ name: 'pipe', unit: 'in', region: [{ outer: ring(5, 1), holes: [ring(4.5, -1)] }], caution: CAUTION });
    expect(text).toMatch(/\r?\n\s*42\r?\n\s*1\r?\n/);
    const { p, doc } = propertiesOfDxf(text);
    expect(doc.unit).toBe('in');
    expect(Math.abs(p.area - Math.PI * (25 - 20.25)) / (Math.PI * 4.75)).toBeLessThan(1e-12);
  });

  it('each part laid flat on its own layer, with its name, and with the holes later cut-outs make in it', () => {
    const doc: SectionDocument = {
      format: 'sectionsmith-section', version: 1, name: 'flange with holes', unit: 'mm', materials: [], defaultMaterial: null,
      parts: [
        { id: 'w', name: 'web', type: 'rectangle', width: 10, height: 300, operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } },
        { id: 'f', name: 'flange', type: 'rectangle', width: 200, height: 20, operation: 'add', material: null, visible: true, placement: { x: 0, y: 160, rotationDeg: 90, mirror: false } },
        { id: 'h', name: 'hole', type: 'circle', diameter: 12, operation: 'subtract', material: null, visible: true, placement: { x: 0, y: 220, rotationDeg: 0, mirror: false } },
      ],
    };
    const parts = cutParts(doc);
    expect(parts.map((p) => p.name)).toEqual(['web', 'flange']);
    const s = sectionFromDocument(doc);
    const text = sectionDxf({ name: doc.name, unit: 'mm', region: s.region, parts, caution: CAUTION });
    // The flange, laid flat (200 × 20 in its own frame, rotated back from 90°), minus the Ø12 hole: 4000 − π·6².
    const flange = propertiesOfDxf(text, ['PART-flange']);
    expect(Math.abs(flange.p.area - (4000 - Math.PI * 36)) / 4000).toBeLessThan(1e-12);
    expect(flange.p.xMax - flange.p.xMin).toBeCloseTo(200, 9);
    expect(flange.p.yMax - flange.p.yMin).toBeCloseTo(20, 9);
    const web = propertiesOfDxf(text, ['PART-web']);
    expect(web.p.area).toBe(3000);
    expect(text).toMatch(/\r?\n\s*1\r?\nflange\r?\n/);
  });
});

describe('a file written by an independent DXF writer (@tarikjabiri/dxf used directly)', () => {
  it('LWPOLYLINE with bulges, LINEs, an ARC and a CIRCLE, in inches: each closed form', () => {
    const dxf = new DxfWriter();
    dxf.setUnits(Units.Inches);
    // An annulus: outer LWPOLYLINE circle r = 3 (two bulges of 1), hole a CIRCLE r = 1.
    dxf.addLWPolyline([{ point: { x: 3, y: 0 }, bulge: 1 }, { point: { x: -3, y: 0 }, bulge: 1 }], { flags: LWPolylineFlags.Closed, layerName: 'RING' });
    dxf.addCircle(point3d(0, 0, 0), 1, { layerName: 'RING' });
    // A D shape at x = 10..: LINE from (10, 0) to (10, 4) and an ARC centre (10, 2), r 2, from −90° to 90°.
    dxf.addLine(point3d(10, 4, 0), point3d(10, 0, 0), { layerName: 'D' });
    dxf.addArc(point3d(10, 2, 0), 2, 270, 90, { layerName: 'D' });
    const text = dxf.stringify();
    const ring = propertiesOfDxf(text, ['RING']).p;
    expect(Math.abs(ring.area - Math.PI * 8) / (Math.PI * 8)).toBeLessThan(1e-12);
    expect(Math.abs(ring.Ix - (Math.PI * (81 - 1)) / 4) / ring.Ix).toBeLessThan(1e-12);
    const d = propertiesOfDxf(text, ['D']).p;
    // Half disc r = 2: A = 2π, centroid 4r/(3π) right of the flat side (Roark, Table A.1).
    expect(Math.abs(d.area - 2 * Math.PI) / (2 * Math.PI)).toBeLessThan(1e-12);
    expect(Math.abs(d.cx - (10 + 8 / (3 * Math.PI)))).toBeLessThan(1e-12 * 10);
  });
});
