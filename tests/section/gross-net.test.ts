// Gross and net sections (issue "holes, joints and shear", what was seen): a plate girder, web
// 1200 × 12, top flange 400 × 25, bottom flange 500 × 30 mm, with two Ø22 bolt holes through the
// bottom flange placed by the bolt-hole assembly. Fastener holes are a net-section deduction only:
// the gross properties (A, I, plastic moduli), the shear centre and Cw must be those of the girder
// without holes, and the net properties must be the composition of rectangles with the hole
// strips subtracted (b·h³/12 + A·d², parallel-axis theorem; Gere & Timoshenko, Mechanics of
// Materials), worked out by hand below.
import { describe, expect, it } from 'vitest';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { newDocument } from '../../core/document/index.ts';
import { boltHolePattern, plateGirder } from '../../core/parts/built-up.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { torsionConstants } from '../../core/torsion/index.ts';
import { compositeProperties, materialPiecesFromDocument } from '../../core/materials/index.ts';

type Piece = ReturnType<typeof plateGirder>['pieces'][number];

function docOf(pieces: readonly Piece[], extra: Partial<SectionDocument> = {}): SectionDocument {
  const parts = pieces.map((p, i) => ({ ...p, id: `p${i + 1}`, material: null, visible: true }) as Part);
  return { ...newDocument('mm', 'plate girder'), parts, ...extra };
}

const girder = plateGirder({ web: { h: 1200, tw: 12 }, top: { b: 400, t: 25 }, bottom: { b: 500, t: 30 } });
// Two Ø22 holes at x = ±70 (gauge 140), through the 30 mm bottom flange centred at y = −615.
const holes = boltHolePattern({ diameter: 22, columns: 2, gauge: 140, x: 0, y: -615, axis: 'y', depth: 30, name: 'bolt hole' });
const plain = docOf(girder.pieces);
const holed = docOf([...girder.pieces, ...holes.pieces]);

/** Rectangles (b wide, h deep, centred at x, y; sign −1 for a hole strip) composed by hand. */
function composed(rects: readonly { b: number; h: number; x: number; y: number; sign: number }[]) {
  const A = rects.reduce((s, r) => s + r.sign * r.b * r.h, 0);
  const cy = rects.reduce((s, r) => s + r.sign * r.b * r.h * r.y, 0) / A;
  const cx = rects.reduce((s, r) => s + r.sign * r.b * r.h * r.x, 0) / A;
  const Ix = rects.reduce((s, r) => s + r.sign * ((r.b * r.h ** 3) / 12 + r.b * r.h * (r.y - cy) ** 2), 0);
  const Iy = rects.reduce((s, r) => s + r.sign * ((r.h * r.b ** 3) / 12 + r.b * r.h * (r.x - cx) ** 2), 0);
  return { A, cx, cy, Ix, Iy };
}

const plates = [
  { b: 12, h: 1200, x: 0, y: 0, sign: 1 },
  { b: 400, h: 25, x: 0, y: 612.5, sign: 1 },
  { b: 500, h: 30, x: 0, y: -615, sign: 1 },
];
const strips = [
  { b: 22, h: 30, x: -70, y: -615, sign: -1 },
  { b: 22, h: 30, x: 70, y: -615, sign: -1 },
];

const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

describe('the bolt-hole assembly places fastener holes', () => {
  it('holes through a plate (axis x or y) are fastener holes; holes along the member (axis z) are voids', () => {
    expect(holes.pieces.map((p) => p.cutoutRole)).toEqual(['fastener-hole', 'fastener-hole']);
    const along = boltHolePattern({ diameter: 22, x: 0, y: 0, axis: 'z' });
    expect(along.pieces.map((p) => p.cutoutRole)).toEqual(['void']);
  });
});

