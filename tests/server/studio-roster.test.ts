// The teacher's roster: server-side paging, sorting, search and filters; status; CSV exports; and
// the outside contract GET /api/studio/students.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import {
  createPlan,
  insertAttempts,
  studentIn,
  teacherWithStudio,
  type Agent,
} from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let ada: Agent, bo: Agent, cy: Agent
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Roster Teacher')
  ada = await studentIn(api.app, api.ctx, teacher.studioId, 'Ada Quill')
  bo = await studentIn(api.app, api.ctx, teacher.studioId, 'Bo Lee, Jr.')
  cy = await studentIn(api.app, api.ctx, teacher.studioId, 'Cy Moss')
  // Ada: 4 answers, 3 right (0.75); Bo: 2 of 2 right (1.0); Cy: no practice at all.
  await insertAttempts(api.ctx, ada.user.id, null, [
    { correct: true, responseMs: 900 },
    { correct: false, responseMs: 2500 },
    { correct: true, responseMs: 1100 },
    { correct: true, responseMs: 1000 },
  ])
  await insertAttempts(api.ctx, bo.user.id, null, [
    { correct: true, responseMs: 800 },
    { correct: true, responseMs: 700 },
  ])
  // Bo has a plan that was due yesterday and is not done: behind.
  await createPlan(teacher, {
    studentIds: [bo.user.id],
    dueAt: new Date(Date.now() - 24 * 3600 * 1000).toISOString(),
  })
})
afterAll(() => api.close())

type Row = {
  name: string
  status: string
  accuracy: number | null
  lastPracticeAt: string | null
  plans: { overdue: number }
}
const names = (items: Row[]) => items.map((r) => r.name)

describe('roster', () => {
  it('when the teacher pages the roster by name, then each page holds pageSize rows and total counts all', async () => {
    const first = await teacher.agent
      .get('/api/studio/roster')
      .query({ page: 1, pageSize: 2, sortBy: 'name' })
    expect(first.status).toBe(200)
    expect(first.body.total).toBe(3)
    expect(names(first.body.items)).toEqual(['Ada Quill', 'Bo Lee, Jr.'])
    const second = await teacher.agent
      .get('/api/studio/roster')
      .query({ page: 2, pageSize: 2, sortBy: 'name' })
    expect(names(second.body.items)).toEqual(['Cy Moss'])
  })

  it('when sorted by accuracy descending, then the figures come from the attempts and no-practice goes last', async () => {
    const res = await teacher.agent
      .get('/api/studio/roster')
      .query({ sortBy: 'accuracy', sortDesc: true })
    const items: Row[] = res.body.items
    expect(names(items)).toEqual(['Bo Lee, Jr.', 'Ada Quill', 'Cy Moss'])
    expect(items.map((r) => r.accuracy)).toEqual([1, 0.75, null])
    expect(items[1]!.lastPracticeAt).not.toBeNull()
  })

  it('when filtered by status or searched, then only matching students come back', async () => {
    const behind = await teacher.agent.get('/api/studio/roster').query({ status: 'behind' })
    expect(names(behind.body.items)).toEqual(['Bo Lee, Jr.'])
    expect(behind.body.items[0].plans.overdue).toBe(1)
    const inactive = await teacher.agent.get('/api/studio/roster').query({ status: 'inactive' })
    expect(names(inactive.body.items)).toEqual(['Cy Moss'])
    const search = await teacher.agent.get('/api/studio/roster').query({ search: 'quill' })
    expect(names(search.body.items)).toEqual(['Ada Quill'])
  })

  it('when filtered by a studio, then only its members come back', async () => {
    const second = await teacher.agent.post('/api/studio/studios').send({ name: 'Saturday group' })
    await api.ctx
      .db('studio_members')
      .insert({ studio_id: second.body.studio.id, student_id: cy.user.id })
    const res = await teacher.agent
      .get('/api/studio/roster')
      .query({ studio: second.body.studio.id })
    expect(names(res.body.items)).toEqual(['Cy Moss'])
    expect(res.body.items[0].studios).toHaveLength(2)
    await api.ctx.db('studio_members').where({ studio_id: second.body.studio.id }).delete()
  })

  it('when the query is not understood, then 400 names the fields', async () => {
    const res = await teacher.agent
      .get('/api/studio/roster')
      .query({ sortBy: 'shoe size', pageSize: 1000, status: 'asleep' })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'query.pageSize',
      'query.sortBy',
      'query.status',
    ])
  })

  it('when the outside contract GET /api/studio/students is called, then it lists the students with their figures', async () => {
    const res = await teacher.agent.get('/api/studio/students')
    const adaRow = res.body.students.find((s: { id: string }) => s.id === ada.user.id)
    expect(adaRow).toMatchObject({ name: 'Ada Quill', email: ada.email, accuracy: 0.75 })
    expect(adaRow.lastPracticeAt).toEqual(expect.any(String))
    expect((await ada.agent.get('/api/studio/students')).status).toBe(403)
  })
})

describe('CSV exports', () => {
  it('when the teacher exports the roster, then a text/csv attachment lists every student with proper quoting', async () => {
    const res = await teacher.agent.get('/api/studio/roster.csv').query({ sortBy: 'name' })
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8')
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?roster-\d{4}-\d\d-\d\d\.csv"?$/,
    )
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n')
    expect(lines).toHaveLength(4)
    expect(lines[0]).toMatch(/^Name,E-mail,Studios,Status,/)
    expect(lines[2]).toMatch(/^"Bo Lee, Jr\.",/)
    expect(lines[2]).toContain(',Behind,')
  })

  it("when the teacher exports a student's results, then there is one row per answer; another teacher gets 403", async () => {
    const res = await teacher.agent.get(`/api/studio/students/${ada.user.id}/results.csv`)
    expect(res.status).toBe(200)
    expect(res.headers['content-disposition']).toMatch(/filename="?ada-quill-results\.csv"?$/)
    const lines = res.text.trim().split('\r\n')
    expect(lines).toHaveLength(1 + 4)
    expect(lines.slice(1).filter((l) => l.includes(',Neck Recall,2,3,C2,')).length).toBe(4) // string index 1 → "2", E1 + 8 = C2
    const other = await teacherWithStudio(api.app)
    expect((await other.agent.get(`/api/studio/students/${ada.user.id}/results.csv`)).status).toBe(
      403,
    )
    expect(
      (
        await teacher.agent
          .get(`/api/studio/students/${ada.user.id}/results.csv`)
          .query({ from: '2026-13-01' })
      ).status,
    ).toBe(400)
  })
})
