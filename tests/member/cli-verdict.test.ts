/**
 * `sectionsmith member` judges every criterion and exits 1 when any is over its limit (issue 13:
 * a W14X90 at 182 % of fy was shown only in grey text and the verdict covered deflection only).
 *
 * W14X90 (AISC Shapes Database v15.0: d 14.0, bf 14.5, tw 0.440, tf 0.710, kdes 1.31 in;
 * Sx = 143 in³), ASTM A992 steel, Fy = 50 ksi (from memory). σ = M/Sx with M = wL²/8 (Gere &
 * Timoshenko): over a 360 in simple span, w = 8·(1.82·50 ksi·143 in³)/360² puts σ at 182 % of
 * fy, within the 1.5 % by which a shape rebuilt from 3-significant-figure dimensions may
 * differ from the table's Sx (see tests/catalogue/aisc-subset.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { memberCommand } from '../../cli/commands/member.ts';
import type { FlagLists, FlagValues } from '../../cli/command.ts';
import { runCommand, type CliRun } from '../cli/run-cli.ts';
import { builtInMaterial } from '../../core/materials/library.ts';

const run = (files: Record<string, string>, positionals: string[], flags: FlagValues, lists: FlagLists = {}): CliRun => runCommand(memberCommand, files, positionals, flags, lists);

const w14x90 = JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'W14X90', unit: 'in', defaultMaterial: 'astm-a992', materials: [builtInMaterial('astm-a992')],
  parts: [{ id: 'w', name: 'W14X90', type: 'shape', shape: 'i-shape', designation: 'W14X90', params: { d: 14, bf: 14.5, tw: 0.44, tf: 0.71, r: 0.6 }, operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } }],
});
const overload = (8 * 1.82 * 50 * 143) / 360 ** 2; // kip/in

describe('sectionsmith member: the verdict covers every criterion', () => {
  it('W14X90 at 182 % of fy: exit 1, bending stress named as governing at ≈182 %, FAIL printed', () => {
    // --limit 50 keeps deflection within its limit, so bending is the criterion that governs.
    const r = run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', uniform: `${overload}kip/in`, limit: '50' });
    expect(r.err).toBe('');
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/verdict: FAILS: bending stress in Steel ASTM A992 \(Fy 50 ksi\) governs at 18\d %/);
    expect(r.out).toMatch(/FAIL +bending stress/);
    expect(r.out).toMatch(/pass +deflection under total load: .* \(span\/50\)/);
    expect(r.out).toMatch(/NOT CHECKED +deflection under live load: no live load given/);
    expect(r.out).toMatch(/default factor 1 is the strength itself/);
  });

  it('--json: verdict.criteria carry demand, limit (ksi, the inch document\'s stress unit) and ratio; the bending ratio is 1.82 within 1.5 %', () => {
    const r = run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', uniform: `${overload}kip/in`, json: true });
    const j = JSON.parse(r.out) as { verdict: { passes: boolean; governing: string; criteria: { kind: string; ratio: number; limit: number }[] } };
    expect(j.verdict.passes).toBe(false);
    const bending = j.verdict.criteria.find((c) => c.kind === 'bending')!;
    expect(Math.abs(bending.ratio / 1.82 - 1)).toBeLessThan(0.015);
    expect(bending.limit).toBeCloseTo(50, 9); // 1 × fy, ksi
  });

  it('a light load passes every criterion: exit 0; live L/360 and total L/240 both judged when --live is given', () => {
    const r = run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', uniform: '0.5kip/ft', live: '1kip/ft' });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/verdict: PASSES/);
    expect(r.out).toMatch(/pass +deflection under live load: .* \(span\/360\)/);
    expect(r.out).toMatch(/pass +deflection under total load: .* \(span\/240\)/);
    expect(r.out).toMatch(/pass +shear stress at the neutral axis/);
  });

  it('--stress-factor 0.6 and --allowable: the limit follows; an unknown material id is bad input (exit 2) naming it', () => {
    const load = (8 * 0.7 * 50 * 143) / 360 ** 2; // σ ≈ 0.7 fy: passes at factor 1, fails at 0.6
    expect(run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', limit: '100', uniform: `${load}kip/in` }).code).toBe(0);
    expect(run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', limit: '100', uniform: `${load}kip/in`, 'stress-factor': '0.6' }).code).toBe(1);
    expect(run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', limit: '100', uniform: `${load}kip/in` }, { allowable: ['30ksi'] }).code).toBe(1);
    const bad = run({ 'w.json': w14x90 }, ['w.json'], { span: '360', support: 'simple', limit: '100', uniform: `${load}kip/in` }, { allowable: ['constructor=30ksi'] });
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/no material "constructor"/);
  });
});
