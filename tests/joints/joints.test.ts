// Joints, overlaps and the parts that act together (core/joints), from the issue's "what was
// seen": two C15X50 toe to toe were silently one welded box; a duplicate part exactly on top of
// its original added nothing and nothing warned; two plates side by side that are not connected
// must twist separately. References: exact arithmetic on the typed dimensions; J of a thin
// rectangle b·t³/3·(1 − 0.630·t/b) (Roark's Formulas for Stress and Strain, Table 10.1 case 4,
// from memory), and the identity J(two separate plates) = 2·J(one plate).
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { JointSetting, Part, SectionDocument } from '../../core/document/types.ts';
import { partFromDesignation } from '../../core/catalogue/index.ts';
import { boxFromChannels, plateGirder } from '../../core/parts/built-up.ts';
import { findJoints, partsActingTogether, separateTorsion } from '../../core/joints/index.ts';
import { regionFromDocument } from '../../core/section/index.ts';
import { torsionConstants } from '../../core/torsion/index.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number, material: string | null = null): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: at(x, y), width, height,
});
const doc = (parts: readonly Part[], extra: Partial<SectionDocument> = {}): SectionDocument => ({ ...newDocument('mm', 'test'), parts, ...extra });

describe('joints are the contact segments between part outlines', () => {
  const girder = plateGirder({ web: { h: 1200, tw: 12 }, top: { b: 400, t: 25 }, bottom: { b: 500, t: 30 } });
  const d = doc(girder.pieces.map((p, i) => ({ ...p, id: ['web', 'top', 'bottom'][i] as string, material: null, visible: true }) as Part));

  it('a plate girder has two joints, web to each flange, each 12 mm long (the web thickness), welded both sides by default', () => {
    const joints = findJoints(d, regionFromDocument(d).parts);
    expect(joints.map((j) => [j.partIds, j.length, j.segments.length, j.kind])).toEqual([
      [['web', 'top'], 12, 1, { type: 'welded', weld: 'fillet-both-sides' }],
      [['web', 'bottom'], 12, 1, { type: 'welded', weld: 'fillet-both-sides' }],
    ]);
    expect(joints[0]?.defaultReason).toBe('default between two metal parts (no material given: taken as metal; no material given: taken as metal)');
    // The web's top edge, from x = 6 to x = −6 at y = 600 (the web's outline runs counter-clockwise).
    const s = joints[0]?.segments[0];
    expect([s?.x0, s?.y0, s?.x1, s?.y1].map((v) => Math.round((v ?? NaN) * 1e9) / 1e9)).toEqual([6, 600, -6, 600]);
  });

  it('the user\'s kind wins over the default; wood to steel defaults to not connected', () => {
    const set: JointSetting[] = [{ parts: ['top', 'web'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } }];
    const joints = findJoints({ ...d, joints: set }, regionFromDocument(d).parts);
    expect(joints.map((j) => [j.kind.type, j.isDefault])).toEqual([['fastened', false], ['welded', true]]);
    const flitch = doc([rect('ply', 38, 235, -25, 0, 'df-l-no2'), rect('plate', 12, 235, 0, 0, 'astm-a36')]);
    const f = findJoints(flitch, regionFromDocument(flitch).parts);
    expect(f.map((j) => [j.kind.type, j.length])).toEqual([['not-connected', 235]]);
  });

  it('parts a gap apart, or overlapping, have no joint', () => {
    const apart = doc([rect('a', 10, 100, 0, 0), rect('b', 10, 100, 10.001, 0)]);
    expect(findJoints(apart, regionFromDocument(apart).parts)).toEqual([]);
  });
});

