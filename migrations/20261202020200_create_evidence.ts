import type { Knex } from 'knex';

/**
 * Evidence behind a recipe: a step test, the model chosen from it and the tuning chosen from
 * that model (with its form and units). Recipes are files or database rows, so the slug is
 * checked by the application, not by a foreign key.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('evidence', (t) => {
    t.increments('id').primary();
    t.string('recipe_slug').notNullable();
    t.integer('step_test_id').notNullable().references('id').inTable('step_tests');
    t.integer('fit_id').notNullable().references('id').inTable('model_fits');
    t.text('tuning').notNullable();
    t.text('note').notNullable().defaultTo('');
    t.string('created_by').notNullable();
    t.string('created_at').notNullable();
    t.index(['recipe_slug']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('evidence');
}
