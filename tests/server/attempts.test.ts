// POST /api/attempts: batches of graded answers, idempotent on the client's UUID, every field checked.
import { randomUUID } from 'node:crypto'
import type { Express } from 'express'
import type { Response } from 'supertest'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'

let api: TestApi
let app: Express
beforeAll(async () => {
  api = await startTestApi()
  app = api.app
})
afterAll(() => api.close())

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent']
const BASS = [28, 33, 38, 43] // E1 A1 D2 G2

/** A student with their default instrument (the instruments API creates one on first read). */
async function student() {
  const s = await signedInAgent(app, 'student')
  const res = await s.agent.get('/api/instruments')
  return { ...s, instrumentId: res.body.instruments[0].id as string }
}

function attempt(instrumentId: string | null, over: Record<string, unknown> = {}) {
  return {
    id: randomUUID(),
    instrumentId,
    tuning: BASS,
    drill: 'recall',
    sessionId: randomUUID(),
    string: 2,
    fret: 5,
    expectedPitch: 43,
    answer: 'G',
    correct: true,
    responseMs: 1500,
    createdAt: new Date(Date.now() - 60_000).toISOString(),
    detail: {},
    planItemId: null,
    ...over,
  }
}

const post = (agent: Agent, body: unknown) => agent.post('/api/attempts').send(body as object)
const countOf = async (ids: string[]) =>
  Number((await api.ctx.db('attempts').whereIn('id', ids).count({ n: '*' }))[0]!.n)
const fieldsOf = (res: Response) => Object.keys(res.body.error?.fields ?? {})

describe('storing attempts', () => {
  it('when a student posts a new batch, then 201 answers with every stored row and they are in the database', async () => {
    const s = await student()
    const batch = [
      attempt(s.instrumentId),
      attempt(s.instrumentId, {
        correct: false,
        answer: 'F#',
        detail: { focusReason: 'due for review' },
      }),
    ]

    const res = await post(s.agent, { attempts: batch })

    expect(res.status).toBe(201)
    expect(res.body.stored).toBe(2)
    expect(res.body.duplicates).toBe(0)
    expect(res.body.attempts.map((a: { id: string }) => a.id).sort()).toEqual(
      batch.map((a) => a.id).sort(),
    )
    const wrong = res.body.attempts.find((a: { id: string }) => a.id === batch[1]!.id)
    expect(wrong).toMatchObject({
      correct: false,
      answer: 'F#',
      expectedPitch: 43,
      string: 2,
      fret: 5,
      detail: { focusReason: 'due for review' },
    })
    const rows = await api.ctx
      .db('attempts')
      .whereIn(
        'id',
        batch.map((a) => a.id),
      )
      .select('user_id')
    expect(rows.map((r) => r.user_id)).toEqual([s.user.id, s.user.id])
  })

  it('when the same batch is sent again, then 200 says nothing new was stored and no row is duplicated', async () => {
    const s = await student()
    const batch = [attempt(s.instrumentId), attempt(s.instrumentId)]
    await post(s.agent, { attempts: batch })

    const again = await post(s.agent, { attempts: batch })

    expect(again.status).toBe(200)
    expect(again.body).toEqual({ stored: 0, duplicates: 2, attempts: [] })
    expect(await countOf(batch.map((a) => a.id))).toBe(2)
  })

  it('when a batch mixes stored and new attempts, then only the new ones are stored and counted', async () => {
    const s = await student()
    const old = attempt(s.instrumentId)
    await post(s.agent, { attempts: [old] })
    const fresh = attempt(s.instrumentId)

    const res = await post(s.agent, { attempts: [old, fresh] })

    expect(res.status).toBe(201)
    expect(res.body.stored).toBe(1)
    expect(res.body.duplicates).toBe(1)
    expect(res.body.attempts.map((a: { id: string }) => a.id)).toEqual([fresh.id])
  })

  it('when one id appears twice in a batch, then it is stored once', async () => {
    const s = await student()
    const one = attempt(s.instrumentId)

    const res = await post(s.agent, { attempts: [one, { ...one }] })

    expect(res.status).toBe(201)
    expect(res.body.stored).toBe(1)
    expect(res.body.duplicates).toBe(1)
    expect(await countOf([one.id])).toBe(1)
  })

  it('when another student sends an id that is already taken, then the original row is untouched and nothing about it is revealed', async () => {
    const owner = await student()
    const taken = attempt(owner.instrumentId, { answer: 'G' })
    await post(owner.agent, { attempts: [taken] })
    const other = await student()

    const res = await post(other.agent, {
      attempts: [{ ...taken, instrumentId: other.instrumentId, answer: 'Ab', correct: false }],
    })

    expect(res.status).toBe(200)
    expect(res.body).toEqual({ stored: 0, duplicates: 1, attempts: [] })
    const row = await api.ctx.db('attempts').where('id', taken.id).first()
    expect(row).toMatchObject({
      user_id: owner.user.id,
      answer: 'G',
      correct: true,
      instrument_id: owner.instrumentId,
    })
  })

  it('when nobody is signed in, then 401 and nothing is stored', async () => {
    const a = attempt(null)
    const res = await request(app)
      .post('/api/attempts')
      .send({ attempts: [a] })
    expect(res.status).toBe(401)
    expect(await countOf([a.id])).toBe(0)
  })
})

