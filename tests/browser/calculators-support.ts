import fs from 'node:fs';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { demoAccount, signInPage } from '../support/session';

/**
 * Opens a page as the demo reader (pages need a session; the server must be started with
 * `seed: true`) and waits until the island `id` has hydrated and drawn its first chart.
 */
export async function openIsland(browser: Browser, url: string, id: string, options: { width?: number } = {}): Promise<Page> {
  const origin = new URL(url).origin;
  const storageState = await readerSession(browser, origin);
  const context = await browser.newContext({ viewport: { width: options.width ?? 1366, height: 900 }, acceptDownloads: true, storageState });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin });
  const page = await context.newPage();
  await page.goto(url);
  await waitForIsland(page, id);
  return page;
}

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;
const sessions = new Map<string, Promise<StorageState>>();

/** Signs the demo reader in once per server and reuses the cookie (sign-in is rate-limited). */
function readerSession(browser: Browser, origin: string): Promise<StorageState> {
  let session = sessions.get(origin);
  if (!session) {
    session = (async () => {
      const context = await browser.newContext();
      const reader = demoAccount('reader');
      await signInPage(await context.newPage(), origin, reader.email, reader.password);
      const state = await context.storageState();
      await context.close();
      return state;
    })();
    sessions.set(origin, session);
  }
  return session;
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
