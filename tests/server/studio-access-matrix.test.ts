// Every studio, plan, recording, comment and digest route × every kind of caller: anonymous, the
// student, another student, the teacher, another teacher, an admin. One row per route; the
// allowed callers run last so destructive routes are refused before they succeed.
import request from 'supertest'
import type { Test } from 'supertest'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import {
  makeAdmin,
  signedInAgent,
  startTestApi,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'
import {
  createPlan,
  planBody,
  RECALL_ITEM,
  studentIn,
  teacherWithStudio,
  wavFile,
  type Agent,
} from '../helpers/studio'

const ROLES = ['anonymous', 'student', 'otherStudent', 'teacher', 'otherTeacher', 'admin'] as const
type Role = (typeof ROLES)[number]
type Expected = Record<Role, number>

interface Fixture {
  studioId: string
  emptyStudioId: string
  studentId: string
  removableId: string
  extraId: string
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
}

let api: TestApi
let dataDir: string
let f: Fixture
const callers = {} as Record<Role, ReturnType<typeof request.agent> | ReturnType<typeof request>>

const wav = wavFile(200)
const allow = (ok: Partial<Expected>, denied = 403): Expected => ({
  anonymous: 401,
  student: denied,
  otherStudent: denied,
  teacher: denied,
  otherTeacher: denied,
  admin: denied,
  ...ok,
})
const teacherOnly = (ok: number, otherTeacher = 403) => allow({ teacher: ok, otherTeacher })

type Call = (c: ReturnType<typeof request.agent>) => Test
const ROUTES: [string, (f: Fixture) => Call, Expected][] = [
  ['GET studios', () => (c) => c.get('/api/studio/studios'), teacherOnly(200, 200)],
  [
    'POST studios',
    () => (c) => c.post('/api/studio/studios').send({ name: 'Another room' }),
    teacherOnly(201, 201),
  ],
  [
    'PATCH studio',
    (f) => (c) => c.patch(`/api/studio/studios/${f.studioId}`).send({ name: 'Renamed room' }),
    teacherOnly(200),
  ],
  [
    'DELETE studio',
    (f) => (c) => c.delete(`/api/studio/studios/${f.emptyStudioId}`),
    teacherOnly(204),
  ],
  [
    'DELETE studio member',
    (f) => (c) => c.delete(`/api/studio/studios/${f.studioId}/students/${f.removableId}`),
    teacherOnly(204),
  ],
  [
    'POST invitation',
    (f) => (c) =>
      c
        .post(`/api/studio/studios/${f.studioId}/invitations`)
        .send({ email: uniqueEmail('matrix') }),
    teacherOnly(201),
  ],
  ['GET invitations', () => (c) => c.get('/api/studio/invitations'), teacherOnly(200, 200)],
  [
    'POST invitation resend',
    (f) => (c) => c.post(`/api/studio/invitations/${f.invitationId}/resend`),
    teacherOnly(200),
  ],
  [
    'DELETE invitation',
    (f) => (c) => c.delete(`/api/studio/invitations/${f.invitationToRevokeId}`),
    teacherOnly(200),
  ],
  [
    'GET invitation preview (public)',
    (f) => (c) => c.get('/api/invitations/preview').query({ token: f.token }),
    allow({
      anonymous: 200,
      student: 200,
      otherStudent: 200,
      teacher: 200,
      otherTeacher: 200,
      admin: 200,
    }),
  ],
  ['GET students (contract)', () => (c) => c.get('/api/studio/students'), teacherOnly(200, 200)],
  ['GET roster', () => (c) => c.get('/api/studio/roster'), teacherOnly(200, 200)],
  ['GET roster.csv', () => (c) => c.get('/api/studio/roster.csv'), teacherOnly(200, 200)],
  ['GET student', (f) => (c) => c.get(`/api/studio/students/${f.studentId}`), teacherOnly(200)],
  [
    'GET student assignments',
    (f) => (c) => c.get(`/api/studio/students/${f.studentId}/assignments`),
    teacherOnly(200),
  ],
  [
    'GET student results.csv',
    (f) => (c) => c.get(`/api/studio/students/${f.studentId}/results.csv`),
    teacherOnly(200),
  ],
  [
    'GET memberships',
    () => (c) => c.get('/api/studio/memberships'),
    allow({ student: 200, otherStudent: 200 }),
  ],
  ['GET plans', () => (c) => c.get('/api/plans'), teacherOnly(200, 200)],
  ['GET starters', () => (c) => c.get('/api/plans/starters'), teacherOnly(200, 200)],
  [
    'GET assigned plans',
    () => (c) => c.get('/api/plans/assigned'),
    allow({ student: 200, otherStudent: 200 }),
  ],
  ['POST plan', () => (c) => c.post('/api/plans').send(planBody()), teacherOnly(201, 201)],
  ['GET plan', (f) => (c) => c.get(`/api/plans/${f.planId}`), teacherOnly(200)],
  [
    'PUT plan',
    (f) => (c) =>
      c.put(`/api/plans/${f.planId}`).send(planBody({ items: [{ ...RECALL_ITEM, id: f.itemId }] })),
    teacherOnly(200),
  ],
  ['POST plan copy', (f) => (c) => c.post(`/api/plans/${f.planId}/copy`), teacherOnly(201)],
  [
    'POST plan assignments',
    (f) => (c) => c.post(`/api/plans/${f.planId}/assignments`).send({ studentIds: [f.studentId] }),
    teacherOnly(200),
  ],
  [
    'DELETE plan assignment',
    (f) => (c) => c.delete(`/api/plans/${f.planId}/assignments/${f.extraId}`),
    teacherOnly(200),
  ],
  ['DELETE plan', (f) => (c) => c.delete(`/api/plans/${f.planToDeleteId}`), teacherOnly(204)],
  [
    'GET plan item',
    (f) => (c) => c.get(`/api/plans/items/${f.itemId}`),
    allow({ student: 200, teacher: 200 }),
  ],
  [
    'GET comments',
    (f) => (c) => c.get(`/api/assignments/${f.assignmentId}/comments`),
    allow({ student: 200, teacher: 200 }),
  ],
  [
    'POST comment',
    (f) => (c) =>
      c.post(`/api/assignments/${f.assignmentId}/comments`).send({ body: 'Matrix says hi' }),
    allow({ student: 201, teacher: 201 }),
  ],
  [
    'DELETE comment (author: student)',
    (f) => (c) => c.delete(`/api/assignments/${f.assignmentId}/comments/${f.commentId}`),
    allow({ student: 204 }),
  ],
  [
    'POST recording',
    (f) => (c) =>
      c
        .post(`/api/assignments/${f.assignmentId}/recordings`)
        .field('planItemId', f.itemId)
        .attach('file', wav, 'take.wav'),
    allow({ student: 201 }),
  ],
  [
    'GET recording audio',
    (f) => (c) => c.get(`/api/assignments/${f.assignmentId}/recordings/${f.recordingId}/audio`),
    allow({ student: 200, teacher: 200 }),
  ],
  [
    'DELETE recording',
    (f) => (c) =>
      c.delete(`/api/assignments/${f.assignmentId}/recordings/${f.recordingToDeleteId}`),
    allow({ student: 204 }),
  ],
  [
    'POST admin digests send',
    () => (c) => c.post('/api/admin/digests/send'),
    allow({ admin: 200 }),
  ],
  // Last: the student leaving the studio ends their assignments.
  [
    'DELETE membership (leave)',
    (f) => (c) => c.delete(`/api/studio/memberships/${f.studioId}`),
    allow({ student: 204, otherStudent: 404 }),
  ],
]

async function upload(student: Agent, assignmentId: string, itemId: string) {
  return (
    await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`)
      .field('planItemId', itemId)
      .attach('file', wav, 'take.wav')
  ).body.recording.id as string
}

async function invitation(teacher: Agent & { studioId: string }) {
  const email = uniqueEmail('matrix-invite')
  const res = await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invitations`)
    .send({ email })
  const mail = await waitForMail(api.ctx, email)
  return {
    id: res.body.invitation.id as string,
    token: decodeURIComponent(/token=(\S+)/.exec(mail.text)![1]!),
  }
}

beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-matrix-'))
  api = await startTestApi({ dataDir })
  const teacher = await teacherWithStudio(api.app, 'Matrix Teacher')
  const otherTeacher = await teacherWithStudio(api.app, 'Other Teacher')
  const student = await studentIn(api.app, api.ctx, teacher.studioId, 'Matrix Student')
  const otherStudent = await studentIn(api.app, api.ctx, otherTeacher.studioId, 'Other Student')
  const removable = await studentIn(api.app, api.ctx, teacher.studioId, 'Removable')
  const extra = await studentIn(api.app, api.ctx, teacher.studioId, 'Extra')
  const admin = await signedInAgent(api.app, 'teacher', 'Matrix Admin')
  await makeAdmin(api.ctx, admin.user.id)
  const plan = await createPlan(teacher, { studentIds: [student.user.id, extra.user.id] })
  const planToDelete = await createPlan(teacher)
  const itemId = plan.items[0]!.id
  const assignmentId = plan.assignees.find((a) => a.studentId === student.user.id)!.assignmentId
  const comment = await student.agent
    .post(`/api/assignments/${assignmentId}/comments`)
    .send({ body: 'mine' })
  const empty = await teacher.agent.post('/api/studio/studios').send({ name: 'Empty room' })
  const [kept, revoked, previewed] = [
    await invitation(teacher),
    await invitation(teacher),
    await invitation(teacher),
  ]
  f = {
    studioId: teacher.studioId,
    emptyStudioId: empty.body.studio.id,
    studentId: student.user.id,
    removableId: removable.user.id,
    extraId: extra.user.id,
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
  }
  Object.assign(callers, {
    anonymous: request(api.app),
    student: student.agent,
    otherStudent: otherStudent.agent,
    teacher: teacher.agent,
    otherTeacher: otherTeacher.agent,
    admin: admin.agent,
  })
})
afterAll(async () => {
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

it.each(ROUTES)('%s answers each caller as the rules say', async (_name, route, expected) => {
  const call = route(f)
  const order = [...ROLES].sort((a, b) => Number(expected[a] < 300) - Number(expected[b] < 300))
  const actual = {} as Expected
  for (const role of order)
    actual[role] = (await call(callers[role] as ReturnType<typeof request.agent>)).status
  expect(actual).toEqual(expected)
})
