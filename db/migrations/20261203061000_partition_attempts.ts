import type { Knex } from 'knex'

// Answers partitioned by month (created_at, UTC) so old months can be detached or archived whole and
// a player's recent answers stay in small tables; the player's id leads every key so the table can
// later be distributed by student. The rows move over here; the queue trigger comes back with the
// live SQL (db/sql), which then finds the statistics built and queues nothing twice.
// Columns, defaults, NOT NULL and checks as they are (a column added by an earlier migration comes
// along); keys and indexes are built anew below.
const SAME_COLUMNS = (table: string) => `(like ${table} including defaults including constraints)`

// The months from the earliest answer (or this month) to three months ahead, plus one partition
// for anything older (an answer may be dated back to the year 2000).
const PARTITIONS = `do $do$
declare
  first_month timestamptz := date_trunc('month',
    least(coalesce((select min(created_at) from attempts_unpartitioned), now()), now())
    at time zone 'UTC') at time zone 'UTC';
  last_month timestamptz := (date_trunc('month', now() at time zone 'UTC') + interval '3 months')
    at time zone 'UTC';
  m timestamptz := first_month;
begin
  execute format('create table attempts_before partition of attempts for values from (minvalue) to (%L)',
    first_month);
  while m <= last_month loop
    execute format('create table %I partition of attempts for values from (%L) to (%L)',
      format('attempts_y%sm%s', to_char(m at time zone 'UTC', 'YYYY'), to_char(m at time zone 'UTC', 'MM')),
      m, m + interval '1 month');
    m := m + interval '1 month';
  end loop;
end
$do$`

// The secondary indexes the table had before.
const INDEXES = [
  'attempts_user_time on attempts (user_id, created_at)',
  'attempts_user_session on attempts (user_id, session_id)',
  'attempts_plan_item on attempts (plan_item_id) where plan_item_id is not null',
]

export async function up(knex: Knex): Promise<void> {
  await knex.raw('alter table attempts rename to attempts_unpartitioned')
  await knex.raw(
    `create table attempts ${SAME_COLUMNS('attempts_unpartitioned')} partition by range (created_at)`,
  )
  await knex.raw(PARTITIONS)
  await knex.raw(`alter table attempts add constraint attempts_pkey2 primary key (user_id, id, created_at),
    add constraint attempts_user_fk foreign key (user_id) references users(id) on delete cascade,
    add constraint attempts_instrument_fk foreign key (instrument_id) references instruments(id)
      on delete set null`)
  await knex.raw('insert into attempts select * from attempts_unpartitioned')
  await knex.raw('drop table attempts_unpartitioned')
  await knex.raw('alter table attempts rename constraint attempts_pkey2 to attempts_pkey')
  // The statistics drain finds queued answers by id alone; the rest as before.
  await knex.raw('create index attempts_id on attempts (id)')
  for (const index of INDEXES) await knex.raw(`create index ${index}`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('alter table attempts rename to attempts_partitioned')
  await knex.raw(`create table attempts ${SAME_COLUMNS('attempts_partitioned')}`)
  await knex.raw(`alter table attempts add primary key (id),
    add foreign key (user_id) references users(id) on delete cascade,
    add foreign key (instrument_id) references instruments(id) on delete set null`)
  await knex.raw('insert into attempts select * from attempts_partitioned')
  await knex.raw('drop table attempts_partitioned')
  for (const index of INDEXES) await knex.raw(`create index ${index}`)
}