describe('who the attempts belong to', () => {
  it('when a student adds a userId to the batch, then 400 names the field and nothing is stored', async () => {
    const s = await student()
    const victim = await student()
    const a = attempt(s.instrumentId)

    const res = await post(s.agent, { userId: victim.user.id, attempts: [a] })

    expect(res.status).toBe(400)
    expect(res.body.error.fields._ ?? res.body.error.fields.userId).toBeDefined()
    expect(await countOf([a.id])).toBe(0)
  })

  it('when a student adds a userId to an attempt, then 400 names that attempt and nothing is stored', async () => {
    const s = await student()
    const victim = await student()
    const a = { ...attempt(null), userId: victim.user.id }

    const res = await post(s.agent, { attempts: [a] })

    expect(res.status).toBe(400)
    expect(fieldsOf(res).some((k) => k.startsWith('attempts.0'))).toBe(true)
    expect(await countOf([a.id])).toBe(0)
  })

  it("when an attempt names another student's instrument, then 400 points at it and the whole batch is refused", async () => {
    const s = await student()
    const other = await student()
    const mine = attempt(s.instrumentId)
    const theirs = attempt(other.instrumentId)

    const res = await post(s.agent, { attempts: [mine, theirs] })

    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['attempts.1.instrumentId'])
    expect(await countOf([mine.id, theirs.id])).toBe(0)
  })

  it('when an attempt names an instrument that does not exist, then 400 points at it', async () => {
    const s = await student()
    const res = await post(s.agent, { attempts: [attempt(randomUUID())] })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['attempts.0.instrumentId'])
  })

  it('when an instrument used before is deleted, then a later batch naming it gets 400 and nothing is stored', async () => {
    const s = await student()
    const created = await s.agent
      .post('/api/instruments')
      .send({ name: 'Spare bass', tuning: BASS, frets: 20, scaleLengthMm: 864 })
    const spareId = created.body.instrument.id as string
    expect((await post(s.agent, { attempts: [attempt(spareId)] })).status).toBe(201)
    expect((await s.agent.delete(`/api/instruments/${spareId}`)).status).toBe(204)

    const late = attempt(spareId)
    const res = await post(s.agent, { attempts: [late] })

    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/no longer exists/)
    expect(await countOf([late.id])).toBe(0)
  })

  it('when an attempt has no instrument, then it is stored with none', async () => {
    const s = await student()
    const a = attempt(null)
    const res = await post(s.agent, { attempts: [a] })
    expect(res.status).toBe(201)
    expect(res.body.attempts[0].instrumentId).toBeNull()
  })
})

// Every field of the contract with a value it must refuse; the error names exactly that field.
const INVALID: [string, unknown][] = [
  ['id', 'not-a-uuid'],
  ['instrumentId', 'bass'],
  ['tuning', []],
  ['tuning', [28, 33, 38, 43, 48, 53, 58, 63, 68, 73, 78]],
  ['tuning', [28, 128]],
  ['drill', 'scales'],
  ['sessionId', 12],
  ['string', -1],
  ['string', 1.5],
  ['fret', 31],
  ['expectedPitch', 128],
  ['expectedPitch', '43'],
  ['answer', 'x'.repeat(33)],
  ['correct', 'yes'],
  ['responseMs', -1],
  ['responseMs', 600_001],
  ['createdAt', 'yesterday'],
  ['createdAt', '2026-03-01T10:00:00'],
  ['detail', { nested: { deep: true } }],
  ['detail', { note: 'x'.repeat(65) }],
  ['planItemId', 'plan-1'],
]

