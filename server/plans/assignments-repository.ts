// Assigned plans as rows, and the attempts practised for their items.
import type { Db } from '../lib/db'
import type { ItemAttempt } from './target-progress'

export interface AssignmentRow {
  id: string
  planId: string
  title: string
  notes: string
  dueAt: Date | null
  assignedAt: Date
  teacherId: string
  teacherName: string
  studentId: string
  studentName: string
}

interface RawAssignment {
  id: string
  plan_id: string
  title: string
  notes: string
  due_at: Date | null
  assigned_at: Date
  teacher_id: string
  teacher_name: string
  student_id: string
  student_name: string
}

const toRow = (r: RawAssignment): AssignmentRow => ({
  id: r.id,
  planId: r.plan_id,
  title: r.title,
  notes: r.notes,
  dueAt: r.due_at,
  assignedAt: r.assigned_at,
  teacherId: r.teacher_id,
  teacherName: r.teacher_name,
  studentId: r.student_id,
  studentName: r.student_name,
})

function assignmentQuery(db: Db) {
  return db('plan_assignments as a')
    .join('plans as p', 'p.id', 'a.plan_id')
    .join('users as t', 't.id', 'p.teacher_id')
    .join('users as s', 's.id', 'a.student_id')
    .select('a.id', 'a.plan_id', 'p.title', 'p.notes', 'p.due_at', 'a.assigned_at', 'p.teacher_id')
    .select('t.name as teacher_name', 'a.student_id', 's.name as student_name')
}

/** Assignments filtered by student and/or teacher, soonest due first (undated last). */
export async function listAssignmentRows(
  db: Db,
  filter: {
    studentId?: string
    teacherId?: string
    studentIds?: string[]
    dueBetween?: [Date, Date]
  },
) {
  const rows: RawAssignment[] = await assignmentQuery(db)
    .modify((q) => {
      if (filter.studentId) q.where('a.student_id', filter.studentId)
      if (filter.studentIds) q.whereIn('a.student_id', filter.studentIds)
      if (filter.teacherId) q.where('p.teacher_id', filter.teacherId)
      if (filter.dueBetween) q.whereBetween('p.due_at', filter.dueBetween)
    })
    .orderByRaw('p.due_at asc nulls last, a.assigned_at desc')
  return rows.map(toRow)
}

export async function findAssignmentRow(
  db: Db,
  assignmentId: string,
): Promise<AssignmentRow | null> {
  const row = (await assignmentQuery(db).where('a.id', assignmentId).first()) as
    RawAssignment | undefined
  return row ? toRow(row) : null
}

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

export async function commentCounts(db: Db, assignmentIds: string[]): Promise<Map<string, number>> {
  const rows: { assignment_id: string; count: string }[] = assignmentIds.length
    ? await db('plan_comments')
        .whereIn('assignment_id', assignmentIds)
        .groupBy('assignment_id')
        .select('assignment_id')
        .count({ count: '*' })
    : []
  return new Map(rows.map((r) => [r.assignment_id, Number(r.count)]))
}
