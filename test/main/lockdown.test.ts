/**
 * The app is locked down: window options, the Content Security Policy (header and meta tag),
 * navigation and new windows refused, the page protocol serving only the renderer folder
 * (traversal, encodings, absolute paths, symlinks out), graph links validated like any input,
 * malformed IPC payloads refused and logged, and no remote content loaded anywhere.
 */
import { mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { BrowserWindow, BrowserWindowConstructorOptions } from 'electron';
import { IPC } from '../../src/core/project/ipc-contract.ts';
import { registerIpc, senderCheck, type IpcEventLike, type IpcHandlers } from '../../src/main/ipc.ts';
import { APP_ORIGIN, CONTENT_SECURITY_POLICY, resolveAppPath, serveApp } from '../../src/main/protocol.ts';
import { checkGraphLink, linksFromArgv } from '../../src/main/url-scheme.ts';
import { createMainWindow, hardenContents, windowOptions, type ContentsLike } from '../../src/main/windows.ts';

/** A fake BrowserWindow recording what the module does to it. */
function fakeWindowClass() {
  const made: { options: BrowserWindowConstructorOptions; loaded: string[]; on: Map<string, (...a: never[]) => unknown>; permission?: (wc: unknown, p: string, cb: (ok: boolean) => void) => void; openHandler?: (d: { url: string }) => unknown }[] = [];
  class FakeWindow {
    readonly rec: (typeof made)[number];
    readonly webContents: unknown;
    constructor(options: BrowserWindowConstructorOptions) {
      const rec: (typeof made)[number] = { options, loaded: [], on: new Map() };
      this.rec = rec;
      made.push(rec);
      this.webContents = {
        on: (ev: string, f: never) => void rec.on.set(ev, f),
        setWindowOpenHandler: (f: never) => void (rec.openHandler = f),
        session: { setPermissionRequestHandler: (f: never) => void (rec.permission = f) },
      };
    }
    once() {}
    on(ev: string, f: never) {
      this.rec.on.set(`window:${ev}`, f);
    }
    show() {}
    loadURL(url: string) {
      this.rec.loaded.push(url);
      return Promise.resolve();
    }
  }
  return { Ctor: FakeWindow as unknown as typeof BrowserWindow, made };
}

describe('windows', () => {
  it('isolation, sandbox, web security on; node integration, webviews, insecure content off', () => {
    expect(windowOptions('/p.cjs').webPreferences).toMatchObject({
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
    });
  });

  it('the main window loads only our page, denies permissions, new windows and navigation away', () => {
    const { Ctor, made } = fakeWindowClass();
    createMainWindow(Ctor, '/x/preload.cjs', () => true);
    const w = made[0]!;
    expect(w.options.webPreferences?.preload).toBe('/x/preload.cjs');
    expect(w.loaded).toEqual([`${APP_ORIGIN}/index.html`]);
    for (const url of w.loaded) expect(url.startsWith(`${APP_ORIGIN}/`)).toBe(true);
    const answers: boolean[] = [];
    for (const p of ['media', 'geolocation', 'notifications', 'openExternal']) w.permission!(null, p, (ok) => answers.push(ok));
    expect(answers).toEqual([false, false, false, false]);
    expect(w.openHandler!({ url: 'https://example.org' })).toEqual({ action: 'deny' });
    for (const ev of ['will-navigate', 'will-redirect']) {
      const blocked = (url: string) => {
        let prevented = false;
        (w.on.get(ev) as (e: { preventDefault(): void }, u: string) => void)({ preventDefault: () => (prevented = true) }, url);
        return prevented;
      };
      for (const bad of ['https://example.org/', 'http://127.0.0.1:5173/', 'file:///etc/passwd', 'javascript:alert(1)', 'data:text/html,<script>1</script>', 'coppice-app://app.evil.org/', 'coppice-app://appx/', 'coppice-app://app@evil.org/', 'coppice://graph?graph=1-2']) {
        expect(blocked(bad), `${ev} ${bad}`).toBe(true);
      }
      expect(blocked(`${APP_ORIGIN}/index.html?theory=phi4`)).toBe(false);
    }
  });

  it('a close with unsaved changes the user keeps is prevented', () => {
    const { Ctor, made } = fakeWindowClass();
    createMainWindow(Ctor, '/p.cjs', () => false);
    let prevented = false;
    (made[0]!.on.get('window:close') as (e: { preventDefault(): void }) => void)({ preventDefault: () => (prevented = true) });
    expect(prevented).toBe(true);
  });

  it('webviews are refused on any contents', () => {
    const on = new Map<string, (e: { preventDefault(): void }) => void>();
    hardenContents({ on: (ev: string, f: never) => void on.set(ev, f), setWindowOpenHandler: () => {} } as unknown as ContentsLike);
    let prevented = false;
    on.get('will-attach-webview')!({ preventDefault: () => (prevented = true) });
    expect(prevented).toBe(true);
  });
});

/** The policy as a map from directive to its sources. */
const directives = (csp: string) => new Map(csp.split(';').map((d) => d.trim()).filter(Boolean).map((d) => { const [k, ...v] = d.split(/\s+/); return [k!, v] as const; }));

describe('Content Security Policy', () => {
  const meta = async () => {
    const html = await readFile('renderer/index.html', 'utf8');
    const m = /<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html);
    expect(m, 'renderer/index.html has a CSP meta tag').not.toBeNull();
    return m![1]!;
  };

  it.each([['header', async () => CONTENT_SECURITY_POLICY], ['meta tag', meta]])('%s: only our own origin, no eval, the module worker and KaTeX fonts allowed', async (_w, get) => {
    const csp = directives(await get());
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('base-uri')).toEqual(["'none'"]);
    expect(csp.get('worker-src')).toContain("'self'");
    expect(csp.get('font-src')).toContain("'self'");
    for (const [name, sources] of csp) {
      for (const s of sources) {
        expect(s, `${name} ${s}`).not.toMatch(/^(https?:|wss?:|ftp:|\*|'unsafe-eval'|'wasm-unsafe-eval'|'unsafe-hashes'|'strict-dynamic')/);
        expect(s, `${name} ${s}`).toMatch(/^('self'|'none'|'unsafe-inline'|data:|blob:)$/);
      }
    }
    expect(csp.get('script-src')).not.toContain("'unsafe-inline'");
  });

  it('the meta tag says the same as the header (frame-ancestors only works as a header)', async () => {
    const header = directives(CONTENT_SECURITY_POLICY);
    header.delete('frame-ancestors');
    expect(directives(await meta())).toEqual(header);
    expect(directives(CONTENT_SECURITY_POLICY).get('frame-ancestors')).toEqual(["'none'"]);
  });
});

