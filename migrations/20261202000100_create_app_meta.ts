import type { Knex } from 'knex';

/** Small key/value facts about this installation, e.g. when the demo data was loaded. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('app_meta', (t) => {
    t.string('key').primary();
    t.text('value').notNullable();
    t.string('updated_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('app_meta');
}
