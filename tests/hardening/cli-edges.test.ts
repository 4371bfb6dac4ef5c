// Hardening findings of issue 18 at the command line's edges: each case is an input that an attack
// on the CLI found mishandled (a silent wrong answer with exit 0, or exit 3 "internal error" where
// the input was simply bad). Every case must now end in exit 2 with a message naming what is wrong,
// or in the right answer. The numbers are exact arithmetic (b·h, b·h³/12) or the input itself.
import { describe, expect, it } from 'vitest';
import { cli, tempFolder } from '../cli/run-cli.ts';
import { csvTextCell } from '../../core/export/csv.ts';

const { dir, file } = tempFolder('sectionsmith-edges-');

const placement = { x: 0, y: 0, rotationDeg: 0, mirror: false };
const common = { operation: 'add', material: null, visible: true, placement };
const fileText = (parts: unknown[], materials: unknown[] = []): string =>
  JSON.stringify({ format: 'sectionsmith-section', version: 2, name: 'edges', unit: 'mm', materials, defaultMaterial: null, sections: [{ id: 's1', name: 'A', parts }] });
const polygon = (outer: unknown, extra: Record<string, unknown> = {}) => ({ id: 'p1', name: 'web plate', type: 'polygon', ...common, outer, holes: [], ...extra });
const plate = { id: 'p1', name: 'deck plate', type: 'rectangle', ...common, width: 300, height: 20 };

