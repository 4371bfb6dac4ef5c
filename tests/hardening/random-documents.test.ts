// 10⁴ random documents, valid and corrupted (fast-check, fixed seed), through load, validate,
// compose, properties and the CSV and SVG exports (issue 18 §3). Nothing may throw except the
// project's typed errors; a refused document must say why; and the properties of a valid one
// must not change, beyond rounding (1e-9 of the section's own size), when every part is moved,
// when a polygon's vertices are renumbered, or when its winding is reversed (Green's theorem is
// invariant under all three: common practice, and the identities of docs/methods.md §1).
// A failing seed becomes a named regression test. The 10⁵-case run is `npm run bench -- fuzz`.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { propertyDifference, randomDocumentText, runPipeline, transformed, type Invariance } from './random-documents.ts';

const SEED = 20261202;

describe('random documents', () => {
  it('10,000 documents: no untyped throw, every refusal says why, properties invariant to 1e-9', () => {
    let valid = 0;
    let refused = 0;
    let checked = 0;
    fc.assert(
      fc.property(randomDocumentText, fc.constantFrom<Invariance>('translate', 'rotate-vertices', 'reverse'), fc.double({ min: -400, max: 400, noNaN: true }), fc.double({ min: -400, max: 400, noNaN: true }), fc.nat(), ({ text, mutated, file }, how, dx, dy, shift) => {
        const result = runPipeline(text);
        if (result.properties.length === 0) refused += 1;
        else valid += 1;
        if (mutated || result.properties.every((p) => p === null)) return;
        const moved = runPipeline(JSON.stringify(transformed(file, how, dx, dy, shift)));
        const ddx = how === 'translate' ? dx : 0, ddy = how === 'translate' ? dy : 0;
        result.properties.forEach((p, k) => {
          const q = moved.properties[k];
          if (p === null) return;
          expect(q, `section ${k} stopped composing after ${how}`).not.toBeNull();
          expect(propertyDifference(p, q!, ddx, ddy), `section ${k} after ${how}`).toBeLessThan(1e-9);
          checked += 1;
        });
      }),
      { seed: SEED, numRuns: 10_000 },
    );
    // The generator must really reach both sides, and check invariance on many sections.
    expect(valid).toBeGreaterThan(2_000);
    expect(refused).toBeGreaterThan(2_000);
    expect(checked).toBeGreaterThan(1_000);
  }, 600_000);
});
