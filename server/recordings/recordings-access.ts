// Who may see a recording and what they may do with it: a take belongs to its student and the
// teacher who reviews it (the plan's teacher, or the one a free take is shared with); a reference
// belongs to its teacher and the students it was made for. Admins see none of it.
import type { AppContext } from '../context'
import { forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { participantAssignment } from '../assignments/assignments-service'
import type { RecordingRights } from '../../src/contract/recordings'
import { findEntry, isTeacherOf, studentHasItem } from './recordings-repository'

type Entry = NonNullable<Awaited<ReturnType<typeof findEntry>>>

const REFUSAL = 'Only the student and their teacher can open this recording.'
const asTeacher = (user: PublicUser) => user.role === 'teacher'

async function takeRights(ctx: AppContext, user: PublicUser, take: Entry) {
  const isStudent = take.studentId === user.id
  if (take.assignmentId) {
    await participantAssignment(ctx, user, take.assignmentId, REFUSAL)
  } else if (!isStudent) {
    const teachers = take.sharedWithId === user.id && asTeacher(user)
    if (!teachers || !(await isTeacherOf(ctx.db, user.id, take.studentId!)))
      throw forbidden(REFUSAL)
  }
  return { canRetitle: true, canDelete: isStudent, canComment: true }
}

async function referenceRights(ctx: AppContext, user: PublicUser, reference: Entry) {
  if (reference.uploadedBy === user.id && asTeacher(user))
    return { canRetitle: true, canDelete: true, canComment: true }
  const forStudent = reference.studentId !== null && reference.studentId === user.id
  const onItem =
    reference.planItemId !== null && (await studentHasItem(ctx.db, user.id, reference.planItemId))
  if (!forStudent && !onItem) throw forbidden(REFUSAL)
  // Everyone on a plan hears an item's reference; only a one-student reference is a conversation.
  return { canRetitle: false, canDelete: false, canComment: forStudent }
}

/** The recording and the user's rights on it; 404 when unknown, 403 when it is not theirs to see. */
export async function openEntry(ctx: AppContext, user: PublicUser, id: string) {
  const entry = await findEntry(ctx.db, id)
  if (!entry) throw notFound('That recording')
  const rights: RecordingRights =
    entry.kind === 'take'
      ? await takeRights(ctx, user, entry)
      : await referenceRights(ctx, user, entry)
  return { entry, rights }
}
