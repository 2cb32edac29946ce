import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { readRecipeFiles } from '../../src/lib/recipes/file-reader';
import { demoAccount, signInPage } from '../support/session';

const CASCADE = 'htst-product-temperature-cascade';

/** Pages in a PDF: one "/Type /Page" object per page (the page tree is "/Type /Pages"). */
function pdfPageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g) ?? []).length;
}

describe('recipe pages in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let context: BrowserContext;
  /** A page of the signed-in reader's browser context. */
  const open = async (path: string, viewport = { width: 1366, height: 900 }): Promise<Page> => {
    const page = await context.newPage();
    await page.setViewportSize(viewport);
    await page.goto(`${server.url}${path}`);
    return page;
  };
  beforeAll(async () => {
    server = await startServer({ seed: true });
    browser = await launchChromium();
    context = await browser.newContext();
    const reader = demoAccount('reader');
    const first = await context.newPage();
    await signInPage(first, server.url, reader.email, reader.password);
    await first.close();
  });
  afterAll(async () => {
    await context?.close();
    await browser?.close();
    await server?.stop();
  });

  it('opens a recipe from the list and shows its status, model, owner, review date, cautions and claims', async () => {
    const page = await open('/recipes?loopType=temperature');
    await page.locator(`[data-slug="${CASCADE}"] a`).first().click();
    await page.waitForURL(`**/recipes/${CASCADE}`);
    expect(await page.locator('h1').textContent()).toContain('cascade');
    expect(await page.getByTestId('recipe-status').textContent()).toBe('Published');
    const facts = await page.getByTestId('recipe-facts').textContent();
    expect(facts).toContain('Mirela Vasquez-Hale');
    expect(facts).toContain('27 October 2026');
    expect(await page.locator('[data-testid="model-formula"] .katex').count()).toBeGreaterThan(0);
    expect(await page.getByTestId('cautions').textContent()).toMatch(/manual[\s\S]*interlocks[\s\S]*legal/);
    const claims = page.getByTestId('claims-table');
    expect(await claims.locator('tbody tr').count()).toBe(9);
    expect(await claims.locator('td.text-fails').count()).toBe(0);
    await page.close();
  });

  it('shows a retired recipe with a banner at the top that links its successor', async () => {
    const page = await open('/recipes/htst-product-temperature-single-loop');
    const banner = page.getByTestId('retired-banner');
    expect(await banner.textContent()).toContain('Retired');
    const box = await banner.boundingBox();
    const heading = await page.locator('h1').boundingBox();
    expect(box!.y).toBeLessThan(heading!.y);
    await banner.locator('a').click();
    await page.waitForURL(`**/recipes/${CASCADE}`);
    await page.close();
  });

  it('finds a recipe by a misspelled word from the header search box', async () => {
    const page = await open('/');
    await page.keyboard.press('/');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('site-search');
    await page.keyboard.type('neutralisaton');
    await page.keyboard.press('Enter');
    await page.waitForURL('**/search?q=neutralisaton');
    const first = page.locator('[data-testid="search-results"] li').first();
    expect(await first.getAttribute('data-slug')).toBe('wastewater-ph-neutralisation');
    expect(await first.locator('mark').first().textContent()).toMatch(/^neutralisation$/i);
    await page.close();
  });

  it('leaves retired recipes out of search unless asked', async () => {
    const page = await open('/search?q=single%20loop%20steam%20valve');
    const slugs = await page.locator('[data-testid="search-results"] li').evaluateAll((els) => els.map((e) => e.getAttribute('data-slug')));
    expect(slugs).not.toContain('htst-product-temperature-single-loop');
    await page.goto(`${server.url}/search?q=single%20loop%20steam%20valve&retired=1`);
    const withRetired = await page.locator('[data-testid="search-results"] li').evaluateAll((els) => els.map((e) => e.getAttribute('data-slug')));
    expect(withRetired).toContain('htst-product-temperature-single-loop');
    await page.close();
  });

  it('filters the browse page by loop type and status', async () => {
    const page = await open('/recipes');
    await page.selectOption('select[name="status"]', 'retired');
    await page.waitForURL('**/recipes?*status=retired*');
    const slugs = await page.getByTestId('recipe-card').evaluateAll((els) => els.map((e) => e.getAttribute('data-slug')));
    expect(slugs.sort()).toEqual(readRecipeFiles().filter((r) => r.data.status === 'retired').map((r) => r.slug).sort());
    await page.close();
  });

  it('prints every recipe as a one-page commissioning sheet without navigation or calculators', async () => {
    for (const { slug } of readRecipeFiles()) {
      const page = await open(`/recipes/${slug}`);
      await page.emulateMedia({ media: 'print' });
      expect(await page.locator('header').isVisible(), slug).toBe(false);
      expect(await page.locator('.recipe-body').isVisible(), slug).toBe(false);
      expect(await page.locator('.commissioning').isVisible(), slug).toBe(true);
      const pdf = await page.pdf({ format: 'A4', printBackground: false });
      expect(pdfPageCount(pdf), `${slug} prints on one page`).toBe(1);
      await page.close();
    }
  }, 240_000);

  it('saves screenshots of a recipe page at phone and desktop widths, readable without sideways scrolling', async () => {
    for (const [name, width, height] of [['recipe-desktop.png', 1366, 900], ['recipe-phone.png', 390, 844]] as const) {
      const page = await open(`/recipes/${CASCADE}`, { width, height });
      await page.locator('astro-island').first().scrollIntoViewIfNeeded();
      await page.waitForTimeout(300);
      expect(await page.evaluate(() => document.documentElement.scrollWidth), name).toBeLessThanOrEqual(width);
      await page.screenshot({ path: artifactPath(name), fullPage: true });
      await page.close();
    }
    const page = await open(`/recipes/${CASCADE}`);
    await page.emulateMedia({ media: 'print' });
    await page.screenshot({ path: artifactPath('recipe-print.png'), fullPage: true });
    await page.close();
  });
});
