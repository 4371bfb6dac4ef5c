/** The printable report and the side-by-side drawing: structure, escaping and the caution (no numbers of their own). */
import { describe, expect, it } from 'vitest';
import { comparisonSvg } from '../../core/compare/index.ts';
import type { SectionDocument } from '../../core/document/index.ts';
import { reportHtml } from '../../core/report/index.ts';

const plate = (name: string, h: number): SectionDocument => ({
  format: 'sectionsmith-section', version: 1, name, unit: 'mm', defaultMaterial: null, materials: [],
  parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 10, height: h }],
});

describe('report and comparison drawing', () => {
  it('outlines share one scale: a plate twice as tall is drawn twice as tall', () => {
    const svg = comparisonSvg([plate('short', 100), plate('tall <b>', 200)], 'mm');
    const heights = [...svg.matchAll(/<path d="([^"]*)"/g)].map((m) => {
      const ys = [...m[1]!.matchAll(/[ML][\d.]+ ([\d.]+)/g)].map((v) => Number(v[1]));
      return Math.max(...ys) - Math.min(...ys);
    });
    expect(heights).toHaveLength(2);
    expect(heights[1]! / heights[0]!).toBeCloseTo(2, 2);
    expect(svg).toContain('tall &lt;b&gt;');
    expect(svg).toContain('licensed engineer');
  });

  it('the HTML has @page CSS, escaped text, the method notes with the FE mesh and error when given, and the caution', () => {
    const html = reportHtml({ title: 'Footbridge <girder>', drawings: ['<svg></svg>'], tables: [{ title: 'Properties', columns: ['symbol', 'value'], rows: [['Ix', '1 & 2']] }], torsion: { meshElements: 1200, jRelativeError: 0.0012 } });
    expect(html).toContain('@page');
    expect(html).toContain('Footbridge &lt;girder&gt;');
    expect(html).toContain('1 &amp; 2');
    expect(html).toContain("Green's theorem".replace("'", '&apos;'));
    expect(html).toContain('1200 elements');
    expect(html).toContain('0.12 %');
    expect(html.match(/licensed engineer/g)).toHaveLength(2);
    expect(html).not.toMatch(/<script/i);
  });
});
