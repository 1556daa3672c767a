import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clickCanvas, haveChromium, openApp, screenshotDir, startHarness, type Harness } from './harness.ts';

describe.skipIf(!haveChromium && !process.env.CI)('the app in Chromium', () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness();
  });
  afterAll(async () => {
    await h?.close();
  });

  it('loads the demo project, validates it and counts powers in the worker', async () => {
    const { page, errors } = await openApp(h);
    await expect.poll(() => page.getByTestId('graph-item').count()).toBe(8);
    await page.getByTestId('graph-item').nth(1).click();
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 / 1 1 2 2');
    await expect.poll(() => page.getByTestId('validation-status').textContent()).toMatch(/✓/);
    await expect.poll(() => page.getByTestId('pc-loops').textContent(), { timeout: 10_000 }).toBe('1');
    expect(await page.getByTestId('pc-omega').textContent()).toBe('0');
    await page.getByTestId('graph-item').nth(6).click();
    await expect.poll(() => page.getByTestId('pc-subgraph-count').textContent(), { timeout: 10_000 }).toBe('5');
    await page.screenshot({ path: `${screenshotDir}/demo.png` });
    expect(errors).toEqual([]);
  });

  it('draws a one-loop bubble with clicks, shows the valence problem, then validates; undo and redo', async () => {
    const { page, errors } = await openApp(h);
    await page.getByTestId('new-graph').click();
    await page.getByTestId('tool-vertex').click();
    await clickCanvas(page, -100, 0);
    await clickCanvas(page, 100, 0);
    await page.keyboard.press('l');
    for (let i = 0; i < 2; i++) {
      await clickCanvas(page, -100, 0);
      await clickCanvas(page, 100, 0);
    }
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 /');
    await expect.poll(() => page.getByTestId('issue-tag').count()).toBe(2);
    expect(await page.getByTestId('issue-tag').first().textContent()).toMatch(/\(phi,phi\), which is not a vertex of theory phi4/);
    await page.screenshot({ path: `${screenshotDir}/bubble-invalid.png` });

    await page.getByTestId('tool-leg').click();
    for (const dx of [-100, -100, 100, 100]) await clickCanvas(page, dx, 0);
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 / 1 1 2 2');
    await expect.poll(() => page.getByTestId('issue-tag').count()).toBe(0);
    expect(await page.getByTestId('validation-status').textContent()).toMatch(/✓/);
    await expect.poll(() => page.getByTestId('pc-loops').textContent(), { timeout: 10_000 }).toBe('1');
    await page.screenshot({ path: `${screenshotDir}/bubble.png` });

    await page.getByTestId('undo').click();
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 / 1 1 2');
    await page.keyboard.press('Control+z');
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 / 1 1');
    await page.getByTestId('redo').click();
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 / 1 1 2 2');
    expect(errors).toEqual([]);
  });

  it('keeps the notation box and the canvas in sync, and explains bad notation', async () => {
    const { page } = await openApp(h);
    await page.getByTestId('new-graph').click();
    const box = page.getByTestId('notation-input');
    await box.fill('1-2 1-2 1-2 / 1 2');
    await expect.poll(() => page.getByTestId('pc-loops').textContent(), { timeout: 10_000 }).toBe('2');
    await expect.poll(() => page.getByTestId('graph-item').last().textContent()).toMatch(/2v · 3e · 2ext/);
    await box.fill('1-2 1-2 1- / 1 2');
    await expect.poll(() => page.getByTestId('notation-error').isVisible()).toBe(true);
    expect(await page.getByTestId('graph-item').last().textContent()).toMatch(/3e/);
    await box.fill('1-2 1-2 1-2 / 1');
    await page.getByTestId('graph-canvas').click({ position: { x: 20, y: 20 } });
    await expect.poll(() => page.getByTestId('issue-tag').count()).toBe(1);
    await page.screenshot({ path: `${screenshotDir}/notation-sync.png` });
  });

  it('saves the project as a download and opens it back (browser fallback)', async () => {
    const { page } = await openApp(h);
    await page.getByTestId('new-graph').click();
    await page.getByTestId('notation-input').fill('1-2 1-2 2-3 2-3 / 1 1 3 3');
    await page.getByTestId('graph-canvas').click({ position: { x: 20, y: 20 } });
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(1);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('save-project').click()]);
    expect(download.suggestedFilename()).toMatch(/\.coppice\.json$/);
    const file = await download.path();
    const saved = JSON.parse(await readFile(file, 'utf8'));
    expect(saved).toMatchObject({ format: 'coppice-project', version: 1, theory: { builtin: 'phi4' } });
    expect(saved.graphs.at(-1).notation).toBe('1-2 1-2 2-3 2-3 / 1 1 3 3');
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);

    await page.getByTestId('new-project').click();
    await expect.poll(() => page.getByTestId('graph-item').count()).toBe(1);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('open-project').click()]);
    await chooser.setFiles(file);
    await expect.poll(() => page.getByTestId('graph-item').count()).toBe(9);
    await page.getByTestId('graph-item').last().click();
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe('1-2 1-2 2-3 2-3 / 1 1 3 3');
    await expect.poll(() => page.getByTestId('pc-subgraph-count').textContent(), { timeout: 10_000 }).toBe('2');
  });
});
