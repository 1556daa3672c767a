/**
 * Values and whole-theory runs in Chromium: the two-loop sunset opened by link and evaluated in
 * MS-bar (the finiteness check passes); φ⁴ RG at two loops, β read from the result
 * (3g² − 17/3 g³, "Critical Properties of φ⁴-Theories", World Scientific 2001, ch. 11); a long
 * run cancelled while the app stays responsive; the period of a primitive graph; screenshots.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { haveChromium, openApp, screenshotDir, startHarness, type Harness } from './harness.ts';

const SUNSET = '1-2 1-2 1-2 / 1 2';
const WHEEL3 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';
const link = (notation: string) => `?theory=phi4&graph=${encodeURIComponent(notation)}`;

describe.skipIf(!haveChromium && !process.env.CI)('values and theory runs in Chromium', () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness();
  });
  afterAll(async () => {
    await h?.close();
  });

  it('evaluates the sunset in MS-bar: counterterm, renormalized value, the finiteness check passes', async () => {
    const { page, errors } = await openApp(h, '?theory=phi4&graph=1-2%201-2%201-2%20%2F%201%202');
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).toBe(SUNSET);
    await page.getByTestId('tab-values').click();
    await page.getByTestId('scheme-select').selectOption('msbar');
    await page.getByTestId('evaluate').click();
    const finite = page.getByTestId('finite-check');
    await expect.poll(() => finite.getAttribute('data-status'), { timeout: 15_000 }).toBe('pass');
    expect(await page.getByTestId('local-check').getAttribute('data-status')).toBe('pass');
    expect(await page.getByTestId('rg-check').getAttribute('data-status')).toBe('pass');
    expect(await page.getByTestId('values-counterterm').locator('.katex').count()).toBe(1);
    expect(await page.getByTestId('values-counterterm').getAttribute('data-text')).toBe('(1/4)*eps^-1');
    expect(await page.getByTestId('values-renormalized').getAttribute('data-text')).toBe('-13/8 | 1/2');
    expect(await page.getByTestId('values-renormalized').locator('.katex-error').count()).toBe(0);
    expect(await page.getByTestId('values-method').textContent()).toMatch(/routing/);
    await page.getByTestId('values-conventions').locator('summary').click();
    await page.setViewportSize({ width: 1400, height: 1300 });
    await page.screenshot({ path: `${screenshotDir}/panel-values.png` });
    expect(errors).toEqual([]);
  });

  it('a four-loop self-energy reached by □_p: the counterterm, its RG check, and finiteness marked unchecked (pole part only)', async () => {
    const { page, errors } = await openApp(h, link('1-2 1-3 1-4 2-3 2-4 3-4 3-4 / 1 2'));
    await page.getByTestId('tab-values').click();
    await page.getByTestId('scheme-select').selectOption('ms');
    await page.getByTestId('evaluate').click();
    const ct = page.getByTestId('values-counterterm');
    await expect.poll(() => ct.getAttribute('data-text'), { timeout: 30_000 }).toBe('(1/24)*eps^-3 + (-7/48)*eps^-2 + (13/96)*eps^-1');
    expect(await page.getByTestId('values-method').textContent()).toMatch(/□_p/);
    expect(await page.getByTestId('finite-check').getAttribute('data-status')).toBe('unchecked');
    expect(await page.getByTestId('rg-check').getAttribute('data-status')).toBe('pass');
    expect(await page.getByTestId('routings-check').getAttribute('data-status')).toBe('pass');
    await page.setViewportSize({ width: 1400, height: 1300 });
    await page.screenshot({ path: `${screenshotDir}/panel-values-box-p.png` });
    expect(errors).toEqual([]);
  });

  it('computes a primitive graph\'s period in the worker and uses −P/(Lε)', async () => {
    const { page, errors } = await openApp(h, link(WHEEL3));
    await page.getByTestId('tab-values').click();
    await page.getByTestId('evaluate').click();
    await expect.poll(() => page.getByTestId('finite-check').getAttribute('data-status'), { timeout: 15_000 }).toBe('pass');
    await page.getByTestId('period-samples').selectOption('20000');
    await page.getByTestId('compute-period').click();
    await expect.poll(() => page.getByTestId('period-agreement').textContent(), { timeout: 20_000 }).toMatch(/agrees/);
    await expect.poll(() => page.getByTestId('values-counterterm').textContent(), { timeout: 15_000 }).toMatch(/approximate/);
    expect(await page.getByTestId('supplied-list').textContent()).toMatch(/period/);
    await page.setViewportSize({ width: 1400, height: 1200 });
    await page.screenshot({ path: `${screenshotDir}/panel-values-period.png` });
    expect(errors).toEqual([]);
  });

  it('runs φ⁴ at four loops: every graph evaluable, γ_φ at g⁴ = 65/192 (REFERENCES.md, "Critical Properties of φ⁴-Theories", ch. 11)', async () => {
    const { page, errors } = await openApp(h, link(SUNSET));
    await page.getByTestId('tab-theory').click();
    await page.getByTestId('rg-theory').selectOption('phi4');
    await page.getByTestId('rg-loops').selectOption('4');
    await page.getByTestId('rg-scheme').selectOption('ms');
    await page.getByTestId('rg-run').click();
    const result = page.getByTestId('rg-result');
    await expect.poll(() => result.count(), { timeout: 60_000 }).toBe(1);
    expect(await result.locator('[data-testid=rg-coef-gammaPhi][data-power="4"] code').textContent()).toBe('65/192');
    expect(await page.getByTestId('rg-consistency').getAttribute('data-status')).toBe('pass');
    await page.setViewportSize({ width: 1400, height: 1500 });
    await page.screenshot({ path: `${screenshotDir}/panel-theory-run-4-loops.png` });
    expect(errors).toEqual([]);
  });

  it('runs φ⁴ at two loops and reads β = −2εg + 3g² − 17/3 g³ from the result', async () => {
    const { page, errors } = await openApp(h, link(SUNSET));
    await page.getByTestId('tab-theory').click();
    await page.getByTestId('rg-theory').selectOption('phi4');
    await page.getByTestId('rg-loops').selectOption('2');
    await page.getByTestId('rg-scheme').selectOption('msbar');
    await page.getByTestId('rg-run').click();
    const result = page.getByTestId('rg-result');
    await expect.poll(() => result.count(), { timeout: 20_000 }).toBe(1);
    const coef = (p: string) => result.locator(`[data-testid=rg-coef-beta][data-power="${p}"] code`).textContent();
    expect(await coef('2')).toBe('3');
    expect(await coef('3')).toBe('-17/3');
    expect(await coef('eps')).toBe('-2');
    expect(await result.locator('[data-testid=rg-coef-gammaPhi][data-power="2"] code').textContent()).toBe('1/12');
    expect(await page.getByTestId('rg-consistency').getAttribute('data-status')).toBe('pass');
    await page.getByTestId('rg-eps').fill('0.1');
    await expect.poll(() => page.getByTestId('beta-fixed-point').count()).toBe(1);
    expect(await page.getByTestId('rg-fixed-point').textContent()).toMatch(/g\* = 0\.0[0-9]/);
    await page.setViewportSize({ width: 1400, height: 1500 });
    await page.screenshot({ path: `${screenshotDir}/panel-theory-run.png` });
    // A generated graph opens in the editor.
    const item = page.locator('[data-testid=rg-graph][data-kind=vertex]').nth(2);
    const wanted = await item.getAttribute('data-notation');
    await item.click();
    await expect.poll(() => page.getByTestId('notation-input').inputValue()).not.toBe(SUNSET);
    expect((await page.getByTestId('notation-input').inputValue()).split('/')[1]!.trim().split(/\s+/)).toHaveLength(4);
    expect(wanted).toMatch(/\//);
    await page.getByTestId('rg-graphs').screenshot({ path: `${screenshotDir}/panel-theory-run-graphs.png` });
    expect(errors).toEqual([]);
  });

  it('cancels a long run while the app stays responsive', async () => {
    const { page, errors } = await openApp(h, link(SUNSET));
    await page.getByTestId('tab-theory').click();
    await page.getByTestId('rg-loops').selectOption('5');
    await page.getByTestId('rg-run').click();
    await expect.poll(() => page.getByTestId('rg-progress').count()).toBe(1);
    await page.waitForTimeout(800);
    expect(await page.getByTestId('rg-progress').count()).toBe(1);
    // The UI thread is free: another tab answers within a second while the worker computes.
    const t0 = Date.now();
    await page.getByTestId('tab-power').click();
    await page.getByTestId('pc-loops').waitFor({ timeout: 1000 });
    expect(Date.now() - t0).toBeLessThan(1000);
    expect(await page.getByTestId('pc-loops').textContent()).toBe('2');
    await page.getByTestId('tab-theory').click();
    await page.screenshot({ path: `${screenshotDir}/panel-theory-run-running.png` });
    await page.getByTestId('rg-cancel').click();
    await expect.poll(() => page.getByTestId('rg-cancelled').count(), { timeout: 2000 }).toBe(1);
    expect(await page.getByTestId('rg-progress').count()).toBe(0);
    // And the worker comes back for the next run.
    await page.getByTestId('rg-loops').selectOption('1');
    await page.getByTestId('rg-run').click();
    await expect.poll(() => page.getByTestId('rg-result').locator('[data-testid=rg-coef-beta][data-power="2"] code').textContent(), { timeout: 20_000 }).toBe('3');
    expect(errors).toEqual([]);
  });
});
