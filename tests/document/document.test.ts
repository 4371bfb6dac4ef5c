// core/document: validation messages (path + expected/got), migrations, newer-version rejection,
// stable serialisation. Expected texts are the format's own rules (core/document/types.ts).
// Sections (version 2) and their one-section views: tests/document/sections.test.ts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DOCUMENT_VERSION,
  MIGRATIONS,
  OLDEST_READABLE_VERSION,
  documentFromJson,
  newDocument,
  parseDocument,
  serialiseDocument,
  type SectionDocument,
} from '../../core/document/index.ts';

const plate = {
  id: 'p1', name: 'web', type: 'rectangle', operation: 'add', material: null, visible: true,
  placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 10, height: 300,
};
/** A current-version file whose one section holds `parts`. */
const withParts = (parts: unknown[], extra: Record<string, unknown> = {}): string =>
  JSON.stringify({ format: 'sectionsmith-section', version: DOCUMENT_VERSION, name: 'Mezzanine flitch beam', unit: 'mm', materials: [], defaultMaterial: null, sections: [{ id: 's1', name: 'Mezzanine flitch beam', parts }], ...extra });

function messages(text: string): string[] {
  const r = parseDocument(text, 'beam.json');
  return r.ok ? [] : r.errors.map((e) => e.message);
}

describe('validation errors name the path and say expected vs got', () => {
  it('a rotation given as text: sections[0].parts[2].placement.rotationDeg: expected a finite number …, got "ninety"', () => {
    const bad = { ...plate, id: 'p3', placement: { ...plate.placement, rotationDeg: 'ninety' } };
    expect(messages(withParts([plate, { ...plate, id: 'p2' }, bad]))).toEqual([
      'beam.json: sections[0].parts[2].placement.rotationDeg: expected a finite number (degrees), got "ninety"',
    ]);
  });

  it('reports every problem at once, each at its own path', () => {
    const bad = { ...plate, width: -3, placement: { x: 0, rotationDeg: 0, mirror: 'no' } };
    expect(messages(withParts([bad]))).toEqual([
      'beam.json: sections[0].parts[0].placement.y: expected the key "y" in sections[0].parts[0].placement, got nothing (the key is missing)',
      'beam.json: sections[0].parts[0].placement.mirror: expected true or false, got "no"',
      'beam.json: sections[0].parts[0].width: expected a positive finite number, got -3',
    ]);
  });

  it('an unknown part type lists the known ones', () => {
    expect(messages(withParts([{ ...plate, type: 'ellipse' }]))).toEqual([
      'beam.json: sections[0].parts[0].type: expected a part object with "type" one of "polygon", "rectangle", "circle", "shape", got "ellipse"',
    ]);
  });

  it('a misspelt key is an error, not silently ignored', () => {
    expect(messages(withParts([{ ...plate, widht: 10 }]))).toEqual([
      'beam.json: sections[0].parts[0].widht: unexpected key "widht" in sections[0].parts[0]; check its spelling against the format',
    ]);
  });

  it('a bad unit, a bad point and a bad format string are each named', () => {
    const poly = { ...plate, type: 'polygon', outer: [[0, 0], [1, 0], [1, 'x']], holes: [] } as Record<string, unknown>;
    delete poly.width;
    delete poly.height;
    const text = withParts([poly], { unit: 'inch' });
    expect(messages(text)).toEqual([
      'beam.json: unit: expected a length unit: "in", "ft", "mm", "cm" or "m", got "inch"',
      'beam.json: sections[0].parts[0].outer[2][1]: expected a finite number, got "x"',
    ]);
    expect(messages(withParts([], { format: 'other' }))).toEqual(['beam.json: format: expected "sectionsmith-section", got "other"']);
  });

  it('cross-field rules: unique ids, known materials, one bulge per segment', () => {
    const poly = { ...plate, id: 'p2', type: 'polygon', material: 'oak', outer: [[0, 0], [1, 0], [1, 1]], outerBulges: [0, 0], holes: [] } as Record<string, unknown>;
    delete poly.width;
    delete poly.height;
    expect(messages(withParts([plate, poly, { ...plate }]))).toEqual([
      'beam.json: sections[0].parts[1].material: expected the id of an entry in materials or null, got "oak"',
      'beam.json: sections[0].parts[1].outerBulges: expected 3 bulges (one per segment of outer), got 2',
      'beam.json: sections[0].parts[2].id: expected a unique id, got "p1" again',
    ]);
  });

  it('a material entry may carry fields of its own (the materials module owns them)', () => {
    const text = withParts([{ ...plate, material: 's355' }], { materials: [{ id: 's355', name: 'S355 steel', E: 210000, fy: 355 }] });
    const r = parseDocument(text, 'beam.json');
    expect(r.ok && r.document.materials[0]?.E).toBe(210000);
  });
});

