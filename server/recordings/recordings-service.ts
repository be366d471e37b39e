// Recording use cases beyond the assignment thread: a student's free takes (private or shared with
// one of their teachers), a teacher's reference takes, titles, playing any take one may see, and
// comments pinned to a moment of a take.
import type { AppContext } from '../context'
import { badRequest, conflict, fieldErrors, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import {
  describeUpload,
  discardRecording,
  fileOrDiscard,
  playable,
} from '../assignments/recordings-service'
import type { StoredUpload } from '../assignments/recording-upload'
import { insertRecording } from '../assignments/recordings-repository'
import { pinnedCommentSchema, type RecordingPatch } from '../../src/contract/recordings'
import { openEntry } from './recordings-access'
import {
  commentsOf,
  countUploads,
  deleteComment,
  findComment,
  insertComment,
  isTeacherOf,
  studentEntries,
  teacherEntries,
  teachersItem,
  teachersOfStudent,
  toPublicEntry,
  updateRecording,
} from './recordings-repository'
import { MAX_FREE_TAKES, MAX_REFERENCES, type ReferenceFields } from './recordings-schema'

const NOT_YOUR_TEACHER = 'Share takes only with a teacher of one of your studios.'

/** The takes the user sees outside their plans: a student's own, or those shared with a teacher. */
export async function listRecordings(ctx: AppContext, user: PublicUser, studentId?: string) {
  if (user.role === 'student') {
    if (studentId && studentId !== user.id) throw forbidden('You can only list your own takes.')
    return (await studentEntries(ctx.db, user.id)).map(toPublicEntry)
  }
  if (studentId && !(await isTeacherOf(ctx.db, user.id, studentId)))
    throw forbidden('You can only see the takes of students in your own studios.')
  return (await teacherEntries(ctx.db, user.id, studentId)).map(toPublicEntry)
}

export const teachersToShareWith = (ctx: AppContext, student: PublicUser) =>
  teachersOfStudent(ctx.db, student.id)

async function checkShareTarget(ctx: AppContext, studentId: string, teacherId?: string | null) {
  if (!teacherId) return
  if (!(await isTeacherOf(ctx.db, teacherId, studentId))) throw forbidden(NOT_YOUR_TEACHER)
}

async function belowLimit(ctx: AppContext, user: PublicUser, kind: 'take' | 'reference') {
  const max = kind === 'take' ? MAX_FREE_TAKES : MAX_REFERENCES
  if ((await countUploads(ctx.db, user.id, kind)) >= max)
    throw conflict(`At most ${max} such takes; delete an older one first.`)
}

type TakeFields = { title?: string; durationMs?: number; shareWith?: string }

/** Files a student's take that belongs to no plan item; refused takes are deleted. */
export const uploadTake = (
  ctx: AppContext,
  student: PublicUser,
  fields: TakeFields,
  upload: StoredUpload,
) =>
  fileOrDiscard(ctx, upload, async () => {
    await checkShareTarget(ctx, student.id, fields.shareWith)
    await belowLimit(ctx, student, 'take')
    const described = await describeUpload(ctx, upload, fields.durationMs)
    const stored = await insertRecording(ctx.db, {
      ...{ assignmentId: null, planItemId: null, studentId: student.id, uploadedBy: student.id },
      ...{ sharedWithId: fields.shareWith ?? null, kind: 'take', title: fields.title ?? '' },
      ...described,
    })
    return toPublicEntry((await openEntry(ctx, student, stored.id)).entry)
  })

async function checkReferenceTarget(ctx: AppContext, teacher: PublicUser, fields: ReferenceFields) {
  if (fields.planItemId && !(await teachersItem(ctx.db, teacher.id, fields.planItemId)))
    throw forbidden('Add reference takes only to items of your own plans.')
  if (fields.studentId && !(await isTeacherOf(ctx.db, teacher.id, fields.studentId)))
    throw forbidden('Add reference takes only for students of your own studios.')
}

/** Files a teacher's reference take on a plan item or for one student; refused ones are deleted. */
export const uploadReference = (
  ctx: AppContext,
  teacher: PublicUser,
  fields: ReferenceFields,
  upload: StoredUpload,
) =>
  fileOrDiscard(ctx, upload, async () => {
    await checkReferenceTarget(ctx, teacher, fields)
    await belowLimit(ctx, teacher, 'reference')
    const described = await describeUpload(ctx, upload, fields.durationMs)
    const stored = await insertRecording(ctx.db, {
      ...{ assignmentId: null, planItemId: fields.planItemId ?? null, uploadedBy: teacher.id },
      ...{ studentId: fields.studentId ?? null, sharedWithId: null, kind: 'reference' },
      ...{ title: fields.title ?? '' },
      ...described,
    })
    return toPublicEntry((await openEntry(ctx, teacher, stored.id)).entry)
  })

/** Retitles a take (its student or their teacher; a reference: its teacher) or changes its sharing. */
export async function changeRecording(
  ctx: AppContext,
  user: PublicUser,
  id: string,
  patch: RecordingPatch,
) {
  const { entry, rights } = await openEntry(ctx, user, id)
  if (patch.title !== undefined && !rights.canRetitle)
    throw forbidden('Only the teacher who recorded this reference can rename it.')
  if (patch.shareWith !== undefined) {
    const free = entry.kind === 'take' && entry.assignmentId === null
    if (!free || entry.studentId !== user.id)
      throw forbidden('Only the student can share their own free takes.')
    await checkShareTarget(ctx, user.id, patch.shareWith)
  }
  await updateRecording(ctx.db, id, { title: patch.title, sharedWith: patch.shareWith })
  return toPublicEntry((await openEntry(ctx, user, id)).entry)
}

export async function removeRecordingById(ctx: AppContext, user: PublicUser, id: string) {
  const { entry, rights } = await openEntry(ctx, user, id)
  if (!rights.canDelete) throw forbidden('Only whoever recorded it can delete it.')
  await discardRecording(ctx, entry)
}

export const audioOf = async (ctx: AppContext, user: PublicUser, id: string) =>
  playable(ctx, (await openEntry(ctx, user, id)).entry)

export async function pinnedComments(ctx: AppContext, user: PublicUser, id: string) {
  const { rights } = await openEntry(ctx, user, id)
  return { comments: await commentsOf(ctx.db, id), rights }
}

/** Pins a comment to a moment inside the take (checked against the take's stored length). */
export async function pinComment(ctx: AppContext, user: PublicUser, id: string, body: unknown) {
  const { entry, rights } = await openEntry(ctx, user, id)
  if (!rights.canComment) throw forbidden('Only the teacher comments on a plan’s reference take.')
  const parsed = pinnedCommentSchema(entry.durationMs).safeParse(body ?? {})
  if (!parsed.success) throw badRequest('Some fields need attention.', fieldErrors(parsed.error))
  return insertComment(ctx.db, { recordingId: id, authorId: user.id, ...parsed.data })
}

export async function unpinComment(
  ctx: AppContext,
  user: PublicUser,
  at: { id: string; commentId: string },
) {
  await openEntry(ctx, user, at.id)
  const comment = await findComment(ctx.db, at.id, at.commentId)
  if (!comment) throw notFound('That comment')
  if (comment.author_id !== user.id) throw forbidden('Only its author can delete a comment.')
  await deleteComment(ctx.db, comment.id)
}
