// The live statistics SQL (db/sql/*.sql: functions and triggers, created or replaced as a whole) is
// installed after the migrations, every time; migrations hold history (tables, indexes), this is the
// code in use. The queue trigger, installed on a database whose statistics were never built, queues
// the attempts already stored.
import type { Knex } from 'knex'
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

const SQL_DIR = path.join(path.dirname(fileURLToPath(import.meta.url)), 'sql')

export interface LiveObject {
  /** The file under db/sql. */
  file: string
  /** The functions it defines (their bodies are compared with the database by a test). */
  functions: string[]
  /** The statement trigger on attempts it defines; `catchUp` runs once when it is first installed. */
  trigger?: { name: string; catchUp: string }
}

// Attempts stored before the queue existed are queued only when no statistics were ever built from
// them (a database that had the earlier rollup triggers already counts them).
const QUEUE_STORED_ATTEMPTS = `insert into rollup_queue (attempt_id, user_id)
  select id, user_id from attempts where not exists (select 1 from progress_items)
  order by created_at`

export const LIVE_SQL: readonly LiveObject[] = [
  { file: 'progress_tail.sql', functions: ['progress_tail'] },
  { file: 'attempt_partitions.sql', functions: ['ensure_attempt_partitions'] },
  { file: 'progress_rollup.sql', functions: ['progress_rollup'] },
  { file: 'progress_runs_rollup.sql', functions: ['progress_runs_rollup'] },
  {
    file: 'rollup_queue.sql',
    functions: ['rollup_enqueue'],
    trigger: { name: 'attempts_enqueue_rollup', catchUp: QUEUE_STORED_ATTEMPTS },
  },
  { file: 'progress_chords_rollup.sql', functions: ['progress_chords_rollup'] },
  { file: 'store_attempts.sql', functions: ['store_attempts'] },
]

export const liveSqlText = (file: string) => readFileSync(path.join(SQL_DIR, file), 'utf8')

async function hasTrigger(db: Knex | Knex.Transaction, name: string) {
  const { rows } = await db.raw('select 1 from pg_trigger where tgname = ? and not tgisinternal', [
    name,
  ])
  return rows.length > 0
}

/** Creates or replaces every live function and trigger, in one transaction. */
export async function installLiveSql(db: Knex): Promise<void> {
  await db.transaction(async (trx) => {
    for (const object of LIVE_SQL) {
      const fresh = object.trigger ? !(await hasTrigger(trx, object.trigger.name)) : false
      await trx.raw(liveSqlText(object.file))
      if (fresh && object.trigger) await trx.raw(object.trigger.catchUp)
    }
  })
}

/** Brings a database up to date: the migrations, then the live SQL. */
export async function migrateToLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest()) as [number, string[]]
  await installLiveSql(db)
  await db.raw('select ensure_attempt_partitions(3)') // a server stopped for months finds them too
  return applied
}
