// Load shared by EI among separate plies (core/joints/ply-share.ts). References: beams side by
// side with one deflection share the load by E·I (common practice; Gere & Timoshenko, Mechanics
// of Materials, composite beams); 2x10 dressed 1.5 × 9.25 in (NDS Supplement Table 1A);
// E = 1.6e6 psi (NDS Supplement Table 4A, Douglas Fir-Larch No. 2, from memory) and 29e6 psi for
// steel (AISC, common practice, from memory); I = b·h³/12 by hand.
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { JointSetting, Part, SectionDocument } from '../../core/document/types.ts';
import { plyShares } from '../../core/joints/index.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number, material: string | null): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: at(x, y), width, height,
});
const doc = (parts: readonly Part[], joints: JointSetting[] = []): SectionDocument => ({ ...newDocument('in', 'mezzanine flitch beam'), parts, joints });
const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

describe('share of the load by EI per ply', () => {
  it('a 3-ply 2x10 of equal plies, not connected (wood to wood default): 1/3 each', () => {
    const d = doc([rect('ply 1', 1.5, 9.25, -1.5, 0, 'df-l-no2'), rect('ply 2', 1.5, 9.25, 0, 0, 'df-l-no2'), rect('ply 3', 1.5, 9.25, 1.5, 0, 'df-l-no2')]);
    const r = plyShares(d);
    expect(r?.separate).toBe(true);
    expect(r?.plies.map((p) => p.labels)).toEqual([['ply 1'], ['ply 2'], ['ply 3']]);
    for (const p of r?.plies ?? []) {
      expect(rel(p.shareX, 1 / 3)).toBeLessThan(1e-12);
      expect(rel(p.shareY, 1 / 3)).toBeLessThan(1e-12);
      expect(rel(p.Ix, (1.5 * 9.25 ** 3) / 12)).toBeLessThan(1e-12);
    }
  });

  it('a flitch beam, two 2x10 and a 3/8 × 9 steel plate: shares by EI by hand', () => {
    const d = doc([rect('ply 1', 1.5, 9.25, -0.9375, 0, 'df-l-no2'), rect('plate', 0.375, 9, 0, 0, 'astm-a36'), rect('ply 2', 1.5, 9.25, 0.9375, 0, 'df-l-no2')]);
    const EIwood = 1.6e6 * ((1.5 * 9.25 ** 3) / 12); // lbf·in²: 158 290 625 (9.25³ = 791.453125)
    const EIsteel = 29e6 * ((0.375 * 9 ** 3) / 12); // 660 656 250
    const total = 2 * EIwood + EIsteel;
    expect(EIwood).toBe(158_290_625);
    expect(EIsteel).toBe(660_656_250);
    const r = plyShares(d);
    expect(r?.plies.map((p) => p.labels[0])).toEqual(['ply 1', 'plate', 'ply 2']);
    expect(rel(r?.plies[0]?.shareX ?? 0, EIwood / total)).toBeLessThan(1e-12);
    expect(rel(r?.plies[1]?.shareX ?? 0, EIsteel / total)).toBeLessThan(1e-12);
    // EI in Pa·in⁴ (psi → Pa: 6894.757293168361, NIST SP 811): E·I of the plate.
    expect(rel(r?.plies[1]?.EIx ?? 0, 29e6 * 6894.757293168361 * ((0.375 * 9 ** 3) / 12))).toBeLessThan(1e-12);
    expect(r?.note).toContain('in proportion to each ply\'s EI');
  });

  it('bolted, the same flitch beam is one ply carrying the whole load', () => {
    const bolted: JointSetting[] = [
      { parts: ['ply 1', 'plate'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } },
      { parts: ['plate', 'ply 2'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } },
    ];
    const d = doc([rect('ply 1', 1.5, 9.25, -0.9375, 0, 'df-l-no2'), rect('plate', 0.375, 9, 0, 0, 'astm-a36'), rect('ply 2', 1.5, 9.25, 0.9375, 0, 'df-l-no2')], bolted);
    const r = plyShares(d);
    expect([r?.separate, r?.plies.length, r?.plies[0]?.shareX]).toEqual([false, 1, 1]);
  });
});