describe('JSON syntax errors give line and column', () => {
  it('a missing value is reported at line 3, column 11', () => {
    const text = '{\n  "format": "sectionsmith-section",\n  "name": ,\n}';
    expect(messages(text)).toEqual(['beam.json: line 3, column 11: JSON syntax error: expected a value, found ","']);
  });

  it('a trailing comma and an unterminated string are located', () => {
    expect(messages('{"a": [1, 2,]}')[0]).toBe('beam.json: line 1, column 13: JSON syntax error: expected a value, found "]"');
    expect(messages('{"a": "abc')[0]).toBe('beam.json: line 1, column 11: JSON syntax error: unterminated string (missing closing ")');
  });
});

describe('versions', () => {
  it('a newer document is rejected with its version and the highest this build reads', () => {
    expect(messages(JSON.stringify({ ...newDocument('in'), version: 7 }))).toEqual([
      `beam.json: document is version 7; this build reads up to ${DOCUMENT_VERSION}. Open it with a newer Sectionsmith.`,
    ]);
  });

  it('a version that is not a whole number is named', () => {
    expect(messages(JSON.stringify({ ...newDocument('in'), version: '1' }))[0]).toBe(
      `beam.json: version: expected a whole number (this build reads ${OLDEST_READABLE_VERSION} to ${DOCUMENT_VERSION}), got "1"`,
    );
  });

  it('there is one migration per older version, each reading the version before the next', () => {
    expect(MIGRATIONS.length).toBe(DOCUMENT_VERSION - OLDEST_READABLE_VERSION);
    MIGRATIONS.forEach((m, k) => expect(m.from).toBe(OLDEST_READABLE_VERSION + k));
  });

  it('version 0 (pre-release layout) migrates to the version 1 document written out by hand (through 3: its cut-out is a void)', () => {
    const v0 = {
      format: 'sectionsmith-section', version: 0, name: 'Footbridge box girder', units: 'mm',
      parts: [
        { kind: 'rectangle', name: 'deck plate', x: 0, y: 300, angle: 0, width: 800, height: 12 },
        { kind: 'circle', x: 100, y: 150, angle: 0, diameter: 22, subtract: true },
        { kind: 'polygon', name: 'gusset', x: 5, y: 6, angle: 90, flip: true, outer: [[0, 0], [50, 0], [0, 40]] },
      ],
    };
    const expected: SectionDocument = {
      format: 'sectionsmith-section', version: 1, name: 'Footbridge box girder', unit: 'mm', materials: [], defaultMaterial: null,
      parts: [
        { id: 'p1', name: 'deck plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 300, rotationDeg: 0, mirror: false }, width: 800, height: 12 },
        { id: 'p2', name: 'circle 2', type: 'circle', operation: 'subtract', cutoutRole: 'void', material: null, visible: true, placement: { x: 100, y: 150, rotationDeg: 0, mirror: false }, diameter: 22 },
        { id: 'p3', name: 'gusset', type: 'polygon', operation: 'add', material: null, visible: true, placement: { x: 5, y: 6, rotationDeg: 90, mirror: true }, outer: [[0, 0], [50, 0], [0, 40]], holes: [] },
      ],
    };
    const r = documentFromJson(v0);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.document).toEqual(expected);
      expect(r.migratedFrom).toBe(0);
    }
  });

  it('a broken version 0 file is reported against the version 0 layout', () => {
    const r = documentFromJson({ format: 'sectionsmith-section', version: 0, units: 'mm', parts: [{ kind: 'circle', x: 0, y: 0, angle: 0, diameter: 'big' }] });
    expect(r.ok ? [] : r.errors.map((e) => e.message)).toEqual(['parts[0].diameter: expected a finite number, got "big" (version 0 layout)']);
  });

  it('a version 0 migration whose output broke the current schema would be caught: the result is validated after migrating', () => {
    // A version 0 rectangle with zero width passes the version 0 layout (finite) but not version 1 (positive).
    const r = documentFromJson({ format: 'sectionsmith-section', version: 0, units: 'mm', parts: [{ kind: 'rectangle', x: 0, y: 0, angle: 0, width: 0, height: 1 }] });
    expect(r.ok ? [] : r.errors.map((e) => e.message)).toEqual(['parts[0].width: expected a positive finite number, got 0']);
  });
});

