// Who may read a student's practice data: the student, a teacher of one of their studios, an admin.
import type { AppContext } from '../context'
import { forbidden } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { teacherHasStudent } from './access-repository'

/**
 * Allows reading a student's data for the student themselves, a teacher with that student in one of
 * their studios, and admins; throws 403 for everyone else (also for unknown ids, so a teacher cannot
 * probe which accounts exist).
 */
export async function assertCanReadStudent(ctx: AppContext, viewer: PublicUser, studentId: string) {
  if (viewer.id === studentId || viewer.role === 'admin') return
  if (viewer.role === 'teacher' && (await teacherHasStudent(ctx.db, viewer.id, studentId))) return
  throw forbidden('You can only see the progress of students in your own studios.')
}
