import type { Knex } from 'knex';

/** Every editorial state change: who, when, which recipe, from and to which status, and why. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_log', (t) => {
    t.increments('id').primary();
    t.string('at').notNullable().index();
    t.string('actor_id').notNullable();
    t.string('actor_email').notNullable();
    t.string('action').notNullable();
    t.string('recipe_slug');
    t.string('from_status');
    t.string('to_status');
    t.integer('revision');
    t.text('comment');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
}
