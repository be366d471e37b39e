import type { Knex } from 'knex'

// The teacher's personal note in an invitation e-mail (sent again with every resend).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('studio_invitations', (t) => {
    t.text('message').nullable()
  })
  await knex.raw(
    'alter table studio_invitations add constraint studio_invitations_message_length check (char_length(message) <= 1000)',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('studio_invitations', (t) => {
    t.dropColumn('message')
  })
}
