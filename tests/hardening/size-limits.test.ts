// Inputs past what the tool can serve are refused at once, saying how big they are and the
// limit (issue 18 §3: a 10⁷-vertex document ran past 120 s in 3 GB before this).
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.ts';
import { MAX_DOCUMENT_VERTICES, MAX_TEXT_LENGTH, parseJson, validateDocument } from '../../core/document/index.ts';
import { regionFromGeoJson } from '../../core/geojson.ts';

const ring = (n: number): [number, number][] => Array.from({ length: n }, (_, i) => [Math.cos((2 * Math.PI * i) / n), Math.sin((2 * Math.PI * i) / n)]);
const fileWith = (outer: [number, number][]) => ({
  format: 'sectionsmith-section', version: 3, name: 'big', unit: 'mm', materials: [], defaultMaterial: null,
  sections: [{ id: 's1', name: 'A', parts: [{ id: 'p1', name: 'outline', type: 'polygon', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, outer, holes: [] }] }],
});

describe('size limits', () => {
  it('a text longer than the limit is refused before JSON.parse, naming its size and the limit', () => {
    const r = parseJson(' '.repeat(MAX_TEXT_LENGTH + 1));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]!.message).toMatch(/128\.?0? MB.*more than this build reads \(128 MB/);
  });
  it('the CLI refuses a 400 MB file from its size alone, without reading it (exit 2)', async () => {
    let err = '';
    const io = {
      out: () => undefined,
      err: (t: string) => void (err += t),
      readFile: (): string => { throw new Error('must not be read'); },
      fileSize: () => 400 * 1024 * 1024,
    };
    const code = await runCli(['props', 'huge.section.json'], io);
    expect(code).toBe(2);
    expect(err).toContain('huge.section.json: the file is 400 MB');
  });
  it(`a document of ${MAX_DOCUMENT_VERTICES + 1} vertices is refused with its count and the limit; one of ${MAX_DOCUMENT_VERTICES} is not`, () => {
    const over = validateDocument(fileWith(ring(MAX_DOCUMENT_VERTICES + 1)));
    expect(over.ok).toBe(false);
    if (!over.ok) expect(over.issues[0]!.message).toContain('2,000,001 outline vertices, more than this build computes (2,000,000)');
    expect(validateDocument(fileWith(ring(MAX_DOCUMENT_VERTICES))).ok).toBe(true);
  });
  it('a GeoJSON polygon past the vertex limit is refused too', () => {
    const r = regionFromGeoJson({ type: 'Polygon', coordinates: [[...ring(MAX_DOCUMENT_VERTICES + 1), [1, 0]]] });
    expect(r.ok).toBe(false);
  });
});
