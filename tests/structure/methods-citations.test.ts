/**
 * Every "docs/methods.md §N" cited in the code and tests names a section that exists in
 * docs/methods.md, and nothing cites a methods note outside the repository.
 * Source: the files themselves, read as text.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '../..');
const SELF = relative(ROOT, __filename);

function files(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (name === 'node_modules' || name === 'artifacts') continue;
    if (statSync(path).isDirectory()) out.push(...files(path));
    else if (/\.(ts|tsx|mjs|json|csv)$/.test(name)) out.push(path);
  }
  return out;
}

const CITATION = /docs\/methods\.md §(\d+(?:\.\d+)?)(?:[–-](\d+(?:\.\d+)?))?/g;
const HEADING = /^#{2,3} §(\d+(?:\.\d+)?) /gm;

/** Section numbers cited in a text; a range "§7.1–7.5" cites both ends. */
function citedSections(text: string): string[] {
  const out: string[] = [];
  for (const m of text.matchAll(CITATION)) out.push(m[1] as string, ...(m[2] ? [m[2]] : []));
  return out;
}

const sections = new Set([...readFileSync(join(ROOT, 'docs/methods.md'), 'utf8').matchAll(HEADING)].map((m) => m[1] as string));
const sources = ['core', 'cli', 'renderer', 'electron', 'tests'].flatMap((d) => files(join(ROOT, d))).filter((f) => relative(ROOT, f) !== SELF);

describe('docs/methods.md citations', () => {
  it('reads citations and ranges (the checker itself)', () => {
    expect(citedSections('see docs/methods.md §2.4 and docs/methods.md §7.1–7.5; docs/methods.md §11.')).toEqual(['2.4', '7.1', '7.5', '11']);
    expect(sections.has('99.9')).toBe(false);
  });

  it('has the sections the code builds on', () => {
    for (const s of ['0', '1.1', '1.3', '2.4', '3', '5.3', '6', '7.2', '7.8', '9.1', '9.2', '10', '11', '12']) expect(sections, `§${s}`).toContain(s);
  });

  it('every cited section exists', () => {
    const missing: string[] = [];
    let count = 0;
    for (const f of sources) {
      for (const s of citedSections(readFileSync(f, 'utf8'))) {
        count++;
        if (!sections.has(s)) missing.push(`${relative(ROOT, f)} cites §${s}`);
      }
    }
    expect(missing).toEqual([]);
    expect(count).toBeGreaterThan(100); // the core cites the methods about a hundred times
  });

  it('nothing cites a methods note outside the repository', () => {
    const outside = sources.filter((f) => /\bMETHODS\b|shared\/METHODS/.test(readFileSync(f, 'utf8'))).map((f) => relative(ROOT, f));
    expect(outside).toEqual([]);
  });
});
