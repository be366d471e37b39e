// Finding 5 as the attack: a NUL character (U+0000) in any text field, query or path must be a 400
// naming the field, never a 500; database refusals of input are 4xx from the one error middleware.
import express from 'express'
import knex, { type Knex } from 'knex'
import { knexConfig } from '../../db/knex-config'
import request from 'supertest'
import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { errorHandler } from '../../server/lib/errors'
import { MAX_BODY_DEPTH } from '../../server/lib/text-guard'
import { signedInAdmin, signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { attemptBody, practiser } from '../helpers/practice'
import { createPlan, planBody, studentIn, teacherWithStudio } from '../helpers/studio'

const NUL = '\u0000'
let api: TestApi
let teacher: Awaited<ReturnType<typeof teacherWithStudio>>
let student: Awaited<ReturnType<typeof studentIn>>
let admin: Awaited<ReturnType<typeof signedInAgent>>
let assignmentId: string
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app)
  student = await studentIn(api.app, api.ctx, teacher.studioId)
  admin = await signedInAdmin(api.app)
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  assignmentId = plan.assignees[0]!.assignmentId
})
afterAll(() => api.close())

type Case = [string, () => request.Test, string[]]
const CASES: Case[] = [
  [
    'register: name',
    () =>
      request(api.app)
        .post('/api/auth/register')
        .send({
          email: `nul-${randomUUID()}@example.test`,
          password: 'long enough',
          name: `A${NUL}`,
          role: 'student',
        }),
    ['name'],
  ],
  [
    'studio: name',
    () => teacher.agent.post('/api/studio/studios').send({ name: `Cedar${NUL}` }),
    ['name'],
  ],
  [
    'plan: title and notes',
    () => teacher.agent.post('/api/plans').send(planBody({ title: `W${NUL}1`, notes: `${NUL}` })),
    ['title', 'notes'],
  ],
  [
    'comment: body',
    () =>
      teacher.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: `hi${NUL}` }),
    ['body'],
  ],
  [
    'instrument: name',
    () =>
      student.agent.post('/api/instruments').send({
        name: `Bass${NUL}`,
        presetId: 'bass-4',
        tuning: [28, 33, 38, 43],
        frets: 20,
        scaleLengthMm: 864,
      }),
    ['name'],
  ],
  [
    'admin user search (query string)',
    () => admin.agent.get('/api/admin/users').query({ search: `Ma${NUL}rta` }),
    ['query.search'],
  ],
  [
    'admin mail search (query string)',
    () => admin.agent.get('/api/admin/mail').query({ search: `${NUL}` }),
    ['query.search'],
  ],
  ['a path parameter', () => teacher.agent.get('/api/plans/%00'), ['params.id']],
  [
    'a key, not a value',
    () => teacher.agent.post('/api/studio/studios').send({ name: 'Ok', [`x${NUL}`]: 1 }),
    ['x\\0'],
  ],
]

describe('NUL in text', () => {
  it.each(CASES)('when %s holds NUL, then 400 with a field error', async (_label, send, fields) => {
    const res = await send()
    expect(res.status).toBe(400)
    for (const field of fields) expect(res.body.error.fields[field]?.[0]).toMatch(/NUL character/)
  })

  it('when an attempt answer and its detail hold NUL, then 400 names both and nothing is stored', async () => {
    const p = await practiser(api.app)
    const attempt = {
      ...attemptBody(p, randomUUID(), {
        string: 0,
        fret: 3,
        correct: true,
        ms: 900,
        at: new Date().toISOString(),
      }),
      answer: `G${NUL}`,
      detail: { focusReason: `weak${NUL}` },
    }
    const res = await p.agent.post('/api/attempts').send({ attempts: [attempt] })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'attempts.0.answer',
      'attempts.0.detail.focusReason',
    ])
    expect(await api.ctx.db('attempts').where({ id: attempt.id }).first()).toBeUndefined()
  })

  it('when a multipart field holds NUL, then 400 on that field', async () => {
    const res = await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`) // the student's own: checked first
      .field('planItemId', `x${NUL}`)
      .attach('file', Buffer.from('RIFF'), 'take.wav')
    expect(res.status).toBe(400)
    expect(res.body.error.fields.planItemId[0]).toMatch(/NUL character/)
  })
})

// Found by the fuzz run: the NUL walk copied the path at every level, so one 240 kB body of 40,000
// nested objects held the event loop for about a minute and every other caller waited.
describe('deeply nested bodies', () => {
  const nested = (depth: number) => '{"a":'.repeat(depth) + '"x"' + '}'.repeat(depth)

  it('when a body nests 40,000 levels (240 kB), then 400 names where it went too deep and the API answers others', async () => {
    const res = await teacher.agent
      .post('/api/studio/studios')
      .set('content-type', 'application/json')
      .send(nested(40_000))
    expect(res.status).toBe(400)
    const [path, messages] = Object.entries(res.body.error.fields)[0] as [string, string[]]
    expect(path.split('.')).toHaveLength(MAX_BODY_DEPTH)
    expect(messages[0]).toMatch(/Nested too deeply: at most 32 levels/)
    expect((await request(api.app).get('/api/health')).status).toBe(200)
  })

  it('when a body nests exactly as deep as allowed, then the NUL check passes it on to the route', async () => {
    const res = await teacher.agent
      .post('/api/studio/studios')
      .set('content-type', 'application/json')
      .send(nested(MAX_BODY_DEPTH))
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['name']) // the route's own schema speaks
  })
})

describe('database refusals in the one error middleware', () => {
  /** A bare route whose query PostgreSQL itself refuses, behind our one error middleware. */
  function appRunning(query: (db: Knex) => Promise<unknown>) {
    const app = express()
    app.get('/', async (_req, res) => {
      res.json(await query(api.ctx.db))
    })
    app.use(errorHandler)
    return app
  }
  const tooLong = (db: Knex) =>
    db.transaction(async (trx) => {
      await trx.raw('create temp table short_text (v varchar(3)) on commit drop')
      await trx.raw('insert into short_text values (?)', ['four'])
    })

  it.each([
    ['22021 NUL in a text parameter', (db: Knex) => db.raw('select ?::text', [`a${NUL}b`])],
    ['22P02 not a number', (db: Knex) => db.raw('select ?::int', ['twelve'])],
    ['22001 too long for the column', tooLong],
    ['22003 out of range', (db: Knex) => db.raw('select ?::smallint', ['70000'])],
  ])('when PostgreSQL answers %s, then 400', async (_label, query) => {
    const res = await request(appRunning(query)).get('/')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_input')
  })

  it('when a unique key is taken (23505), then 409', async () => {
    const { user } = await signedInAgent(api.app)
    const duplicate = async (db: Knex) => {
      const row = await db('users').where({ id: user.id }).first()
      return db('users').insert({ ...row, id: randomUUID() })
    }
    expect((await request(appRunning(duplicate)).get('/')).status).toBe(409)
  })

  it('when every database connection stays busy past the wait, then 503 with Retry-After', async () => {
    const tiny = knex({
      ...knexConfig(api.ctx.config.databaseUrl),
      pool: { min: 0, max: 1 },
      acquireConnectionTimeout: 300,
    })
    let release!: () => void
    const held = tiny.transaction(() => new Promise<void>((r) => (release = r)))
    try {
      const res = await request(appRunning(() => tiny.raw('select 1'))).get('/')
      expect(res.status).toBe(503)
      expect(res.body.error.code).toBe('busy')
      expect(res.headers['retry-after']).toBe('5')
    } finally {
      release()
      await held
      await tiny.destroy()
    }
  })
})
