/**
 * The pure logic of the table-check view (renderer/app/check/check-model.ts): the key a mapping is
 * remembered under, reading it back, and the dropdown choices as target texts that core/check
 * reads back to the same role (a round-trip identity).
 */
import { describe, expect, it } from 'vitest';
import { mapColumns, roleFromTarget } from '../../core/check/index.ts';
import { fnv1a, mappingKey, newColumns, powerOf, readRemembered, rememberedIndex, rememberedText, rememberedWithin, symbolOf, targetChoices, targetText, unitChoices, unitTextOf, viewMessage } from '../../renderer/app/check/check-model.ts';

describe('the remembered-mapping key', () => {
  it('FNV-1a 32-bit gives the published test vectors: "" → 811c9dc5, "a" → e40c292c, "foobar" → bf9cf968 (Fowler–Noll–Vo reference test suite, from memory)', () => {
    expect(fnv1a('')).toBe('811c9dc5');
    expect(fnv1a('a')).toBe('e40c292c');
    expect(fnv1a('foobar')).toBe('bf9cf968');
  });

  it('is one per header signature: spaces around headers do not count, order and names do, the count is in the key', () => {
    const k = mappingKey(['label', 'A_in2', 'Ix_in4']);
    expect(mappingKey([' label ', 'A_in2', 'Ix_in4 '])).toBe(k);
    expect(mappingKey(['A_in2', 'label', 'Ix_in4'])).not.toBe(k);
    expect(mappingKey(['label', 'A_in2', 'Ix_in3'])).not.toBe(k);
    expect(k).toMatch(/^check-mapping:3:[0-9a-f]{8}$/);
    // Joined with a separator no header holds: ["a,b"] and ["a", "b"] are different tables.
    expect(mappingKey(['ab', 'c'])).not.toBe(mappingKey(['a', 'bc']));
  });
});

describe('reading a remembered mapping back', () => {
  const headers = ['Section', 'Kind', 'Overall depth', 'Ix (in4)'];
  const mapping = mapColumns(headers, 'in', new Map([['Overall depth', 'd']]));

  it('round-trips the mapping, the table unit and the shape type', () => {
    const text = rememberedText(headers, { mapping, unit: 'mm', type: 'W' });
    expect(readRemembered(headers, text)).toEqual({ mapping, unit: 'mm', type: 'W' });
  });

  it('is refused for other headers (a colliding key), damaged JSON, a bad unit or a bad column', () => {
    const text = rememberedText(headers, { mapping, unit: 'in', type: null });
    expect(readRemembered(['Section', 'Kind', 'Depth', 'Ix (in4)'], text)).toBeNull();
    expect(readRemembered(headers, '{"headers": [')).toBeNull();
    expect(readRemembered(headers, text.replace('"unit":"in"', '"unit":"furlong"'))).toBeNull();
    expect(readRemembered(headers, text.replace('"symbol":"d"', '"symbol":"zz"'))).toBeNull();
    expect(readRemembered(headers, null)).toBeNull();
  });
});

