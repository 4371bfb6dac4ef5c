import { describe, expect, it } from 'vitest';
import { memberCommand } from '../../cli/commands/member.ts';
import type { FlagValues } from '../../cli/command.ts';
import { runCommand, type CliRun } from '../cli/run-cli.ts';
import { builtInMaterial } from '../../core/materials/library.ts';
import { readRefs, refValue } from './refs.ts';

const refs = readRefs(new URL('../fixtures/analytic-refs-stress-member.csv', import.meta.url));
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

const run = (files: Record<string, string>, positionals: string[], flags: FlagValues): CliRun => runCommand(memberCommand, files, positionals, flags);

// A 120 × 200 mm rectangle: I = 120·200³/12 = 8e7 mm⁴, the I of the beam_deflection rows.
const rectangle = JSON.stringify({ type: 'Polygon', coordinates: [[[0, 0], [120, 0], [120, 200], [0, 200], [0, 0]]] });

describe('sectionsmith member (command line)', () => {
  it('GeoJSON with --E 200000 (MPa): simple span 6000 mm, 20 kN at midspan → deflectionMax 5.625 mm (analytic refs)', () => {
    const r = run({ 'r.json': rectangle }, ['r.json'], { unit: 'mm', span: '6000', support: 'simple', point: '20kN', E: '200000', json: true, limit: '360' });
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, unknown>;
    expect(rel(j.deflectionMax as number, refValue(refs, 'beam_deflection', 'simply_supported_centre_load'))).toBeLessThan(1e-12);
    expect(rel(j.deflectionAt as number, 3000)).toBeLessThan(1e-12);
    expect(rel(j.spanOverDeflection as number, 6000 / 5.625)).toBeLessThan(1e-12);
    expect(rel(j.momentMax as number, (20 * 6) / 4)).toBeLessThan(1e-12); // P L / 4 = 30 kN·m (a metric document reports kN·m)
    expect((j.units as Record<string, string>).momentMax).toBe('kN·m');
    expect(j.caution).toMatch(/licensed engineer/);
    const limit = j.limit as { allowed: number; passes: boolean };
    expect(rel(limit.allowed, refValue(refs, 'beam_deflection', 'limit_L_over_360'))).toBeLessThan(1e-12);
    expect(limit.passes).toBe(true);
    // σ = M c / I = 3e7 · 100 / 8e7 = 37.5 MPa
    const st = (j.stresses as { maxTension: number }[])[0]!;
    expect(rel(st.maxTension, 37.5)).toBeLessThan(1e-12);
  });

  it('uniform load given as 10kN/m equals 10 N/mm: 5wL⁴/(384EI) = 10.546875 mm (analytic refs)', () => {
    const r = run({ 'r.json': rectangle }, ['r.json'], { unit: 'mm', span: '6000', support: 'simple', uniform: '10kN/m', E: '200GPa', json: true, limit: '360' });
    const j = JSON.parse(r.out) as Record<string, unknown>;
    expect(rel(j.deflectionMax as number, refValue(refs, 'beam_deflection', 'simply_supported_udl'))).toBeLessThan(1e-12);
    expect((j.limit as { verdict: string }).verdict).toBe('within limit');
  });

  it('cantilever end load: P L³/(3EI) = 90 mm, and span/240 with 2× the length per the IBC footnote (from memory)', () => {
    const r = run({ 'r.json': rectangle }, ['r.json'], { unit: 'mm', span: '6000', support: 'cantilever', point: '20000', E: '200000', json: true, limit: '240' });
    const j = JSON.parse(r.out) as Record<string, unknown>;
    expect(rel(j.deflectionMax as number, refValue(refs, 'beam_deflection', 'cantilever_end_load'))).toBeLessThan(1e-12);
    const limit = j.limit as { allowed: number; passes: boolean; limitLength: number };
    expect(limit.limitLength).toBe(12_000);
    expect(rel(limit.allowed, 50)).toBeLessThan(1e-12);
    expect(limit.passes).toBe(false);
  });

  it('a document flitch beam in inches uses its materials: EI = 1.6e6 psi · 610.7734375 in⁴ (hand transformed section)', () => {
    const wood = builtInMaterial('df-l-no2')!, steel = builtInMaterial('astm-a36')!;
    const part = (id: string, material: string, x: number, width: number, height: number) => ({
      id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: { x, y: 0, rotationDeg: 0, mirror: false }, width, height,
    });
    const doc = {
      format: 'sectionsmith-section', version: 1, name: 'mezzanine flitch beam', unit: 'in', defaultMaterial: null,
      materials: [wood, steel],
      parts: [part('ply 1', wood.id, -0.9375, 1.5, 9.25), part('plate', steel.id, 0, 0.375, 9), part('ply 2', wood.id, 0.9375, 1.5, 9.25)],
    };
    // 14 ft span = 168 in, 1000 lbf at midspan: Δ = P L³/(48 EI) (Gere & Timoshenko)
    const r = run({ 'f.json': JSON.stringify(doc) }, ['f.json'], { span: '168', support: 'simple', point: '1000', json: true, limit: '360' });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as Record<string, unknown>;
    const EI = 1.6e6 * 610.7734375; // lbf·in²
    const units = j.units as Record<string, string>;
    expect([units.EI, units.deflectionMax, units.momentMax, units['stresses[].maxTension']]).toEqual(['kip·in²', 'in', 'kip·ft', 'ksi']);
    expect(rel(j.EI as number, EI / 1000)).toBeLessThan(1e-12);
    expect(rel(j.deflectionMax as number, (1000 * 168 ** 3) / (48 * EI))).toBeLessThan(1e-12);
    // P L / 4 = 1000 lbf · 168 in / 4 = 42000 lbf·in = 3.5 kip·ft
    expect(rel(j.momentMax as number, 3.5)).toBeLessThan(1e-12);
    // plate stress n·M·c/I_tr = 18.125 · 42000 · 4.5 / 610.7734375 psi, in ksi
    const plate = (j.stresses as { material: string; maxTension: number }[]).find((s) => s.material.startsWith('plate'))!;
    expect(rel(plate.maxTension, (18.125 * 42_000 * 4.5) / 610.7734375 / 1000)).toBeLessThan(1e-12);
  });

  it('without a modulus a GeoJSON shape is refused with a message naming --E', () => {
    const r = run({ 'r.json': rectangle }, ['r.json'], { unit: 'mm', span: '6000', support: 'simple', point: '1kN' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/r\.json: the shape has no materials: give the modulus with --E/);
  });

  it('bad flags are named: an unknown support, an unknown force unit, a load outside the span', () => {
    const base = { unit: 'mm', span: '6000', E: '200000' };
    expect(run({ 'r.json': rectangle }, ['r.json'], { ...base, support: 'hinged' }).err).toMatch(/--support: expected simple, cantilever, fixed, propped, got "hinged"/);
    expect(run({ 'r.json': rectangle }, ['r.json'], { ...base, support: 'simple', point: '5tons' }).err).toMatch(/--point: unknown unit "tons"/);
    const outside = run({ 'r.json': rectangle }, ['r.json'], { ...base, support: 'simple', point: '5kN', at: '7000' });
    expect(outside.code).toBe(2);
    expect(outside.err).toMatch(/--at: 7000 is outside the span 0…6000/);
  });
});