describe('page protocol serves only the renderer folder', () => {
  let base = '';
  let root = '';
  let handler: (r: Request) => Response | Promise<Response>;
  beforeAll(async () => {
    base = await mkdtemp(join(tmpdir(), 'coppice-proto-'));
    root = join(base, 'renderer');
    await mkdir(join(root, 'assets'), { recursive: true });
    await writeFile(join(root, 'index.html'), '<!doctype html>app');
    await writeFile(join(root, 'assets', 'a.js'), 'export {}');
    await writeFile(join(base, 'secret.txt'), 'SECRET');
    await symlink(join(base, 'secret.txt'), join(root, 'leak.txt'));
    await symlink(base, join(root, 'up'));
    await symlink(join(root, 'assets', 'a.js'), join(root, 'inside-link.js'));
    serveApp({ handle: (_s, h) => void (handler = h) }, root);
  });
  afterAll(() => rm(base, { recursive: true, force: true }));
  const get = async (url: string) => {
    const r = await handler(new Request(url));
    return { status: r.status, body: await r.text(), csp: r.headers.get('content-security-policy'), type: r.headers.get('content-type') };
  };

  it('serves its files, with the policy and the right types', async () => {
    expect(await get(`${APP_ORIGIN}/`)).toMatchObject({ status: 200, body: '<!doctype html>app', csp: CONTENT_SECURITY_POLICY });
    expect(await get(`${APP_ORIGIN}/assets/a.js?v=2`)).toMatchObject({ status: 200, type: expect.stringMatching(/javascript/) });
    expect((await get(`${APP_ORIGIN}/inside-link.js`)).status).toBe(200);
  });

  it.each([
    '/../../etc/passwd',
    '/%2e%2e/%2e%2e/etc/passwd',
    '/%2E%2E%2F%2E%2E%2Fsecret.txt',
    '/assets/..%2F..%2Fsecret.txt',
    '/x%2F..%2F..%2Fsecret.txt',
    '/..%5C..%5Csecret.txt',
    '/%5C%5Cserver%5Cshare',
    '//etc/passwd',
    '/%2Fetc%2Fpasswd',
    '/C:/Windows/win.ini',
    '/index.html%00.js',
    '/leak.txt',
    '/up/secret.txt',
    '/%ff%fe',
    '/missing.html',
  ])('refuses %s', async (path) => {
    const r = await get(`${APP_ORIGIN}${path}`);
    expect(r.status).toBe(404);
    expect(r.body).not.toContain('SECRET');
  });

  it('refuses other hosts and schemes', async () => {
    expect((await get('coppice-app://evil/index.html')).status).toBe(404);
    expect((await get('coppice-app://app.evil/index.html')).status).toBe(404);
    expect(resolveAppPath(root, 'file:///etc/passwd')).toBeNull();
    expect(resolveAppPath(root, 'https://app/index.html')).toBeNull();
  });
});

