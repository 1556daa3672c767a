/**
 * What the renderer needs from its host: the desktop app's preload bridge when present,
 * otherwise the browser fallback (file picker, downloads, localStorage). The renderer never
 * assumes `window.coppice` exists.
 */
import type { CoppiceBridge, GraphLink, OpenedFile } from '../../../src/core/project/ipc-contract.ts';

/** What the renderer may ask of its host: the desktop bridge's functions, or their browser fallbacks. */
export interface Platform extends Omit<CoppiceBridge, 'platform'> {
  readonly kind: 'desktop' | 'browser';
}

export const RECOVERY_KEY = 'coppice.recovery';

export function desktopPlatform(bridge: CoppiceBridge): Platform {
  return {
    kind: 'desktop',
    startup: () => bridge.startup(),
    openProject: () => bridge.openProject(),
    saveProject: (r) => bridge.saveProject(r),
    saveProjectAs: (r) => bridge.saveProjectAs(r),
    exportFile: (r) => bridge.exportFile(r),
    recentFiles: () => bridge.recentFiles(),
    openRecent: (p) => bridge.openRecent(p),
    revealInFolder: (p) => bridge.revealInFolder(p),
    autosave: (t) => bridge.autosave(t),
    setDirty: (d) => bridge.setDirty(d),
    onMenuCommand: (l) => bridge.onMenuCommand(l),
    onOpenLink: (l) => bridge.onOpenLink(l),
    onOpenFile: (l) => bridge.onOpenFile(l),
  };
}

function download(text: string, name: string, type = 'application/json'): string {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return name;
}

function pickFile(): Promise<OpenedFile | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = '.json,application/json';
    input.setAttribute('data-testid', 'file-input');
    input.style.display = 'none';
    const done = (v: OpenedFile | null) => {
      input.remove();
      resolve(v);
    };
    input.addEventListener('cancel', () => done(null));
    input.addEventListener('change', () => {
      const f = input.files?.[0];
      if (!f) return done(null);
      f.text().then((text) => done({ path: f.name, text }), () => done(null));
    });
    document.body.appendChild(input);
    input.click();
  });
}

/** The browser fallback: downloads for save and export, a file picker for open, localStorage for autosave. */
export function browserPlatform(storage: Storage | undefined = globalThis.localStorage): Platform {
  const link = (() => {
    try {
      const q = new URLSearchParams(globalThis.location?.search ?? '');
      // `graph` is the documented name; `notation` is accepted too.
      const notation = q.get('graph') ?? q.get('notation');
      if (!notation) return undefined;
      const theory = q.get('theory');
      const name = q.get('name');
      return { notation, ...(theory && /^[A-Za-z0-9_-]{1,64}$/.test(theory) ? { theory } : {}), ...(name ? { name: name.slice(0, 200) } : {}) } as GraphLink;
    } catch {
      return undefined;
    }
  })();
  return {
    kind: 'browser',
    async startup() {
      const text = storage?.getItem(RECOVERY_KEY);
      return { ...(text ? { recovery: { path: 'recovered project', text } } : {}), ...(link ? { link } : {}) };
    },
    openProject: pickFile,
    async saveProject(r) {
      return download(r.text, r.suggestedName);
    },
    async saveProjectAs(r) {
      return download(r.text, r.suggestedName);
    },
    async exportFile(r) {
      return download(r.text, r.suggestedName, r.format === 'json' ? 'application/json' : 'text/plain');
    },
    async recentFiles() {
      return [];
    },
    async openRecent() {
      return null;
    },
    async revealInFolder() {},
    async autosave(text) {
      try {
        if (text === null) storage?.removeItem(RECOVERY_KEY);
        else storage?.setItem(RECOVERY_KEY, text);
      } catch {
        // Storage full or disabled: autosave is best effort.
      }
    },
    setDirty() {},
    onMenuCommand: () => () => {},
    onOpenLink: () => () => {},
    onOpenFile: () => () => {},
  };
}

export function detectPlatform(): Platform {
  return typeof window !== 'undefined' && 'coppice' in window && window.coppice ? desktopPlatform(window.coppice) : browserPlatform();
}
