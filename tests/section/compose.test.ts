// core/section: composing document parts into one section. Reference values are closed forms
// (Gere & Timoshenko - Mechanics of Materials: b h³/12, π d⁴/64, b h³/36, parallel-axis theorem)
// and exact arithmetic; area identities for unions (inclusion–exclusion).
import { describe, expect, it } from 'vitest';
import { newDocument, type Part, type SectionDocument } from '../../core/document/index.ts';
import { differenceRegions } from '../../core/geometry/index.ts';
import { regionIntegrals } from '../../core/properties/index.ts';
import { regionFromDocument, sectionFromDocument } from '../../core/section/index.ts';

let nextId = 0;
const at = (x: number, y: number, rotationDeg = 0, mirror = false) => ({ x, y, rotationDeg, mirror });
const common = (name: string, placement = at(0, 0), operation: 'add' | 'subtract' = 'add') => ({ id: `p${++nextId}`, name, placement, operation, material: null, visible: true });
const rect = (name: string, width: number, height: number, placement = at(0, 0), operation: 'add' | 'subtract' = 'add'): Part => ({ ...common(name, placement, operation), type: 'rectangle', width, height });
const circle = (name: string, diameter: number, placement = at(0, 0), operation: 'add' | 'subtract' = 'subtract'): Part => ({ ...common(name, placement, operation), type: 'circle', diameter });
const polygon = (name: string, outer: [number, number][], placement = at(0, 0)): Part => ({ ...common(name, placement), type: 'polygon', outer, holes: [] });
const docOf = (parts: Part[], unit: SectionDocument['unit'] = 'mm'): SectionDocument => ({ ...newDocument(unit, 'test section'), parts });

const rel = (got: number | undefined, want: number): number => Math.abs((got ?? Number.NaN) - want) / Math.abs(want);

