/**
 * The flag parser every command shares (cli/main.ts parseFlags), on a command of the test's own:
 * a repeatable flag keeps every value in order, a plain one is refused when given twice, booleans
 * and positionals are as given. Exact expectations (the parser only sorts what it was handed).
 */
import { describe, expect, it } from 'vitest';
import type { Command } from '../../cli/command.ts';
import { commandHelp, parseFlags } from '../../cli/main.ts';

const sample: Command = {
  name: 'sample',
  summary: 'a command for the parser test',
  usage: 'sample FILE [--tag T …] [--unit U] [--json]',
  description: 'test only',
  flags: [
    { name: 'tag', type: 'string', value: 'T', description: 'a repeatable tag', multiple: true },
    { name: 'unit', type: 'string', value: 'U', description: 'a plain flag' },
    { name: 'json', type: 'boolean', description: 'a switch' },
  ],
  run: () => 0,
};

describe('parseFlags', () => {
  it('a repeatable flag keeps all three values in the order given, whatever lies between them', () => {
    const r = parseFlags(sample, ['a.csv', '--tag', 'one', '--unit', 'mm', '--tag=two', 'b.csv', '--tag', 'three']);
    expect(r.lists.tag).toEqual(['one', 'two', 'three']);
    expect(r.flags.unit).toBe('mm');
    expect(r.positionals).toEqual(['a.csv', 'b.csv']);
    expect(r.flags.tag).toBeUndefined();
  });

  it('an absent repeatable flag is an empty list, an absent plain flag undefined', () => {
    const r = parseFlags(sample, ['a.csv']);
    expect(r.lists.tag).toEqual([]);
    expect(r.flags.unit).toBeUndefined();
    expect(r.flags.json).toBeUndefined();
  });

  it('a plain string flag given twice throws naming the flag; a boolean given twice is still true', () => {
    expect(() => parseFlags(sample, ['--unit', 'mm', '--unit', 'in'])).toThrow('--unit was given 2 times; give it once');
    expect(parseFlags(sample, ['--json', '--json']).flags.json).toBe(true);
  });

  it('an unknown flag and a string flag without a value are refused', () => {
    expect(() => parseFlags(sample, ['--colour', 'red'])).toThrow(/--colour/);
    expect(() => parseFlags(sample, ['--tag'])).toThrow(/--tag/);
  });

  it('help marks the repeatable flag and lists the exit codes', () => {
    const help = commandHelp(sample);
    expect(help).toMatch(/--tag T +a repeatable tag \(may be repeated\)/);
    expect(help).not.toMatch(/a plain flag \(may be repeated\)/);
    expect(help).toContain('3 internal error');
  });
});
