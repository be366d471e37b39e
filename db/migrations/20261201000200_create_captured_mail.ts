import type { Knex } from 'knex'

// Mail received by the local SMTP sink; the admin mail log reads it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('captured_mail', (t) => {
    t.bigIncrements('id').primary()
    t.text('message_id')
    t.text('sender').notNullable()
    t.specificType('recipients', 'text[]').notNullable()
    t.text('subject').notNullable().defaultTo('')
    t.text('text_body').notNullable().defaultTo('')
    t.text('html_body')
    t.integer('size_bytes').notNullable()
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now()).index()
  })
  await knex.raw(
    'create index captured_mail_recipients_idx on captured_mail using gin (recipients)',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('captured_mail')
}
