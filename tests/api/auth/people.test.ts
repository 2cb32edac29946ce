import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { demoAccount, sessionHeaders, signIn, signInAs } from '../../support/session';

describe('changing roles and deactivating accounts', () => {
  let server: RunningServer;
  let admin: string;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    admin = await signInAs(server.url, 'admin');
  });
  afterAll(async () => server?.stop());

  const change = (id: string, body: unknown, cookie = admin) =>
    fetch(`${server.url}/api/admin/people/${id}`, { method: 'PATCH', headers: sessionHeaders(server.url, cookie), body: JSON.stringify(body) });
  const sessionOf = async (cookie: string) => (await fetch(`${server.url}/api/auth/get-session`, { headers: { Cookie: cookie } })).json();

  it('changes a role, and the person’s open session carries the new role', async () => {
    const reader = await signInAs(server.url, 'reader');
    const res = await change('demo-reader', { role: 'author' });
    expect(res.status).toBe(200);
    expect((await res.json()).person).toMatchObject({ id: 'demo-reader', role: 'author', status: 'active' });
    expect((await sessionOf(reader)).user.role).toBe('author');
    await change('demo-reader', { role: 'reader' });
  });

  it('deactivating ends the person’s sessions at once and blocks sign-in; reactivating allows it again', async () => {
    const { email, password } = demoAccount('author');
    const author = await signInAs(server.url, 'author');
    const res = await change('demo-author', { active: false });
    expect(res.status).toBe(200);
    expect((await res.json()).person.status).toBe('deactivated');

    expect(await sessionOf(author)).toBeNull();
    expect((await fetch(`${server.url}/`, { headers: { Cookie: author }, redirect: 'manual' })).status).toBe(302);
    const refused = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server.url }, body: JSON.stringify({ email, password }),
    });
    expect(refused.status).toBe(403);
    expect((await refused.json()).message).toMatch(/deactivated/);

    expect((await change('demo-author', { active: true })).status).toBe(200);
    await signIn(server.url, email, password);
  });

  it('refuses to let an admin change their own account', async () => {
    const res = await change('demo-admin', { role: 'reader' });
    expect(res.status).toBe(409);
    expect((await res.json()).error.code).toBe('conflict');
  });

  it('answers 400 for an empty or unknown change and 404 for an unknown person, changing nothing', async () => {
    const empty = await change('demo-curator', {});
    expect(empty.status).toBe(400);
    expect((await empty.json()).error.code).toBe('invalid_request');
    const bad = await change('demo-curator', { role: 'superuser' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.field).toBe('role');
    expect((await change('demo-curator', { role: 'reader', extra: 1 })).status).toBe(400);
    expect((await change('no-such-person', { role: 'reader' })).status).toBe(404);
    const people = await (await fetch(`${server.url}/api/admin/people`, { headers: { Cookie: admin } })).json();
    expect(people.people.find((p: { id: string }) => p.id === 'demo-curator').role).toBe('curator');
  });

  it('refuses the library’s own admin endpoints to a reader', async () => {
    const reader = await signInAs(server.url, 'reader');
    const res = await fetch(`${server.url}/api/auth/admin/set-role`, { method: 'POST', headers: sessionHeaders(server.url, reader), body: JSON.stringify({ userId: 'demo-reader', role: 'admin' }) });
    expect(res.status).toBe(403);
    expect((await sessionOf(reader)).user.role).toBe('reader');
  });
});
