import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { lastMailTo, linkIn } from '../../support/mail';
import { sessionHeaders, signIn, signInAs } from '../../support/session';

describe('inviting someone', () => {
  let server: RunningServer;
  let admin: string;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    admin = await signInAs(server.url, 'admin');
  });
  afterAll(async () => server?.stop());

  const invite = (body: unknown) =>
    fetch(`${server.url}/api/admin/invitations`, { method: 'POST', headers: sessionHeaders(server.url, admin), body: JSON.stringify(body) });

  it('mails a link that sets a password, after which the person signs in with their role', async () => {
    const res = await invite({ email: 'Ines.Farrow@brindlewood.example', name: 'Ines Farrow', role: 'author' });
    expect(res.status).toBe(201);
    const { person } = await res.json();
    expect(person).toMatchObject({ email: 'ines.farrow@brindlewood.example', role: 'author', status: 'invited' });

    const mail = lastMailTo(server, 'ines.farrow@brindlewood.example');
    expect(mail?.subject).toMatch(/invited/i);
    const link = linkIn(mail, `${server.url}/invite?token=`);
    expect(link).not.toBeNull();

    // Not yet able to sign in: there is no password until the link is used.
    const early = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ email: 'ines.farrow@brindlewood.example', password: 'anything-at-all' }),
    });
    expect(early.status).toBe(401);

    const page = await fetch(link!);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('Welcome, Ines Farrow');

    const token = new URL(link!).searchParams.get('token');
    const set = await fetch(`${server.url}/api/auth/reset-password`, {
      method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ token, newPassword: 'whey-protein-balance' }),
    });
    expect(set.status).toBe(200);

    const cookie = await signIn(server.url, 'ines.farrow@brindlewood.example', 'whey-protein-balance');
    const session = await (await fetch(`${server.url}/api/auth/get-session`, { headers: { Cookie: cookie } })).json();
    expect(session.user).toMatchObject({ name: 'Ines Farrow', role: 'author' });

    const people = await (await fetch(`${server.url}/api/admin/people`, { headers: { Cookie: admin } })).json();
    expect(people.people.find((p: { email: string }) => p.email === 'ines.farrow@brindlewood.example').status).toBe('active');

    // The link worked once.
    expect((await fetch(link!)).status).toBe(404);
  });

  it('answers 400 with the field for a bad address and an unknown role, and saves nothing', async () => {
    const bad = await invite({ email: 'not-an-address', name: 'Jo Pell', role: 'reader' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error).toMatchObject({ code: 'invalid_request', field: 'email' });
    const role = await invite({ email: 'jo.pell@brindlewood.example', name: 'Jo Pell', role: 'owner' });
    expect(role.status).toBe(400);
    expect((await role.json()).error.field).toBe('role');
    const broken = await fetch(`${server.url}/api/admin/invitations`, { method: 'POST', headers: sessionHeaders(server.url, admin), body: '{"email":' });
    expect(broken.status).toBe(400);
    expect((await broken.json()).error.code).toBe('invalid_json');
    const people = await (await fetch(`${server.url}/api/admin/people`, { headers: { Cookie: admin } })).json();
    expect(people.people.some((p: { email: string }) => p.email.startsWith('jo.pell'))).toBe(false);
  });

  it('answers 409 for an address that already has an account', async () => {
    const res = await invite({ email: 'odile.brennan@brindlewood.example', name: 'Odile Brennan', role: 'reader' });
    expect(res.status).toBe(409);
    expect((await res.json()).error.code).toBe('conflict');
  });

  it('sends a fresh link when a pending invitation is repeated, and only the new link works', async () => {
    await invite({ email: 'kit.marsh@brindlewood.example', name: 'Kit Marsh', role: 'reader' });
    const first = linkIn(lastMailTo(server, 'kit.marsh@brindlewood.example'), `${server.url}/invite?token=`);
    const again = await invite({ email: 'kit.marsh@brindlewood.example', name: 'Kit Marsh', role: 'curator' });
    expect(again.status).toBe(201);
    expect((await again.json()).person.role).toBe('curator');
    const second = linkIn(lastMailTo(server, 'kit.marsh@brindlewood.example'), `${server.url}/invite?token=`);
    expect(second).not.toBe(first);
    expect((await fetch(first!)).status).toBe(404);
    expect((await fetch(second!)).status).toBe(200);
  });

  it('lists the captured messages on the admin mail page', async () => {
    const html = await (await fetch(`${server.url}/admin/mail`, { headers: { Cookie: admin } })).text();
    expect(html).toContain('ines.farrow@brindlewood.example');
    expect(html).toContain('You are invited to Loopwright');
  });
});
