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

const sessions = new Map<string, Promise<string>>();

/**
 * Signs in as the demo account of `role` once per server and returns the `Cookie` header value;
 * later calls reuse that session (sign-in is rate-limited per account). Use `signIn` for a
 * fresh session, e.g. one a test will end.
 */
export function signInAs(baseUrl: string, role: Role): Promise<string> {
  const key = `${baseUrl} ${role}`;
  let cookie = sessions.get(key);
  if (!cookie) {
    const a = demoAccount(role);
    cookie = signIn(baseUrl, a.email, a.password);
    cookie.catch(() => sessions.delete(key));
    sessions.set(key, cookie);
  }
  return cookie;
}

/** Puts the (shared, see signInAs) session of a demo role into a Playwright page's browser context. */
export async function signInPageAs(page: Page, baseUrl: string, role: Role): Promise<void> {
  const cookie = await signInAs(baseUrl, role);
  const cookies = cookie.split('; ').map((pair) => {
    const i = pair.indexOf('=');
    return { name: pair.slice(0, i), value: pair.slice(i + 1), url: baseUrl };
  });
  await page.context().addCookies(cookies);
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
