// Issue 16: the roster's weak spots are the weakest places, worst first, by the same rule as the
// heat map (a recent miss counts even on a first week's single answer), spelled as the instrument spells.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let dee: Agent
const place = (string: number, fret: number, results: boolean[]) =>
  results.map((correct) => ({ correct, responseMs: 1200, string, fret }))

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Weak Spot Teacher')
  dee = await studentIn(api.app, api.ctx, teacher.studioId, 'Dee Weakspot')
  await insertAttempts(api.ctx, dee.user.id, null, [
    ...place(2, 7, [true, true, true, true, true]), // 100 %: never a weak spot
    ...place(3, 4, [true, false, true, true]), // 75 %
    ...place(1, 2, [false, true, false, true]), // 50 % over 4 answers
    ...place(0, 1, [true, false]), // 50 % over 2 answers: less sure, after the one above
    ...place(0, 2, [false]), // 0 % on a first answer: the weakest
  ])
  await api.ctx.db('instruments').where({ user_id: dee.user.id }).update({ accidentals: 'sharp' })
})
afterAll(() => api.close())

describe('roster weak spots', () => {
  it('when a student has places at 0 %, 50 % and 100 %, then the roster lists the three weakest worst-first', async () => {
    const res = await teacher.agent.get('/api/studio/roster').query({ search: 'Weakspot' })
    const spots = res.body.items[0].weakSpots as {
      string: number
      fret: number
      accuracy: number
    }[]
    expect(spots.map((s) => [s.string, s.fret, s.accuracy])).toEqual([
      [0, 2, 0],
      [1, 2, 0.5],
      [0, 1, 0.5],
    ])
  })

  it("when the student's instrument spells with sharps, then the weak spot's note is spelled with sharps", async () => {
    const res = await teacher.agent.get(`/api/studio/students/${dee.user.id}`)
    expect(res.status).toBe(200)
    expect(res.body.student.weakSpots[0].label).toMatch(/fret 2 \(F#1\)$/)
  })
})
