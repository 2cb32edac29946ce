import { z } from 'zod';
import { appMode, ConfigurationError } from '../auth/settings';

/** Sender used in demo mode when MAIL_FROM is unset. */
export const DEMO_FROM = 'Loopwright <loopwright@brindlewood.example>';

const smtpEnv = z.object({
  SMTP_HOST: z.string({ error: 'SMTP_HOST is not set: name the mail server Loopwright sends through.' }).trim().min(1, 'SMTP_HOST is empty.'),
  SMTP_PORT: z.coerce.number({ error: 'SMTP_PORT must be a port number.' }).int().min(1).max(65535).default(587),
  SMTP_USER: z.string().trim().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string({ error: 'MAIL_FROM is not set: give the sender, e.g. "Loopwright <loopwright@plant.example>".' }).trim().min(3),
});

/** Where mail goes: a real SMTP server, or the in-process fake one (demo and tests). */
export type MailSettings =
  | { kind: 'smtp'; host: string; port: number; user: string | null; pass: string | null; from: string }
  | { kind: 'fake'; from: string };

/**
 * Production reads SMTP_HOST, SMTP_PORT (default 587), SMTP_USER, SMTP_PASS and MAIL_FROM and
 * refuses to run without a host and sender. Elsewhere an unset SMTP_HOST means the fake server.
 */
export function mailSettings(env: NodeJS.ProcessEnv = process.env): MailSettings {
  const production = appMode(env) === 'production';
  if (!production && !env.SMTP_HOST?.trim()) return { kind: 'fake', from: env.MAIL_FROM?.trim() || DEMO_FROM };
  const parsed = smtpEnv.safeParse({ ...env, MAIL_FROM: env.MAIL_FROM ?? (production ? undefined : DEMO_FROM) });
  if (!parsed.success) throw new ConfigurationError(`Mail is not configured: ${parsed.error.issues.map((i) => i.message).join(' ')}`);
  const s = parsed.data;
  return { kind: 'smtp', host: s.SMTP_HOST, port: s.SMTP_PORT, user: s.SMTP_USER || null, pass: s.SMTP_PASS ?? null, from: s.MAIL_FROM };
}
