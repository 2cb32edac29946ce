import type { Knex } from 'knex';

/** Who invited whom and when the invitation was taken up (the link itself is a better-auth reset token). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invitations', (t) => {
    t.increments('id');
    t.string('user_id').notNullable().unique().references('id').inTable('users').onDelete('CASCADE');
    t.string('invited_by').references('id').inTable('users').onDelete('SET NULL');
    t.string('invited_at').notNullable();
    t.string('expires_at').notNullable();
    t.string('accepted_at');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('invitations');
}
