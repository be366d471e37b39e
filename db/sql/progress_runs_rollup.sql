-- Range Runs fingerings per session (so "which fingering did I practise least" reads a few rows):
-- one row per player, key, scale, fret region, fingering pattern, instrument and session. A runs
-- detail not in the agreed shape (a non-numeric fret) is stored with the attempt and not counted.
create or replace function progress_runs_rollup(batch uuid[]) returns void language plpgsql as $fn$
begin
  insert into progress_runs as r
    (user_id, tonic, scale, low_fret, high_fret, pattern, instrument_key, session_id, attempts, last_at)
  select user_id, tonic, scale, low_fret, high_fret, pattern, ikey, session_id, count(*), max(created_at)
  from (
    select user_id, detail->>'tonic' as tonic, detail->>'scale' as scale,
      case when jsonb_typeof(detail->'lowFret') = 'number'
        and (detail->>'lowFret')::numeric between 0 and 99
        then (detail->>'lowFret')::numeric::int end as low_fret,
      case when jsonb_typeof(detail->'highFret') = 'number'
        and (detail->>'highFret')::numeric between 0 and 99
        then (detail->>'highFret')::numeric::int end as high_fret,
      detail->>'pattern' as pattern,
      coalesce(instrument_id, '00000000-0000-0000-0000-000000000000'::uuid) as ikey,
      session_id, created_at
    from attempts where id = any(batch) and drill = 'runs'
  ) as runs
  where tonic is not null and scale is not null and pattern is not null
    and low_fret is not null and high_fret is not null
  group by 1, 2, 3, 4, 5, 6, 7, 8 order by 1, 2, 3, 4, 5, 6, 7, 8
  on conflict (user_id, tonic, scale, low_fret, high_fret, pattern, instrument_key, session_id)
  do update set
    attempts = r.attempts + excluded.attempts, last_at = greatest(r.last_at, excluded.last_at);
end
$fn$;
