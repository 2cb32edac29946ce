import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { demoAccount, sessionHeaders, signIn, signInPage } from '../support/session';
import { sampleRecipe } from '../support/editorial';

/**
 * Two people edit the same draft: the author's save lands first (over the API), the curator's
 * page still holds revision 1. The curator's save must show both versions and keep the typed
 * text; saving on top of the current revision then keeps both changes.
 */
describe('a conflicting save in the editor', () => {
  let server: RunningServer;
  let browser: Browser;
  beforeAll(async () => {
    server = await startServer({ seed: true });
    browser = await launchChromium();
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('shows both versions, loses nothing, and saves on top of the other change', async () => {
    const author = demoAccount('author');
    const cookie = await signIn(server.url, author.email, author.password);
    const headers = sessionHeaders(server.url, cookie);
    const created = await (await fetch(`${server.url}/api/v1/recipes`, { method: 'POST', headers, body: JSON.stringify(sampleRecipe('Boiler house steam header pressure')) })).json();

    const context = await browser.newContext();
    const page = await context.newPage();
    const curator = demoAccount('curator');
    await signInPage(page, server.url, curator.email, curator.password);
    await page.goto(`${server.url}/recipes/${created.slug}/edit`);
    await page.locator('[data-testid=recipe-editor][data-ready=true]').waitFor();

    // Meanwhile the author saves revision 2.
    const saved = await fetch(`${server.url}/api/v1/recipes/${created.slug}`, { method: 'PUT', headers, body: JSON.stringify({ baseRevision: 1, body: `${created.body}\nThe author's field note on PIC-300.\n` }) });
    expect(saved.status).toBe(200);

    const body = page.getByTestId('body-input');
    const mine = `${created.body}\nThe curator's remark on the trim valve.\n`;
    await body.fill(mine);
    await page.getByTestId('save').click();
    const conflict = page.getByTestId('conflict');
    await conflict.waitFor();
    expect(await page.getByTestId('conflict-theirs').textContent()).toContain("The author's field note on PIC-300.");
    expect(await page.getByTestId('conflict-mine').textContent()).toContain("The curator's remark on the trim valve.");
    expect(await body.inputValue()).toBe(mine);
    await page.screenshot({ path: artifactPath('editorial-conflict.png'), fullPage: true });

    // Merge by hand: keep both paragraphs, then save on top of revision 2.
    await body.fill(`${created.body}\nThe author's field note on PIC-300.\n\nThe curator's remark on the trim valve.\n`);
    await page.getByTestId('keep-mine').click();
    await expect.poll(() => page.getByTestId('editor-notice').textContent()).toBe('Saved as revision 3.');
    const current = await (await fetch(`${server.url}/api/v1/recipes/${created.slug}`, { headers })).json();
    expect(current.body).toContain("The author's field note on PIC-300.");
    expect(current.body).toContain("The curator's remark on the trim valve.");
    await context.close();
  });
});
