import type { Knex } from 'knex'

// Open invitation links of a studio, for teachers who hand the link out in a chat: not bound to an
// address, a limited number of uses, an expiry; only the token's SHA-256 is stored.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('studio_invite_links', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE').index()
    t.text('token_hash').notNullable().unique()
    t.uuid('created_by').notNullable().references('users.id').onDelete('CASCADE')
    t.integer('max_uses').notNullable()
    t.integer('uses').notNullable().defaultTo(0)
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('revoked_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.raw(
    'alter table studio_invite_links add constraint studio_invite_links_uses check (max_uses between 1 and 500 and uses between 0 and max_uses)',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('studio_invite_links')
}
