// Use cases of assigned plans that other features call: who takes part in one, and removing
// assignments or plan items together with the recording files attached to them.
import type { AppContext } from '../context'
import type { Db } from '../lib/db'
import { forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import {
  commentCounts,
  deleteAssignments,
  findAssignmentId,
  findAssignmentRow,
  insertAssignments,
  listAssignmentRows,
  type AssignmentFilter,
  type AssignmentRow,
} from './assignments-repository'
import { recordingStorage } from './recording-storage'
import {
  recordingsOfAssignments,
  referencesOfItems,
  storageKeysOf,
  toSummary,
} from './recordings-repository'

export type { AssignmentRow }

/** The assignment, when the user is its student or its plan's teacher (the thread's two people). */
export async function participantAssignment(
  ctx: AppContext,
  user: PublicUser,
  assignmentId: string,
  refusal = 'Only the student and the teacher of this plan can see its comments.',
): Promise<AssignmentRow> {
  const assignment = await findAssignmentRow(ctx.db, assignmentId)
  if (!assignment) throw notFound('That assigned plan')
  // The plan's author counts as its teacher only while their account is a teacher's.
  const asTeacher = assignment.teacherId === user.id && user.role === 'teacher'
  if (assignment.studentId !== user.id && !asTeacher) throw forbidden(refusal)
  return assignment
}

/** The storage keys of the recordings a delete of these assignments, items or plan removes. */
export const recordingKeys = (
  ctx: AppContext,
  where: { assignmentIds?: string[]; itemIds?: string[]; planId?: string },
) => storageKeysOf(ctx.db, where)

/** Deletes recording files after their rows are gone; a missing file is not an error. */
export async function dropRecordingFiles(ctx: AppContext, keys: string[]) {
  const storage = recordingStorage(ctx)
  await Promise.all(
    keys.map((key) =>
      storage
        .delete(key)
        .catch((err: unknown) => ctx.logger.warn({ err }, 'recording delete failed')),
    ),
  )
}

/** Deletes assignments (comments and recordings go with them) and their recording files. */
export async function purgeAssignments(ctx: AppContext, assignmentIds: string[]) {
  const keys = await recordingKeys(ctx, { assignmentIds })
  await deleteAssignments(ctx.db, assignmentIds)
  await dropRecordingFiles(ctx, keys)
}

/** Assignments as rows (plan title, teacher and student names), filtered. */
export const assignmentRows = (ctx: AppContext, filter: AssignmentFilter) =>
  listAssignmentRows(ctx.db, filter)

/** Assigns a plan; returns only the students newly assigned (re-assigning is a no-op). */
export const assignStudents = (
  ctx: AppContext,
  planId: string,
  studentIds: string[],
  trx: Db = ctx.db, // the caller's transaction, when the plan is written in the same one
) => insertAssignments(trx, planId, studentIds)

/** The assignment of a plan to a student, or null. */
export const assignmentOf = (ctx: AppContext, planId: string, studentId: string) =>
  findAssignmentId(ctx.db, planId, studentId)

/** What plan views show of assignments: their comment counts and recordings (newest first). */
export async function assignmentActivity(ctx: AppContext, assignmentIds: string[]) {
  const [comments, recordings] = await Promise.all([
    commentCounts(ctx.db, assignmentIds),
    recordingsOfAssignments(ctx.db, assignmentIds),
  ])
  return {
    comments,
    recordings: recordings.map((r) => ({ assignmentId: r.assignmentId, summary: toSummary(r) })),
  }
}

/** The teachers' reference takes on these plan items (newest first). */
export async function itemReferences(ctx: AppContext, itemIds: string[]) {
  return (await referencesOfItems(ctx.db, itemIds)).map(toSummary)
}