describe('graph links are validated like any input', () => {
  const link = (q: string) => checkGraphLink(`coppice://graph?${q}`);
  const bubble = encodeURIComponent('1-2 1-2 / 1 1 2 2');

  it('accepts a good link', () => {
    expect(link(`theory=phi4&graph=${bubble}&name=bubble`)).toEqual({ link: { theory: 'phi4', notation: '1-2 1-2 / 1 1 2 2', name: 'bubble' } });
    expect(link(`notation=${bubble}`)).toEqual({ link: { notation: '1-2 1-2 / 1 1 2 2' } });
  });

  it.each([
    ['a bad theory', `theory=..%2F..%2Fetc&graph=${bubble}`, /unknown theory/],
    ['an unknown theory', `theory=phi5&graph=${bubble}`, /unknown theory/],
    ['malformed notation', 'theory=phi4&graph=1-2%20%2F%20%25%25', /refused link/],
    ['a graph that does not fit the theory', `theory=qed&graph=${encodeURIComponent('1-2 1-2 1-2 1-2 / 1 1 2 2')}`, /refused link/],
    ['no graph', 'theory=phi4', /no graph/],
    ['an extra parameter', `graph=${bubble}&exec=rm`, /unknown parameter "exec"/],
    ['a repeated parameter', `graph=${bubble}&graph=1-2`, /twice/],
    ['graph and notation both', `graph=${bubble}&notation=${bubble}`, /both/],
    ['bad percent-encoding', 'graph=%E0%A4%A', /percent-encoding/],
    ['an over-long graph', `graph=${'1-2%20'.repeat(30_000)}`, /longer than/],
    ['an over-long name', `graph=${bubble}&name=${'x'.repeat(201)}`, /name/],
    ['a name with control characters', `graph=${bubble}&name=a%0Ab`, /control/],
    ['a parameter without value', `graph=${bubble}&theory`, /malformed parameter/],
  ])('refuses %s, with a message', (_what, q, message) => {
    const r = link(q);
    expect('error' in r && r.error).toMatch(message);
  });

  it('refuses other link forms and over-long links; only valid links are opened, the rest reported', () => {
    expect(checkGraphLink('coppice://evil?graph=1-2')).toHaveProperty('error');
    expect(checkGraphLink(`coppice://graph?graph=${'1'.repeat(200_001)}`)).toHaveProperty('error');
    const refused: string[] = [];
    const links = linksFromArgv(['/usr/bin/coppice', '--flag', `coppice://graph?graph=${bubble}`, 'coppice://graph?theory=nope&graph=1-2', 'COPPICE://graph?graph=1-2&x=1'], (m) => refused.push(m));
    expect(links).toEqual([{ notation: '1-2 1-2 / 1 1 2 2' }]);
    expect(refused).toHaveLength(2);
    expect(refused.every((m) => /^refused link: /.test(m))).toBe(true);
  });
});

