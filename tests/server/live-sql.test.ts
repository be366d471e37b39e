// The statistics SQL installed in PostgreSQL is the live SQL in db/sql, to the letter: each
// function's body is its file's, and the triggers on attempts are the files' triggers and no others.
import { randomUUID } from 'node:crypto'
import { afterAll, describe, expect, it } from 'vitest'
import { installLiveSql, LIVE_SQL, liveSqlText, migrateToLatest } from '../../db/live-sql'
import { drainAll } from '../../server/statistics/rollup-drain'
import { createDatabase, dropDatabase } from '../../scripts/db.mjs'
import { databaseUrl, TEST_API_DATABASE } from '../../scripts/lib/paths.mjs'
import { createDb } from '../../server/lib/db'

const db = createDb(process.env.DATABASE_URL!)
afterAll(() => db.destroy())

/** The body of a function as the file writes it (between its $fn$ quotes). */
function bodyIn(sql: string, name: string): string {
  const match = new RegExp(
    `function\\s+${name}\\([^)]*\\)[\\s\\S]*?\\$fn\\$([\\s\\S]*?)\\$fn\\$`,
  ).exec(sql)
  if (!match) throw new Error(`no function ${name} in the file`)
  return match[1] as string
}

/** A trigger statement as words: case, spacing, "or replace" and the schema name do not matter. */
const triggerWords = (statement: string) =>
  statement
    .toLowerCase()
    .replace(/\bor replace\b/, '')
    .replace(/\bpublic\./g, '')
    .replace(/;/g, '')
    .split(/\s+/)
    .filter(Boolean)
    .join(' ')

const installedBody = async (name: string) =>
  (await db.raw('select prosrc from pg_proc where proname = ?', [name])).rows.map(
    (r: { prosrc: string }) => r.prosrc,
  )

const FUNCTIONS = LIVE_SQL.flatMap((o) => o.functions.map((fn) => [fn, o.file] as const))

describe('live SQL (db/sql) against the database', () => {
  it.each(FUNCTIONS)('%s is installed exactly as written in db/sql/%s', async (fn, file) => {
    expect(await installedBody(fn)).toEqual([bodyIn(liveSqlText(file), fn)])
  })

  it('the triggers on attempts are exactly the ones the files define', async () => {
    const { rows } = await db.raw(
      `select pg_get_triggerdef(t.oid) as def from pg_trigger t
       where t.tgrelid = 'attempts'::regclass and not t.tgisinternal order by t.tgname`,
    )
    const installed = rows.map((r: { def: string }) => triggerWords(r.def))
    const written = LIVE_SQL.flatMap((o) => {
      const statement = /create or replace trigger[\s\S]*?;/.exec(liveSqlText(o.file))
      return statement ? [triggerWords(statement[0])] : []
    }).sort()
    expect(installed).toEqual(written)
  })

  it('a function changed in the database no longer matches its file (so the checks can fail)', async () => {
    await db
      .transaction(async (trx) => {
        await trx.raw(`create or replace function progress_tail(a anyarray, n integer) returns anyarray
        language sql immutable as $fn$ select a $fn$`)
        const changed = (
          await trx.raw("select prosrc from pg_proc where proname = 'progress_tail'")
        ).rows[0].prosrc
        expect(changed).not.toBe(bodyIn(liveSqlText('progress_tail.sql'), 'progress_tail'))
        await trx.rollback()
      })
      .catch(() => undefined)
    expect(await installedBody('progress_tail')).toEqual([
      bodyIn(liveSqlText('progress_tail.sql'), 'progress_tail'),
    ])
  })
})

describe('installing the live SQL on a database that already holds attempts', () => {
  const name = `${TEST_API_DATABASE}_live`

  it('queues the attempts stored before the queue trigger existed, once, and the drain counts them', async () => {
    await dropDatabase(name)
    await createDatabase(name)
    const fresh = createDb(databaseUrl(name))
    try {
      await migrateToLatest(fresh)
      await fresh.raw('drop trigger attempts_enqueue_rollup on attempts')
      const [user] = await fresh('users')
        .insert({ email: 'early@example.test', name: 'Early', role: 'student', password_hash: 'x' })
        .returning('id')
      const attempt = (correct: boolean, second: number) => ({
        id: randomUUID(),
        user_id: user.id,
        tuning: [28, 33, 38, 43],
        drill: 'runs',
        session_id: '00000000-0000-4000-8000-00000000000a',
        string: 1,
        fret: 3,
        expected_pitch: 36, // A string fret 3 = C2 (33 + 3, arithmetic)
        answer: '1:3',
        correct,
        response_ms: 900,
        created_at: new Date(Date.UTC(2026, 2, 2, 10, 0, second)),
        detail: { tonic: 'C', scale: 'major', lowFret: 2, highFret: 5, pattern: '0:3-3-2-2' },
      })
      await fresh('attempts').insert([attempt(true, 0), attempt(false, 10)])
      expect(await fresh('progress_items').count({ n: '*' })).toEqual([{ n: '0' }])

      await installLiveSql(fresh)
      await installLiveSql(fresh) // again: the trigger exists now, nothing is queued twice
      expect(await fresh('rollup_queue').count({ n: '*' })).toEqual([{ n: '2' }])
      expect(await drainAll(fresh)).toBe(2)

      // one place, per drill and for all drills ('*'): 2 answers, 1 right
      const items = await fresh('progress_items')
        .select('drill', 'attempts', 'correct')
        .orderBy('drill')
      expect(items).toEqual([
        { drill: '*', attempts: 2, correct: 1 },
        { drill: 'runs', attempts: 2, correct: 1 },
      ])
      const runs = await fresh('progress_runs').select('pattern', 'attempts')
      expect(runs).toEqual([{ pattern: '0:3-3-2-2', attempts: 2 }])

      // statistics built already: a queue trigger installed again does not queue the history
      await fresh.raw('drop trigger attempts_enqueue_rollup on attempts')
      await installLiveSql(fresh)
      expect(await fresh('rollup_queue').count({ n: '*' })).toEqual([{ n: '0' }])
    } finally {
      await fresh.destroy()
      await dropDatabase(name)
    }
  })
})
