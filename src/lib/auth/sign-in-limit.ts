import { z } from 'zod';

/** How many sign-in attempts one client address may make per window. */
export interface SignInLimit {
  /** Attempts allowed per window (successful ones count too). */
  max: number;
  /** Window length, s. */
  windowSeconds: number;
}

const limitEnv = z.object({
  LOOPWRIGHT_SIGN_IN_MAX: z.coerce.number().int().min(1).max(1000).default(8),
  LOOPWRIGHT_SIGN_IN_WINDOW: z.coerce.number().int().min(1).max(86_400).default(300),
});

/**
 * Defaults: 8 attempts per 5 minutes per client address, enough for a person who mistypes,
 * far too few to guess a password. LOOPWRIGHT_SIGN_IN_MAX / _WINDOW override them.
 */
export function signInLimit(env: NodeJS.ProcessEnv = process.env): SignInLimit {
  const parsed = limitEnv.safeParse({ LOOPWRIGHT_SIGN_IN_MAX: env.LOOPWRIGHT_SIGN_IN_MAX || undefined, LOOPWRIGHT_SIGN_IN_WINDOW: env.LOOPWRIGHT_SIGN_IN_WINDOW || undefined });
  const data = parsed.success ? parsed.data : limitEnv.parse({});
  return { max: data.LOOPWRIGHT_SIGN_IN_MAX, windowSeconds: data.LOOPWRIGHT_SIGN_IN_WINDOW };
}
