import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { startServer, type RunningServer } from '../../support/server';
import { artifactPath, launchChromium } from '../../support/browser';
import { demoAccount, signInPage } from '../../support/session';
import { toCsv } from '../../support/step-test-csv';

/** A step test of TIC-210 generated from an FOPDT close to the cascade recipe's model (see tests/support/step-test-csv.ts). */
const CSV = toCsv({ model: { type: 'fopdt', k: 0.9, tau: 22, theta: 7 }, dt: 1, n: 240, stepAt: 20, u0: 40, u1: 44, y0: 72.4, sigma: 0.03, seed: 4 }, { european: true });

describe('step test to evidence in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let page: Page;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    browser = await launchChromium();
    page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const author = demoAccount('author');
    await signInPage(page, server.url, author.email, author.password);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('uploads, previews, fits the three models, compares tuning and saves evidence shown on the recipe page', async () => {
    page.on('pageerror', (e) => console.error('page error:', e.message));
    await page.goto(`${server.url}/step-tests`);
    await expect.poll(() => page.getByTestId('fd-workbench').getAttribute('data-ready')).toBe('true');
    await page.getByTestId('fd-file').setInputFiles({ name: 'tic210-step.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
    await expect.poll(() => page.getByTestId('fd-format').textContent()).toContain('240 data rows, separated by semicolons, decimal comma');
    expect(await page.getByTestId('fd-preview').locator('tbody tr').count()).toBe(8);
    expect(await page.getByTestId('fd-tag').inputValue()).toBe('TIC-210');
    await page.getByTestId('fd-area').selectOption('htst');
    await page.getByTestId('fd-upload').click();
    await page.getByTestId('fd-data-chart').waitFor().catch(async (e) => {
      await page.screenshot({ path: artifactPath('step-test-failure.png'), fullPage: true });
      throw e;
    });

    await page.getByTestId('fd-fit-button').click();
    for (const type of ['fopdt', 'sopdt', 'ipdt']) {
      await page.getByTestId(`fd-fit-${type}`).waitFor({ timeout: 30_000 }).catch(async (e) => {
        await page.screenshot({ path: artifactPath('step-test-failure.png'), fullPage: true });
        throw e;
      });
    }
    await page.getByTestId('fd-choose-fopdt').check();
    const fopdt = await page.getByTestId('fd-fit-fopdt').textContent();
    // The fitted gain is printed with four significant digits; the truth is 0.9.
    const k = Number(/K ([\d.]+)/.exec(fopdt ?? '')?.[1]);
    expect(Math.abs(k - 0.9)).toBeLessThan(0.03);
    await expect.poll(() => page.getByTestId('fd-matches').textContent()).toContain('HTST');

    expect(await page.getByTestId('fd-cautions').textContent()).toContain('test there first');
    await page.getByTestId('fd-rule-simc').waitFor();
    await page.getByTestId('fd-rule-simc').check();
    expect(Number(await page.getByTestId('fd-kc').inputValue())).toBeGreaterThan(0);

    await page.getByTestId('fd-recipe').selectOption('htst-product-temperature-cascade');
    await page.getByTestId('fd-note').fill('Bump test after the plate-pack rework');
    await page.getByTestId('fd-save').click();
    await expect.poll(() => page.getByTestId('fd-saved').textContent()).toContain('Saved as evidence');
    await page.screenshot({ path: artifactPath('step-test-workbench.png'), fullPage: true });

    await page.goto(`${server.url}/recipes/htst-product-temperature-cascade`);
    const item = page.getByTestId('evidence-item').first();
    expect(await item.textContent()).toContain('Bump test after the plate-pack rework');
    expect(await item.locator('svg path').count()).toBe(2);
    expect(await page.getByTestId('following-loops').textContent()).toContain('TIC-210');
  });

  it('shows every bad row of a refused file by line', async () => {
    await page.goto(`${server.url}/step-tests`);
    await expect.poll(() => page.getByTestId('fd-workbench').getAttribute('data-ready')).toBe('true');
    const lines = CSV.split('\r\n');
    lines[3] = '2,000;72,4';
    await page.getByTestId('fd-file').setInputFiles({ name: 'broken.csv', mimeType: 'text/csv', buffer: Buffer.from(lines.join('\r\n')) });
    await expect.poll(() => page.getByTestId('fd-problem').textContent()).toContain('Line 4: expected 3 cells, found 2.');
  });
});
