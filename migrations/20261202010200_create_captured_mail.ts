import type { Knex } from 'knex';

/** Messages caught by the local fake SMTP server in demo and test mode (admins read them at /admin/mail). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('captured_mail', (t) => {
    t.increments('id');
    t.string('from_address').notNullable();
    t.text('to_addresses').notNullable();
    t.string('subject').notNullable();
    t.text('body').notNullable();
    t.text('raw').notNullable();
    t.string('received_at').notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('captured_mail');
}
