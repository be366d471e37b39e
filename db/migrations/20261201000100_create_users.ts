import type { Knex } from 'knex'

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('email').notNullable().unique()
    t.text('name').notNullable()
    t.text('role').notNullable().checkIn(['student', 'teacher', 'admin'])
    t.text('password_hash').notNullable()
    t.timestamp('password_changed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamps(true, true)
  })
  await knex.schema.createTable('password_resets', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.text('token_hash').notNullable().unique()
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('used_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('password_resets')
  await knex.schema.dropTable('users')
}
