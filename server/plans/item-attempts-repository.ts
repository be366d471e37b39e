// The attempts practised for plan items, the figures their targets are evaluated on.
import type { Db } from '../lib/db'
import type { ItemAttempt } from './target-progress'

/** Attempts practised for the given items by the given students, keyed "studentId:itemId". */
export async function itemAttempts(db: Db, studentIds: string[], itemIds: string[]) {
  const byKey = new Map<string, ItemAttempt[]>()
  if (!studentIds.length || !itemIds.length) return byKey
  const rows: {
    user_id: string
    plan_item_id: string
    correct: boolean
    response_ms: number
    session_id: string
    created_at: Date
    drill: string
    key: string | null
  }[] = await db('attempts')
    .whereIn('plan_item_id', itemIds)
    .whereIn('user_id', studentIds)
    .select(
      'user_id',
      'plan_item_id',
      'correct',
      'response_ms',
      'session_id',
      'created_at',
      'drill',
    )
    .select(db.raw("detail->>'key' as key"))
  for (const r of rows) {
    const key = `${r.user_id}:${r.plan_item_id}`
    const attempt = {
      correct: r.correct,
      responseMs: r.response_ms,
      sessionId: r.session_id,
      createdAt: r.created_at,
      drill: r.drill,
      key: r.key,
    }
    const list = byKey.get(key)
    if (list) list.push(attempt)
    else byKey.set(key, [attempt])
  }
  return byKey
}
