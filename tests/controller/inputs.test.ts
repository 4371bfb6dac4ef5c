/**
 * Member and stress inputs as document data (issue 11 items 1–2): typed quantities read through
 * core/units, stored with the section in SI, and kept through document-unit switches, undo,
 * alternatives, saving and reopening and the recovery copy; a new document and the example start
 * from their own cases, carrying nothing over. Replays the issue's reproductions on the app
 * controller, without React.
 *
 * Hand values (exact arithmetic on the example's plates, parallel-axis theorem; Gere & Timoshenko,
 * Mechanics of Materials §12.5): the base girder is a 700 × 20 top flange at y = 410, two 12 × 800
 * webs at y = 0, a 520 × 25 bottom flange at y = −412.5 and a 12 × 120 stiffener at y = −340 (mm).
 * E = 29,000 ksi (AISC 360-16 §B4, common practice); 1 psi = 6894.757293168361 Pa (NIST SP 811
 * Appendix B.8, from the exact definitions of lbf and in). Simply supported beam under w:
 * δ = 5wL⁴/384EI (AISC Manual Table 3-23 case 1). Combined stress σ = N/A + M·(y − ȳ)/I
 * (Gere & Timoshenko §11.5).
 */
import { describe, expect, it } from 'vitest';
import { serialiseDocument } from '../../core/document/index.ts';
import type { SectionDocument } from '../../core/document/types.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { documentFromText } from '../../renderer/controller/files.ts';
import { RECOVERY_DELAY_MS } from '../../renderer/controller/controller.ts';
import { FIELD_RANGE, memberFields, memberOutcome, memberValue, readMemberField, withMemberValue, type MemberFieldKey } from '../../renderer/app/member/member-model.ts';
import { computeStress, stressFields, type StressKey } from '../../renderer/app/stress/stress.ts';
import { fieldText } from '../../renderer/app/shell/quantity-text.ts';
import { memberInputsOf, stressInputsOf } from '../../core/document/inputs.ts';
import { rig, settle, type Rig } from './fakes.ts';

const PSI = 6894.757293168361;
const KSI = 1000 * PSI;
const E = 29_000 * KSI;

/** The base girder by hand: [b, h, y] in mm. */
const PLATES: readonly [number, number, number][] = [[700, 20, 410], [12, 800, 0], [12, 800, 0], [520, 25, -412.5], [12, 120, -340]];
const A_MM2 = PLATES.reduce((s, [b, h]) => s + b * h, 0);
const CY = PLATES.reduce((s, [b, h, y]) => s + b * h * y, 0) / A_MM2;
const IX_MM4 = PLATES.reduce((s, [b, h, y]) => s + (b * h ** 3) / 12 + b * h * (y - CY) ** 2, 0);
const IX_M4 = IX_MM4 * 1e-12;

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

async function example(): Promise<Rig> {
  const r = rig();
  await r.c.openExample();
  return r;
}

const doc = (r: Rig): SectionDocument => r.c.editor.getState().doc;

/** Types `text` into a member box as the panel does: read, shown live, committed as one step. */
function typeMember(r: Rig, key: MemberFieldKey, text: string): void {
  const f = memberFields(doc(r).unit)[key];
  const read = readMemberField(text, f, FIELD_RANGE[key]);
  if (!read.ok) throw new Error(read.message);
  r.c.editor.liveDocument((d) => ({ ...d, member: withMemberValue(memberInputsOf(d), key, read.si) }));
  r.c.editor.commitLive(`Set ${f.label}`);
}

function typeStress(r: Rig, key: StressKey, text: string): void {
  const f = stressFields(doc(r))[key];
  const read = readMemberField(text, f);
  if (!read.ok) throw new Error(read.message);
  r.c.editor.liveDocument((d) => ({ ...d, stress: { ...stressInputsOf(d), [key]: read.si } }));
  r.c.editor.commitLive(`Set ${key}`);
}

function deflection(r: Rig): number {
  const d = doc(r);
  const o = memberOutcome(d, sectionFromDocument(d).properties !== null);
  if (o.kind !== 'done') throw new Error(o.message);
  return o.result.deflectionMax;
}

/** The example's case cleared to the issue's: no live load, no self-weight. */
async function issueCase(): Promise<Rig> {
  const r = await example();
  typeMember(r, 'liveW', '0');
  r.c.editor.liveDocument((d) => ({ ...d, member: { ...memberInputsOf(d), selfWeight: false } }));
  r.c.editor.commitLive('Leave out self-weight');
  typeMember(r, 'span', '12000');
  typeMember(r, 'deadW', '15');
  return r;
}

