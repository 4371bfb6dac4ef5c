/**
 * Joints in the editor (issue "holes, joints and shear"): cut-out roles, separate pieces and
 * overlaps, the joints list and the kind editor, and the shear flow each joint carries with
 * what it asks of welds and fasteners. Driven through the app controller and the editor model
 * (no React), with the view logic of renderer/app/joints/joints-model.ts.
 *
 * References, named at each check:
 * - thin-walled monosymmetric I (common practice; e.g. AISC Design Guide 9): shear centre
 *   h·I_bot/(I_top + I_bot) below the top flange's centre, Cw = h²·I_top·I_bot/(I_top + I_bot);
 * - rectangles b·h³/12 + A·d² (parallel-axis theorem; Gere & Timoshenko, Mechanics of Materials);
 * - q = V·Q/I with Q = Af·(d − tf)/2 for a welded I's flange-to-web joint (Gere & Timoshenko);
 * - AISC 360-22 §J2.4: Rn = 0.60·FEXX·(0.707·w) per unit length of fillet, φ = 0.75, Ω = 2.00;
 *   Table J2.4 minimum fillet leg (from memory): over 6 mm to 13 mm thick → 5 mm;
 * - fastener pitch s = n·R/q (common practice: the flow one fastener row spacing carries).
 */
import { describe, expect, it } from 'vitest';
import { parseDocument, serialiseDocument } from '../../core/document/index.ts';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { regionFromDocument, sectionFromDocument } from '../../core/section/index.ts';
import { torsionConstants } from '../../core/torsion/index.ts';
import { buildAssembly, defaultTexts, assemblySpec, placeAssemblyStep } from '../../renderer/app/parts/assembly-model.ts';
import {
  cutoutRows, jointDesign, jointKey, jointsOverview, operationToggled, readShears, setCutoutRole, setJointKind, shearFlowDiagram, shearUnits, thicknessAtJoint, type ShearTexts,
} from '../../renderer/app/joints/joints-model.ts';
import { rig, settle } from './fakes.ts';
import type { Editor } from '../../renderer/editor/editor.ts';
import { withMaterialStored } from '../../renderer/app/materials/material-form.ts';
import { torsionOfDocument } from '../../renderer/app/joints/joint-torsion.ts';

const rel = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);

function place(editor: Editor, id: Parameters<typeof assemblySpec>[0], texts: Record<string, string>): string[] {
  const spec = assemblySpec(id);
  const built = buildAssembly(id, { ...defaultTexts(spec, 'mm'), ...texts }, 'mm');
  expect([built.fieldErrors, built.errors]).toEqual([{}, []]);
  return placeAssemblyStep(editor, `Place ${id}`, built.pieces, {});
}

/** A new millimetre document with the plate girder of the issue: web 1200 × 12, top 400 × 25, bottom 500 × 30. */
async function girderRig() {
  const r = rig();
  await r.c.start();
  r.c.editor.replaceDocument('clear', (d) => ({ ...d, parts: [], unit: 'mm' }));
  place(r.c.editor, 'plate-girder', { webH: '1200', webT: '12', topB: '400', topT: '25', bottomB: '500', bottomT: '30', x: '0', y: '0' });
  return r;
}

