import { z } from 'zod';

/** Secret used to sign sessions in demo mode only; production must set its own. */
export const DEMO_SECRET = 'loopwright-demo-mode-secret-never-use-in-production';

/** How this installation runs: `production` needs real secrets and SMTP, `demo` makes do. */
export function appMode(env: NodeJS.ProcessEnv = process.env): 'production' | 'demo' {
  return env.LOOPWRIGHT_MODE?.trim() === 'production' ? 'production' : 'demo';
}

const productionEnv = z.object({
  BETTER_AUTH_SECRET: z
    .string({ error: 'BETTER_AUTH_SECRET is not set: set it to a random string of at least 32 characters (e.g. `openssl rand -base64 32`).' })
    .min(32, 'BETTER_AUTH_SECRET is too short: use at least 32 random characters.'),
  BETTER_AUTH_URL: z.url({ error: 'BETTER_AUTH_URL must be the public address of Loopwright, e.g. https://loopwright.example.com.' }),
});

/** What better-auth needs to know about where it runs. */
export interface AuthSettings {
  mode: 'production' | 'demo';
  /** Session-signing secret. */
  secret: string;
  /** Public base URL, e.g. http://127.0.0.1:4404 (no trailing slash). */
  baseURL: string;
  /** Origins allowed to POST with cookies. */
  trustedOrigins: string[];
}

/** Raised when production settings are missing; the message says what to set. */
export class ConfigurationError extends Error {}

/**
 * Settings from the environment. Production requires BETTER_AUTH_SECRET and BETTER_AUTH_URL;
 * demo mode uses a fixed secret and the address the server listens on (HOST, PORT), trusting
 * both localhost and 127.0.0.1 so tests on random ports can POST.
 */
export function authSettings(env: NodeJS.ProcessEnv = process.env): AuthSettings {
  const mode = appMode(env);
  if (mode === 'production') {
    const parsed = productionEnv.safeParse(env);
    if (!parsed.success) throw new ConfigurationError(`Loopwright cannot start in production: ${parsed.error.issues.map((i) => i.message).join(' ')}`);
    const baseURL = parsed.data.BETTER_AUTH_URL.replace(/\/+$/, '');
    return { mode, secret: parsed.data.BETTER_AUTH_SECRET, baseURL, trustedOrigins: [new URL(baseURL).origin] };
  }
  const port = env.PORT?.trim() || '4321';
  const host = env.HOST?.trim() || 'localhost';
  const listening = host === '0.0.0.0' || host === '::' ? 'localhost' : host;
  const baseURL = (env.BETTER_AUTH_URL?.trim() || `http://${listening}:${port}`).replace(/\/+$/, '');
  const trustedOrigins = [...new Set([new URL(baseURL).origin, `http://localhost:${port}`, `http://127.0.0.1:${port}`])];
  return { mode, secret: env.BETTER_AUTH_SECRET?.trim() || DEMO_SECRET, baseURL, trustedOrigins };
}
