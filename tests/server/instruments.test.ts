// /api/instruments: a player's saved instruments, one active, only their own.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

const FIVE_STRING = {
  name: 'Five-string',
  presetId: 'bass-5',
  tuning: [23, 28, 33, 38, 43], // B0 E1 A1 D2 G2
  frets: 24,
  scaleLengthMm: 889,
}

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent']

async function activeIds(agent: Agent): Promise<string[]> {
  const res = await agent.get('/api/instruments')
  return res.body.instruments
    .filter((i: { isActive: boolean }) => i.isActive)
    .map((i: { id: string }) => i.id)
}

describe('listing', () => {
  it('when a new student has no instrument, then GET returns one active 4-string bass in E A D G', async () => {
    const { agent } = await signedInAgent(api.app)
    const res = await agent.get('/api/instruments')
    expect(res.status).toBe(200)
    expect(res.body.instruments).toHaveLength(1)
    // common practice: a 4-string bass is tuned E1 A1 D2 G2 = MIDI 28 33 38 43 (MIDI 1.0 numbering)
    expect(res.body.instruments[0]).toMatchObject({
      tuning: [28, 33, 38, 43],
      isActive: true,
      presetId: 'bass-4',
    })
    const again = await agent.get('/api/instruments')
    expect(again.body.instruments.map((i: { id: string }) => i.id)).toEqual([
      res.body.instruments[0].id,
    ])
  })

  it('when nobody is signed in, then every instrument route answers 401', async () => {
    expect((await request(api.app).get('/api/instruments')).status).toBe(401)
    expect((await request(api.app).get('/api/instruments/presets')).status).toBe(401)
    expect((await request(api.app).post('/api/instruments').send(FIVE_STRING)).status).toBe(401)
  })

  it('when presets are asked for, then they hold the 5-string bass with B0 at MIDI 23', async () => {
    const { agent } = await signedInAgent(api.app)
    const res = await agent.get('/api/instruments/presets')
    expect(res.status).toBe(200)
    const five = res.body.presets.find((p: { id: string }) => p.id === 'bass-5')
    // scientific pitch notation: B0 = 12·(0+1) + 11 = 23
    expect(five.pitches[0]).toBe(23)
    // 35 in × 25.4 mm/in = 889 mm (arithmetic)
    expect(five.scaleLengthMm).toBe(889)
  })
})

describe('creating and changing', () => {
  it('when a student adds a second instrument, then it is saved inactive and listed after the active one', async () => {
    const { agent } = await signedInAgent(api.app)
    const first = (await agent.get('/api/instruments')).body.instruments[0]
    const res = await agent.post('/api/instruments').send(FIVE_STRING)
    expect(res.status).toBe(201)
    expect(res.body.instrument).toMatchObject({
      ...FIVE_STRING,
      isActive: false,
      referenceHz: 440,
      handedness: 'right',
    })
    const list = (await agent.get('/api/instruments')).body.instruments
    expect(list.map((i: { id: string }) => i.id)).toEqual([first.id, res.body.instrument.id])
  })

  it('when the tuning is listed high to low, then 400 names the tuning field with the theory core message', async () => {
    const { agent } = await signedInAgent(api.app)
    const res = await agent.post('/api/instruments').send({ ...FIVE_STRING, tuning: [43, 38, 33] })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.tuning).toEqual(['List the open strings lowest-pitched first.'])
  })

  it('when fields are missing or out of range, then 400 lists each of them', async () => {
    const { agent } = await signedInAgent(api.app)
    const res = await agent
      .post('/api/instruments')
      .send({ name: '', tuning: [], frets: 40, scaleLengthMm: 5, referenceHz: 1000 })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'frets',
      'name',
      'referenceHz',
      'scaleLengthMm',
      'tuning',
    ])
  })

  it('when an unknown preset id is sent, then 400 names presetId', async () => {
    const { agent } = await signedInAgent(api.app)
    const res = await agent.post('/api/instruments').send({ ...FIVE_STRING, presetId: 'banjo-5' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.presetId[0]).toContain('banjo-5')
  })

  it('when a student patches handedness, then only that field changes', async () => {
    const { agent } = await signedInAgent(api.app)
    const created = (await agent.post('/api/instruments').send({ ...FIVE_STRING, volume: 0.3 }))
      .body.instrument
    const res = await agent.patch(`/api/instruments/${created.id}`).send({ handedness: 'left' })
    expect(res.status).toBe(200)
    expect(res.body.instrument).toEqual({ ...created, handedness: 'left' })
  })

  it('when a patch would leave the tuning unplayable, then 400 and nothing is saved', async () => {
    const { agent } = await signedInAgent(api.app)
    const created = (await agent.post('/api/instruments').send(FIVE_STRING)).body.instrument
    const res = await agent
      .patch(`/api/instruments/${created.id}`)
      .send({ tuning: [120, 125], frets: 24 })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.tuning[0]).toContain('above MIDI note 127')
    const list = (await agent.get('/api/instruments')).body.instruments
    expect(list.find((i: { id: string }) => i.id === created.id).tuning).toEqual(FIVE_STRING.tuning)
  })

  it('when a patch is empty or has unknown fields, then 400', async () => {
    const { agent } = await signedInAgent(api.app)
    const created = (await agent.post('/api/instruments').send(FIVE_STRING)).body.instrument
    expect((await agent.patch(`/api/instruments/${created.id}`).send({})).status).toBe(400)
    expect(
      (await agent.patch(`/api/instruments/${created.id}`).send({ isActive: true })).status,
    ).toBe(400)
    expect(
      (await agent.patch('/api/instruments/not-a-uuid').send({ name: 'x' })).body.error.fields[
        'params.id'
      ],
    ).toBeDefined()
  })
})

