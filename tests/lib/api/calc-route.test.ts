import type { APIContext } from 'astro';
import { z } from 'zod';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { calcRoute, modelRoots, resetCalcLimiter } from '../../../src/lib/api/calc-route';
import { RateLimiter } from '../../../src/lib/api/rate-limit';
import { ModelError } from '../../../src/lib/control/types';

const Schema = z.object({ x: z.number() }).strict();

function route(run: (input: { x: number }) => unknown) {
  return calcRoute({ name: 'test', schema: Schema, codeFor: modelRoots(), run });
}

function call(handler: (c: APIContext) => Response | Promise<Response>, body: unknown, client = '10.0.0.1') {
  const request = new Request('http://localhost/api/v1/calc/test', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  return handler({ request, clientAddress: client } as unknown as APIContext);
}

afterEach(() => {
  resetCalcLimiter();
  vi.restoreAllMocks();
});

describe('calcRoute', () => {
  it('answers the engine result as JSON, not cached', async () => {
    resetCalcLimiter(new RateLimiter({ perMinute: 60, burst: 10 }));
    const res = await call(route(({ x }) => ({ doubled: 2 * x })).POST, { x: 4 });
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-store');
    expect(await res.json()).toEqual({ doubled: 8 });
  });

  it('turns a ModelError into 400 with its code and field', async () => {
    resetCalcLimiter(new RateLimiter({ perMinute: 60, burst: 10 }));
    const res = await call(route(() => { throw new ModelError('The plant has no poles left.', 'invalid_model', 'plant.den'); }).POST, { x: 1 });
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({ error: { code: 'invalid_model', message: 'The plant has no poles left.', field: 'plant.den' } });
  });

  it('answers any other engine failure with 422 calculation_failed, logs it, and sends no stack', async () => {
    resetCalcLimiter(new RateLimiter({ perMinute: 60, burst: 10 }));
    const log = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const res = await call(route(() => { throw new TypeError('Cannot read properties of undefined'); }).POST, { x: 1 });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.code).toBe('calculation_failed');
    expect(JSON.stringify(body)).not.toMatch(/TypeError|Cannot read|\.ts:\d+/);
    expect(log).toHaveBeenCalledOnce();
  });

  it('answers 429 with Retry-After once the client has used its burst, before reading the body', async () => {
    resetCalcLimiter(new RateLimiter({ perMinute: 60, burst: 2 }));
    const run = vi.fn(() => ({ ok: true }));
    const { POST } = route(run);
    expect((await call(POST, { x: 1 })).status).toBe(200);
    expect((await call(POST, { x: 1 })).status).toBe(200);
    const refused = await call(POST, 'not even an object');
    expect(refused.status).toBe(429);
    expect(refused.headers.get('retry-after')).toBe('1');
    expect((await refused.json()).error.code).toBe('rate_limited');
    expect(run).toHaveBeenCalledTimes(2);
    expect((await call(POST, { x: 1 }, '10.0.0.2')).status).toBe(200);
  });

  it('answers other methods with 405 and Allow: POST', async () => {
    const res = await route(() => null).ALL({ request: new Request('http://localhost/x') } as unknown as APIContext);
    expect(res.status).toBe(405);
    expect(res.headers.get('allow')).toBe('POST');
  });
});

describe('modelRoots', () => {
  const codeFor = modelRoots('plant');
  const issue = { code: 'invalid_type', expected: 'number', path: [], message: '' } as never;
  it.each([
    [['plant', 'den', 0], 'a number in the text', 'invalid_model'],
    [['plant'], 'a text', 'invalid_model'],
    [['plant'], undefined, 'invalid_request'],
    [['controller', 'kc'], 'a text', 'invalid_request'],
    [[], null, 'invalid_request'],
  ] as const)('gives %j (received %j) the code %s', (path, received, expected) => {
    expect(codeFor(path, issue, received)).toBe(expected);
  });

  it('keeps unknown keys and a model type choice as invalid_request', () => {
    expect(codeFor(['plant', 'Delay'], { code: 'unrecognized_keys', keys: ['Delay'], path: [], message: '' } as never, undefined)).toBe('invalid_request');
    expect(modelRoots('model')(['model', 'type'], { code: 'invalid_value', values: [], path: [], message: '' } as never, 'foptd')).toBe('invalid_request');
  });
});
