// Per-place and per-chord figures computed from the answers themselves, for a viewer who may see
// only part of a student's practice (a teacher the student shared practice with from a date on):
// the all-time rollups cannot be cut at an instant. Same shapes and rules as the rollups
// (db/sql/progress_rollup.sql, progress_chords_rollup.sql): 50 answers per place are recent.
import type { Db } from '../lib/db'
import {
  ALL_INSTRUMENTS,
  toChordToneRow,
  toItemRow,
  type ChordDbRow,
  type ChordToneRow,
  type ItemDbRow,
  type ItemRow,
} from './progress-repository'

/**
 * SQL for progress_items-shaped rows (user_id, instrument_key, string, fret, pitch, attempts,
 * correct, shown, last_at, recent_correct, recent_ms, recent_accuracy, recent_median_ms) of the
 * answers of `students` (a `(id uuid, since timestamptz)` relation) from each one's `since` on.
 */
export const ITEMS_SINCE_SQL = `
  select g.*, (select avg(x::int) from unnest(g.recent_correct) as x) as recent_accuracy,
    (select percentile_cont(0.5) within group (order by v) from unnest(g.recent_ms) as v)
      as recent_median_ms
  from (
    select a.user_id, coalesce(a.instrument_id, '00000000-0000-0000-0000-000000000000'::uuid)
        as instrument_key,
      coalesce(a.string, -1) as string, coalesce(a.fret, -1) as fret, a.expected_pitch as pitch,
      count(*) filter (where a.outcome <> 'shown')::int as attempts,
      count(*) filter (where a.correct and a.outcome <> 'shown')::int as correct,
      count(*) filter (where a.outcome = 'shown')::int as shown, max(a.created_at) as last_at,
      progress_tail(coalesce(array_agg(a.correct order by a.created_at)
        filter (where a.outcome <> 'shown'), '{}'), 50) as recent_correct,
      progress_tail(coalesce(array_agg(a.response_ms order by a.created_at)
        filter (where a.correct and a.outcome <> 'shown'), '{}'), 50) as recent_ms
    from attempts a join students st on st.id = a.user_id and a.created_at >= st.since
    where (?::text = '*' or a.drill = ?::text)
    group by 1, 2, 3, 4, 5
  ) as g`

/** Per-place rows of one instrument (ALL_INSTRUMENTS: not allowed here) and drill, from `since` on. */
export async function itemRowsSince(
  db: Db,
  userId: string,
  instrumentKey: string,
  drill: string,
  since: Date,
): Promise<ItemRow[]> {
  if (instrumentKey === ALL_INSTRUMENTS) throw new Error('per-place figures are per instrument')
  const { rows } = await db.raw(
    `with students as (select ?::uuid as id, ?::timestamptz as since)
     select * from (${ITEMS_SINCE_SQL}) as i where i.instrument_key = ?`,
    [userId, since, drill, drill, instrumentKey],
  )
  return (rows as ItemDbRow[]).map(toItemRow)
}

/** Chord Tones rows (as progress_chords) of a player's answers from `since` on. */
export async function chordToneRowsSince(
  db: Db,
  userId: string,
  since: Date,
  instrumentId?: string,
): Promise<ChordToneRow[]> {
  const { rows } = await db.raw(
    `select detail->>'chordType' as chord_type, detail->>'degree' as degree,
       count(*)::int as attempts, count(*) filter (where correct)::int as correct,
       max(created_at) as last_at,
       progress_tail(coalesce(array_agg(response_ms order by created_at) filter (where correct),
         '{}'::integer[]), 50) as recent_ms
     from attempts
     where user_id = ? and created_at >= ? and drill = 'chords' and outcome <> 'shown'
       and jsonb_typeof(detail->'chordType') = 'string' and jsonb_typeof(detail->'degree') = 'string'
       and (?::uuid is null or coalesce(instrument_id, '00000000-0000-0000-0000-000000000000'::uuid) = ?::uuid)
     group by 1, 2 order by 1, 2`,
    [userId, since, instrumentId ?? null, instrumentId ?? null],
  )
  return (rows as ChordDbRow[]).map(toChordToneRow)
}
