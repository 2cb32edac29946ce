import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freePort, startServer, type RunningServer } from '../../support/server';
import { sessionHeaders, signInAs } from '../../support/session';

describe('an invitation when the mail server is down', () => {
  let server: RunningServer;
  beforeAll(async () => {
    // A port nothing listens on: every send is refused.
    server = await startServer({ seed: true, env: { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await freePort()) } });
  });
  afterAll(async () => server?.stop());

  it('answers 503 mail_unavailable and keeps no half-made account', async () => {
    const admin = await signInAs(server.url, 'admin');
    const res = await fetch(`${server.url}/api/admin/invitations`, {
      method: 'POST',
      headers: sessionHeaders(server.url, admin),
      body: JSON.stringify({ email: 'lars.petit@brindlewood.example', name: 'Lars Petit', role: 'reader' }),
    });
    expect(res.status).toBe(503);
    expect((await res.json()).error.code).toBe('mail_unavailable');
    const { people } = await (await fetch(`${server.url}/api/admin/people`, { headers: { Cookie: admin } })).json();
    expect(people.some((p: { email: string }) => p.email === 'lars.petit@brindlewood.example')).toBe(false);
  });
});