describe('cut-out roles in the editor (gross and net)', () => {
  it('the bolt-hole assembly places fastener holes; the section the torsion solver gets is the girder without holes, so ys and Cw stay (closed form, thin-walled monosymmetric I)', async () => {
    const r = await girderRig();
    const plain = r.c.editor.getState().doc;
    const plainResults = r.c.results(plain);
    place(r.c.editor, 'bolt-holes', { holeD: '22', axis: 'y', depth: '30', rows: '1', columns: '2', gauge: '140', x: '0', y: '-615' });
    const doc = r.c.editor.getState().doc;
    const rows = cutoutRows(doc);
    expect(rows.map((c) => c.role)).toEqual(['fastener-hole', 'fastener-hole']);
    // Gross properties unchanged; net properties present: An = 14 400 + 10 000 + 15 000 − 2 × 22 × 30 (exact arithmetic).
    const results = r.c.results(doc);
    expect(results.properties).toEqual(plainResults.properties);
    expect(results.fastenerHoles).toBe(2);
    expect(results.net?.area).toBeCloseTo(38_080, 6);
    // What the background torsion solves (renderer/controller/torsion.worker.ts composes the gross region).
    const gross = regionFromDocument(doc);
    expect(gross.region.length).toBe(1);
    const t = torsionConstants(gross.region);
    const h = 1227.5, It = (25 * 400 ** 3) / 12, Ib = (30 * 500 ** 3) / 12;
    // The girder's origin is the middle of its web: the top flange's centre is at 600 + 12.5.
    const ys = 612.5 - (h * Ib) / (It + Ib);
    expect(ys).toBeCloseTo(-247.9, 1);
    expect(Math.abs(t.ys - ys)).toBeLessThan(0.005 * h);
    expect(rel(t.Cw, (h * h * It * Ib) / (It + Ib))).toBeLessThan(0.005);
    expect(t.Cw / 1e9).toBeGreaterThan(140_000);
  }, 60_000);

  it('changing a hole to a void is one undo step, cuts the flange (three pieces), and survives save and reopen', async () => {
    const r = await girderRig();
    place(r.c.editor, 'bolt-holes', { holeD: '22', axis: 'y', depth: '30', rows: '1', columns: '2', gauge: '140', x: '0', y: '-615' });
    const ids = cutoutRows(r.c.editor.getState().doc).map((c) => c.id);
    for (const id of ids) setCutoutRole(r.c.editor, id, 'void');
    const doc = r.c.editor.getState().doc;
    expect(cutoutRows(doc).map((c) => c.role)).toEqual(['void', 'void']);
    expect(regionFromDocument(doc).region.length).toBe(3);
    expect(sectionFromDocument(doc).netProperties).toBeNull();
    expect(jointsOverview(doc).piecesNote).toMatch(/3 separate pieces/);
    r.c.editor.undo();
    expect(cutoutRows(r.c.editor.getState().doc).map((c) => c.role)).toEqual(['void', 'fastener-hole']);
    const reopened = parseDocument(serialiseDocument(r.c.editor.getState().sectionFile), 'girder.section.json');
    expect(reopened.ok).toBe(true);
    if (reopened.ok) expect(reopened.file.sections[0]?.parts.filter((p) => p.operation === 'subtract').map((p) => p.cutoutRole)).toEqual(['void', 'fastener-hole']);
  });

  it('a cut-out with a role made solid drops the role (the file stays valid: a role belongs to a cut-out)', () => {
    const hole: Part = { id: 'h', name: 'hole', type: 'rectangle', width: 22, height: 30, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, operation: 'subtract', cutoutRole: 'fastener-hole', material: null, visible: true };
    const solid = operationToggled(hole);
    expect(solid.operation).toBe('add');
    expect('cutoutRole' in solid).toBe(false);
    expect(operationToggled(solid)).toMatchObject({ operation: 'subtract' });
  });
});

/** A document of plates (b × h centred at x, y), steel unless `material` says otherwise. */
function plates(list: readonly { name: string; b: number; h: number; x: number; y: number; material?: string }[]): SectionDocument {
  const r = rig();
  const base = withMaterialStored(withMaterialStored(r.c.editor.getState().doc, 'astm-a36'), 'df-l-no2');
  return {
    ...base, unit: 'mm', defaultMaterial: 'astm-a36',
    parts: list.map((p, i) => ({ id: `p${i + 1}`, name: p.name, type: 'rectangle', width: p.b, height: p.h, placement: { x: p.x, y: p.y, rotationDeg: 0, mirror: false }, operation: 'add', material: p.material ?? null, visible: true })),
  };
}

describe('separate pieces and overlaps', () => {
  it('a duplicate part exactly on top of its original: a warning names both and the overlapping area (100 × 20 = 2000 mm², exact)', () => {
    const doc = plates([{ name: 'cover plate', b: 100, h: 20, x: 0, y: 0 }, { name: 'cover plate copy', b: 100, h: 20, x: 0, y: 0 }]);
    const o = jointsOverview(doc);
    expect(o.overlaps.map((x) => [x.labels, x.area])).toEqual([[['cover plate', 'cover plate copy'], 2000]]);
    expect(o.overlapNotes[0]).toMatch(/"cover plate" and "cover plate copy" overlap by 2000 mm²/);
  });

  it('two plates apart: two pieces, with why torsion is a sum and there is no shared shear centre', () => {
    const o = jointsOverview(plates([{ name: 'left', b: 10, h: 100, x: -50, y: 0 }, { name: 'right', b: 10, h: 100, x: 50, y: 0 }]));
    expect(o.groups).toHaveLength(2);
    expect(o.piecesNote).toMatch(/2 separate pieces/);
    expect(o.piecesNote).toMatch(/no shared shear centre/);
  });

  it('two C15X50 toe to toe are not silently one welded box: their joint shows, at the two toes, welded only by default', async () => {
    const r = rig();
    await r.c.start();
    r.c.editor.replaceDocument('clear', (d) => ({ ...d, parts: [] }));
    r.c.changeUnit('in');
    const spec = assemblySpec('box-from-channels');
    const built = buildAssembly('box-from-channels', { ...defaultTexts(spec, 'in'), shape: 'C15X50', arrangement: 'toe-to-toe', gap: '0', x: '0', y: '0' }, 'in');
    expect([built.fieldErrors, built.errors]).toEqual([{}, []]);
    placeAssemblyStep(r.c.editor, 'box', built.pieces, {});
    const o = jointsOverview(r.c.editor.getState().doc);
    expect(o.joints).toHaveLength(1);
    const j = o.joints[0];
    expect(j?.labels).toEqual(['left channel', 'right channel']);
    // Two toes, each a vertical contact on the line x = 0 (the channels meet there, gap 0).
    expect(j?.segments).toHaveLength(2);
    for (const s of j?.segments ?? []) {
      expect(Math.abs(s.x0)).toBeLessThan(1e-9);
      expect(Math.abs(s.x1)).toBeLessThan(1e-9);
    }
    expect(j?.isDefault).toBe(true);
    expect(o.defaultNotes[0]).toMatch(/by default/);
  });
});