describe('serialisation', () => {
  const doc: SectionDocument = {
    ...newDocument('in', 'Trailer frame'),
    materials: [{ name: 'A36', id: 'a36', fy: 36 }],
    parts: [
      { ...plate, material: 'a36', placement: { x: 1.5, y: -2, rotationDeg: 30, mirror: true } } as SectionDocument['parts'][number],
      { id: 'p2', name: 'tab', type: 'polygon', operation: 'subtract', material: null, visible: false, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, outer: [[0, 0], [2, 0], [2, 1]], outerBulges: [0, 0.5, 0], holes: [] },
      { id: 'p3', name: 'rail', type: 'shape', shape: 'channel', params: { tw: 0.3, d: 8, bf: 2.5 }, operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } },
    ],
  };

  it('reading back what was written gives the same document, and writing it again the same text', () => {
    const text = serialiseDocument(doc);
    const r = parseDocument(text, 'frame.json');
    expect(r.ok && r.document).toEqual(doc);
    if (r.ok) expect(serialiseDocument(r.document)).toBe(text);
  });

  it('keys come in a fixed order, with 2-space indentation and points on one line', () => {
    const text = serialiseDocument(doc);
    expect(text.startsWith('{\n  "format": "sectionsmith-section",\n  "version": 3,\n  "name": "Trailer frame",\n  "unit": "in",')).toBe(true);
    expect(text).toContain('"sections": [\n    {\n      "id": "s1",\n      "name": "Trailer frame",\n      "parts": [');
    expect(text).toContain('"outer": [\n            [0, 0],\n            [2, 0],\n            [2, 1]\n          ],');
    expect(text).toContain('"outerBulges": [0, 0.5, 0]');
    expect(text).toContain('"params": {\n            "bf": 2.5,\n            "d": 8,\n            "tw": 0.3\n          }');
    expect(text.indexOf('"id": "a36"')).toBeLessThan(text.indexOf('"fy": 36'));
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('a name that looks like a number array is not reformatted', () => {
    const text = serialiseDocument({ ...doc, name: '[\n 1,\n 2 ]' });
    const r = parseDocument(text, 'x.json');
    expect(r.ok && r.document.name).toBe('[\n 1,\n 2 ]');
  });

  it('newDocument is a valid, empty document in the given unit', () => {
    const r = parseDocument(serialiseDocument(newDocument('ft')), 'new.json');
    expect(r.ok && [r.document.unit, r.document.parts.length]).toEqual(['ft', 0]);
  });
});

describe('parseDocument never throws on user input', () => {
  it('arbitrary JSON values and arbitrary text come back as errors, never exceptions (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.json(), fc.string(), fc.jsonValue().map((v) => JSON.stringify({ format: 'sectionsmith-section', version: 1, parts: [v] }))), (text) => {
        const r = parseDocument(text, 'f.json');
        expect(typeof r.ok).toBe('boolean');
      }),
      { seed: 20261201, numRuns: 300 },
    );
  });
});
