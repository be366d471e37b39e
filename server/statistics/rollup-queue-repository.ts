// rollup_queue access: take queued answers, roll them up with the live SQL, and count what waits.
import type { Knex } from 'knex'
import type { ReviewedAnswer } from '../focus/card-review'
import type { Db } from '../lib/db'

type Conn = Db | Knex.Transaction

export interface QueuedAnswer {
  attempt_id: string
  user_id: string
}

/**
 * Removes up to `limit` queued answers, oldest first (only these players' when given), and returns
 * them. Called inside the drain's transaction, so a rollback puts them back.
 */
export async function takeQueued(
  trx: Knex.Transaction,
  limit: number,
  userIds?: readonly string[],
): Promise<QueuedAnswer[]> {
  const { rows } = await trx.raw<{ rows: QueuedAnswer[] }>(
    `delete from rollup_queue where seq in (
       select seq from rollup_queue
       where (:users::uuid[] is null or user_id = any(:users::uuid[]))
       order by seq limit :limit for update skip locked)
     returning attempt_id, user_id`,
    { users: userIds ? [...userIds] : null, limit },
  )
  return rows
}

/** Folds these attempts into every statistics rollup (db/sql: progress, runs and chord tones). */
export async function rollUp(trx: Knex.Transaction, attemptIds: string[]) {
  await trx.raw(
    `select progress_rollup(:ids::uuid[]), progress_runs_rollup(:ids::uuid[]),
      progress_chords_rollup(:ids::uuid[])`,
    { ids: attemptIds },
  )
}

/** The attempts among these ids that name a place (they move review cards). */
export async function placedAnswers(trx: Knex.Transaction, attemptIds: string[]) {
  const rows: ReviewedAnswer[] = await trx('attempts')
    .whereIn('id', attemptIds)
    .whereNotNull('string')
    .whereNotNull('fret')
    .select('user_id', 'instrument_id', 'string', 'fret', 'correct', 'response_ms', 'created_at')
  return rows
}

/** How many answers of these players wait in the queue. */
export async function pendingCount(db: Conn, userIds: readonly string[]) {
  const row = await db('rollup_queue')
    .whereIn('user_id', [...userIds])
    .count<{ n: string }[]>({ n: '*' })
    .first()
  return Number(row?.n ?? 0)
}

/** The whole queue: how many answers wait and how long the oldest has waited (ms; 0 when empty). */
export async function queueState(db: Conn) {
  const { rows } = await db.raw<{ rows: { depth: string; lag_ms: number | null }[] }>(
    `select count(*) as depth,
       coalesce(extract(epoch from clock_timestamp() - min(queued_at)) * 1000, 0)::float8 as lag_ms
     from rollup_queue`,
  )
  return { depth: Number(rows[0]!.depth), lagMs: Number(rows[0]!.lag_ms ?? 0) }
}
