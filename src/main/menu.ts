/** The native menu, with the usual accelerators; items send commands to the focused window's renderer. */
import type { MenuItemConstructorOptions } from 'electron';
import type { MenuCommand } from '../core/project/ipc-contract.ts';

export interface MenuOptions {
  readonly isMac: boolean;
  readonly recent: readonly string[];
  readonly send: (cmd: MenuCommand) => void;
  readonly openRecent: (path: string) => void;
  readonly revealInFolder?: () => void;
}

export function menuTemplate(o: MenuOptions): MenuItemConstructorOptions[] {
  const cmd = (label: string, command: MenuCommand, accelerator?: string): MenuItemConstructorOptions => ({
    label,
    ...(accelerator ? { accelerator } : {}),
    click: () => o.send(command),
  });
  const file: MenuItemConstructorOptions = {
    label: 'File',
    submenu: [
      cmd('New Project', 'new', 'CmdOrCtrl+N'),
      cmd('Open…', 'open', 'CmdOrCtrl+O'),
      {
        label: 'Open Recent',
        submenu: o.recent.length ? o.recent.map((p) => ({ label: p, click: () => o.openRecent(p) })) : [{ label: 'No recent projects', enabled: false }],
      },
      { type: 'separator' },
      cmd('Save', 'save', 'CmdOrCtrl+S'),
      cmd('Save As…', 'save-as', 'CmdOrCtrl+Shift+S'),
      { label: 'Export', submenu: [cmd('Project as JSON…', 'export-json', 'CmdOrCtrl+E'), cmd('Graphs as Plain Text…', 'export-text')] },
      ...(o.revealInFolder ? [{ label: o.isMac ? 'Reveal in Finder' : 'Show in Folder', click: o.revealInFolder }] : []),
      { type: 'separator' },
      o.isMac ? { role: 'close' } : { role: 'quit' },
    ],
  };
  const edit: MenuItemConstructorOptions = {
    label: 'Edit',
    submenu: [
      cmd('Undo', 'undo', 'CmdOrCtrl+Z'),
      cmd('Redo', 'redo', o.isMac ? 'Shift+Cmd+Z' : 'Ctrl+Y'),
      { type: 'separator' },
      { role: 'cut' },
      { role: 'copy' },
      { role: 'paste' },
      cmd('Delete Selection', 'delete'),
      cmd('Select All Elements', 'select-all'),
      { type: 'separator' },
      cmd('Copy Graph Notation', 'copy-notation', 'CmdOrCtrl+Shift+C'),
      cmd('Paste Notation as New Graph', 'paste-notation', 'CmdOrCtrl+Shift+V'),
    ],
  };
  const graph: MenuItemConstructorOptions = {
    label: 'Graph',
    submenu: [cmd('New Graph', 'new-graph', 'CmdOrCtrl+G'), cmd('Arrange Automatically', 'layout', 'CmdOrCtrl+L')],
  };
  const viewMenu: MenuItemConstructorOptions = {
    label: 'View',
    submenu: [
      cmd('Fit Graph', 'fit', 'CmdOrCtrl+0'),
      cmd('Zoom In', 'zoom-in', 'CmdOrCtrl+Plus'),
      cmd('Zoom Out', 'zoom-out', 'CmdOrCtrl+-'),
      { type: 'separator' },
      { role: 'togglefullscreen' },
    ],
  };
  const app: MenuItemConstructorOptions[] = o.isMac ? [{ role: 'appMenu' }] : [];
  return [...app, file, edit, graph, viewMenu, { role: 'windowMenu' }];
}
