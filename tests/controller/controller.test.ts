/**
 * The app controller without React or a browser: start-up, files, recovery, notes, settings,
 * background torsion, keys, and every command by id. Expected values are exact arithmetic on
 * the inputs (grid steps, zoom factors) or what the fake host recorded.
 */
import { describe, expect, it } from 'vitest';
import { newSectionFile, serialiseDocument } from '../../core/document/index.ts';
import type { Part } from '../../core/document/types.ts';
import { COMMAND_IDS, type CommandId } from '../../renderer/controller/commands.ts';
import { DISPLAY_SETTING, EXAMPLE_NAME, NOTE_LIFETIME_MS, RECOVERY_DELAY_MS, SEEN_EXAMPLE_SETTING, TORSION_DELAY_MS } from '../../renderer/controller/controller.ts';
import { KEY_BINDINGS, type KeyInput } from '../../renderer/controller/keymap.ts';
import { EXAMPLE_TEXT, rig, settle, type Rig } from './fakes.ts';
import { importDxf } from '../../core/dxf/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import { readFileSync } from 'node:fs';
import { firstSheetCells, unzip } from '../export/unzip.ts';

const key = (k: string, o: Partial<KeyInput> = {}): KeyInput => ({ key: k, mod: false, shift: false, alt: false, typing: false, ...o });

/** A controller with one 100 × 20 plate (id part-1) at the origin, selected, snapping grid 10. */
function withPlate(setup?: Parameters<typeof rig>[0]): Rig {
  const r = rig(setup);
  r.c.editor.addRectangle({ x: 0, y: 0, width: 100, height: 20 });
  return r;
}

const placed = (r: Rig): [string, number, number][] => r.c.editor.getState().doc.parts.map((p: Part) => [p.id, p.placement.x, p.placement.y]);

describe('start-up', () => {
  it('opens the example on first start and marks it seen only once the canvas has shown it', async () => {
    const r = rig(() => undefined, false);
    await r.c.start();
    expect(r.c.editor.getState().file?.name).toBe(EXAMPLE_NAME);
    expect(r.host.settings.has(SEEN_EXAMPLE_SETTING)).toBe(false); // not shown yet: no canvas size
    r.c.setSize(800, 600);
    await settle();
    expect(r.host.settings.get(SEEN_EXAMPLE_SETTING)).toBe('1');
  });

  it('opens the example again when the page reloaded before it had shown', async () => {
    const first = rig(() => undefined, false);
    await first.c.start();
    first.c.dispose(); // the page died during start-up
    const second = rig((h) => {
      for (const [k, v] of first.host.settings) h.settings.set(k, v);
    });
    await second.c.start();
    expect(second.c.editor.getState().file?.name).toBe(EXAMPLE_NAME);
  });

  it('starts empty once the example has been seen', async () => {
    const r = rig((h) => h.settings.set(SEEN_EXAMPLE_SETTING, '1'));
    await r.c.start();
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  });

  it('opens the file the host was given at start instead of the example', async () => {
    const text = serialiseDocument({ ...newSectionFile('in'), name: 'Trailer frame' });
    const r = rig((h) => (h.launch = { name: 'trailer.section.json', handle: 'h-9', text }));
    await r.c.start();
    expect(r.c.editor.getState().file).toEqual({ name: 'trailer.section.json', handle: 'h-9' });
    expect(r.c.editor.getState().doc.unit).toBe('in');
  });

  it('offers unsaved work of an earlier session; restoring loads it as unsaved, keeps it in its own copy, then removes the old copy', async () => {
    const left = serialiseDocument({ ...newSectionFile('mm'), name: 'Mezzanine flitch beam' });
    const r = rig((h) => {
      h.left = [{ id: 'w1', text: left, savedAt: 1 }];
      h.settings.set(SEEN_EXAMPLE_SETTING, '1');
    });
    await r.c.start();
    expect(r.c.getState().recovery).toEqual({ id: 'w1', text: left, savedAt: 1 });
    await r.c.restoreRecovery();
    expect(r.c.getState().recovery).toBeNull();
    expect(r.c.editor.getState().sectionFile.name).toBe('Mezzanine flitch beam');
    expect(r.c.editor.getState().dirty).toBe(true);
    expect(r.host.recovery).toBe(serialiseDocument(r.c.editor.getState().sectionFile));
    expect(r.host.discarded).toEqual(['w1']);
  });

  it('discarding the offer removes that copy only, and the next copy is offered', async () => {
    const r = rig((h) => (h.left = [{ id: 'w2', text: 'newer', savedAt: 2 }, { id: 'w1', text: 'older', savedAt: 1 }]));
    await r.c.start();
    expect(r.c.getState().recovery?.id).toBe('w2');
    r.c.discardRecovery();
    await settle();
    expect(r.host.discarded).toEqual(['w2']);
    expect(r.c.getState().recovery?.id).toBe('w1');
    r.c.discardRecovery();
    await settle();
    expect(r.c.getState().recovery).toBeNull();
    expect(r.host.recoveryWrites).toEqual([]);
  });

  // Hardening finding 4: "Restore" replaced a 2-part unsaved document with the recovered 6-part one
  // without asking.
  it('Restore asks before replacing unsaved work; declining keeps the document and the offer', async () => {
    const six = { ...newSectionFile('mm'), name: 'Six plates' };
    const r = rig((h) => {
      h.left = [{ id: 'w1', text: serialiseDocument(six), savedAt: 1 }];
      h.settings.set(SEEN_EXAMPLE_SETTING, '1');
      h.discardAnswer = false;
    });
    await r.c.start();
    r.c.editor.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    r.c.editor.addRectangle({ x: 20, y: 0, width: 10, height: 10 });
    await r.c.restoreRecovery();
    expect(r.host.discardAsked.length).toBe(1);
    expect(r.c.editor.getState().doc.parts).toHaveLength(2);
    expect(r.c.getState().recovery?.id).toBe('w1');
    expect(r.host.discarded).toEqual([]);
    r.host.discardAnswer = true;
    await r.c.restoreRecovery();
    expect(r.c.editor.getState().sectionFile.name).toBe('Six plates');
    expect(r.host.discarded).toEqual(['w1']);
  });

  it('reads the display unit and figures from the host settings', async () => {
    const r = rig((h) => {
      h.settings.set(DISPLAY_SETTING, 'in');
      h.settings.set('figures', '6');
    });
    await r.c.start();
    expect(r.c.getState().displayId).toBe('in');
    expect(r.c.getState().sig).toBe(6);
  });
});

