import type { Knex } from 'knex';

/** The plant's process areas; recipes and registered loops refer to them by code. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('plant_areas', (t) => {
    t.string('code').primary();
    t.string('name').notNullable();
    t.text('description').notNullable().defaultTo('');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('plant_areas');
}
