// Issue 16 item 5: plan items name strings from the instrument's ends (stored as such; old items
// with string numbers migrated to the same strings counted from the lowest), and the plans list
// says how far each assigned student is.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { up as addRelativeStrings } from '../../db/migrations/20261203101100_add_plan_item_relative_strings'
import { startTestApi, type TestApi } from '../helpers/api'
import {
  createPlan,
  insertAttempts,
  RECALL_ITEM,
  studentIn,
  teacherWithStudio,
  type Agent,
} from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let done: Agent
let started: Agent
const TWO_HIGHEST = { from: 'highest', to: '2nd-highest' }
const relative = (strings: object) => ({
  ...RECALL_ITEM,
  preset: { drill: 'recall', settings: { ...RECALL_ITEM.preset.settings, strings } },
})

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Span Teacher')
  done = await studentIn(api.app, api.ctx, teacher.studioId, 'Ada Done')
  started = await studentIn(api.app, api.ctx, teacher.studioId, 'Bo Started')
})
afterAll(() => api.close())

describe('relative strings in plan items', () => {
  it('when a Neck Recall item names the two highest strings, then the student receives that span', async () => {
    const plan = await createPlan(teacher, {
      items: [relative(TWO_HIGHEST)],
      studentIds: [done.user.id],
    })
    const item = await done.agent.get(`/api/plans/items/${plan.items[0]!.id}`)
    expect(item.status).toBe(200)
    expect(item.body.preset.settings.strings).toEqual(TWO_HIGHEST)
  })

  it('when a string is named in no known way, then 400 names the field', async () => {
    const res = await teacher.agent
      .post('/api/plans')
      .send({ title: 'Odd', items: [relative({ from: 'lowest', to: 'middle' })] })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toContain('items.0.preset.settings.strings.to')
  })

  it('when a plan stored before relative strings is migrated, then its numbers become strings counted from the lowest', async () => {
    const plan = await createPlan(teacher, { title: 'Old plan' })
    const [row] = await api.ctx
      .db('plan_items')
      .where({ plan_id: plan.id })
      .update({
        preset: JSON.stringify({
          drill: 'recall',
          settings: { region: { lowString: 1, highString: 2, lowFret: 0, highFret: 5 } },
        }),
      })
      .returning('id')
    await addRelativeStrings(api.ctx.db)
    const stored = await api.ctx.db('plan_items').where({ id: row.id }).first('preset')
    expect(stored.preset.settings.strings).toEqual({ from: '2nd-lowest', to: '3rd-lowest' })
    expect(stored.preset.settings.region).toMatchObject({ lowString: 1, highString: 2 })
  })
})

describe('per-student completion in the plans list', () => {
  it('when one student met the target and another began, then each assignee says how far', async () => {
    const plan = await createPlan(teacher, {
      title: 'Completion',
      studentIds: [done.user.id, started.user.id],
    })
    const itemId = plan.items[0]!.id
    const right = { correct: true, responseMs: 900 }
    await insertAttempts(api.ctx, done.user.id, itemId, [right, right, right, right])
    await insertAttempts(api.ctx, started.user.id, itemId, [right, right])
    const res = await teacher.agent.get('/api/plans')
    const listed = res.body.plans.find((p: { id: string }) => p.id === plan.id)
    const of = (id: string) =>
      listed.assignees.find((a: { studentId: string }) => a.studentId === id).progress
    expect(of(done.user.id)).toEqual({
      targetsMet: 1,
      targetsTotal: 1,
      share: 1,
      complete: true,
      overdue: false,
    })
    expect(of(started.user.id)).toMatchObject({ targetsMet: 0, complete: false })
    expect(of(started.user.id).share).toBeCloseTo(0.5) // 2 of the 4 answers the target asks
  })
})