describe('background work and recovery', () => {
  it('solves torsion once the drawing has settled for the delay, and cancels on a newer edit', () => {
    const r = withPlate();
    expect(r.torsion.solved).toHaveLength(0);
    r.timers.advance(TORSION_DELAY_MS - 1);
    r.c.editor.moveSelectionBy(10, 0); // a newer edit restarts the wait
    r.timers.advance(TORSION_DELAY_MS - 1);
    expect(r.torsion.solved).toHaveLength(0);
    r.timers.advance(1);
    expect(r.torsion.solved).toEqual([r.c.editor.getState().doc]);
  });

  it('does not solve torsion of a section without properties (nothing drawn)', () => {
    const r = rig();
    r.timers.advance(10 * TORSION_DELAY_MS);
    expect(r.torsion.solved).toHaveLength(0);
  });

  it('Cancel stops a running solve, keeps a finished result, and the next edit solves again', () => {
    const r = withPlate();
    r.timers.advance(TORSION_DELAY_MS);
    expect(r.torsion.solved).toHaveLength(1);
    r.torsion.report({ kind: 'running', fraction: 0.4 });
    const cancels = r.torsion.cancels;
    r.c.cancelTorsion();
    expect(r.torsion.cancels).toBe(cancels + 1);
    expect(r.c.getState().torsion.kind).toBe('cancelled');
    r.c.editor.moveSelectionBy(5, 0);
    r.timers.advance(TORSION_DELAY_MS);
    expect(r.torsion.solved).toHaveLength(2);
    expect(r.torsion.solved[1]).toBe(r.c.editor.getState().doc);
    // A finished result is not thrown away by a Cancel that has nothing to stop.
    const done = { kind: 'done', result: { J: 1, Cw: 0, xs: 0, ys: 0, meshElements: 1, meshNodes: 1, iterations: 1, jRelativeError: 0, components: 1 }, millis: 1, doc: r.c.editor.getState().doc } as const;
    r.torsion.report(done);
    r.c.cancelTorsion();
    expect(r.c.getState().torsion).toBe(done);
  });

  it('reports the runner state in its own state', () => {
    const r = withPlate();
    r.torsion.report({ kind: 'running', fraction: 0.5 });
    expect(r.c.getState().torsion).toEqual({ kind: 'running', fraction: 0.5 });
  });

  it('writes the recovery copy one frame after an edit and clears it when the work is saved', async () => {
    expect(RECOVERY_DELAY_MS).toBeLessThanOrEqual(17); // no later than the next frame at 60 Hz
    const r = withPlate();
    r.timers.advance(RECOVERY_DELAY_MS);
    await settle();
    expect(r.host.recovery).toBe(serialiseDocument(r.c.editor.getState().sectionFile));
    await r.c.run('save');
    expect(r.host.recovery).toBeNull();
  });

  // Issue 18 §2: an edit made 300 ms before the page died was not in the recovery copy.
  it('a pending edit is written at once when the page is hidden or goes away (flushRecovery)', async () => {
    const r = withPlate();
    r.c.flushRecovery();
    await settle();
    expect(r.host.recovery).toBe(serialiseDocument(r.c.editor.getState().sectionFile));
    expect(r.host.recoveryWrites).toHaveLength(1);
    r.timers.advance(10 * RECOVERY_DELAY_MS); // nothing left pending: no second write
    await settle();
    expect(r.host.recoveryWrites).toHaveLength(1);
  });

  // Hardening finding 4: while the offer was unanswered, new edits were not written to recovery.
  it('keeps writing its own copy while an earlier copy is on offer, and never touches that copy', async () => {
    const r = rig((h) => (h.left = [{ id: 'w1', text: 'earlier work', savedAt: 1 }]));
    await r.c.start();
    r.c.editor.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    r.timers.advance(RECOVERY_DELAY_MS);
    await settle();
    expect(r.host.recovery).toBe(serialiseDocument(r.c.editor.getState().sectionFile));
    expect(r.host.left.map((c) => c.text)).toEqual(['earlier work']);
    expect(r.host.discarded).toEqual([]);
    expect(r.c.getState().recovery?.id).toBe('w1');
  });

  // Hardening finding 4: a full storage quota was an unhandled rejection with no banner.
  it('a recovery copy that cannot be kept (storage full) shows an error banner and keeps the document', async () => {
    const r = withPlate((h) => (h.recoveryFailure = 'Unsaved work could not be kept for recovery: the storage quota is full.'));
    const parts = r.c.editor.getState().doc.parts.length;
    r.timers.advance(RECOVERY_DELAY_MS);
    await settle();
    expect(r.c.getState().banner?.kind).toBe('error');
    expect(r.c.getState().banner?.title).toBe('Unsaved work could not be kept for recovery.');
    expect(r.c.getState().banner?.lines).toEqual(['Unsaved work could not be kept for recovery: the storage quota is full.']);
    expect(r.c.editor.getState().doc.parts).toHaveLength(parts);
  });
});

