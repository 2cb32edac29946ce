/**
 * `npm run bench`: runs every tests/bench/*.bench.ts in name order. Each exports
 * `run(): Promise<void>` and prints its own figures (medians and ratios; machines are noisy).
 */
import fs from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const dir = path.dirname(new URL(import.meta.url).pathname);
const only = process.argv[2];
const files = fs.readdirSync(dir).filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only))).sort();
for (const file of files) {
  console.log(`\n== ${file} ==`);
  const mod = (await import(pathToFileURL(path.join(dir, file)).href)) as { run(): Promise<void> };
  await mod.run();
}
