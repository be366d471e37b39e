// Message use cases: a teacher writes to students of their studios (chosen ones or a whole studio),
// in the app and by e-mail; students read theirs and mark them read; the teacher sees who has.
import type { AppContext } from '../context'
import { badRequest, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { teacherStudents } from '../access/access-repository'
import { notify } from '../notifications/notify'
import { ownStudio } from '../studios/studios-service'
import type { MessageCreate } from '../../src/contract/messages'
import { messageMail } from './messages-mail'
import * as repo from './messages-repository'

type Student = Awaited<ReturnType<typeof teacherStudents>>[number]

/** The students the message goes to: each chosen one must be the teacher's (403 otherwise). */
async function recipientsOf(ctx: AppContext, teacher: PublicUser, to: MessageCreate['to']) {
  const students = await teacherStudents(ctx.db, teacher.id)
  if (to.kind === 'studio') {
    await ownStudio(ctx, teacher.id, to.studioId)
    const members = students.filter((s) => s.studios.some((st) => st.id === to.studioId))
    if (!members.length)
      throw badRequest('This studio has no students yet.', { to: ['This studio has no students.'] })
    return members
  }
  const wanted = new Set(to.studentIds)
  const chosen = students.filter((s) => wanted.has(s.id))
  if (chosen.length !== wanted.size)
    throw forbidden('You can only write to students of your studios.')
  return chosen
}

function mailCopies(ctx: AppContext, teacher: PublicUser, to: Student[], input: MessageCreate) {
  const message = { teacherName: teacher.name, subject: input.subject, body: input.body }
  return notify(
    ctx,
    to.map((s) => messageMail(ctx.config, s, message)),
  )
}

export async function sendMessage(ctx: AppContext, teacher: PublicUser, input: MessageCreate) {
  const students = await recipientsOf(ctx, teacher, input.to)
  const id = await repo.insertMessage(ctx.db, {
    teacherId: teacher.id,
    studioId: input.to.kind === 'studio' ? input.to.studioId : null,
    audience: input.to.kind,
    subject: input.subject,
    body: input.body,
    emailed: input.email,
    studentIds: students.map((s) => s.id),
  })
  if (input.email) await mailCopies(ctx, teacher, students, input)
  return (await repo.sentMessages(ctx.db, teacher.id, [id]))[0]!
}

/** The teacher's sent messages with read states, or a student's received ones. */
export const messagesFor = (ctx: AppContext, user: PublicUser) =>
  user.role === 'teacher'
    ? repo.sentMessages(ctx.db, user.id)
    : repo.receivedMessages(ctx.db, user.id)

/** The student read the message (the first time counts); 404 when it was not sent to them. */
export async function markRead(ctx: AppContext, student: PublicUser, id: string) {
  if (!(await repo.markRead(ctx.db, id, student.id))) throw notFound('That message')
  return (await repo.receivedMessages(ctx.db, student.id, id))[0]!
}

/** The teacher removes a message they sent (from every recipient's list too). */
export async function removeMessage(ctx: AppContext, teacher: PublicUser, id: string) {
  const owner = await repo.messageOwner(ctx.db, id)
  if (!owner) throw notFound('That message')
  if (owner !== teacher.id) throw forbidden('This message belongs to another teacher.')
  await repo.deleteMessage(ctx.db, id)
}
