import { mkdtempSync, promises as fs, readdirSync, readFileSync, rmSync, writeFileSync, existsSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupPathFor, saveAtomically, SaveError, tempPathFor, type SaveFs } from '../../electron/save.ts';
import { versionOf, versionText } from './children/versions.ts';
import { seededRandom, sleep, spawnChild } from './kill.ts';

let folder = '';
beforeEach(() => {
  folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-save-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('saveAtomically', () => {
  it('writes the text exactly and keeps the previous version as NAME.bak', async () => {
    const target = path.join(folder, 'footbridge box.section.json');
    writeFileSync(target, 'old text');
    const outcome = await saveAtomically(target, 'new text ✓');
    expect(readFileSync(target, 'utf8')).toBe('new text ✓');
    expect(outcome.backupPath).toBe(`${target}.bak`);
    expect(readFileSync(`${target}.bak`, 'utf8')).toBe('old text');
    expect(outcome.bytes).toBe(Buffer.byteLength('new text ✓'));
  });

  it('creates a new file without a backup and leaves no temporary file behind', async () => {
    const target = path.join(folder, 'new.section.json');
    const outcome = await saveAtomically(target, 'first');
    expect(outcome.backupPath).toBeNull();
    expect(readdirSync(folder)).toEqual(['new.section.json']);
  });

  it('keeps no backup when asked not to (exports)', async () => {
    const target = path.join(folder, 'drawing.svg');
    writeFileSync(target, 'old');
    await saveAtomically(target, 'new', { keepBackup: false });
    expect(existsSync(backupPathFor(target))).toBe(false);
  });

  it('refuses a relative path', async () => {
    await expect(saveAtomically('relative.section.json', 'x')).rejects.toThrow(/not absolute/);
  });

  it('fails with "the folder does not exist" and writes nothing when the folder is missing', async () => {
    const target = path.join(folder, 'missing', 'a.section.json');
    await expect(saveAtomically(target, 'x')).rejects.toThrow(/the folder does not exist \(ENOENT\)/);
    expect(existsSync(path.join(folder, 'missing'))).toBe(false);
  });

  it('fails naming the folder in the way when the target is a folder, leaving it untouched', async () => {
    const target = path.join(folder, 'taken.section.json');
    mkdirSync(target);
    const error = await saveAtomically(target, 'x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(SaveError);
    expect((error as SaveError).message).toMatch(/a folder of that name is in the way/);
    expect(readdirSync(folder)).toEqual(['taken.section.json']);
  });

  it('leaves the old file intact and says "the disk is full" when writing fails with ENOSPC', async () => {
    const target = path.join(folder, 'full.section.json');
    writeFileSync(target, 'the old version');
    const fullDisk: SaveFs = {
      ...fs,
      open: (async (...args: Parameters<typeof fs.open>) => {
        const handle = await fs.open(...args);
        return Object.assign(handle, {
          writeFile: async () => {
            throw Object.assign(new Error('no space left on device'), { code: 'ENOSPC' });
          },
        });
      }) as typeof fs.open,
    };
    await expect(saveAtomically(target, 'the new version', { fs: fullDisk })).rejects.toThrow(
      /Could not save ".*full\.section\.json" \(failed to write the new version\): the disk is full \(ENOSPC\)\. The file on disk is unchanged\./,
    );
    expect(readFileSync(target, 'utf8')).toBe('the old version');
    expect(readdirSync(folder)).toEqual(['full.section.json']);
  });

  it('leaves the old file intact when the final rename fails', async () => {
    const target = path.join(folder, 'locked.section.json');
    writeFileSync(target, 'kept');
    const lockedRename: SaveFs = {
      ...fs,
      rename: async (from, to) => {
        if (to === target) throw Object.assign(new Error('busy'), { code: 'EBUSY' });
        return fs.rename(from, to);
      },
    };
    await expect(saveAtomically(target, 'lost', { fs: lockedRename })).rejects.toThrow(/failed to replace the file\): the file is locked by another program \(EBUSY\)/);
    expect(readFileSync(target, 'utf8')).toBe('kept');
    expect(existsSync(tempPathFor(target, process.pid))).toBe(false);
  });
});

describe('saveAtomically under SIGKILL', () => {
  it('a save killed half way through its write leaves the old file whole, and the next save removes the dead temp file', async () => {
    const target = path.join(folder, 'rail.section.json');
    writeFileSync(target, versionText(0));
    const child = spawnChild('save-loop.ts', [target, 'hang']);
    await child.waitForLine((line) => line === 'half-written');
    await child.kill();
    const pid = child.process.pid ?? -1;
    expect(existsSync(tempPathFor(target, pid))).toBe(true); // the kill really landed mid-write
    expect(versionOf(readFileSync(target, 'utf8'))).toBe(0);
    await saveAtomically(target, versionText(9));
    expect(existsSync(tempPathFor(target, pid))).toBe(false);
    expect(versionOf(readFileSync(target, 'utf8'))).toBe(9);
  });

  it('killed at 8 seeded random moments during a save loop, the file is always one complete version, never partial', async () => {
    const random = seededRandom(20261201);
    const target = path.join(folder, 'rail.section.json');
    writeFileSync(target, versionText(0));
    for (let run = 0; run < 8; run += 1) {
      const before = versionOf(readFileSync(target, 'utf8'));
      const child = spawnChild('save-loop.ts', [target]);
      await child.waitForLine((line) => line.startsWith('begin '));
      await sleep(Math.floor(random() * 60));
      await child.kill();
      const saved = child.lines.filter((l) => l.startsWith('saved ')).map((l) => Number(l.slice(6)));
      const lastSaved = saved.at(-1) ?? 0;
      const now = versionOf(readFileSync(target, 'utf8'));
      // Either the last save the child reported, or the one it was in the middle of (renamed, not yet reported).
      expect(now === lastSaved || now === lastSaved + 1 || (saved.length === 0 && now === before)).toBe(true);
      if (existsSync(backupPathFor(target))) expect(versionOf(readFileSync(backupPathFor(target), 'utf8'))).not.toBeNull();
    }
  });
});
