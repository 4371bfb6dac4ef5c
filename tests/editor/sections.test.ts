// The editor holds the whole file and edits one section (alternative) at a time: adding,
// duplicating, renaming, deleting and reordering sections are one undo step each; switching is
// not a change to the file. Expected values are exact arithmetic on the plates drawn here.
import { describe, expect, it } from 'vitest';
import { parseDocument, serialiseDocument, type RectanglePart, type SectionFile } from '../../core/document/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { Editor } from '../../renderer/editor/editor.ts';
import { drag, editorWith } from './helpers.ts';

const names = (ed: Editor): string[] => ed.getState().sectionFile.sections.map((s) => s.name);
const partCounts = (ed: Editor): number[] => ed.getState().sectionFile.sections.map((s) => s.parts.length);
const activeName = (ed: Editor): string | undefined => ed.getState().sectionFile.sections.find((s) => s.id === ed.getState().activeSection)?.name;

/** One 100 × 200 mm plate in the only section, saved. */
function plateEditor(): Editor {
  const ed = editorWith();
  ed.addRectangle({ x: 0, y: 0, width: 100, height: 200 });
  ed.markSaved({ name: 'girder.section.json', handle: null });
  return ed;
}

describe('adding and duplicating sections', () => {
  it('an empty new section comes after the active one, becomes active, and is one undo step', () => {
    const ed = plateEditor();
    const r = ed.addSection();
    expect(r.ok).toBe(true);
    expect(names(ed)).toEqual(['test', 'Alternative 2']);
    expect(activeName(ed)).toBe('Alternative 2');
    expect(ed.getState().doc.parts).toEqual([]);
    expect(ed.getState().undoLabel).toBe('Add section');
    expect(ed.getState().dirty).toBe(true);
    ed.undo();
    expect(names(ed)).toEqual(['test']);
    expect(activeName(ed)).toBe('test');
    expect(ed.getState().dirty).toBe(false);
  });

  it('a duplicate copies the parts under the name "… (copy)"; editing the copy leaves the original as it was', () => {
    const ed = plateEditor();
    ed.addSection({ duplicate: true });
    expect(names(ed)).toEqual(['test', 'test (copy)']);
    const id = ed.getState().doc.parts[0]?.id as string;
    ed.updatePart(id, 'Width', (p) => ({ ...(p as RectanglePart), width: 150 }));
    const widths = ed.getState().sectionFile.sections.map((s) => (s.parts[0] as RectanglePart).width);
    expect(widths).toEqual([100, 150]);
    // A = b·h for each alternative: 100·200 and 150·200.
    expect(ed.getState().sectionFile.sections.map((s) => sectionFromDocument({ ...ed.getState().doc, parts: s.parts }).properties?.area)).toEqual([20000, 30000]);
  });

  it('a name given for a new section must be free and not blank; the refusal says why and changes nothing', () => {
    const ed = plateEditor();
    expect(ed.addSection({ name: 'test' })).toEqual({ ok: false, message: 'another section is already called "test"' });
    expect(ed.addSection({ name: '  ' })).toEqual({ ok: false, message: 'a section name cannot be empty' });
    expect(names(ed)).toEqual(['test']);
    expect(ed.getState().canUndo).toBe(true);
    expect(ed.getState().undoLabel).toBe('Add plate');
  });
});

describe('switching', () => {
  it('switching shows the other section, clears the selection, and is no undo step (the file stays saved)', () => {
    const ed = plateEditor();
    ed.addSection();
    ed.markSaved({ name: 'girder.section.json', handle: null });
    const first = ed.getState().sectionFile.sections[0]?.id as string;
    ed.switchSection(first);
    expect(ed.getState().doc.parts.length).toBe(1);
    expect(ed.getState().selection).toEqual([]);
    expect(ed.getState().dirty).toBe(false);
    expect(ed.getState().undoLabel).toBe('Add section');
  });

  it('undo returns to the section where the step was made', () => {
    const ed = plateEditor();
    ed.addSection({ duplicate: true });
    const copy = ed.getState().activeSection;
    ed.addCircle({ x: 0, y: 0, diameter: 20 });
    const first = ed.getState().sectionFile.sections[0]?.id as string;
    ed.switchSection(first);
    expect(ed.getState().doc.parts.length).toBe(1);
    ed.undo();
    expect(ed.getState().activeSection).toBe(copy);
    expect(partCounts(ed)).toEqual([1, 1]);
    ed.redo();
    expect(partCounts(ed)).toEqual([1, 2]);
  });

  it('a drag in the second section changes only that section', () => {
    const ed = plateEditor();
    ed.addSection({ duplicate: true });
    drag(ed, [0, 0], [20, 0], [30, 0]);
    const xs = ed.getState().sectionFile.sections.map((s) => s.parts[0]?.placement.x);
    expect(xs).toEqual([0, 30]);
    ed.undo();
    expect(ed.getState().sectionFile.sections.map((s) => s.parts[0]?.placement.x)).toEqual([0, 0]);
  });

  it('a dimension being typed is recorded in its own section before the switch', () => {
    const ed = plateEditor();
    ed.addSection({ duplicate: true });
    const id = ed.getState().doc.parts[0]?.id as string;
    ed.livePart(id, (p) => ({ ...(p as RectanglePart), height: 300 }));
    ed.switchSection(ed.getState().sectionFile.sections[0]?.id as string);
    expect(ed.getState().sectionFile.sections.map((s) => (s.parts[0] as RectanglePart).height)).toEqual([200, 300]);
    expect(ed.getState().undoLabel).toBe('Change dimension');
  });
});

