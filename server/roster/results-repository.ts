// One student's graded answers for the CSV export (the teacher's own plan titles only).
import type { Db } from '../lib/db'

export interface ResultRow {
  created_at: Date
  drill: string
  string: number | null
  fret: number | null
  expected_pitch: number
  answer: string
  correct: boolean
  response_ms: number
  session_id: string
  plan_title: string | null
}

export const MAX_RESULT_ROWS = 50_000

export async function studentResults(
  db: Db,
  studentId: string,
  teacherId: string,
  from: Date,
  to: Date,
): Promise<ResultRow[]> {
  return db('attempts as a')
    .leftJoin('plan_items as i', 'i.id', 'a.plan_item_id')
    .leftJoin('plans as p', function () {
      this.on('p.id', 'i.plan_id').andOnVal('p.teacher_id', teacherId)
    })
    .where('a.user_id', studentId)
    .where('a.created_at', '>=', from)
    .where('a.created_at', '<', to)
    .orderBy('a.created_at', 'desc')
    .limit(MAX_RESULT_ROWS)
    .select(
      'a.created_at',
      'a.drill',
      'a.string',
      'a.fret',
      'a.expected_pitch',
      'a.answer',
      'a.correct',
    )
    .select('a.response_ms', 'a.session_id', 'p.title as plan_title')
}
