// The cast and the rows the route × role matrix works on: a studio with its teacher, the student,
// a classmate, a student and a teacher of another studio, an admin, and one of everything a route
// can name (plan, item, assignment, comment, recordings, invitations, instrument, mail…).
import { randomUUID } from 'node:crypto'
import { issueSessionToken } from '../../server/auth/sessions'
import { sessionCookieName } from '../../server/auth/session-token'
import { signedInAdmin, signedInAgent, uniqueEmail, waitForMail, type TestApi } from './api'
import { billingFixture } from './billing'
import { createPlan, joinStudio, studentIn, teacherWithStudio, wavFile, type Agent } from './studio'

export const ROLES = [
  'anonymous',
  'student',
  'classmate',
  'outsider',
  'teacher',
  'otherTeacher',
  'admin',
] as const
export type Role = (typeof ROLES)[number]

export interface Fixture {
  users: Record<Exclude<Role, 'anonymous'>, { id: string; email: string }>
  studioId: string
  emptyStudioId: string
  leavableStudioId: string
  removableId: string
  extraId: string
  targetUserId: string
  planId: string
  planToDeleteId: string
  itemId: string
  assignmentId: string
  commentId: string
  recordingId: string
  recordingToDeleteId: string
  invitationId: string
  invitationToRevokeId: string
  token: string
  instrumentId: string
  mailId: number
  lessonId: string
  lessonToDeleteId: string
  lessonNoteId: string
  shareToken: string
  shareToRevokeToken: string
  messageId: string
  messageToDeleteId: string
  inviteLinkId: string
  freeTakeId: string
  freeTakeToDeleteId: string
  pinnedCommentId: string
  billing: Awaited<ReturnType<typeof billingFixture>>
}

export const BASS = {
  name: 'Matrix bass',
  presetId: 'bass-4',
  tuning: [28, 33, 38, 43], // E1 A1 D2 G2
  frets: 20,
  scaleLengthMm: 864,
}

/** A one-off lesson with the fixture's student, a week ahead in the teacher's zone. */
export const LESSON_BODY = (f: Pick<Fixture, 'users'>) => ({
  studentId: f.users.student.id,
  date: '2030-01-07',
  time: '17:30',
  timeZone: 'Europe/Tallinn',
  durationMinutes: 45,
  weeks: 1,
})

// common practice: a 4-string bass is tuned E1 A1 D2 G2 = MIDI 28 33 38 43
export const SHARE_BODY = {
  preset: { drill: 'scatter', settings: { tonic: 'A', scale: 'minor', seed: 4711 } },
  title: 'Matrix scatter',
  instrument: { name: 'Matrix bass', tuning: [28, 33, 38, 43], frets: 20 },
}

async function upload(student: Agent, assignmentId: string, itemId: string) {
  const res = await student.agent
    .post(`/api/assignments/${assignmentId}/recordings`)
    .field('planItemId', itemId)
    .attach('file', wavFile(200), 'take.wav')
  return res.body.recording.id as string
}

async function invitation(api: TestApi, teacher: Agent & { studioId: string }) {
  const email = uniqueEmail('matrix-invite')
  const res = await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invitations`)
    .send({ email })
  const mail = await waitForMail(api.ctx, email)
  return {
    id: res.body.invitation.id as string,
    token: decodeURIComponent(/token=(\S+)/.exec(mail.text)![1]!),
    mailId: mail.id,
  }
}

async function cast(api: TestApi) {
  const teacher = await teacherWithStudio(api.app, 'Matrix Teacher')
  const otherTeacher = await teacherWithStudio(api.app, 'Other Teacher')
  const student = await studentIn(api.app, api.ctx, teacher.studioId, 'Matrix Student')
  const classmate = await studentIn(api.app, api.ctx, teacher.studioId, 'Matrix Classmate')
  const outsider = await studentIn(api.app, api.ctx, otherTeacher.studioId, 'Other Student')
  const admin = await signedInAdmin(api.app, 'Matrix Admin')
  return { teacher, otherTeacher, student, classmate, outsider, admin }
}

async function studios(api: TestApi, people: Awaited<ReturnType<typeof cast>>) {
  const { teacher, student } = people
  const room = (name: string) => teacher.agent.post('/api/studio/studios').send({ name })
  const empty = (await room('Empty room')).body.studio.id as string
  const leavable = (await room('Leavable room')).body.studio.id as string
  await joinStudio(api.ctx, leavable, student.user.id)
  const removable = await studentIn(api.app, api.ctx, teacher.studioId, 'Removable')
  const extra = await studentIn(api.app, api.ctx, teacher.studioId, 'Extra')
  return { empty, leavable, removable: removable.user.id, extra: extra.user.id }
}

/** Two lessons of the teacher with the student (one to delete), a note on the first, two share links. */
async function lessonsAndShares(people: Awaited<ReturnType<typeof cast>>, f: Fixture) {
  const { teacher, student } = people
  const schedule = async () =>
    (await teacher.agent.post('/api/lessons').send(LESSON_BODY(f))).body.lessons[0].id as string
  const [lessonId, lessonToDeleteId] = [await schedule(), await schedule()]
  const noted = await teacher.agent
    .post(`/api/lessons/${lessonId}/notes`)
    .send({ body: 'Kept note', shared: false })
  const share = async () =>
    (await student.agent.post('/api/shares').send(SHARE_BODY)).body.share.token as string
  return {
    ...{ lessonId, lessonToDeleteId, lessonNoteId: noted.body.lesson.notes[0].id as string },
    ...{ shareToken: await share(), shareToRevokeToken: await share() },
  }
}

/** Two messages of the teacher to the student (one to delete) and an open invitation link. */
async function messagesAndLink(people: Awaited<ReturnType<typeof cast>>) {
  const { teacher, student } = people
  const write = async (subject: string) =>
    (
      await teacher.agent
        .post('/api/messages')
        .send({ to: { kind: 'students', studentIds: [student.user.id] }, subject, body: 'Hi' })
    ).body.message.id as string
  const link = await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invite-links`)
    .send({})
  return {
    ...{ messageId: await write('Kept'), messageToDeleteId: await write('Removable') },
    inviteLinkId: link.body.link.id as string,
  }
}

