import { afterEach, describe, expect, it, vi } from 'vitest';

// Password hashing (scrypt) is deliberately slow; on a busy machine seeding four accounts takes seconds.
vi.setConfig({ testTimeout: 60_000 });
import { hashPassword } from 'better-auth/crypto';
import { tempDatabase } from '../../support/temp-db';
import { seedDemo } from '../../../src/lib/db/seed';
import { productionProblems, workingDemoPasswords } from '../../../src/lib/auth/production';
import { DEMO_USERS } from '../../../src/lib/auth/demo-users';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await cleanup?.();
  cleanup = undefined;
});

const READY = {
  LOOPWRIGHT_MODE: 'production',
  BETTER_AUTH_SECRET: 'p'.repeat(48),
  BETTER_AUTH_URL: 'https://loopwright.brindlewood.example',
  SMTP_HOST: 'mail.brindlewood.example',
  MAIL_FROM: 'Loopwright <loopwright@brindlewood.example>',
};

describe('workingDemoPasswords', () => {
  it('finds every seeded demo account, and none once passwords are changed or accounts deactivated', async () => {
    const t = await tempDatabase();
    cleanup = t.cleanup;
    await seedDemo(t.knex);
    expect((await workingDemoPasswords(t.knex)).sort()).toEqual(DEMO_USERS.map((u) => u.email).sort());

    await t.knex('accounts').where({ user_id: 'demo-reader' }).update({ password: await hashPassword('a-new-private-password') });
    await t.knex('users').where({ id: 'demo-admin' }).update({ banned: 1 });
    const left = await workingDemoPasswords(t.knex);
    expect(left).not.toContain('priya.halloran@brindlewood.example');
    expect(left).not.toContain('tobiah.quarrie@brindlewood.example');
    expect(left).toHaveLength(2);
  });
});

describe('productionProblems', () => {
  it('is empty in demo mode even with demo accounts', async () => {
    const t = await tempDatabase();
    cleanup = t.cleanup;
    await seedDemo(t.knex);
    expect(await productionProblems(t.knex, {})).toEqual([]);
  });

  it('names missing secrets and working demo passwords in production', async () => {
    const t = await tempDatabase();
    cleanup = t.cleanup;
    await seedDemo(t.knex);
    const problems = await productionProblems(t.knex, { LOOPWRIGHT_MODE: 'production' });
    expect(problems.join(' ')).toMatch(/BETTER_AUTH_SECRET/);
    expect(problems.join(' ')).toMatch(/SMTP_HOST/);
    expect(problems.join(' ')).toMatch(/Demo accounts still open/);
  });

  it('is empty in production with settings and no demo accounts', async () => {
    const t = await tempDatabase();
    cleanup = t.cleanup;
    expect(await productionProblems(t.knex, READY)).toEqual([]);
  });
});
