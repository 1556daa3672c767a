/**
 * Windows: secure web preferences, and every page kept on our own scheme — navigation,
 * new windows, webviews and permission requests are refused.
 */
import type { BrowserWindow, BrowserWindowConstructorOptions, WebContents } from 'electron';
import { APP_ORIGIN } from './protocol.ts';

export function windowOptions(preload: string): BrowserWindowConstructorOptions {
  return {
    width: 1360,
    height: 860,
    minWidth: 900,
    minHeight: 560,
    title: 'Coppice',
    backgroundColor: '#fbfaf7',
    show: false,
    webPreferences: {
      preload,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      spellcheck: false,
    },
  };
}

/** Only our own pages may be shown. */
export function isAppUrl(url: string): boolean {
  return url === APP_ORIGIN || url.startsWith(`${APP_ORIGIN}/`);
}

/** The parts of WebContents we harden. */
export type ContentsLike = Pick<WebContents, 'on' | 'setWindowOpenHandler'>;

export function hardenContents(contents: ContentsLike): void {
  contents.on('will-navigate', (event, url) => {
    if (!isAppUrl(url)) event.preventDefault();
  });
  contents.on('will-redirect', (event, url) => {
    if (!isAppUrl(url)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
}

/** Creates the main window on the app page; `confirmClose` asks about unsaved changes. */
export function createMainWindow(
  Ctor: typeof BrowserWindow,
  preload: string,
  confirmClose: (win: BrowserWindow) => boolean,
): BrowserWindow {
  const win = new Ctor(windowOptions(preload));
  hardenContents(win.webContents);
  win.webContents.session.setPermissionRequestHandler((_wc, _permission, callback) => callback(false));
  win.once('ready-to-show', () => win.show());
  win.on('close', (e) => {
    if (!confirmClose(win)) e.preventDefault();
  });
  void win.loadURL(`${APP_ORIGIN}/index.html`);
  return win;
}