describe('notes, title and settings', () => {
  it('an information note clears itself; an error stays', () => {
    const r = rig();
    r.c.note('Saved x');
    r.timers.advance(NOTE_LIFETIME_MS - 1);
    expect(r.c.getState().banner?.title).toBe('Saved x');
    r.timers.advance(1);
    expect(r.c.getState().banner).toBeNull();
    r.c.error('Could not open y');
    r.timers.advance(10 * NOTE_LIFETIME_MS);
    expect(r.c.getState().banner?.title).toBe('Could not open y');
  });

  it('the window title names the document and marks unsaved work', () => {
    const r = withPlate();
    expect(r.host.titles.at(-1)).toBe('• Untitled section — Sectionsmith');
  });

  it('the display unit and figures are kept through the host, not the page storage', async () => {
    const r = rig();
    r.c.setDisplay('cm');
    r.c.setFigures(5);
    await settle();
    expect(r.host.settings.get(DISPLAY_SETTING)).toBe('cm');
    expect(r.host.settings.get('figures')).toBe('5');
  });

  it('changing the document unit keeps the section the same physical size (25.4 mm per inch, exact)', () => {
    const r = withPlate();
    r.c.changeUnit('in');
    const part = r.c.editor.getState().doc.parts[0];
    expect(part?.type === 'rectangle' ? part.width : NaN).toBeCloseTo(100 / 25.4, 12);
  });

  it('refuses a host command it does not know, with a message', async () => {
    const r = rig();
    await r.c.start();
    r.host.send('make-coffee');
    await settle();
    expect(r.c.getState().banner?.kind).toBe('error');
    expect(r.c.getState().banner?.title).toContain('make-coffee');
  });
});

