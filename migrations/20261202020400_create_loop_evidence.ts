import type { Knex } from 'knex';

/** Which evidence backs which registered loop (many to many). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('loop_evidence', (t) => {
    t.integer('loop_id').notNullable().references('id').inTable('loops').onDelete('CASCADE');
    t.integer('evidence_id').notNullable().references('id').inTable('evidence').onDelete('CASCADE');
    t.primary(['loop_id', 'evidence_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('loop_evidence');
}
