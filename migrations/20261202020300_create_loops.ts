import type { Knex } from 'knex';

/** The register of the plant's control loops, by ISA-5.1 tag, with the tuning left in them. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('loops', (t) => {
    t.increments('id').primary();
    t.string('tag').notNullable().unique();
    t.string('area').notNullable().references('code').inTable('plant_areas');
    t.text('description').notNullable().defaultTo('');
    t.string('recipe_slug').nullable();
    t.text('tuning').nullable();
    t.string('commissioned_by').nullable();
    t.string('commissioned_at').nullable();
    t.string('owner_email').notNullable();
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.index(['recipe_slug']);
    t.index(['area']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('loops');
}