describe('points are exactly [x, y] (finding 5)', () => {
  it('a point [100, 0, 100, 50] (a missing "],[") is refused with its path, not read as [100, 0]', async () => {
    const r = await cli('props', file('four.json', fileText([polygon([[0, 0], [100, 0, 100, 50], [0, 50]])])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('sections[0].parts[0].outer[1]');
  });
  it('a point with text or an object after the two numbers is refused', async () => {
    const r = await cli('props', file('junk.json', fileText([polygon([[0, 0], [100, 0, 'oops', {}], [0, 50]])])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('outer[1]');
  });
  it('a 3-D point is refused', async () => {
    const r = await cli('props', file('three-d.json', fileText([polygon([[0, 0, 0], [100, 0, 0], [0, 50, 0]])])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('outer[0]');
  });
});

describe('a UTF-8 byte-order mark is accepted in documents (finding 8), as in CSV', () => {
  it('props reads a BOM-prefixed document: A = b·h = 6000 mm²', async () => {
    const r = await cli('props', file('bom.json', `\uFEFF${fileText([plate])}`), '--json');
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as { area: number }).area).toBe(300 * 20);
  });
});

describe('exit 2, not 3, for bad input (finding 6)', () => {
  it('--csv into a folder that does not exist names the flag and the path', async () => {
    const doc = file('plate.json', fileText([plate]));
    const r = await cli('compare', doc, '--csv', '/nonexistent/x.csv');
    expect(r.code).toBe(2);
    expect(r.err).toContain('--csv');
    expect(r.err).toContain('/nonexistent/x.csv');
  });
  it('--report onto a folder names the flag and says it is a folder', async () => {
    const doc = file('plate2.json', fileText([plate]));
    const r = await cli('compare', doc, '--report', dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--report');
    expect(r.err).toMatch(/folder|directory/);
  });
  it('part i-shape d=1e308 is refused as too large, naming d and the limit', async () => {
    const r = await cli('part', 'i-shape', 'd=1e308', 'bf=10', 'tw=1', 'tf=1', '--unit', 'mm');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/\bd\b.*1e\+?9|limit/);
  });
  it('a plate of 1e-200 is refused (too small for second moments), naming the dimension', async () => {
    const r = await cli('part', 'plate', 'b=1e-200', 't=1e-200', '--unit', 'mm');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/too small|below/);
  });
  it('a bulge of 1e308 is refused as bad input', async () => {
    const r = await cli('props', file('bulge.json', fileText([polygon([[0, 0], [100, 0], [0, 50]], { outerBulges: [1e308, 0, 0] })])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('bulge');
  });
  it('an arc whose extent passes ±1e9 is refused even though its end points lie inside (bulge 1e10 reached 2.5e10)', async () => {
    const r = await cli('props', file('arc-reach.json', fileText([polygon([[0, 0], [10, 0], [10, 10], [0, 10]], { outerBulges: [1e10, 0, 0, 0] })])));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/1e\+?9|1000000000/);
  });
  it('E = 1e308 GPa (infinite in pascals) is refused naming --E', async () => {
    const doc = file('plate3.json', fileText([plate]));
    const r = await cli('member', doc, '--span', '1000', '--uniform', '1kN/m', '--E', '1e308GPa', '--support', 'simple');
    expect(r.code).toBe(2);
    expect(r.err).toContain('--E');
  });
  it('E = 1e308 GPa in a document material is refused naming the material, not an internal error', async () => {
    const steel = { id: 'hot', name: 'too stiff', kind: 'steel', stressUnit: 'GPa', E: 1e308, nu: 0.3, density: 7850, fy: 0.35, strengthBasis: 'yield' };
    const r = await cli('props', file('stiff.json', fileText([{ ...plate, material: 'hot' }], [steel])), '--json');
    expect(r.code).not.toBe(3);
  });
});

describe('no NaN printed as a result with exit 0 (finding 5)', () => {
  it('member --span 1e308 is refused (the deflection overflows), not "span/NaN" with exit 0', async () => {
    const doc = file('plate4.json', fileText([plate]));
    const r = await cli('member', doc, '--span', '1e308', '--uniform', '1kN/m', '--E', '200GPa', '--support', 'simple');
    expect(r.code).toBe(2);
    expect(r.out).not.toContain('NaN');
    expect(r.err).toContain('span');
  });
  it('at a scale of 1e-100 nothing silently underflows to 0: the section is refused as too small', async () => {
    const r = await cli('part', 'plate', 'b=1e-100', 't=2e-100', '--unit', 'mm', '--json');
    expect(r.code).toBe(2);
  });
});

describe('user text as a key (finding 1) and counts (finding 3)', () => {
  it('part plate constructor=5 is an unknown dimension, not "given twice"', async () => {
    const r = await cli('part', 'plate', 'b=100', 't=10', 'constructor=5', '--unit', 'mm');
    expect(r.code).toBe(2);
    expect(r.err).toContain('unknown dimension "constructor"');
  });
  it('part plate __proto__=5 and toString=5 are unknown dimensions too', async () => {
    for (const key of ['__proto__', 'toString', 'valueOf', 'hasOwnProperty']) {
      const r = await cli('part', 'plate', 'b=100', 't=10', `${key}=5`, '--unit', 'mm');
      expect(r.code, key).toBe(2);
      expect(r.err, key).toContain(`unknown dimension "${key}"`);
    }
  });
  it('plies: 1000000 in a 400-byte document is refused at once, naming the limit', async () => {
    const lumber = { id: 'p1', name: 'header', type: 'shape', ...common, shape: 'lumber', params: { b: 2, d: 10, plies: 1_000_000 } };
    const started = Date.now();
    const r = await cli('props', file('plies.json', fileText([lumber])));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/plies.*(at most|limit)/);
    // Not a timing target (benches do that); a guard against the 6-minute hang coming back.
    expect(Date.now() - started).toBeLessThan(30_000);
  });
});

describe('text output and CSV cells (finding 8)', () => {
  it('control characters (an ANSI escape) in a part name are not written to the terminal', async () => {
    const named = { ...plate, name: 'deck\u001b[31m red\u0007' };
    const r = await cli('props', file('ansi.json', JSON.stringify({ format: 'sectionsmith-section', version: 2, name: 'a\u001b[2Jb', unit: 'mm', materials: [], defaultMaterial: null, sections: [{ id: 's1', name: 'A\u001b[0m', parts: [named] }] })));
    expect(r.code).toBe(0);
    expect(r.out).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
  });
  it('a cell holding the separator of a semicolon locale is quoted, so x;=1+1;y stays one cell', () => {
    expect(csvTextCell('x;=1+1;y')).toBe('"x;=1+1;y"');
    expect(csvTextCell('a\tb')).toBe('"a\tb"');
  });
});
