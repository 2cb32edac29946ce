import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/** Where browser tests leave screenshots for people to look at (git ignores it). */
export const ARTIFACTS_DIR = path.resolve('test-artifacts');

/** Launches Debian's Chromium headless, with the flags this closed network needs. */
export async function launchChromium(): Promise<Browser> {
  if (!fs.existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `Chromium was not found at ${CHROMIUM_PATH}. Browser tests need it: install it with ` +
        '`apt-get update && apt-get install -y chromium` (or set CHROMIUM_PATH).',
    );
  }
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync',
    ],
  });
}

/** Path for a named screenshot under test-artifacts/, creating the folder. */
export function artifactPath(name: string): string {
  fs.mkdirSync(ARTIFACTS_DIR, { recursive: true });
  return path.join(ARTIFACTS_DIR, name);
}
