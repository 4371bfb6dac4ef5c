// Golden cases run through the real command line as a process (`node cli/sectionsmith.mjs props
// FILE --json`), so the command line and core can never disagree (STYLE.md §20). Each folder
// holds the input and expected.json: the values, how they were derived by hand (exact fractions
// or closed forms, with the book named), and their tolerance.
import { execFile } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const here = dirname(fileURLToPath(import.meta.url));
const cli = join(here, '..', '..', 'cli', 'sectionsmith.mjs');

interface Expected {
  readonly what: string;
  readonly args: readonly string[];
  readonly unit: string;
  readonly source: string;
  readonly tolerance: { readonly relative: number };
  readonly values: Readonly<Record<string, { readonly value: number; readonly scale?: number }>>;
}

interface Run {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

function run(args: readonly string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [cli, ...args], { encoding: 'utf8' }, (err, stdout, stderr) => {
      resolve({ code: err ? (typeof err.code === 'number' ? err.code : null) : 0, stdout, stderr });
    });
  });
}

const cases = readdirSync(here, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name).sort();
const runs = new Map<string, Run>();

beforeAll(async () => {
  // Start every case at once: each process pays the node + tsx start-up once.
  await Promise.all(
    cases.map(async (name) => {
      const dir = join(here, name);
      const input = readdirSync(dir).find((f) => f.startsWith('input.')) as string;
      const expected = JSON.parse(readFileSync(join(dir, 'expected.json'), 'utf8')) as Expected;
      runs.set(name, await run(['props', join(dir, input), '--json', ...expected.args]));
    }),
  );
}, 60_000);

describe('golden cases through `sectionsmith props --json`', () => {
  it('there are golden cases to run', () => {
    expect(cases.length).toBeGreaterThanOrEqual(5);
  });

  for (const name of cases) {
    const expected = JSON.parse(readFileSync(join(here, name, 'expected.json'), 'utf8')) as Expected;
    it(`${name}: every expected value within ${expected.tolerance.relative} relative (${expected.what})`, () => {
      const result = runs.get(name);
      expect(result?.stderr).toBe('');
      expect(result?.code).toBe(0);
      const got = JSON.parse(result?.stdout ?? '{}') as Record<string, unknown>;
      expect(got.unit).toBe(expected.unit);
      expect(String(got.caution)).toMatch(/licensed engineer/);
      for (const [key, { value, scale }] of Object.entries(expected.values)) {
        const actual = got[key];
        expect(typeof actual, key).toBe('number');
        const allowed = expected.tolerance.relative * Math.max(Math.abs(value), scale ?? 0);
        expect(Math.abs((actual as number) - value), `${key}: got ${String(actual)}, expected ${value} ± ${allowed}`).toBeLessThanOrEqual(allowed);
      }
    });
  }
});
