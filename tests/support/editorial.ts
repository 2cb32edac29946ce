import { sessionHeaders, signInAs } from './session';
import type { Role } from '../../src/lib/auth/roles';

/** A signed-in caller of the recipe API (or anonymous, with no cookie). */
export interface Caller {
  role: Role | 'anonymous';
  call(method: string, path: string, body?: unknown): Promise<{ status: number; body: any }>;
}

/** Callers for anonymous and each demo role, signed in once. */
export async function callers(baseUrl: string): Promise<Record<Role | 'anonymous', Caller>> {
  const make = (role: Role | 'anonymous', cookie: string | null): Caller => ({
    role,
    async call(method, path, body) {
      const headers: Record<string, string> = cookie ? sessionHeaders(baseUrl, cookie) : { Origin: baseUrl, 'Content-Type': 'application/json' };
      const res = await fetch(`${baseUrl}${path}`, { method, headers, body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body) });
      const text = await res.text();
      let parsed: unknown = text;
      try {
        parsed = JSON.parse(text);
      } catch {
        // not JSON: keep the text for the failure message
      }
      return { status: res.status, body: parsed };
    },
  });
  const roles = ['reader', 'author', 'curator', 'admin'] as const;
  const cookies = await Promise.all(roles.map((r) => signInAs(baseUrl, r)));
  return {
    anonymous: make('anonymous', null),
    ...(Object.fromEntries(roles.map((r, i) => [r, make(r, cookies[i])])) as Record<Role, Caller>),
  };
}

/** A body that passes the authored-MDX checks, with one calculator. */
export const SAMPLE_BODY = [
  '## When to use it',
  '',
  'The CIP return temperature loop TIC-540 on the caustic wash.',
  '',
  '<LoopResponse model={{ type: "fopdt", k: 0.7, tau: 90, theta: 25 }} controller={{ form: "ideal", kc: 1.1, ti: 90 }} />',
  '',
].join('\n');

export function sampleRecipe(title: string) {
  return {
    title,
    summary: 'Holds the CIP return temperature on the caustic wash within two degrees.',
    loopType: 'temperature',
    area: 'cip',
    loopTags: ['TIC-540'],
    units: { pv: '°C', mv: '% valve' },
    model: { type: 'fopdt', k: 0.7, tau: 90, theta: 25 },
    controller: { form: 'ideal', kc: 1.1, ti: 90 },
    body: SAMPLE_BODY,
  };
}
