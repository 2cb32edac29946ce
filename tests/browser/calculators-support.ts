import fs from 'node:fs';
import type { Browser, Page } from 'playwright-core';

/** Opens a path and waits until the island `id` has hydrated and drawn its first chart. */
export async function openIsland(browser: Browser, url: string, id: string, options: { width?: number } = {}): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: options.width ?? 1366, height: 900 }, acceptDownloads: true });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: new URL(url).origin });
  const page = await context.newPage();
  await page.goto(url);
  await waitForIsland(page, id);
  return page;
}

/** Scrolls the island into view (client:visible hydrates it) and waits for a drawn canvas or a table. */
export async function waitForIsland(page: Page, id: string): Promise<void> {
  const island = page.getByTestId(id);
  await island.scrollIntoViewIfNeeded();
  await page.waitForFunction((sel) => {
    const el = document.querySelector(`[data-testid="${sel}"]`);
    return !!el && (!!el.querySelector('canvas') || !!el.closest('astro-island:not([ssr])'));
  }, id);
}

/** The bytes of a file the page offered for download after `click()`. */
export async function download(page: Page, click: () => Promise<void>): Promise<{ name: string; bytes: Buffer }> {
  const [file] = await Promise.all([page.waitForEvent('download'), click()]);
  const path = await file.path();
  return { name: file.suggestedFilename(), bytes: fs.readFileSync(path) };
}

/** Width and height from a PNG's IHDR chunk (PNG spec, ISO/IEC 15948 §11.2.2). */
export function pngSize(bytes: Buffer): { width: number; height: number } {
  const signature = '89504e470d0a1a0a';
  if (bytes.subarray(0, 8).toString('hex') !== signature) throw new Error('Not a PNG file.');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
