// The drain: takes queued answers and, in the same transaction, rolls them up into the statistics
// and the spaced-review cards; a crash at any point rolls back, so the answers stay queued.
import type { Db } from '../lib/db'
import { reviewStoredAnswers } from '../focus/card-review'
import { placedAnswers, rollUp, takeQueued } from './rollup-queue-repository'

/** How many answers one drain takes at most (a few hundred milliseconds of work). */
export const DRAIN_LIMIT = 5000
// One drain at a time across every process on the database: cards are read, moved and written, so
// two drains with answers of one player would lose a review.
const DRAIN_LOCK = 0x616d6274

/**
 * Rolls up to `limit` queued answers (only these players' when `userIds` is given) into the rollups
 * and the review cards, and removes them from the queue, all in one transaction. Returns how many
 * were taken.
 */
export async function drainOnce(
  db: Db,
  { limit = DRAIN_LIMIT, userIds }: { limit?: number; userIds?: readonly string[] } = {},
): Promise<number> {
  return db.transaction(async (trx) => {
    await trx.raw('select pg_advisory_xact_lock(?)', [DRAIN_LOCK])
    const taken = await takeQueued(trx, limit, userIds)
    if (!taken.length) return 0
    const ids = taken.map((t) => t.attempt_id)
    await rollUp(trx, ids)
    await reviewStoredAnswers(trx, await placedAnswers(trx, ids))
    return taken.length
  })
}

/** Drains until the queue is empty (the seed and the benchmarks, after bulk inserts). */
export async function drainAll(db: Db, limit = DRAIN_LIMIT): Promise<number> {
  let total = 0
  for (let n = await drainOnce(db, { limit }); n > 0; n = await drainOnce(db, { limit })) total += n
  return total
}