describe('renaming, deleting, reordering', () => {
  it('rename is one step; a blank or taken name is refused with the reason', () => {
    const ed = plateEditor();
    ed.addSection();
    const id = ed.getState().activeSection;
    expect(ed.renameSection(id, '  Deeper web ').ok).toBe(true);
    expect(names(ed)).toEqual(['test', 'Deeper web']);
    expect(ed.getState().doc.name).toBe('Deeper web');
    expect(ed.renameSection(id, 'test')).toEqual({ ok: false, message: 'another section is already called "test"' });
    expect(ed.renameSection(id, '')).toEqual({ ok: false, message: 'a section name cannot be empty' });
    ed.undo();
    expect(names(ed)).toEqual(['test', 'Alternative 2']);
  });

  it('the last section cannot be deleted; deleting another is one step that undo brings back whole', () => {
    const ed = plateEditor();
    const only = ed.getState().activeSection;
    expect(ed.deleteSection(only)).toEqual({ ok: false, message: '"test" is the only section; a document keeps at least one' });
    ed.addSection({ duplicate: true });
    ed.addCircle({ x: 0, y: 0, diameter: 20 });
    const copy = ed.getState().activeSection;
    const r = ed.deleteSection(copy);
    expect(r).toEqual({ ok: true, id: only });
    expect(names(ed)).toEqual(['test']);
    expect(ed.getState().activeSection).toBe(only);
    ed.undo();
    expect(names(ed)).toEqual(['test', 'test (copy)']);
    expect(partCounts(ed)).toEqual([1, 2]);
    expect(ed.getState().activeSection).toBe(copy);
  });

  it('moving a section reorders the file and keeps the active section', () => {
    const ed = plateEditor();
    ed.addSection();
    const id = ed.getState().activeSection;
    ed.moveSection(id, -1);
    expect(names(ed)).toEqual(['Alternative 2', 'test']);
    expect(ed.getState().activeSection).toBe(id);
    ed.moveSection(id, -1);
    expect(ed.getState().undoLabel).toBe('Reorder sections');
    ed.undo();
    expect(names(ed)).toEqual(['test', 'Alternative 2']);
  });
});

describe('the whole file', () => {
  it('a file with two sections loads with the first active, saves with both, and reads back the same', () => {
    const file: SectionFile = {
      format: 'sectionsmith-section', version: 3, name: 'Footbridge girder', unit: 'mm', materials: [], defaultMaterial: null,
      sections: [
        { id: 's1', name: 'Thicker flanges', parts: [] },
        { id: 's2', name: 'Deeper web', parts: [] },
      ],
    };
    const ed = new Editor(file);
    expect(ed.getState().activeSection).toBe('s1');
    ed.switchSection('s2');
    ed.addRectangle({ x: 0, y: 0, width: 12, height: 900 });
    const r = parseDocument(serialiseDocument(ed.getState().sectionFile), 'girder.section.json');
    expect(r.ok && r.file.sections.map((s) => [s.name, s.parts.length])).toEqual([['Thicker flanges', 0], ['Deeper web', 1]]);
    ed.load(file, null);
    expect([ed.getState().activeSection, ed.getState().canUndo, ed.getState().dirty]).toEqual(['s1', false, false]);
  });

  it('a change to every section (the shared unit) is one step: 100 mm → 10 cm in both', () => {
    const ed = plateEditor();
    ed.addSection({ duplicate: true });
    ed.replaceAllSections('Document unit mm → cm', (d) => ({ ...d, unit: 'cm', parts: d.parts.map((p) => (p.type === 'rectangle' ? { ...p, width: p.width / 10, height: p.height / 10 } : p)) }));
    expect(ed.getState().sectionFile.unit).toBe('cm');
    expect(ed.getState().doc.unit).toBe('cm');
    expect(ed.getState().sectionFile.sections.map((s) => (s.parts[0] as RectanglePart).width)).toEqual([10, 10]);
    ed.undo();
    expect(ed.getState().sectionFile.unit).toBe('mm');
  });

  it('removing a material through the view clears it in the other section too, so the saved file stays valid', () => {
    const ed = plateEditor();
    ed.replaceDocument('Add material', (d) => ({ ...d, materials: [{ id: 'oak', name: 'oak' }], parts: d.parts.map((p) => ({ ...p, material: 'oak' })) }));
    ed.addSection({ duplicate: true });
    ed.replaceDocument('Delete material', (d) => ({ ...d, materials: [], parts: d.parts.map((p) => ({ ...p, material: null })) }));
    expect(ed.getState().sectionFile.sections.map((s) => s.parts[0]?.material)).toEqual([null, null]);
    expect(parseDocument(serialiseDocument(ed.getState().sectionFile), 'x.json').ok).toBe(true);
  });
});