describe('joint kinds are stored in the document', () => {
  it('defaults: welded between two steel plates, not connected between timber and steel; a chosen kind is one undo step and survives save and reopen', async () => {
    const r = rig();
    await r.c.start();
    const doc = plates([
      { name: 'web', b: 10, h: 300, x: 0, y: 0 },
      { name: 'flange', b: 200, h: 20, x: 0, y: 160 },
      { name: 'nailer', b: 89, h: 38, x: 0, y: 189, material: 'df-l-no2' },
    ]);
    r.c.editor.replaceDocument('plates', () => doc);
    let o = jointsOverview(r.c.editor.getState().doc);
    expect(o.joints.map((j) => [j.labels.join(' | '), j.kind.type, j.isDefault])).toEqual([
      ['web | flange', 'welded', true],
      ['flange | nailer', 'not-connected', true],
    ]);
    const nailer = o.joints[1];
    if (!nailer) throw new Error('no joint');
    setJointKind(r.c.editor, nailer.partIds, { type: 'fastened', fastener: 'screw', rows: 2 });
    o = jointsOverview(r.c.editor.getState().doc);
    expect(o.joints[1]?.kind).toEqual({ type: 'fastened', fastener: 'screw', rows: 2 });
    expect(r.c.editor.getState().doc.joints).toEqual([{ parts: ['p2', 'p3'], kind: { type: 'fastened', fastener: 'screw', rows: 2 } }]);
    const text = serialiseDocument(r.c.editor.getState().sectionFile);
    r.c.editor.undo();
    expect(jointsOverview(r.c.editor.getState().doc).joints[1]?.isDefault).toBe(true);
    const reopened = parseDocument(text, "plates.section.json");
    expect(reopened.ok && reopened.file.sections[0]?.joints).toEqual([{ parts: ['p2', 'p3'], kind: { type: 'fastened', fastener: 'screw', rows: 2 } }]);
    // Back to the default removes the entry.
    r.c.editor.redo();
    setJointKind(r.c.editor, nailer.partIds, null);
    expect(r.c.editor.getState().doc.joints ?? []).toEqual([]);
    expect(jointKey(['b', 'a'])).toBe(jointKey(['a', 'b']));
    await settle();
  });
});

