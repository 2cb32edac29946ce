/**
 * A calculator's state in the page address, so a link reproduces exactly what a colleague saw.
 * Each island instance owns one query parameter named by its `id` prop (`?lr-tic210=...`);
 * the value is the state as JSON in URL-safe base64 (numbers keep every digit, any shape of
 * state fits, and the address stays one opaque token per island). Pure: no DOM.
 */
import type { $ZodType, output } from 'zod/v4/core';

/** Any zod schema, from the full build or from zod/mini. */
export type StateSchema = $ZodType & { safeParse(data: unknown): { success: boolean; data?: unknown } };

/** Query parameter names are the island id, restricted so they never need escaping. */
const ID = /^[a-z0-9][a-z0-9-]{0,39}$/i;

/** Checks an island id; returns the parameter name, or throws with what a valid id looks like. */
export function stateParam(id: string): string {
  if (!ID.test(id)) {
    throw new Error(`Calculator id "${id}" must be 1–40 letters, digits or dashes, starting with a letter or digit.`);
  }
  return id;
}

function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = '';
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

function fromBase64Url(token: string): string | null {
  if (!/^[A-Za-z0-9_-]*$/.test(token)) return null;
  try {
    const binary = atob(token.replace(/-/g, '+').replace(/_/g, '/'));
    const bytes = Uint8Array.from(binary, (c) => c.charCodeAt(0));
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return null;
  }
}

/** The state as one URL-safe token. */
export function encodeState(state: unknown): string {
  return toBase64Url(JSON.stringify(state));
}

/** The state a token carries, checked by the island's schema; null when absent, garbled or invalid. */
export function decodeState<S extends StateSchema>(token: string | null | undefined, schema: S): output<S> | null {
  if (!token) return null;
  const json = fromBase64Url(token);
  if (json === null) return null;
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    return null;
  }
  const parsed = schema.safeParse(raw);
  return parsed.success ? (parsed.data as output<S>) : null;
}

/** The island's state from a query string (`location.search`); null when the link carries none. */
export function readState<S extends StateSchema>(search: string, id: string, schema: S): output<S> | null {
  return decodeState(new URLSearchParams(search).get(stateParam(id)), schema);
}

/**
 * The address with this island's state written in (or removed, for null), every other
 * parameter and the fragment kept as they were. `href` is a full or relative URL.
 */
export function writeState(href: string, id: string, state: unknown | null): string {
  const url = new URL(href, 'http://placeholder.invalid');
  if (state === null) url.searchParams.delete(stateParam(id));
  else url.searchParams.set(stateParam(id), encodeState(state));
  const relative = `${url.pathname}${url.search}${url.hash}`;
  return /^[a-z]+:\/\//i.test(href) ? `${url.origin}${relative}` : relative;
}
