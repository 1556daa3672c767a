/**
 * End-to-end harness: the built renderer (out/renderer, from `npm run build:renderer`) served
 * in-process by Vite's preview server, and Debian's Chromium driven by playwright-core.
 */
import { existsSync, mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { preview, type PreviewServer } from 'vite';

const root = fileURLToPath(new URL('../..', import.meta.url));
export const chromiumPath = process.env.COPPICE_CHROMIUM ?? '/usr/bin/chromium';
export const haveChromium = existsSync(chromiumPath);
export const screenshotDir = `${root}.ci-out/e2e`;

export interface Harness {
  browser: Browser;
  server: PreviewServer;
  url: string;
  close(): Promise<void>;
}

export async function startHarness(): Promise<Harness> {
  if (!existsSync(`${root}out/renderer/index.html`)) throw new Error('the renderer is not built: run `npm run build:renderer` first (npm test does)');
  mkdirSync(screenshotDir, { recursive: true });
  const server = await preview({ configFile: `${root}renderer/vite.config.ts`, logLevel: 'silent', preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false } });
  const port = (server.httpServer.address() as AddressInfo).port;
  const browser = await chromium.launch({
    executablePath: chromiumPath,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  return {
    browser,
    server,
    url: `http://127.0.0.1:${port}/`,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** A fresh page on the app (fresh storage), with console errors collected. */
export async function openApp(h: Harness, query = ''): Promise<{ page: Page; errors: string[] }> {
  const context = await h.browser.newContext({ viewport: { width: 1400, height: 860 }, acceptDownloads: true });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('dialog', (d) => void d.accept());
  await page.goto(`${h.url}${query}`);
  await page.waitForSelector('[data-ready="yes"]');
  return { page, errors };
}

/** Clicks the canvas at an offset from its centre (where model (0,0) sits in a fresh graph). */
export async function clickCanvas(page: Page, dx: number, dy: number): Promise<void> {
  const box = (await page.getByTestId('graph-canvas').boundingBox())!;
  await page.mouse.click(box.x + box.width / 2 + dx, box.y + box.height / 2 + dy);
  await page.waitForTimeout(60);
}
