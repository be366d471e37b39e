import type { Knex } from 'knex'

// Range Runs fingerings per session (so "which fingering did I practise least" reads a few rows, not
// every runs attempt), filled by its own statement trigger (live SQL: db/sql/progress_runs_rollup.sql,
// which also counts the runs stored before it); and an index in the order the roster ranks a
// student's weakest places, so each student's three weakest are read straight from it.

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('progress_runs', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.text('tonic').notNullable()
    t.text('scale').notNullable()
    t.integer('low_fret').notNullable()
    t.integer('high_fret').notNullable()
    t.text('pattern').notNullable()
    t.uuid('instrument_key').notNullable()
    t.uuid('session_id').notNullable()
    t.integer('attempts').notNullable()
    t.timestamp('last_at', { useTz: true }).notNullable()
    t.primary([
      'user_id',
      'tonic',
      'scale',
      'low_fret',
      'high_fret',
      'pattern',
      'instrument_key',
      'session_id',
    ])
  })
  await knex.raw('drop index if exists attempts_runs_fingering')
  await knex.raw(`
    create index progress_items_weakest on progress_items
    (user_id, recent_accuracy, recent_median_ms desc nulls last, string, fret)
    where drill = '*' and string >= 0
      and instrument_key <> '00000000-0000-0000-0000-000000000000'::uuid`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index if exists progress_items_weakest')
  await knex.raw(`
    create index attempts_runs_fingering on attempts
    (user_id, (detail->>'tonic'), (detail->>'scale'), (detail->>'lowFret'), (detail->>'highFret'))
    where drill = 'runs'`)
  await knex.raw('drop trigger if exists attempts_runs_rollup on attempts')
  await knex.raw('drop function if exists progress_runs_rollup()')
  await knex.schema.dropTableIfExists('progress_runs')
}