describe('keys', () => {
  it('Ctrl+S saves even while typing; Ctrl+Z in a text box is the box’s own', () => {
    const r = withPlate();
    expect(r.c.keyDown(key('s', { mod: true, typing: true }))).toBe(true);
    expect(r.c.keyDown(key('z', { mod: true, typing: true }))).toBe(false);
    expect(r.c.editor.getState().doc.parts).toHaveLength(1);
  });

  it('plain letters pick tools, but not while typing', () => {
    const r = rig();
    expect(r.c.keyDown(key('r'))).toBe(true);
    expect(r.c.editor.getState().toolId).toBe('rectangle');
    expect(r.c.keyDown(key('p', { typing: true }))).toBe(false);
    expect(r.c.editor.getState().toolId).toBe('rectangle');
  });

  it('arrows move the selection one grid step, and are left to the page when nothing is selected', () => {
    const r = withPlate();
    expect(r.c.keyDown(key('ArrowLeft'))).toBe(true);
    expect(placed(r)).toEqual([['part-1', -10, 0]]);
    r.c.editor.select([]);
    expect(r.c.keyDown(key('ArrowLeft'))).toBe(false);
  });

  it('Escape, Enter, Delete and Backspace go to the active tool', () => {
    const r = withPlate();
    expect(r.c.keyDown(key('Delete'))).toBe(true);
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  });

  it('every binding names a command that exists, and no chord is bound twice', () => {
    const chords = KEY_BINDINGS.map((b) => b.chord);
    expect(new Set(chords).size).toBe(chords.length);
    for (const b of KEY_BINDINGS) expect(COMMAND_IDS).toContain(b.command);
  });
});


/** Two plates 10 × 10 at (0, 0) and 60 × 20 at (100, 50), both selected. */
function twoPlates(): Rig {
  const r = rig();
  r.c.editor.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
  r.c.editor.addRectangle({ x: 100, y: 50, width: 60, height: 20 });
  r.c.editor.select(['part-1', 'part-2']);
  return r;
}

/** Align: the selection box is x −5 … 130, y −5 … 60; each edge is exact arithmetic on it. */
function alignCases(): Record<'align-left' | 'align-centre-x' | 'align-right' | 'align-top' | 'align-centre-y' | 'align-bottom', () => Promise<void>> {
  const expectPlaced = (id: CommandId, want: [string, number, number][]) => async (): Promise<void> => {
    const r = twoPlates();
    await r.c.run(id);
    expect(placed(r)).toEqual(want);
  };
  return {
    'align-left': expectPlaced('align-left', [['part-1', 0, 0], ['part-2', 25, 50]]),
    'align-centre-x': expectPlaced('align-centre-x', [['part-1', 62.5, 0], ['part-2', 62.5, 50]]),
    'align-right': expectPlaced('align-right', [['part-1', 125, 0], ['part-2', 100, 50]]),
    'align-top': expectPlaced('align-top', [['part-1', 0, 55], ['part-2', 100, 50]]),
    'align-centre-y': expectPlaced('align-centre-y', [['part-1', 0, 27.5], ['part-2', 100, 27.5]]),
    'align-bottom': expectPlaced('align-bottom', [['part-1', 0, 0], ['part-2', 100, 5]]),
  };
}

/** Distribute and touch: three plates of widths (heights) 10, 20, 30 at 0, 100, 130 along each axis. */
function spreadCases(): Record<'distribute-x' | 'distribute-y' | 'space-x' | 'space-y' | 'touch-x' | 'touch-y', () => Promise<void>> {
  const run = (id: CommandId, axis: 'x' | 'y', want: number[]) => async (): Promise<void> => {
    const r = rig();
    [[0, 10], [100, 20], [130, 30]].forEach(([at, size]) =>
      r.c.editor.addRectangle(axis === 'x' ? { x: at as number, y: 0, width: size as number, height: 5 } : { x: 0, y: at as number, width: 5, height: size as number }),
    );
    r.c.editor.select(['part-1', 'part-2', 'part-3']);
    await r.c.run(id);
    expect(r.c.editor.getState().doc.parts.map((p) => (axis === 'x' ? p.placement.x : p.placement.y))).toEqual(want);
  };
  return {
    'distribute-x': run('distribute-x', 'x', [0, 65, 130]),
    'distribute-y': run('distribute-y', 'y', [0, 65, 130]),
    'space-x': run('space-x', 'x', [0, 60, 130]),
    'space-y': run('space-y', 'y', [0, 60, 130]),
    'touch-x': run('touch-x', 'x', [0, 15, 40]),
    'touch-y': run('touch-y', 'y', [0, 15, 40]),
  };
}

