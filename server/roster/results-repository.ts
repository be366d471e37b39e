// One student's graded answers for the CSV export (the teacher's own plan titles only), with each
// session numbered in the order the student practised.
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
  /** 1 for the first session the teacher may see, 2 for the next… (by each session's first answer) */
  session_number: number
  plan_title: string | null
  /** How the answer's instrument spells notes; null when it was deleted since. */
  accidentals: 'sharp' | 'flat' | null
}

export const MAX_RESULT_ROWS = 50_000

export async function studentResults(
  db: Db,
  studentId: string,
  teacherId: string,
  range: { from: Date; to: Date; since: Date | null },
): Promise<ResultRow[]> {
  const { to, since } = range
  const from = since && since > range.from ? since : range.from
  // sessions are numbered among the answers the teacher may see, so the count hides nothing
  const sessions = db('attempts')
    .where('user_id', studentId)
    .modify((q) => since && q.where('created_at', '>=', since))
    .groupBy('session_id')
    .select('session_id', db.raw('row_number() over (order by min(created_at)) as session_number'))
  const rows = await db('attempts as a')
    .join(sessions.as('n'), 'n.session_id', 'a.session_id')
    .leftJoin('instruments as ins', 'ins.id', 'a.instrument_id')
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
    .select('a.response_ms', 'a.session_id', 'n.session_number', 'p.title as plan_title')
    .select('ins.accidentals')
  return rows.map((r: ResultRow) => ({ ...r, session_number: Number(r.session_number) }))
}
