import { describe, expect, it } from 'vitest';
import { ringPathData, sectionSvg } from '../../core/export/svg.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { allText, findAll, parseXml, type XmlElement } from './xml.ts';
import { circle, document, rectangle } from './sections.ts';
import type { SectionDocument } from '../../core/document/types.ts';

const svgOf = (doc: SectionDocument): string => sectionSvg({ name: doc.name, unit: doc.unit, section: sectionFromDocument(doc) });
const byId = (root: XmlElement, id: string): XmlElement | undefined => findAll(root, (e) => e.attributes.id === id)[0];

// The drawing frame (svg.ts): a 560 px square whose top-left is (24, 64); the section is scaled to fit.
const DRAW = 560;
const LEFT = 24;
const TOP = 64;

describe('SVG export', () => {
  const plate = document('splice plate with bolt hole', [rectangle('p', 'plate', 4, 6), circle('h', 'bolt hole', 2, 0, 0, 'subtract')]);

  it('is well-formed XML with an svg root in the SVG namespace', () => {
    const root = parseXml(svgOf(plate));
    expect(root.name).toBe('svg');
    expect(root.attributes.xmlns).toBe('http://www.w3.org/2000/svg');
  });

  it('draws the hole as two exact arc commands of the hole radius times the drawing scale, clockwise in the section (sweep-flag 0 after the y flip)', () => {
    const section = byId(parseXml(svgOf(plate)), 'section');
    const d = section?.children[0]?.attributes.d ?? '';
    // Scale: the 4 × 6 plate fits 560 px in height → 560/6 px per inch (exact arithmetic); radius 1 in.
    const radius = Math.round((DRAW / 6) * 1000) / 1000;
    const arcs = [...d.matchAll(/A([\d.]+) ([\d.]+) 0 ([01]) ([01]) /g)];
    expect(arcs).toHaveLength(2);
    for (const arc of arcs) {
      expect(Number(arc[1])).toBe(radius);
      expect(Number(arc[2])).toBe(radius);
      expect(arc[3]).toBe('0'); // a semicircle is not a large arc
      expect(arc[4]).toBe('0');
    }
    expect(section?.children[0]?.attributes['fill-rule']).toBe('evenodd');
  });

  it('flips y: the 6 in flange of a tee (at the top in the section) is drawn along the top of the frame, the 1 in web along the bottom', () => {
    const tee = document('tee', [rectangle('f', 'flange', 6, 1, 0, 5.5), rectangle('w', 'web', 1, 5, 0, 2.5)]);
    const d = byId(parseXml(svgOf(tee)), 'section')?.children[0]?.attributes.d ?? '';
    const points = [...d.matchAll(/[ML]([\d.]+) ([\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])] as const);
    const widthAt = (y: number): number => {
      const xs = points.filter((p) => p[1] === y).map((p) => p[0]);
      return Math.max(...xs) - Math.min(...xs);
    };
    expect(Math.min(...points.map((p) => p[1]))).toBe(TOP);
    expect(Math.max(...points.map((p) => p[1]))).toBe(TOP + DRAW);
    // 560/6 px per inch: the flange is 560 px wide, the web 93.333 px.
    expect(widthAt(TOP)).toBeCloseTo(DRAW, 6);
    expect(widthAt(TOP + DRAW)).toBeCloseTo(DRAW / 6, 2);
  });

  it('marks the centroid of a tee at its true height: ȳ = (6·5.5 + 5·2.5)/11 in from the bottom (exact arithmetic)', () => {
    const tee = document('tee', [rectangle('f', 'flange', 6, 1, 0, 5.5), rectangle('w', 'web', 1, 5, 0, 2.5)]);
    const marker = findAll(byId(parseXml(svgOf(tee)), 'centroid') as XmlElement, (e) => e.name === 'circle')[0];
    const ybar = (6 * 5.5 + 5 * 2.5) / 11;
    expect(Number(marker?.attributes.cy)).toBeCloseTo(TOP + (DRAW / 6) * (6 - ybar), 2);
    expect(Number(marker?.attributes.cx)).toBeCloseTo(LEFT + DRAW / 2, 2);
  });

  it('draws principal axes with their angle for an unequal angle, and none for a rectangle (θ = 0)', () => {
    const angle = document('angle', [rectangle('v', 'vertical leg', 1, 6, 0.5, 3), rectangle('h', 'horizontal leg', 3, 1, 2.5, 0.5)]);
    const root = parseXml(svgOf(angle));
    expect(byId(root, 'principal-axes')).toBeDefined();
    expect(allText(root)).toMatch(/θ = -?\d/);
    expect(byId(parseXml(svgOf(document('bar', [rectangle('r', 'bar', 2, 8)]))), 'principal-axes')).toBeUndefined();
    expect(byId(root, 'centroidal-axes')?.children).toHaveLength(2);
  });

  it('lists properties in display units: A = 24 − π in² = 20.86 in² for the plate with a 2 in hole (4 significant figures)', () => {
    const table = byId(parseXml(svgOf(plate)), 'properties') as XmlElement;
    const texts = table.children.map((e) => e.text);
    const a = texts.indexOf('A');
    expect(texts.slice(a, a + 3)).toEqual(['A', '20.86', 'in²']);
    const ix = texts.indexOf('Ix');
    // Ix = 4·6³/12 − π·2⁴/64 = 72 − π/4 = 71.21 in⁴ (rectangle and circle closed forms, Gere & Timoshenko).
    expect(texts.slice(ix, ix + 3)).toEqual(['Ix', '71.21', 'in⁴']);
  });

  it('carries the caution', () => {
    const caution = byId(parseXml(svgOf(plate)), 'caution');
    expect(caution?.text).toMatch(/preliminary.*licensed engineer.*building code/);
  });

  it('escapes markup in names: a part called <script>… stays text and reads back exactly', () => {
    const nasty = `<script>alert("x&y")</script> 'q' ]]>`;
    const doc = document(`girder & "co" <draft>`, [rectangle('p', nasty, 4, 6)]);
    const text = svgOf(doc);
    expect(text).not.toContain('<script');
    const root = parseXml(text);
    expect(findAll(root, (e) => e.name === 'script')).toHaveLength(0);
    expect(findAll(root, (e) => e.name === 'title').map((e) => e.text)).toEqual([`girder & "co" <draft>`, nasty]);
    expect(allText(byId(root, 'part-list') as XmlElement)).toContain(`+ ${nasty}`);
  });

  it('replaces characters XML cannot hold (a control character in a name) and stays well-formed', () => {
    const root = parseXml(svgOf(document('rail\u0001\u001b', [rectangle('p', 'web\u0000plate', 1, 1)])));
    expect(findAll(root, (e) => e.name === 'title').map((e) => e.text)).toEqual(['rail\uFFFD\uFFFD', 'web\uFFFDplate']);
  });

  it('still draws the parts and names the problem when the geometry has no properties', () => {
    const broken = document('broken', [rectangle('p', 'plate', 2, 2), rectangle('q', 'cutter', 4, 4, 0, 0, 'subtract')]);
    const root = parseXml(svgOf(broken));
    expect(allText(root)).toMatch(/No properties: the section has no area/);
    expect(byId(root, 'properties')).toBeUndefined();
  });
});