/** One check per command: the Record type makes a new command without a test a type error. */
const COMMAND_CASES: Record<CommandId, () => Promise<void>> = {
  async new() {
    const r = withPlate((h) => (h.discardAnswer = false));
    await r.c.run('new');
    expect(r.host.discardAsked).toEqual(['Untitled section']);
    expect(r.c.editor.getState().doc.parts).toHaveLength(1); // kept: the user said no
    r.host.discardAnswer = true;
    await r.c.run('new');
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  },
  async open() {
    const r = withPlate();
    r.c.editor.markSaved({ name: 'a.section.json', handle: null });
    r.host.nextOpen = { name: 'broken.section.json', handle: 'h', text: '{ not json' };
    await r.c.run('open');
    expect(r.c.getState().banner?.kind).toBe('error');
    expect(r.c.editor.getState().doc.parts).toHaveLength(1); // unchanged
    r.host.nextOpen = { name: 'box.section.json', handle: 'h-2', text: EXAMPLE_TEXT };
    await r.c.run('open');
    expect(r.c.editor.getState().file).toEqual({ name: 'box.section.json', handle: 'h-2' });
  },
  async save() {
    const r = withPlate();
    await r.c.run('save');
    expect(r.host.saved).toEqual([{ handle: null, suggested: 'Untitled-section.section.json', text: serialiseDocument(r.c.editor.getState().sectionFile) }]);
    expect(r.c.editor.getState().dirty).toBe(false);
    r.c.editor.moveSelectionBy(1, 0);
    await r.c.run('save'); // now has a handle: saved back to the same file
    expect(r.host.saved[1]?.handle).toBe('h-1');
    expect(r.c.getState().banner?.title).toBe('Saved saved.section.json');
  },
  async 'save-as'() {
    const r = withPlate();
    await r.c.run('save');
    await r.c.run('save-as');
    expect(r.host.saved.map((s) => s.handle)).toEqual([null, null]);
  },
  async 'export-svg'() {
    const r = rig();
    await r.c.run('export-svg');
    expect(r.c.getState().banner?.kind).toBe('error'); // nothing drawn: nothing to export
    r.c.editor.addRectangle({ x: 0, y: 0, width: 100, height: 20 });
    await r.c.run('export-svg');
    expect(r.host.exported[0]?.mimeType).toBe('image/svg+xml');
    expect(r.host.exported[0]?.text).toContain('<svg');
  },
  async 'export-csv'() {
    const r = withPlate();
    await r.c.run('export-csv');
    expect(r.host.exported[0]?.suggestedName).toBe('Untitled-section.csv');
    expect(r.host.exported[0]?.mimeType).toBe('text/csv');
  },
  async 'export-xlsx'() {
    const r = withPlate();
    await r.c.run('export-xlsx');
    const file = r.host.exportedBytes[0];
    expect(file?.suggestedName).toBe('Untitled-section.xlsx');
    expect(file?.mimeType).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    // Read back: the caution in A1 and the plate's area as a number, A = b·h = 100 × 20 = 2000 (exact arithmetic).
    const cells = firstSheetCells(unzip(file?.bytes ?? new Uint8Array()));
    expect(cells.get('A1')?.text).toMatch(/^CAUTION:/);
    const areaColumn = [...cells.values()].find((c) => c.text === 'area [mm^2]')?.ref.replace(/\d+$/, '');
    expect(cells.get(`${areaColumn}3`)).toMatchObject({ type: 'number', text: '2000' });
  },
  async 'export-dxf'() {
    const r = withPlate();
    await r.c.run('export-dxf');
    const file = r.host.exported[0];
    expect(file?.suggestedName).toBe('Untitled-section.dxf');
    expect(file?.mimeType).toBe('application/dxf');
    // Read back through the importer: the 100 × 20 plate, A = b·h = 2000 (exact arithmetic).
    const back = importDxf(file?.text ?? '', { layers: ['SECTION'] });
    expect(back.ok && sectionProperties(back.value.polygons.map((p) => ({ outer: p.outer, holes: p.holes }))).area).toBe(2000);
    expect(file?.text).toContain('PART-');
  },
  async compare() {
    const r = rig();
    await r.c.run('compare');
    expect(r.c.getState().shown).toBe('compare');
  },
  async 'print-report'() {
    const r = rig();
    await r.c.run('print-report');
    expect(r.c.getState().shown).toBe('print-report');
  },
  async 'check-table'() {
    const r = rig();
    await r.c.run('check-table');
    expect(r.c.getState().shown).toBe('check-table');
  },
  async 'open-example'() {
    const r = rig();
    await r.c.run('open-example');
    expect(r.c.editor.getState().file?.name).toBe(EXAMPLE_NAME);
    expect(r.c.editor.getState().doc.parts.length).toBeGreaterThan(0);
  },
  async 'open-launch-file'() {
    const r = rig((h) => (h.launch = { name: 'given.section.json', handle: 'h-5', text: EXAMPLE_TEXT }));
    await r.c.run('open-launch-file');
    expect(r.c.editor.getState().file?.name).toBe('given.section.json');
  },
  async undo() {
    const r = withPlate();
    await r.c.run('undo');
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  },
  async redo() {
    const r = withPlate();
    await r.c.run('undo');
    await r.c.run('redo');
    expect(r.c.editor.getState().doc.parts).toHaveLength(1);
  },
  async copy() {
    const r = withPlate();
    await r.c.run('copy');
    expect(r.c.getState().clipboardParts).toBe(1);
    expect(r.c.editor.getState().doc.parts).toHaveLength(1); // copying changes nothing
  },
  async cut() {
    const r = withPlate();
    await r.c.run('cut');
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
    await r.c.run('paste'); // a cut part pastes back where it was
    expect(placed(r)).toEqual([['part-1', 0, 0]]);
  },
  async 'paste-points'() {
    const r = rig();
    await r.c.run('paste-points');
    expect(r.c.getState().points).toMatchObject({ text: '', third: 'auto', errors: [] });
    // A 200 × 10 plate typed as a spreadsheet would copy it, with a header: A = b·h = 2000 (exact arithmetic).
    r.c.choosePoints({ text: 'x\ty\n0\t0\n200\t0\n200\t10\n0\t10\n' });
    expect(r.c.addPoints('add')).toBe(true);
    expect(r.c.getState().points).toBeNull();
    expect(r.c.results(r.c.editor.getState().doc).properties?.area).toBe(2000);
  },
  async paste() {
    const r = withPlate();
    await r.c.run('copy');
    await r.c.run('paste');
    await r.c.run('paste');
    // each paste one grid step (10) further right and down
    expect(placed(r)).toEqual([['part-1', 0, 0], ['part-2', 10, -10], ['part-3', 20, -20]]);
    expect(r.c.editor.getState().selection).toEqual(['part-3']);
    await r.c.run('undo');
    expect(r.c.editor.getState().doc.parts).toHaveLength(2); // one paste = one step
  },
  async duplicate() {
    const r = withPlate();
    await r.c.run('duplicate');
    expect(placed(r)).toEqual([['part-1', 0, 0], ['part-2', 10, -10]]);
  },
  async delete() {
    const r = withPlate();
    await r.c.run('delete');
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  },
  async 'select-all'() {
    const r = withPlate();
    r.c.editor.addRectangle({ x: 200, y: 0, width: 10, height: 10 });
    r.c.editor.select([]);
    await r.c.run('select-all');
    expect(r.c.editor.getState().selection).toEqual(['part-1', 'part-2']);
  },
  ...alignCases(),
  ...spreadCases(),
  async 'zoom-in'() {
    const r = rig();
    const before = r.c.getState().view.scale;
    await r.c.run('zoom-in');
    expect(r.c.getState().view.scale).toBeCloseTo(before * 1.25, 12);
  },
  async 'zoom-out'() {
    const r = rig();
    const before = r.c.getState().view.scale;
    await r.c.run('zoom-out');
    expect(r.c.getState().view.scale).toBeCloseTo(before * 0.8, 12);
  },
  async 'zoom-fit'() {
    const r = withPlate();
    await r.c.run('zoom-fit');
    // 100 × 20 plate in 800 × 600 px with a 70 px margin: width governs, (800 − 140) / 100
    expect(r.c.getState().view.scale).toBeCloseTo(6.6, 12);
  },
  async shortcuts() {
    const r = rig();
    await r.c.run('shortcuts');
    expect(r.c.getState().shown).toBe('shortcuts');
  },
  async 'tool-select'() {
    const r = rig();
    r.c.editor.setTool('polygon');
    await r.c.run('tool-select');
    expect(r.c.editor.getState().toolId).toBe('select');
  },
  async 'tool-rectangle'() {
    const r = rig();
    await r.c.run('tool-rectangle');
    expect(r.c.editor.getState().toolId).toBe('rectangle');
  },
  async 'tool-circle'() {
    const r = rig();
    await r.c.run('tool-circle');
    expect(r.c.editor.getState().toolId).toBe('circle');
  },
  async 'tool-polygon'() {
    const r = rig();
    await r.c.run('tool-polygon');
    expect(r.c.editor.getState().toolId).toBe('polygon');
  },
  async 'tool-vertex'() {
    const r = rig();
    await r.c.run('tool-vertex');
    expect(r.c.editor.getState().toolId).toBe('vertex');
  },
  async 'nudge-left'() {
    const r = withPlate();
    await r.c.run('nudge-left');
    expect(placed(r)).toEqual([['part-1', -10, 0]]);
  },
  async 'nudge-right'() {
    const r = withPlate();
    await r.c.run('nudge-right');
    expect(placed(r)).toEqual([['part-1', 10, 0]]);
  },
  async 'nudge-up'() {
    const r = withPlate();
    await r.c.run('nudge-up');
    expect(placed(r)).toEqual([['part-1', 0, 10]]);
  },
  async 'nudge-down'() {
    const r = withPlate();
    await r.c.run('nudge-down');
    expect(placed(r)).toEqual([['part-1', 0, -10]]);
  },
  async 'torsion-cancel'() {
    const r = withPlate();
    r.timers.advance(TORSION_DELAY_MS);
    r.torsion.report({ kind: 'running', fraction: 0.25 });
    const cancels = r.torsion.cancels;
    await r.c.run('torsion-cancel');
    expect(r.torsion.cancels).toBe(cancels + 1);
    expect(r.c.getState().torsion).toEqual({ kind: 'cancelled' });
  },
  async 'torsion-solve'() {
    const r = withPlate();
    await r.c.run('torsion-cancel'); // cancelled while waiting for the drawing to settle
    r.timers.advance(10 * TORSION_DELAY_MS);
    expect(r.torsion.solved).toHaveLength(0);
    await r.c.run('torsion-solve');
    expect(r.torsion.solved).toEqual([r.c.editor.getState().doc]);
  },
};

