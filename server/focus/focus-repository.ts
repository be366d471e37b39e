// focus_cards table access and the few attempt reads the focus needs.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import { ALL_DRILLS } from '../progress/progress-repository'
import type { ReviewCard } from './focus-types'

type Conn = Db | Knex.Transaction

interface CardRow {
  string: number
  fret: number
  due: Date
  stability: number
  difficulty: number
  elapsed_days: number
  scheduled_days: number
  learning_steps: number
  reps: number
  lapses: number
  state: number
  last_review: Date | null
  recent_misses: Date[]
}

export const cellKey = (string: number, fret: number) => `${string}:${fret}`

const toCard = (r: CardRow): ReviewCard => ({
  due: r.due,
  stability: r.stability,
  difficulty: r.difficulty,
  elapsedDays: r.elapsed_days,
  scheduledDays: r.scheduled_days,
  learningSteps: r.learning_steps,
  reps: r.reps,
  lapses: r.lapses,
  state: r.state,
  lastReview: r.last_review,
  recentMisses: r.recent_misses,
})

/** Every card of an instrument, keyed "string:fret". */
export async function loadCards(db: Conn, userId: string, instrumentKey: string) {
  const rows: CardRow[] = await db('focus_cards')
    .where({ user_id: userId, instrument_key: instrumentKey })
    .select('*')
  return new Map(rows.map((r) => [cellKey(r.string, r.fret), toCard(r)]))
}

export interface PlacedCard {
  string: number
  fret: number
  card: ReviewCard
}

export interface CardJson extends Omit<CardRow, 'due' | 'last_review' | 'recent_misses'> {
  due: string
  last_review: string | null
  recent_misses: string[]
}

const fromJson = (r: CardJson): CardRow => ({
  ...r,
  due: new Date(r.due),
  last_review: r.last_review ? new Date(r.last_review) : null,
  recent_misses: r.recent_misses.map((at) => new Date(at)),
})

/** A card as json_agg gives it. */
export const cardFromJson = (r: CardJson): ReviewCard => toCard(fromJson(r))

/** A player's instrument and the cards moved on it. */
export interface MovedCards {
  userId: string
  instrumentKey: string
  cards: PlacedCard[]
}

/** Writes the cards of any players and instruments (insert or replace) in one statement. */
export async function saveCardGroups(db: Conn, moved: MovedCards[]) {
  const rows = moved.flatMap(({ userId, instrumentKey, cards }) =>
    cards.map(({ string, fret, card: c }) => ({
      user_id: userId,
      instrument_key: instrumentKey,
      string,
      fret,
      due: c.due,
      stability: c.stability,
      difficulty: c.difficulty,
      elapsed_days: c.elapsedDays,
      scheduled_days: c.scheduledDays,
      learning_steps: c.learningSteps,
      reps: c.reps,
      lapses: c.lapses,
      state: c.state,
      last_review: c.lastReview,
      recent_misses: c.recentMisses,
    })),
  )
  if (!rows.length) return
  const columns = Object.keys(rows[0]!)
  const updates = columns.slice(4).map((c) => `${c} = excluded.${c}`)
  await db.raw(
    `insert into focus_cards (${columns.join(', ')})
     select ${columns.join(', ')} from json_populate_recordset(null::focus_cards, ?::json)
     on conflict (user_id, instrument_key, string, fret) do update set ${updates.join(', ')}`,
    [JSON.stringify(rows)],
  )
}

/** Writes one instrument's cards (insert or replace). */
export const saveCards = (db: Conn, userId: string, instrumentKey: string, cards: PlacedCard[]) =>
  saveCardGroups(db, [{ userId, instrumentKey, cards }])

/**
 * The player's usual response time on an instrument, the median of the places' median times, as a
 * scalar subquery over the SQL expressions `user` and `instrument` (binds `:all`, the all-drills key).
 */
export const USUAL_MS_SQL = (user: string, instrument: string) =>
  `(select percentile_cont(0.5) within group (order by p.recent_median_ms) from progress_items p
     where p.user_id = ${user} and p.instrument_key = ${instrument} and p.drill = :all
       and p.string >= 0 and p.recent_median_ms is not null)`

/** The player's usual response time on an instrument (USUAL_MS_SQL). */
export async function usualMs(
  db: Conn,
  userId: string,
  instrumentKey: string,
): Promise<number | null> {
  const { rows } = await db.raw(`select ${USUAL_MS_SQL(':user', ':instrument')} as usual`, {
    user: userId,
    instrument: instrumentKey,
    all: ALL_DRILLS,
  })
  return (rows[0] as { usual: number | null } | undefined)?.usual ?? null
}

export interface CellAnswer {
  string: number
  fret: number
  correct: boolean
  responseMs: number
  at: Date
}

/** The latest answers with a place on one instrument, oldest first (to rebuild cards). */
export async function latestCellAnswers(
  db: Conn,
  userId: string,
  instrumentId: string,
  limit: number,
): Promise<CellAnswer[]> {
  const rows = await db('attempts')
    .where({ user_id: userId, instrument_id: instrumentId })
    .whereNotNull('string')
    .orderBy('created_at', 'desc')
    .limit(limit)
    .select('string', 'fret', 'correct', 'response_ms', 'created_at')
  return rows.reverse().map((r) => ({
    string: r.string,
    fret: r.fret,
    correct: r.correct,
    responseMs: r.response_ms,
    at: r.created_at,
  }))
}
