import type { Knex } from 'knex'

// Range Runs fingerings per session (so "which fingering did I practise least" reads a few rows, not
// every runs attempt), kept by its own statement trigger; and an index in the order the roster ranks
// a student's weakest places, so each student's three weakest are read straight from it.
const NONE = "'00000000-0000-0000-0000-000000000000'::uuid"

// A detail number as an int, or null when it is missing or not a number (never fails the insert).
const fret = (key: string) =>
  `case when jsonb_typeof(detail->'${key}') = 'number' and (detail->>'${key}')::numeric between 0 and 99
     then (detail->>'${key}')::numeric::int end`

const RUNS_FUNCTION = `
create function progress_runs_rollup() returns trigger language plpgsql as $fn$
begin
  insert into progress_runs as r
    (user_id, tonic, scale, low_fret, high_fret, pattern, instrument_key, session_id, attempts, last_at)
  select user_id, tonic, scale, low_fret, high_fret, pattern, ikey, session_id, count(*), max(created_at)
  from (
    select user_id, detail->>'tonic' as tonic, detail->>'scale' as scale, ${fret('lowFret')} as low_fret,
      ${fret('highFret')} as high_fret, detail->>'pattern' as pattern, coalesce(instrument_id, ${NONE}) as ikey,
      session_id, created_at
    from new_rows where drill = 'runs'
  ) as runs
  where tonic is not null and scale is not null and pattern is not null and low_fret is not null and high_fret is not null
  group by 1, 2, 3, 4, 5, 6, 7, 8 order by 1, 2, 3, 4, 5, 6, 7, 8
  on conflict (user_id, tonic, scale, low_fret, high_fret, pattern, instrument_key, session_id) do update set
    attempts = r.attempts + excluded.attempts, last_at = greatest(r.last_at, excluded.last_at);
  return null;
end
$fn$`

const TRIGGER = (table: string, name: string) => `
  create trigger ${name} after insert on ${table}
  referencing new table as new_rows for each statement execute function progress_runs_rollup()`

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
  await knex.raw(RUNS_FUNCTION)
  await knex.raw(TRIGGER('attempts', 'attempts_runs_rollup'))
  // Runs stored before this migration go through the same function once (see the rollups migration).
  await knex.raw('create temporary table attempts_backfill (like attempts)')
  await knex.raw(TRIGGER('attempts_backfill', 'attempts_backfill_runs'))
  await knex.raw("insert into attempts_backfill select * from attempts where drill = 'runs'")
  await knex.raw('drop table attempts_backfill')
  await knex.raw('drop index if exists attempts_runs_fingering')
  await knex.raw(`
    create index progress_items_weakest on progress_items
    (user_id, recent_accuracy, recent_median_ms desc nulls last, string, fret)
    where drill = '*' and string >= 0 and instrument_key <> ${NONE}`)
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
