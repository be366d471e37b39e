import type { Knex } from 'knex'

// Server-side sessions (revocable), a disabled state for accounts, and rate-limit counters shared
// by every app process.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('expires_at', { useTz: true }).notNullable()
  })
  await knex.schema.alterTable('users', (t) => {
    t.timestamp('disabled_at', { useTz: true })
  })
  await knex.schema.createTable('rate_limits', (t) => {
    t.text('key').primary()
    t.integer('hits').notNullable()
    t.timestamp('window_ends_at', { useTz: true }).notNullable().index()
    t.timestamp('last_hit_at', { useTz: true }).notNullable()
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rate_limits')
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('disabled_at')
  })
  await knex.schema.dropTable('sessions')
}
