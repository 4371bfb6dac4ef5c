/**
 * The editor's stress view (renderer/app/stress/stress.ts): forces typed with units through the
 * panel's fields (core/units readQuantity, kept in SI), and the numbers it shows. Closed forms: flexure formula σ = M·c/I and axial σ = N/A (Gere & Timoshenko, Mechanics of
 * Materials, §5.5 and §1.2); kern of a circle, radius d/8 (common practice; Roark, kern of a solid
 * circle). Unit factors are exact by definition (1 ft = 12 in).
 */
import { describe, expect, it } from 'vitest';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { builtInMaterial, materialInSI } from '../../core/materials/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { computeStress, stressFields, stressUnits, toStressUnit, type StressKey } from '../../renderer/app/stress/stress.ts';
import { readField } from '../../renderer/app/shell/quantity-text.ts';
import type { StressInputs } from '../../core/document/types.ts';
import { emptyDoc } from './helpers.ts';

const common = { placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, operation: 'add', material: null, visible: true } as const;
const plate = (b: number, h: number): Part => ({ ...common, id: 'p', name: 'plate', type: 'rectangle', width: b, height: h });
const round = (d: number): Part => ({ ...common, id: 'c', name: 'round', type: 'circle', diameter: d });
const docOf = (part: Part, over: Partial<SectionDocument> = {}): SectionDocument => ({ ...emptyDoc(), parts: [part], ...over });
type Texts = Partial<Record<StressKey, string>>;
/** The texts typed into the panel's fields, read as each field reads them (SI); throws the field's refusal. */
function forces(doc: SectionDocument, f: Texts): StressInputs {
  const fields = stressFields(doc);
  const out: Record<StressKey, number> = { N: 0, Mx: 0, My: 0, Vx: 0, Vy: 0 };
  for (const [k, text] of Object.entries(f) as [StressKey, string][]) {
    const r = readField(text, fields[k]);
    if (!r.ok) throw new Error(r.message);
    out[k] = r.si;
  }
  return out;
}

function run(doc: SectionDocument, f: Texts) {
  const r = computeStress(doc, sectionFromDocument(doc).properties, forces(doc, f));
  if (!r.ok) throw new Error(r.message);
  return r.view;
}

describe('stress view: forces with units', () => {
  it('a 100 × 200 mm plate under Mx = 50 kN·m reads ±75 MPa however the moment is written', () => {
    // σ = M·c/I = 5e7 N·mm · 100 mm / (100·200³/12 mm⁴) = 75 N/mm² = 75 MPa (exact arithmetic).
    const doc = docOf(plate(100, 200));
    for (const Mx of ['50', '50 kN·m', '50kNm', '50 kN*m', '5e7 N·mm', '50000 N·m', '50000 kN·mm']) {
      const v = run(doc, { Mx });
      expect(toStressUnit(v.max, 'MPa')).toBeCloseTo(75, 9);
      expect(toStressUnit(v.min, 'MPa')).toBeCloseTo(-75, 9);
      expect(v.maxAt[1]).toBe(100);
    }
  });

  it('an inch document reads kip and kip·ft and shows ksi: a 4 × 10 in plate under 100 kip·ft gives 18 ksi', () => {
    // M = 1200 kip·in, c = 5 in, I = 4·10³/12 in⁴: σ = 1200·5·12/4000 = 18 ksi (exact arithmetic).
    const doc = docOf(plate(4, 10), { unit: 'in' });
    expect(stressUnits(doc)).toEqual({ force: 'kip', moment: 'kip·ft', stress: 'ksi' });
    const v = run(doc, { Mx: '100' });
    expect(toStressUnit(v.max, 'ksi')).toBeCloseTo(18, 9);
    expect(toStressUnit(run(doc, { Mx: '1200 kip·in' }).max, 'ksi')).toBeCloseTo(18, 9);
  });

  it('a force unit on a moment, or a word, is refused with the input named', () => {
    const doc = docOf(plate(100, 200));
    expect(() => forces(doc, { Mx: '50 kN' })).toThrow(/^Mx: "50 kN" is a force, not a moment/);
    expect(() => forces(doc, { N: 'ten' })).toThrow(/^N: "ten" is not a number/);
    expect(() => forces(doc, { N: '' })).toThrow(/^N: enter a value/);
    expect(() => forces(doc, { N: '3 furlongs' })).toThrow(/^N: unknown unit "furlongs"/);
  });

  it('a pure axial load gives σ = N/A everywhere and no neutral axis', () => {
    // N = −100 kN on 20,000 mm²: σ = −5 MPa (exact arithmetic).
    const v = run(docOf(plate(100, 200)), { N: '-100' });
    expect(toStressUnit(v.max, 'MPa')).toBeCloseTo(-5, 12);
    expect(toStressUnit(v.min, 'MPa')).toBeCloseTo(-5, 12);
    expect(v.axis.exists).toBe(false);
  });

  it('one material gives the same stresses as the geometric section (σ = E·ε with ε ∝ 1/E)', () => {
    const geometric = run(docOf(plate(100, 200)), { Mx: '50', My: '-10', N: '20' });
    const steel = run(docOf(plate(100, 200), { defaultMaterial: 'astm-a992' }), { Mx: '50', My: '-10', N: '20' });
    expect(steel.withMaterials).toBe(true);
    expect(steel.max / geometric.max).toBeCloseTo(1, 12);
    expect(steel.min / geometric.min).toBeCloseTo(1, 12);
  });

  it('the kern of a 100 mm round has every corner at d/8 = 12.5 mm from the centre', () => {
    const v = run(docOf(round(100)), { Mx: '1' });
    expect(v.kern.length).toBeGreaterThan(8);
    for (const [x, y] of v.kern) expect(Math.hypot(x, y)).toBeCloseTo(12.5, 9);
  });

  it('a steel plate on an aluminium plate under N alone: one strain, so the stresses of the parts stand as E_steel : E_aluminium', () => {
    // Uniform strain ε = N/EA in both (docs/methods.md §6): σ_i = E_i·ε, so σ_steel/σ_al = E_steel/E_al (identity).
    const steel = { ...common, id: 's', name: 'steel', type: 'rectangle', width: 100, height: 20, placement: { ...common.placement, y: 60 }, material: 'astm-a992' } as const;
    const alu = { ...common, id: 'a', name: 'alu', type: 'rectangle', width: 100, height: 100, material: 'al-6061-t6' } as const;
    const doc: SectionDocument = { ...emptyDoc(), parts: [steel, alu] };
    const v = run(doc, { N: '100' });
    const [s, a] = v.perPiece;
    const ratio = materialInSI(builtInMaterial('astm-a992')!).E / materialInSI(builtInMaterial('al-6061-t6')!).E;
    expect(s!.max / a!.max).toBeCloseTo(ratio, 9);
    expect(s!.min / s!.max).toBeCloseTo(1, 9);
  });
});
