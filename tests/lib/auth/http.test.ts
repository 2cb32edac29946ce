import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { forbidden, jsonError, readBody, unauthenticated } from '../../../src/lib/auth/http';

const post = (body: string) => new Request('http://localhost/api/admin/invitations', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body });

describe('jsonError', () => {
  it('answers the contract error body, never cached, with field only when given', async () => {
    const withField = jsonError(400, 'invalid_request', 'Give an e-mail address.', 'email');
    expect(withField.status).toBe(400);
    expect(withField.headers.get('cache-control')).toBe('no-store');
    expect(await withField.json()).toEqual({ error: { code: 'invalid_request', message: 'Give an e-mail address.', field: 'email' } });
    expect(await jsonError(409, 'conflict', 'Already invited.').json()).toEqual({ error: { code: 'conflict', message: 'Already invited.' } });
  });
});

describe('unauthenticated', () => {
  it('answers 401 unauthenticated and says how to sign in', async () => {
    const res = unauthenticated();
    expect(res.status).toBe(401);
    const { error } = await res.json();
    expect(error.code).toBe('unauthenticated');
    expect(error.message).toMatch(/sign-in/);
  });
});

describe('forbidden', () => {
  it('answers 403 forbidden naming the role needed', async () => {
    const res = forbidden('curator');
    expect(res.status).toBe(403);
    expect((await res.json()).error).toMatchObject({ code: 'forbidden', message: expect.stringMatching(/curator role or higher/) });
  });
});

describe('readBody', () => {
  const schema = z.object({ email: z.email('Give an e-mail address.') });

  it('gives the parsed data of a valid body', async () => {
    expect(await readBody(post('{"email":"operator@brindlewood.example"}'), schema)).toEqual({ data: { email: 'operator@brindlewood.example' }, response: null });
  });

  it('answers broken JSON with 400 invalid_json', async () => {
    const { data, response } = await readBody(post('{"email": '), schema);
    expect(data).toBeNull();
    expect(response?.status).toBe(400);
    expect((await response!.json()).error.code).toBe('invalid_json');
  });

  it('answers a body the schema refuses with 400 invalid_request naming the field', async () => {
    const { response } = await readBody(post('{"email":"not an address"}'), schema);
    expect(response?.status).toBe(400);
    expect((await response!.json()).error).toEqual({ code: 'invalid_request', message: 'Give an e-mail address.', field: 'email' });
  });
});
