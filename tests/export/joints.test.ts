// Joints in the exports (core/export/joints.ts, the CSV block, the SVG markers and list, the
// report tables). References: the shear formula and shear flow (Gere & Timoshenko, Mechanics of
// Materials) by hand, as in tests/joints; unit factors exact (NIST SP 811: 1 in = 0.0254 m,
// 1 lbf = 4.4482216152605 N); AISC 360-22 §J2.4 weld sizes by the hand formula in tests/joints.
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { jointsCsv, jointsExport } from '../../core/export/joints.ts';
import { sectionSvg } from '../../core/export/svg.ts';
import { reportHtml } from '../../core/report/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { findAll, parseXml } from './xml.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material: null, visible: true, placement: at(x, y), width, height,
});
const doc = (unit: 'mm' | 'in', parts: readonly Part[]): SectionDocument => ({ ...newDocument(unit, 'welded I'), parts });
const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

// Welded I, flanges 300 × 20, web 10 × 560 mm; V = 500 kN.
const girder = doc('mm', [rect('top', 300, 20, 0, 290), rect('web', 10, 560, 0, 0), rect('bottom', 300, 20, 0, -290)]);
const Ix = (10 * 560 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 6000 * 290 ** 2);
const q = (500_000 * 6000 * 290) / Ix; // N/mm
const tauWeb = (500_000 * (6000 * 290 + (10 * 280 ** 2) / 2)) / (Ix * 10); // MPa
const legLrfd = q / (2 * 0.75 * 0.6 * 0.707 * (70 * 6.894757293168361)); // mm, E70, both sides

describe('jointsExport: one set of numbers in output units', () => {
  it('metric: q in N/mm, τ in MPa, the fillet leg in mm, V in kN', () => {
    const x = jointsExport({ doc: girder, loads: { Vy: 500_000, Vx: 0 } });
    expect(x?.units).toEqual({ length: 'mm', force: 'kN', q: 'N/mm', weld: 'mm', stress: 'MPa', stiffness: 'kN·m²' });
    expect(x?.shear?.Vy).toBeCloseTo(500, 12);
    expect(rel(Math.abs(x?.joints[0]?.shear?.q ?? 0), q)).toBeLessThan(1e-9);
    expect(rel(x?.joints[0]?.shear?.fillet?.requiredLeg ?? 0, legLrfd)).toBeLessThan(1e-9);
    expect(x?.joints[0]?.shear?.fillet?.minimum?.leg).toBe(5); // Table J2.4: thinner part 10 mm → 5 mm
    // 2.45 mm by strength is less than the 5 mm minimum: the minimum governs, and the text says so.
    expect(legLrfd).toBeLessThan(5);
    expect(x?.joints[0]?.shear?.needs).toContain('Table J2.4 minimum 5 mm; the Table J2.4 minimum governs');
    expect(rel(x?.shear?.parts.find((p) => p.part === 'web')?.tauMax ?? 0, tauWeb)).toBeLessThan(1e-9);
    expect(x?.notes.join(' ')).toContain('the local code governs');
  });

  it('the same girder drawn in inches: q in kip/in and τ in ksi, converted exactly', () => {
    const k = 1 / 25.4;
    const inch = doc('in', [rect('top', 300 * k, 20 * k, 0, 290 * k), rect('web', 10 * k, 560 * k, 0, 0), rect('bottom', 300 * k, 20 * k, 0, -290 * k)]);
    const x = jointsExport({ doc: inch, loads: { Vy: 500_000, Vx: 0 } });
    expect([x?.units.q, x?.units.stress, x?.units.force, x?.units.weld]).toEqual(['kip/in', 'ksi', 'kip', 'in']);
    // N/mm → kip/in: × 25.4 / 4448.2216152605; MPa → ksi: / 6.894757293168361.
    expect(rel(Math.abs(x?.joints[0]?.shear?.q ?? 0), (q * 25.4) / 4448.2216152605)).toBeLessThan(1e-9);
    expect(rel(x?.shear?.parts.find((p) => p.part === 'web')?.tauMax ?? 0, tauWeb / 6.894757293168361)).toBeLessThan(1e-9);
    expect(rel(x?.shear?.Vy ?? 0, 500_000 / 4448.2216152605)).toBeLessThan(1e-12);
  });
});

