/**
 * Small settings kept between sessions for the desktop host (main process only): the renderer's
 * readSetting / writeSetting (renderer/host/host.ts), e.g. the table check's remembered column
 * mappings. One JSON object of text values in the app's data folder, written atomically
 * (saveAtomically, no backup) so a kill leaves the old file or the new one. Writes are queued, so
 * two quick changes never lose one another. A damaged file is read as empty (settings are a
 * convenience, never a reason to refuse to start) and replaced at the next write.
 *
 * Limits (the payload schema checks them too, electron/payloads.ts): keys of at most
 * SETTING_KEY_MAX characters from [A-Za-z0-9._:-]; values of at most SETTING_VALUE_MAX characters;
 * at most SETTINGS_MAX_ENTRIES entries, the oldest written dropped first.
 */
import { promises as nodeFs } from 'node:fs';
import path from 'node:path';
import { errorCode, saveAtomically } from './save.ts';

export const SETTINGS_FILE_NAME = 'settings.json';
export const SETTING_KEY_MAX = 200;
export const SETTING_VALUE_MAX = 1024 * 1024;
export const SETTINGS_MAX_ENTRIES = 500;
export const SETTING_KEY = /^[A-Za-z0-9._:-]+$/;

export interface SettingsStore {
  readonly path: string;
  read(key: string): Promise<string | null>;
  /** Keeps `value` under `key` (null forgets it); a bad key or an oversized value throws at once. */
  write(key: string, value: string | null): Promise<void>;
}

function checkKey(key: string): void {
  if (key.length === 0 || key.length > SETTING_KEY_MAX || !SETTING_KEY.test(key)) {
    throw new Error(`setting key ${JSON.stringify(key.slice(0, 40))} is not 1–${SETTING_KEY_MAX} characters of letters, digits and . _ : -`);
  }
}

export function createSettingsStore(folder: string): SettingsStore {
  const file = path.join(folder, SETTINGS_FILE_NAME);
  // A Map, never a plain object: keys are the renderer's text, and "constructor" or "__proto__"
  // looked up on an object find Object.prototype's members instead of a setting.
  const load = async (): Promise<Map<string, string>> => {
    let text: string;
    try {
      text = await nodeFs.readFile(file, 'utf8');
    } catch (error) {
      if (errorCode(error) === 'ENOENT') return new Map();
      throw error;
    }
    try {
      const value: unknown = JSON.parse(text);
      if (typeof value !== 'object' || value === null || Array.isArray(value)) return new Map();
      return new Map(Object.entries(value).filter((e): e is [string, string] => typeof e[1] === 'string' && SETTING_KEY.test(e[0])));
    } catch {
      return new Map(); // damaged: read as empty, replaced at the next write
    }
  };
  let queue: Promise<unknown> = Promise.resolve();
  return {
    path: file,
    async read(key) {
      checkKey(key);
      await queue.catch(() => undefined);
      return (await load()).get(key) ?? null;
    },
    write(key, value) {
      checkKey(key);
      if (value !== null && value.length > SETTING_VALUE_MAX) throw new Error(`setting "${key}" is ${value.length} characters; at most ${SETTING_VALUE_MAX} are kept`);
      const next = queue.catch(() => undefined).then(async () => {
        const all = await load();
        all.delete(key); // re-inserted last: the newest entry
        if (value !== null) all.set(key, value);
        const keys = [...all.keys()];
        for (const old of keys.slice(0, Math.max(0, keys.length - SETTINGS_MAX_ENTRIES))) all.delete(old);
        await nodeFs.mkdir(folder, { recursive: true });
        // Object.fromEntries defines own properties, so even "__proto__" is written as a key.
        await saveAtomically(file, `${JSON.stringify(Object.fromEntries(all))}\n`, { keepBackup: false });
      });
      queue = next;
      return next;
    },
  };
}
