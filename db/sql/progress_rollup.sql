-- The statistics rollups (progress_sessions, progress_days, progress_items), brought up to date by one
-- statement per batch of queued attempts (called by the drain, server/statistics): data-modifying
-- CTEs whose upserts also compute each place's recent accuracy and median (a day's median and p90
-- are computed when read, from its list of right-answer times). See DEVELOPERS.md, "Statistics".
--   instrument_key: the instrument id, 00000000-… for attempts without one, ffffffff-… for all;
--   drill: the drill id, or '*' for every drill; 50 answers per place are "recent";
--   a gap longer than 120 000 ms inside a session is not practice time;
--   a "shown" attempt ("show me") is practice time but neither an answer nor a miss: counted in shown.
create or replace function progress_rollup(batch uuid[]) returns void language plpgsql as $fn$
begin
  with new_rows as (select * from attempts where id = any(batch)),
  n as (
    -- each new attempt with its player's local day and the attempt before it in its session
    select a.user_id, coalesce(a.instrument_id, '00000000-0000-0000-0000-000000000000'::uuid) as ikey,
      a.drill, a.session_id, coalesce(a.string, -1)::smallint as string,
      coalesce(a.fret, -1)::smallint as fret, a.expected_pitch, a.correct, a.response_ms, a.created_at,
      a.outcome = 'shown' as shown,
      (a.created_at at time zone coalesce(z.time_zone, 'UTC'))::date as day,
      lag(a.created_at) over (partition by a.user_id, a.session_id order by a.created_at, a.id) as prev_at
    from new_rows a left join user_time_zones z on z.user_id = a.user_id
  ),
  t as (
    -- the active time each attempt adds (the first of a session: its response time)
    select n.*, least(120000, case
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
      (array_agg(drill order by created_at))[1], min(day), min(created_at), max(created_at),
      count(*), sum(active_ms)
    from t group by user_id, session_id order by user_id, session_id
    on conflict (user_id, session_id) do update set
      first_at = least(s.first_at, excluded.first_at), last_at = greatest(s.last_at, excluded.last_at),
      attempts = s.attempts + excluded.attempts, active_ms = s.active_ms + excluded.active_ms
  ),
  day_groups as (
    select t.user_id, k.ikey, k.drill, t.day, count(*) filter (where not t.shown) as attempts,
      count(*) filter (where t.correct and not t.shown) as correct, sum(t.active_ms) as active_ms,
      coalesce(array_agg(t.response_ms order by t.created_at) filter (where t.correct and not t.shown),
        '{}') as recall_ms,
      min(t.created_at) as first_at, max(t.created_at) as last_at,
      count(*) filter (where t.shown) as shown
    from t cross join lateral (values
      (t.ikey, t.drill), (t.ikey, '*'),
      ('ffffffff-ffff-ffff-ffff-ffffffffffff'::uuid, t.drill),
      ('ffffffff-ffff-ffff-ffff-ffffffffffff'::uuid, '*')) as k(ikey, drill)
    group by t.user_id, k.ikey, k.drill, t.day
  ),
  days as (
    -- the day's median and p90 are computed when read, from recall_ms (not re-sorted per drain)
    insert into progress_days as d
      (user_id, instrument_key, drill, day, attempts, correct, active_ms, recall_ms, first_at, last_at,
       shown)
    select g.* from day_groups g
    order by 1, 2, 3, 4
    on conflict (user_id, instrument_key, drill, day) do update set
      attempts = d.attempts + excluded.attempts, correct = d.correct + excluded.correct,
      active_ms = d.active_ms + excluded.active_ms, recall_ms = d.recall_ms || excluded.recall_ms,
      first_at = least(d.first_at, excluded.first_at), last_at = greatest(d.last_at, excluded.last_at),
      shown = d.shown + excluded.shown
  ),
  item_groups as (
    select t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch,
      count(*) filter (where not t.shown) as attempts,
      count(*) filter (where t.correct and not t.shown) as correct, max(t.created_at) as last_at,
      progress_tail(coalesce(
        array_agg(t.correct order by t.created_at) filter (where not t.shown), '{}'), 50) as recent_correct,
      progress_tail(coalesce(array_agg(t.response_ms order by t.created_at)
        filter (where t.correct and not t.shown), '{}'), 50) as recent_ms,
      count(*) filter (where t.shown) as shown
    from t cross join lateral (values (t.drill), ('*')) as k(drill)
    group by t.user_id, t.ikey, k.drill, t.string, t.fret, t.expected_pitch
  )
  insert into progress_items as i
    (user_id, instrument_key, drill, string, fret, pitch, attempts, correct, last_at, recent_correct,
     recent_ms, shown, recent_accuracy, recent_median_ms)
  select g.*,
    (select avg(x::int) from unnest(g.recent_correct) as x),
    (select percentile_cont(0.5) within group (order by v) from unnest(g.recent_ms) as v)
  from item_groups g order by 1, 2, 3, 4, 5, 6
  on conflict (user_id, instrument_key, drill, string, fret, pitch) do update set
    attempts = i.attempts + excluded.attempts, correct = i.correct + excluded.correct,
    last_at = greatest(i.last_at, excluded.last_at), shown = i.shown + excluded.shown,
    recent_correct = progress_tail(i.recent_correct || excluded.recent_correct, 50),
    recent_ms = progress_tail(i.recent_ms || excluded.recent_ms, 50),
    recent_accuracy = (select avg(x::int)
      from unnest(progress_tail(i.recent_correct || excluded.recent_correct, 50)) as x),
    recent_median_ms = (select percentile_cont(0.5) within group (order by v)
      from unnest(progress_tail(i.recent_ms || excluded.recent_ms, 50)) as v);
end
$fn$;
