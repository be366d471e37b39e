// The last Window Cycle note a player answered for a scale (of one plan item, or any), read from
// the attempts so the next session continues the cycle after it.
import type { Db } from '../lib/db'

export interface CycleStopFilter {
  scale: string
  /** Only this plan item's attempts; null: any Window Cycle attempt of the scale. */
  planItemId: string | null
  /** Only attempts from this instant on (what the student shares with the viewer); null: all. */
  since?: Date | null
}

export interface CycleStopRow {
  key: string
  noteIndex: number
  phase: 'up' | 'down'
  at: Date
}

/** The latest cycle attempt carrying a position (attempts before positions were stored are skipped). */
export async function lastCycleStop(
  db: Db,
  userId: string,
  filter: CycleStopFilter,
): Promise<CycleStopRow | null> {
  const q = db('attempts')
    .where({ user_id: userId, drill: 'cycle' })
    .whereRaw(`detail->>'scale' = ?`, [filter.scale])
    .whereRaw(`detail->>'noteIndex' ~ '^[0-9]{1,2}$'`)
    .whereRaw(`detail->>'phase' in ('up', 'down')`)
  if (filter.planItemId) q.where('plan_item_id', filter.planItemId)
  if (filter.since) q.where('created_at', '>=', filter.since)
  const row = (await q
    .orderBy('created_at', 'desc')
    .first(
      db.raw(`detail->>'key' as key`),
      db.raw(`(detail->>'noteIndex')::int as note_index`),
      db.raw(`detail->>'phase' as phase`),
      'created_at',
    )) as { key: string; note_index: number; phase: 'up' | 'down'; created_at: Date } | undefined
  if (!row) return null
  return { key: row.key, noteIndex: row.note_index, phase: row.phase, at: row.created_at }
}
