/**
 * Reading and writing documents as text. Never throws on user input: every problem comes back
 * as a DocumentIssue with a path (schema) or a line and column (JSON syntax).
 *
 * Reading: JSON.parse → migrate to the current version → validate (schema.ts).
 * Writing: a fixed key order and 2-space indentation, points kept on one line, so a saved file
 * diffs cleanly and the same document always serialises to the same text.
 * Computed results are never part of the document.
 */
import type { LengthUnit } from '../units/types.ts';
import { migrateToCurrent } from './migrations.ts';
import { MAX_DOCUMENT_VERTICES, validateDocument, type DocumentIssue } from './schema.ts';
import { fileFromSection, firstSectionView } from './sections.ts';
import { DOCUMENT_FORMAT, SECTION_VIEW_VERSION, type JointSetting, type LoadSet, type MaterialRef, type MemberInputs, type Part, type SectionDocument, type SectionFile } from './types.ts';

/**
 * `file` is the whole file (every section); `document` is the view of its first section, for
 * callers that read one section only. Write back `file` (serialiseDocument), never `document`.
 */
export type ParseResult =
  | { readonly ok: true; readonly file: SectionFile; readonly document: SectionDocument; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly errors: readonly DocumentIssue[] };

export type JsonResult = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly errors: readonly DocumentIssue[] };

/** 1-based line and column of a character offset. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/**
 * Finds the first JSON syntax error (RFC 8259) and says what was expected there. Only called
 * after JSON.parse has failed, so it favours clear messages over speed.
 */
export function jsonSyntaxError(text: string): { offset: number; message: string } | null {
  let i = 0;
  const fail = (message: string): never => {
    throw { offset: i, message };
  };
  const found = (): string => (i >= text.length ? 'the end of the file' : JSON.stringify(text[i]));
  const space = (): void => {
    while (i < text.length && ' \t\n\r'.includes(text[i] as string)) i++;
  };
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail(`expected a value, found ${found()}`);
  };
  const string = (): void => {
    i++;
    while (i < text.length) {
      const c = text.charCodeAt(i);
      if (c === 34) { i++; return; }
      if (c < 32) fail('control character inside a string (write it as an escape such as \\n)');
      if (c === 92) {
        i++;
        const e = text[i];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 1, i + 5))) fail('expected four hex digits after \\u');
          i += 5;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i++;
        else fail(`invalid escape \\${e ?? ''} in a string`);
      } else i++;
    }
    fail('unterminated string (missing closing ")');
  };
  const number = (): void => {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i, i + 400));
    if (!m || m[0] === '' || m[0] === '-') fail(`expected a value, found ${found()}`);
    i += (m as RegExpExecArray)[0].length;
  };
  const value = (depth: number): void => {
    if (depth > 10000) fail('nesting deeper than 10000 levels');
    space();
    const c = text[i];
    if (c === '{') {
      i++; space();
      if (text[i] === '}') { i++; return; }
      for (;;) {
        space();
        if (text[i] !== '"') fail(`expected a property name in double quotes, found ${found()}`);
        string(); space();
        if (text[i] !== ':') fail(`expected ':' after the property name, found ${found()}`);
        i++; value(depth + 1); space();
        if (text[i] === ',') { i++; continue; }
        if (text[i] === '}') { i++; return; }
        fail(`expected ',' or '}' after a property value, found ${found()}`);
      }
    }
    if (c === '[') {
      i++; space();
      if (text[i] === ']') { i++; return; }
      for (;;) {
        value(depth + 1); space();
        if (text[i] === ',') { i++; continue; }
        if (text[i] === ']') { i++; return; }
        fail(`expected ',' or ']' after an array item, found ${found()}`);
      }
    }
    if (c === '"') return string();
    if (c === 't') return literal('true');
    if (c === 'f') return literal('false');
    if (c === 'n') return literal('null');
    return number();
  };
  try {
    value(0);
    space();
    if (i < text.length) fail(`unexpected ${found()} after the end of the JSON value`);
    return null;
  } catch (err) {
    if (err instanceof RangeError) return { offset: 0, message: 'nesting too deep to read' };
    return err as { offset: number; message: string };
  }
}

