// Rate-limit counters in PostgreSQL (table rate_limits), so every app process sees the same counts.
import type { Db } from './db'

/** A fixed window of `limit` hits; past `freeHits`, each hit must wait an exponential back-off. */
export interface CounterRule {
  limit: number
  windowMs: number
  /** Hits allowed without back-off (default: the limit, i.e. no back-off). */
  freeHits?: number
  /** Wait after the first hit beyond freeHits; doubles with every further hit. */
  backoffBaseMs?: number
  backoffCapMs?: number
}

export interface TakeResult {
  allowed: boolean
  hits: number
  /** When refused: how long until a try may be allowed again. */
  retryAfterMs: number
}

interface CounterRow {
  hits: number
  window_ends_at: Date
  last_hit_at: Date
}

const SWEEP_EVERY_MS = 10 * 60 * 1000
let lastSweep = 0

/** Deletes counters whose window ended a day ago; at most every 10 minutes per process. */
function sweep(db: Db) {
  if (Date.now() - lastSweep < SWEEP_EVERY_MS) return
  lastSweep = Date.now()
  db('rate_limits')
    .where('window_ends_at', '<', db.raw("now() - interval '1 day'"))
    .delete()
    .catch(() => (lastSweep = 0))
}

// One upsert counts a hit, starting a new window when the last one ended; `where` may refuse it.
const upsert = (where = '') =>
  `insert into rate_limits as r (key, hits, window_ends_at, last_hit_at)
   values (?, 1, now() + ?::float8 * interval '1 millisecond', now())
   on conflict (key) do update set
     hits = case when r.window_ends_at <= now() then 1 else r.hits + 1 end,
     window_ends_at = case when r.window_ends_at <= now() then excluded.window_ends_at
                           else r.window_ends_at end,
     last_hit_at = now()
   ${where}
   returning hits, window_ends_at, last_hit_at`

// Allowed: a new window, or under the limit and past the back-off since the last counted hit.
const ALLOWED = `where r.window_ends_at <= now()
   or (r.hits < ?::int and (r.hits < ?::int or r.last_hit_at
       + least(?::float8 * 2 ^ (r.hits - ?::int), ?::float8) * interval '1 millisecond' <= now()))`

/** Counts one hit unconditionally (express-rate-limit's store contract). */
export async function hit(db: Db, key: string, windowMs: number): Promise<CounterRow> {
  sweep(db)
  const { rows } = await db.raw<{ rows: CounterRow[] }>(upsert(), [key, windowMs])
  return rows[0]!
}

const backoffMs = (rule: CounterRule, hits: number) => {
  const free = rule.freeHits ?? rule.limit
  if (hits < free) return 0
  return Math.min((rule.backoffBaseMs ?? 0) * 2 ** (hits - free), rule.backoffCapMs ?? Infinity)
}

/**
 * Takes one hit when the rule allows it, atomically (one statement, so parallel tries cannot all
 * slip through); a refused try is not counted.
 */
export async function take(db: Db, key: string, rule: CounterRule): Promise<TakeResult> {
  sweep(db)
  const free = rule.freeHits ?? rule.limit
  const { rows } = await db.raw<{ rows: CounterRow[] }>(upsert(ALLOWED), [
    key,
    rule.windowMs,
    rule.limit,
    free,
    rule.backoffBaseMs ?? 0,
    free,
    rule.backoffCapMs ?? 1e12,
  ])
  if (rows[0]) return { allowed: true, hits: rows[0].hits, retryAfterMs: 0 }
  const row = await peek(db, key)
  const windowLeft = row ? row.window_ends_at.getTime() - Date.now() : 0
  const backoffLeft = row ? row.last_hit_at.getTime() + backoffMs(rule, row.hits) - Date.now() : 0
  const left = row && row.hits >= rule.limit ? windowLeft : Math.min(windowLeft, backoffLeft)
  return { allowed: false, hits: row?.hits ?? 0, retryAfterMs: Math.max(1000, left) }
}

/** The current counter, or null when there is none or its window has ended. */
export async function peek(db: Db, key: string): Promise<CounterRow | null> {
  const row: CounterRow | undefined = await db('rate_limits')
    .where({ key })
    .where('window_ends_at', '>', db.fn.now())
    .first('hits', 'window_ends_at', 'last_hit_at')
  return row ?? null
}

/** Gives one hit back (a request that turned out not to count). */
export async function undo(db: Db, key: string) {
  await db('rate_limits').where({ key }).where('hits', '>', 0).decrement('hits', 1)
}

export async function clear(db: Db, key: string) {
  await db('rate_limits').where({ key }).delete()
}
