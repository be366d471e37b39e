// Reads of the statistics rollups (progress_days, progress_items, progress_sessions) and of runs
// attempts for fingerings. The rollups are written by the attempts trigger, never here.
import type { Db } from '../lib/db'

/** instrument_key values in the rollups: attempts without an instrument, and every instrument. */
export const NO_INSTRUMENT = '00000000-0000-0000-0000-000000000000'
export const ALL_INSTRUMENTS = 'ffffffff-ffff-ffff-ffff-ffffffffffff'
export const ALL_DRILLS = '*'

export interface ItemRow {
  string: number
  fret: number
  pitch: number
  attempts: number
  correct: number
  shown: number
  lastAt: Date
  recentCorrect: boolean[]
  recentMs: number[]
}

/** A per-place row as PostgreSQL returns it (the recent times may come back as numeric text). */
export interface ItemDbRow {
  string: number
  fret: number
  pitch: number
  attempts: number
  correct: number
  shown: number
  last_at: Date
  recent_correct: boolean[]
  recent_ms: (number | string)[]
}

/** The per-place figures of one row, for the progress service. */
export const toItemRow = (r: ItemDbRow): ItemRow => ({
  string: r.string,
  fret: r.fret,
  pitch: r.pitch,
  attempts: r.attempts,
  correct: r.correct,
  shown: r.shown,
  lastAt: r.last_at,
  recentCorrect: r.recent_correct,
  recentMs: r.recent_ms.map(Number),
})

export interface DayRow {
  drill: string
  day: string
  attempts: number
  correct: number
  shown: number
  activeMs: number
  medianMs: number | null
  p90Ms: number | null
  lastAt: Date
}

export interface DayRange {
  from?: string
  to?: string
  /** Sessions begun from this instant on only (a teacher sees what the student shared). */
  since?: Date
}

/** The player's time zone for days and streaks (UTC until their client has sent one). */
export async function timeZoneOf(db: Db, userId: string): Promise<string> {
  const row = await db('user_time_zones').where('user_id', userId).first('time_zone')
  return (row as { time_zone: string } | undefined)?.time_zone ?? 'UTC'
}

/** Per-place rollup rows of one instrument and drill ('*' for every drill). */
export async function itemRows(
  db: Db,
  userId: string,
  instrumentKey: string,
  drill: string,
): Promise<ItemRow[]> {
  const rows = await db('progress_items')
    .where({ user_id: userId, instrument_key: instrumentKey, drill })
    .select(
      'string',
      'fret',
      'pitch',
      'attempts',
      'correct',
      'shown',
      'last_at',
      'recent_correct',
      'recent_ms',
    )
  return (rows as ItemDbRow[]).map(toItemRow)
}

const inRange = (range: DayRange) => (q: ReturnType<Db>) => {
  if (range.from) q.where('day', '>=', range.from)
  if (range.to) q.where('day', '<=', range.to)
}

/** A day's median and p90 of right-answer times, from its list (`percentile_cont`, as everywhere). */
const DAY_PERCENTILES = `(select percentile_cont(array[0.5, 0.9]) within group (order by v)
  from unnest(recall_ms) as v) as percentiles`

/** Per-day rollup rows, oldest first, for the given drill keys ('*' = all drills together; null = every key). */
export async function dayRows(
  db: Db,
  userId: string,
  instrumentKey: string,
  drills: string[] | null,
  range: DayRange,
): Promise<DayRow[]> {
  interface Row {
    drill: string
    day: string
    attempts: number
    correct: number
    shown: number
    active_ms: string
    percentiles: number[] | null
    last_at: Date
  }
  const rows: Row[] = await db('progress_days')
    .where({ user_id: userId, instrument_key: instrumentKey })
    .modify((q) => (drills ? q.whereIn('drill', drills) : q))
    .modify(inRange(range))
    .orderBy('day')
    .select(
      'drill',
      db.raw('day::text as day'),
      'attempts',
      'correct',
      'shown',
      'active_ms',
      db.raw(DAY_PERCENTILES),
      'last_at',
    )
  return rows.map((r) => ({
    drill: r.drill,
    day: r.day,
    attempts: r.attempts,
    correct: r.correct,
    shown: r.shown,
    activeMs: Number(r.active_ms),
    medianMs: r.percentiles?.[0] ?? null,
    p90Ms: r.percentiles?.[1] ?? null,
    lastAt: r.last_at,
  }))
}

