import { mkdtemp, readFile, readdir, rm } from 'node:fs/promises';
import { promises as fs } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { atomicWrite, RecentFiles, RecoveryFile, type Fs } from '../../src/main/files.ts';
import { menuTemplate } from '../../src/main/menu.ts';
import { APP_ORIGIN, CONTENT_SECURITY_POLICY, resolveAppPath, serveApp } from '../../src/main/protocol.ts';
import { linksFromArgv, projectFromArgv } from '../../src/main/url-scheme.ts';
import { hardenContents, isAppUrl, windowOptions, type ContentsLike } from '../../src/main/windows.ts';

describe('windows', () => {
  it('turn on isolation and the sandbox, node integration off', () => {
    const w = windowOptions('/x/preload.cjs').webPreferences!;
    expect(w).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false, webviewTag: false, preload: '/x/preload.cjs' });
  });

  it('block navigation away from the app and every new window', () => {
    const on = new Map<string, (e: { preventDefault(): void }, url: string) => void>();
    let openHandler: ((d: { url: string }) => { action: string }) | null = null;
    const contents = {
      on: (ev: string, f: never) => void on.set(ev, f),
      setWindowOpenHandler: (f: never) => void (openHandler = f),
    } as unknown as ContentsLike;
    hardenContents(contents);
    const nav = (url: string) => {
      let prevented = false;
      on.get('will-navigate')!({ preventDefault: () => (prevented = true) }, url);
      return prevented;
    };
    expect(nav('https://example.org/')).toBe(true);
    expect(nav('file:///etc/passwd')).toBe(true);
    expect(nav('coppice-app://appx.evil/')).toBe(true);
    expect(nav(`${APP_ORIGIN}/index.html?x=1`)).toBe(false);
    expect(openHandler!({ url: `${APP_ORIGIN}/index.html` })).toEqual({ action: 'deny' });
    let webview = false;
    on.get('will-attach-webview')!({ preventDefault: () => (webview = true) }, '');
    expect(webview).toBe(true);
    expect(isAppUrl(APP_ORIGIN)).toBe(true);
  });
});

