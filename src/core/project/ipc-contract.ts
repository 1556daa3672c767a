/**
 * The typed contract between the renderer and the Electron main process: channel names,
 * payload and reply types, and the API the preload exposes as `window.coppice`. Main
 * validates every payload against these shapes (src/main/ipc-validate.ts); the renderer
 * never imports Electron or main code, only these types.
 */

/** A project file read from disk. */
export interface OpenedFile {
  readonly path: string;
  readonly text: string;
}

export interface SaveRequest {
  /** Where to write; absent asks the user (save as). */
  readonly path?: string;
  readonly text: string;
  /** File name proposed in the save dialog. */
  readonly suggestedName: string;
  /** Write even though the file changed on disk since it was opened (after the user agreed). */
  readonly overwrite?: boolean;
}

/** A save refused because the file changed on disk since it was opened or last saved. */
export interface SaveConflict {
  readonly conflict: 'changed-on-disk';
  readonly path: string;
  /** A sentence for the user. */
  readonly message: string;
}

/** What a save answers: the path written, null when the user cancelled, or a conflict. */
export type SaveResult = string | null | SaveConflict;

export function isSaveConflict(r: unknown): r is SaveConflict {
  return typeof r === 'object' && r !== null && (r as SaveConflict).conflict === 'changed-on-disk';
}

export interface ExportRequest {
  readonly text: string;
  readonly suggestedName: string;
  /** What is exported, which picks the dialog's file filter. */
  readonly format: 'latex' | 'tikz' | 'svg' | 'json' | 'text';
}

/** A graph link (`coppice://graph?notation=…&theory=…`) opened from outside the app. */
export interface GraphLink {
  readonly notation: string;
  readonly theory?: string;
  readonly name?: string;
}

/** What the app opens with: the project given on the command line, or a link. */
export interface Startup {
  readonly project?: OpenedFile;
  readonly link?: GraphLink;
  /** A recovery file left by autosave when the app last stopped with unsaved changes. */
  readonly recovery?: OpenedFile;
}

/** Commands the native menu sends to the renderer. */
export type MenuCommand =
  | 'new' | 'open' | 'save' | 'save-as' | 'export-json' | 'export-text'
  | 'undo' | 'redo' | 'delete' | 'select-all' | 'copy-notation' | 'paste-notation'
  | 'layout' | 'fit' | 'zoom-in' | 'zoom-out' | 'new-graph';

/** The functions the preload puts on `window.coppice`. */
export interface CoppiceBridge {
  readonly platform: string;
  startup(): Promise<Startup>;
  openProject(): Promise<OpenedFile | null>;
  /**
   * Saves atomically (keeping the previous version as `<file>.bak`); returns the path written,
   * null when the user cancelled, or a conflict when the file changed on disk since it was
   * opened — ask the user, then save again with `overwrite: true` or save as.
   */
  saveProject(req: SaveRequest): Promise<SaveResult>;
  saveProjectAs(req: SaveRequest): Promise<SaveResult>;
  exportFile(req: ExportRequest): Promise<string | null>;
  recentFiles(): Promise<readonly string[]>;
  openRecent(path: string): Promise<OpenedFile | null>;
  revealInFolder(path: string): Promise<void>;
  /** Writes the recovery file (or removes it when `text` is null, after a save). */
  autosave(text: string | null): Promise<void>;
  /** Tells main whether there are unsaved changes, for the prompt on closing. */
  setDirty(dirty: boolean): void;
  onMenuCommand(listener: (cmd: MenuCommand) => void): () => void;
  onOpenLink(listener: (link: GraphLink) => void): () => void;
  /** A project the user picked from the native menu's recent list. */
  onOpenFile(listener: (file: OpenedFile) => void): () => void;
}

/** Channel names, in one place. Invoke channels answer; send channels do not. */
export const IPC = {
  startup: 'coppice:startup',
  openProject: 'coppice:open-project',
  saveProject: 'coppice:save-project',
  saveProjectAs: 'coppice:save-project-as',
  exportFile: 'coppice:export-file',
  recentFiles: 'coppice:recent-files',
  openRecent: 'coppice:open-recent',
  revealInFolder: 'coppice:reveal-in-folder',
  autosave: 'coppice:autosave',
  setDirty: 'coppice:set-dirty',
  menuCommand: 'coppice:menu-command',
  openLink: 'coppice:open-link',
  openFile: 'coppice:open-file',
} as const;

export const MENU_COMMANDS: readonly MenuCommand[] = [
  'new', 'open', 'save', 'save-as', 'export-json', 'export-text', 'undo', 'redo', 'delete', 'select-all',
  'copy-notation', 'paste-notation', 'layout', 'fit', 'zoom-in', 'zoom-out', 'new-graph',
];

/** The URL scheme that opens graph links, and the app's own page scheme. */
export const LINK_SCHEME = 'coppice';
export const APP_SCHEME = 'coppice-app';

/** Parses `coppice://graph?graph=…&theory=…&name=…` (or `notation=…`); null when it is not such a link. */
export function parseGraphLink(url: string): GraphLink | null {
  const m = /^coppice:\/\/\/?graph\/?\?(.*)$/i.exec(url.trim());
  if (!m || url.length > 200_000) return null;
  const params = new Map<string, string>();
  for (const pair of m[1]!.split('&')) {
    const eq = pair.indexOf('=');
    if (eq <= 0) continue;
    try {
      params.set(pair.slice(0, eq), decodeURIComponent(pair.slice(eq + 1).replace(/\+/g, ' ')));
    } catch {
      return null;
    }
  }
  // `graph` as in the renderer's address (`?theory=…&graph=…`); `notation` as written by graphLink.
  const notation = params.get('graph') ?? params.get('notation');
  if (!notation || notation.length > 100_000) return null;
  const theory = params.get('theory');
  const name = params.get('name');
  return {
    notation,
    ...(theory && /^[A-Za-z0-9_-]{1,64}$/.test(theory) ? { theory } : {}),
    ...(name ? { name: name.slice(0, 200) } : {}),
  };
}

/** A graph link for a notation (the inverse of parseGraphLink). */
export function graphLink(link: GraphLink): string {
  const q = [`notation=${encodeURIComponent(link.notation)}`];
  if (link.theory) q.push(`theory=${encodeURIComponent(link.theory)}`);
  if (link.name) q.push(`name=${encodeURIComponent(link.name)}`);
  return `${LINK_SCHEME}://graph?${q.join('&')}`;
}
