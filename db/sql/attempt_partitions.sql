-- The answers table is partitioned by the month an answer was given (created_at, UTC). The scheduler
-- (server/digests/scheduler.ts) calls this every tick so the partitions of the coming months exist
-- before answers arrive; answers older than the first month go to attempts_before.
create or replace function ensure_attempt_partitions(months_ahead int default 3) returns int
language plpgsql as $fn$
declare
  month_start timestamptz;
  created int := 0;
  part text;
begin
  for i in 0..months_ahead loop
    month_start := (date_trunc('month', now() at time zone 'UTC') + make_interval(months => i))
      at time zone 'UTC';
    part := format('attempts_y%sm%s', to_char(month_start at time zone 'UTC', 'YYYY'),
      to_char(month_start at time zone 'UTC', 'MM'));
    if to_regclass(part) is null then
      execute format('create table if not exists %I partition of attempts for values from (%L) to (%L)',
        part, month_start, month_start + interval '1 month');
      created := created + 1;
    end if;
  end loop;
  return created;
end
$fn$;