describe('opening a DXF drawing', () => {
  const dxf = (name: string): string => readFileSync(new URL(`../fixtures/dxf/${name}`, import.meta.url), 'utf8');

  it('asks for layers and unit first, and leaves the document untouched until Import', () => {
    const r = withPlate();
    const before = r.c.editor.getState().doc;
    expect(r.c.openText(dxf('two-layers.dxf'), 'plates.dxf', 'h-9')).toBe(true);
    const prompt = r.c.getState().dxf;
    expect(prompt?.summary.layers.map((l) => l.name)).toEqual(['FLANGE', 'OTHER', 'WEB']);
    expect(prompt?.unit).toBe('mm');
    expect(r.c.editor.getState().doc).toBe(before);
    r.c.chooseDxf({ layers: ['FLANGE', 'WEB'], grouping: 'one' });
    expect(r.c.importChosenDxf()).toBe(true);
    const doc = r.c.editor.getState().doc;
    expect(doc.unit).toBe('mm');
    expect(doc.parts).toHaveLength(1);
    // Imported, not opened: saving it is a Save As (no handle to write a DXF back to).
    expect(r.c.editor.getState().file?.handle).toBeNull();
    expect(r.c.getState().dxf).toBeNull();
  });

  it('a drawing without a unit takes the unit chosen in the dialog', () => {
    const r = rig();
    r.c.openText(dxf('error-no-unit.dxf'), 'plain.dxf', null);
    expect(r.c.getState().dxf?.summary.unit).toBeNull();
    r.c.chooseDxf({ unit: 'in' });
    expect(r.c.importChosenDxf()).toBe(true);
    expect(r.c.editor.getState().doc.unit).toBe('in');
  });

  it('holes take the role chosen in the dialog: fastener holes become cut-outs counted in the net section only', () => {
    const r = rig();
    r.c.openText(dxf('pipe-lwpolyline.dxf'), 'pipe.dxf', null);
    expect(r.c.getState().dxf?.holes).toBe('void');
    r.c.chooseDxf({ holes: 'fastener-hole' });
    expect(r.c.importChosenDxf()).toBe(true);
    const parts = r.c.editor.getState().doc.parts;
    expect(parts.map((p) => p.operation)).toEqual(['add', 'subtract']);
    expect(parts[1]?.cutoutRole).toBe('fastener-hole');
  });

  it('an import error stays in the dialog, naming the entity, and the document is unchanged', () => {
    const r = withPlate();
    const before = r.c.editor.getState().doc;
    r.c.openText(dxf('error-open-chain.dxf'), 'open.dxf', null);
    expect(r.c.importChosenDxf()).toBe(false);
    expect(r.c.getState().dxf?.errors[0]).toMatch(/LINE handle [0-9A-F]+ on layer "PROFILE".*does not close/);
    expect(r.c.editor.getState().doc).toBe(before);
    r.c.cancelDxf();
    expect(r.c.getState().dxf).toBeNull();
    expect(r.c.editor.getState().doc).toBe(before);
  });
});

