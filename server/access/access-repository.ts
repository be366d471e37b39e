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

/** The students of the teacher's studios, each once, by name, with the studios they are in. */
export async function teacherStudents(
  db: Db,
  teacherId: string,
): Promise<{ id: string; name: string; email: string; studios: { id: string; name: string }[] }[]> {
  return db('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .join('users as u', 'u.id', 'm.student_id')
    .where('s.teacher_id', teacherId)
    .groupBy('u.id', 'u.name', 'u.email')
    .orderBy('u.name')
    .select('u.id', 'u.name', 'u.email')
    .select(
      db.raw("json_agg(json_build_object('id', s.id, 'name', s.name) order by s.name) as studios"),
    )
}