/** JSON.parse that reports where the syntax is wrong (line and column) instead of throwing. */
/**
 * The longest text this build parses (characters, about bytes for a document or GeoJSON file):
 * past it JSON.parse alone needs gigabytes and minutes (a 10-million-vertex file, ~400 MB, ran
 * past 120 s in 3 GB), so such a file is refused at once, saying how big it is and the limit.
 * 128 MiB holds a section of MAX_DOCUMENT_VERTICES vertices with room to spare.
 */
export const MAX_TEXT_LENGTH = 128 * 1024 * 1024;

const megabytes = (n: number): string => `${(n / (1024 * 1024)).toFixed(n < 10 * 1024 * 1024 ? 1 : 0)} MB`;

/** The refusal for a text longer than MAX_TEXT_LENGTH, or null. */
export function textTooLong(length: number): string | null {
  if (length <= MAX_TEXT_LENGTH) return null;
  return `the file is ${megabytes(length)}, more than this build reads (${megabytes(MAX_TEXT_LENGTH)}, about ${MAX_DOCUMENT_VERTICES.toLocaleString('en-US')} vertices); simplify or split the outlines`;
}

export function parseJson(input: string): JsonResult {
  const tooLong = textTooLong(input.length);
  if (tooLong !== null) return { ok: false, errors: [{ path: '', message: tooLong }] };
  // A UTF-8 byte-order mark (which some Windows editors write) is not part of the JSON (RFC 8259 §8.1 lets a parser ignore it).
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  try {
    return { ok: true, value: JSON.parse(text) as unknown };
  } catch (err) {
    const located = jsonSyntaxError(text);
    if (!located) return { ok: false, errors: [{ path: '', message: `JSON syntax error: ${err instanceof Error ? err.message : String(err)}` }] };
    const { line, column } = lineColumn(text, located.offset);
    return { ok: false, errors: [{ path: '', line, column, message: `line ${line}, column ${column}: JSON syntax error: ${located.message}` }] };
  }
}

/** Migrates and validates an already-parsed JSON value. */
export function documentFromJson(value: unknown): ParseResult {
  const migrated = migrateToCurrent(value);
  if (!migrated.ok) return { ok: false, errors: migrated.issues };
  const validated = validateDocument(migrated.value);
  if (!validated.ok) return { ok: false, errors: validated.issues };
  return { ok: true, file: validated.document, document: firstSectionView(validated.document), migratedFrom: migrated.migratedFrom };
}

/**
 * Reads a document from text. `fileName` prefixes every message ("girder.json: parts[2]…") so
 * a caller can print them as they are.
 */
export function parseDocument(text: string, fileName: string): ParseResult {
  const json = parseJson(text);
  const result = json.ok ? documentFromJson(json.value) : json;
  if (result.ok) return result;
  return { ok: false, errors: result.errors.map((e) => ({ ...e, message: `${fileName}: ${e.message}` })) };
}

/**
 * An empty one-section document in the given unit (the shape the computing code takes; as
 * JSON it is a version 1 file, which reads back through its migration). For a whole new file,
 * newSectionFile (sections.ts).
 */
export function newDocument(unit: LengthUnit, name = 'Untitled section'): SectionDocument {
  return { format: DOCUMENT_FORMAT, version: SECTION_VIEW_VERSION, name, unit, parts: [], materials: [], defaultMaterial: null };
}

