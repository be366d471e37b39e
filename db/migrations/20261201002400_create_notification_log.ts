import type { Knex } from 'knex'

// Scheduled mail already sent (weekly digests, due-soon reminders), so a restart never resends.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('notification_log', (t) => {
    t.bigIncrements('id').primary()
    t.text('kind').notNullable()
    t.text('key').notNullable()
    t.text('recipient').notNullable()
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['kind', 'key'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('notification_log')
}