describe('composition against closed forms', () => {
  it('two touching 100 × 50 rectangles give the 100 × 100 rectangle: A = b h, Ix = b h³/12', () => {
    const r = sectionFromDocument(docOf([rect('lower', 100, 50, at(0, 25)), rect('upper', 100, 50, at(0, 75))]));
    expect(r.diagnostics).toEqual([]);
    expect(r.booleanCalls).toBe(1);
    expect(rel(r.properties?.area, 10000)).toBeLessThan(1e-12);
    expect(rel(r.properties?.cy, 50)).toBeLessThan(1e-12);
    expect(rel(r.properties?.Ix, (100 * 100 ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(r.properties?.Iy, (100 * 100 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('a 200 × 120 plate minus a centred 40 mm hole: A = b h − π d²/4 and Ix = b h³/12 − π d⁴/64, exact (the arcs are kept)', () => {
    const r = sectionFromDocument(docOf([rect('plate', 200, 120), circle('hole', 40)]));
    expect(r.diagnostics).toEqual([]);
    expect(rel(r.properties?.area, 200 * 120 - (Math.PI * 40 ** 2) / 4)).toBeLessThan(1e-13);
    expect(rel(r.properties?.Ix, (200 * 120 ** 3) / 12 - (Math.PI * 40 ** 4) / 64)).toBeLessThan(1e-13);
    expect(rel(r.properties?.Iy, (120 * 200 ** 3) / 12 - (Math.PI * 40 ** 4) / 64)).toBeLessThan(1e-13);
  });

  it('a hole near the hypotenuse of a triangular plate goes through the Boolean adapter and stays exact (triangle b h³/36 minus circle, parallel-axis)', () => {
    const r = sectionFromDocument(docOf([polygon('gusset', [[0, 0], [300, 0], [0, 300]]), circle('hole', 40, at(80, 80))]));
    expect(r.diagnostics).toEqual([]);
    expect(r.booleanCalls).toBe(1);
    const At = 45000, Ac = Math.PI * 400;
    const A = At - Ac;
    const cy = (At * 100 - Ac * 80) / A;
    const Ix = (300 * 300 ** 3) / 36 + At * (100 - cy) ** 2 - ((Math.PI * 40 ** 4) / 64 + Ac * (80 - cy) ** 2);
    expect(rel(r.properties?.area, A)).toBeLessThan(1e-11);
    expect(rel(r.properties?.cy, cy)).toBeLessThan(1e-11);
    expect(rel(r.properties?.Ix, Ix)).toBeLessThan(1e-11);
  });

  it('overlapping union: a cross of 200 × 40 and 40 × 200 has A = 8000 + 8000 − 1600 and Ix by inclusion–exclusion', () => {
    const r = sectionFromDocument(docOf([rect('flat', 200, 40), rect('upright', 40, 200)]));
    expect(r.diagnostics).toEqual([]);
    expect(rel(r.properties?.area, 14400)).toBeLessThan(1e-12);
    const Ix = (40 * 200 ** 3) / 12 + (200 * 40 ** 3) / 12 - (40 * 40 ** 3) / 12;
    expect(rel(r.properties?.Ix, Ix)).toBeLessThan(1e-12);
    expect(rel(r.properties?.Iy, Ix)).toBeLessThan(1e-12);
  });

  it('a rotation of 90° swaps Ix and Iy; a 30° rotation follows the tensor law I_u = (Ix+Iy)/2 + (Ix−Iy)/2·cos2θ − Ixy·sin2θ about the rotated axes', () => {
    const r90 = sectionFromDocument(docOf([rect('bar', 10, 80, at(5, 7, 90))]));
    expect(rel(r90.properties?.Ix, (80 * 10 ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(r90.properties?.Iy, (10 * 80 ** 3) / 12)).toBeLessThan(1e-12);
    const r30 = sectionFromDocument(docOf([rect('bar', 10, 80, at(0, 0, 30))]));
    // The bar's own axes are principal, so in section axes Ix = (Iu+Iv)/2 + (Iu−Iv)/2 cos 60°.
    const Iu = (10 * 80 ** 3) / 12, Iv = (80 * 10 ** 3) / 12;
    expect(rel(r30.properties?.Ix, (Iu + Iv) / 2 + ((Iu - Iv) / 2) * Math.cos(Math.PI / 3))).toBeLessThan(1e-12);
  });

  it('an angle as a polygon part: Ixy = −70078125/76 mm⁴ (exact composition of two rectangles); mirrored it changes sign', () => {
    const outer: [number, number][] = [[0, 0], [75, 0], [75, 10], [10, 10], [10, 125], [0, 125]];
    const plain = sectionFromDocument(docOf([polygon('angle', outer)]));
    expect(rel(plain.properties?.Ixy, -70078125 / 76)).toBeLessThan(1e-12);
    expect(rel(plain.properties?.area, 1900)).toBeLessThan(1e-12);
    const mirrored = sectionFromDocument(docOf([polygon('angle', outer, at(0, 0, 0, true))]));
    expect(rel(mirrored.properties?.Ixy, 70078125 / 76)).toBeLessThan(1e-12);
    expect(rel(mirrored.properties?.cx, -1355 / 76)).toBeLessThan(1e-12);
  });

  it('a semicircle polygon part with one arc (bulge 1), mirrored and turned 90°, has cx = −4r/(3π) and Ix = π r⁴/8 (analytic_refs.csv semicircle, Gere & Timoshenko)', () => {
    const r = 50;
    const semi: Part = { ...common('half round', at(0, 0, 90, true)), type: 'polygon', outer: [[r, 0], [-r, 0]], outerBulges: [1, 0], holes: [] };
    const got = sectionFromDocument(docOf([semi]));
    expect(got.diagnostics).toEqual([]);
    // Mirroring x → −x leaves the upper half-disc as it is; 90° CCW turns it into the left half.
    expect(rel(got.properties?.area, 3926.9908169872415)).toBeLessThan(1e-13);
    expect(rel(got.properties?.cx, -21.22065907891938)).toBeLessThan(1e-12);
    expect(rel(got.properties?.Ix, 2454369.2606170257)).toBeLessThan(1e-12);
    expect(rel(got.properties?.Iy, 685981.0040404109)).toBeLessThan(1e-12);
  });

  it('a standard part from core/parts: a round bar of d = 50 mm has A = π d²/4 and Ix = π d⁴/64', () => {
    const bar: Part = { ...common('bar'), type: 'shape', shape: 'round-bar', params: { d: 50 } };
    const r = sectionFromDocument(docOf([bar]));
    expect(r.diagnostics).toEqual([]);
    expect(rel(r.properties?.area, (Math.PI * 50 ** 2) / 4)).toBeLessThan(1e-13);
    expect(rel(r.properties?.Ix, (Math.PI * 50 ** 4) / 64)).toBeLessThan(1e-12);
  });
});

describe('hidden parts and order', () => {
  it('a hidden part is left out of the numbers and counted', () => {
    const hole = { ...circle('hole', 40), visible: false };
    const r = sectionFromDocument(docOf([rect('plate', 200, 120), hole]));
    expect(r.hiddenParts).toBe(1);
    expect(rel(r.properties?.area, 24000)).toBeLessThan(1e-14);
  });

  it('parts combine in document order: a later, larger add fills an earlier hole (A = b h again)', () => {
    const r = sectionFromDocument(docOf([rect('plate', 200, 120), circle('hole', 40), circle('plug', 60, at(0, 0), 'add')]));
    expect(r.diagnostics).toEqual([]);
    expect(rel(r.properties?.area, 24000)).toBeLessThan(1e-12);
    // The same parts in another order leave the hole: A = b h − π d²/4.
    const reordered = sectionFromDocument(docOf([rect('plate', 200, 120), circle('plug', 60, at(0, 0), 'add'), circle('hole', 40)]));
    expect(rel(reordered.properties?.area, 24000 - Math.PI * 400)).toBeLessThan(1e-12);
  });
});

describe('fast paths agree with the Boolean adapter', () => {
  it('eight bolt holes cut by the fast path give the same integrals as differenceRegions (1e-12 relative)', () => {
    const holes = [-75, -25, 25, 75].flatMap((x) => [-30, 30].map((y) => circle(`hole ${x},${y}`, 22, at(x, y))));
    const composed = regionFromDocument(docOf([rect('plate', 200, 100), ...holes]));
    expect(composed.booleanCalls).toBe(0);
    let viaAdapter = regionFromDocument(docOf([rect('plate', 200, 100)])).region;
    for (const h of holes) viaAdapter = differenceRegions(viaAdapter, regionFromDocument(docOf([{ ...h, operation: 'add' }])).region);
    const a = regionIntegrals(composed.region, 0, 0);
    const b = regionIntegrals(viaAdapter, 0, 0);
    expect(rel(a.A, b.A)).toBeLessThan(1e-12);
    expect(rel(a.Ixx, b.Ixx)).toBeLessThan(1e-12);
    expect(rel(a.A, 20000 - 8 * Math.PI * 121)).toBeLessThan(1e-13);
  });

  it('twenty separate plates need no Boolean call and their areas add', () => {
    const plates = Array.from({ length: 20 }, (_, i) => rect(`plate ${i}`, 10, 30, at(i * 20, 0)));
    const r = sectionFromDocument(docOf(plates));
    expect(r.booleanCalls).toBe(0);
    expect(rel(r.properties?.area, 20 * 300)).toBeLessThan(1e-14);
  });
});

describe('diagnostics name the part', () => {
  it('a self-intersecting polygon part is reported with its name and no numbers are given', () => {
    const bow = polygon('bow tie', [[0, 0], [10, 10], [10, 0], [0, 10]]);
    const r = sectionFromDocument(docOf([rect('plate', 100, 100), bow]));
    expect(r.properties).toBeNull();
    expect(r.diagnostics.map((d) => [d.code, d.part])).toContainEqual(['self-intersection', 'bow tie']);
    expect(r.parts[1]?.diagnostics.length).toBeGreaterThan(0);
  });

  it('an unknown standard part type is a bad-parameter diagnostic naming the part', () => {
    const odd: Part = { ...common('mystery'), type: 'shape', shape: 'hexagon-bar', params: {} };
    const r = sectionFromDocument(docOf([odd]));
    expect(r.diagnostics.map((d) => [d.code, d.part])).toEqual([['bad-parameter', 'mystery']]);
    expect(r.diagnostics[0]?.message).toMatch(/part "mystery": unknown part type "hexagon-bar"/);
  });

  it('a subtract part before any add part, an empty document and an all-hidden document are empty-section diagnostics', () => {
    expect(sectionFromDocument(docOf([circle('hole', 10), rect('plate', 100, 100)])).diagnostics.map((d) => [d.code, d.part])).toEqual([['empty-section', 'hole']]);
    expect(sectionFromDocument(docOf([])).diagnostics[0]?.message).toBe('the section has no area: the document has no parts');
    expect(sectionFromDocument(docOf([{ ...rect('plate', 1, 1), visible: false }])).diagnostics[0]?.message).toBe('the section has no area: every part is hidden');
  });

  it('a part placed beyond the coordinate limit is reported, not computed', () => {
    const r = sectionFromDocument(docOf([rect('far plate', 10, 10, at(5e9, 0))]));
    expect(r.properties).toBeNull();
    expect(r.diagnostics[0]?.code).toBe('too-large');
    expect(r.diagnostics[0]?.part).toBe('far plate');
  });
});
