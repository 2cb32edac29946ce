import type { Knex } from 'knex';

/**
 * Recipes written in the browser. `recipes` holds one row per recipe (its workflow state and
 * who owns it); `recipe_revisions` keeps every save, never updated, with the compiled HTML.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipes', (t) => {
    t.increments('id').primary();
    t.string('slug').notNullable().unique();
    t.string('status').notNullable().defaultTo('draft');
    t.string('owner_id').notNullable().index();
    t.string('owner_email').notNullable();
    t.string('owner_name').notNullable();
    t.integer('current_revision').notNullable();
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.string('submitted_at');
    t.string('published_at');
    t.string('reviewed_at');
    t.string('retired_at');
    t.text('retired_reason');
    t.string('superseded_by');
    t.text('review_comment');
  });
  await knex.schema.createTable('recipe_revisions', (t) => {
    t.increments('id').primary();
    t.integer('recipe_id').notNullable().references('id').inTable('recipes').onDelete('CASCADE');
    t.integer('revision').notNullable();
    t.string('author_id').notNullable();
    t.string('author_email').notNullable();
    t.string('created_at').notNullable();
    t.string('message').notNullable();
    t.text('frontmatter_json').notNullable();
    t.text('body').notNullable();
    t.text('html').notNullable();
    t.unique(['recipe_id', 'revision']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_revisions');
  await knex.schema.dropTable('recipes');
}
