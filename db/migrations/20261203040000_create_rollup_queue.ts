import type { Knex } from 'knex'

// Statistics leave the request path: a stored answer is queued (rollup_queue, filled by the live
// trigger in db/sql/rollup_queue.sql) and the app's drain folds it into the rollups and review cards,
// deleting it from the queue in the same transaction. The rollup triggers of 20261201003000 and
// 20261201003200 are dropped here; their functions are live SQL again, taking a batch of ids.
export async function up(knex: Knex): Promise<void> {
  // Keyed by arrival order (an append-only index, cheaper to write than one on random ids); the
  // index on user_id serves "how many of this player's answers still wait".
  await knex.schema.createTable('rollup_queue', (t) => {
    t.bigIncrements('seq').primary()
    t.uuid('attempt_id').notNullable()
    t.uuid('user_id').notNullable()
    t.timestamp('queued_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['user_id'])
  })
  // A queue table sees every row deleted soon after it is written: vacuum it often.
  await knex.raw('alter table rollup_queue set (autovacuum_vacuum_scale_factor = 0.01)')
  await knex.raw('drop trigger if exists attempts_progress_rollup on attempts')
  await knex.raw('drop trigger if exists attempts_runs_rollup on attempts')
  await knex.raw('drop function if exists progress_rollup()')
  await knex.raw('drop function if exists progress_runs_rollup()')
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists attempts_enqueue_rollup on attempts')
  await knex.raw('drop function if exists rollup_enqueue()')
  await knex.raw('drop function if exists progress_rollup(uuid[])')
  await knex.raw('drop function if exists progress_runs_rollup(uuid[])')
  await knex.schema.dropTable('rollup_queue')
}
