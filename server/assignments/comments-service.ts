// Comment use cases: only the assigned student and the plan's teacher read and write the thread;
// each new comment is mailed to the other one.
import type { AppContext } from '../context'
import { forbidden, notFound } from '../lib/errors'
import { notify } from '../notifications/notify'
import { findUserById } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import { participantAssignment } from './assignments-service'
import { commentMail } from './comments-mail'
import { deleteComment, findComment, insertComment, listComments } from './comments-repository'

export async function threadOf(ctx: AppContext, user: PublicUser, assignmentId: string) {
  await participantAssignment(ctx, user, assignmentId)
  return listComments(ctx.db, assignmentId)
}

export async function postComment(
  ctx: AppContext,
  user: PublicUser,
  assignmentId: string,
  body: string,
) {
  const assignment = await participantAssignment(ctx, user, assignmentId)
  const comment = await insertComment(ctx.db, assignmentId, user.id, body)
  const fromTeacher = user.id === assignment.teacherId
  const recipient = await findUserById(
    ctx.db,
    fromTeacher ? assignment.studentId : assignment.teacherId,
  )
  if (recipient) {
    const path = fromTeacher ? '/plans' : `/studio/students/${assignment.studentId}`
    await notify(ctx, [
      commentMail(ctx.config, recipient, {
        authorName: user.name,
        planTitle: assignment.title,
        body,
        path,
      }),
    ])
  }
  return comment
}

/** Authors may delete their own comments. */
export async function removeComment(
  ctx: AppContext,
  user: PublicUser,
  assignmentId: string,
  commentId: string,
) {
  await participantAssignment(ctx, user, assignmentId)
  const comment = await findComment(ctx.db, commentId)
  if (!comment || comment.assignmentId !== assignmentId) throw notFound('That comment')
  if (comment.author.id !== user.id) throw forbidden('Only its author can delete a comment.')
  await deleteComment(ctx.db, commentId)
}