describe('issue 11: member inputs keep their meaning through a document-unit switch', () => {
  it('the hand values: Ix of the base girder and δ = 5wL⁴/384EI = 3.517 mm for L = 12 m, w = 15 kN/m', () => {
    expect(A_MM2).toBe(47_640);
    const delta = (5 * 15_000 * 12 ** 4) / (384 * E * IX_M4);
    expect(delta * 1000).toBeCloseTo(3.517, 3);
  });

  it('L = 12000 mm and w = 15 kN/m give δ = 3.517 mm; after switching to in, L reads 472.441 in, w 1.02783 kip/ft and δ is the same', async () => {
    const r = await issueCase();
    const want = (5 * 15_000 * 12 ** 4) / (384 * E * IX_M4);
    expect(rel(deflection(r), want)).toBeLessThan(1e-9);
    r.c.changeUnit('in');
    const m = memberInputsOf(doc(r));
    expect(m.span).toBe(12);
    expect(m.dead.uniform).toBe(15_000);
    const f = memberFields('in');
    // 12 m / 0.0254 m = 472.44094… in; 15 kN/m × 0.3048 m/ft / 4448.2216152605 N/kip = 1.0278265 kip/ft (exact factors).
    expect(f.span.unit).toBe('in');
    expect(fieldText(memberValue(m, 'span') ?? NaN, f.span)).toBe('472.441');
    expect(f.deadW.unit).toBe('kip/ft');
    expect(fieldText(memberValue(m, 'deadW') ?? NaN, f.deadW)).toBe('1.02783');
    expect(rel(deflection(r), want)).toBeLessThan(1e-9);
  });

  it('the stress panel: N = −500 kN, Mx = 1500 kN·m keep their physical value after the switch, σmax = 99.52 MPa = 14.43 ksi', async () => {
    const r = await example();
    typeStress(r, 'N', '-500');
    typeStress(r, 'Mx', '1500');
    r.c.changeUnit('in');
    const d = doc(r);
    expect(stressInputsOf(d)).toEqual({ N: -500_000, Mx: 1_500_000, My: 0, Vx: 0, Vy: 0 });
    const f = stressFields(d);
    expect([f.N.unit, f.Mx.unit]).toEqual(['kip', 'kip·ft']);
    // −500 kN / 4.4482216152605 kN/kip = −112.404 kip; 1500 kN·m / (4.4482216152605 kN × 0.3048 m) = 1106.34 kip·ft.
    expect(fieldText(stressInputsOf(d).N, f.N)).toBe('-112.404');
    expect(fieldText(stressInputsOf(d).Mx, f.Mx)).toBe('1106.34');
    const s = computeStress(d, sectionFromDocument(d).properties);
    if (!s.ok) throw new Error(s.message);
    // Top fibre at y = 420 mm: σ = N/A + M·(420 − ȳ)/Ix.
    const sigma = -500_000 / (A_MM2 * 1e-6) + (1_500_000 * (420 - CY) * 1e-3) / IX_M4;
    expect(sigma / 1e6).toBeCloseTo(99.52, 2);
    expect(sigma / KSI).toBeCloseTo(14.43, 2);
    expect(rel(s.view.max, sigma)).toBeLessThan(1e-9);
    expect(s.view.unit).toBe('ksi');
    expect(s.view.labels.max).toBe('14.43 ksi');
  });

  it('undo takes back the unit switch and then each typed input, one step each', async () => {
    const r = await issueCase();
    r.c.changeUnit('in');
    r.c.editor.undo();
    expect(doc(r).unit).toBe('mm');
    expect(memberInputsOf(doc(r)).span).toBe(12);
    r.c.editor.undo(); // w
    expect(memberInputsOf(doc(r)).dead.uniform).toBe(6000); // the example's own superimposed dead load
    r.c.editor.undo(); // L
    expect(memberInputsOf(doc(r)).span).toBe(24);
    r.c.editor.redo();
    expect(memberInputsOf(doc(r)).span).toBe(12);
  });

  it('a cancelled edit (Escape) puts the stored value back and leaves no undo step', async () => {
    const r = await example();
    const before = r.c.editor.getState().canUndo;
    r.c.editor.liveDocument((d) => ({ ...d, member: withMemberValue(memberInputsOf(d), 'span', 3) }));
    expect(memberInputsOf(doc(r)).span).toBe(3);
    r.c.editor.cancelLive();
    expect(memberInputsOf(doc(r)).span).toBe(24);
    expect(r.c.editor.getState().canUndo).toBe(before);
  });

  it('saving and reopening keeps every input as a physical value, in whichever unit the file is', async () => {
    const r = await issueCase();
    typeStress(r, 'My', '-20 kip·ft');
    r.c.changeUnit('ft');
    const text = serialiseDocument(r.c.editor.getState().sectionFile);
    const back = documentFromText(text, 'x.section.json', 'mm');
    if (!back.ok) throw new Error(back.errors.join('; '));
    expect(back.doc.unit).toBe('ft');
    expect(back.doc.member).toEqual(doc(r).member);
    // 20 kip·ft = 20 × 4448.2216152605 N × 0.3048 m (exact factors).
    expect(rel(-(back.doc.stress?.My ?? 0), 20 * 4448.2216152605 * 0.3048)).toBeLessThan(1e-15);
  });

  it('the recovery copy carries the inputs', async () => {
    const r = await issueCase();
    r.timers.advance(RECOVERY_DELAY_MS);
    await settle();
    const back = documentFromText(r.host.recovery ?? '', 'recovered', 'mm');
    if (!back.ok) throw new Error(back.errors.join('; '));
    expect(back.doc.member?.span).toBe(12);
    expect(back.doc.member?.dead.uniform).toBe(15_000);
  });

  it('each alternative keeps its own case; a new alternative starts from the active one\'s', async () => {
    const r = await issueCase();
    const sections = r.c.editor.getState().sectionFile.sections;
    const other = sections[1]!.id;
    r.c.editor.switchSection(other);
    expect(memberInputsOf(doc(r)).span).toBe(24); // the example's case for that alternative
    typeMember(r, 'span', '30 m');
    r.c.editor.switchSection(sections[0]!.id);
    expect(memberInputsOf(doc(r)).span).toBe(12);
    r.c.editor.addSection();
    expect(memberInputsOf(doc(r)).span).toBe(12);
    expect(doc(r).parts).toHaveLength(0);
  });

  it('File → New starts from the defaults and the example from its own case: nothing carries over', async () => {
    const r = await issueCase();
    typeStress(r, 'N', '-500');
    r.host.discardAnswer = true;
    await r.c.newDocument();
    expect(doc(r).member).toBeUndefined();
    expect(doc(r).stress).toBeUndefined();
    // Defaults: a 6 m span in a mm document, no load, L/240 total and L/360 live (IBC Table 1604.3, common practice).
    expect(memberInputsOf(doc(r))).toEqual({ span: 6, support: 'simple', dead: { uniform: 0, points: [] }, live: { uniform: 0, points: [] }, selfWeight: false, totalLimit: 240, liveLimit: 360, stressFactor: 1 });
    expect(stressInputsOf(doc(r))).toEqual({ N: 0, Mx: 0, My: 0, Vx: 0, Vy: 0 });
    typeMember(r, 'span', '7 m');
    await r.c.openExample();
    expect(memberInputsOf(doc(r)).span).toBe(24);
    expect(stressInputsOf(doc(r)).N).toBe(0);
  });

  it('a section on the default case keeps its span when the unit changes (the default is written in first)', async () => {
    const r = rig();
    r.c.editor.addRectangle({ x: 0, y: 0, width: 100, height: 200 });
    expect(doc(r).member).toBeUndefined();
    r.c.changeUnit('in');
    expect(memberInputsOf(doc(r)).span).toBe(6); // 6 m, shown as 236.22 in, not the inch default of 20 ft
  });
});