describe('CSV, SVG and report carry the joints', () => {
  const x = jointsExport({ doc: girder, loads: { Vy: 500_000, Vx: 0 } });
  if (x === null) throw new Error('no joints export');

  it('CSV: a joints table with units in the headers, τmax per part, the note; numbers at full precision', () => {
    const csv = jointsCsv(x);
    const lines = csv.split('\r\n');
    const header = lines.find((l) => l.startsWith('joint,'));
    expect(header).toContain('q [N/mm]');
    expect(header).toContain('tau on joint [MPa]');
    expect(header).toContain('required fillet leg [mm]');
    const j1 = lines.find((l) => l.startsWith('J1,'))?.split(',') ?? [];
    expect(j1.slice(0, 3)).toEqual(['J1', 'top', 'web']);
    expect(lines).toContain('part,tau max [MPa],where');
    const web = lines.find((l) => l.startsWith('web,'));
    expect(rel(Number(web?.split(',')[1]), tauWeb)).toBeLessThan(1e-9);
    expect(csv).toContain('the local code governs');
  });

  it('SVG: joint markers J1, J2 on the drawing and the joints listed, still well-formed', () => {
    const svg = sectionSvg({ name: 'welded I', unit: 'mm', section: sectionFromDocument(girder), joints: x });
    const root = parseXml(svg);
    expect(findAll(root, (e) => e.attributes['data-joint'] !== undefined).map((e) => e.attributes['data-joint'])).toEqual(['J1', 'J2']);
    expect(svg).toContain('J1  top | web  10.00 mm  welded, fillet welds both sides (default)  q = 752.6 N/mm');
    expect(svg).toContain(`τmax web = ${tauWeb.toPrecision(4)} MPa`);
    expect(svg).toContain('the local code governs');
  });

  it('report: the joints table, τmax per part and the notes', () => {
    const html = reportHtml({ title: 'welded I', drawings: [], tables: [], joints: x });
    expect(html).toContain('Joints under Vy = 500 kN, Vx = 0 kN');
    expect(html).toContain('Shear stress τ = V·Q/(I·t), largest in each part');
    expect(html).toContain(`<td>web</td><td>${tauWeb.toPrecision(4)}</td>`);
    expect(html).toContain('the local code governs');
  });
});

describe('separate pieces and overlaps are said in every export', () => {
  it('two plates apart: CSV, SVG and report say the material falls into 2 separate pieces', () => {
    const d = doc('mm', [rect('left', 10, 100, -20, 0), rect('right', 10, 100, 20, 0)]);
    const x = jointsExport({ doc: d });
    if (x === null) throw new Error('no joints export');
    const said = 'The material falls into 2 separate pieces';
    expect(jointsCsv(x)).toContain(said);
    expect(sectionSvg({ name: 'two plates', unit: 'mm', section: sectionFromDocument(d), joints: x })).toContain(said);
    expect(reportHtml({ title: 'two plates', drawings: [], tables: [], joints: x })).toContain(said);
    // Separate plies share the load by EI: two equal plates, half each.
    expect(x.plies?.plies.map((p) => p.shareX)).toEqual([0.5, 0.5]);
  });

  it('a duplicate part: the overlap warning with both names and 400 × 25 = 10 000 mm² in the CSV and the report', () => {
    const d = doc('mm', [rect('top flange', 400, 25, 0, 0), { ...rect('copy', 400, 25, 0, 0), name: 'top flange copy' }]);
    const x = jointsExport({ doc: d });
    if (x === null) throw new Error('no joints export');
    const said = 'Parts "top flange" and "top flange copy" overlap by 10000 mm²';
    // CSV doubles the quotes inside a quoted cell (RFC 4180); HTML escapes them.
    expect(jointsCsv(x)).toContain(said.replaceAll('"', '""'));
    expect(reportHtml({ title: 'dup', drawings: [], tables: [], joints: x })).toContain(said.replaceAll('"', '&quot;'));
  });
});
