import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readRecentFiles, RECENT_LIMIT, withRecent, writeRecentFiles } from '../../electron/recent-files.ts';

let folder = '';
beforeEach(() => {
  folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-recent-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('recent files', () => {
  it('puts the newest first, keeps each file once and at most RECENT_LIMIT entries', () => {
    let list = withRecent([], '/w/a.section.json');
    list = withRecent(list, '/w/b.section.json');
    list = withRecent(list, '/w/a.section.json');
    expect(list).toEqual([{ name: 'a.section.json', handle: '/w/a.section.json' }, { name: 'b.section.json', handle: '/w/b.section.json' }]);
    for (let i = 0; i < 2 * RECENT_LIMIT; i += 1) list = withRecent(list, `/w/${i}.section.json`);
    expect(list).toHaveLength(RECENT_LIMIT);
    expect(list[0]?.handle).toBe(`/w/${2 * RECENT_LIMIT - 1}.section.json`);
  });

  it('reads back what was written, dropping files that no longer exist', async () => {
    const kept = path.join(folder, 'kept.section.json');
    writeFileSync(kept, '{}');
    const store = path.join(folder, 'data', 'recent-files.json');
    await writeRecentFiles(store, withRecent(withRecent([], path.join(folder, 'gone.section.json')), kept));
    expect(await readRecentFiles(store)).toEqual([{ name: 'kept.section.json', handle: kept }]);
  });

  it('starts an empty list from a missing, damaged or wrongly shaped file', async () => {
    const store = path.join(folder, 'recent-files.json');
    expect(await readRecentFiles(store)).toEqual([]);
    writeFileSync(store, '[{"name": ');
    expect(await readRecentFiles(store)).toEqual([]);
    writeFileSync(store, JSON.stringify([{ name: 'x', handle: 'relative/x.json' }]));
    expect(await readRecentFiles(store)).toEqual([]);
  });
});
