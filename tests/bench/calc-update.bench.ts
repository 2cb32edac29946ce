/**
 * Recompute-and-redraw time of the loop-response calculator in headless Chromium: drags the
 * controller-gain slider across its whole range (one input event per mouse move) and prints
 * the p50 and p95 of the `calc-update` measures the island records. Budget: p95 < 16 ms (one
 * frame at 60 Hz). Needs a build (`npm run build`).
 */
import { startServer } from '../support/server';
import { launchChromium } from '../support/browser';
import { demoAccount, signInPage } from '../support/session';

/** The slider dragged: the controller gain of the demo page's HTST loop. */
const SLIDER = 'htst-tic210-kc-slider';
const MOVES = 240;

function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

export async function run(): Promise<void> {
  const server = await startServer({ seed: true });
  const browser = await launchChromium();
  try {
    const page = await browser.newPage({ viewport: { width: 1366, height: 900 } });
    const reader = demoAccount('reader');
    await signInPage(page, server.url, reader.email, reader.password);
    await page.goto(`${server.url}/calculators`);
    const slider = page.getByTestId(SLIDER);
    await slider.waitFor();
    await page.waitForFunction(() => document.querySelector('[data-testid="htst-tic210-setpoint-chart"] canvas') !== null);
    await slider.scrollIntoViewIfNeeded();
    await page.evaluate(() => performance.clearMeasures('calc-update'));
    const box = (await slider.boundingBox())!;
    const y = box.y + box.height / 2;
    await page.mouse.move(box.x + 2, y);
    await page.mouse.down();
    for (let i = 0; i <= MOVES; i++) await page.mouse.move(box.x + 2 + ((box.width - 4) * i) / MOVES, y);
    await page.mouse.up();
    const durations = await page.evaluate(() => performance.getEntriesByName('calc-update').map((e) => e.duration));
    if (durations.length < 20) throw new Error(`Only ${durations.length} calc-update measures were recorded while dragging.`);
    const sorted = [...durations].sort((a, b) => a - b);
    const p50 = percentile(sorted, 50);
    const p95 = percentile(sorted, 95);
    console.log(`loop response, slider drag: ${durations.length} recomputes, calc-update p50 ${p50.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms (budget p95 < 16 ms) ${p95 < 16 ? 'OK' : 'OVER BUDGET'}`);
  } finally {
    await browser.close();
    await server.stop();
  }
}
