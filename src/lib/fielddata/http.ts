/** The glue between the field-data routes and their services: errors, uploads, the database and folder. */
import type { APIContext } from 'astro';
import { db } from '../db';
import { databasePath } from '../db/config';
import { jsonError } from '../auth/http';
import { requireRole } from '../auth/guard';
import type { Role } from '../auth/roles';
import { EditorialError } from '../editorial/errors';
import type { Actor } from './actor';
import { STEP_TEST_LIMITS } from './csv';
import { FieldDataProblem } from './problem';
import { readLimited } from '../api/read-limited';
import { stepTestFolder } from './storage';

/** Room for the multipart envelope and the small text fields around a 5 MB file. */
const MULTIPART_OVERHEAD = 64 * 1024;

export const noStore = { 'Cache-Control': 'no-store' };

/** Runs a route body for a role: 401/403 from the guard, problems as the contract's error body (plus `issues`). */
export async function asRole(context: APIContext, min: Role, body: (actor: Actor & { id: string }) => Promise<Response>): Promise<Response> {
  const { user, response } = requireRole(context, min);
  if (response) return response;
  try {
    return await body(user);
  } catch (err) {
    return problemResponse(err);
  }
}

/** A thrown problem as its answer; anything else is a server fault, logged and answered 500 without detail. */
export function problemResponse(err: unknown): Response {
  if (err instanceof FieldDataProblem) {
    const body: Record<string, unknown> = { error: err.field === undefined ? { code: err.code, message: err.message } : { code: err.code, message: err.message, field: err.field } };
    if (err.issues) Object.assign(body, { issues: err.issues.list, issueCount: err.issues.count });
    return Response.json(body, { status: err.status, headers: noStore });
  }
  if (err instanceof EditorialError) return jsonError(err.status, err.code, err.message, err.field ?? undefined);
  console.error('Field-data route failed:', err);
  return jsonError(500, 'internal', 'Something went wrong on the server; nothing was saved. Try again, and tell an admin if it keeps happening.');
}

export function database() {
  return db();
}

/** Where stored step-test files live for this server's database. */
export function folder(): string {
  return stepTestFolder(databasePath());
}

/** A positive whole number from a route parameter, or a 404. */
export function idParam(value: string | undefined, what: string): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0) throw new FieldDataProblem(404, 'not_found', `There is no ${what} ${value ?? ''}.`.replace(/ \.$/, '.'));
  return id;
}

/** An uploaded file and the text fields beside it. */
export interface Upload {
  bytes: Uint8Array;
  fileName: string;
  fields: Record<string, string>;
}

/**
 * Reads `multipart/form-data` (a `file` part plus text fields) or a raw `text/csv` body,
 * stopping at the size limit so an oversized upload costs at most the limit in memory.
 */
export async function readUpload(request: Request, limit: number = STEP_TEST_LIMITS.maxBytes, what = 'a step-test file'): Promise<Upload> {
  const type = (request.headers.get('content-type') ?? '').toLowerCase();
  const raw = await readLimited(request, limit + MULTIPART_OVERHEAD, (seen) => tooLarge(seen, limit, what));
  if (type.startsWith('text/csv') || type.startsWith('text/plain')) {
    if (raw.byteLength > limit) throw tooLarge(raw.byteLength, limit, what);
    return { bytes: raw, fileName: '', fields: {} };
  }
  if (!type.startsWith('multipart/form-data')) {
    throw new FieldDataProblem(400, 'invalid_request', 'Send the file as multipart/form-data with a "file" part (or the CSV itself with Content-Type: text/csv).');
  }
  let form: FormData;
  try {
    form = await new Response(raw as unknown as BodyInit, { headers: { 'content-type': request.headers.get('content-type')! } }).formData();
  } catch {
    throw new FieldDataProblem(400, 'invalid_request', 'The form data could not be read; send it as multipart/form-data with a "file" part.');
  }
  const file = form.get('file');
  if (!file || typeof file === 'string') throw new FieldDataProblem(400, 'invalid_request', 'Attach the step-test file as the "file" part of the form.', 'file');
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.byteLength > limit) throw tooLarge(bytes.byteLength, limit, what);
  const fields: Record<string, string> = {};
  for (const [k, v] of form.entries()) if (typeof v === 'string') fields[k] = v;
  return { bytes, fileName: file.name ?? '', fields };
}

function tooLarge(bytes: number, limit: number, what: string): FieldDataProblem {
  const mb = (n: number) => String(Number((n / 1024 / 1024).toFixed(1)));
  return new FieldDataProblem(413, 'body_too_large', `The file is ${(bytes / 1024 / 1024).toFixed(1)} MB; ${what} may be at most ${mb(limit)} MB.`, 'file');
}

/** A JSON body (1 MB at most); an empty body is `{}` when `optional`. The services validate it. */
export async function readJsonBody(request: Request, optional = false): Promise<unknown> {
  const raw = await readLimited(request, 1024 * 1024, (seen) => tooLarge(seen, 1024 * 1024, 'a request body')).catch(() => {
    throw new FieldDataProblem(413, 'body_too_large', 'The request body is larger than 1 MB.');
  });
  const text = new TextDecoder().decode(raw);
  if (text.trim() === '') {
    if (optional) return {};
    throw new FieldDataProblem(400, 'invalid_json', 'The request body is empty; send a JSON object.');
  }
  try {
    return JSON.parse(text);
  } catch {
    throw new FieldDataProblem(400, 'invalid_json', 'The body is not valid JSON: send a JSON object with Content-Type: application/json.');
  }
}