/** How many sessions started in the range (a session counts for the day it began). */
export async function sessionCount(
  db: Db,
  userId: string,
  instrumentKey: string,
  drill: string,
  range: DayRange,
) {
  const q = db('progress_sessions').where('user_id', userId).modify(inRange(range))
  if (range.since) q.where('first_at', '>=', range.since)
  if (instrumentKey !== ALL_INSTRUMENTS) q.where('instrument_key', instrumentKey)
  if (drill !== ALL_DRILLS) q.where('drill', drill)
  const row = await q.count({ n: '*' }).first()
  return Number((row as { n: string } | undefined)?.n ?? 0)
}

export interface FingeringFilter {
  instrumentId?: string
  tonic: string
  scale: string
  lowFret: number
  highFret: number
  /** Sessions that ended from this instant on only. */
  since?: Date
}

/** Range Runs of one key and region, per fingering pattern (from the per-session runs rollup). */
export async function fingeringRows(db: Db, userId: string, f: FingeringFilter) {
  const q = db('progress_runs').where({
    user_id: userId,
    tonic: f.tonic,
    scale: f.scale,
    low_fret: f.lowFret,
    high_fret: f.highFret,
  })
  if (f.instrumentId) q.where('instrument_key', f.instrumentId)
  if (f.since) q.where('last_at', '>=', f.since)
  const rows = (await q
    .groupBy('pattern')
    .select('pattern')
    .count({ sessions: '*' })
    .sum({ attempts: 'attempts' })
    .max({ last_at: 'last_at' })
    .orderBy('last_at', 'desc')) as unknown as {
    pattern: string
    sessions: string
    attempts: string
    last_at: Date
  }[]
  return rows.map((r) => ({
    pattern: r.pattern,
    sessions: Number(r.sessions),
    attempts: Number(r.attempts),
    lastPractisedAt: r.last_at.toISOString(),
  }))
}

export interface ChordToneRow {
  chordType: string
  degree: string
  attempts: number
  correct: number
  lastAt: Date
  recentMs: number[]
}

/** A Chord Tones row as PostgreSQL returns it. */
export interface ChordDbRow {
  chord_type: string
  degree: string
  attempts: number
  correct: number
  last_at: Date
  recent_ms: (number | string)[]
}

/** The figures of one chord tone, for the progress service. */
export const toChordToneRow = (r: ChordDbRow): ChordToneRow => ({
  chordType: r.chord_type,
  degree: r.degree,
  attempts: r.attempts,
  correct: r.correct,
  lastAt: r.last_at,
  recentMs: r.recent_ms.map(Number),
})

/** Chord Tones rollup rows of a player (one instrument, or every instrument when none is given). */
export async function chordToneRows(
  db: Db,
  userId: string,
  instrumentId?: string,
): Promise<ChordToneRow[]> {
  const q = db('progress_chords').where('user_id', userId)
  if (instrumentId) q.where('instrument_key', instrumentId)
  const rows = await q
    .orderBy(['chord_type', 'degree'])
    .select('chord_type', 'degree', 'attempts', 'correct', 'last_at', 'recent_ms')
  return (rows as ChordDbRow[]).map(toChordToneRow)
}

export interface TempoRow {
  drill: string
  settings: string
  day: string
  bpm: number
}

/** The fastest clean tempo of played takes per drill, settings and local day (attempts' detail). */
export async function tempoRows(
  db: Db,
  userId: string,
  f: {
    instrumentKey: string
    drill: string | null
    timeZone: string
    range: { from: string; to: string }
    since: Date | null
  },
): Promise<TempoRow[]> {
  const day = db.raw('to_char((created_at at time zone ?)::date, ?)', [f.timeZone, 'YYYY-MM-DD'])
  const q = db('attempts')
    .where('user_id', userId)
    .whereRaw(`detail->>'cleanTempo' is not null`)
    .whereRaw('(created_at at time zone ?)::date between ? and ?', [
      f.timeZone,
      f.range.from,
      f.range.to,
    ])
  if (f.instrumentKey !== ALL_INSTRUMENTS) q.where('instrument_id', f.instrumentKey)
  if (f.drill) q.where('drill', f.drill)
  if (f.since) q.where('created_at', '>=', f.since)
  const rows = (await q
    .select('drill', db.raw(`coalesce(detail->>'playedSettings', '') as settings`), { day })
    .max({ bpm: db.raw(`(detail->>'cleanTempo')::int`) })
    .groupBy('drill', 'settings', 'day')
    .orderBy(['drill', 'settings', 'day'])) as unknown as TempoRow[]
  return rows.map((r) => ({ ...r, bpm: Number(r.bpm) }))
}
