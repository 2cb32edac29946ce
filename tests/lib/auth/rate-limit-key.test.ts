import { describe, expect, it } from 'vitest';
import { accountAddress, rateLimitAddress } from '../../../src/lib/auth/rate-limit-key';

const body = (v: unknown) => new TextEncoder().encode(JSON.stringify(v)).buffer as ArrayBuffer;

describe('accountAddress', () => {
  it('gives one private IPv6 /64 per account, the same for any letter case', () => {
    const a = accountAddress('Priya.Halloran@brindlewood.example');
    expect(a).toMatch(/^fd[0-9a-f]{2}:[0-9a-f]{4}:[0-9a-f]{4}:[0-9a-f]{4}::1$/);
    expect(accountAddress(' priya.halloran@brindlewood.example ')).toBe(a);
    const prefix = (s: string) => s.split(':').slice(0, 4).join(':');
    expect(prefix(accountAddress('marek.lindqvist@brindlewood.example'))).not.toBe(prefix(a));
  });
});

describe('rateLimitAddress', () => {
  it('counts a sign-in against the account named in the body', () => {
    expect(rateLimitAddress('/api/auth/sign-in/email', body({ email: 'odile.brennan@brindlewood.example' }), '10.0.0.5')).toBe(accountAddress('odile.brennan@brindlewood.example'));
  });

  it('falls back to the client address elsewhere or when the body names no account', () => {
    expect(rateLimitAddress('/api/auth/get-session', undefined, '::ffff:10.0.0.5')).toBe('10.0.0.5');
    expect(rateLimitAddress('/api/auth/sign-in/email', body({}), '10.0.0.5')).toBe('10.0.0.5');
    expect(rateLimitAddress('/api/auth/sign-in/email', new TextEncoder().encode('{oops').buffer as ArrayBuffer, '10.0.0.5')).toBe('10.0.0.5');
  });
});
