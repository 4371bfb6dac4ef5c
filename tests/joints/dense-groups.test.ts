/**
 * Issue 18, seen in the browser suite: a 300,000-vertex outline with a separate plate blanked the
 * editor, because splitting the section into the parts that act together intersected the dense
 * ring with the gross section, and the clipping library gave up ("queue size too big").
 */
import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/types.ts';
import { partsActingTogether } from '../../core/joints/index.ts';
import { regionIntegrals } from '../../core/properties/index.ts';

function denseEllipseWithPlate(n: number): SectionDocument {
  const outer: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    outer.push([200 * Math.cos(t), 100 * Math.sin(t)]);
  }
  const placement = { x: 0, y: 0, rotationDeg: 0, mirror: false };
  return {
    format: 'sectionsmith-section', version: 3, name: 'dense outline', unit: 'mm', materials: [], defaultMaterial: null,
    parts: [
      { id: 'p1', name: 'dense ellipse', type: 'polygon', operation: 'add', material: null, visible: true, placement, outer, holes: [] },
      { id: 'p2', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { ...placement, y: -150 }, width: 50, height: 20 },
    ],
  } as unknown as SectionDocument;
}

describe('parts acting together on a dense outline', () => {
  it('splits a 300,000-vertex ellipse and a separate plate into two groups without the clipping library giving up', () => {
    const n = 300_000;
    const acting = partsActingTogether(denseEllipseWithPlate(n));
    expect(acting.groups.map((g) => g.labels)).toEqual([['dense ellipse'], ['plate']]);
    // Exact arithmetic: the inscribed n-gon of the ellipse has area (n/2)·a·b·sin(2π/n); the plate 50 × 20.
    const areas = acting.groups.map((g) => regionIntegrals(g.region, 0, 0).A);
    expect(areas[0]).toBeCloseTo((n / 2) * 200 * 100 * Math.sin((2 * Math.PI) / n), 6);
    expect(areas[1]).toBeCloseTo(1000, 9);
  });
});
