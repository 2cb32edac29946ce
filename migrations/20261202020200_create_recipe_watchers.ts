import type { Knex } from 'knex';

/** Who is e-mailed about a recipe's new published revisions, retirement and field notes. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipe_watchers', (t) => {
    t.string('recipe_slug').notNullable();
    t.string('user_id').notNullable();
    t.string('user_email').notNullable();
    t.string('created_at').notNullable();
    t.primary(['recipe_slug', 'user_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_watchers');
}
