import type { Knex } from 'knex';

/** The starting body of a new recipe, one per loop type; curators edit them. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipe_templates', (t) => {
    t.string('loop_type').primary();
    t.string('title').notNullable();
    t.text('body').notNullable();
    t.string('updated_at').notNullable();
    t.string('updated_by').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_templates');
}