describe('issue 11: every member box goes through readQuantity and refuses nonsense by name', () => {
  const f = memberFields('mm');
  it('reads a bare number in the unit shown, or any unit typed', () => {
    expect(readMemberField('12000', f.span, 'positive')).toEqual({ ok: true, si: 12 });
    // 39'-4 1/2" = 472.5 in = 12.0015 m (exact: 1 in = 0.0254 m).
    const feet = readMemberField(`39'-4 1/2"`, f.span, 'positive');
    expect(feet.ok && rel(feet.si, 472.5 * 0.0254)).toBeLessThan(1e-15);
    const kip = readMemberField('2 kip/ft', f.deadW);
    expect(kip.ok && rel(kip.si, (2 * 4448.2216152605) / 0.3048)).toBeLessThan(1e-15);
    expect(readMemberField('L/360', f.liveLimit, 'positive')).toEqual({ ok: true, si: 360 });
  });

  it('refuses a force in a length box, an unknown unit, an empty box and a zero span, naming the box and the text', () => {
    const force = readMemberField('15 kN', f.span, 'positive');
    expect(!force.ok && force.message).toMatch(/^span L: "15 kN" is a force, not a length/);
    const unknown = readMemberField('3 furlongs', f.deadW);
    expect(!unknown.ok && unknown.message).toMatch(/^uniform load w \(dead and other\): unknown unit "furlongs" in "3 furlongs"/);
    const empty = readMemberField('  ', f.span, 'positive');
    expect(!empty.ok && empty.message).toMatch(/^span L: enter a value/);
    const zero = readMemberField('0', f.span, 'positive');
    expect(!zero.ok && zero.message).toBe('span L: "0" must be more than zero');
    const before = readMemberField('-1 m', f.deadA, 'non-negative');
    expect(!before.ok && before.message).toMatch(/^position a of P: "-1 m" is before the left end/);
  });
});
