/**
 * The desktop host's settings store (electron/settings.ts) under Node, and the payload checks of
 * the channels behind openTable, readSetting and writeSetting (electron/payloads.ts).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { checkedArgs, RejectedMessage } from '../../electron/payloads.ts';
import { createSettingsStore, SETTING_KEY_MAX, SETTINGS_MAX_ENTRIES } from '../../electron/settings.ts';

let folder = '';
beforeEach(() => {
  folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-settings-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('settings store', () => {
  it('reads null for an unknown key, the value after a write, null again after forgetting it', async () => {
    const store = createSettingsStore(path.join(folder, 'data'));
    expect(await store.read('check-mapping:3:0a1b2c3d')).toBeNull();
    await store.write('check-mapping:3:0a1b2c3d', '{"headers":["a","b","c"]}');
    expect(await store.read('check-mapping:3:0a1b2c3d')).toBe('{"headers":["a","b","c"]}');
    await store.write('check-mapping:3:0a1b2c3d', null);
    expect(await store.read('check-mapping:3:0a1b2c3d')).toBeNull();
  });

  it('keys named like Object.prototype members are settings like any other (issue 18 finding 1): read null before a write, the value after', async () => {
    const store = createSettingsStore(folder);
    for (const key of ['constructor', 'toString', '__proto__', 'valueOf', 'hasOwnProperty']) {
      expect(await store.read(key), key).toBeNull();
      await store.write(key, `kept ${key}`);
    }
    const again = createSettingsStore(folder);
    for (const key of ['constructor', 'toString', '__proto__', 'valueOf', 'hasOwnProperty']) expect(await again.read(key), key).toBe(`kept ${key}`);
  });

  it('keeps every one of 20 writes started together (queued, none lost), and a new store reads them from disk', async () => {
    const store = createSettingsStore(folder);
    await Promise.all(Array.from({ length: 20 }, (_, i) => store.write(`k${i}`, `v${i}`)));
    const again = createSettingsStore(folder);
    for (let i = 0; i < 20; i++) expect(await again.read(`k${i}`)).toBe(`v${i}`);
  });

  it('a damaged file reads as empty and is replaced by the next write', async () => {
    mkdirSync(folder, { recursive: true });
    writeFileSync(path.join(folder, 'settings.json'), '{"k": "v", ');
    const store = createSettingsStore(folder);
    expect(await store.read('k')).toBeNull();
    await store.write('k', 'w');
    expect(JSON.parse(readFileSync(store.path, 'utf8'))).toEqual({ k: 'w' });
  });

  it(`keeps at most ${SETTINGS_MAX_ENTRIES} entries, dropping the oldest written first`, async () => {
    const store = createSettingsStore(folder);
    mkdirSync(folder, { recursive: true });
    writeFileSync(store.path, JSON.stringify(Object.fromEntries(Array.from({ length: SETTINGS_MAX_ENTRIES }, (_, i) => [`k${i}`, 'x']))));
    await store.write('newest', 'y');
    const all = JSON.parse(readFileSync(store.path, 'utf8')) as Record<string, string>;
    expect(Object.keys(all)).toHaveLength(SETTINGS_MAX_ENTRIES);
    expect(all.k0).toBeUndefined();
    expect(all.k1).toBe('x');
    expect(all.newest).toBe('y');
  });

  it('refuses keys with folders or spaces and keys that are too long, naming the key', async () => {
    const store = createSettingsStore(folder);
    await expect(store.read('../x')).rejects.toThrow(/setting key "..\/x"/);
    expect(() => store.write('a b', 'v')).toThrow(/letters, digits/);
    expect(() => store.write('k'.repeat(SETTING_KEY_MAX + 1), 'v')).toThrow(/1–200 characters/);
  });
});

describe('payloads of the table and settings channels', () => {
  it('table:open takes nothing; settings:read a key; settings:write a key and text or null', () => {
    expect(checkedArgs('table:open', [])).toEqual([]);
    expect(() => checkedArgs('table:open', ['/etc/passwd'])).toThrow(RejectedMessage);
    expect(checkedArgs('settings:read', ['check-mapping:3:0a1b2c3d'])).toEqual(['check-mapping:3:0a1b2c3d']);
    expect(checkedArgs('settings:write', ['k', null])).toEqual(['k', null]);
    expect(checkedArgs('settings:write', ['k', 'text'])).toEqual(['k', 'text']);
  });

  it('refuses a key with a folder, a non-text value and missing arguments, naming the channel', () => {
    expect(() => checkedArgs('settings:read', ['../../secrets'])).toThrow(/settings:read: rejected payload at argument 0/);
    expect(() => checkedArgs('settings:write', ['k', 42])).toThrow(/settings:write: rejected payload at argument 1/);
    expect(() => checkedArgs('settings:write', ['k'])).toThrow(/settings:write: rejected payload/);
  });
});
