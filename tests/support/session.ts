import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../src/lib/auth/demo-users';
import type { Role } from '../../src/lib/auth/roles';

/**
 * Signing in from tests. Pages and most API routes need a session: start the server with
 * `startServer({ seed: true })` so the demo accounts exist, then sign in as one of them.
 */

/** The demo account of a role (e-mail and password as in README's "Demo accounts"). */
export function demoAccount(role: Role): { email: string; password: string; name: string } {
  const u = DEMO_USERS.find((d) => d.role === role)!;
  return { email: u.email, password: u.password, name: u.name };
}

/** Signs in over HTTP and returns the `Cookie` header value to send with later requests. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: baseUrl },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`Sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(';')[0]);
  if (!cookies.length) throw new Error(`Sign-in as ${email} set no cookie.`);
  return cookies.join('; ');
}

/** Signs in as the demo account of `role`; returns the `Cookie` header value. */
export function signInAs(baseUrl: string, role: Role): Promise<string> {
  const a = demoAccount(role);
  return signIn(baseUrl, a.email, a.password);
}

/** Headers for a JSON call with a session: Cookie, Origin (better-auth and our routes expect it on writes) and Content-Type. */
export function sessionHeaders(baseUrl: string, cookie: string): Record<string, string> {
  return { Cookie: cookie, Origin: baseUrl, 'Content-Type': 'application/json' };
}

/** Signs a Playwright page's browser context in (the cookie lands in the context, so every page of it is signed in). */
export async function signInPage(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  const res = await page.request.post(`${baseUrl}/api/auth/sign-in/email`, {
    headers: { Origin: baseUrl, 'Content-Type': 'application/json' },
    data: { email, password },
  });
  if (res.status() !== 200) throw new Error(`Sign-in as ${email} answered ${res.status()}: ${await res.text()}`);
}
