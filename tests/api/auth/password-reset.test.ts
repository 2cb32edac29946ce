import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { capturedMail, lastMailTo, linkIn } from '../../support/mail';
import { demoAccount, signIn } from '../../support/session';

describe('password reset by e-mail', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
  });
  afterAll(async () => server?.stop());

  const post = (path: string, body: unknown) =>
    fetch(`${server.url}${path}`, { method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server.url }, body: JSON.stringify(body) });

  it('mails a link; the new password works, the old one and old sessions do not', async () => {
    const { email, password } = demoAccount('curator');
    const oldSession = await signIn(server.url, email, password);
    expect((await post('/api/auth/request-password-reset', { email })).status).toBe(200);
    const link = linkIn(lastMailTo(server, email), `${server.url}/reset-password?token=`);
    expect(link).not.toBeNull();
    expect(await (await fetch(link!)).text()).toContain('Choose a new password');

    const token = new URL(link!).searchParams.get('token');
    expect((await post('/api/auth/reset-password', { token, newPassword: 'short' })).status).toBe(400);
    expect((await post('/api/auth/reset-password', { token, newPassword: 'caustic-wash-at-80C' })).status).toBe(200);

    expect((await post('/api/auth/sign-in/email', { email, password })).status).toBe(401);
    await signIn(server.url, email, 'caustic-wash-at-80C');
    const old = await (await fetch(`${server.url}/api/auth/get-session`, { headers: { Cookie: oldSession } })).json();
    expect(old).toBeNull();
    // The link works once.
    expect((await post('/api/auth/reset-password', { token, newPassword: 'another-new-password' })).status).toBe(400);
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const before = capturedMail(server).length;
    const res = await post('/api/auth/request-password-reset', { email: 'nobody@brindlewood.example' });
    expect(res.status).toBe(200);
    expect(capturedMail(server).length).toBe(before);
  });
});
