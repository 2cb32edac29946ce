/** What came back from a JSON call: ok with data, or a message a person can act on. */
export type JsonResult<T> = { ok: true; status: number; data: T; message: null } | { ok: false; status: number; data: null; message: string };

/** Sends JSON to one of our routes and reads the answer; both our `{ error: { message } }` and better-auth's `{ message }` bodies are understood. */
export async function sendJson<T = unknown>(url: string, body: unknown, method = 'POST'): Promise<JsonResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body), credentials: 'same-origin' });
  } catch {
    return { ok: false, status: 0, data: null, message: 'The server could not be reached. Check the connection and try again; nothing you typed is lost.' };
  }
  const data = await res.json().catch(() => null);
  if (res.ok) return { ok: true, status: res.status, data: data as T, message: null };
  const message = data?.error?.message ?? data?.message ?? `The server answered ${res.status}.`;
  return { ok: false, status: res.status, data: null, message };
}
