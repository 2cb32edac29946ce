import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { demoAccount, signInPage } from '../support/session';
import type { Role } from '../../src/lib/auth/roles';

/**
 * The whole editorial path in Chromium, one person per browser context: an author writes a
 * recipe from a template and submits it, a curator approves it from the review queue, a
 * reader finds it by search and rates it with a field note, the curator retires it, and the
 * reader sees the retired banner with its successor. No script from the content may run.
 */
describe('the editorial path in the browser', () => {
  let server: RunningServer;
  let browser: Browser;
  const contexts: Partial<Record<Role, BrowserContext>> = {};
  const problems: string[] = [];
  let slug = '';

  async function pageAs(role: Role): Promise<Page> {
    if (!contexts[role]) {
      const ctx = await browser.newContext();
      const page = await ctx.newPage();
      const a = demoAccount(role);
      await signInPage(page, server.url, a.email, a.password);
      await page.close();
      contexts[role] = ctx;
    }
    const page = await contexts[role]!.newPage();
    page.on('dialog', (d) => {
      problems.push(`dialog: ${d.message()}`);
      void d.dismiss();
    });
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    return page;
  }

  beforeAll(async () => {
    server = await startServer({ seed: true });
    browser = await launchChromium();
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('lets an author write a recipe from a template with a live preview, save it and submit it', async () => {
    const page = await pageAs('author');
    await page.goto(`${server.url}/recipes/new`);
    await page.getByRole('link', { name: 'temperature' }).click();
    await page.waitForURL(/loopType=temperature/);
    // Buttons render before React takes over; wait until the island has hydrated.
    await page.locator('[data-testid=recipe-editor][data-ready=true]').waitFor();
    const editor = page.getByTestId('recipe-editor');
    await editor.locator('input[name=title]').fill('Glycol chiller supply temperature');
    await editor.locator('textarea[name=summary]').fill('Holds the quenchwater glycol supply at 1 °C for the yoghurt cooling tunnel.');
    await editor.locator('input[name=loopTags]').fill('TIC-610');
    await editor.locator('select[name=area]').selectOption('glycol');
    // The preview compiles the template's body on the server and hydrates its calculators.
    await expect.poll(() => page.getByTestId('preview-html').locator('[data-island="LoopResponse"][data-hydrated="true"]').count(), { timeout: 20_000 }).toBe(1);
    // A body that is not allowed shows its line in the preview, and the typed text stays.
    const body = editor.getByTestId('body-input');
    const template = await body.inputValue();
    await body.fill(`${template}\n<script>window.__pwned = 1</script>\n`);
    await expect.poll(() => page.getByTestId('preview-problems').textContent(), { timeout: 10_000 }).toMatch(/Line \d+, column 1/);
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('editor-error').textContent()).toMatch(/^Line \d+, column 1: HTML elements such as <script>/);
    expect(await body.inputValue()).toContain('<script>window.__pwned = 1</script>');
    await body.fill(template);
    await page.getByTestId('save').click();
    await page.waitForURL(/\/recipes\/glycol-chiller-supply-temperature\/edit\?created=1/);
    slug = 'glycol-chiller-supply-temperature';
    await page.locator('[data-testid=recipe-editor][data-ready=true]').waitFor();
    // A claim with a value that is not a number is refused with its field, and the typed text stays.
    await editor.getByTestId('add-claim').click();
    await editor.locator('select[name="claims.0.metric"]').selectOption('overshootPct');
    await editor.locator('select[name="claims.0.op"]').selectOption('<=');
    await editor.locator('input[name="claims.0.value"]').fill('5 %');
    await editor.locator('select[name="tuningRule.rule"]').selectOption('simc');
    await editor.locator('input[name="tuningRule.designTime"]').fill('40');
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('editor-error').textContent()).toContain('(field: claims.0.value)');
    expect(await editor.locator('input[name="claims.0.value"]').inputValue()).toBe('5 %');
    await editor.locator('input[name="claims.0.value"]').fill('5');
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('editor-notice').textContent()).toContain('Saved as revision 2');
    // Both survive a reload of the page from the server.
    await page.reload();
    await page.locator('[data-testid=recipe-editor][data-ready=true]').waitFor();
    expect(await editor.getByTestId('claim-row').count()).toBe(1);
    expect(await editor.locator('select[name="claims.0.metric"]').inputValue()).toBe('overshootPct');
    expect(await editor.locator('input[name="claims.0.value"]').inputValue()).toBe('5');
    expect(await editor.locator('select[name="tuningRule.rule"]').inputValue()).toBe('simc');
    expect(await editor.locator('input[name="tuningRule.designTime"]').inputValue()).toBe('40');
    await page.getByTestId('submit').click();
    await expect.poll(() => page.getByTestId('editor-notice').textContent()).toContain('Submitted');
    await page.screenshot({ path: artifactPath('editorial-editor.png'), fullPage: true });
    await page.close();
  });

  it('lets a curator approve it from the review queue', async () => {
    const page = await pageAs('curator');
    await page.goto(`${server.url}/review`);
    await expect.poll(() => page.getByTestId(`waiting-${slug}`).count()).toBe(1);
    await page.screenshot({ path: artifactPath('editorial-review-queue.png'), fullPage: true });
    await page.getByTestId(`publish-${slug}`).click();
    await expect.poll(() => page.getByTestId(`waiting-${slug}`).count()).toBe(0);
    await page.close();
  });

  it('lets a reader find it by search, use its calculator and rate it with a field note', async () => {
    const page = await pageAs('reader');
    await page.goto(`${server.url}/search?q=quenchwater`);
    await page.getByRole('link', { name: /Glycol chiller supply temperature/ }).first().click();
    await page.waitForURL(new RegExp(`/recipes/${slug}$`));
    // The calculator is a real island: hydrated once Astro drops its `ssr` marker.
    await page.locator('[data-island="LoopResponse"]').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('[data-island="LoopResponse"] astro-island:not([ssr])').count(), { timeout: 20_000 }).toBe(1);
    await page.getByTestId('rating-panel').scrollIntoViewIfNeeded();
    await page.locator('[data-testid=rating-panel][data-ready=true]').waitFor();
    await page.getByTestId('star-4').click();
    await page.getByTestId('note-input').fill('Used on TIC-611 as well; ti 20 % longer because the valve sticks.');
    await Promise.all([page.waitForEvent('load'), page.getByTestId('rate').click()]);
    await expect.poll(async () => (await page.getByTestId('rating-summary').textContent())?.trim()).toBe('4.0 of 5 from 1 person');
    await expect.poll(() => page.getByTestId('field-notes').textContent()).toContain('valve sticks');
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    await page.close();
  });

  it('lets the curator retire it, and the reader then sees the retired banner with the successor', async () => {
    const curator = await pageAs('curator');
    const list = await curator.request.get(`${server.url}/api/v1/recipes`);
    const successor = ((await list.json()).recipes as { slug: string; source: string }[]).find((r) => r.source === 'file')!.slug;
    await curator.goto(`${server.url}/recipes/${slug}`);
    await curator.locator('[data-testid=workflow-actions][data-ready=true]').waitFor();
    await curator.getByTestId('action-retire').click();
    await curator.getByTestId('retire-reason').fill('The chiller was replaced by a plate unit with its own controller.');
    await curator.getByTestId('retire-successor').fill(successor);
    await Promise.all([curator.waitForEvent('load'), curator.getByTestId('retire-confirm').click()]);
    await curator.close();

    const reader = await pageAs('reader');
    await reader.goto(`${server.url}/recipes/${slug}`);
    const banner = reader.getByTestId('retired-banner');
    await expect.poll(() => banner.textContent()).toMatch(/retired/i);
    expect(await banner.textContent()).toContain('The chiller was replaced by a plate unit');
    expect(await banner.locator(`a[href="/recipes/${successor}"]`).count()).toBe(1);
    await reader.screenshot({ path: artifactPath('editorial-retired.png'), fullPage: true });
    await reader.close();
    expect(problems).toEqual([]);
  });
});
