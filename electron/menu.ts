/**
 * The native menu: every item sends one named command to the renderer (renderer/host/host.ts HOST_COMMANDS),
 * except the platform's own roles (quit, copy/paste in text fields, full screen, dev tools).
 * Accelerators are the usual ones; "CmdOrCtrl" is Cmd on macOS and Ctrl elsewhere.
 * Undo, redo and delete are shown but not registered (`registerAccelerator: false`) so that the
 * keys reach the page: in a text field they edit the text, on the canvas the editor's own key
 * handling (the same as in the browser build) runs them.
 */
import type { MenuItemConstructorOptions } from 'electron';
import type { HostCommand } from './channels.ts';

export function menuTemplate(send: (command: HostCommand) => void, platform: NodeJS.Platform): MenuItemConstructorOptions[] {
  const item = (label: string, command: HostCommand, accelerator?: string, pageKey = false): MenuItemConstructorOptions => ({
    label,
    click: () => send(command),
    ...(accelerator ? { accelerator } : {}),
    ...(pageKey ? { registerAccelerator: false } : {}),
  });
  const mac = platform === 'darwin';
  return [
    ...(mac ? [{ label: 'Sectionsmith', submenu: [{ role: 'about' }, { type: 'separator' }, { role: 'hide' }, { role: 'hideOthers' }, { type: 'separator' }, { role: 'quit' }] } satisfies MenuItemConstructorOptions] : []),
    {
      label: 'File',
      submenu: [
        item('New Section', 'new', 'CmdOrCtrl+N'),
        item('Open…', 'open', 'CmdOrCtrl+O'),
        { type: 'separator' },
        item('Save', 'save', 'CmdOrCtrl+S'),
        item('Save As…', 'save-as', 'CmdOrCtrl+Shift+S'),
        { type: 'separator' },
        item('Export Drawing as SVG…', 'export-svg', 'CmdOrCtrl+E'),
        item('Export Properties as CSV…', 'export-csv', 'CmdOrCtrl+Shift+E'),
        item('Export Properties as XLSX…', 'export-xlsx'),
        item('Export Drawing as DXF (CAD, cutting)…', 'export-dxf'),
        { type: 'separator' },
        item('Compare Alternatives…', 'compare'),
        item('Print Report…', 'print-report', 'CmdOrCtrl+P'),
        item('Check a Section Table (CSV)…', 'check-table'),
        ...(mac ? [] : [{ type: 'separator' } as const, { role: 'quit' } as const]),
      ],
    },
    {
      label: 'Edit',
      submenu: [
        item('Undo', 'undo', 'CmdOrCtrl+Z', true),
        item('Redo', 'redo', mac ? 'Cmd+Shift+Z' : 'Ctrl+Y', true),
        { type: 'separator' },
        { role: 'cut' },
        { role: 'copy' },
        { role: 'paste' },
        item('Delete Selected Parts', 'delete', 'Delete', true),
      ],
    },
    {
      label: 'View',
      submenu: [
        item('Zoom In', 'zoom-in', 'CmdOrCtrl+='),
        item('Zoom Out', 'zoom-out', 'CmdOrCtrl+-'),
        item('Fit Section in Window', 'zoom-fit', 'CmdOrCtrl+0'),
        { type: 'separator' },
        { role: 'togglefullscreen' },
        { role: 'toggleDevTools' },
      ],
    },
    {
      label: 'Help',
      submenu: [item('Open the Example Section', 'open-example')],
    },
  ];
}
