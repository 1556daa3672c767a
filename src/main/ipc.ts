/**
 * IPC handlers: one per channel of the contract. Each checks that the sender is one of our
 * windows showing our own page, validates the payload, then calls the file layer. Electron's
 * ipcMain is passed in, so tests drive this module with a small fake.
 */
import { IPC, type ExportRequest, type OpenedFile, type SaveRequest, type SaveResult, type Startup } from '../core/project/ipc-contract.ts';
import { PayloadError, payloadSchemas as S, validate } from './ipc-validate.ts';

/** The parts of an IPC event we look at. */
export interface IpcEventLike {
  readonly sender: { readonly id: number };
  readonly senderFrame?: { readonly url: string } | null;
}

/** The parts of Electron's ipcMain we use. */
export interface IpcMainLike {
  handle(channel: string, listener: (event: IpcEventLike, ...args: unknown[]) => unknown): void;
  on(channel: string, listener: (event: IpcEventLike, ...args: unknown[]) => void): void;
}

/** What the handlers do, per window (identified by its webContents id). */
export interface IpcHandlers {
  startup(sender: number): Promise<Startup>;
  openProject(sender: number): Promise<OpenedFile | null>;
  saveProject(sender: number, req: SaveRequest): Promise<SaveResult>;
  saveProjectAs(sender: number, req: SaveRequest): Promise<SaveResult>;
  exportFile(sender: number, req: ExportRequest): Promise<string | null>;
  recentFiles(): Promise<readonly string[]>;
  openRecent(path: string): Promise<OpenedFile | null>;
  revealInFolder(path: string): Promise<void>;
  autosave(text: string | null): Promise<void>;
  setDirty(sender: number, dirty: boolean): void;
}

/** Refusal of a sender that is not one of our windows. */
export class UntrustedSenderError extends Error {
  constructor(channel: string) {
    super(`ignored ${channel} from a sender that is not a Coppice window`);
    this.name = 'UntrustedSenderError';
  }
}

/**
 * A sender is trusted when its webContents belongs to one of our windows and the frame shows
 * a page of our own scheme (`coppice-app://app/…`).
 */
export function senderCheck(ownContents: () => Iterable<number>, appOrigin: string): (e: IpcEventLike) => boolean {
  return (e) => {
    if (![...ownContents()].includes(e.sender.id)) return false;
    const url = e.senderFrame?.url;
    return typeof url === 'string' && (url === appOrigin || url.startsWith(`${appOrigin}/`));
  };
}

/**
 * Registers every channel. An untrusted sender or a malformed payload is refused (the
 * renderer's promise rejects) and logged through `log`; the handler is never called.
 */
export function registerIpc(ipc: IpcMainLike, trusted: (e: IpcEventLike) => boolean, h: IpcHandlers, log: (message: string) => void = (m) => console.warn(`coppice: ${m}`)): void {
  const invoke = (channel: string, run: (e: IpcEventLike, args: unknown[]) => unknown) =>
    ipc.handle(channel, async (e, ...args) => {
      if (!trusted(e)) {
        const err = new UntrustedSenderError(channel);
        log(err.message);
        throw err;
      }
      try {
        return await run(e, args);
      } catch (err) {
        if (err instanceof PayloadError) log(err.message);
        throw err;
      }
    });
  invoke(IPC.startup, (e, a) => (validate(S.none, IPC.startup, a), h.startup(e.sender.id)));
  invoke(IPC.openProject, (e, a) => (validate(S.none, IPC.openProject, a), h.openProject(e.sender.id)));
  invoke(IPC.saveProject, (e, a) => h.saveProject(e.sender.id, validate(S.saveRequest, IPC.saveProject, a[0]) as SaveRequest));
  invoke(IPC.saveProjectAs, (e, a) => h.saveProjectAs(e.sender.id, validate(S.saveRequest, IPC.saveProjectAs, a[0]) as SaveRequest));
  invoke(IPC.exportFile, (e, a) => h.exportFile(e.sender.id, validate(S.exportRequest, IPC.exportFile, a[0])));
  invoke(IPC.recentFiles, (_e, a) => (validate(S.none, IPC.recentFiles, a), h.recentFiles()));
  invoke(IPC.openRecent, (_e, a) => h.openRecent(validate(S.path, IPC.openRecent, a[0])));
  invoke(IPC.revealInFolder, (_e, a) => h.revealInFolder(validate(S.path, IPC.revealInFolder, a[0])));
  invoke(IPC.autosave, (_e, a) => h.autosave(validate(S.autosave, IPC.autosave, a[0])));
  ipc.on(IPC.setDirty, (e, ...a) => {
    if (!trusted(e)) return log(new UntrustedSenderError(IPC.setDirty).message);
    const r = S.dirty.safeParse(a[0]);
    if (r.success) h.setDirty(e.sender.id, r.data);
    else log(new PayloadError(IPC.setDirty, 'value: expected a boolean').message);
  });
}
