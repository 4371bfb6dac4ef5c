/**
 * Checked accessors in core/mesh and core/torsion (STYLE.md §5: a broken invariant throws): an
 * index outside its array is a bug and raises InvariantError naming the index, where
 * `array[index] ?? 0` used to read coordinate 0 and carry on.
 */
import { describe, expect, it } from 'vitest';
import { InvariantError, outside } from '../../core/invariant.ts';
import { quadraticMesh, solveWarping } from '../../core/torsion/warping.ts';

describe('checked accessors', () => {
  it('a checked read returns the element inside the array and throws InvariantError naming the index outside it', () => {
    const a = Float64Array.of(1.5, -2, 0);
    const read = (i: number): number => a[i] ?? outside(a, i);
    expect(read(1)).toBe(-2);
    expect(read(2)).toBe(0);
    expect(() => read(3)).toThrow(InvariantError);
    expect(() => read(-1)).toThrow(/index -1 is outside 0\.\.2/);
  });

  it('a triangle that names a node the mesh does not have is refused, not read as the origin', () => {
    // Unit right triangle (nodes 0..2), then a second triangle naming node 7 of a 3-node list.
    const xy = Float64Array.of(0, 0, 1, 0, 0, 1);
    expect(() => quadraticMesh(xy, Int32Array.of(0, 1, 2, 1, 7, 2))).toThrow(InvariantError);
  });

  it('an element naming a node outside the node list stops the solve with InvariantError', () => {
    const q = quadraticMesh(Float64Array.of(0, 0, 1, 0, 0, 1), Int32Array.of(0, 1, 2));
    const broken = { xy: q.xy, elements: Int32Array.of(0, 1, 2, 3, 4, 9) };
    expect(() => solveWarping(broken, { tolerance: 1e-10, maxIterations: 100 })).toThrow(InvariantError);
  });
});
