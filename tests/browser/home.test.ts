import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { demoAccount, signInPage } from '../support/session';

describe('home page in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  beforeAll(async () => {
    server = await startServer({ seed: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('hydrates the palette switch island, which reacts to a click', async () => {
    const page = await browser.newPage({ colorScheme: 'light' });
    await signInPage(page, server.url, demoAccount('reader').email, demoAccount('reader').password);
    await page.goto(`${server.url}/`);
    const button = page.getByTestId('theme-switch');
    // Disabled until React has hydrated and read the current palette.
    await expect.poll(() => button.isEnabled()).toBe(true);
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe('light');
    await button.click();
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe('dark');
    await expect.poll(() => button.textContent()).toContain('Light');
    await page.close();
  });

  it('saves screenshots of the home page at desktop and phone widths', async () => {
    for (const [name, width, height] of [['home-desktop.png', 1366, 900], ['home-phone.png', 390, 844]] as const) {
      const page = await browser.newPage({ viewport: { width, height } });
      await signInPage(page, server.url, demoAccount('reader').email, demoAccount('reader').password);
      await page.goto(`${server.url}/`);
      await page.getByTestId('theme-switch').isEnabled();
      const heading = await page.locator('h1').textContent();
      expect(heading).toContain('Loop patterns');
      // Nothing wider than the viewport: the page reads on a phone without sideways scrolling.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      await page.screenshot({ path: artifactPath(name), fullPage: true });
      await page.close();
    }
  });
});
