// Studio membership lookups used by access checks (the only Knex in server/access).
import type { Db } from '../lib/db'

/** True when the teacher runs a studio the student belongs to. */
export async function teacherHasStudent(db: Db, teacherId: string, studentId: string) {
  const row = await db('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .where({ 's.teacher_id': teacherId, 'm.student_id': studentId })
    .first('m.student_id')
  return row !== undefined
}
