/**
 * The test-only switch that spares the browser tests the example's torsion solve
 * (`?example-torsion=off`, ControllerDeps.exampleTorsion = false): the example, as opened at
 * start and while it is edited, is not sent to the solver; a new document is, as always; and
 * without the switch the example is solved as before.
 */
import { describe, expect, it } from 'vitest';
import { AppController, EXAMPLE_NAME, TORSION_DELAY_MS } from '../../renderer/controller/controller.ts';
import { EXAMPLE_TEXT, fakeHost, ManualTimers, RecordingTorsion, settle } from '../controller/fakes.ts';

function rigWith(exampleTorsion: boolean | undefined): { c: AppController; timers: ManualTimers; torsion: () => RecordingTorsion } {
  const timers = new ManualTimers();
  let torsion: RecordingTorsion | null = null;
  const c = new AppController({ host: fakeHost(), exampleText: EXAMPLE_TEXT, timers, torsion: (report) => (torsion = new RecordingTorsion(report)), ...(exampleTorsion === undefined ? {} : { exampleTorsion }) });
  c.setSize(800, 600);
  return { c, timers, torsion: () => torsion as unknown as RecordingTorsion };
}

describe('the example without its automatic torsion (browser tests only)', () => {
  it('is not solved when opened at start, nor after an edit, while a new document is', async () => {
    const r = rigWith(false);
    await r.c.start();
    expect(r.c.editor.getState().file?.name).toBe(EXAMPLE_NAME);
    r.timers.advance(10 * TORSION_DELAY_MS);
    expect(r.torsion().solved).toHaveLength(0);
    r.c.editor.addRectangle({ x: 0, y: -500, width: 100, height: 20 });
    r.timers.advance(10 * TORSION_DELAY_MS);
    expect(r.torsion().solved).toHaveLength(0);
    await r.c.newDocument();
    await settle();
    r.c.editor.addRectangle({ x: 0, y: 0, width: 100, height: 20 });
    r.timers.advance(TORSION_DELAY_MS);
    expect(r.torsion().solved).toEqual([r.c.editor.getState().doc]);
  });

  it('is solved as usual without the switch', async () => {
    const r = rigWith(undefined);
    await r.c.start();
    r.timers.advance(TORSION_DELAY_MS);
    expect(r.torsion().solved).toEqual([r.c.editor.getState().doc]);
  });
});
