// Studio use cases: a teacher's studios (create, rename, delete when empty), removing a student,
// and a student's own memberships (list, leave).
import type { AppContext } from '../context'
import { conflict, forbidden, notFound } from '../lib/errors'
import { teacherHasStudent } from '../access/access-repository'
import { assignmentRows, purgeAssignments } from '../assignments/assignments-service'
import {
  addMember,
  countMembers,
  deleteStudio as removeStudio,
  findStudio,
  insertStudio,
  listStudios,
  memberships,
  removeMember,
  isMemberEmail,
  renameStudio as rename,
  type StudioRecord,
} from './studios-repository'

/** The studio, when it belongs to the teacher (404 when missing, 403 when someone else's). */
export async function ownStudio(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
): Promise<StudioRecord> {
  const studio = await findStudio(ctx.db, studioId)
  if (!studio) throw notFound('That studio')
  if (studio.teacherId !== teacherId) throw forbidden('This studio belongs to another teacher.')
  return studio
}

export const studiosOf = (ctx: AppContext, teacherId: string) => listStudios(ctx.db, teacherId)

async function studioView(ctx: AppContext, teacherId: string, studioId: string) {
  const studio = (await listStudios(ctx.db, teacherId)).find((s) => s.id === studioId)
  if (!studio) throw notFound('That studio')
  return studio
}

export async function createStudio(ctx: AppContext, teacherId: string, name: string) {
  return studioView(ctx, teacherId, await insertStudio(ctx.db, teacherId, name))
}

export async function renameStudio(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
  name: string,
) {
  await ownStudio(ctx, teacherId, studioId)
  await rename(ctx.db, studioId, name)
  return studioView(ctx, teacherId, studioId)
}

/** Only an empty studio can be deleted, so no student is dropped by accident. */
export async function deleteStudio(ctx: AppContext, teacherId: string, studioId: string) {
  await ownStudio(ctx, teacherId, studioId)
  if ((await countMembers(ctx.db, studioId)) > 0) {
    throw conflict('Remove the students first; only an empty studio can be deleted.')
  }
  await removeStudio(ctx.db, studioId)
}

/** Once a student is in none of a teacher's studios, that teacher's plans for them go too. */
async function dropOrphanedAssignments(ctx: AppContext, teacherId: string, studentId: string) {
  if (await teacherHasStudent(ctx.db, teacherId, studentId)) return
  const rows = await assignmentRows(ctx, { teacherId, studentId })
  await purgeAssignments(
    ctx,
    rows.map((r) => r.id),
  )
}

export async function removeStudent(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
  studentId: string,
) {
  await ownStudio(ctx, teacherId, studioId)
  if (!(await removeMember(ctx.db, studioId, studentId)))
    throw notFound('That student in this studio')
  await dropOrphanedAssignments(ctx, teacherId, studentId)
}

export const membershipsOf = (ctx: AppContext, studentId: string) => memberships(ctx.db, studentId)

export async function leaveStudio(ctx: AppContext, studentId: string, studioId: string) {
  const studio = await findStudio(ctx.db, studioId)
  if (!studio || !(await removeMember(ctx.db, studioId, studentId)))
    throw notFound('That studio membership')
  await dropOrphanedAssignments(ctx, studio.teacherId, studentId)
}

/** Whether the e-mail already belongs to a member of the studio. */
export const studioHasEmail = (ctx: AppContext, studioId: string, email: string) =>
  isMemberEmail(ctx.db, studioId, email)

/** Adds a student to a studio (inside the caller's transaction); false when already a member. */
export const joinStudio = addMember
