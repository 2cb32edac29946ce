import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../support/server';
import { pageWeight } from '../support/page-weight';
import { readRecipeFiles } from '../../src/lib/recipes/file-reader';
import { signInAs } from '../support/session';

/** The product's budget: all JavaScript of one recipe page, gzipped (150 KB = 150 × 1024 bytes). */
const BUDGET_BYTES = 150 * 1024;

const slugs = readRecipeFiles().map((r) => r.slug);

describe('JavaScript shipped by each recipe page', () => {
  let server: RunningServer;
  let cookie: string;
  const report: string[] = [];
  beforeAll(async () => {
    server = await startServer({ seed: true });
    cookie = await signInAs(server.url, 'reader');
  });
  afterAll(async () => {
    await server?.stop();
    console.log(`Recipe page JavaScript (gzip, eager + on demand + inline), budget ${BUDGET_BYTES / 1024} KB:\n${report.join('\n')}`);
  });

  it.each(slugs)('%s stays within the budget', async (slug) => {
    const res = await fetch(`${server.url}/recipes/${slug}`, { headers: { Cookie: cookie }, redirect: 'manual' });
    expect(res.status).toBe(200);
    const weight = pageWeight(await res.text());
    expect(weight.eager.length).toBeGreaterThan(0);
    const kb = (b: number) => (b / 1024).toFixed(1);
    report.push(`  ${slug}: ${kb(weight.totalGzipBytes)} KB (${weight.eager.length} files at once, ${weight.lazy.length} on demand; largest ${weight.eager[0].file} ${kb(weight.eager[0].gzipBytes)} KB)`);
    expect(weight.totalGzipBytes, `${slug} ships ${kb(weight.totalGzipBytes)} KB: ${[...weight.eager, ...weight.lazy].map((f) => `${f.file} ${kb(f.gzipBytes)}`).join(', ')}`).toBeLessThanOrEqual(BUDGET_BYTES);
  });
});
