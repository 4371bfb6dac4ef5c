/**
 * Separate pieces twist on their own (docs/methods.md §7.4): J is the sum of the pieces' J, and
 * there is no shared shear centre or warping constant, which the results must say.
 * Reference: the Saint-Venant series for each rectangle (Timoshenko & Goodier, torsion chapter).
 * Fresh dimensions: 13 × 41 and 9 × 27, 30 apart.
 */
import { describe, expect, it } from 'vitest';
import { propsCommand } from '../../cli/commands/props.ts';
import type { CliIo } from '../../cli/command.ts';
import { torsionConstants } from '../../core/torsion/index.ts';
import { rectangle, rectangleSeriesJ } from './shapes.ts';

const exact = rectangleSeriesJ(13, 41) + rectangleSeriesJ(9, 27);

describe('two disjoint rectangles', () => {
  it('J is the sum of the two Saint-Venant series values (within 0.1 %), two components', () => {
    const r = torsionConstants([rectangle(0, 0, 13, 41), rectangle(43, 5, 52, 32)]);
    expect(r.components).toBe(2);
    expect(Math.abs(r.J / exact - 1)).toBeLessThan(1e-3);
  });

  it('props --torsion says so and gives no shared shear centre or Cw (null in --json, a dash in the table)', () => {
    const geo = JSON.stringify({
      type: 'MultiPolygon',
      coordinates: [
        [[[0, 0], [13, 0], [13, 41], [0, 41], [0, 0]]],
        [[[43, 5], [52, 5], [52, 32], [43, 32], [43, 5]]],
      ],
    });
    const run = (json: boolean): { code: number; out: string } => {
      let out = '';
      const io: CliIo = { out: (t) => { out += t; }, err: () => undefined, readFile: () => geo };
      const code = propsCommand.run(['two.geojson'], { unit: 'mm', torsion: true, json }, io) as number;
      return { code, out };
    };
    const j = JSON.parse(run(true).out) as Record<string, unknown>;
    expect(j.torsionComponents).toBe(2);
    expect(j.Cw).toBeNull();
    expect(j.xs).toBeNull();
    expect(j.ys).toBeNull();
    expect(Math.abs((j.J as number) / exact - 1)).toBeLessThan(1e-3);
    const table = run(false).out;
    expect(table).toMatch(/sum over 2 separate pieces/);
    expect(table).toMatch(/no shared shear centre or Cw/);
  });
});
