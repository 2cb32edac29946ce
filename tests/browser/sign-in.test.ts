import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { startServer, type RunningServer } from '../support/server';
import { artifactPath, launchChromium } from '../support/browser';
import { demoAccount } from '../support/session';
import { lastMailTo, linkIn } from '../support/mail';

/** Waits until the island has hydrated (its submit button is enabled), so typing is not replaced by hydration. */
async function hydrated(page: Page, button: string): Promise<void> {
  await page.getByRole('button', { name: button }).and(page.locator(':enabled')).waitFor({ timeout: 30_000 });
}

describe('signing in through the form in Chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('keeps what was typed after a wrong password, then signs in and shows the name and role', async () => {
    const page = await browser.newPage();
    const { email, password, name } = demoAccount('curator');
    await page.goto(`${server.url}/admin/mail`);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await hydrated(page, 'Sign in');
    const form = page.getByTestId('sign-in-form');
    await form.getByLabel('Work e-mail').fill(email);
    await form.getByLabel('Password').fill('wrong-password-here');
    await form.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor({ timeout: 20_000 });
    expect(await page.getByRole('alert').textContent()).toContain('do not match');
    expect(await form.getByLabel('Work e-mail').inputValue()).toBe(email);

    await form.getByLabel('Password').fill(password);
    await form.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${server.url}/admin/mail`);
    // A curator reaches the page it asked for but may not read it.
    expect(await page.locator('h1').textContent()).toContain('Not for your role');
    const who = page.getByTestId('signed-in-as');
    expect(await who.textContent()).toContain(name);
    expect(await who.textContent()).toContain('Curator');
    await page.screenshot({ path: artifactPath('sign-in-done.png') });

    await page.getByTestId('sign-out').click();
    await page.waitForURL(`${server.url}/sign-in`);
    await page.close();
  });

  it('fits the sign-in page on a phone without sideways scrolling', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await page.goto(`${server.url}/sign-in`);
    await hydrated(page, 'Sign in');
    await page.getByTestId('demo-accounts').locator('summary').click();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: artifactPath('sign-in-phone.png'), fullPage: true });
    await page.close();
  });

  it('lets an admin invite someone from the people page, who then sets a password and lands signed in', async () => {
    const page = await browser.newPage();
    const admin = demoAccount('admin');
    await page.goto(`${server.url}/sign-in`);
    await hydrated(page, 'Sign in');
    await page.getByLabel('Work e-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${server.url}/`);
    await page.getByRole('link', { name: 'Admin', exact: true }).click();
    await page.waitForURL(`${server.url}/admin/people`);

    await hydrated(page, 'Send invitation');
    const form = page.getByTestId('invite-form');
    await form.getByLabel('Name').fill('Rosa Underhill');
    await form.getByLabel('Work e-mail').fill('rosa.underhill@brindlewood.example');
    await form.getByLabel('Role of the new person').selectOption('author');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    const outcome = form.locator('[role="status"], [role="alert"]');
    await outcome.waitFor({ timeout: 20_000 }).catch(async (err) => {
      await page.screenshot({ path: artifactPath('admin-people-failed.png'), fullPage: true });
      throw new Error(`No answer to the invitation: ${err}\n${server.output().slice(-2000)}`);
    });
    expect(await outcome.textContent()).toContain('Invitation sent');
    const row = page.locator('[data-testid="person-row"][data-email="rosa.underhill@brindlewood.example"]');
    expect(await row.getByTestId('person-status').textContent()).toContain('Invited');
    await page.screenshot({ path: artifactPath('admin-people.png'), fullPage: true });

    const link = linkIn(lastMailTo(server, 'rosa.underhill@brindlewood.example'), `${server.url}/invite?token=`);
    const invitee = await browser.newPage();
    await invitee.goto(link!);
    await hydrated(invitee, 'Set my password');
    await invitee.getByLabel('New password').fill('pasteurizer-hold-line');
    await invitee.getByLabel('The same password again').fill('pasteurizer-hold-line');
    await invitee.getByRole('button', { name: 'Set my password' }).click();
    await invitee.waitForURL(`${server.url}/`);
    expect(await invitee.getByTestId('signed-in-as').textContent()).toContain('Rosa Underhill');
    await invitee.close();
    await page.close();
  });
});
