import { betterAuth } from 'better-auth';
import { admin } from 'better-auth/plugins/admin';
import type { Knex } from 'knex';
import { db } from '../db';
import { sendMail } from '../mail/mailer';
import { passwordResetMail } from '../mail/templates/password-reset';
import { accessControl, accessRoles } from './access';
import { markInvitationAccepted } from './invitations';
import { knexAdapter } from './knex-adapter';
import { authSettings } from './settings';
import { signInLimit } from './sign-in-limit';

/** Header our auth route sets from the socket address; better-auth keys rate limits on it. */
export const CLIENT_IP_HEADER = 'x-loopwright-client-ip';

/** How long a password-reset link works, s. */
export const RESET_LINK_SECONDS = 60 * 60;

/** Shortest password accepted, characters. */
export const MIN_PASSWORD_LENGTH = 10;

/** The better-auth instance for a database and environment (one per server process, see getAuth). */
export function createAuth(knex: Knex, env: NodeJS.ProcessEnv = process.env) {
  const settings = authSettings(env);
  const limit = signInLimit(env);
  return betterAuth({
    appName: 'Loopwright',
    baseURL: settings.baseURL,
    basePath: '/api/auth',
    secret: settings.secret,
    // Demo mode also trusts the origin the request was addressed to, so `astro dev --port N`
    // works; a cross-site form still fails because its Origin differs from the Host it posts to.
    trustedOrigins:
      settings.mode === 'production'
        ? settings.trustedOrigins
        : (request) => [...settings.trustedOrigins, request ? new URL(request.url).origin : null],
    database: knexAdapter(knex),
    emailAndPassword: {
      enabled: true,
      // People join by invitation only.
      disableSignUp: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      maxPasswordLength: 128,
      resetPasswordTokenExpiresIn: RESET_LINK_SECONDS,
      revokeSessionsOnPasswordReset: true,
      async sendResetPassword({ user, token }) {
        const url = `${settings.baseURL}/reset-password?token=${encodeURIComponent(token)}`;
        await sendMail(passwordResetMail({ to: user.email, name: user.name, url, validMinutes: RESET_LINK_SECONDS / 60 }));
      },
      // An invitation link is a reset token: choosing the password accepts the invitation.
      async onPasswordReset({ user }) {
        await markInvitationAccepted(knex, user.id);
      },
    },
    session: { expiresIn: 60 * 60 * 24 * 7, updateAge: 60 * 60 * 24 },
    rateLimit: {
      enabled: true,
      storage: 'database',
      window: 60,
      max: 120,
      customRules: {
        '/sign-in/email': { window: limit.windowSeconds, max: limit.max },
        '/request-password-reset': { window: 300, max: 5 },
        '/reset-password': { window: 300, max: 10 },
      },
    },
    advanced: {
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      useSecureCookies: settings.baseURL.startsWith('https://'),
    },
    telemetry: { enabled: false },
    plugins: [
      admin({
        ac: accessControl,
        roles: accessRoles,
        defaultRole: 'reader',
        adminRoles: ['admin'],
        bannedUserMessage: 'This account has been deactivated. Ask a Loopwright admin if you need it back.',
      }),
    ],
  });
}

export type Auth = ReturnType<typeof createAuth>;

let instance: Auth | undefined;

/** The server's better-auth instance, built on first use from the environment. */
export function getAuth(): Auth {
  instance ??= createAuth(db());
  return instance;
}
