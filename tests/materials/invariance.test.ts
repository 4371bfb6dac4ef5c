import { describe, expect, it } from 'vitest';
import { rotateRegion, translateRegion } from '../../core/geometry/transform.ts';
import { compositeProperties, type MaterialPiece } from '../../core/materials/composite.ts';
import { circle, mat, polygon, rect, rel } from './helpers.ts';

// A trailer-frame rail of our own: a steel channel-like polygon with an aluminium bar bolted on
// its web and a round steel bar below (arcs), to exercise every path of the sums.
const steel = mat('steel', 200e9, 355e6, 7850);
const aluminium = mat('aluminium', 70e9, 250e6, 2700);
const pieces: MaterialPiece[] = [
  { region: polygon([[0, 0], [60, 0], [60, 8], [8, 8], [8, 142], [60, 142], [60, 150], [0, 150]]), material: steel, label: 'rail' },
  { region: rect(8, 40, 20, 110), material: aluminium, label: 'bar' },
  { region: circle(30, -20, 16), material: steel, label: 'rod' },
];
const base = compositeProperties(pieces, 'mm');

describe('invariance of the E-weighted section (docs/methods.md §11 invariance tests)', () => {
  it('translating every piece by (1.2e6, −7.7e6) mm leaves EA, EIx, EIy, EIxy unchanged and moves the centroid by the same amount', () => {
    const moved = compositeProperties(pieces.map((p) => ({ ...p, region: translateRegion(p.region, 1.2e6, -7.7e6) })), 'mm');
    expect(rel(moved.EA, base.EA)).toBeLessThan(1e-12);
    expect(rel(moved.EIx, base.EIx)).toBeLessThan(1e-9); // far-offset input representation, docs/methods.md §11
    expect(rel(moved.EIy, base.EIy)).toBeLessThan(1e-9);
    expect(Math.abs(moved.EIxy - base.EIxy)).toBeLessThan(1e-9 * base.EIx);
    expect(Math.abs(moved.cx - 1.2e6 - base.cx)).toBeLessThan(1e-6);
    expect(Math.abs(moved.cy + 7.7e6 - base.cy)).toBeLessThan(1e-6);
  });

  it('rotating the section by 35° keeps EI1 and EI2 and turns the EI1 axis by 35° (tensor law, Gere & Timoshenko)', () => {
    const turned = compositeProperties(pieces.map((p) => ({ ...p, region: rotateRegion(p.region, 35) })), 'mm');
    expect(rel(turned.EI1, base.EI1)).toBeLessThan(1e-12);
    expect(rel(turned.EI2, base.EI2)).toBeLessThan(1e-12);
    const d = (((turned.thetaDeg - base.thetaDeg - 35) % 180) + 180) % 180;
    expect(Math.min(d, 180 - d)).toBeLessThan(1e-9);
  });

  it('EI is linear in E: doubling every modulus doubles EA and EI and leaves the centroid and the modular ratios', () => {
    const doubled = compositeProperties(pieces.map((p) => ({ ...p, material: { ...p.material, E: 2 * p.material.E } })), 'mm');
    expect(rel(doubled.EA, 2 * base.EA)).toBeLessThan(1e-14);
    expect(rel(doubled.EIx, 2 * base.EIx)).toBeLessThan(1e-13);
    expect(rel(doubled.cy, base.cy)).toBeLessThan(1e-13);
    expect(doubled.pieces.map((p) => p.n)).toEqual(base.pieces.map((p) => p.n));
  });

  it('one material with E = 1 gives the geometric values: EA = A and EI = I (rectangle b h³/12, Gere & Timoshenko)', () => {
    const one = compositeProperties([{ region: rect(0, 0, 30, 70), material: mat('u', 1, 1, 0) }], 'm');
    expect(rel(one.EA, 2100)).toBeLessThan(1e-14);
    expect(rel(one.EIx, (30 * 70 ** 3) / 12)).toBeLessThan(1e-13);
    expect(rel(one.EIy, (70 * 30 ** 3) / 12)).toBeLessThan(1e-13);
  });
});
