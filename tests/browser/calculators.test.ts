import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { download, openIsland, pngSize, waitForIsland } from './calculators-support';
import { signInAs } from '../support/session';

const LOOP = 'htst-tic210';

describe('calculator islands in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let page_url: string;
  beforeAll(async () => {
    server = await startServer({ seed: true });
    browser = await launchChromium();
    page_url = `${server.url}/calculators`;
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('shows the step information at first paint, before any script runs', async () => {
    const cookie = await signInAs(server.url, 'reader');
    const html = await (await fetch(page_url, { headers: { Cookie: cookie } })).text();
    expect(html).toContain(`data-testid="${LOOP}-overshoot"`);
    // React separates adjacent text with comments in server HTML.
    expect(html.replace(/<!-- -->/g, "")).toMatch(/HOLDS<\/span><span>Overshoot \(setpoint step\)/);
  });

  it('redraws the plot and the step information when the gain slider moves, and flips a claim', async () => {
    const page = await openIsland(browser, page_url, LOOP);
    const overshoot = page.getByTestId(`${LOOP}-overshoot`);
    const before = await overshoot.textContent();
    const canvas = page.getByTestId(`${LOOP}-setpoint-chart`).locator('canvas');
    const pixelsBefore = await canvas.evaluate((c: HTMLCanvasElement) => c.toDataURL());
    await page.getByTestId(`${LOOP}-kc-slider`).focus();
    await page.keyboard.press('End');
    await expect.poll(() => overshoot.textContent()).not.toBe(before);
    expect(await canvas.evaluate((c: HTMLCanvasElement) => c.toDataURL())).not.toBe(pixelsBefore);
    expect(Number.parseFloat((await page.getByTestId(`${LOOP}-kc-field`).inputValue()))).toBeCloseTo(7.6, 6);
    // Four times the recipe's gain breaks the overshoot claim of ≤ 10 %.
    await expect.poll(() => page.getByTestId(`${LOOP}-claims`).locator('li[data-holds="false"]').count()).toBeGreaterThan(0);
    const measures = await page.evaluate(() => performance.getEntriesByName('calc-update').length);
    expect(measures).toBeGreaterThan(0);
    await page.context().close();
  });

  it('restores exactly the same state from a shared link', async () => {
    const page = await openIsland(browser, page_url, LOOP);
    const ti = page.getByTestId(`${LOOP}-ti-field`);
    await ti.fill('1.5 min');
    await ti.press('Enter');
    await expect.poll(() => ti.inputValue()).toBe('90');
    await expect.poll(() => page.url()).toContain(`${LOOP}=`);
    const shared = page.url();
    const facts = await page.getByTestId(`${LOOP}-facts`).textContent();
    await page.context().close();

    const colleague = await openIsland(browser, shared, LOOP);
    await expect.poll(() => colleague.getByTestId(`${LOOP}-ti-field`).inputValue()).toBe('90');
    expect(await colleague.getByTestId(`${LOOP}-facts`).textContent()).toBe(facts);
    await colleague.context().close();
  });

  it('downloads the responses as CSV and the charts as PNG, and copies the tuning', async () => {
    const page = await openIsland(browser, page_url, LOOP);
    const csv = await download(page, () => page.getByTestId(`${LOOP}-csv`).click());
    expect(csv.name).toBe('htst-tic210-data.csv');
    const lines = csv.bytes.toString('utf8').trim().split('\r\n');
    expect(lines[0]).toBe('t (s),"PV, setpoint step","PV, load step"');
    expect(lines).toHaveLength(602);
    expect(lines[1]!.split(',').map(Number)).toEqual([0, 0, 0]);

    const png = await download(page, () => page.getByTestId(`${LOOP}-png`).click());
    expect(png.name).toBe('htst-tic210-chart.png');
    const size = pngSize(png.bytes);
    expect(size.width).toBeGreaterThan(300);
    expect(size.height).toBeGreaterThan(300);

    await page.getByTestId(`${LOOP}-copy`).click();
    await expect.poll(() => page.getByTestId(`${LOOP}-status`).textContent()).toContain('Copied');
    expect(await page.evaluate(() => navigator.clipboard.readText())).toContain('Kc = 1.9');
    await page.context().close();
  });

  it('reads typed trade units and explains a typing mistake', async () => {
    const page = await openIsland(browser, page_url, LOOP);
    const kc = page.getByTestId(`${LOOP}-kc-field`);
    await kc.fill('PB 50');
    await kc.press('Enter');
    await expect.poll(() => kc.inputValue()).toBe('2');
    await kc.fill('two');
    await kc.press('Enter');
    await expect.poll(() => page.getByRole('alert').filter({ hasText: 'proportional band' }).count()).toBe(1);
    expect(await kc.getAttribute('aria-invalid')).toBe('true');
    await page.context().close();
  });

  it('changes the combined transfer function when a block is added, and keeps it when blocks are reordered', async () => {
    const page = await openIsland(browser, page_url, 'steam-chain');
    const tf = page.getByTestId('steam-chain-tf');
    const read = async () => JSON.parse((await tf.getAttribute('data-tf'))!) as { num: number[]; den: number[]; delay: number };
    const first = await read();
    expect(first.den).toHaveLength(3);
    expect(first.delay).toBe(3);
    await expect.poll(() => tf.locator('.katex').count()).toBeGreaterThan(0);

    await page.getByTestId('steam-chain-kind').selectOption('dead-time');
    await page.getByTestId('steam-chain-add').click();
    await expect.poll(async () => (await read()).delay).toBe(5);
    await page.getByTestId('steam-chain-kind').selectOption('first-order');
    await page.getByTestId('steam-chain-add').click();
    await expect.poll(async () => (await read()).den.length).toBe(4);
    const added = await read();

    const names = () => page.getByTestId('steam-chain-blocks').locator('li strong').allTextContents();
    const order = await names();
    const tex = await tf.textContent();
    await page.getByTestId('steam-chain-up-2').click();
    await expect.poll(names).not.toEqual(order);
    // Blocks in series commute (the contract: the order does not change the result).
    expect(await read()).toEqual(added);
    await expect.poll(() => tf.textContent()).not.toBe(tex);
    await page.getByTestId('steam-chain-remove-0').click();
    await expect.poll(async () => (await read()).num[0]).not.toBeCloseTo(added.num[0]!, 6);
    await page.context().close();
  });

  it('prints the difference equation for a new sample time and refuses one that splits the dead time', async () => {
    const page = await openIsland(browser, page_url, 'htst-discrete');
    const equation = page.getByTestId('htst-discrete-equation');
    await expect.poll(() => equation.textContent()).toContain('u[k−7]');
    const ts = page.getByTestId('htst-discrete-ts');
    await ts.fill('2 s');
    await ts.press('Enter');
    await expect.poll(() => equation.textContent()).toContain('u[k−4]');
    await ts.fill('0.7');
    await ts.press('Enter');
    await expect.poll(() => page.getByTestId('htst-discrete').getByRole('alert').count()).toBeGreaterThan(0);
    await page.context().close();
  });

  it('converts the chiller PID between forms and into proportional band and repeats per minute', async () => {
    const page = await openIsland(browser, page_url, 'chiller-pid');
    const table = page.getByTestId('chiller-pid-table');
    await page.getByTestId('chiller-pid-gain-unit').selectOption('pb');
    await page.getByTestId('chiller-pid-integral-unit').selectOption('rpm');
    const series = table.locator('tr[data-form="series"]');
    await expect.poll(() => series.locator('[data-setting="pb"]').textContent()).toContain(String(Number((100 / 2.4).toPrecision(4))));
    await expect.poll(() => series.locator('[data-setting="ri"]').textContent()).toContain(String(Number((60 / 180).toPrecision(4))));
    await expect.poll(() => table.locator('tr[data-form="parallel"] [data-setting="ki"]').count()).toBe(1);
    await page.context().close();
  });

  it('marks the margins on the frequency view and moves them with the gain', async () => {
    const page = await openIsland(browser, page_url, 'htst-tic210-freq');
    const pm = page.getByTestId('htst-tic210-freq-pm');
    const before = await pm.textContent();
    expect(Number.parseFloat(before!)).toBeGreaterThan(30);
    await page.getByTestId('htst-tic210-freq-kc-slider').focus();
    await page.keyboard.press('Home');
    await expect.poll(() => pm.textContent()).not.toBe(before);
    expect(await page.getByTestId('htst-tic210-freq-nyquist-chart').locator('canvas').count()).toBe(1);
    await page.context().close();
  });

  it('lists the published rules side by side, re-tunes for a new model and shows them in another form', async () => {
    const page = await openIsland(browser, page_url, 'silo-flow-rules');
    const rows = page.getByTestId('silo-flow-rules-table').locator('tbody tr');
    await expect.poll(() => rows.count()).toBeGreaterThanOrEqual(5);
    expect(await rows.locator('th').allTextContents()).toEqual(expect.arrayContaining([expect.stringContaining('SIMC'), expect.stringContaining('AMIGO')]));
    const simcGain = () => page.getByTestId('silo-flow-rules-table').locator('tr[data-rule="simc"] td').nth(1).textContent();
    // SIMC PI with τc = θ: Kc = τ/(K·2θ) = 6/(1.3·3) = 1.538 (Skogestad 2003); doubling θ halves it (×0.5).
    expect(await simcGain()).toBe('1.538');
    const theta = page.getByTestId('silo-flow-rules-theta-field');
    await theta.fill('3');
    await theta.press('Enter');
    await expect.poll(simcGain).toBe('0.7692');
    await page.getByTestId('silo-flow-rules-gain-unit').selectOption('pb');
    await expect.poll(simcGain).toBe(String(Number((100 / 0.7692307692).toPrecision(4))));
    await page.context().close();
  });

  it('restores a rearranged block chain from a shared link', async () => {
    const page = await openIsland(browser, page_url, 'steam-chain');
    await page.getByTestId('steam-chain-remove-3').click();
    await expect.poll(() => page.url()).toContain('steam-chain=');
    const tf = await page.getByTestId('steam-chain-tf').getAttribute('data-tf');
    expect(JSON.parse(tf!).delay).toBe(0);
    const shared = page.url();
    await page.context().close();
    const colleague = await openIsland(browser, shared, 'steam-chain');
    await expect.poll(() => colleague.getByTestId('steam-chain-tf').getAttribute('data-tf')).toBe(tf);
    expect(await colleague.getByTestId('steam-chain-blocks').locator('li').count()).toBe(3);
    await colleague.context().close();
  });

  it('saves screenshots of the calculators at desktop and phone widths', async () => {
    for (const [name, width] of [['calculators-desktop.png', 1366], ['calculators-phone.png', 390]] as const) {
      const page = await openIsland(browser, page_url, LOOP, { width });
      for (const id of ['htst-tic210-freq', 'silo-flow-rules', 'steam-chain', 'chiller-pid', 'htst-discrete']) await waitForIsland(page, id);
      await page.waitForTimeout(300);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      await page.screenshot({ path: artifactPath(name), fullPage: true });
      await page.context().close();
    }
  });
});
