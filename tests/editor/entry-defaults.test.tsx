/**
 * The exact-input form offers sizes in the document's unit (issue 11 item 4: an inch document
 * offered a 100 × 200 plate, which is a 100 × 200 inch plate), reads lengths with their units,
 * and keeps what was typed physically the same across a unit change.
 * Factors: 1 in = 25.4 mm and 1 ft = 12 in exactly (NIST SP 811, Appendix B.8).
 */
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LENGTH_UNITS, type LengthUnit } from '../../core/units/index.ts';
import type { Editor, EditorState } from '../../renderer/editor/editor.ts';
import { EntryPanel } from '../../renderer/app/parts/EntryPanel.tsx';
import { entryDefaults, fieldsForUnit, readEntryLength } from '../../renderer/app/parts/entry-model.ts';

const MM_PER: Record<LengthUnit, number> = { mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 };
const mm = (text: string | undefined, unit: LengthUnit): number => Number(text) * MM_PER[unit];

function offered(unit: LengthUnit): Record<string, string> {
  const state = { doc: { unit }, tool: { draft: null } } as unknown as EditorState;
  const html = renderToStaticMarkup(<EntryPanel editor={{} as Editor} state={state} />);
  const inputs = [...html.matchAll(/<input[^>]*>/g)].map((m) => m[0]);
  return Object.fromEntries(inputs.map((i) => [/data-testid="entry-([a-z-]+)"/.exec(i)?.[1], /value="([^"]*)"/.exec(i)?.[1]]));
}

describe('exact-input defaults follow the document unit', () => {
  it('an inch document offers a 4 × 8 in plate and a 3/4 in round, not 100 × 200 inches', () => {
    const f = offered('in');
    expect([f['rect-width'], f['rect-height'], f['circle-diameter']]).toEqual(['4', '8', '0.75']);
  });

  it('a mm document offers 100 × 200 mm and a 20 mm round', () => {
    const f = offered('mm');
    expect([f['rect-width'], f['rect-height'], f['circle-diameter']]).toEqual(['100', '200', '20']);
  });

  it.each(LENGTH_UNITS.map((u) => [u]))('in %s the offered plate is a plausible first plate: 50 to 350 mm wide and deep, a round of 10 to 30 mm', (unit) => {
    const d = entryDefaults(unit);
    for (const k of ['rect-width', 'rect-height']) expect(mm(d[k], unit), k).toBeGreaterThanOrEqual(50);
    for (const k of ['rect-width', 'rect-height']) expect(mm(d[k], unit), k).toBeLessThanOrEqual(350);
    expect(mm(d['circle-diameter'], unit)).toBeGreaterThanOrEqual(10);
    expect(mm(d['circle-diameter'], unit)).toBeLessThanOrEqual(30);
  });
});

describe('reading and carrying typed lengths', () => {
  it('a bare number is in the document unit; "4 in" in a mm document is 101.6 mm; a force is refused naming the field', () => {
    expect(readEntryLength('150', 'width b', 'mm')).toEqual({ ok: true, value: 150 });
    const r = readEntryLength('4 in', 'width b', 'mm');
    expect(r.ok && r.value).toBeCloseTo(101.6, 12);
    const ft = readEntryLength('1\'-6"', 'height h', 'in');
    expect(ft.ok && ft.value).toBeCloseTo(18, 12);
    const bad = readEntryLength('10 kN', 'width b', 'mm');
    expect(!bad.ok && bad.message).toMatch(/width b.*10 kN.*force/);
  });

  it('switching mm → in: untouched defaults become the inch defaults, a typed 254 mm becomes 10 in, bad text is kept', () => {
    const typed = { ...entryDefaults('mm'), 'rect-width': '254', 'rect-x': '-12.7', 'circle-diameter': 'abc' };
    const f = fieldsForUnit(typed, 'mm', 'in');
    expect(f['rect-height']).toBe('8');
    expect(f['rect-width']).toBe('10');
    expect(f['rect-x']).toBe('-0.5');
    expect(f['circle-diameter']).toBe('abc');
    expect(Number(fieldsForUnit(f, 'in', 'ft')['rect-width'])).toBeCloseTo(10 / 12, 11);
  });
});
