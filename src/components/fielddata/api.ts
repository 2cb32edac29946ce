/** Calls from the field-data islands to the API, with the contract's error body read back. */

/** A refused call: the API's one-sentence message, its field, and for files every issue by line. */
export class ApiFailure extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly field: string | null,
    readonly issues: { line: number | null; message: string }[],
  ) {
    super(message);
  }
}

async function read<T>(res: Response): Promise<T> {
  const body = await res.json().catch(() => null);
  if (!res.ok) {
    const e = body?.error;
    throw new ApiFailure(e?.message ?? `The server answered ${res.status}; try again.`, res.status, e?.field ?? null, body?.issues ?? []);
  }
  return body as T;
}

export async function getJson<T>(url: string): Promise<T> {
  return read<T>(await fetch(url, { headers: { Accept: 'application/json' } }));
}

export async function postJson<T>(url: string, body: unknown): Promise<T> {
  return read<T>(await fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json', Accept: 'application/json' }, body: JSON.stringify(body) }));
}

export async function postForm<T>(url: string, form: FormData): Promise<T> {
  return read<T>(await fetch(url, { method: 'POST', body: form, headers: { Accept: 'application/json' } }));
}

/** Significant digits for display, no trailing zeros. */
export function fmt(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  return String(Number(x.toPrecision(digits)));
}
