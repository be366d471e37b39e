// plan_assignments: a plan assigned to a student, read as rows with the plan's title and both names,
// written when a teacher assigns or unassigns; and the comment count of each.
import type { Db } from '../lib/db'

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
export interface AssignmentFilter {
  studentId?: string
  teacherId?: string
  studentIds?: string[]
  dueBetween?: [Date, Date]
}

export async function listAssignmentRows(db: Db, filter: AssignmentFilter) {
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

/** Assigns a plan; returns only the students newly assigned (re-assigning is a no-op). */
export async function insertAssignments(
  db: Db,
  planId: string,
  studentIds: string[],
): Promise<string[]> {
  if (!studentIds.length) return []
  const rows: { student_id: string }[] = await db('plan_assignments')
    .insert(studentIds.map((student_id) => ({ plan_id: planId, student_id })))
    .onConflict(['plan_id', 'student_id'])
    .ignore()
    .returning('student_id')
  return rows.map((r) => r.student_id)
}

export async function findAssignmentId(
  db: Db,
  planId: string,
  studentId: string,
): Promise<string | null> {
  const row = await db('plan_assignments')
    .where({ plan_id: planId, student_id: studentId })
    .first('id')
  return (row as { id: string } | undefined)?.id ?? null
}

export async function deleteAssignments(db: Db, assignmentIds: string[]) {
  if (assignmentIds.length) await db('plan_assignments').whereIn('id', assignmentIds).delete()
}

/** Whether the item belongs to the assigned plan (a recording is attached to one of its items). */
export async function itemInAssignment(db: Db, assignmentId: string, itemId: string) {
  const row = await db('plan_items as i')
    .join('plan_assignments as a', 'a.plan_id', 'i.plan_id')
    .where({ 'a.id': assignmentId, 'i.id': itemId })
    .first('i.id')
  return row !== undefined
}
