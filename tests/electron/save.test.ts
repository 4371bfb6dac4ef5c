import { chmodSync, constants, existsSync, lstatSync, mkdirSync, mkdtempSync, promises as fs, readdirSync, readFileSync, realpathSync, rmSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupPathFor, isTempOf, saveAtomically, SaveError, type SaveFs } from '../../electron/save.ts';
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
    expect(readdirSync(folder).filter((n) => isTempOf(target, n, process.pid))).toEqual([]);
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
    expect(readdirSync(folder).filter((n) => isTempOf(target, n, pid)).length).toBe(1); // the kill really landed mid-write
    expect(versionOf(readFileSync(target, 'utf8'))).toBe(0);
    await saveAtomically(target, versionText(9));
    expect(readdirSync(folder).filter((n) => isTempOf(target, n, pid))).toEqual([]);
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

// Hardening finding 7: the atomic save kept neither the file's mode nor its symlink, and its
// temporary file had a predictable name opened with 'w' (so a link planted there was followed).
describe('saveAtomically keeps what the file is', () => {
  it('saving over a 0600 file leaves it 0600, and its backup too (POSIX modes)', async () => {
    if (process.platform === 'win32') return;
    const target = path.join(folder, 'private.section.json');
    writeFileSync(target, 'old', { mode: 0o600 });
    chmodSync(target, 0o600);
    await saveAtomically(target, 'new');
    expect(statSync(target).mode & 0o777).toBe(0o600);
    expect(statSync(backupPathFor(target)).mode & 0o777).toBe(0o600);
  });

  it('a group-writable 0664 file stays 0664 whatever the umask strips from a new file', async () => {
    if (process.platform === 'win32') return;
    const target = path.join(folder, 'shared.section.json');
    writeFileSync(target, 'old');
    chmodSync(target, 0o664);
    await saveAtomically(target, 'new');
    expect(statSync(target).mode & 0o777).toBe(0o664);
  });

  it('saving through a symlink writes the file it points to and leaves the link a link', async () => {
    if (process.platform === 'win32') return;
    mkdirSync(path.join(folder, 'real'));
    const real = path.join(folder, 'real', 'girder.section.json');
    writeFileSync(real, 'old');
    const link = path.join(folder, 'girder-link.section.json');
    symlinkSync(path.join('real', 'girder.section.json'), link);
    const outcome = await saveAtomically(link, 'new');
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(readFileSync(real, 'utf8')).toBe('new');
    expect(outcome.path).toBe(realpathSync(real));
    expect(readFileSync(`${real}.bak`, 'utf8')).toBe('old');
    expect(readdirSync(folder).sort()).toEqual(['girder-link.section.json', 'real']);
  });

  it('a link through a link to a file that does not exist yet creates that file', async () => {
    if (process.platform === 'win32') return;
    const real = path.join(folder, 'later.section.json');
    symlinkSync(real, path.join(folder, 'hop1'));
    symlinkSync(path.join(folder, 'hop1'), path.join(folder, 'hop2'));
    await saveAtomically(path.join(folder, 'hop2'), 'created');
    expect(readFileSync(real, 'utf8')).toBe('created');
    expect(lstatSync(path.join(folder, 'hop2')).isSymbolicLink()).toBe(true);
  });

  it('a link planted at the old predictable temporary name is never followed: the file it points to is untouched', async () => {
    if (process.platform === 'win32') return;
    const target = path.join(folder, 'deck.section.json');
    writeFileSync(target, 'old');
    const victim = path.join(folder, 'victim.txt');
    writeFileSync(victim, 'not yours');
    symlinkSync(victim, path.join(folder, `.deck.section.json.${process.pid}.sectionsmith-tmp`));
    await saveAtomically(target, 'new');
    expect(readFileSync(victim, 'utf8')).toBe('not yours');
    expect(readFileSync(target, 'utf8')).toBe('new');
    expect(lstatSync(target).isSymbolicLink()).toBe(false);
  });

  it('opens every temporary file exclusively ("wx") under a random name, different on each save', async () => {
    const target = path.join(folder, 'frame.section.json');
    writeFileSync(target, 'old');
    const opened: { file: string; flags: unknown }[] = [];
    const copied: { file: string; mode: unknown }[] = [];
    const spying: SaveFs = {
      ...fs,
      open: (async (file: string, flags: unknown, mode?: number) => {
        opened.push({ file: path.basename(String(file)), flags });
        return fs.open(file, flags as string, mode);
      }) as typeof fs.open,
      copyFile: (async (from: string, to: string, mode?: number) => {
        copied.push({ file: path.basename(String(to)), mode });
        return fs.copyFile(from, to, mode);
      }) as typeof fs.copyFile,
    };
    await saveAtomically(target, 'one', { fs: spying });
    await saveAtomically(target, 'two', { fs: spying });
    // The document's own temporary file (the backup's is made by copyFile, checked below).
    const temps = opened.filter((o) => /^\.frame\.section\.json\.\d/.test(o.file));
    expect(temps.length).toBe(2);
    expect(copied.length).toBe(2);
    for (const c of copied) {
      expect(c.file).toMatch(/\.sectionsmith-tmp$/);
      expect(Number(c.mode) & constants.COPYFILE_EXCL).toBe(constants.COPYFILE_EXCL);
    }
    expect(copied[0]?.file).not.toBe(copied[1]?.file);
    for (const t of temps) {
      expect(t.flags).toBe('wx');
      expect(t.file).toMatch(new RegExp(`^\\.frame\\.section\\.json\\.${process.pid}\\.[0-9a-f]{16}\\.sectionsmith-tmp$`));
    }
    expect(temps[0]?.file).not.toBe(temps[1]?.file);
  });
});

describe('saveAtomically refuses what it cannot follow', () => {
  it('links that go round in a loop give a message naming the loop, and nothing is written', async () => {
    if (process.platform === 'win32') return;
    symlinkSync(path.join(folder, 'b'), path.join(folder, 'a'));
    symlinkSync(path.join(folder, 'a'), path.join(folder, 'b'));
    await expect(saveAtomically(path.join(folder, 'a'), 'x')).rejects.toThrow(/failed to follow the link to the file\): the symbolic links go round in a loop \(ELOOP\)/);
    expect(readdirSync(folder).sort()).toEqual(['a', 'b']);
  });
});
