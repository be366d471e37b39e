import type { Knex } from 'knex'

// Statistics rollups kept current by a statement-level trigger on attempts, so progress pages read a
// few hundred small rows instead of a student's whole history (see DEVELOPERS.md, "Statistics").
// instrument_key: the instrument id, NONE for attempts without one, ALL for every instrument.
// drill: the drill id, or '*' for every drill.
// The constants and the first steps are exported for later migrations that replace the function.
export const NONE = "'00000000-0000-0000-0000-000000000000'::uuid"
export const ALL = "'ffffffff-ffff-ffff-ffff-ffffffffffff'::uuid"
export const RECENT = 50 // answers kept per place for "how you play now" (accuracy, median, p90)
const IDLE_CAP_MS = 120_000 // a pause longer than this inside a session is not practice time

// Each new attempt with its player's local day and the active time it adds to its session.
export const NEW_ATTEMPTS = `
  n as (
    select a.user_id, coalesce(a.instrument_id, ${NONE}) as ikey, a.drill, a.session_id,
      coalesce(a.string, -1)::smallint as string, coalesce(a.fret, -1)::smallint as fret,
      a.expected_pitch, a.correct, a.response_ms, a.created_at,
      (a.created_at at time zone coalesce(z.time_zone, 'UTC'))::date as day,
      lag(a.created_at) over (partition by a.user_id, a.session_id order by a.created_at, a.id) as prev_at
    from new_rows a left join user_time_zones z on z.user_id = a.user_id
  )`

// Each new attempt with the active time it adds (gaps capped), and the sessions' rows brought up to date.
export const ACTIVE_TIME_AND_SESSIONS = `
  t as (
    select n.*, least(${IDLE_CAP_MS}, case
        when coalesce(n.prev_at, s.last_at) is null or n.created_at <= coalesce(n.prev_at, s.last_at)
          then n.response_ms
        else (extract(epoch from n.created_at - coalesce(n.prev_at, s.last_at)) * 1000)::bigint
      end)::bigint as active_ms
    from n left join progress_sessions s on s.user_id = n.user_id and s.session_id = n.session_id
  ),
  sessions as (
    insert into progress_sessions as s
      (user_id, session_id, instrument_key, drill, day, first_at, last_at, attempts, active_ms)
    select user_id, session_id, (array_agg(ikey order by created_at))[1],
      (array_agg(drill order by created_at))[1], min(day), min(created_at), max(created_at), count(*), sum(active_ms)
    from t group by user_id, session_id order by user_id, session_id
    on conflict (user_id, session_id) do update set
      first_at = least(s.first_at, excluded.first_at), last_at = greatest(s.last_at, excluded.last_at),
      attempts = s.attempts + excluded.attempts, active_ms = s.active_ms + excluded.active_ms
  ),`

