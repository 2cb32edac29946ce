import type { Knex } from 'knex';

/**
 * Accounts for better-auth (email and password, its admin plugin, database rate limiting).
 * Columns mirror `getAuthTables()` from `better-auth/db` in snake_case, as the Knex adapter in
 * src/lib/auth/knex-adapter.ts names them. Dates are ISO text, booleans 0/1.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.string('id').primary();
    t.string('name').notNullable();
    t.string('email').notNullable().unique();
    t.integer('email_verified').notNullable().defaultTo(0);
    t.string('image');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.string('role').notNullable().defaultTo('reader');
    t.integer('banned').notNullable().defaultTo(0);
    t.string('ban_reason');
    t.string('ban_expires');
  });
  await knex.schema.createTable('sessions', (t) => {
    t.string('id').primary();
    t.string('expires_at').notNullable();
    t.string('token').notNullable().unique();
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.string('ip_address');
    t.string('user_agent');
    t.string('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE').index();
    t.string('impersonated_by');
  });
  await knex.schema.createTable('accounts', (t) => {
    t.string('id').primary();
    t.string('account_id').notNullable();
    t.string('provider_id').notNullable();
    t.string('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE').index();
    t.text('access_token');
    t.text('refresh_token');
    t.text('id_token');
    t.string('access_token_expires_at');
    t.string('refresh_token_expires_at');
    t.string('scope');
    t.string('password');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
  });
  await knex.schema.createTable('verifications', (t) => {
    t.string('id').primary();
    t.string('identifier').notNullable().index();
    t.text('value').notNullable();
    t.string('expires_at').notNullable();
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
  });
  await knex.schema.createTable('rate_limits', (t) => {
    t.string('id').primary();
    t.string('key').notNullable().unique();
    t.integer('count').notNullable();
    t.bigInteger('last_request').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['rate_limits', 'verifications', 'accounts', 'sessions', 'users']) await knex.schema.dropTable(table);
}
