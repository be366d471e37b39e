-- Every stored attempt, whoever writes it (the API, the demo seed, imports, the benchmarks), is queued
-- for the statistics in the same statement; the drain (server/statistics) rolls the queue up in
-- batches and deletes what it applied in the same transaction, so each answer counts exactly once.
create or replace function rollup_enqueue() returns trigger language plpgsql as $fn$
begin
  insert into rollup_queue (attempt_id, user_id) select id, user_id from new_rows;
  return null;
end
$fn$;

create or replace trigger attempts_enqueue_rollup after insert on attempts
  referencing new table as new_rows for each statement execute function rollup_enqueue();
