// The precision promise of exact arcs (issue 18, finding 9): a lone circular segment, the case
// where cancellation is worst (a thin sliver whose centroidal Ix is tiny beside the sector and
// triangle it is the difference of), swept across 0.3–2 rad through the old switch between
// quadrature and closed form at 0.5 rad. References: 40 of 60 digits computed with mpmath
// (a general-purpose arbitrary-precision library) by tests/fixtures/arc-segment-refs.py.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';

interface Row { bulge: number; sweep: string; area: string; cy: string; Ix: string; Iy: string }
const refs = JSON.parse(readFileSync(new URL('../fixtures/arc-segment-refs.json', import.meta.url), 'utf8')) as { rows: Row[] };

/** The ring (10.5, 36) —arc, bulge b→ (−10.5, 36) —straight→ back: counter-clockwise. */
const segment = (b: number): Region => [{ outer: { xy: new Float64Array([10.5, 36, -10.5, 36]), bulge: new Float64Array([b, 0]) }, holes: [] }];

const rel = (got: number, want: string): number => Math.abs(got - Number(want)) / Math.abs(Number(want));

describe('a lone circular segment, 0.3–2 rad, against 40-digit references', () => {
  it('the seen case, bulge 1/7: centroidal Ix = 3.2560782522774 (mpmath), not 3.2560782521341', () => {
    const row = refs.rows.find((r) => r.bulge === 1 / 7)!;
    expect(row.Ix.startsWith('3.2560782522773')).toBe(true);
    const p = sectionProperties(segment(1 / 7));
    expect(rel(p.Ix, row.Ix)).toBeLessThan(2e-14);
  });
  it('every sweep: A, ȳ, Iy and the centroidal Ix all within 2e-14 relative (the bound the module states)', () => {
    const worst = { area: 0, cy: 0, Ix: 0, Iy: 0 };
    for (const row of refs.rows) {
      const p = sectionProperties(segment(row.bulge));
      worst.area = Math.max(worst.area, rel(p.area, row.area));
      worst.cy = Math.max(worst.cy, rel(p.cy, row.cy));
      worst.Ix = Math.max(worst.Ix, rel(p.Ix, row.Ix));
      worst.Iy = Math.max(worst.Iy, rel(p.Iy, row.Iy));
    }
    expect(refs.rows.length).toBeGreaterThanOrEqual(35);
    expect(worst.area).toBeLessThan(2e-14);
    expect(worst.cy).toBeLessThan(2e-14);
    expect(worst.Iy).toBeLessThan(2e-14);
    expect(worst.Ix).toBeLessThan(2e-14);
  });
});
