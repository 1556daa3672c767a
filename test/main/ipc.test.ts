import { describe, expect, it, vi } from 'vitest';
import { IPC } from '../../src/core/project/ipc-contract.ts';
import { registerIpc, senderCheck, UntrustedSenderError, type IpcEventLike, type IpcHandlers, type IpcMainLike } from '../../src/main/ipc.ts';
import { PayloadError } from '../../src/main/ipc-validate.ts';
import { APP_ORIGIN } from '../../src/main/protocol.ts';

/** A fake ipcMain: records the listeners so tests can call them like Electron would. */
function fakeIpc() {
  const handlers = new Map<string, (e: IpcEventLike, ...a: unknown[]) => unknown>();
  const listeners = new Map<string, (e: IpcEventLike, ...a: unknown[]) => void>();
  const ipc: IpcMainLike = {
    handle: (ch, f) => void handlers.set(ch, f),
    on: (ch, f) => void listeners.set(ch, f),
  };
  return { ipc, invoke: (ch: string, e: IpcEventLike, ...a: unknown[]) => handlers.get(ch)!(e, ...a), send: (ch: string, e: IpcEventLike, ...a: unknown[]) => listeners.get(ch)!(e, ...a), handlers };
}

function fakeHandlers(): IpcHandlers {
  return {
    startup: vi.fn(async () => ({})),
    openProject: vi.fn(async () => null),
    saveProject: vi.fn(async (_s, r) => r.path ?? '/tmp/x.coppice.json'),
    saveProjectAs: vi.fn(async () => '/tmp/y.coppice.json'),
    exportFile: vi.fn(async () => '/tmp/e.txt'),
    recentFiles: vi.fn(async () => ['/tmp/a.coppice.json']),
    openRecent: vi.fn(async () => null),
    revealInFolder: vi.fn(async () => {}),
    autosave: vi.fn(async () => {}),
    setDirty: vi.fn(),
  };
}

const ours: IpcEventLike = { sender: { id: 7 }, senderFrame: { url: `${APP_ORIGIN}/index.html` } };
const stranger: IpcEventLike = { sender: { id: 99 }, senderFrame: { url: `${APP_ORIGIN}/index.html` } };
const foreignPage: IpcEventLike = { sender: { id: 7 }, senderFrame: { url: 'https://example.org/' } };

describe('IPC', () => {
  const setup = () => {
    const f = fakeIpc();
    const h = fakeHandlers();
    registerIpc(f.ipc, senderCheck(() => [7], APP_ORIGIN), h);
    return { ...f, h };
  };

  it('registers every invoke channel of the contract', () => {
    const { handlers } = setup();
    const invokeChannels = Object.values(IPC).filter((c) => ![IPC.setDirty, IPC.menuCommand, IPC.openLink, IPC.openFile].includes(c as never));
    expect([...handlers.keys()].sort()).toEqual(invokeChannels.sort());
  });

  it('answers its own window', async () => {
    const { invoke, h } = setup();
    await expect(invoke(IPC.saveProject, ours, { text: '{}', suggestedName: 'a.coppice.json', path: '/home/u/a.coppice.json' })).resolves.toBe('/home/u/a.coppice.json');
    expect(h.saveProject).toHaveBeenCalledWith(7, { text: '{}', suggestedName: 'a.coppice.json', path: '/home/u/a.coppice.json' });
  });

  it('ignores senders that are not its windows, or frames showing another page', async () => {
    const { invoke, send, h } = setup();
    await expect(invoke(IPC.recentFiles, stranger)).rejects.toBeInstanceOf(UntrustedSenderError);
    await expect(invoke(IPC.openRecent, foreignPage, '/etc/passwd')).rejects.toBeInstanceOf(UntrustedSenderError);
    await expect(invoke(IPC.autosave, { sender: { id: 7 }, senderFrame: null }, 'x')).rejects.toBeInstanceOf(UntrustedSenderError);
    send(IPC.setDirty, stranger, true);
    expect(h.setDirty).not.toHaveBeenCalled();
    expect(h.recentFiles).not.toHaveBeenCalled();
    expect(h.openRecent).not.toHaveBeenCalled();
  });

  it.each([
    [IPC.saveProject, [{ text: 1, suggestedName: 'a' }]],
    [IPC.saveProject, [{ text: '', suggestedName: '../evil' }]],
    [IPC.saveProject, [{ text: '', suggestedName: 'a', path: 'relative/path' }]],
    [IPC.saveProject, [{ text: '', suggestedName: 'a', extra: true }]],
    [IPC.exportFile, [{ text: '', suggestedName: 'a.txt', format: 'exe' }]],
    [IPC.openRecent, [42]],
    [IPC.revealInFolder, ['not/absolute']],
    [IPC.autosave, [{ text: 'x' }]],
    [IPC.startup, ['unexpected']],
  ])('validates payloads: %s %j', async (channel, args) => {
    const { invoke, h } = setup();
    await expect(invoke(channel, ours, ...args)).rejects.toBeInstanceOf(PayloadError);
    for (const f of Object.values(h)) expect(f).not.toHaveBeenCalled();
  });

  it('setDirty takes booleans only', () => {
    const { send, h } = setup();
    send(IPC.setDirty, ours, 'yes');
    send(IPC.setDirty, ours, true);
    expect(h.setDirty).toHaveBeenCalledTimes(1);
    expect(h.setDirty).toHaveBeenCalledWith(7, true);
  });
});
