// Who is whose student: studio memberships as the access checks, plans and the roster read them.
import type { Db } from '../lib/db'

/** True when the teacher runs a studio the student belongs to. */
export async function teacherHasStudent(db: Db, teacherId: string, studentId: string) {
  const row = await db('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .where({ 's.teacher_id': teacherId, 'm.student_id': studentId })
    .first('m.student_id')
  return row !== undefined
}

export interface TeacherStudent {
  id: string
  name: string
  email: string
  studios: { id: string; name: string }[]
  /** The first instant of practice the teacher may see (null: all of it). */
  since: Date | null
}

/** The earliest shares_from of a student's memberships with one teacher; null when one shares all. */
const SINCE_SQL =
  'case when bool_or(m.shares_from is null) then null else min(m.shares_from) end as since'

/** The students of the teacher's studios, each once, by name, with the studios they are in. */
export async function teacherStudents(db: Db, teacherId: string): Promise<TeacherStudent[]> {
  return db('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .join('users as u', 'u.id', 'm.student_id')
    .where('s.teacher_id', teacherId)
    .groupBy('u.id', 'u.name', 'u.email')
    .orderBy('u.name')
    .select('u.id', 'u.name', 'u.email')
    .select(
      db.raw("json_agg(json_build_object('id', s.id, 'name', s.name) order by s.name) as studios"),
      db.raw(SINCE_SQL),
    )
}

/**
 * Per student, the first instant of their practice the teacher may see (the earliest `shares_from`
 * of the memberships in the teacher's studios; null = all of it). Students not theirs are absent.
 */
export async function sharedSince(
  db: Db,
  teacherId: string,
  studentIds: string[],
): Promise<Map<string, Date | null>> {
  const rows: { student_id: string; since: Date | null }[] = studentIds.length
    ? await db('studio_members as m')
        .join('studios as s', 's.id', 'm.studio_id')
        .where('s.teacher_id', teacherId)
        .whereIn('m.student_id', studentIds)
        .groupBy('m.student_id')
        .select('m.student_id', db.raw(SINCE_SQL))
    : []
  return new Map(rows.map((r) => [r.student_id, r.since]))
}
