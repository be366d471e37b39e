// The live statistics SQL (db/sql/*.sql: functions and triggers, created or replaced as a whole) is
// installed after the migrations, every time; migrations hold history (tables, indexes), this is the
// code in use. A trigger installed for the first time catches up on the attempts already stored.
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
  /** The statement trigger on attempts it defines, which rolls up what was stored before it. */
  trigger?: { name: string; function: string }
}

export const LIVE_SQL: readonly LiveObject[] = [
  { file: 'progress_tail.sql', functions: ['progress_tail'] },
  {
    file: 'progress_rollup.sql',
    functions: ['progress_rollup'],
    trigger: { name: 'attempts_progress_rollup', function: 'progress_rollup' },
  },
  {
    file: 'progress_runs_rollup.sql',
    functions: ['progress_runs_rollup'],
    trigger: { name: 'attempts_runs_rollup', function: 'progress_runs_rollup' },
  },
  {
    file: 'progress_chords_rollup.sql',
    functions: ['progress_chords_rollup'],
    trigger: { name: 'attempts_chords_rollup', function: 'progress_chords_rollup' },
  },
]

export const liveSqlText = (file: string) => readFileSync(path.join(SQL_DIR, file), 'utf8')

async function hasTrigger(db: Knex | Knex.Transaction, name: string) {
  const { rows } = await db.raw('select 1 from pg_trigger where tgname = ? and not tgisinternal', [
    name,
  ])
  return rows.length > 0
}

// Feeds the attempts stored so far through a trigger function once, by attaching it to a
// throwaway copy of the table (the function only reads its transition table).
async function catchUp(trx: Knex.Transaction, fn: string) {
  if ((await trx.raw('select 1 from attempts limit 1')).rows.length === 0) return
  await trx.raw('create temporary table attempts_catch_up (like attempts)')
  await trx.raw(`create trigger attempts_catch_up after insert on attempts_catch_up
    referencing new table as new_rows for each statement execute function ${fn}()`)
  await trx.raw('insert into attempts_catch_up select * from attempts')
  await trx.raw('drop table attempts_catch_up')
}

/** Creates or replaces every live function and trigger, in one transaction. */
export async function installLiveSql(db: Knex): Promise<void> {
  await db.transaction(async (trx) => {
    for (const object of LIVE_SQL) {
      const fresh = object.trigger ? !(await hasTrigger(trx, object.trigger.name)) : false
      await trx.raw(liveSqlText(object.file))
      if (fresh && object.trigger) await catchUp(trx, object.trigger.function)
    }
  })
}

/** Brings a database up to date: the migrations, then the live SQL. */
export async function migrateToLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest()) as [number, string[]]
  await installLiveSql(db)
  return applied
}
