/** A small menu bar of our own: File, Edit, View, Help. Items name the shortcut beside them. */
import { useEffect, useRef, useState, type ReactElement } from 'react';
import type { Overlays } from '../../controller/controller.ts';

import type { CommandId } from '../../controller/commands.ts';
import { shortcutOf } from '../../controller/keymap.ts';

export type MenuAction = CommandId;

interface Props {
  readonly onAction: (a: MenuAction) => void;
  readonly onOpenFile: (f: File) => void;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  readonly undoLabel: string | null;
  readonly redoLabel: string | null;
  readonly overlays: Overlays;
  readonly onOverlays: (o: Overlays) => void;
  readonly title: string;
  /** Recent files (newest first) and what opening one does. */
  readonly recent: readonly { readonly name: string; readonly handle: string }[];
  readonly onOpenRecent: (handle: string, name: string) => void;
  /** A menu is opening (the File menu reads the recent files then). */
  readonly onMenuOpen?: (name: string) => void;
}

const OVERLAY_NAMES: readonly [keyof Overlays, string][] = [
  ['centroid', 'Centroid'],
  ['axes', 'Centroidal x–y axes'],
  ['principal', 'Principal axes and angle'],
  ['pna', 'Plastic neutral axes'],
  ['fibres', 'Extreme-fibre distances'],
  ['dimensions', 'Overall dimensions'],
  ['stress', 'Stress map, extremes, neutral axis'],
  ['kern', 'Kern (core)'],
];

export function MenuBar(props: Props): ReactElement {
  const [open, setOpen] = useState<string | null>(null);
  const bar = useRef<HTMLElement>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  useEffect(() => {
    const close = (e: MouseEvent): void => {
      if (bar.current && !bar.current.contains(e.target as Node)) setOpen(null);
    };
    window.addEventListener('mousedown', close);
    return () => window.removeEventListener('mousedown', close);
  }, []);

  const item = (action: MenuAction, label: string, shortcut = shortcutOf(action), disabled = false): ReactElement => (
    <button
      type="button"
      role="menuitem"
      className="menu-item"
      data-testid={`menu-${action}`}
      disabled={disabled}
      onClick={() => {
        setOpen(null);
        props.onAction(action);
      }}
    >
      <span>{label}</span>
      <kbd>{shortcut}</kbd>
    </button>
  );

  const menu = (name: string, children: ReactElement): ReactElement => (
    <div className="menu">
      <button type="button" className={open === name ? 'menu-title open' : 'menu-title'} data-testid={`menu-${name.toLowerCase()}`} aria-haspopup="menu" aria-expanded={open === name} onClick={() => {
          if (open !== name) props.onMenuOpen?.(name);
          setOpen(open === name ? null : name);
        }}>
        {name}
      </button>
      {open === name && (
        <div className="menu-list" role="menu">
          {children}
        </div>
      )}
    </div>
  );

  return (
    <nav className="menubar" ref={bar}>
      <span className="brand">Sectionsmith</span>
      {menu(
        'File',
        <>
          {item('new', 'New section')}
          {item('open', 'Open…')}
          <button type="button" role="menuitem" className="menu-item" data-testid="menu-open-file-input" onClick={() => fileInput.current?.click()}>
            <span>Open from a file picker…</span>
            <kbd />
          </button>
          {props.recent.length > 0 && (
            <>
              <hr />
              <span className="menu-note muted small">Recent</span>
              {props.recent.map((r, i) => (
                <button
                  key={r.handle}
                  type="button"
                  role="menuitem"
                  className="menu-item"
                  data-testid={`menu-recent-${i}`}
                  onClick={() => {
                    setOpen(null);
                    props.onOpenRecent(r.handle, r.name);
                  }}
                >
                  <span>{r.name}</span>
                  <kbd />
                </button>
              ))}
              <hr />
            </>
          )}
          {item('save', 'Save')}
          {item('save-as', 'Save as…')}
          <hr />
          {item('export-svg', 'Export drawing (SVG)…')}
          {item('export-csv', 'Export properties (CSV)…')}
          {item('export-xlsx', 'Export properties (XLSX)…')}
          {item('export-dxf', 'Export drawing for CAD and cutting (DXF)…')}
          <hr />
          {item('compare', 'Compare alternatives…')}
          {item('print-report', 'Print report…')}
          {item('check-table', 'Check a section table (CSV)…')}
        </>,
      )}
      {menu(
        'Edit',
        <>
          {item('undo', props.undoLabel ? `Undo ${props.undoLabel.toLowerCase()}` : 'Undo', shortcutOf('undo'), !props.canUndo)}
          {item('redo', props.redoLabel ? `Redo ${props.redoLabel.toLowerCase()}` : 'Redo', shortcutOf('redo'), !props.canRedo)}
          <hr />
          {item('cut', 'Cut')}
          {item('copy', 'Copy')}
          {item('paste', 'Paste')}
          {item('paste-points', 'Paste coordinates (x y list)…')}
          {item('duplicate', 'Duplicate')}
          {item('delete', 'Delete', 'Del')}
          {item('select-all', 'Select all parts')}
        </>,
      )}
      {menu(
        'View',
        <>
          {item('zoom-in', 'Zoom in')}
          {item('zoom-out', 'Zoom out')}
          {item('zoom-fit', 'Fit the section')}
          <hr />
          {OVERLAY_NAMES.map(([key, label]) => (
            <label key={key} className="menu-item check">
              <input type="checkbox" data-testid={`overlay-${key}`} checked={props.overlays[key]} onChange={(e) => props.onOverlays({ ...props.overlays, [key]: e.target.checked })} />
              <span>{label}</span>
            </label>
          ))}
        </>,
      )}
      {menu(
        'Help',
        <>
          {item('shortcuts', 'Keyboard shortcuts')}
          {item('open-example', 'Open the example: footbridge box girder')}
        </>,
      )}
      <span className="quick">
        <button type="button" data-testid="undo" disabled={!props.canUndo} title={props.undoLabel ? `Undo ${props.undoLabel}` : 'Nothing to undo'} onClick={() => props.onAction('undo')}>
          ↶ Undo
        </button>
        <button type="button" data-testid="redo" disabled={!props.canRedo} title={props.redoLabel ? `Redo ${props.redoLabel}` : 'Nothing to redo'} onClick={() => props.onAction('redo')}>
          ↷ Redo
        </button>
        <button type="button" data-testid="save" onClick={() => props.onAction('save')}>
          Save
        </button>
        <button type="button" data-testid="zoom-fit" onClick={() => props.onAction('zoom-fit')}>
          Fit
        </button>
      </span>
      <span className="doc-title" data-testid="doc-title">
        {props.title}
      </span>
      <input
        ref={fileInput}
        className="file-input"
        type="file"
        accept=".json,.geojson,.dxf,application/json"
        data-testid="open-document"
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (f) props.onOpenFile(f);
          e.target.value = '';
        }}
      />
    </nav>
  );
}