describe('validation', () => {
  it.each(INVALID)(
    'when %s is %j, then 400 names that field of attempt 0 and nothing is stored',
    async (field, value) => {
      const s = await student()
      const a = attempt(s.instrumentId, { [field]: value })

      const res = await post(s.agent, { attempts: [a] })

      expect(res.status).toBe(400)
      expect(
        fieldsOf(res).some(
          (k) => k === `attempts.0.${field}` || k.startsWith(`attempts.0.${field}.`),
        ),
      ).toBe(true)
      expect(await api.ctx.db('attempts').where('user_id', s.user.id).count({ n: '*' })).toEqual([
        { n: '0' },
      ])
    },
  )

  it.each([
    'id',
    'tuning',
    'drill',
    'sessionId',
    'expectedPitch',
    'answer',
    'correct',
    'responseMs',
    'createdAt',
  ])('when %s is missing, then 400 names it', async (field) => {
    const s = await student()
    const a: Record<string, unknown> = attempt(s.instrumentId)
    delete a[field]
    const res = await post(s.agent, { attempts: [a] })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toContain(`attempts.0.${field}`)
  })

  it('when a string is given without a fret, then 400 names the fret', async () => {
    const s = await student()
    const res = await post(s.agent, { attempts: [attempt(s.instrumentId, { fret: null })] })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['attempts.0.fret'])
  })

  it('when the string is not on the tuning, then 400 names the string', async () => {
    const s = await student()
    const res = await post(s.agent, { attempts: [attempt(s.instrumentId, { string: 4 })] })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['attempts.0.string'])
  })

  it('when an answer is dated two days ahead, then 400 names createdAt', async () => {
    const s = await student()
    const res = await post(s.agent, {
      attempts: [
        attempt(s.instrumentId, { createdAt: new Date(Date.now() + 2 * 86_400_000).toISOString() }),
      ],
    })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['attempts.0.createdAt'])
  })

  it('when the time zone is unknown, then 400 names timeZone', async () => {
    const s = await student()
    const res = await post(s.agent, {
      attempts: [attempt(s.instrumentId)],
      timeZone: 'Mars/Olympus_Mons',
    })
    expect(res.status).toBe(400)
    expect(fieldsOf(res)).toEqual(['timeZone'])
  })

  it('when the body is not JSON, then 400 explains it', async () => {
    const s = await student()
    const res = await s.agent
      .post('/api/attempts')
      .set('content-type', 'application/json')
      .send('{"attempts": [')
    expect(res.status).toBe(400)
    expect(res.body.error.message).toContain('JSON')
  })
})

describe('batch size', () => {
  it('when a batch is empty, then 400 asks for at least one attempt', async () => {
    const s = await student()
    const res = await post(s.agent, { attempts: [] })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.attempts).toEqual(['Send at least one attempt.'])
  })

  it('when a batch holds 200 attempts, then all are stored', async () => {
    const s = await student()
    const batch = Array.from({ length: 200 }, () => attempt(s.instrumentId))
    const res = await post(s.agent, { attempts: batch })
    expect(res.status).toBe(201)
    expect(res.body.stored).toBe(200)
  })

  it('when a batch holds 201 attempts, then 400 names the limit and nothing is stored', async () => {
    const s = await student()
    const batch = Array.from({ length: 201 }, () => attempt(s.instrumentId))
    const res = await post(s.agent, { attempts: batch })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.attempts).toEqual(['At most 200 attempts per request.'])
    expect(await countOf(batch.map((a) => a.id))).toBe(0)
  })
})

describe('days follow the player', () => {
  it('when a batch carries a time zone, then an evening answer counts for that local day', async () => {
    const s = await student()
    // 2026-03-02 02:30 UTC is still 1 March, 18:30, in Los Angeles (UTC−8 in winter).
    const a = attempt(s.instrumentId, { createdAt: '2026-03-02T02:30:00.000Z' })

    const res = await post(s.agent, { attempts: [a], timeZone: 'America/Los_Angeles' })

    expect(res.status).toBe(201)
    expect(await api.ctx.statistics.settle([s.user.id])).toBe(0)
    const days = await api.ctx
      .db('progress_days')
      .where({ user_id: s.user.id, drill: '*' })
      .select(api.ctx.db.raw('day::text as day'))
    expect(days.map((d) => d.day)).toEqual(['2026-03-01', '2026-03-01'])
  })
})

describe('plan items', () => {
  /** A plan with one item, assigned to `studentId` by a teacher (rows written directly). */
  async function assignedItem(studentId: string) {
    const teacher = await signedInAgent(app, 'teacher')
    const [plan] = await api.ctx
      .db('plans')
      .insert({ teacher_id: teacher.user.id, title: 'Test plan' })
      .returning('id')
    const preset = { drill: 'recall', settings: {} }
    const [item] = await api.ctx
      .db('plan_items')
      .insert({ plan_id: plan.id, position: 0, preset, target: { kind: 'sessions', count: 1 } })
      .returning('id')
    await api.ctx.db('plan_assignments').insert({ plan_id: plan.id, student_id: studentId })
    return item.id as string
  }

  it('when an attempt names a plan item assigned to the student, then it is credited to that item', async () => {
    const s = await student()
    const itemId = await assignedItem(s.user.id)
    const a = attempt(s.instrumentId, { planItemId: itemId })
    expect((await post(s.agent, { attempts: [a] })).status).toBe(201)
    expect((await api.ctx.db('attempts').where({ id: a.id }).first()).plan_item_id).toBe(itemId)
  })

  it('when an attempt names a plan item of someone else, then it is kept but not credited to that plan', async () => {
    const s = await student()
    const other = await student()
    const othersItem = await assignedItem(other.user.id)
    const a = attempt(s.instrumentId, { planItemId: othersItem })
    const res = await post(s.agent, { attempts: [a] })
    expect(res.status).toBe(201)
    const row = await api.ctx.db('attempts').where({ id: a.id }).first()
    expect(row.user_id).toBe(s.user.id)
    expect(row.plan_item_id).toBeNull()
  })
})
