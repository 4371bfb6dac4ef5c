import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createDebouncedWriter, createRecoveryStore, type RecoveryStore } from '../../electron/recovery.ts';
import { editedDocumentText } from './children/edits.ts';
import { seededRandom, sleep, spawnChild } from './kill.ts';

let folder = '';
beforeEach(() => {
  folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-recovery-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const revisionOf = (text: string): number => Number(/revision (\d+)/.exec(text)?.[1]);

describe('recovery store', () => {
  it('reads null when nothing was left, the text after a write, and null again after clear', async () => {
    const store = createRecoveryStore(path.join(folder, 'data'));
    expect(await store.read()).toBeNull();
    await store.write('{"name":"unsaved"}');
    expect(await store.read()).toBe('{"name":"unsaved"}');
    await store.clear();
    expect(await store.read()).toBeNull();
  });

  it('the debounced writer writes only the last of several quick changes, once, within the delay', async () => {
    const written: (string | null)[] = [];
    const store: RecoveryStore = {
      path: '',
      write: async (text) => void written.push(text),
      read: async () => null,
      clear: async () => void written.push(null),
    };
    const writer = createDebouncedWriter(store, 30, (e) => { throw e; });
    writer.schedule('a');
    writer.schedule('b');
    writer.schedule('c');
    expect(written).toEqual([]);
    await sleep(80);
    expect(written).toEqual(['c']);
    writer.schedule(null);
    await writer.flush();
    expect(written).toEqual(['c', null]);
  });
});

describe('recovery writer during a continuous drag', () => {
  it('changes every 5 ms for 150 ms with a 30 ms delay are still written during the drag (at least 3 writes), the last text last', async () => {
    const written: string[] = [];
    const store: RecoveryStore = { path: '', write: async (t) => void written.push(t), read: async () => null, clear: async () => undefined };
    const writer = createDebouncedWriter(store, 30, (e) => { throw e; });
    for (let i = 1; i <= 30; i += 1) {
      writer.schedule(`revision ${i}`);
      await sleep(5);
    }
    await writer.flush();
    expect(written.length).toBeGreaterThanOrEqual(3);
    expect(written.at(-1)).toBe('revision 30');
  });
});

describe('recovery under SIGKILL mid-edit', () => {
  it('killed at 6 seeded random moments while editing, the recovery file holds a complete, parseable revision no older than the last one reported written', async () => {
    const random = seededRandom(7310);
    for (let run = 0; run < 6; run += 1) {
      const data = path.join(folder, `run-${run}`);
      const child = spawnChild('edit-loop.ts', [data, '15']);
      await child.waitForLine((line) => line.startsWith('written '));
      await sleep(Math.floor(random() * 80));
      await child.kill();
      const reported = child.lines.filter((l) => l.startsWith('written ')).map((l) => Number(l.slice(8)));
      const text = await createRecoveryStore(data).read();
      expect(text).not.toBeNull();
      const document = JSON.parse(text ?? '') as { format: string; parts: unknown[] };
      expect(document.format).toBe('sectionsmith-section');
      const revision = revisionOf(text ?? '');
      // Exactly the text the editor produced for that revision: nothing partial, nothing mixed.
      expect(text).toBe(editedDocumentText(revision));
      expect(revision).toBeGreaterThanOrEqual(reported.at(-1) ?? 0);
      expect(readFileSync(createRecoveryStore(data).path, 'utf8')).toBe(text);
    }
  });
});
