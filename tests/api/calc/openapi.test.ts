import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { analyzeExample, discretizeExample, identifyExample, tuneExample } from '../../../src/lib/api/examples';
import { openApiDocument } from '../../../src/lib/api/openapi';
import { responseValidator } from '../../support/openapi-validator';
import { startServer, type RunningServer } from '../../support/server';

let server: RunningServer;
beforeAll(async () => {
  server = await startServer();
});
afterAll(async () => server?.stop());

describe('GET /api/v1/openapi.json', () => {
  it('serves the generated document without a session', async () => {
    const res = await fetch(`${server.url}/api/v1/openapi.json`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/application\/json/);
    expect(await res.json()).toEqual(JSON.parse(JSON.stringify(openApiDocument())));
  });

  it('answers other methods with 405 and the contract body', async () => {
    const res = await fetch(`${server.url}/api/v1/openapi.json`, { method: 'DELETE', headers: { origin: server.url } });
    expect(res.status).toBe(405);
    expect((await res.json()).error.code).toBe('method_not_allowed');
  });
});

describe('the worked examples of the document', () => {
  const examples = { analyze: analyzeExample, tune: tuneExample, identify: identifyExample, discretize: discretizeExample };
  it.each(Object.entries(examples))('POST /api/v1/calc/%s answers 200 in the documented shape', async (route, body) => {
    const served = await (await fetch(`${server.url}/api/v1/openapi.json`)).json();
    const validate = responseValidator(served);
    const res = await fetch(`${server.url}/api/v1/calc/${route}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
    expect(res.status).toBe(200);
    expect(validate(`/api/v1/calc/${route}`, 'post', await res.json())).toBeNull();
  });
});
