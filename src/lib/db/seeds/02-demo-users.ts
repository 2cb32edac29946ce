import type { Knex } from 'knex';
import { hashPassword } from 'better-auth/crypto';
import { DEMO_USERS } from '../../auth/demo-users';

/**
 * One account per role (src/lib/auth/demo-users.ts), passwords hashed with better-auth's own
 * hasher so the sign-in form accepts them. Existing accounts are left as they are.
 */
export async function seed(knex: Knex): Promise<void> {
  const now = new Date().toISOString();
  for (const u of DEMO_USERS) {
    const exists = await knex('users').where({ email: u.email }).first();
    if (exists) continue;
    const password = await hashPassword(u.password);
    await knex.transaction(async (trx) => {
      await trx('users').insert({ id: u.id, name: u.name, email: u.email, email_verified: 1, role: u.role, banned: 0, created_at: now, updated_at: now });
      await trx('accounts').insert({ id: `${u.id}-credential`, account_id: u.id, provider_id: 'credential', user_id: u.id, password, created_at: now, updated_at: now });
    });
  }
}