describe('round-off residue in the drawing', () => {
  it('shows a centroid of 1e-14 in and an angle of 6e-15° on a symmetric bar as 0 and draws no principal axes; 1e-3 in stays', () => {
    const bar = document('bar', [rectangle('r', 'bar', 2, 8)]);
    const section = sectionFromDocument(bar);
    const props = section.properties;
    if (!props) throw new Error('bar has no properties');
    const noisy = { ...props, cx: 1e-14, Ixy: -4e-13, thetaDeg: 5.871e-15 };
    const root = parseXml(sectionSvg({ name: 'bar', unit: 'in', section: { ...section, properties: noisy } }));
    const texts = (byId(root, 'properties') as XmlElement).children.map((e) => e.text);
    expect(texts[texts.indexOf('x̄') + 1]).toBe('0');
    expect(texts[texts.indexOf('Ixy') + 1]).toBe('0');
    expect(texts[texts.indexOf('θ') + 1]).toBe('0');
    expect(byId(root, 'principal-axes')).toBeUndefined();
    const offset = parseXml(sectionSvg({ name: 'bar', unit: 'in', section: { ...section, properties: { ...props, cx: 1e-3 } } }));
    const offsetTexts = (byId(offset, 'properties') as XmlElement).children.map((e) => e.text);
    expect(offsetTexts[offsetTexts.indexOf('x̄') + 1]).toBe('0.001000'); // 4 significant figures, trailing zeros kept
  });
});

describe('ringPathData arcs', () => {
  const frame = { toX: (x: number) => x, toY: (y: number) => -y, scale: 1 };
  it('an arc of bulge 0.5 over a chord of 2 has radius 2·(1 + 0.25)/(4·0.5) = 1.25, small, sweep-flag 1 (counter-clockwise in the section)', () => {
    const d = ringPathData({ xy: Float64Array.from([0, 0, 2, 0, 1, 3]), bulge: Float64Array.from([0.5, 0, 0]) }, frame);
    expect(d).toBe('M0 0A1.25 1.25 0 0 1 2 0L1 -3L0 0Z');
  });
  it('an arc of bulge −2 (sweep over 180°) sets large-arc-flag 1 and sweep-flag 0', () => {
    const d = ringPathData({ xy: Float64Array.from([0, 0, 2, 0]), bulge: Float64Array.from([-2, 0]) }, frame);
    // radius = 2·(1 + 4)/(4·2) = 1.25
    expect(d).toBe('M0 0A1.25 1.25 0 1 0 2 0L0 0Z');
  });
});