describe('IPC: a malformed payload is rejected and logged, never executed', () => {
  const ours: IpcEventLike = { sender: { id: 1 }, senderFrame: { url: `${APP_ORIGIN}/index.html` } };
  const setup = () => {
    const handlers = new Map<string, (e: IpcEventLike, ...a: unknown[]) => unknown>();
    const listeners = new Map<string, (e: IpcEventLike, ...a: unknown[]) => void>();
    const h = Object.fromEntries(['startup', 'openProject', 'saveProject', 'saveProjectAs', 'exportFile', 'recentFiles', 'openRecent', 'revealInFolder', 'autosave', 'setDirty'].map((k) => [k, vi.fn(async () => null)])) as unknown as IpcHandlers;
    const log = vi.fn();
    registerIpc({ handle: (c, f) => void handlers.set(c, f), on: (c, f) => void listeners.set(c, f) }, senderCheck(() => [1], APP_ORIGIN), h, log);
    return { handlers, listeners, h, log };
  };

  it.each([
    [IPC.saveProject, { text: 'x', suggestedName: 'a.json', overwrite: 'yes' }],
    [IPC.saveProject, { text: 'x', suggestedName: 'a.json', path: '/a\0b' }],
    [IPC.saveProject, { text: 'x'.repeat(20_000_001), suggestedName: 'a.json' }],
    [IPC.saveProject, { text: 'x', suggestedName: 'a.json', __proto__: { polluted: true }, constructor: 1 }],
    [IPC.exportFile, { text: 'x', suggestedName: 'C:\\evil.bat', format: 'text' }],
    [IPC.openRecent, '../etc/passwd'],
    [IPC.autosave, 42],
  ])('%s %#', async (channel, payload) => {
    const { handlers, h, log } = setup();
    await expect(handlers.get(channel)!(ours, payload)).rejects.toThrow(/invalid payload/);
    expect(log).toHaveBeenCalledWith(expect.stringMatching(new RegExp(`invalid payload on ${channel}`)));
    for (const f of Object.values(h)) expect(f).not.toHaveBeenCalled();
  });

  it('untrusted senders and bad setDirty values are logged too', async () => {
    const { handlers, listeners, h, log } = setup();
    await expect(handlers.get(IPC.recentFiles)!({ sender: { id: 2 }, senderFrame: { url: `${APP_ORIGIN}/` } })).rejects.toThrow(/not a Coppice window/);
    listeners.get(IPC.setDirty)!(ours, 'true');
    listeners.get(IPC.setDirty)!({ sender: { id: 1 }, senderFrame: { url: 'https://evil.org/' } }, true);
    expect(log).toHaveBeenCalledTimes(3);
    expect(h.setDirty).not.toHaveBeenCalled();
  });

  it('a well-formed save with overwrite passes through', async () => {
    const { handlers, h, log } = setup();
    await handlers.get(IPC.saveProject)!(ours, { text: '{}', suggestedName: 'a.coppice.json', path: '/home/u/a.coppice.json', overwrite: true });
    expect(h.saveProject).toHaveBeenCalledWith(1, { text: '{}', suggestedName: 'a.coppice.json', path: '/home/u/a.coppice.json', overwrite: true });
    expect(log).not.toHaveBeenCalled();
  });
});

describe('no remote content, ever', () => {
  it('main-process code loads only our scheme and opens nothing external', async () => {
    const files = (await readdir('src/main')).filter((f) => f.endsWith('.ts'));
    const sources = Object.fromEntries(await Promise.all(files.map(async (f) => [f, await readFile(join('src/main', f), 'utf8')] as const)));
    for (const [f, src] of Object.entries(sources)) {
      expect(src, f).not.toMatch(/\bloadFile\s*\(|openExternal|webviewTag:\s*true|nodeIntegration:\s*true|contextIsolation:\s*false|sandbox:\s*false|webSecurity:\s*false|allowRunningInsecureContent:\s*true/);
      expect(src, f).not.toMatch(/['"`]https?:\/\//);
      for (const m of src.matchAll(/\.loadURL\(([^)]*)\)/g)) expect(`${f}: ${m[1]}`).toMatch(/: `\$\{APP_ORIGIN\}\//);
    }
    expect(Object.values(sources).join('\n').match(/\.loadURL\(/g)).toHaveLength(1);
  });
});
