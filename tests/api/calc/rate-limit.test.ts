import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tuneExample } from '../../../src/lib/api/examples';
import { startServer, type RunningServer } from '../../support/server';

/** A server whose calculation routes allow bursts of 5 and 60 requests per minute (one per second). */
let server: RunningServer;
beforeAll(async () => {
  server = await startServer({ env: { LOOPWRIGHT_CALC_RATE_PER_MIN: '60', LOOPWRIGHT_CALC_BURST: '5' } });
});
afterAll(async () => server?.stop());

function tune(client: string): Promise<Response> {
  return fetch(`${server.url}/api/v1/calc/tune`, {
    method: 'POST',
    // The standalone server takes the client address from X-Forwarded-For when present.
    headers: { 'content-type': 'application/json', 'x-forwarded-for': client },
    body: JSON.stringify(tuneExample),
  });
}

describe('rate limit on /api/v1/calc/*', () => {
  it('answers a burst of 5, then 429 rate_limited with Retry-After, across all calculation routes', async () => {
    const client = '10.20.0.11';
    const statuses = [];
    for (let i = 0; i < 5; i++) statuses.push((await tune(client)).status);
    expect(statuses).toEqual([200, 200, 200, 200, 200]);

    const refused = await tune(client);
    expect(refused.status).toBe(429);
    const wait = Number(refused.headers.get('retry-after'));
    expect(Number.isInteger(wait)).toBe(true);
    expect(wait).toBeGreaterThanOrEqual(1);
    const body = await refused.json();
    expect(body.error.code).toBe('rate_limited');
    expect(body.error.message).toMatch(/wait \d+ s/);

    // The budget is per client, not per route.
    const other = await fetch(`${server.url}/api/v1/calc/discretize`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-forwarded-for': client },
      body: JSON.stringify({ tf: { num: [1], den: [1, 1] }, ts: 0.1, method: 'zoh' }),
    });
    expect(other.status).toBe(429);
  });

  it('keeps a separate bucket for another client', async () => {
    for (let i = 0; i < 6; i++) await tune('10.20.0.12');
    expect((await tune('10.20.0.13')).status).toBe(200);
  });

  it('lets the client in again after Retry-After seconds', async () => {
    const client = '10.20.0.14';
    let refused: Response | null = null;
    for (let i = 0; i < 7 && !refused; i++) {
      const res = await tune(client);
      if (res.status === 429) refused = res;
    }
    expect(refused).not.toBeNull();
    const wait = Number(refused!.headers.get('retry-after'));
    await new Promise((r) => setTimeout(r, wait * 1000 + 100));
    expect((await tune(client)).status).toBe(200);
  });

  it('does not limit the OpenAPI document', async () => {
    for (let i = 0; i < 8; i++) expect((await fetch(`${server.url}/api/v1/openapi.json`)).status).toBe(200);
  });
});
