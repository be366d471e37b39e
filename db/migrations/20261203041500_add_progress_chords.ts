import type { Knex } from 'knex'

// Chord Tones answers per chord type and degree (so "which chord tones do I miss" reads a few rows,
// not every attempt), filled by the statistics drain with the other rollups (live SQL:
// db/sql/progress_chords_rollup.sql).

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('progress_chords', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('instrument_key').notNullable()
    t.text('chord_type').notNullable()
    t.text('degree').notNullable()
    t.integer('attempts').notNullable()
    t.integer('correct').notNullable()
    t.timestamp('last_at', { useTz: true }).notNullable()
    /** The latest 50 right answers' response times (ms), oldest first. */
    t.specificType('recent_ms', 'integer[]').notNullable()
    t.primary(['user_id', 'instrument_key', 'chord_type', 'degree'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists attempts_chords_rollup on attempts')
  await knex.raw('drop function if exists progress_chords_rollup(uuid[])')
  await knex.schema.dropTableIfExists('progress_chords')
}