describe('gross section: fastener holes change nothing that a hole at the bolt does not change', () => {
  it('A, Ix, Iy, centroid, moduli and plastic moduli with the holes equal those without (no stiffness lost to holes)', () => {
    const a = sectionFromDocument(plain).properties;
    const b = sectionFromDocument(holed).properties;
    expect(b).toEqual(a);
    const hand = composed(plates);
    expect(rel(b?.area ?? 0, hand.A)).toBeLessThan(1e-12);
    expect(rel(b?.Ix ?? 0, hand.Ix)).toBeLessThan(1e-12);
  });

  it('the gross section is one piece: the holes do not cut the flange into three', () => {
    expect(sectionFromDocument(holed).region.length).toBe(1);
  });

  it('EI for deflection uses the gross section: the material pieces ignore fastener holes', () => {
    // Built-in ASTM A992 steel as the default material; EIx with holes must be EIx without.
    const withSteel = (d: SectionDocument): SectionDocument => ({ ...d, defaultMaterial: 'astm-a992' });
    const a = materialPiecesFromDocument(withSteel(plain));
    const b = materialPiecesFromDocument(withSteel(holed));
    expect([a.issues, b.issues]).toEqual([[], []]);
    expect(compositeProperties(b.pieces, 'mm').EIx).toBe(compositeProperties(a.pieces, 'mm').EIx);
  });
});

describe('net section beside the gross, wherever fastener holes exist', () => {
  it('An, net centroid, Ix,net, Iy,net and Sx,net equal the plates less the two 22 × 30 hole strips (b·h³/12 + A·d²)', () => {
    const r = sectionFromDocument(holed);
    const net = r.netProperties;
    expect(r.fastenerHoles).toBe(2);
    expect(net).not.toBeNull();
    const hand = composed([...plates, ...strips]);
    expect(hand.A).toBe(38_080); // 14 400 + 10 000 + 15 000 − 2 × 660
    expect(rel(net?.area ?? 0, hand.A)).toBeLessThan(1e-12);
    expect(rel(net?.cy ?? 0, hand.cy)).toBeLessThan(1e-12);
    expect(Math.abs(net?.cx ?? 1)).toBeLessThan(1e-9);
    expect(rel(net?.Ix ?? 0, hand.Ix)).toBeLessThan(1e-12);
    expect(rel(net?.Iy ?? 0, hand.Iy)).toBeLessThan(1e-12);
    expect(rel(net?.SxTop ?? 0, hand.Ix / (625 - hand.cy))).toBeLessThan(1e-12);
    expect(rel(net?.SxBottom ?? 0, hand.Ix / (hand.cy + 630))).toBeLessThan(1e-12);
  });

  it('a section without fastener holes has no net properties, and a void is cut from the gross section too', () => {
    expect(sectionFromDocument(plain).netProperties).toBeNull();
    const voids = docOf([...girder.pieces, ...holes.pieces.map((p) => ({ ...p, cutoutRole: 'void' as const }))]);
    const r = sectionFromDocument(voids);
    expect(r.netProperties).toBeNull();
    expect(rel(r.properties?.area ?? 0, 38_080)).toBeLessThan(1e-12);
  });
});

describe('torsion of the gross section: shear centre and Cw unchanged by fastener holes', () => {
  it('ys = −247.8 mm and Cw = 140,800 × 10⁹ mm⁶ with the holes as without (thin-walled closed forms within 0.5 %)', () => {
    const a = torsionConstants(sectionFromDocument(plain).region);
    const b = torsionConstants(sectionFromDocument(holed).region);
    expect(b.components).toBe(1);
    expect(b.J).toBe(a.J);
    expect(b.Cw).toBe(a.Cw);
    expect(b.ys).toBe(a.ys);
    // Thin-walled monosymmetric I (common practice; e.g. AISC Design Guide 9): flange centroids
    // h = 1227.5 mm apart, I_top = 25·400³/12, I_bot = 30·500³/12; the shear centre lies
    // h·I_bot/(I_top + I_bot) below the top flange's centre (612.5), and Cw = h²·I_top·I_bot/(I_top + I_bot).
    const h = 1227.5, It = (25 * 400 ** 3) / 12, Ib = (30 * 500 ** 3) / 12;
    const ys = 612.5 - (h * Ib) / (It + Ib);
    const Cw = (h * h * It * Ib) / (It + Ib);
    expect(ys).toBeCloseTo(-247.9, 1);
    expect(Math.abs(b.ys - ys)).toBeLessThan(0.005 * h);
    expect(rel(b.Cw, Cw)).toBeLessThan(0.005);
  });
});