describe('activating and deleting', () => {
  it('when another instrument is activated, then it is the only active one and listed first', async () => {
    const { agent } = await signedInAgent(api.app)
    await agent.get('/api/instruments')
    const second = (await agent.post('/api/instruments').send(FIVE_STRING)).body.instrument
    const res = await agent.post(`/api/instruments/${second.id}/activate`)
    expect(res.status).toBe(200)
    expect(res.body.instrument.isActive).toBe(true)
    expect(await activeIds(agent)).toEqual([second.id])
    expect((await agent.get('/api/instruments')).body.instruments[0].id).toBe(second.id)
  })

  it('when activations race, then exactly one instrument ends up active', async () => {
    const { agent } = await signedInAgent(api.app)
    await agent.get('/api/instruments')
    const ids = await Promise.all(
      [1, 2, 3].map(
        async (n) =>
          (await agent.post('/api/instruments').send({ ...FIVE_STRING, name: `Bass ${n}` })).body
            .instrument.id,
      ),
    )
    const results = await Promise.all(
      ids.map((id) => agent.post(`/api/instruments/${id}/activate`)),
    )
    expect(results.map((r) => r.status)).toEqual([200, 200, 200])
    expect(await activeIds(agent)).toHaveLength(1)
  })

  it('when the only instrument is deleted, then 409 explains that one must remain', async () => {
    const { agent } = await signedInAgent(api.app)
    const only = (await agent.get('/api/instruments')).body.instruments[0]
    const res = await agent.delete(`/api/instruments/${only.id}`)
    expect(res.status).toBe(409)
    expect(res.body.error.message).toContain('at least one')
  })

  it('when the active instrument is deleted, then another becomes active', async () => {
    const { agent } = await signedInAgent(api.app)
    const first = (await agent.get('/api/instruments')).body.instruments[0]
    const second = (await agent.post('/api/instruments').send(FIVE_STRING)).body.instrument
    expect((await agent.delete(`/api/instruments/${first.id}`)).status).toBe(204)
    expect(await activeIds(agent)).toEqual([second.id])
  })
})

describe('ownership', () => {
  it("when a student touches another player's instrument, then every route answers 404 and nothing changes", async () => {
    const owner = await signedInAgent(api.app)
    const theirs = (await owner.agent.post('/api/instruments').send(FIVE_STRING)).body.instrument
    const { agent } = await signedInAgent(api.app)
    expect(
      (await agent.patch(`/api/instruments/${theirs.id}`).send({ name: 'Mine now' })).status,
    ).toBe(404)
    expect((await agent.post(`/api/instruments/${theirs.id}/activate`)).status).toBe(404)
    expect((await agent.delete(`/api/instruments/${theirs.id}`)).status).toBe(404)
    const list = (await owner.agent.get('/api/instruments')).body.instruments
    expect(list.map((i: { name: string }) => i.name)).toEqual(['Five-string'])
    expect(
      (await agent.get('/api/instruments')).body.instruments.map((i: { id: string }) => i.id),
    ).not.toContain(theirs.id)
  })
})
