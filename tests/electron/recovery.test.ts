import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createDebouncedWriter, createRecoveryStore, recoveryFileName, type RecoveryStore } from '../../electron/recovery.ts';
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
    expect(await store.leftBehind()).toEqual([]);
    await store.write('{"name":"unsaved"}');
    expect(await store.read()).toBe('{"name":"unsaved"}');
    expect(await store.leftBehind()).toEqual([]); // its own copy is not "left behind"
    await store.clear();
    expect(await store.read()).toBeNull();
  });

  it('the debounced writer writes only the last of several quick changes, once, within the delay', async () => {
    const written: (string | null)[] = [];
    const store: RecoveryStore = {
      ...createRecoveryStore(folder),
      write: async (text) => void written.push(text),
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
    const store: RecoveryStore = { ...createRecoveryStore(folder), write: async (t) => void written.push(t), clear: async () => undefined };
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
      // The next session finds the killed one's copy among those left behind.
      const next = createRecoveryStore(data);
      const left = await next.leftBehind();
      expect(left.length).toBe(1);
      const text = left[0]?.text ?? null;
      expect(text).not.toBeNull();
      const document = JSON.parse(text ?? '') as { format: string; parts: unknown[] };
      expect(document.format).toBe('sectionsmith-section');
      const revision = revisionOf(text ?? '');
      // Exactly the text the editor produced for that revision: nothing partial, nothing mixed.
      expect(text).toBe(editedDocumentText(revision));
      expect(revision).toBeGreaterThanOrEqual(reported.at(-1) ?? 0);
      expect(readFileSync(path.join(data, recoveryFileName(left[0]?.id ?? '')), 'utf8')).toBe(text);
    }
  });
});

// Issue 18 §2: with one recovery file, window B's copy replaced window A's, and a clean exit of
// instance B removed instance A's file. Each window now owns its own copy.
describe('recovery copies per window', () => {
  it('two windows keep two copies; B writing never replaces A, and B clearing (a clean exit) never removes A', async () => {
    const data = path.join(folder, 'data');
    const a = createRecoveryStore(data);
    const b = createRecoveryStore(data);
    expect(a.id).not.toBe(b.id);
    await a.write('window A: 2 parts');
    await b.write('window B: 6 parts');
    expect(await a.read()).toBe('window A: 2 parts');
    await b.clear();
    expect(await a.read()).toBe('window A: 2 parts');
    expect(readdirSync(data)).toEqual([recoveryFileName(a.id)]);
  });

  it('the next start is offered every copy left behind, newest first, each with its own text, and its own copy is not among them', async () => {
    const data = path.join(folder, 'data');
    const a = createRecoveryStore(data);
    const b = createRecoveryStore(data);
    await a.write('window A');
    await sleep(20);
    await b.write('window B');
    const next = createRecoveryStore(data);
    await next.write('the new window');
    const left = await next.leftBehind();
    expect(left.map((c) => c.text)).toEqual(['window B', 'window A']);
    expect(left.map((c) => c.id)).toEqual([b.id, a.id]);
    expect(left[0]?.savedAt).toBeGreaterThanOrEqual(left[1]?.savedAt ?? Infinity);
  });

  it('discarding one left-behind copy removes that one only; the own copy and malformed IDs are refused', async () => {
    const data = path.join(folder, 'data');
    const a = createRecoveryStore(data);
    const b = createRecoveryStore(data);
    await a.write('A');
    await b.write('B');
    const next = createRecoveryStore(data);
    await next.write('mine');
    await next.discard(a.id);
    expect((await next.leftBehind()).map((c) => c.text)).toEqual(['B']);
    await expect(next.discard(next.id)).rejects.toThrow(/own recovery copy/);
    await expect(next.discard('../settings')).rejects.toThrow(/not a recovery copy/);
    await expect(next.discard('')).rejects.toThrow(/not a recovery copy/);
    expect(await next.read()).toBe('mine');
  });

  it('the single recovery file of earlier versions is offered as a copy left behind', async () => {
    const data = path.join(folder, 'data');
    mkdirSync(data);
    writeFileSync(path.join(data, 'unsaved-work.section.json'), 'from an earlier version');
    const left = await createRecoveryStore(data).leftBehind();
    expect(left.map((c) => [c.id, c.text])).toEqual([['work', 'from an earlier version']]);
  });
});
