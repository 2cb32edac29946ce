import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { demoAccount, sessionHeaders, signIn, signInAs } from '../../support/session';

describe('signing in and route protection', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
  });
  afterAll(async () => server?.stop());

  it('signs a demo account in and reports its name and role in the session', async () => {
    const cookie = await signInAs(server.url, 'author');
    const res = await fetch(`${server.url}/api/auth/get-session`, { headers: { Cookie: cookie } });
    const body = await res.json();
    expect(body.user).toMatchObject({ email: demoAccount('author').email, name: demoAccount('author').name, role: 'author' });
  });

  it('refuses a wrong password with 401 and sets no session cookie', async () => {
    const res = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ email: demoAccount('reader').email, password: 'not-the-password' }),
    });
    expect(res.status).toBe(401);
    expect(res.headers.getSetCookie().some((c) => c.startsWith('better-auth.session_token=') && !c.includes('Max-Age=0'))).toBe(false);
  });

  it('refuses public sign-up: accounts come by invitation only', async () => {
    const res = await fetch(`${server.url}/api/auth/sign-up/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ email: 'stranger@elsewhere.example', password: 'long-enough-password', name: 'Stranger' }),
    });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
  });

  it('answers an anonymous API call with 401 and the contract body', async () => {
    const res = await fetch(`${server.url}/api/admin/people`);
    expect(res.status).toBe(401);
    const body = await res.json();
    expect(body.error.code).toBe('unauthenticated');
    expect(typeof body.error.message).toBe('string');
  });

  it('answers 401 for any unknown API path too, so nothing leaks before sign-in', async () => {
    expect((await fetch(`${server.url}/api/v1/recipes`)).status).toBe(401);
  });

  it('sends an anonymous page visit to the sign-in page, keeping where it was going', async () => {
    const res = await fetch(`${server.url}/admin/people?tab=1`, { redirect: 'manual' });
    expect(res.status).toBe(302);
    expect(res.headers.get('location')).toBe('/sign-in?next=%2Fadmin%2Fpeople%3Ftab%3D1');
    const page = await fetch(`${server.url}/sign-in`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Sign in to the recipe book');
    expect(html).toContain('Demo accounts at Brindlewood Creamery');
    expect(html).toContain(demoAccount('curator').email);
  });

  it('leaves the health check, the calculation routes and the API description open without a session', async () => {
    expect((await fetch(`${server.url}/api/health`)).status).toBe(200);
    for (const path of ['/api/v1/calc/analyze', '/api/v1/openapi.json']) {
      const res = await fetch(`${server.url}${path}`, { method: path.endsWith('json') ? 'GET' : 'POST', headers: { 'Content-Type': 'application/json' }, body: path.endsWith('json') ? undefined : '{}' });
      expect(res.status, path).not.toBe(401);
      expect(res.status, path).not.toBe(302);
    }
  });

  it('answers 403 with the contract body when a reader calls an admin-only route', async () => {
    const cookie = await signInAs(server.url, 'reader');
    for (const [method, path] of [['GET', '/api/admin/people'], ['GET', '/api/admin/mail'], ['POST', '/api/admin/invitations'], ['PATCH', '/api/admin/people/demo-author']] as const) {
      const res = await fetch(`${server.url}${path}`, { method, headers: sessionHeaders(server.url, cookie), body: method === 'GET' ? undefined : '{}' });
      expect(res.status, `${method} ${path}`).toBe(403);
      expect((await res.json()).error.code).toBe('forbidden');
    }
  });

  it('shows a curator the people page as not allowed (403), and an admin the list', async () => {
    const curator = await signInAs(server.url, 'curator');
    const denied = await fetch(`${server.url}/admin/people`, { headers: { Cookie: curator } });
    expect(denied.status).toBe(403);
    expect(await denied.text()).toContain('Not for your role');
    const admin = await signInAs(server.url, 'admin');
    const page = await fetch(`${server.url}/admin/people`, { headers: { Cookie: admin } });
    expect(page.status).toBe(200);
    const html = await page.text();
    for (const role of ['reader', 'author', 'curator'] as const) expect(html).toContain(demoAccount(role).email);
  });

  it('ends the session on sign-out', async () => {
    const cookie = await signIn(server.url, demoAccount('reader').email, demoAccount('reader').password);
    const out = await fetch(`${server.url}/api/auth/sign-out`, { method: 'POST', headers: sessionHeaders(server.url, cookie), body: '{}' });
    expect(out.status).toBe(200);
    const res = await fetch(`${server.url}/`, { headers: { Cookie: cookie }, redirect: 'manual' });
    expect(res.status).toBe(302);
  });
});
