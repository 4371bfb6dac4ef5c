/**
 * The import graph of the source tree: no module imports itself through others (a cycle makes
 * load order matter and hides which module owns what), and the document types are a leaf that
 * the materials and section code import, never the other way round.
 * Source: the files themselves, read as text; relative imports only (packages are not ours).
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '../..');

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|tsx)$/.test(name) && !name.endsWith('.d.ts')) out.push(path);
  }
  return out;
}

const IMPORT = /^\s*(?:import|export)\b[^'"]*?\bfrom\s+['"](\.{1,2}\/[^'"]+)['"]/gm;

/** Relative imports of one file, as paths from the repository root (query suffixes like ?raw dropped). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const out: string[] = [];
  for (const m of text.matchAll(IMPORT)) {
    const target = (m[1] as string).replace(/\?.*$/, '');
    if (!/\.(ts|tsx)$/.test(target)) continue;
    out.push(relative(ROOT, resolve(dirname(file), target)));
  }
  return out;
}

function graphOf(dirs: readonly string[]): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const d of dirs) for (const f of sourceFiles(join(ROOT, d))) graph.set(relative(ROOT, f), importsOf(f));
  return graph;
}

/** One cycle per strongly connected component of more than one node (Tarjan), each listed. */
function cycles(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    idx.set(v, index);
    low.set(v, index++);
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!graph.has(w)) continue;
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const comp: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1) found.push(comp.sort());
    }
  };
  for (const v of graph.keys()) if (!idx.has(v)) visit(v);
  return found;
}

describe('import graph', () => {
  it('finds a cycle when there is one (the checker itself)', () => {
    expect(cycles(new Map([['a', ['b']], ['b', ['c']], ['c', ['a']], ['d', ['a']]]))).toEqual([['a', 'b', 'c']]);
    expect(cycles(new Map([['a', ['b']], ['b', []]]))).toEqual([]);
  });

  it('has no cycle between modules of core/', () => {
    expect(cycles(graphOf(['core']))).toEqual([]);
  });

  it('has no cycle between modules of renderer/ (tools switch through the tool table)', () => {
    expect(cycles(graphOf(['renderer']))).toEqual([]);
  });

  it('has no cycle between the folders document, materials and section of core/', () => {
    const folders = ['core/document', 'core/materials', 'core/section'];
    const byFolder = new Map<string, string[]>(folders.map((f) => [f, []]));
    for (const [file, targets] of graphOf(folders)) {
      const from = dirname(file);
      for (const t of targets) if (folders.includes(dirname(t)) && dirname(t) !== from) byFolder.get(from)!.push(dirname(t));
    }
    expect(cycles(byFolder)).toEqual([]);
  });

  it('keeps the document types a leaf: core/document/types.ts imports only unit names', () => {
    expect(importsOf(join(ROOT, 'core/document/types.ts'))).toEqual(['core/units/types.ts']);
  });
});
