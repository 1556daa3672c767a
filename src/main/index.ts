/**
 * Electron main process: wiring only. Each concern lives in its own module — windows,
 * menu, files, IPC, the page protocol and graph links.
 */
import { app, BrowserWindow, dialog, ipcMain, Menu, protocol, shell, type FileFilter } from 'electron';
import { existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { IPC, LINK_SCHEME, type GraphLink, type MenuCommand, type SaveResult, type Startup } from '../core/project/ipc-contract.ts';
import { atomicWrite, FileChangedError, fingerprintOf, readTextFile, RecentFiles, RecoveryFile, saveDocument, type Fingerprint } from './files.ts';
import { registerIpc, senderCheck } from './ipc.ts';
import { menuTemplate } from './menu.ts';
import { APP_ORIGIN, registerAppScheme, serveApp } from './protocol.ts';
import { linksFromArgv, projectFromArgv } from './url-scheme.ts';
import { createMainWindow } from './windows.ts';

const here = dirname(fileURLToPath(import.meta.url));
const rendererRoot = join(here, '../renderer');
const preload = join(here, '../preload/preload.cjs');

registerAppScheme(protocol);
if (!app.requestSingleInstanceLock()) app.quit();
if (process.defaultApp && process.argv[1]) app.setAsDefaultProtocolClient(LINK_SCHEME, process.execPath, [resolve(process.argv[1])]);
else app.setAsDefaultProtocolClient(LINK_SCHEME);

const windows = new Set<BrowserWindow>();
const dirty = new Map<number, boolean>();
/** A link from outside that fails validation is refused, logged and shown, never opened. */
function refuseLink(message: string): void {
  console.warn(`coppice: ${message}`);
  if (app.isReady()) dialog.showErrorBox('Coppice did not open the link', message);
}
const pendingLinks: GraphLink[] = linksFromArgv(process.argv, refuseLink);
/** What each project file was when we last read or wrote it, to refuse overwriting changes made elsewhere. */
const onDisk = new Map<string, Fingerprint>();
let recent: RecentFiles;
let recovery: RecoveryFile;

const projectFilters: FileFilter[] = [{ name: 'Coppice project', extensions: ['json'] }];
const exportFilters: Record<string, FileFilter[]> = {
  latex: [{ name: 'LaTeX', extensions: ['tex'] }],
  tikz: [{ name: 'TikZ', extensions: ['tex', 'tikz'] }],
  svg: [{ name: 'SVG', extensions: ['svg'] }],
  json: [{ name: 'JSON', extensions: ['json'] }],
  text: [{ name: 'Plain text', extensions: ['txt'] }],
};
const winOf = (id: number) => [...windows].find((w) => w.webContents.id === id) ?? null;
const focused = () => BrowserWindow.getFocusedWindow() ?? [...windows][0] ?? null;
const send = (cmd: MenuCommand) => focused()?.webContents.send(IPC.menuCommand, cmd);

function refreshMenu(): void {
  Menu.setApplicationMenu(
    Menu.buildFromTemplate(
      menuTemplate({
        isMac: process.platform === 'darwin',
        recent: recent?.files ?? [],
        send,
        openRecent: (p) => void openInFocused(p),
        revealInFolder: () => {
          const p = recent?.files[0];
          if (p) shell.showItemInFolder(p);
        },
      }),
    ),
  );
}

async function openInFocused(path: string): Promise<void> {
  // The renderer decides (unsaved-changes prompt) and loads it.
  const file = await readProjectFile(path).catch(() => null);
  if (file) focused()?.webContents.send(IPC.openFile, file);
}

async function readProjectFile(path: string) {
  const text = await readTextFile(path);
  const fp = await fingerprintOf(path, text);
  if (fp) onDisk.set(path, fp);
  await recent.add(path);
  refreshMenu();
  return { path, text };
}

/** Saves with a backup of the previous version; a file changed on disk since we read it is a conflict, unless `overwrite`. */
async function saveTo(path: string, text: string, overwrite = false): Promise<SaveResult> {
  try {
    const fp = await saveDocument(path, text, { expected: onDisk.get(path), overwrite });
    if (fp) onDisk.set(path, fp);
  } catch (e) {
    if (e instanceof FileChangedError) return { conflict: 'changed-on-disk', path, message: e.message };
    throw e;
  }
  await recent.add(path);
  refreshMenu();
  return path;
}

function confirmClose(win: BrowserWindow): boolean {
  if (!dirty.get(win.webContents.id)) return true;
  const choice = dialog.showMessageBoxSync(win, {
    type: 'question',
    buttons: ['Discard changes', 'Cancel'],
    defaultId: 1,
    cancelId: 1,
    message: 'This project has unsaved changes.',
    detail: 'A recovery copy is kept and offered the next time Coppice starts.',
  });
  return choice === 0;
}

function openWindow(): BrowserWindow {
  const win = createMainWindow(BrowserWindow, preload, confirmClose);
  const id = win.webContents.id;
  windows.add(win);
  win.on('closed', () => {
    windows.delete(win);
    dirty.delete(id);
  });
  return win;
}

function deliverLink(link: GraphLink): void {
  const win = focused();
  if (win) win.webContents.send(IPC.openLink, link);
  else pendingLinks.push(link);
}

app.on('second-instance', (_e, argv) => {
  linksFromArgv(argv, refuseLink).forEach(deliverLink);
  const win = focused();
  if (win) {
    if (win.isMinimized()) win.restore();
    win.focus();
  }
});
app.on('open-url', (e, url) => {
  e.preventDefault();
  linksFromArgv([url], refuseLink).forEach(deliverLink);
});
app.on('web-contents-created', (_e, contents) => {
  contents.on('will-attach-webview', (ev) => ev.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
});
app.on('window-all-closed', () => {
  if (process.platform !== 'darwin') app.quit();
});

void app.whenReady().then(async () => {
  const userData = app.getPath('userData');
  recent = new RecentFiles(join(userData, 'recent-projects.json'));
  recovery = new RecoveryFile(join(userData, 'recovery.coppice.json'));
  await recent.load();
  serveApp(protocol, rendererRoot);
  const startProject = projectFromArgv(process.argv);
  let startupUsed = false;

  registerIpc(ipcMain, senderCheck(() => [...windows].map((w) => w.webContents.id), APP_ORIGIN), {
    async startup() {
      const s: { -readonly [K in keyof Startup]: Startup[K] } = {};
      if (!startupUsed) {
        startupUsed = true;
        if (startProject && existsSync(startProject)) s.project = await readProjectFile(resolve(startProject)).catch(() => undefined);
        const rec = await recovery.read();
        if (rec) s.recovery = { path: recovery.path, text: rec };
        const link = pendingLinks.shift();
        if (link) s.link = link;
      }
      return s;
    },
    async openProject(sender) {
      const win = winOf(sender);
      const r = win ? await dialog.showOpenDialog(win, { properties: ['openFile'], filters: projectFilters }) : null;
      if (!r || r.canceled || !r.filePaths[0]) return null;
      return readProjectFile(r.filePaths[0]);
    },
    async saveProject(sender, req) {
      if (req.path && recent.has(req.path)) return saveTo(req.path, req.text, req.overwrite ?? false);
      return this.saveProjectAs(sender, req);
    },
    async saveProjectAs(sender, req) {
      const win = winOf(sender);
      const r = win ? await dialog.showSaveDialog(win, { defaultPath: req.path ?? req.suggestedName, filters: projectFilters }) : null;
      if (!r || r.canceled || !r.filePath) return null;
      // The dialog has asked about replacing an existing file.
      return saveTo(r.filePath, req.text, true);
    },
    async exportFile(sender, req) {
      const win = winOf(sender);
      const r = win ? await dialog.showSaveDialog(win, { defaultPath: req.suggestedName, filters: exportFilters[req.format] ?? [] }) : null;
      if (!r || r.canceled || !r.filePath) return null;
      await atomicWrite(r.filePath, req.text);
      return r.filePath;
    },
    async recentFiles() {
      return recent.files;
    },
    async openRecent(path) {
      // Only paths the user opened or saved before: the renderer cannot name arbitrary files.
      if (!recent.has(path)) return null;
      return readProjectFile(path).catch(() => null);
    },
    async revealInFolder(path) {
      if (recent.has(path)) shell.showItemInFolder(path);
    },
    async autosave(text) {
      await recovery.write(text);
    },
    setDirty(sender, d) {
      dirty.set(sender, d);
    },
  });

  refreshMenu();
  openWindow();
  app.on('activate', () => {
    if (windows.size === 0) openWindow();
  });
});
