import type { Knex } from 'knex'
import {
  ACTIVE_TIME_AND_SESSIONS,
  ALL,
  NEW_ATTEMPTS,
  RECENT,
  ROLLUP_FUNCTION,
} from './20261201003000_create_progress_rollups'

// The statistics trigger in one statement: the daily median/p90 and each place's recent accuracy and
// median are computed inside the upserts that write those rows, instead of by two UPDATEs that wrote
// every touched row a second time. Same results; a 20-answer batch took 5–10 % less time in the
// trigger (EXPLAIN ANALYZE, warm). The first steps are the rollups migration's.

// median and p90 of an integer[] expression, as a (median, p90) row; nulls when it is empty.
const percentiles = (array: string) => `
  (select p[1], p[2] from (
    select percentile_cont(array[0.5, 0.9]) within group (order by v) as p from unnest(${array}) as v
  ) as q)`
const median = (array: string) =>
  `(select percentile_cont(0.5) within group (order by v) from unnest(${array}) as v)`
const share = (array: string) => `(select avg(x::int) from unnest(${array}) as x)`

const FOLDED_FUNCTION = `
create or replace function progress_rollup() returns trigger language plpgsql as $fn$
begin
  with ${NEW_ATTEMPTS},
${ACTIVE_TIME_AND_SESSIONS}
  day_groups as (
    select t.user_id, k.ikey, k.drill, t.day, count(*) as attempts, count(*) filter (where t.correct) as correct,
      sum(t.active_ms) as active_ms,
      coalesce(array_agg(t.response_ms order by t.created_at) filter (where t.correct), '{}') as recall_ms,
      min(t.created_at) as first_at, max(t.created_at) as last_at
    from t cross join lateral (values (t.ikey, t.drill), (t.ikey, '*'), (${ALL}, t.drill), (${ALL}, '*')) as k(ikey, drill)
    group by t.user_id, k.ikey, k.drill, t.day
  ),
  days as (
    insert into progress_days as d
      (user_id, instrument_key, drill, day, attempts, correct, active_ms, recall_ms, first_at, last_at, median_ms, p90_ms)
    select g.*, p.median_ms, p.p90_ms
    from day_groups g cross join lateral ${percentiles('g.recall_ms')} as p(median_ms, p90_ms)
    order by 1, 2, 3, 4
    on conflict (user_id, instrument_key, drill, day) do update set
      attempts = d.attempts + excluded.attempts, correct = d.correct + excluded.correct,
      active_ms = d.active_ms + excluded.active_ms, recall_ms = d.recall_ms || excluded.recall_ms,
      first_at = least(d.first_at, excluded.first_at), last_at = greatest(d.last_at, excluded.last_at),
      (median_ms, p90_ms) = ${percentiles('d.recall_ms || excluded.recall_ms')}
  ),
  item_groups as (
    select t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch, count(*) as attempts,
      count(*) filter (where t.correct) as correct, max(t.created_at) as last_at,
      progress_tail(array_agg(t.correct order by t.created_at), ${RECENT}) as recent_correct,
      progress_tail(coalesce(array_agg(t.response_ms order by t.created_at) filter (where t.correct), '{}'), ${RECENT}) as recent_ms
    from t cross join lateral (values (t.drill), ('*')) as k(drill)
    group by t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch
  )
  insert into progress_items as i
    (user_id, instrument_key, drill, string, fret, pitch, attempts, correct, last_at, recent_correct, recent_ms,
     recent_accuracy, recent_median_ms)
  select g.*, ${share('g.recent_correct')}, ${median('g.recent_ms')}
  from item_groups g order by 1, 2, 3, 4, 5, 6
  on conflict (user_id, instrument_key, drill, string, fret, pitch) do update set
    attempts = i.attempts + excluded.attempts, correct = i.correct + excluded.correct,
    last_at = greatest(i.last_at, excluded.last_at),
    recent_correct = progress_tail(i.recent_correct || excluded.recent_correct, ${RECENT}),
    recent_ms = progress_tail(i.recent_ms || excluded.recent_ms, ${RECENT}),
    recent_accuracy = ${share(`progress_tail(i.recent_correct || excluded.recent_correct, ${RECENT})`)},
    recent_median_ms = ${median(`progress_tail(i.recent_ms || excluded.recent_ms, ${RECENT})`)};
  return null;
end
$fn$`

export async function up(knex: Knex): Promise<void> {
  await knex.raw(FOLDED_FUNCTION)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(ROLLUP_FUNCTION.replace('create function', 'create or replace function'))
}
