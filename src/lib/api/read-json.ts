import { ApiError, tooLargeMessage, UNSUPPORTED_MEDIA_MESSAGE } from './errors';
import { readLimited } from './read-limited';

/** The largest request body any JSON route reads: 1 MB. */
export const MAX_BODY_BYTES = 1024 * 1024;

export interface ReadJsonOptions {
  /** Largest accepted body in bytes (default 1 MB). */
  limitBytes?: number;
}

/** `application/json` or any `application/*+json`, parameters (charset) allowed. */
export function isJsonContentType(header: string | null): boolean {
  if (!header) return false;
  const type = header.split(';')[0]!.trim().toLowerCase();
  return type === 'application/json' || /^application\/[\w.+-]+\+json$/.test(type);
}

/**
 * Reads and parses a JSON request body. Throws ApiError: 415 `unsupported_media_type` for a
 * body not declared as JSON, 413 `body_too_large` past the limit (stops reading there, so a
 * huge upload costs at most the limit), 400 `invalid_json` for empty, non-UTF-8 or broken JSON.
 */
export async function readJson(request: Request, options: ReadJsonOptions = {}): Promise<unknown> {
  const limit = options.limitBytes ?? MAX_BODY_BYTES;
  if (!isJsonContentType(request.headers.get('content-type'))) {
    throw new ApiError(415, 'unsupported_media_type', UNSUPPORTED_MEDIA_MESSAGE);
  }
  const text = decode(await readLimited(request, limit, () => tooLarge(limit)));
  if (text.trim() === '') {
    throw new ApiError(400, 'invalid_json', 'The request body is empty; send a JSON object.');
  }
  try {
    return JSON.parse(text);
  } catch (err) {
    const reason = err instanceof Error ? err.message.replace(/\.$/, '') : 'parse error';
    throw new ApiError(
      400,
      'invalid_json',
      `The request body is not valid JSON (${reason}); check quotes, commas and brackets.`,
    );
  }
}

function tooLarge(limit: number): ApiError {
  return new ApiError(413, 'body_too_large', tooLargeMessage(limit));
}

function decode(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new ApiError(400, 'invalid_json', 'The request body is not valid UTF-8 text; send JSON encoded as UTF-8.');
  }
}
