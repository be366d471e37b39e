// The teachers a weekly digest goes to.
import type { Db } from '../lib/db'

/** Teachers who own at least one studio. */
export async function studioTeachers(
  db: Db,
): Promise<{ id: string; name: string; email: string }[]> {
  return db('users as u')
    .whereExists(db('studios as s').whereRaw('s.teacher_id = u.id'))
    .where('u.role', 'teacher')
    .select('u.id', 'u.name', 'u.email')
    .orderBy('u.name')
}
