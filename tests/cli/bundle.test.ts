// The launcher's bundle (cli/bundle.mjs): when a stored bundle counts as current, and that the
// bundled tool and the TypeScript sources run through tsx print exactly the same thing.
import { execFile } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { RECIPE, stampIsCurrent } from '../../cli/bundle.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const launcher = join(here, '..', '..', 'cli', 'sectionsmith.mjs');

const onDisk: Record<string, readonly [number, number]> = { 'core/a.ts': [120, 1000.5], 'cli/b.ts': [64, 2000.25] };
const fingerprintOf = (file: string): readonly [number, number] => {
  const f = onDisk[file];
  if (!f) throw Object.assign(new Error(`ENOENT: ${file}`), { code: 'ENOENT' });
  return f;
};
const stamp = (inputs: [string, number, number][], recipe = RECIPE) => ({ recipe, inputs });

describe('stampIsCurrent', () => {
  it('is true when every input has the stored size and mtime', () => {
    expect(stampIsCurrent(stamp([['core/a.ts', 120, 1000.5], ['cli/b.ts', 64, 2000.25]]), fingerprintOf)).toBe(true);
  });
  it('is false when one input has another mtime (a saved edit), even with the same size', () => {
    expect(stampIsCurrent(stamp([['core/a.ts', 120, 1000.5], ['cli/b.ts', 64, 2000]]), fingerprintOf)).toBe(false);
  });
  it('is false when one input has another size', () => {
    expect(stampIsCurrent(stamp([['core/a.ts', 121, 1000.5]]), fingerprintOf)).toBe(false);
  });
  it('is false when an input is gone, the stamp is of another recipe, empty or not a stamp', () => {
    expect(stampIsCurrent(stamp([['core/gone.ts', 1, 1]]), fingerprintOf)).toBe(false);
    expect(stampIsCurrent(stamp([['core/a.ts', 120, 1000.5]], RECIPE + 1), fingerprintOf)).toBe(false);
    expect(stampIsCurrent(stamp([]), fingerprintOf)).toBe(false);
    expect(stampIsCurrent(null, fingerprintOf)).toBe(false);
    expect(stampIsCurrent({ recipe: RECIPE, inputs: 'core/a.ts' }, fingerprintOf)).toBe(false);
  });
});

function run(env: Record<string, string>, ...args: string[]): Promise<{ code: number; out: string; err: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [launcher, ...args], { env: { ...process.env, ...env } }, (error, out, err) => {
      resolve({ code: error ? Number(error.code ?? 1) : 0, out, err });
    });
  });
}

describe('bundled and unbundled runs', () => {
  const golden = join(here, '..', 'golden', 'plate-girder', 'input.json');
  it('print byte-identical JSON for a golden document, and the same message and exit code 2 for a missing file', async () => {
    const [bundled, sources] = await Promise.all([run({}, 'props', golden, '--json'), run({ SECTIONSMITH_NO_BUNDLE: '1' }, 'props', golden, '--json')]);
    expect(bundled.code).toBe(0);
    expect(bundled.out).toBe(sources.out);
    expect(JSON.parse(bundled.out)).toHaveProperty('Ix');
    const [a, b] = await Promise.all([run({}, 'props', '/nonexistent/x.json'), run({ SECTIONSMITH_NO_BUNDLE: '1' }, 'props', '/nonexistent/x.json')]);
    expect([a.code, b.code]).toEqual([2, 2]);
    expect(a.err).toBe(b.err);
    expect(a.err).toContain('/nonexistent/x.json: cannot read the file: no such file');
  }, 30_000);
});