describe('shear flow and what each joint asks of its welds or fasteners', () => {
  // Welded I of plates: web 300 × 10, flanges 200 × 20 (d = 340 mm, tf = 20 mm).
  const doc = plates([
    { name: 'web', b: 10, h: 300, x: 0, y: 0 },
    { name: 'top flange', b: 200, h: 20, x: 0, y: 160 },
    { name: 'bottom flange', b: 200, h: 20, x: 0, y: -160 },
  ]);
  const Ix = (10 * 300 ** 3) / 12 + 2 * ((200 * 20 ** 3) / 12 + 200 * 20 * 160 ** 2); // mm⁴, parallel-axis
  const Q = 200 * 20 * (340 - 20) / 2; // Af·(d − tf)/2, mm³
  const units = shearUnits('mm');
  const texts = (t: Partial<ShearTexts> = {}): ShearTexts => ({
    Vy: { text: '100 kN', unit: units.force }, Vx: { text: '', unit: units.force }, fexx: { text: '490 MPa', unit: units.stress }, capacity: { text: '', unit: units.force }, method: 'LRFD', ...t,
  });

  it('flange-to-web q = V·Af·(d − tf)/2/Ix, shown in N/mm; the fillet leg by AISC 360-22 §J2.4 for LRFD and ASD; the Table J2.4 minimum for the 10 mm web', () => {
    const d = jointDesign(doc, texts());
    expect(d.errors).toEqual({});
    const top = d.rows.find((x) => x.joint.labels.includes('top flange'));
    if (!top) throw new Error('no top joint');
    const q = (100_000 * Q) / Ix; // N/mm
    expect(q).toBeCloseTo(281.24, 2); // 100 000 · 640 000 / 227 566 667
    expect(rel(Math.abs(top.qShown), q)).toBeLessThan(1e-9);
    // Hand calculation, two fillet lines: w = q / (2 · 0.75 · 0.60 · 0.707 · 490 MPa) = 281.24 / 311.787 = 0.902 mm.
    const lrfd = q / (2 * 0.75 * 0.6 * 0.707 * 490);
    expect(lrfd).toBeCloseTo(0.902, 3);
    expect(rel(top.weld?.requiredShown ?? 0, lrfd)).toBeLessThan(1e-9);
    expect(top.weld?.thinnerShown).toBeCloseTo(10, 9); // the web is the thinner part joined
    expect(top.weld?.minimumShown).toBeCloseTo(5, 12); // Table J2.4: over 6 to 13 mm → 5 mm (from memory)
    const asd = jointDesign(doc, texts({ method: 'ASD' })).rows.find((x) => x.joint.labels.includes('top flange'));
    // ASD: w = 2.00 · q / (2 · 0.60 · 0.707 · 490) = 562.47 / 415.716 = 1.353 mm (q here taken as the service shear).
    expect(rel(asd?.weld?.requiredShown ?? 0, (2 * q) / (2 * 0.6 * 0.707 * 490))).toBeLessThan(1e-9);
    // Intermittent at the governing leg (5 mm): segments of max(4·5, 38) = 38 mm at pitch 38 · (2·0.75·0.6·0.707·490·5) / q.
    expect(top.weld?.segmentShown).toBeCloseTo(38, 9);
    expect(rel(top.weld?.pitchShown ?? 0, (38 * 2 * 0.75 * 0.6 * 0.707 * 490 * 5) / q)).toBeLessThan(1e-9);
    expect(d.note).toMatch(/your inputs or the cited clauses/);
    expect(d.note).toMatch(/local code governs/);
  });

  it('fasteners: the largest pitch s = n·R/q for a capacity typed by the user, and a given pitch checked against it', () => {
    const fastened: SectionDocument = { ...doc, joints: [{ parts: ['p1', 'p2'], kind: { type: 'fastened', fastener: 'bolt', rows: 2, pitch: 100 } }] };
    const d = jointDesign(fastened, texts({ capacity: { text: '20 kN', unit: units.force } }));
    const top = d.rows.find((x) => x.joint.labels.includes('top flange'));
    const q = (100_000 * Q) / Ix;
    expect(rel(top?.fastener?.largestPitchShown ?? 0, (2 * 20_000) / q)).toBeLessThan(1e-9); // 142.2 mm
    expect(top?.fastener?.pitchOk).toBe(true); // 100 mm ≤ 142.2 mm
    const wide: SectionDocument = { ...doc, joints: [{ parts: ['p1', 'p2'], kind: { type: 'fastened', fastener: 'bolt', rows: 2, pitch: 150 } }] };
    expect(jointDesign(wide, texts({ capacity: { text: '20 kN', unit: units.force } })).rows.find((x) => x.joint.labels.includes('top flange'))?.fastener?.pitchOk).toBe(false);
  });

  it('bad input names the field and the text; a bare number keeps the unit it was typed in when the document unit changes', () => {
    const bad = jointDesign(doc, texts({ Vy: { text: 'lots', unit: units.force } }));
    expect(bad.errors.Vy).toMatch(/^Vy.*"lots"/);
    expect(bad.rows.every((x) => x.qShown === 0 || Number.isNaN(x.qShown))).toBe(true);
    // "100" typed while the document was in mm means 100 kN; the same text in an inch document stays 100 kN.
    const inch: SectionDocument = { ...doc, unit: 'in', parts: doc.parts.map((p) => (p.type === 'rectangle' ? { ...p, width: p.width / 25.4, height: p.height / 25.4, placement: { ...p.placement, x: p.placement.x / 25.4, y: p.placement.y / 25.4 } } : p)) };
    const a = jointDesign(doc, texts({ Vy: { text: '100', unit: 'kN' } })).rows[0];
    const b = jointDesign(inch, texts({ Vy: { text: '100', unit: 'kN' } })).rows[0];
    expect(rel(b?.qSI ?? 0, a?.qSI ?? 1)).toBeLessThan(1e-9);
  });

  it('thickness at a joint is the thinner part measured across and along the contact: 10 mm web against a 20 mm flange', () => {
    const o = jointsOverview(doc);
    const j = o.joints[0];
    if (!j) throw new Error('no joint');
    expect(thicknessAtJoint(o, j)).toBeCloseTo(10, 9);
  });

  it('shear-flow diagram on thin plates: the web carries V·Q_NA/I at the neutral axis, a flange 0 at its tip and V·tf·(b − tw)/2·(d − tf)/2/I beside the web (Gere & Timoshenko)', () => {
    const loads = readShears(texts());
    expect(loads).toEqual({ Vy: 100_000, Vx: 0 });
    const d = shearFlowDiagram(doc, loads ?? { Vy: 0, Vx: 0 });
    expect(d.walls.map((w) => w.label).sort()).toEqual(['bottom flange', 'top flange', 'web']);
    const web = d.walls.find((w) => w.label === 'web');
    const mid = web?.stations[web.stations.length >> 1];
    // Q at the neutral axis: flange 640 000 + web half 10 · 150² / 2 = 752 500 mm³.
    expect(Math.abs(mid?.y ?? 1)).toBeLessThan(1e-6);
    expect(rel(Math.abs(mid?.q ?? 0), (100_000 * 752_500) / Ix)).toBeLessThan(1e-9);
    const flange = d.walls.find((w) => w.label === 'top flange');
    const tip = flange?.stations[0];
    expect(Math.abs(tip?.q ?? 1)).toBeLessThan(1e-6 * (mid?.q ?? 1));
    // Inside the web's contact the flow leaves the flange: no value is drawn there.
    expect(flange?.stations.some((st) => Number.isNaN(st.q))).toBe(true);
    const beside = flange?.stations.filter((st) => !Number.isNaN(st.q) && st.x < 0).at(-1);
    const at = -(beside?.x ?? 0); // distance from the web's centre line
    expect(rel(Math.abs(beside?.q ?? 0), (100_000 * 20 * (100 - at) * 160) / Ix)).toBeLessThan(1e-9);
    expect(rel(d.qMax, (100_000 * 752_500) / Ix)).toBeLessThan(1e-9);
  });

  it('a closed box is not drawn: its plates need a closed-cell analysis, and the diagram says so', () => {
    const box = plates([
      { name: 'top', b: 200, h: 10, x: 0, y: 105 },
      { name: 'bottom', b: 200, h: 10, x: 0, y: -105 },
      { name: 'left web', b: 10, h: 200, x: -95, y: 0 },
      { name: 'right web', b: 10, h: 200, x: 95, y: 0 },
    ]);
    const d = shearFlowDiagram(box, { Vy: 100_000, Vx: 0 });
    expect(d.walls).toEqual([]);
    expect(d.notes.join(' ')).toMatch(/closed cell/);
  });
});

