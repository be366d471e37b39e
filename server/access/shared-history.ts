// What part of a student's practice a viewer may see: the student and admins all of it, a teacher
// what the student shared on joining their studio (studio_members.shares_from; null = everything).
import type { AppContext } from '../context'
import type { PublicUser } from '../users/users-schema'
import { localDateTime, zonedTimeToUtc } from '../../src/contract/local-time'
import { sharedSince } from './access-repository'
import { assertCanReadStudent } from './student-access'

/** The visible part of a student's practice: answers from `since` on, whole days from `fromDay`. */
export interface PracticeWindow {
  since: Date | null
  /** The first local day (YYYY-MM-DD) wholly inside the window, for the per-day rollups. */
  fromDay: string | null
}

export const WHOLE_HISTORY: PracticeWindow = { since: null, fromDay: null }

/** The first local day that starts at or after `since` (its own day when it starts at midnight). */
export function firstWholeDay(since: Date, timeZone: string): string {
  const { date } = localDateTime(since, timeZone)
  if (zonedTimeToUtc(date, '00:00', timeZone).getTime() === since.getTime()) return date
  const next = new Date(`${date}T00:00:00Z`)
  next.setUTCDate(next.getUTCDate() + 1)
  return next.toISOString().slice(0, 10)
}

export function practiceWindow(since: Date | null, timeZone: string): PracticeWindow {
  return since ? { since, fromDay: firstWholeDay(since, timeZone) } : WHOLE_HISTORY
}

/** The instant from which a viewer may see the student's practice (null: all of it). */
export async function visibleSince(ctx: AppContext, viewer: PublicUser, studentId: string) {
  if (viewer.id === studentId || viewer.role !== 'teacher') return null
  return (await sharedSince(ctx.db, viewer.id, [studentId])).get(studentId) ?? null
}

/** Checks the viewer may read the student (403 otherwise) and answers from when on. */
export async function readableSince(
  ctx: AppContext,
  viewer: PublicUser,
  studentId: string,
): Promise<Date | null> {
  await assertCanReadStudent(ctx, viewer, studentId)
  return visibleSince(ctx, viewer, studentId)
}

/** Each student's first visible instant for a teacher (null: all of it). */
export const sharedSinceOf = (ctx: AppContext, teacherId: string, studentIds: string[]) =>
  sharedSince(ctx.db, teacherId, studentIds)
