import type { Knex } from 'knex';

/**
 * Uploaded step tests. The file itself lives under the data folder as `stored_name`, a name the
 * server generates; the user's file name is kept only as a label.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('step_tests', (t) => {
    t.increments('id').primary();
    t.string('tag').notNullable();
    t.string('area').nullable().references('code').inTable('plant_areas');
    t.text('note').notNullable().defaultTo('');
    t.string('uploaded_by').notNullable();
    t.string('uploaded_at').notNullable();
    t.string('original_name').notNullable().defaultTo('');
    t.string('stored_name').notNullable().unique();
    t.integer('bytes').notNullable();
    t.string('sha256').notNullable();
    t.text('mapping').notNullable();
    t.text('dialect').notNullable();
    t.integer('row_count').notNullable();
    t.index(['tag']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('step_tests');
}
