-- Stores a player's batch of answers in one round trip, each answer once: the advisory lock lets one
-- batch of a player in at a time (a resend in flight waits), and the insert that follows takes a fresh
-- snapshot after the lock, so it sees the rows of the batch it waited for; an id stored already (by
-- anyone, in any monthly partition) is skipped, never overwritten. Returns the rows stored now. Being
-- a function, its statements are planned once per connection instead of once per batch.
create or replace function store_attempts(player uuid, batch json) returns setof attempts
language plpgsql as $fn$
begin
  perform pg_advisory_xact_lock(1098151024, hashtext(player::text));
  return query
    insert into attempts (id, user_id, instrument_id, tuning, drill, session_id, string, fret,
      expected_pitch, answer, correct, response_ms, created_at, detail, plan_item_id, outcome)
    select r.id, player, r.instrument_id, r.tuning, r.drill, r.session_id, r.string, r.fret,
      r.expected_pitch, r.answer, r.correct, r.response_ms, r.created_at, r.detail, r.plan_item_id,
      r.outcome
    from json_populate_recordset(null::attempts, batch) r
    where not exists (select 1 from attempts a where a.id = r.id)
    on conflict (user_id, id, created_at) do nothing
    returning *;
end
$fn$;
