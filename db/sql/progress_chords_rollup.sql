-- Chord Tones answers per player, instrument, chord type and degree: answers, right answers, the
-- last one, and the latest 50 right answers' response times, for one batch of queued attempts
-- (called by the drain, server/statistics, with the other rollups). A chords detail without a text
-- chordType and degree is stored with the attempt and not counted here; "show me" answers neither.
create or replace function progress_chords_rollup(batch uuid[]) returns void language plpgsql as $fn$
begin
  insert into progress_chords as c
    (user_id, instrument_key, chord_type, degree, attempts, correct, last_at, recent_ms)
  select user_id, ikey, chord_type, degree, count(*), count(*) filter (where correct),
    max(created_at),
    progress_tail(coalesce(
      array_agg(response_ms order by created_at) filter (where correct), '{}'::integer[]), 50)
  from (
    select user_id, coalesce(instrument_id, '00000000-0000-0000-0000-000000000000'::uuid) as ikey,
      case when jsonb_typeof(detail->'chordType') = 'string' then detail->>'chordType' end
        as chord_type,
      case when jsonb_typeof(detail->'degree') = 'string' then detail->>'degree' end as degree,
      correct, response_ms, created_at
    from attempts where id = any(batch) and drill = 'chords' and outcome <> 'shown'
  ) as chords
  where chord_type is not null and degree is not null
  group by 1, 2, 3, 4 order by 1, 2, 3, 4
  on conflict (user_id, instrument_key, chord_type, degree) do update set
    attempts = c.attempts + excluded.attempts,
    correct = c.correct + excluded.correct,
    last_at = greatest(c.last_at, excluded.last_at),
    recent_ms = progress_tail(c.recent_ms || excluded.recent_ms, 50);
end
$fn$;
