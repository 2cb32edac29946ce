import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext } from 'playwright-core';
import { startServer, type RunningServer } from '../../support/server';
import { artifactPath, launchChromium } from '../../support/browser';
import { demoAccount, signInPage } from '../../support/session';

describe('loop register pages in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let context: BrowserContext;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    browser = await launchChromium();
    context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const curator = demoAccount('curator');
    await signInPage(await context.newPage(), server.url, curator.email, curator.password);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('lists the register, filters by area and by age of tuning, and opens a loop', async () => {
    const page = await context.newPage();
    await page.goto(`${server.url}/loops`);
    const tags = () => page.getByTestId('loop-table').locator('tbody td:first-child').allTextContents();
    expect((await tags()).length).toBeGreaterThanOrEqual(9);
    await page.locator('select[name=area]').selectOption('htst');
    await page.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/area=htst/);
    expect(await tags()).toEqual(['LIC-220', 'TIC-210', 'TIC-250']);
    await page.locator('select[name=area]').selectOption('');
    await page.locator('select[name=age]').selectOption('unknown');
    await page.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/age=unknown/);
    expect(await tags()).toEqual(['AIC-710']);
    expect(await page.getByTestId('loop-export').getAttribute('href')).toBe('/api/v1/loops/export.csv?untuned=true');
    expect(await page.getByTestId('loop-import').isVisible()).toBe(true);
    await page.getByRole('link', { name: 'AIC-710' }).click();
    await page.waitForURL(/\/loops\/AIC-710$/);
    expect(await page.getByTestId('loop-tag').textContent()).toBe('AIC-710');
    await page.screenshot({ path: artifactPath('loop-detail.png'), fullPage: true });
    await page.close();
  });

  it('reads on a phone without sideways scrolling of the page', async () => {
    const page = await context.newPage();
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${server.url}/loops`);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: artifactPath('loops-phone.png'), fullPage: true });
    await page.close();
  });
});
