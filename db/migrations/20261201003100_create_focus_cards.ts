import type { Knex } from 'knex'

// Spaced-review state (an FSRS card) per player, instrument and fretboard place, updated as attempts
// arrive; recent_misses keeps the last few miss times so the app can say "missed twice this week".
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('focus_cards', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('instrument_key').notNullable()
    t.smallint('string').notNullable()
    t.smallint('fret').notNullable()
    t.timestamp('due', { useTz: true }).notNullable()
    t.double('stability').notNullable()
    t.double('difficulty').notNullable()
    t.integer('elapsed_days').notNullable().defaultTo(0)
    t.integer('scheduled_days').notNullable()
    t.integer('learning_steps').notNullable()
    t.integer('reps').notNullable()
    t.integer('lapses').notNullable()
    t.smallint('state').notNullable()
    t.timestamp('last_review', { useTz: true })
    t.specificType('recent_misses', 'timestamptz[]').notNullable().defaultTo('{}')
    t.primary(['user_id', 'instrument_key', 'string', 'fret'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('focus_cards')
}