describe('a point list pasted or typed for an outline', () => {
  it('pasted with the outline tool: comma-separated, third column of radii (header), an exact half-disc', () => {
    const r = rig();
    r.c.editor.setTool('polygon');
    // Two points joined by a straight chord and a 50 radius arc: a half-disc of radius 50, A = π·50²/2 (Roark, Table A.1).
    expect(r.c.pasteText('x,y,radius\n50,0,50\n-50,0,0\n')).toBe(true);
    const area = r.c.results(r.c.editor.getState().doc).properties?.area ?? 0;
    expect(Math.abs(area - (Math.PI * 50 ** 2) / 2) / ((Math.PI * 50 ** 2) / 2)).toBeLessThan(1e-12);
  });

  it('semicolons and spaces read too; a bad list opens the dialog naming the line and column, and the document is unchanged', () => {
    const r = rig();
    r.c.editor.setTool('polygon');
    expect(r.c.pasteText('0;0\n100;0\n100;50\n')).toBe(true);
    expect(r.c.editor.getState().doc.parts).toHaveLength(1);
    const before = r.c.editor.getState().doc;
    expect(r.c.pasteText('0 0\n100 0\n100 5o\n')).toBe(true);
    expect(r.c.editor.getState().doc).toBe(before);
    expect(r.c.getState().points?.errors[0]).toMatch(/line 3, column 2: "5o" is not a number/);
    expect(r.c.getState().points?.text).toBe('0 0\n100 0\n100 5o\n');
  });

  it('crossing points are refused naming a point; without the outline tool other text is left alone', () => {
    const r = rig();
    r.c.openPoints();
    r.c.choosePoints({ text: '0 0\n10 10\n10 0\n0 10\n' });
    expect(r.c.addPoints('add')).toBe(false);
    expect(r.c.getState().points?.errors.join(' ')).toMatch(/cross|point/i);
    r.c.cancelPoints();
    expect(r.c.pasteText('hello world')).toBe(false);
    expect(r.c.getState().points).toBeNull();
  });
});