/** Saint-Venant J of a t × b rectangle (t ≤ b): (t³·b/3)·[1 − (192·t/(π⁵·b))·Σ_{n odd} tanh(nπb/2t)/n⁵] (Timoshenko & Goodier, Theory of Elasticity, torsion of a rectangular bar). */
function rectangleJ(t: number, b: number): number {
  let sum = 0;
  for (let n = 1; n < 200; n += 2) sum += Math.tanh((n * Math.PI * b) / (2 * t)) / n ** 5;
  return ((t ** 3 * b) / 3) * (1 - ((192 * t) / (Math.PI ** 5 * b)) * sum);
}

describe('not connected means separate: the torsion the editor solves', () => {
  const pair = plates([{ name: 'left ply', b: 10, h: 100, x: -5, y: 0 }, { name: 'right ply', b: 10, h: 100, x: 5, y: 0 }]);
  it('two 10 × 100 plates side by side, welded (the default between steel parts): one 20 × 100 bar', () => {
    const r = torsionOfDocument(pair);
    expect(r.components).toBe(1);
    expect(rel(r.J, rectangleJ(20, 100))).toBeLessThan(0.01);
  });

  it('the same plates with their joint not connected: J is the sum of the two plates\' J, two pieces, no shared shear centre', () => {
    const loose: SectionDocument = { ...pair, joints: [{ parts: ['p1', 'p2'], kind: { type: 'not-connected' } }] };
    const r = torsionOfDocument(loose);
    expect(r.components).toBe(2);
    expect(rel(r.J, 2 * rectangleJ(10, 100))).toBeLessThan(0.01);
  });
});
