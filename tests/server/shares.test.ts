// /api/shares: a link to one generated exercise, readable without an account until it is revoked.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { MAX_OPEN_SHARES } from '../../src/contract/shares'
import { signedInAdmin, signedInAgent, startTestApi, type TestApi } from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

// common practice: a 4-string bass is tuned E1 A1 D2 G2 = MIDI 28 33 38 43 (MIDI 1.0 numbering)
const BASS = { name: 'Cedar Hollow loaner bass', tuning: [28, 33, 38, 43], frets: 20 }
const SCATTER_SHARE = {
  preset: { drill: 'scatter', settings: { tonic: 'A', scale: 'minor', seed: 4711 } },
  title: 'A minor octave scatter',
  instrument: BASS,
}

async function share(agent: Awaited<ReturnType<typeof signedInAgent>>['agent'], body: object) {
  const res = await agent.post('/api/shares').send(body)
  expect(res.status, JSON.stringify(res.body)).toBe(201)
  return res.body.share as { token: string; revokedAt: string | null }
}

describe('making and opening a link', () => {
  it('when a teacher shares a scatter with its seed, then anyone opens the same settings without an account', async () => {
    const { agent } = await signedInAgent(api.app, 'teacher', 'Rowan Teacher')
    const made = await share(agent, SCATTER_SHARE)
    expect(made.token).toMatch(/^[A-Za-z0-9_-]{22}$/)
    expect(made.revokedAt).toBeNull()

    const res = await request(api.app).get(`/api/shares/${made.token}`)
    expect(res.status).toBe(200)
    expect(res.headers['cache-control']).toBe('no-store')
    expect(res.body.share).toMatchObject({
      token: made.token,
      title: 'A minor octave scatter',
      sharedBy: 'Rowan Teacher',
      instrument: BASS,
      fingering: null,
      preset: { drill: 'scatter', settings: { tonic: 'A', scale: 'minor', seed: 4711 } },
    })
    // the contract's defaults are filled in, so the page regenerates with the same settings
    expect(res.body.share.preset.settings.minDisplaced).toBe(2)
    expect(res.body.share).not.toHaveProperty('ownerId')
    expect(res.body.share).not.toHaveProperty('revokedAt')
  })

  it('when a student shares a run with its fingering, then the link keeps the fingering', async () => {
    const { agent } = await signedInAgent(api.app)
    const made = await share(agent, {
      preset: { drill: 'runs', settings: { tonic: 'G', scale: 'major', lowFret: 2, highFret: 5 } },
      fingering: '0:2-3-3-3',
      title: 'G major range run',
      instrument: BASS,
    })
    const res = await request(api.app).get(`/api/shares/${made.token}`)
    expect(res.body.share.fingering).toBe('0:2-3-3-3')
  })

  it('when the token is unknown or malformed, then 404 and 400', async () => {
    expect((await request(api.app).get('/api/shares/AAAAAAAAAAAAAAAAAAAAAA')).status).toBe(404)
    const bad = await request(api.app).get('/api/shares/not-a-token')
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields).toHaveProperty(['params.token'])
  })
})

describe('bad input', () => {
  it('when nobody is signed in, then making or listing links answers 401', async () => {
    expect((await request(api.app).post('/api/shares').send(SCATTER_SHARE)).status).toBe(401)
    expect((await request(api.app).get('/api/shares')).status).toBe(401)
  })

  it('when the drill cannot be shared, the settings are wrong or the tuning is unplayable, then 400 with the field', async () => {
    const { agent } = await signedInAgent(api.app)
    const recall = await agent.post('/api/shares').send({
      ...SCATTER_SHARE,
      preset: { drill: 'recall', settings: {} },
    })
    expect(recall.status).toBe(400)
    expect(recall.body.error.fields).toHaveProperty(['preset.drill'])

    const tonic = await agent.post('/api/shares').send({
      ...SCATTER_SHARE,
      preset: { drill: 'scatter', settings: { tonic: 'H', scale: 'minor' } },
    })
    expect(tonic.status).toBe(400)
    expect(Object.keys(tonic.body.error.fields).join()).toContain('tonic')

    const tuning = await agent
      .post('/api/shares')
      .send({ ...SCATTER_SHARE, instrument: { ...BASS, tuning: [43, 38, 33, 28] } })
    expect(tuning.status).toBe(400)
    expect(tuning.body.error.fields).toHaveProperty(['instrument.tuning'])

    const fingering = await agent.post('/api/shares').send({ ...SCATTER_SHARE, fingering: 'x' })
    expect(fingering.status).toBe(400)
    expect(fingering.body.error.fields).toHaveProperty(['fingering'])
  })
})

describe('listing and revoking', () => {
  it('when the owner revokes a link, then it answers 410 and the list shows it revoked', async () => {
    const { agent } = await signedInAgent(api.app, 'teacher')
    const made = await share(agent, SCATTER_SHARE)
    const list = await agent.get('/api/shares')
    expect(list.body.shares.map((s: { token: string }) => s.token)).toEqual([made.token])

    expect((await agent.delete(`/api/shares/${made.token}`)).status).toBe(204)
    const gone = await request(api.app).get(`/api/shares/${made.token}`)
    expect(gone.status).toBe(410)
    expect(gone.body.error.message).toMatch(/withdrawn/)
    expect((await agent.delete(`/api/shares/${made.token}`)).status).toBe(204)
    const after = await agent.get('/api/shares')
    expect(after.body.shares[0].revokedAt).not.toBeNull()
  })

  it('when someone else tries to revoke a link, then 403 and it still opens; an admin may revoke it', async () => {
    const owner = await signedInAgent(api.app, 'teacher')
    const made = await share(owner.agent, SCATTER_SHARE)
    const other = await signedInAgent(api.app)
    expect((await other.agent.delete(`/api/shares/${made.token}`)).status).toBe(403)
    expect((await other.agent.get('/api/shares')).body.shares).toEqual([])
    expect((await request(api.app).get(`/api/shares/${made.token}`)).status).toBe(200)

    const admin = await signedInAdmin(api.app)
    expect((await admin.agent.delete(`/api/shares/${made.token}`)).status).toBe(204)
    expect((await request(api.app).get(`/api/shares/${made.token}`)).status).toBe(410)
  })

  it('when a revoke comes without the anti-CSRF header, then 403 and the link stays', async () => {
    const { agent } = await signedInAgent(api.app)
    const made = await share(agent, SCATTER_SHARE)
    const cookies = (await agent.get('/api/shares')).request.cookies
    const res = await request(api.bareApp)
      .delete(`/api/shares/${made.token}`)
      .set('Cookie', cookies)
    expect(res.status).toBe(403)
    expect((await request(api.app).get(`/api/shares/${made.token}`)).status).toBe(200)
  })

  it(`when an account already has ${MAX_OPEN_SHARES} open links, then the next is refused with 409`, async () => {
    const { agent, user } = await signedInAgent(api.app)
    const rows = Array.from({ length: MAX_OPEN_SHARES }, (_, i) => ({
      token: `filler${String(i).padStart(16, '0')}`,
      owner_id: user.id,
      drill: 'scatter',
      settings: JSON.stringify(SCATTER_SHARE.preset.settings),
      title: 'filler',
      instrument_name: BASS.name,
      tuning: BASS.tuning,
      frets: BASS.frets,
    }))
    await api.ctx.db('shared_exercises').insert(rows)
    const res = await agent.post('/api/shares').send(SCATTER_SHARE)
    expect(res.status).toBe(409)
    expect(res.body.error.message).toMatch(/revoke/)
  })
})