export const ROLLUP_FUNCTION = `
create function progress_rollup() returns trigger language plpgsql as $fn$
begin
  with ${NEW_ATTEMPTS},
${ACTIVE_TIME_AND_SESSIONS}
  days as (
    insert into progress_days as d
      (user_id, instrument_key, drill, day, attempts, correct, active_ms, recall_ms, first_at, last_at)
    select t.user_id, k.ikey, k.drill, t.day, count(*), count(*) filter (where t.correct), sum(t.active_ms),
      coalesce(array_agg(t.response_ms order by t.created_at) filter (where t.correct), '{}'),
      min(t.created_at), max(t.created_at)
    from t cross join lateral (values (t.ikey, t.drill), (t.ikey, '*'), (${ALL}, t.drill), (${ALL}, '*')) as k(ikey, drill)
    group by t.user_id, k.ikey, k.drill, t.day order by 1, 2, 3, 4
    on conflict (user_id, instrument_key, drill, day) do update set
      attempts = d.attempts + excluded.attempts, correct = d.correct + excluded.correct,
      active_ms = d.active_ms + excluded.active_ms, recall_ms = d.recall_ms || excluded.recall_ms,
      first_at = least(d.first_at, excluded.first_at), last_at = greatest(d.last_at, excluded.last_at)
  )
  insert into progress_items as i
    (user_id, instrument_key, drill, string, fret, pitch, attempts, correct, last_at, recent_correct, recent_ms)
  select t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch, count(*), count(*) filter (where t.correct),
    max(t.created_at), progress_tail(array_agg(t.correct order by t.created_at), ${RECENT}),
    progress_tail(coalesce(array_agg(t.response_ms order by t.created_at) filter (where t.correct), '{}'), ${RECENT})
  from t cross join lateral (values (t.drill), ('*')) as k(drill)
  group by t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch order by 1, 2, 3, 4, 5, 6
  on conflict (user_id, instrument_key, drill, string, fret, pitch) do update set
    attempts = i.attempts + excluded.attempts, correct = i.correct + excluded.correct,
    last_at = greatest(i.last_at, excluded.last_at),
    recent_correct = progress_tail(i.recent_correct || excluded.recent_correct, ${RECENT}),
    recent_ms = progress_tail(i.recent_ms || excluded.recent_ms, ${RECENT});

  -- Exact daily median and p90 of correct answers, recomputed for the days this statement touched.
  with ${NEW_ATTEMPTS},
  k as (
    select distinct n.user_id, k.ikey, k.drill, n.day from n
    cross join lateral (values (n.ikey, n.drill), (n.ikey, '*'), (${ALL}, n.drill), (${ALL}, '*')) as k(ikey, drill)
  )
  update progress_days d set (median_ms, p90_ms) = (
    select p[1], p[2] from (
      select percentile_cont(array[0.5, 0.9]) within group (order by v) as p from unnest(d.recall_ms) as v
    ) as q)
  from k where d.user_id = k.user_id and d.instrument_key = k.ikey and d.drill = k.drill and d.day = k.day;

  -- Recent accuracy and median per place, for lists that rank places across many students.
  update progress_items i set
    recent_accuracy = (select avg(x::int) from unnest(i.recent_correct) as x),
    recent_median_ms = (select percentile_cont(0.5) within group (order by v) from unnest(i.recent_ms) as v)
  from (select distinct user_id, coalesce(instrument_id, ${NONE}) as ikey, coalesce(string, -1) as string,
          coalesce(fret, -1) as fret, expected_pitch from new_rows) as k
  where i.user_id = k.user_id and i.instrument_key = k.ikey and i.string = k.string and i.fret = k.fret
    and i.pitch = k.expected_pitch;
  return null;
end
$fn$`

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
  await knex.raw(`
    create function progress_tail(a anyarray, n integer) returns anyarray language sql immutable as
    $$ select a[greatest(cardinality(a) - n + 1, 1):cardinality(a)] $$`)
  await knex.raw(ROLLUP_FUNCTION)
  await knex.raw(`
    create trigger attempts_progress_rollup after insert on attempts
    referencing new table as new_rows for each statement execute function progress_rollup()`)
  // Range Runs asks how often each fingering of a key and region was practised.
  await knex.raw(`
    create index attempts_runs_fingering on attempts
    (user_id, (detail->>'tonic'), (detail->>'scale'), (detail->>'lowFret'), (detail->>'highFret'))
    where drill = 'runs'`)
  await backfill(knex)
}

// Attempts stored before this migration: feed them through the same trigger function once, by
// attaching it to a throwaway copy of the table (the function only reads its transition table).
async function backfill(knex: Knex) {
  await knex.raw('create temporary table attempts_backfill (like attempts)')
  await knex.raw(`
    create trigger attempts_backfill_rollup after insert on attempts_backfill
    referencing new table as new_rows for each statement execute function progress_rollup()`)
  await knex.raw('insert into attempts_backfill select * from attempts')
  await knex.raw('drop table attempts_backfill')
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
