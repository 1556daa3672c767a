/**
 * The preload (built as CommonJS, preload.cjs, so the sandbox stays on): a few named, typed
 * functions on `window.coppice`, nothing else of Electron reaches the page.
 */
import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import { IPC, MENU_COMMANDS, type CoppiceBridge, type GraphLink, type MenuCommand, type OpenedFile } from '../core/project/ipc-contract.ts';

const bridge: CoppiceBridge = {
  platform: process.platform,
  startup: () => ipcRenderer.invoke(IPC.startup),
  openProject: () => ipcRenderer.invoke(IPC.openProject),
  saveProject: (req) => ipcRenderer.invoke(IPC.saveProject, req),
  saveProjectAs: (req) => ipcRenderer.invoke(IPC.saveProjectAs, req),
  exportFile: (req) => ipcRenderer.invoke(IPC.exportFile, req),
  recentFiles: () => ipcRenderer.invoke(IPC.recentFiles),
  openRecent: (path) => ipcRenderer.invoke(IPC.openRecent, path),
  revealInFolder: (path) => ipcRenderer.invoke(IPC.revealInFolder, path),
  autosave: (text) => ipcRenderer.invoke(IPC.autosave, text),
  setDirty: (dirty) => ipcRenderer.send(IPC.setDirty, dirty),
  onMenuCommand(listener) {
    const f = (_e: IpcRendererEvent, cmd: unknown) => {
      if (typeof cmd === 'string' && (MENU_COMMANDS as readonly string[]).includes(cmd)) listener(cmd as MenuCommand);
    };
    ipcRenderer.on(IPC.menuCommand, f);
    return () => void ipcRenderer.removeListener(IPC.menuCommand, f);
  },
  onOpenLink(listener) {
    const f = (_e: IpcRendererEvent, link: unknown) => {
      if (link && typeof link === 'object' && typeof (link as GraphLink).notation === 'string') listener(link as GraphLink);
    };
    ipcRenderer.on(IPC.openLink, f);
    return () => void ipcRenderer.removeListener(IPC.openLink, f);
  },
  onOpenFile(listener) {
    const f = (_e: IpcRendererEvent, file: unknown) => {
      const x = file as OpenedFile | null;
      if (x && typeof x.path === 'string' && typeof x.text === 'string') listener({ path: x.path, text: x.text });
    };
    ipcRenderer.on(IPC.openFile, f);
    return () => void ipcRenderer.removeListener(IPC.openFile, f);
  },
};

contextBridge.exposeInMainWorld('coppice', bridge);
