import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../src/lib/api/errors';
import { isJsonContentType, MAX_BODY_BYTES, readJson } from '../../../src/lib/api/read-json';

function post(body: BodyInit | null, contentType: string | null = 'application/json', extra: Record<string, string> = {}) {
  const headers: Record<string, string> = { ...extra };
  if (contentType) headers['content-type'] = contentType;
  return new Request('http://localhost/api/v1/calc/analyze', { method: 'POST', body, headers });
}

async function failure(request: Request, limitBytes?: number): Promise<ApiError> {
  try {
    await readJson(request, { limitBytes });
  } catch (err) {
    if (err instanceof ApiError) return err;
    throw err;
  }
  throw new Error('readJson accepted the body');
}

/** A body streamed in chunks without a Content-Length, as a chunked upload arrives. */
function streamed(chunks: number, chunkBytes: number): ReadableStream<Uint8Array> {
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent++ >= chunks) return controller.close();
      controller.enqueue(new Uint8Array(chunkBytes).fill(0x20));
    },
  });
}

describe('isJsonContentType', () => {
  it.each([
    ['application/json', true],
    ['application/json; charset=utf-8', true],
    ['Application/JSON', true],
    ['application/vnd.loopwright+json', true],
    ['text/plain', false],
    ['application/x-www-form-urlencoded', false],
    ['application/jsonp', false],
    [null, false],
  ])('classifies %s as %s', (header, expected) => {
    expect(isJsonContentType(header)).toBe(expected);
  });
});

describe('readJson', () => {
  it('parses a JSON object', async () => {
    await expect(readJson(post('{"plant":{"num":[1],"den":[1,1]}}'))).resolves.toEqual({ plant: { num: [1], den: [1, 1] } });
  });

  it('answers 415 for a body not declared as JSON', async () => {
    const err = await failure(post('{}', 'text/plain'));
    expect([err.status, err.code]).toEqual([415, 'unsupported_media_type']);
  });

  it('answers 400 invalid_json for an empty body', async () => {
    const err = await failure(post(''));
    expect([err.status, err.code]).toEqual([400, 'invalid_json']);
  });

  it('answers 400 invalid_json naming the parser complaint for broken JSON', async () => {
    const err = await failure(post('{"plant": [1,}'));
    expect([err.status, err.code]).toEqual([400, 'invalid_json']);
    expect(err.message).toMatch(/not valid JSON/);
  });

  it('answers 400 invalid_json for bytes that are not UTF-8', async () => {
    const err = await failure(post(new Uint8Array([0x7b, 0xff, 0xfe, 0x7d])));
    expect(err.code).toBe('invalid_json');
    expect(err.message).toMatch(/UTF-8/);
  });

  it('accepts a body of exactly the limit and refuses one byte more', async () => {
    const limit = 64;
    const fits = `{"a":"${'x'.repeat(limit - 8)}"}`;
    expect(new TextEncoder().encode(fits).byteLength).toBe(limit);
    await expect(readJson(post(fits), { limitBytes: limit })).resolves.toBeTruthy();
    const err = await failure(post(`{"a":"${'x'.repeat(limit - 7)}"}`), limit);
    expect([err.status, err.code]).toEqual([413, 'body_too_large']);
  });

  it('refuses a declared Content-Length over the limit before reading', async () => {
    const err = await failure(post('{}', 'application/json', { 'content-length': String(MAX_BODY_BYTES + 1) }));
    expect(err.status).toBe(413);
  });

  it('stops reading a streamed body once it passes the limit', async () => {
    const body = streamed(10_000, 1024); // 10 MB offered, no Content-Length
    const request = new Request('http://localhost/x', {
      method: 'POST',
      body,
      headers: { 'content-type': 'application/json' },
      // @ts-expect-error Node's fetch needs duplex for a stream body.
      duplex: 'half',
    });
    const err = await failure(request);
    expect(err.status).toBe(413);
  });
});
