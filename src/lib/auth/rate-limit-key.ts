import { createHash } from 'node:crypto';

/** Auth paths whose rate limit counts per account (the e-mail in the body) rather than per client address. */
const PER_ACCOUNT_PATHS = new Set(['/api/auth/sign-in/email', '/api/auth/request-password-reset']);

/**
 * A stand-in address for an account: the first 64 bits of a private (fd00::/8) IPv6 address
 * taken from the SHA-256 of the lower-cased e-mail. better-auth keys its limits on an address
 * and groups IPv6 by /64, so each account gets its own bucket.
 */
export function accountAddress(email: string): string {
  const h = createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
  return `fd${h.slice(0, 2)}:${h.slice(2, 6)}:${h.slice(6, 10)}:${h.slice(10, 14)}::1`;
}

/**
 * The address better-auth should count a request against. Sign-in and reset requests count
 * against the account they name, so guessing one person's password is limited however many
 * addresses (or forged X-Forwarded-For headers) the guesser uses; other requests count against
 * the client address Astro reports.
 */
export function rateLimitAddress(pathname: string, body: ArrayBuffer | undefined, clientAddress: string): string {
  if (PER_ACCOUNT_PATHS.has(pathname) && body) {
    try {
      const email = JSON.parse(new TextDecoder().decode(body))?.email;
      if (typeof email === 'string' && email.trim()) return accountAddress(email);
    } catch {
      // not JSON: better-auth answers 400 itself
    }
  }
  return clientAddress.replace(/^::ffff:/, '');
}
