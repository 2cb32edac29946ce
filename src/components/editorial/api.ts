/** The API's error body. */
export interface ApiError {
  code: string;
  message: string;
  field?: string;
}

export type ApiResult<T> = { ok: true; status: number; data: T } | { ok: false; status: number; error: ApiError; body: Record<string, unknown> };

/**
 * Calls a Loopwright API route with the session cookie and answers a result, never throws:
 * a network failure becomes status 0 with a message that says the text is kept.
 */
export async function callApi<T>(method: 'GET' | 'POST' | 'PUT' | 'DELETE', path: string, body?: unknown): Promise<ApiResult<T>> {
  let res: Response;
  try {
    // Writes always carry a JSON body: the server refuses bodiless cross-site-looking POSTs.
    const payload = body === undefined && method !== 'GET' ? {} : body;
    res = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: payload === undefined ? { Accept: 'application/json' } : { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: payload === undefined ? undefined : JSON.stringify(payload),
    });
  } catch {
    return { ok: false, status: 0, error: { code: 'network', message: 'The server could not be reached; nothing was lost — try again when the connection is back.' }, body: {} };
  }
  let json: Record<string, unknown> = {};
  try {
    json = await res.json();
  } catch {
    // An empty or non-JSON answer: handled below by the status.
  }
  if (res.ok) return { ok: true, status: res.status, data: json as T };
  const error = (json.error as ApiError | undefined) ?? { code: `http_${res.status}`, message: `The server answered ${res.status}; try again.` };
  return { ok: false, status: res.status, error, body: json };
}