/** Two free takes of the student shared with the teacher (one to delete), one pinned comment. */
async function freeTakes(people: Awaited<ReturnType<typeof cast>>) {
  const { teacher, student } = people
  const upload = async () =>
    (
      await student.agent
        .post('/api/recordings')
        .field('shareWith', teacher.user.id)
        .attach('file', wavFile(800), 'take.wav')
    ).body.recording.id as string
  const [freeTakeId, freeTakeToDeleteId] = [await upload(), await upload()]
  const pinned = await student.agent
    .post(`/api/recordings/${freeTakeId}/comments`)
    .send({ atMs: 50, body: 'Mine' })
  return { freeTakeId, freeTakeToDeleteId, pinnedCommentId: pinned.body.comment.id as string }
}

/** Builds the whole fixture through the API (and the database where no API exists). */
export async function buildFixture(api: TestApi) {
  const people = await cast(api)
  const { teacher, student } = people
  const rooms = await studios(api, people)
  const plan = await createPlan(teacher, { studentIds: [student.user.id, rooms.extra] })
  const planToDelete = await createPlan(teacher)
  const itemId = plan.items[0]!.id
  const assignmentId = plan.assignees.find((a) => a.studentId === student.user.id)!.assignmentId
  const comment = await student.agent
    .post(`/api/assignments/${assignmentId}/comments`)
    .send({ body: 'mine' })
  const [kept, revoked, previewed] = [
    await invitation(api, teacher),
    await invitation(api, teacher),
    await invitation(api, teacher),
  ]
  const instrument = await student.agent.post('/api/instruments').send(BASS)
  const target = await signedInAgent(api.app, 'student', 'Admin Target')
  const users = Object.fromEntries(
    Object.entries(people).map(([role, agent]) => [role, agent.user]),
  ) as unknown as Fixture['users']
  const fixture = {
    users,
    studioId: teacher.studioId,
    emptyStudioId: rooms.empty,
    leavableStudioId: rooms.leavable,
    removableId: rooms.removable,
    extraId: rooms.extra,
    targetUserId: target.user.id,
    planId: plan.id,
    planToDeleteId: planToDelete.id,
    itemId,
    assignmentId,
    commentId: comment.body.comment.id,
    recordingId: await upload(student, assignmentId, itemId),
    recordingToDeleteId: await upload(student, assignmentId, itemId),
    invitationId: kept.id,
    invitationToRevokeId: revoked.id,
    token: previewed.token, // resending rotates kept's token
    instrumentId: instrument.body.instrument.id,
    mailId: kept.mailId,
    billing: await billingFixture(teacher, student.user.id),
  } as Fixture
  return {
    ...fixture,
    ...(await lessonsAndShares(people, fixture)),
    ...(await messagesAndLink(people)),
    ...(await freeTakes(people)),
  }
}

/** A fresh session cookie for the role's user (every call gets its own, so sign-outs harm nothing). */
export async function cookieFor(api: TestApi, f: Fixture, role: Role) {
  if (role === 'anonymous') return null
  const token = await issueSessionToken(api.ctx, f.users[role].id)
  return `${sessionCookieName(api.ctx.config)}=${token}`
}

export const freshId = () => randomUUID()
