import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../../support/server';
import { artifactPath, launchChromium } from '../../support/browser';
import { demoAccount, sessionHeaders, signInAs, signInPage } from '../../support/session';
import { sampleRecipe } from '../../support/editorial';
import { capturedMail } from '../../support/mail';

describe('retiring a recipe that registered loops follow, in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let slug: string;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    browser = await launchChromium();
    const [author, curator] = [await signInAs(server.url, 'author'), await signInAs(server.url, 'curator')];
    const call = async (cookie: string, method: string, path: string, body?: unknown) => {
      const res = await fetch(`${server.url}${path}`, { method, headers: sessionHeaders(server.url, cookie), body: body === undefined ? undefined : JSON.stringify(body) });
      if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${await res.text()}`);
      return res.json();
    };
    slug = (await call(author, 'POST', '/api/v1/recipes', sampleRecipe('CIP caustic return temperature'))).slug;
    await call(author, 'POST', `/api/v1/recipes/${slug}/submit`);
    await call(curator, 'POST', `/api/v1/recipes/${slug}/publish`);
    const loop = { area: 'cip', recipeSlug: slug, description: 'Caustic return, circuit A' };
    await call(author, 'POST', '/api/v1/loops', { ...loop, tag: 'TIC-540', ownerEmail: 'priya.lindgren@brindlewood.example' });
    await call(author, 'POST', '/api/v1/loops', { ...loop, tag: 'TIC-541', description: 'Caustic return, circuit B', ownerEmail: 'oren.castellano@brindlewood.example' });
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('shows the loops that still follow it in the retire dialog, and mails their owners once it is retired', async () => {
    const page = await browser.newPage();
    const curator = demoAccount('curator');
    await signInPage(page, server.url, curator.email, curator.password);
    await page.goto(`${server.url}/recipes/${slug}`);
    await page.locator('[data-testid=workflow-actions][data-ready=true]').waitFor();
    await page.getByTestId('action-retire').click();
    const list = page.getByTestId('retire-dialog').getByTestId('loops-following');
    await expect.poll(() => list.getAttribute('data-count')).toBe('2');
    const text = await list.textContent();
    expect(text).toContain('2 registered loops still follow this recipe');
    expect(text).toContain('TIC-540');
    expect(text).toContain('TIC-541 – Caustic return, circuit B (oren.castellano@brindlewood.example)');
    await page.screenshot({ path: artifactPath('retire-dialog-loops.png'), fullPage: true });

    await page.getByTestId('retire-reason').fill('The caustic tank got a new heat exchanger; the model no longer holds.');
    await page.getByTestId('retire-confirm').click();
    await expect.poll(() => capturedMail(server).filter((m) => m.subject.startsWith('Recipe retired: CIP caustic return temperature')).map((m) => m.to[0]).sort(), { timeout: 15_000 })
      .toEqual(['oren.castellano@brindlewood.example', 'priya.lindgren@brindlewood.example']);
    await page.close();
  });
});
