import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import katexCss from 'katex/dist/katex.min.css?raw';
import { launchChromium } from '../support/browser';
import { compileBody } from '../../src/lib/recipes/authored-mdx/compile';
import { HOSTILE_BODIES } from '../lib/recipes/authored-mdx/hostile-bodies';

/**
 * The hostile bodies that compile, rendered in Chromium: nothing may run — no `__pwned` flag,
 * no dialog, no navigation — even when every element is hovered, focused and clicked.
 */
describe('hostile authored bodies in Chromium', () => {
  let browser: Browser;
  let page: Page;
  const dialogs: string[] = [];
  beforeAll(async () => {
    browser = await launchChromium();
    page = await browser.newPage();
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    // No request may leave the page either (images, frames, styles from elsewhere).
    await page.route('**/*', (route) => (route.request().url().startsWith('data:') ? route.continue() : route.abort()));
  });
  afterAll(async () => browser?.close());

  const inert = HOSTILE_BODIES.filter((b) => b.expect === 'inert');

  it.each(inert)('runs nothing from $name', async ({ body }) => {
    const result = compileBody(body);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const requests: string[] = [];
    const onRequest = (r: { url(): string }) => requests.push(r.url());
    page.on('request', onRequest);
    await page.setContent(`<!doctype html><html><head><style>${katexCss}</style><script>window.__pwned = 0;</script></head><body><main id="m">${result.html}</main></body></html>`);
    // Poke everything an attacker might have wired: hover, focus, click (links are prevented from navigating away).
    await page.evaluate(() => {
      for (const el of Array.from(document.querySelectorAll('#m *'))) {
        for (const type of ['mouseover', 'mouseenter', 'focus', 'click', 'animationstart', 'load', 'error']) {
          el.dispatchEvent(new Event(type, { bubbles: true }));
        }
      }
    });
    await page.waitForTimeout(50);
    page.off('request', onRequest);
    expect(await page.evaluate(() => (window as unknown as { __pwned: number }).__pwned)).toBe(0);
    expect(dialogs).toEqual([]);
    expect(requests.filter((u) => !u.startsWith('data:') && u !== 'about:blank')).toEqual([]);
    expect(await page.evaluate(() => document.querySelectorAll('#m script, #m iframe, #m object, #m embed, #m img, #m style, #m link').length)).toBe(0);
  });

  it('would notice a script that runs (the check can fail)', async () => {
    await page.setContent('<script>window.__pwned = 0;</script><img src="x" onerror="window.__pwned = 1">');
    await expect.poll(() => page.evaluate(() => (window as unknown as { __pwned: number }).__pwned)).toBe(1);
  });
});
