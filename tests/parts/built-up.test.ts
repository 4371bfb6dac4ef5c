/**
 * Built-up helpers placed as document parts and composed by core/section, checked by hand:
 * parallel-axis composition (Gere & Timoshenko, Mechanics of Materials, §12.5), closed forms for
 * rectangles, and the AISC v15.0 table for the rolled piece.
 */
import { describe, expect, it } from 'vitest';
import { DOCUMENT_FORMAT, SECTION_VIEW_VERSION, type Part, type SectionDocument } from '../../core/document/types.ts';
import { boltHolePattern, boxFromChannels, coverPlatedI, doubleAnglesBackToBack, flitchBeam, getPartType, plateGirder, type BuiltUpPiece } from '../../core/parts/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { sectionProperties, type NetSectionProperties } from '../../core/properties/index.ts';
import { partFromDesignation } from '../../core/catalogue/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import type { LengthUnit } from '../../core/units/types.ts';

function document(pieces: readonly BuiltUpPiece[], unit: LengthUnit = 'in'): SectionDocument {
  const parts = pieces.map((piece, i) => {
    const { role: _role, ...rest } = piece;
    return { ...rest, id: `p${i}`, material: null, visible: true } as Part;
  });
  return { format: DOCUMENT_FORMAT, version: SECTION_VIEW_VERSION, name: 'built-up check', unit, parts, materials: [], defaultMaterial: null };
}

function composed(pieces: readonly BuiltUpPiece[], unit: LengthUnit = 'in'): SectionProperties {
  const result = sectionFromDocument(document(pieces, unit));
  expect(result.diagnostics).toEqual([]);
  return result.properties!;
}

/** The net section (gross less the fastener holes): the flange holes are fastener holes. */
function composedNet(pieces: readonly BuiltUpPiece[]): NetSectionProperties {
  const result = sectionFromDocument(document(pieces, 'in'));
  expect(result.diagnostics).toEqual([]);
  expect(result.netProperties).not.toBeNull();
  return result.netProperties!;
}

function alone(shape: string, params: Readonly<Record<string, number>>): SectionProperties {
  return sectionProperties(getPartType(shape)!.region(params).region);
}

const rel = (got: number, expected: number): number => Math.abs(got / expected - 1);

/** Σ A, centroid and Σ (I + A·d²) about the composite centroid, for pieces (A, y, I own). */
function parallelAxis(pieces: readonly (readonly [A: number, y: number, I: number])[]): { A: number; y: number; I: number } {
  const A = pieces.reduce((s, [a]) => s + a, 0);
  const y = pieces.reduce((s, [a, yy]) => s + a * yy, 0) / A;
  const I = pieces.reduce((s, [a, yy, i]) => s + i + a * (yy - y) ** 2, 0);
  return { A, y, I };
}

