import type { Knex } from 'knex'

// Statistics rollup tables, filled by a statement-level trigger on attempts, so progress pages read
// a few hundred small rows instead of a student's whole history (see DEVELOPERS.md, "Statistics").
// The trigger and its functions are live SQL (db/sql/progress_rollup.sql, installed after the
// migrations, which also rolls up the attempts stored before it); this migration first created
// them itself and kept them in step with later ones. A frozen snapshot: it imports nothing.

async function createTables(knex: Knex) {
  await knex.schema.createTable('user_time_zones', (t) => {
    t.uuid('user_id').primary().references('users.id').onDelete('CASCADE')
    t.text('time_zone').notNullable()
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('progress_sessions', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('session_id').notNullable()
    t.uuid('instrument_key').notNullable()
    t.text('drill').notNullable()
    t.date('day').notNullable()
    t.timestamp('first_at', { useTz: true }).notNullable()
    t.timestamp('last_at', { useTz: true }).notNullable()
    t.integer('attempts').notNullable()
    t.bigInteger('active_ms').notNullable()
    t.primary(['user_id', 'session_id'])
  })
  await knex.schema.createTable('progress_days', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('instrument_key').notNullable()
    t.text('drill').notNullable()
    t.date('day').notNullable()
    t.integer('attempts').notNullable()
    t.integer('correct').notNullable()
    t.bigInteger('active_ms').notNullable()
    t.specificType('recall_ms', 'integer[]').notNullable()
    t.double('median_ms')
    t.double('p90_ms')
    t.timestamp('first_at', { useTz: true }).notNullable()
    t.timestamp('last_at', { useTz: true }).notNullable()
    t.primary(['user_id', 'instrument_key', 'drill', 'day'])
  })
  await knex.schema.createTable('progress_items', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('instrument_key').notNullable()
    t.text('drill').notNullable()
    t.smallint('string').notNullable()
    t.smallint('fret').notNullable()
    t.smallint('pitch').notNullable()
    t.integer('attempts').notNullable()
    t.integer('correct').notNullable()
    t.timestamp('last_at', { useTz: true }).notNullable()
    t.specificType('recent_correct', 'boolean[]').notNullable()
    t.specificType('recent_ms', 'integer[]').notNullable()
    t.double('recent_accuracy')
    t.double('recent_median_ms')
    t.primary(['user_id', 'instrument_key', 'drill', 'string', 'fret', 'pitch'])
  })
}

export async function up(knex: Knex): Promise<void> {
  await createTables(knex)
  // Range Runs asks how often each fingering of a key and region was practised (until 003200).
  await knex.raw(`
    create index attempts_runs_fingering on attempts
    (user_id, (detail->>'tonic'), (detail->>'scale'), (detail->>'lowFret'), (detail->>'highFret'))
    where drill = 'runs'`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index if exists attempts_runs_fingering')
  await knex.raw('drop trigger if exists attempts_progress_rollup on attempts')
  await knex.raw('drop function if exists progress_rollup()')
  await knex.raw('drop function if exists progress_tail(anyarray, integer)')
  for (const table of ['progress_items', 'progress_days', 'progress_sessions', 'user_time_zones']) {
    await knex.schema.dropTableIfExists(table)
  }
}
