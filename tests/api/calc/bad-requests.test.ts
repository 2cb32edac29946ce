import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resetCalcLimiter } from '../../../src/lib/api/calc-route';
import { RateLimiter } from '../../../src/lib/api/rate-limit';
import { callInProcess, callOverHttp, type CalcAnswer } from '../../support/calc-routes';
import { startServer, type RunningServer } from '../../support/server';
import { badRequests, type BadRequest } from './bad-request-corpus';

function expectContractError(answer: CalcAnswer, row: BadRequest) {
  expect(answer.status).toBe(row.status);
  expect(answer.json.error.code).toBe(row.code);
  expect(answer.json.error.field).toBe(row.field);
  // One plain sentence a person can act on, and nothing of the server's insides.
  expect(answer.json.error.message).toMatch(/^[A-Za-z"][^\n]*\.$/);
  expect(answer.json.error.message).not.toMatch(/at .*\.(ts|js|mjs):\d+|ZodError|TypeError|undefined/);
  expect(answer.headers.get('content-type')).toMatch(/application\/json/);
}

describe('the bad-request corpus', () => {
  it('has at least 40 requests, each with a distinct name', () => {
    expect(badRequests.length).toBeGreaterThanOrEqual(40);
    expect(new Set(badRequests.map((r) => r.name)).size).toBe(badRequests.length);
  });
});

describe('calculation routes called in-process with bad requests', () => {
  beforeAll(() => resetCalcLimiter(new RateLimiter({ perMinute: 1e9, burst: 1e9 })));
  it.each(badRequests)('answers $status $code at $field for $name', async (row) => {
    expectContractError(await callInProcess(row.call), row);
  });
});

describe('calculation routes over HTTP with bad requests', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ env: { LOOPWRIGHT_CALC_RATE_PER_MIN: '100000', LOOPWRIGHT_CALC_BURST: '100000' } });
  });
  afterAll(async () => server?.stop());

  it.each(badRequests)('answers $status $code at $field for $name', async (row) => {
    const answer = await callOverHttp(server.url, row.call);
    expectContractError(answer, row);
    if (row.status === 405) expect(answer.headers.get('allow')).toBe('POST');
  });

  it('logs no stack trace for any of them', () => {
    expect(server.output()).not.toMatch(/unexpected failure/);
  });
});