describe('cover-plated I with flange holes', () => {
  const w = partFromDesignation('W14X90');
  if (!w.ok) throw new Error(w.message);
  // 3/4 in × 16 in plate on the top flange; two 15/16 in holes per flange at the W14X90 workable
  // gauge 5 1/2 in (AISC v15.0 WGi), through flange and plate.
  const built = coverPlatedI({ i: w.params, designation: 'W14X90', top: { b: 16, t: 0.75 }, holes: { diameter: 15 / 16, columns: 2, gauge: 5.5 } });

  it('the catalogue carries the published workable gauge of W14X90, WGi = 5 1/2 in (AISC v15.0)', () => {
    expect(w.entry.dimensions['WGi']).toBe(5.5);
  });

  it('creates the I, the plate and four subtract strips', () => {
    expect(built.diagnostics).toEqual([]);
    expect(built.pieces.map((p) => `${p.type}:${p.operation}`)).toEqual(['shape:add', 'shape:add', 'rectangle:subtract', 'rectangle:subtract', 'rectangle:subtract', 'rectangle:subtract']);
  });

  it('its net section matches the parallel-axis hand check built on the rolled shape’s own properties to 1e-9', () => {
    const W = alone('i-shape', w.params);
    const d = 14;
    const tf = 0.71;
    const dh = 15 / 16;
    const top = tf + 0.75;
    const hand = parallelAxis([
      [W.area, 0, W.Ix],
      [16 * 0.75, d / 2 + 0.375, (16 * 0.75 ** 3) / 12],
      [-2 * dh * top, d / 2 - tf + top / 2, (-2 * dh * top ** 3) / 12],
      [-2 * dh * tf, -d / 2 + tf / 2, (-2 * dh * tf ** 3) / 12],
    ]);
    const p = composedNet(built.pieces);
    expect(rel(p.area, hand.A)).toBeLessThan(1e-9);
    expect(rel(p.cy, hand.y)).toBeLessThan(1e-9);
    expect(rel(p.Ix, hand.I)).toBeLessThan(1e-9);
  });

  it('its net section is within 1.5 % of the same hand check made with the AISC v15.0 tabulated W14X90 (A = 26.5, Ix = 999)', () => {
    const dh = 15 / 16;
    const hand = parallelAxis([
      [26.5, 0, 999],
      [12, 7.375, (16 * 0.75 ** 3) / 12],
      [-2 * dh * 1.46, 6.29 + 0.73, (-2 * dh * 1.46 ** 3) / 12],
      [-2 * dh * 0.71, -6.645, (-2 * dh * 0.71 ** 3) / 12],
    ]);
    const p = composedNet(built.pieces);
    expect(rel(p.area, hand.A)).toBeLessThan(0.01);
    expect(rel(p.Ix, hand.I)).toBeLessThan(0.015);
  });

  it('reports holes whose gauge puts them into the web fillets', () => {
    const bad = coverPlatedI({ i: w.params, holes: { diameter: 15 / 16, columns: 2, gauge: 1.5 } });
    expect(bad.pieces).toEqual([]);
    expect(bad.diagnostics.map((x) => x.message).join()).toContain('holes at gauge 1.5 cut into the web or its fillets');
  });
});

