// Practice plans: create, validate, edit (items keep their ids), copy, assign (with mail), the plan
// item a drill view opens, and target progress computed from the student's attempts.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, waitForMail, type TestApi } from '../helpers/api'
import {
  CYCLE_ITEM,
  RECALL_ITEM,
  createPlan,
  insertAttempts,
  planBody,
  studentIn,
  teacherWithStudio,
} from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

describe('creating and editing plans', () => {
  it('when a teacher creates a plan for a student, then the student gets a mail and sees the plan', async () => {
    const teacher = await teacherWithStudio(api.app, 'Marit Solberg')
    const student = await studentIn(api.app, api.ctx, teacher.studioId, 'Ola')
    const res = await teacher.agent
      .post('/api/plans')
      .send(planBody({ studentIds: [student.user.id] }))
    expect(res.status).toBe(201)
    expect(res.body.plan.assignees.map((a: { studentId: string }) => a.studentId)).toEqual([
      student.user.id,
    ])
    const mail = await waitForMail(api.ctx, student.email)
    expect(mail.subject).toBe('New practice plan: Week 1: first position')
    expect(mail.text).toContain('Neck Recall')
    const assigned = await student.agent.get('/api/plans/assigned')
    expect(assigned.body.assignments).toHaveLength(1)
    expect(assigned.body.assignments[0]).toMatchObject({
      title: 'Week 1: first position',
      teacher: { name: 'Marit Solberg' },
      targetsMet: 0,
    })
  })

  it('when the plan is invalid, then 400 lists every field that needs attention', async () => {
    const teacher = await teacherWithStudio(api.app)
    const res = await teacher.agent.post('/api/plans').send({
      title: '',
      items: [
        { preset: { drill: 'recall', settings: {} }, target: { kind: 'all-keys' } },
        { ...CYCLE_ITEM, preset: { drill: 'cycle', settings: { low: 40, high: 47 } } },
      ],
    })
    expect(res.status).toBe(400)
    const fields = Object.keys(res.body.error.fields)
    expect(fields).toEqual(
      expect.arrayContaining([
        'title',
        'items.0.preset.settings.region',
        'items.1.preset.settings.high',
      ]),
    )
    expect(res.body.error.fields['items.1.preset.settings.high'][0]).toContain('missing')
  })

  it('when "every key" is asked of a drill without keys, then 400 on the target', async () => {
    const teacher = await teacherWithStudio(api.app)
    const res = await teacher.agent
      .post('/api/plans')
      .send(planBody({ items: [{ ...RECALL_ITEM, target: { kind: 'all-keys' } }] }))
    expect(res.status).toBe(400)
    expect(res.body.error.fields['items.0.target.kind']).toBeDefined()
  })

  it('when a plan is edited, then kept items keep their id, new ones get one and removed ones go', async () => {
    const teacher = await teacherWithStudio(api.app)
    const plan = await createPlan(teacher, { items: [RECALL_ITEM, CYCLE_ITEM] })
    const [recall] = plan.items
    const res = await teacher.agent
      .put(`/api/plans/${plan.id}`)
      .send(planBody({ title: 'Renamed', items: [CYCLE_ITEM, { ...RECALL_ITEM, id: recall!.id }] }))
    expect(res.status).toBe(200)
    expect(res.body.plan.title).toBe('Renamed')
    const ids = res.body.plan.items.map((i: { id: string }) => i.id)
    expect(ids[1]).toBe(recall!.id)
    expect(ids[0]).not.toBe(plan.items[1]!.id)
    expect(res.body.plan.items.map((i: { preset: { drill: string } }) => i.preset.drill)).toEqual([
      'cycle',
      'recall',
    ])
  })

  it('when a plan is copied, then the copy has the same items, new ids and nobody assigned', async () => {
    const teacher = await teacherWithStudio(api.app)
    const student = await studentIn(api.app, api.ctx, teacher.studioId)
    const plan = await createPlan(teacher, { studentIds: [student.user.id] })
    const res = await teacher.agent.post(`/api/plans/${plan.id}/copy`)
    expect(res.status).toBe(201)
    expect(res.body.plan).toMatchObject({ title: 'Week 1: first position (copy)', assignees: [] })
    expect(res.body.plan.items[0].preset).toEqual(
      (await teacher.agent.get(`/api/plans/${plan.id}`)).body.plan.items[0].preset,
    )
    expect(res.body.plan.items[0].id).not.toBe(plan.items[0]!.id)
    expect((await teacher.agent.get('/api/plans')).body.plans).toHaveLength(2)
  })

  it('when a teacher assigns to someone outside their studios, then 403 and nothing is assigned', async () => {
    const teacher = await teacherWithStudio(api.app)
    const stranger = await signedInAgent(api.app)
    const plan = await createPlan(teacher)
    const res = await teacher.agent
      .post(`/api/plans/${plan.id}/assignments`)
      .send({ studentIds: [stranger.user.id] })
    expect(res.status).toBe(403)
    expect((await teacher.agent.get(`/api/plans/${plan.id}`)).body.plan.assignees).toEqual([])
  })

  it('when a teacher unassigns and deletes, then the student no longer sees the plan', async () => {
    const teacher = await teacherWithStudio(api.app)
    const student = await studentIn(api.app, api.ctx, teacher.studioId)
    const plan = await createPlan(teacher, { studentIds: [student.user.id] })
    const res = await teacher.agent.delete(`/api/plans/${plan.id}/assignments/${student.user.id}`)
    expect(res.body.plan.assignees).toEqual([])
    expect((await student.agent.get('/api/plans/assigned')).body.assignments).toEqual([])
    expect((await teacher.agent.delete(`/api/plans/${plan.id}`)).status).toBe(204)
    expect((await teacher.agent.get(`/api/plans/${plan.id}`)).status).toBe(404)
  })

  it('when a teacher asks for the starter library, then our starter plans come back', async () => {
    const teacher = await teacherWithStudio(api.app)
    const res = await teacher.agent.get('/api/plans/starters')
    expect(res.body.starters.map((s: { title: string }) => s.title)).toContain(
      'First position note names',
    )
  })
})