describe('every command by id', () => {
  for (const id of COMMAND_IDS) it(id, () => COMMAND_CASES[id]());

  it('a host menu item runs the command of the same id', async () => {
    const r = withPlate((h) => h.settings.set(SEEN_EXAMPLE_SETTING, '1'));
    await r.c.start();
    r.host.send('undo');
    await settle();
    expect(r.c.editor.getState().doc.parts).toHaveLength(0);
  });
});

describe('mounting twice (React development mode mounts, unmounts and mounts again)', () => {
  it('keeps following the editor after dispose and a second start, and loads the example once', async () => {
    const r = rig();
    await r.c.start();
    r.c.dispose();
    await r.c.start();
    expect(r.c.editor.getState().file?.name).toBe(EXAMPLE_NAME);
    r.c.editor.moveSelectionBy(0, 0);
    r.c.editor.select(['deck-plate']);
    r.c.editor.moveSelectionBy(10, 0);
    expect(r.host.titles.at(-1)).toBe(`• ${EXAMPLE_NAME} — Sectionsmith`);
    r.timers.advance(TORSION_DELAY_MS);
    expect(r.torsion.solved.at(-1)).toBe(r.c.editor.getState().doc);
  });
});

describe('recent files', () => {
  it('reads the host list and opens an entry without a dialog', async () => {
    const r = rig((h) => h.recent.set('h-7', { name: 'mezzanine.section.json', handle: 'h-7', text: EXAMPLE_TEXT }));
    await r.c.refreshRecent();
    expect(r.c.getState().recent).toEqual([{ name: 'mezzanine.section.json', handle: 'h-7' }]);
    await r.c.openRecent('h-7', 'mezzanine.section.json');
    expect(r.c.editor.getState().file).toEqual({ name: 'mezzanine.section.json', handle: 'h-7' });
  });

  it('says so when a recent file is gone, and keeps the current document', async () => {
    const r = withPlate();
    r.c.editor.markSaved({ name: 'a.section.json', handle: null });
    await r.c.openRecent('h-gone', 'old.section.json');
    expect(r.c.getState().banner?.title).toContain('old.section.json is no longer available');
    expect(r.c.editor.getState().doc.parts).toHaveLength(1);
  });
});
