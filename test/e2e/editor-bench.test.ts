/**
 * Editor responsiveness (issue 10's benchmark), measured in Chromium inside the page: a
 * 60-vertex graph entered in the notation box until drawn, the force layout until drawn, and
 * 100 edits (a leg added or removed through the notation box), each until the next frame.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ringWithChords } from '../../bench/cases/editor.ts';
import { haveChromium, openApp, screenshotDir, startHarness, type Harness } from './harness.ts';

describe.skipIf(!haveChromium && !process.env.CI)('editor responsiveness in Chromium', () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness();
  });
  afterAll(async () => {
    await h?.close();
  });

  it('draws and lays out a 60-vertex graph and applies 100 edits', async () => {
    const { page, errors } = await openApp(h);
    await page.getByTestId('new-graph').click();
    const ring = ringWithChords(60);
    const figures = await page.evaluate(async (notation) => {
      const frame = () => new Promise<void>((r) => requestAnimationFrame(() => r()));
      const box = document.querySelector<HTMLTextAreaElement>('[data-testid=notation-input]')!;
      const type = (text: string) => {
        box.value = text;
        box.dispatchEvent(new Event('input', { bubbles: true }));
      };
      box.dispatchEvent(new Event('focus'));
      let t = performance.now();
      type(notation);
      await frame();
      await frame();
      const draw = performance.now() - t;
      t = performance.now();
      document.querySelector<HTMLButtonElement>('[data-testid=auto-layout]')!.click();
      await frame();
      await frame();
      const layout = performance.now() - t;
      t = performance.now();
      for (let k = 0; k < 100; k++) {
        type(k % 2 === 0 ? `${notation} 1` : notation);
        await frame();
      }
      const edits = performance.now() - t;
      return { draw, layout, edits };
    }, ring);
    await expect.poll(() => page.getByTestId('graph-item').last().textContent()).toMatch(/60v · 120e/);
    await page.screenshot({ path: `${screenshotDir}/editor-60-vertices.png` });
    console.log(
      `editor, 60-vertex graph in Chromium: drawn in ${figures.draw.toFixed(0)} ms, force layout drawn in ${figures.layout.toFixed(0)} ms, ` +
        `100 edits in ${figures.edits.toFixed(0)} ms (${(figures.edits / 100).toFixed(1)} ms per edit, each to the next frame)`,
    );
    expect(figures.edits / 100).toBeLessThan(500);
    expect(errors).toEqual([]);
  });
});