describe('boxes, double angles, flitch beams, plate girders', () => {
  const c = { d: 9, bf: 2.5, tw: 0.3, tf: 0.4, r: 0.3 };
  const C = alone('channel', c);

  it('two channels toe to toe: A = 2A, Ix = 2Ix, Iy = 2(Iy + A(bf − x̄)²) (parallel axis)', () => {
    const p = composed(boxFromChannels({ channel: c, arrangement: 'toe-to-toe', gap: 0 }).pieces);
    expect(rel(p.area, 2 * C.area)).toBeLessThan(1e-9);
    expect(rel(p.Ix, 2 * C.Ix)).toBeLessThan(1e-9);
    expect(rel(p.Iy, 2 * (C.Iy + C.area * (2.5 - C.cx) ** 2))).toBeLessThan(1e-9);
    expect(Math.abs(p.cx)).toBeLessThan(1e-12);
  });

  it('two channels back to back with a 3/8 gap: Iy = 2(Iy + A(g/2 + x̄)²)', () => {
    const p = composed(boxFromChannels({ channel: c, arrangement: 'back-to-back', gap: 0.375 }).pieces);
    expect(rel(p.Iy, 2 * (C.Iy + C.area * (0.1875 + C.cx) ** 2))).toBeLessThan(1e-9);
  });

  it('double angles back to back, gap 3/8: A = 2A, Ix = 2Ix, Iy = 2(Iy + A(g/2 + x̄)²), Ixy = 0', () => {
    const a = { d: 4, b: 3, t: 0.5 };
    const L = alone('angle', a);
    const p = composed(doubleAnglesBackToBack({ angle: a, gap: 0.375 }).pieces);
    expect(rel(p.area, 2 * L.area)).toBeLessThan(1e-12);
    expect(rel(p.Ix, 2 * L.Ix)).toBeLessThan(1e-12);
    expect(rel(p.Iy, 2 * (L.Iy + L.area * (0.1875 + L.cx) ** 2))).toBeLessThan(1e-12);
    expect(Math.abs(p.Ixy)).toBeLessThan(1e-12);
  });

  it('mezzanine flitch beam, two 2x12 with a 1/2 × 11.25 plate: one 3.5 × 11.25 block, Ix = 3.5·11.25³/12 (exact composition)', () => {
    const built = flitchBeam({ lumber: { b: 2, d: 12 }, plies: 2, plate: { t: 0.5, depth: 11.25 }, unit: 'in' });
    expect(built.pieces.map((p) => p.role)).toEqual(['timber', 'steel', 'timber']);
    const p = composed(built.pieces);
    expect(p.area).toBeCloseTo(3.5 * 11.25, 12);
    expect(rel(p.Ix, (3.5 * 11.25 ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(p.Iy, (11.25 * 3.5 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('a flitch beam in a millimetre document places the dressed plies at 25.4 mm per inch', () => {
    const built = flitchBeam({ lumber: { b: 2, d: 12 }, plies: 3, plate: { t: 12, depth: 285.75 }, unit: 'mm' });
    const p = composed(built.pieces, 'mm');
    const width = 3 * 38.1 + 2 * 12;
    expect(rel(p.Iy, (285.75 * width ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('footbridge plate girder 48 × 3/8 web, 14 × 1 top, 18 × 1¼ bottom flange: parallel-axis hand check', () => {
    const p = composed(plateGirder({ web: { h: 48, tw: 0.375 }, top: { b: 14, t: 1 }, bottom: { b: 18, t: 1.25 } }).pieces);
    const hand = parallelAxis([
      [48 * 0.375, 0, (0.375 * 48 ** 3) / 12],
      [14, 24.5, 14 / 12],
      [18 * 1.25, -24.625, (18 * 1.25 ** 3) / 12],
    ]);
    expect(rel(p.area, hand.A)).toBeLessThan(1e-12);
    expect(rel(p.cy, hand.y)).toBeLessThan(1e-12);
    expect(rel(p.Ix, hand.I)).toBeLessThan(1e-12);
  });

  it('names bad built-up input', () => {
    expect(flitchBeam({ lumber: { b: 2, d: 7 }, plies: 2, plate: { t: 0.5, depth: 6 }, unit: 'in' }).diagnostics[0]!.message).toContain('nominal 2x7 lumber is not in NDS Supplement Table 1A');
    expect(flitchBeam({ lumber: { b: 2, d: 12 }, plies: 1, plate: { t: 0.5, depth: 6 }, unit: 'in' }).diagnostics[0]!.message).toContain('plies = 1 must be a whole number of at least 2');
    expect(boxFromChannels({ channel: c, arrangement: 'toe-to-toe', gap: -1 }).diagnostics[0]!.message).toContain('gap = -1 must be 0 or more');
    expect(plateGirder({ web: { h: 48, tw: 0 }, top: { b: 14, t: 1 }, bottom: { b: 18, t: 1 } }).diagnostics[0]!.message).toContain('web: plate: t = 0 must be greater than 0');
  });
});

describe('bolt-hole patterns', () => {
  it('a 2 × 3 grid through a flange: strips diameter wide and depth deep at ±pitch/2 and 0, ±gauge', () => {
    const { pieces, diagnostics } = boltHolePattern({ diameter: 0.8125, rows: 2, columns: 3, pitch: 3, gauge: 2.5, x: 1, y: 10, axis: 'y', depth: 0.5 });
    expect(diagnostics).toEqual([]);
    expect(pieces.map((p) => [p.placement.x, p.placement.y])).toEqual([
      [-1.5, 8.5], [1, 8.5], [3.5, 8.5],
      [-1.5, 11.5], [1, 11.5], [3.5, 11.5],
    ]);
    for (const p of pieces) expect(p.type === 'rectangle' && [p.width, p.height, p.operation]).toEqual([0.8125, 0.5, 'subtract']);
  });

  it('holes along the member (axis z) are subtract circles; holes through a web (axis x) are depth wide', () => {
    const z = boltHolePattern({ diameter: 1, x: 0, y: 0, axis: 'z' }).pieces[0]!;
    expect(z.type === 'circle' && z.diameter).toBe(1);
    const x = boltHolePattern({ diameter: 1, x: 0, y: 0, axis: 'x', depth: 0.44 }).pieces[0]!;
    expect(x.type === 'rectangle' && [x.width, x.height]).toEqual([0.44, 1]);
  });

  it('names each bad pattern value', () => {
    const text = boltHolePattern({ diameter: 1, rows: 2, pitch: 0.5, columns: 1.5, x: 0, y: 0, axis: 'y' }).diagnostics.map((d) => d.message).join('\n');
    expect(text).toContain('columns = 1.5 must be a whole number of at least 1');
    expect(text).toContain('pitch = 0.5 must be at least the diameter 1 for 2 rows');
    expect(text).toContain('depth (the thickness the holes pass through) must be greater than 0');
  });
});