describe('two C15X50 toe to toe: a joint at each toe, listed, never silently a box', () => {
  const c = partFromDesignation('C15X50');
  if (!c.ok) throw new Error(c.message);
  const box = boxFromChannels({ channel: c.params, designation: 'C15X50', arrangement: 'toe-to-toe', gap: 0 });
  const d: SectionDocument = { ...newDocument('in', 'trailer frame rail'), parts: box.pieces.map((p, i) => ({ ...p, id: `c${i + 1}`, material: null, visible: true }) as Part) };

  it('one joint between the two channels with two contact segments, one per toe, and the default named as such', () => {
    const r = partsActingTogether(d);
    expect(r.joints).toHaveLength(1);
    const j = r.joints[0];
    expect(j?.segments).toHaveLength(2);
    // Each toe contact lies on x = 0 and is no thicker than the flange (tf = 0.65 in, AISC v15.0).
    for (const s of j?.segments ?? []) {
      expect(Math.abs(s.x0) + Math.abs(s.x1)).toBeLessThan(1e-9);
      expect(s.length).toBeGreaterThan(0);
      expect(s.length).toBeLessThanOrEqual(0.65);
    }
    expect(r.warnings.join(' ')).toContain('"left channel" and "right channel": welded, fillet welds both sides by default');
  });

  it('marked not connected, the two channels are two pieces that twist separately', () => {
    const apart = { ...d, joints: [{ parts: ['c1', 'c2'], kind: { type: 'not-connected' } }] as JointSetting[] };
    const r = partsActingTogether(apart);
    expect(r.groups.map((g) => g.labels)).toEqual([['left channel'], ['right channel']]);
    expect(r.warnings[0]).toMatch(/^The material falls into 2 separate pieces \(parts apart, or joined only by joints marked "not connected"\)/);
    expect(r.warnings[0]).toContain('no shared shear centre');
  });
});

describe('overlaps are warned with names and area', () => {
  it('a duplicate part exactly on top of its original: warned, overlap = its whole area 400 × 25 = 10 000 mm²', () => {
    const d = doc([rect('top flange', 400, 25, 0, 0), rect('web', 12, 300, 0, -162.5), { ...rect('top flange', 400, 25, 0, 0), id: 'copy', name: 'top flange copy' }]);
    const r = partsActingTogether(d);
    expect(r.overlaps.map((o) => [o.labels, Math.round(o.area * 1e6) / 1e6])).toEqual([[['top flange', 'top flange copy'], 10_000]]);
    expect(r.warnings).toContain('Parts "top flange" and "top flange copy" overlap by 10000 mm²: the overlap counts once (nothing is added for it). Check that this is intended (a duplicate part on top of another adds nothing).');
    expect(r.groups).toHaveLength(1);
  });

  it('parts that only touch do not overlap', () => {
    const d = doc([rect('a', 10, 100, 0, 0), rect('b', 10, 100, 10, 0)]);
    expect(partsActingTogether(d).overlaps).toEqual([]);
  });
});

describe('not connected means separate: torsion of two plates side by side', () => {
  // Two 10 × 100 mm plates touching along their 100 mm edges (a two-ply member).
  const plies = [rect('ply 1', 10, 100, -5, 0, 'astm-a36'), rect('ply 2', 10, 100, 5, 0, 'astm-a36')];
  const notConnected: JointSetting[] = [{ parts: ['ply 1', 'ply 2'], kind: { type: 'not-connected' } }];

  it('J of the two plies not connected = 2 × J of one ply (identity) ≈ 2 · b·t³/3·(1 − 0.630 t/b) (Roark)', () => {
    const r = partsActingTogether(doc(plies, { joints: notConnected }));
    expect(r.groups).toHaveLength(2);
    const sum = separateTorsion(r.groups);
    const one = torsionConstants(regionFromDocument(doc([plies[0] as Part])).region);
    expect(Math.abs(sum.J - 2 * one.J)).toBeLessThan(1e-6 * one.J);
    const roark = ((100 * 10 ** 3) / 3) * (1 - (0.63 * 10) / 100);
    expect(Math.abs(sum.J / (2 * roark) - 1)).toBeLessThan(0.01);
    expect(sum.groups.map((g) => g.labels)).toEqual([['ply 1'], ['ply 2']]);
  });

  it('welded, the same plies are one 20 × 100 plate, with J about 4 times larger', () => {
    const r = partsActingTogether(doc(plies));
    expect(r.groups).toHaveLength(1);
    const J = torsionConstants(r.groups[0]?.region ?? []).J;
    const roark = ((100 * 20 ** 3) / 3) * (1 - (0.63 * 20) / 100);
    expect(Math.abs(J / roark - 1)).toBeLessThan(0.01);
  });
});
