import type { Knex } from 'knex'

// E-mail invitations to join a studio: only the token's SHA-256 is stored; single-use and expiring.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('studio_invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE').index()
    t.text('email').notNullable()
    t.text('token_hash').notNullable().unique()
    t.uuid('invited_by').notNullable().references('users.id').onDelete('CASCADE')
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.integer('send_count').notNullable().defaultTo(1)
    t.timestamp('accepted_at', { useTz: true })
    t.uuid('accepted_by').references('users.id').onDelete('SET NULL')
    t.timestamp('revoked_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  // At most one open invitation per address and studio.
  await knex.raw(
    'create unique index studio_invitations_open on studio_invitations (studio_id, email) where accepted_at is null and revoked_at is null',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('studio_invitations')
}
