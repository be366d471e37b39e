// One run of a scheduled job at a time across every app process: a transaction-scoped advisory lock
// (two-key form, apart from the statistics drain's one-key lock) taken without waiting.
import { hostname } from 'node:os'
import type { Db } from './db'

/** The advisory lock class of scheduled jobs ("AmJb"); the job name picks the second key. */
const JOB_LOCK_CLASS = 0x416d4a62

/** This process as a runner name: host and process id. */
export const runnerName = () => `${hostname()}:${process.pid}`

/**
 * Runs `job` when no other process runs the job of this name now, and notes the run in
 * scheduled_runs; resolves to the job's result, or `skipped` when another process holds the lock.
 */
export async function runAlone<T>(
  db: Db,
  name: string,
  job: () => Promise<T>,
): Promise<{ ran: true; result: T } | { ran: false }> {
  return db.transaction(async (trx) => {
    const { rows } = await trx.raw<{ rows: { locked: boolean }[] }>(
      'select pg_try_advisory_xact_lock(?::int, hashtext(?)) as locked',
      [JOB_LOCK_CLASS, name],
    )
    if (!rows[0]!.locked) return { ran: false as const }
    const result = await job()
    await trx.raw(
      `insert into scheduled_runs (job, runner, runs, last_run_at) values (?, ?, 1, now())
       on conflict (job, runner) do update set runs = scheduled_runs.runs + 1, last_run_at = now()`,
      [name, runnerName()],
    )
    return { ran: true as const, result }
  })
}
