import type { Knex } from 'knex';
import { verifyPassword } from 'better-auth/crypto';
import { mailSettings } from '../mail/settings';
import { DEMO_USERS } from './demo-users';
import { appMode, authSettings } from './settings';

/** Demo accounts whose published demo password still signs in. */
export async function workingDemoPasswords(knex: Knex): Promise<string[]> {
  const rows = await knex('users as u')
    .join('accounts as a', 'a.user_id', 'u.id')
    .where('a.provider_id', 'credential')
    .where('u.banned', 0)
    .whereIn('u.email', DEMO_USERS.map((d) => d.email))
    .select('u.email', 'a.password');
  const working: string[] = [];
  for (const row of rows) {
    const demo = DEMO_USERS.find((d) => d.email === row.email);
    if (demo && row.password && (await verifyPassword({ hash: row.password, password: demo.password }))) working.push(row.email);
  }
  return working;
}

/**
 * Why this installation may not serve in production: missing secrets or mail settings, or
 * demo accounts that still open with their published passwords. Empty outside production.
 */
export async function productionProblems(knex: Knex, env: NodeJS.ProcessEnv = process.env): Promise<string[]> {
  if (appMode(env) !== 'production') return [];
  const problems: string[] = [];
  for (const check of [() => authSettings(env), () => mailSettings(env)]) {
    try {
      check();
    } catch (err) {
      problems.push(err instanceof Error ? err.message : String(err));
    }
  }
  const demo = await workingDemoPasswords(knex);
  if (demo.length) {
    problems.push(
      `Demo accounts still open with their published passwords (${demo.join(', ')}): deactivate them, change their passwords or delete them before running in production.`,
    );
  }
  return problems;
}
