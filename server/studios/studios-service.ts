// Studio use cases: a teacher's studios (create, rename, delete when empty), removing a student,
// and a student's own memberships (list, leave).
import type { Knex } from 'knex'
import type { AppContext } from '../context'
import { timeZoneOf } from '../users/users-repository'
import { localDay, zonedTimeToUtc } from '../../src/contract/local-time'
import type { ShareHistoryChoice } from '../../src/contract/studios'
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
  studioCountOf,
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

const DAY_MS = 24 * 3600 * 1000

/** The first instant of practice a new studio's teacher sees for a choice (null: everything). */
export function sharesFromOf(choice: ShareHistoryChoice, timeZone: string, now = new Date()) {
  if (choice === 'everything') return null
  if (choice === 'from-now') return now
  return zonedTimeToUtc(
    localDay(new Date(now.getTime() - 30 * DAY_MS), timeZone),
    '00:00',
    timeZone,
  )
}

/**
 * Adds a student to a studio (inside the caller's transaction), sharing the earlier practice they
 * chose (default: from now on when already in another studio, else everything); false when already
 * a member.
 */
export async function joinStudio(
  trx: Knex.Transaction,
  studioId: string,
  studentId: string,
  choice?: ShareHistoryChoice,
) {
  const chosen = choice ?? ((await studioCountOf(trx, studentId)) > 0 ? 'from-now' : 'everything')
  const sharesFrom = sharesFromOf(chosen, await timeZoneOf(trx, studentId))
  return { joined: await addMember(trx, studioId, studentId, sharesFrom), sharesFrom }
}
