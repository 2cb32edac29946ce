import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { demoAccount } from '../../support/session';

const MAX = 4;

function attempt(server: RunningServer, password: string) {
  return fetch(`${server.url}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: server.url },
    body: JSON.stringify({ email: demoAccount('reader').email, password }),
  });
}

describe('sign-in rate limit', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: String(MAX), LOOPWRIGHT_SIGN_IN_WINDOW: '600' } });
  });
  afterAll(async () => server?.stop());

  it(`answers 429 once ${MAX} failed attempts have been made, even for the right password`, async () => {
    for (let i = 0; i < MAX; i++) expect((await attempt(server, `guess-number-${i}`)).status).toBe(401);
    const blocked = await attempt(server, 'guess-number-last');
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('x-retry-after'))).toBeGreaterThan(0);
    expect((await attempt(server, demoAccount('reader').password)).status).toBe(429);
  });

  it('counts per account: forged client-address headers give a guesser no fresh allowance', async () => {
    const res = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: server.url, 'x-loopwright-client-ip': '10.9.8.7', 'x-forwarded-for': '10.9.8.7' },
      body: JSON.stringify({ email: demoAccount('reader').email, password: 'another-guess' }),
    });
    expect(res.status).toBe(429);
  });

  it('leaves other accounts signing in normally meanwhile', async () => {
    const other = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ email: demoAccount('curator').email, password: demoAccount('curator').password }),
    });
    expect(other.status).toBe(200);
  });
});