describe('a remembered mapping reused when columns are added (issue 13, table check)', () => {
  const headers = ['Section', 'Kind', 'Overall depth', 'Ix (in4)'];
  const wider = ['Section', 'Kind', 'Overall depth', 'Flange width bf (in)', 'Ix (in4)', 'Notes'];

  it('what was seen: the mapping corrected for a table is found again once a column is added, and the added columns are named', () => {
    const index = rememberedIndex(null, headers);
    // The exact signature changes with the added columns, so the key alone finds nothing ...
    expect(mappingKey(wider)).not.toBe(mappingKey(headers));
    // ... but the index lists the remembered table whose every column the wider one still has.
    expect(rememberedWithin(wider, index)).toEqual([headers]);
    expect(newColumns(wider, headers)).toEqual(['Flange width bf (in)', 'Notes']);
    // The remembered roles apply to the known columns; the new ones are read from their headers.
    const mapping = mapColumns(headers, 'in', new Map([['Overall depth', 'd']]));
    const again = mapColumns(wider, 'in', new Map(), readRemembered(headers, rememberedText(headers, { mapping, unit: 'in', type: null }))!.mapping);
    expect(again.columns.find((c) => c.header === 'Overall depth')).toMatchObject({ role: 'dimension', symbol: 'd' });
    expect(again.columns.find((c) => c.header === 'Flange width bf (in)')).toMatchObject({ role: 'dimension', symbol: 'bf' });
  });

  it('a table that lost a remembered column, or another table, does not take it; the widest match comes first; the index keeps 30 tables, most recent first', () => {
    let index = rememberedIndex(null, headers);
    index = rememberedIndex(index, ['Section', 'Kind']);
    expect(rememberedWithin(['Section', 'Overall depth', 'Ix (in4)', 'extra'], index)).toEqual([]);
    expect(rememberedWithin(wider, index)).toEqual([headers, ['Section', 'Kind']]);
    // The exact signature is found by its own key, never as a match of itself.
    expect(rememberedWithin(headers, index)).toEqual([['Section', 'Kind']]);
    for (let i = 0; i < 40; i++) index = rememberedIndex(index, [`t${i}`]);
    const kept = JSON.parse(index) as string[][];
    expect(kept.length).toBe(30);
    expect(kept[0]).toEqual(['t39']);
    // Remembering a table again moves it to the front, once.
    const again = JSON.parse(rememberedIndex(index, ['t20'])) as string[][];
    expect(again[0]).toEqual(['t20']);
    expect(again.filter((h) => h[0] === 't20').length).toBe(1);
    // A damaged index is read as empty, never a reason to refuse the table.
    expect(rememberedWithin(wider, '{not json')).toEqual([]);
    expect(JSON.parse(rememberedIndex('{not json', headers))).toEqual([headers]);
  });
});

describe('dropdown choices as target texts', () => {
  it('every unit choice of every property and dimension reads back through core/check to the same symbol and unit', () => {
    const symbols = targetChoices().flatMap((g) => g.choices.map((c) => c.value)).filter((s) => powerOf(s) !== null);
    expect(symbols).toEqual(expect.arrayContaining(['d', 'bf', 'tw', 'tf', 'A', 'Ix', 'Sx', 'Zx', 'rx']));
    for (const symbol of symbols) {
      for (const choice of unitChoices(powerOf(symbol)!)) {
        const role = roleFromTarget(targetText(symbol, choice.value, 'in'), 'in', 'column');
        expect(symbolOf(role), `${symbol} ${choice.value}`).toBe(symbol);
        expect(unitTextOf(role), `${symbol} ${choice.value}`).toBe(choice.value);
      }
    }
  });

  it('a unit of the wrong power falls back to the table unit to the right power; designation, type and ignore take none', () => {
    expect(targetText('Ix', 'mm', 'cm')).toBe('Ix:cm4');
    expect(targetText('d', '10^6mm4', 'mm')).toBe('d:mm');
    expect(targetText('A', 'in2', 'mm')).toBe('A:in2');
    expect(targetText('designation', 'in', 'in')).toBe('designation');
    expect(targetText('ignore', 'in4', 'in')).toBe('ignore');
  });

  it('scaled metric units: 10^6 mm⁴ reads as scale 10⁶ (the SI prefix arithmetic of the header "Ix [10^6 mm^4]")', () => {
    const role = roleFromTarget(targetText('Ix', '10^6mm4', 'mm'), 'mm', 'I');
    expect(role).toEqual({ role: 'property', symbol: 'Ix', unit: 'mm', scale: 1e6 });
    expect(unitChoices(4).map((c) => c.label)).toContain('10⁶ mm⁴');
  });
});

describe('messages for the view', () => {
  it('command-line hints become the view\'s own controls', () => {
    expect(viewMessage('columns "a" and "b" both map to Ix; correct one with --map "b=ignore" or another target')).toBe('columns "a" and "b" both map to Ix; correct one with the mapping (set column "b" to ignore)');
    expect(viewMessage('no type column: add one, name one with --map COLUMN=type, or give --type')).toBe('no type column: add one, name one with the mapping (set a column to type), or choose the shape type');
    expect(viewMessage('--tolerance Qx=2%: unknown property "Qx"')).toBe('tolerance Qx=2%: unknown property "Qx"');
  });
});
