import { describe, expect, it } from 'vitest';
import { authSettings, ConfigurationError, DEMO_SECRET } from '../../../src/lib/auth/settings';
import { mailSettings } from '../../../src/lib/mail/settings';
import { signInLimit } from '../../../src/lib/auth/sign-in-limit';

const SECRET = 'x'.repeat(40);

describe('authSettings', () => {
  it('in demo mode uses the fixed secret and the listening address, trusting localhost and 127.0.0.1', () => {
    const s = authSettings({ HOST: '127.0.0.1', PORT: '43117' });
    expect(s).toMatchObject({ mode: 'demo', secret: DEMO_SECRET, baseURL: 'http://127.0.0.1:43117' });
    expect(s.trustedOrigins).toEqual(expect.arrayContaining(['http://127.0.0.1:43117', 'http://localhost:43117']));
  });

  it('defaults to localhost:4321 like the server', () => {
    expect(authSettings({}).baseURL).toBe('http://localhost:4321');
  });

  it('in production refuses to run without BETTER_AUTH_SECRET, naming it', () => {
    expect(() => authSettings({ LOOPWRIGHT_MODE: 'production', BETTER_AUTH_URL: 'https://loopwright.example.com' })).toThrow(/BETTER_AUTH_SECRET/);
  });

  it('in production refuses a short secret and a missing or malformed URL', () => {
    expect(() => authSettings({ LOOPWRIGHT_MODE: 'production', BETTER_AUTH_SECRET: 'short', BETTER_AUTH_URL: 'https://a.example' })).toThrow(ConfigurationError);
    expect(() => authSettings({ LOOPWRIGHT_MODE: 'production', BETTER_AUTH_SECRET: SECRET })).toThrow(/BETTER_AUTH_URL/);
    expect(() => authSettings({ LOOPWRIGHT_MODE: 'production', BETTER_AUTH_SECRET: SECRET, BETTER_AUTH_URL: 'loopwright' })).toThrow(/BETTER_AUTH_URL/);
  });

  it('in production trusts only the configured origin', () => {
    const s = authSettings({ LOOPWRIGHT_MODE: 'production', BETTER_AUTH_SECRET: SECRET, BETTER_AUTH_URL: 'https://loopwright.example.com/' });
    expect(s).toMatchObject({ mode: 'production', secret: SECRET, baseURL: 'https://loopwright.example.com', trustedOrigins: ['https://loopwright.example.com'] });
  });
});

describe('mailSettings', () => {
  it('uses the built-in fake server outside production when SMTP_HOST is unset', () => {
    expect(mailSettings({}).kind).toBe('fake');
  });

  it('reads the SMTP settings, with 587 as the default port', () => {
    expect(mailSettings({ SMTP_HOST: 'mail.plant.example', MAIL_FROM: 'Loopwright <lw@plant.example>' })).toEqual({
      kind: 'smtp', host: 'mail.plant.example', port: 587, user: null, pass: null, from: 'Loopwright <lw@plant.example>',
    });
  });

  it('in production requires a host and a sender, saying which is missing', () => {
    expect(() => mailSettings({ LOOPWRIGHT_MODE: 'production' })).toThrow(/SMTP_HOST/);
    expect(() => mailSettings({ LOOPWRIGHT_MODE: 'production', SMTP_HOST: 'mail.plant.example' })).toThrow(/MAIL_FROM/);
    expect(() => mailSettings({ LOOPWRIGHT_MODE: 'production', SMTP_HOST: 'mail.plant.example', SMTP_PORT: 'smtp', MAIL_FROM: 'a@b.example' })).toThrow(/SMTP_PORT/);
  });
});

describe('signInLimit', () => {
  it('defaults to 8 attempts per 300 s and takes overrides', () => {
    expect(signInLimit({})).toEqual({ max: 8, windowSeconds: 300 });
    expect(signInLimit({ LOOPWRIGHT_SIGN_IN_MAX: '3', LOOPWRIGHT_SIGN_IN_WINDOW: '60' })).toEqual({ max: 3, windowSeconds: 60 });
  });
});
