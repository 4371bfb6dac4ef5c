/**
 * Every command of the editor by id: what menus, buttons, keys (keymap.ts) and host menu items
 * (renderer/host/host.ts HostCommand) run. A command is a plain function of the controller's
 * command surface (CommandTarget), so it is tested without React and without a browser.
 */
import type { Editor } from '../editor/editor.ts';
import type { ToolId } from '../editor/tools/tool.ts';
import type { AlignEdge, DistributeMode } from '../editor/transforms.ts';

/** What the commands act on: the editor, and the controller's own work (files, views, clipboard). */
export interface CommandTarget {
  readonly editor: Editor;
  newDocument(): Promise<void>;
  openWithPicker(): Promise<void>;
  openExample(): Promise<void>;
  openLaunchFile(): Promise<void>;
  save(as: boolean): Promise<void>;
  exportAs(kind: 'svg' | 'csv' | 'xlsx'): Promise<void>;
  exportDxf(): Promise<void>;
  zoomBy(factor: number): void;
  fit(): void;
  show(view: ShownView): void;
  copy(): void;
  cut(): void;
  paste(): void;
  openPoints(): void;
  duplicate(): void;
  nudge(dx: number, dy: number): void;
  /** Stops the torsion solve now running or waiting to start. */
  cancelTorsion(): void;
  /** Starts the torsion solve of the section now (after a cancel). */
  solveTorsionNow(): void;
}

/** The views that open over the editor. */
export type ShownView = 'compare' | 'print-report' | 'check-table' | 'shortcuts';

export interface Command {
  /** As the menu shows it. */
  readonly label: string;
  run(t: CommandTarget): void | Promise<void>;
}

const tool = (id: ToolId, label: string): Command => ({ label, run: (t) => t.editor.setTool(id) });
const align = (edge: AlignEdge, label: string): Command => ({ label, run: (t) => t.editor.alignSelection(edge) });
const spread = (axis: 'x' | 'y', mode: DistributeMode, label: string): Command => ({ label, run: (t) => t.editor.distributeSelection(axis, mode) });
const nudge = (sx: number, sy: number, label: string): Command => ({
  label,
  run: (t) => {
    const step = t.editor.getState().snap.grid;
    t.nudge(sx * step, sy * step);
  },
});

export const COMMANDS = {
  new: { label: 'New section', run: (t) => t.newDocument() },
  open: { label: 'Open…', run: (t) => t.openWithPicker() },
  save: { label: 'Save', run: (t) => t.save(false) },
  'save-as': { label: 'Save as…', run: (t) => t.save(true) },
  'export-svg': { label: 'Export drawing (SVG)…', run: (t) => t.exportAs('svg') },
  'export-csv': { label: 'Export properties (CSV)…', run: (t) => t.exportAs('csv') },
  'export-xlsx': { label: 'Export properties (XLSX)…', run: (t) => t.exportAs('xlsx') },
  'export-dxf': { label: 'Export drawing for CAD and cutting (DXF)…', run: (t) => t.exportDxf() },
  compare: { label: 'Compare alternatives…', run: (t) => t.show('compare') },
  'print-report': { label: 'Print report…', run: (t) => t.show('print-report') },
  'check-table': { label: 'Check a section table (CSV)…', run: (t) => t.show('check-table') },
  'open-example': { label: 'Open the example: footbridge box girder', run: (t) => t.openExample() },
  'open-launch-file': { label: 'Open the file given at start', run: (t) => t.openLaunchFile() },
  undo: { label: 'Undo', run: (t) => t.editor.undo() },
  redo: { label: 'Redo', run: (t) => t.editor.redo() },
  copy: { label: 'Copy', run: (t) => t.copy() },
  cut: { label: 'Cut', run: (t) => t.cut() },
  paste: { label: 'Paste', run: (t) => t.paste() },
  'paste-points': { label: 'Paste coordinates (x y list)…', run: (t) => t.openPoints() },
  duplicate: { label: 'Duplicate', run: (t) => t.duplicate() },
  delete: { label: 'Delete', run: (t) => t.editor.deleteSelection() },
  'select-all': { label: 'Select all parts', run: (t) => t.editor.select(t.editor.getState().doc.parts.map((p) => p.id)) },
  'align-left': align('left', 'Align left edges'),
  'align-centre-x': align('centre-x', 'Align centres (vertical line)'),
  'align-right': align('right', 'Align right edges'),
  'align-top': align('top', 'Align top edges'),
  'align-centre-y': align('centre-y', 'Align middles (horizontal line)'),
  'align-bottom': align('bottom', 'Align bottom edges'),
  'distribute-x': spread('x', 'centres', 'Distribute centres left to right'),
  'distribute-y': spread('y', 'centres', 'Distribute centres bottom to top'),
  'space-x': spread('x', 'gaps', 'Equal gaps left to right'),
  'space-y': spread('y', 'gaps', 'Equal gaps bottom to top'),
  'touch-x': spread('x', 'touch', 'Side by side, touching (left to right)'),
  'touch-y': spread('y', 'touch', 'Stacked, touching (bottom to top)'),
  'zoom-in': { label: 'Zoom in', run: (t) => t.zoomBy(1.25) },
  'zoom-out': { label: 'Zoom out', run: (t) => t.zoomBy(0.8) },
  'zoom-fit': { label: 'Fit the section', run: (t) => t.fit() },
  shortcuts: { label: 'Keyboard shortcuts', run: (t) => t.show('shortcuts') },
  'torsion-cancel': { label: 'Stop the torsion solve', run: (t) => t.cancelTorsion() },
  'torsion-solve': { label: 'Solve torsion now', run: (t) => t.solveTorsionNow() },
  'tool-select': tool('select', 'Select tool'),
  'tool-rectangle': tool('rectangle', 'Plate tool'),
  'tool-circle': tool('circle', 'Round tool'),
  'tool-polygon': tool('polygon', 'Outline tool'),
  'tool-vertex': tool('vertex', 'Corners tool'),
  'nudge-left': nudge(-1, 0, 'Move left one grid step'),
  'nudge-right': nudge(1, 0, 'Move right one grid step'),
  'nudge-up': nudge(0, 1, 'Move up one grid step'),
  'nudge-down': nudge(0, -1, 'Move down one grid step'),
} as const satisfies Record<string, Command>;

export type CommandId = keyof typeof COMMANDS;

export const COMMAND_IDS = Object.keys(COMMANDS) as CommandId[];

export function isCommandId(id: string): id is CommandId {
  return Object.hasOwn(COMMANDS, id);
}