describe('plan items and target progress', () => {
  it('when the assigned student opens a plan item, then it comes with its preset, target and due date', async () => {
    const teacher = await teacherWithStudio(api.app)
    const student = await studentIn(api.app, api.ctx, teacher.studioId)
    const plan = await createPlan(teacher, { studentIds: [student.user.id] })
    const res = await student.agent.get(`/api/plans/items/${plan.items[0]!.id}`)
    expect(res.status).toBe(200)
    expect(res.body).toEqual({
      id: plan.items[0]!.id,
      planId: plan.id,
      planTitle: 'Week 1: first position',
      preset: expect.objectContaining({ drill: 'recall' }),
      target: RECALL_ITEM.target,
      dueAt: expect.any(String),
    })
    expect((await teacher.agent.get(`/api/plans/items/${plan.items[0]!.id}`)).status).toBe(200)
  })

  it('when the student has practised the item, then progress follows their attempts for it (and only those)', async () => {
    const teacher = await teacherWithStudio(api.app)
    const student = await studentIn(api.app, api.ctx, teacher.studioId)
    const plan = await createPlan(teacher, {
      studentIds: [student.user.id],
      items: [RECALL_ITEM, CYCLE_ITEM],
    })
    const [recall, cycle] = plan.items.map((i) => i.id)
    // last 4 recall answers: 3 right (0.75), times 900 1000 1100 3000 → median 1050 ≤ 2000: met
    await insertAttempts(api.ctx, student.user.id, recall!, [
      { correct: false, responseMs: 400 },
      { correct: true, responseMs: 900 },
      { correct: false, responseMs: 3000 },
      { correct: true, responseMs: 1000 },
      { correct: true, responseMs: 1100 },
    ])
    await insertAttempts(api.ctx, student.user.id, null, [{ correct: false, responseMs: 9000 }]) // free practice
    await insertAttempts(api.ctx, student.user.id, cycle!, [
      { correct: true, responseMs: 800, drill: 'cycle', detail: { key: 'C' } },
      { correct: true, responseMs: 800, drill: 'cycle', detail: { key: 'F' } },
    ])
    const [assignment] = (await student.agent.get('/api/plans/assigned')).body.assignments
    expect(assignment.items[0].progress).toEqual({
      kind: 'accuracy',
      met: true,
      ratio: 1,
      attempts: 4,
      needed: 4,
      accuracy: 0.75,
      medianMs: 1050,
    })
    expect(assignment.items[1].progress).toMatchObject({
      kind: 'all-keys',
      met: false,
      keysPlayed: ['C', 'F'],
      keysMissing: ['Bb'],
    })
    expect(assignment).toMatchObject({ targetsMet: 1, complete: false })
    const teacherView = await teacher.agent.get(
      `/api/studio/students/${student.user.id}/assignments`,
    )
    expect(teacherView.body.assignments[0].items[0].progress.met).toBe(true)
  })
})
