import type { Knex } from 'knex';

/** One rating (1–5 stars) and optional field note per person per recipe, file or authored (by slug). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipe_ratings', (t) => {
    t.string('recipe_slug').notNullable();
    t.string('user_id').notNullable();
    t.string('user_email').notNullable();
    t.string('user_name').notNullable();
    t.integer('stars').notNullable();
    t.text('note');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.primary(['recipe_slug', 'user_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_ratings');
}
