import type { Knex } from 'knex'

// Shared exercises: a random token opens one generated exercise read-only until its owner revokes it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shared_exercises', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('token').notNullable().unique()
    t.uuid('owner_id').notNullable().references('users.id').onDelete('CASCADE')
    t.text('drill').notNullable()
    t.jsonb('settings').notNullable()
    t.text('fingering')
    t.text('title').notNullable()
    t.text('instrument_name').notNullable()
    t.specificType('tuning', 'smallint[]').notNullable()
    t.smallint('frets').notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('revoked_at', { useTz: true })
    t.index(['owner_id', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('shared_exercises')
}
