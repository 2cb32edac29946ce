import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { demoAccount, sessionHeaders, signIn } from '../../support/session';

describe('changing one’s own password', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
  });
  afterAll(async () => server?.stop());

  it('shows the account page to its owner', async () => {
    const { email, password, name } = demoAccount('author');
    const cookie = await signIn(server.url, email, password);
    const html = await (await fetch(`${server.url}/account`, { headers: { Cookie: cookie } })).text();
    expect(html).toContain(name);
    expect(html).toContain('Change your password');
  });

  it('refuses a wrong current password, then changes it and signs out the other sessions', async () => {
    const { email, password } = demoAccount('reader');
    const here = await signIn(server.url, email, password);
    const elsewhere = await signIn(server.url, email, password);
    const change = (body: unknown) => fetch(`${server.url}/api/auth/change-password`, { method: 'POST', headers: sessionHeaders(server.url, here), body: JSON.stringify(body) });

    expect((await change({ currentPassword: 'not-my-password', newPassword: 'balance-tank-level-9' })).status).toBe(400);
    const ok = await change({ currentPassword: password, newPassword: 'balance-tank-level-9', revokeOtherSessions: true });
    expect(ok.status).toBe(200);
    expect(await (await fetch(`${server.url}/api/auth/get-session`, { headers: { Cookie: elsewhere } })).json()).toBeNull();
    await signIn(server.url, email, 'balance-tank-level-9');
  });
});
