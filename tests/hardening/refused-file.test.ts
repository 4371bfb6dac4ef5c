/**
 * Hardening finding 8: after a refused file, the previous document's numbers must not read as if
 * they were the refused file's. The document stays open (never lose work), and the controller says,
 * until that document changes, that the results shown are still the open document's, naming both.
 */
import { describe, expect, it } from 'vitest';
import { newSectionFile, serialiseDocument } from '../../core/document/index.ts';
import { rig, settle } from '../controller/fakes.ts';

const good = serialiseDocument({ ...newSectionFile('mm'), name: 'Mezzanine flitch beam' });

describe('a refused file and the numbers still shown', () => {
  it('marks the results as the open document\'s, naming the refused file, until that document changes', async () => {
    const r = rig();
    await r.c.start();
    expect(r.c.openText(good, 'flitch.section.json', null)).toBe(true);
    r.c.editor.addRectangle({ x: 0, y: 0, width: 100, height: 20 });
    const before = r.c.editor.getState().doc;
    expect(r.c.openText('{"format":"sectionsmith-section","version":3,', 'trailer.section.json', null)).toBe(false);
    expect(r.c.editor.getState().doc).toBe(before); // the open document is kept
    expect(r.c.getState().refused).toEqual({ file: 'trailer.section.json', shown: 'flitch.section.json' });
    // An edit to the open document: the numbers are plainly its own again.
    r.c.editor.addRectangle({ x: 0, y: 100, width: 100, height: 20 });
    expect(r.c.getState().refused).toBeNull();
  });

  it('is cleared by opening a file that is accepted', async () => {
    const r = rig();
    await r.c.start();
    r.c.openText('not a document', 'frame.dxf.json', null);
    expect(r.c.getState().refused?.file).toBe('frame.dxf.json');
    r.c.openText(good, 'flitch.section.json', null);
    await settle();
    expect(r.c.getState().refused).toBeNull();
  });
});
