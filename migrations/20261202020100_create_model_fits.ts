import type { Knex } from 'knex';

/** Models fitted to a step test (FOPDT, SOPDT, IPDT), with their fit quality; one may be chosen. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('model_fits', (t) => {
    t.increments('id').primary();
    t.integer('step_test_id').notNullable().references('id').inTable('step_tests').onDelete('CASCADE');
    t.string('type').notNullable();
    t.text('params').notNullable();
    t.float('rmse').notNullable();
    t.float('r2').notNullable();
    t.boolean('chosen').notNullable().defaultTo(false);
    t.string('fitted_by').notNullable();
    t.string('fitted_at').notNullable();
    t.index(['step_test_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('model_fits');
}
