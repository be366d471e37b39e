// attempts table access: idempotent inserts, instrument ownership, the player's time zone.
import type { Db } from '../lib/db'
import type { AttemptInput, StoredAttempt } from '../../src/contract/attempts'

export interface AttemptRow {
  id: string
  user_id: string
  instrument_id: string | null
  tuning: number[]
  drill: AttemptInput['drill']
  session_id: string
  string: number | null
  fret: number | null
  expected_pitch: number
  answer: string
  correct: boolean
  response_ms: number
  created_at: Date
  received_at: Date
  detail: AttemptInput['detail']
  plan_item_id: string | null
  outcome: AttemptInput['outcome']
}

export const toStoredAttempt = (row: AttemptRow): StoredAttempt => ({
  id: row.id,
  instrumentId: row.instrument_id,
  tuning: row.tuning.map(Number),
  drill: row.drill,
  sessionId: row.session_id,
  string: row.string,
  fret: row.fret,
  expectedPitch: row.expected_pitch,
  answer: row.answer,
  correct: row.correct,
  responseMs: row.response_ms,
  createdAt: row.created_at.toISOString(),
  receivedAt: row.received_at.toISOString(),
  detail: row.detail,
  planItemId: row.plan_item_id,
  outcome: row.outcome,
})

/** An attempt as its database row (the ingest benchmark writes the same rows). */
export const attemptRow = (userId: string, a: AttemptInput) => ({
  id: a.id,
  user_id: userId,
  instrument_id: a.instrumentId,
  tuning: a.tuning,
  drill: a.drill,
  session_id: a.sessionId,
  string: a.string,
  fret: a.fret,
  expected_pitch: a.expectedPitch,
  answer: a.answer,
  correct: a.correct,
  response_ms: a.responseMs,
  created_at: a.createdAt,
  detail: a.detail,
  plan_item_id: a.planItemId,
  outcome: a.outcome,
})

/** Which of these instrument ids belong to the user. */
export async function ownedInstrumentIds(db: Db, userId: string, ids: string[]) {
  if (!ids.length) return new Set<string>()
  const rows: { id: string }[] = await db('instruments')
    .where('user_id', userId)
    .whereIn('id', ids)
    .select('id')
  return new Set(rows.map((r) => r.id))
}

/** The plan items among `ids` that belong to a plan assigned to the player. */
export async function assignedPlanItemIds(db: Db, userId: string, ids: string[]) {
  if (!ids.length) return new Set<string>()
  const rows: { id: string }[] = await db('plan_items as i')
    .join('plan_assignments as a', 'a.plan_id', 'i.plan_id')
    .where('a.student_id', userId)
    .whereIn('i.id', ids)
    .select('i.id')
  return new Set(rows.map((r) => r.id))
}

/**
 * Inserts the attempts whose ids are new, in one statement (db/sql/store_attempts.sql): one batch of
 * a player at a time, ids already stored (by anyone) left untouched. The batch travels as one JSON
 * parameter (not one binding per field), which keeps a 200-answer batch a single small statement.
 */
export async function insertNewAttempts(db: Db, userId: string, attempts: AttemptInput[]) {
  const { rows } = await db.raw<{ rows: AttemptRow[] }>(
    'select * from store_attempts(?::uuid, ?::json)',
    [userId, JSON.stringify(attempts.map((a) => attemptRow(userId, a)))],
  )
  return rows
}

/** Creates the monthly partitions of attempts up to `monthsAhead` months on; resolves to how many. */
export async function ensureMonthPartitions(db: Db, monthsAhead = 3): Promise<number> {
  const { rows } = await db.raw<{ rows: { created: number }[] }>(
    'select ensure_attempt_partitions(?::int) as created',
    [monthsAhead],
  )
  return rows[0]!.created
}