describe('page protocol', () => {
  it('maps app URLs into the renderer folder and nothing outside it', () => {
    expect(resolveAppPath('/r', `${APP_ORIGIN}/`)).toBe('/r/index.html');
    expect(resolveAppPath('/r', `${APP_ORIGIN}/assets/a.js?v=1`)).toBe('/r/assets/a.js');
    expect(resolveAppPath('/r', `${APP_ORIGIN}/../etc/passwd`)).toBe('/r/etc/passwd');
    expect(resolveAppPath('/r', `${APP_ORIGIN}/%2e%2e/%2e%2e/etc/passwd`)).toBe('/r/etc/passwd');
    expect(resolveAppPath('/r', `${APP_ORIGIN}/x%2F..%2F..%2Fetc%2Fpasswd`)).toBeNull();
    expect(resolveAppPath('/r', 'coppice-app://other/index.html')).toBeNull();
    expect(resolveAppPath('/r', 'file:///r/index.html')).toBeNull();
  });

  it('serves files with the content security policy', async () => {
    let handler: ((r: Request) => Response | Promise<Response>) | null = null;
    serveApp({ handle: (_s, h) => void (handler = h) }, '/r', async (p) => Buffer.from(`file ${p}`), async (p) => p);
    const ok = await handler!(new Request(`${APP_ORIGIN}/index.html`));
    expect(ok.status).toBe(200);
    expect(ok.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(ok.headers.get('content-type')).toMatch(/text\/html/);
    expect(await ok.text()).toBe('file /r/index.html');
    expect(CONTENT_SECURITY_POLICY).toMatch(/worker-src 'self' blob:/);
    expect(CONTENT_SECURITY_POLICY).toMatch(/font-src 'self' data:/);
    expect((await handler!(new Request('coppice-app://elsewhere/x'))).status).toBe(404);
  });
});

describe('files', () => {
  let dir = '';
  afterEach(async () => {
    if (dir) await rm(dir, { recursive: true, force: true });
  });

  it('saves atomically and leaves no temp file', async () => {
    dir = await mkdtemp(join(tmpdir(), 'coppice-'));
    const p = join(dir, 'a.coppice.json');
    await atomicWrite(p, 'one');
    await atomicWrite(p, 'two');
    expect(await readFile(p, 'utf8')).toBe('two');
    expect(await readdir(dir)).toEqual(['a.coppice.json']);
  });

  it('retries a rename the platform briefly refuses, and cleans up when it keeps refusing', async () => {
    dir = await mkdtemp(join(tmpdir(), 'coppice-'));
    const p = join(dir, 'b.coppice.json');
    let refusals = 2;
    const flaky: Fs = { ...fs, rename: async (a, b) => (refusals-- > 0 ? Promise.reject(Object.assign(new Error('busy'), { code: 'EBUSY' })) : fs.rename(a, b)) };
    await atomicWrite(p, 'ok', flaky);
    expect(await readFile(p, 'utf8')).toBe('ok');
    const stuck: Fs = { ...fs, rename: async () => Promise.reject(Object.assign(new Error('perm'), { code: 'EPERM' })) };
    await expect(atomicWrite(p, 'never', stuck, 2)).rejects.toThrow('perm');
    expect(await readdir(dir)).toEqual(['b.coppice.json']);
    expect(await readFile(p, 'utf8')).toBe('ok');
  });

  it('keeps recent files newest first, without duplicates, and a recovery file', async () => {
    dir = await mkdtemp(join(tmpdir(), 'coppice-'));
    const r = new RecentFiles(join(dir, 'recent.json'), fs, 3);
    await r.load();
    for (const f of ['/a', '/b', '/c', '/a', '/d']) await r.add(f);
    expect(r.files).toEqual(['/d', '/a', '/c']);
    const again = new RecentFiles(join(dir, 'recent.json'));
    expect(await again.load()).toEqual(['/d', '/a', '/c']);
    const rec = new RecoveryFile(join(dir, 'sub', 'recovery.json'));
    expect(await rec.read()).toBeNull();
    await rec.write('{"x":1}');
    expect(await rec.read()).toBe('{"x":1}');
    await rec.write(null);
    expect(await rec.read()).toBeNull();
  });
});

describe('menu and links', () => {
  it('has the usual accelerators and sends commands', () => {
    const sent: string[] = [];
    const t = menuTemplate({ isMac: false, recent: [], send: (c) => sent.push(c), openRecent: () => {} });
    const items = t.flatMap((m) => (Array.isArray(m.submenu) ? m.submenu : []));
    const acc = Object.fromEntries(items.filter((i) => i.accelerator).map((i) => [i.label, i.accelerator]));
    expect(acc).toMatchObject({ 'Open…': 'CmdOrCtrl+O', Save: 'CmdOrCtrl+S', 'Save As…': 'CmdOrCtrl+Shift+S', Undo: 'CmdOrCtrl+Z', Redo: 'Ctrl+Y' });
    const save = items.find((i) => i.label === 'Save')!;
    (save.click as () => void)();
    expect(sent).toEqual(['save']);
  });

  it('finds graph links and the project on the command line', () => {
    expect(linksFromArgv(['/usr/bin/coppice', 'coppice://graph?notation=1-2%201-2%20%2F%201%201%202%202&theory=phi4'])).toEqual([{ notation: '1-2 1-2 / 1 1 2 2', theory: 'phi4' }]);
    expect(linksFromArgv(['x', 'https://graph?notation=1'])).toEqual([]);
    expect(projectFromArgv(['electron', '.', '--project', 'assets/demo/phi4-course.coppice.json'])).toBe('assets/demo/phi4-course.coppice.json');
    expect(projectFromArgv(['coppice', '/home/u/p.coppice.json'])).toBe('/home/u/p.coppice.json');
  });
});