function orderedPart(p: Part): Record<string, unknown> {
  const head = {
    id: p.id, name: p.name, type: p.type, operation: p.operation, ...(p.cutoutRole !== undefined ? { cutoutRole: p.cutoutRole } : {}),
    material: p.material, visible: p.visible, placement: { x: p.placement.x, y: p.placement.y, rotationDeg: p.placement.rotationDeg, mirror: p.placement.mirror },
  };
  switch (p.type) {
    case 'rectangle':
      return { ...head, width: p.width, height: p.height };
    case 'circle':
      return { ...head, diameter: p.diameter };
    case 'polygon':
      return { ...head, outer: p.outer, ...(p.outerBulges ? { outerBulges: p.outerBulges } : {}), holes: p.holes, ...(p.holeBulges ? { holeBulges: p.holeBulges } : {}) };
    case 'shape': {
      const params = Object.fromEntries(Object.keys(p.params).sort().map((k) => [k, p.params[k]]));
      return { ...head, shape: p.shape, params, ...(p.designation !== undefined ? { designation: p.designation } : {}) };
    }
  }
}

function orderedJoint(j: JointSetting): Record<string, unknown> {
  const k = j.kind;
  const kind = k.type === 'welded' ? { type: k.type, weld: k.weld } : k.type === 'fastened' ? { type: k.type, fastener: k.fastener, rows: k.rows, ...(k.pitch !== undefined ? { pitch: k.pitch } : {}) } : { type: k.type };
  return { parts: [j.parts[0], j.parts[1]], kind };
}

function orderedLoad(l: LoadSet): Record<string, unknown> {
  return { uniform: l.uniform, points: l.points.map((p) => ({ P: p.P, ...(p.a !== undefined ? { a: p.a } : {}) })) };
}

/** A member case in a fixed key order (SI values, written as they are). */
function orderedMember(m: MemberInputs): Record<string, unknown> {
  return {
    span: m.span, support: m.support, dead: orderedLoad(m.dead), live: orderedLoad(m.live), selfWeight: m.selfWeight,
    totalLimit: m.totalLimit, liveLimit: m.liveLimit, stressFactor: m.stressFactor,
    ...(m.allowables !== undefined ? { allowables: m.allowables.map((a) => ({ material: a.material, ...(a.bending !== undefined ? { bending: a.bending } : {}), ...(a.shear !== undefined ? { shear: a.shear } : {}) })) } : {}),
  };
}

function orderedMaterial(m: MaterialRef): Record<string, unknown> {
  const rest = Object.keys(m).filter((k) => k !== 'id' && k !== 'name').sort();
  return { id: m.id, name: m.name, ...Object.fromEntries(rest.map((k) => [k, m[k]])) };
}

/**
 * Stable text for a file: fixed key order, 2-space indent, number arrays on one line. A
 * one-section document is written as a file holding that one section (fileFromSection).
 */
export function serialiseDocument(input: SectionFile | SectionDocument): string {
  const doc = 'sections' in input ? input : fileFromSection(input);
  const ref = doc.referenceModulus;
  const ordered = {
    format: doc.format,
    version: doc.version,
    name: doc.name,
    unit: doc.unit,
    defaultMaterial: doc.defaultMaterial,
    ...(ref !== undefined ? { referenceModulus: 'material' in ref ? { material: ref.material } : { value: ref.value, unit: ref.unit } } : {}),
    materials: doc.materials.map(orderedMaterial),
    sections: doc.sections.map((s) => ({
      id: s.id, name: s.name, parts: s.parts.map(orderedPart), ...(s.joints !== undefined && s.joints.length > 0 ? { joints: s.joints.map(orderedJoint) } : {}),
      ...(s.member !== undefined ? { member: orderedMember(s.member) } : {}),
      ...(s.stress !== undefined ? { stress: { N: s.stress.N, Mx: s.stress.Mx, My: s.stress.My, Vx: s.stress.Vx, Vy: s.stress.Vy } } : {}),
    })),
  };
  // Arrays holding only numbers go on one line. JSON.stringify never puts a raw newline inside a
  // string, so the leading "[\n" anchors the pattern to structure, never to text in a name.
  const json = JSON.stringify(ordered, null, 2).replace(/\[\n\s*(-?\d[\d.eE+-]*(?:,\n\s*-?\d[\d.eE+-]*)*)\n\s*\]/g, (_m, body: string) => `[${body.replace(/,\n\s*/g, ', ')}]`);
  return `${json}\n`;
}
