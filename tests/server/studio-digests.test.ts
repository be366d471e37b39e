// Scheduled mail: the weekly digest once per ISO week, due-soon reminders once per due date (both
// recorded, so a restarted app does not resend), and the admin action "send digests now".
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { latestMailTo } from '../../server/admin/mail-log-repository'
import { runScheduledJobs } from '../../server/digests/scheduler'
import { digestDue, isoWeek } from '../../server/digests/digest-service'
import { makeAdmin, signedInAgent, startTestApi, waitForMail, type TestApi } from '../helpers/api'
import {
  createPlan,
  insertAttempts,
  studentIn,
  teacherWithStudio,
  type Agent,
} from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let keen: Agent
let quiet: Agent
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Digest Teacher')
  keen = await studentIn(api.app, api.ctx, teacher.studioId, 'Keen Kim')
  quiet = await studentIn(api.app, api.ctx, teacher.studioId, 'Quiet Quinn')
  await insertAttempts(api.ctx, keen.user.id, null, [
    { correct: false, responseMs: 900, string: 2, fret: 7 },
    { correct: false, responseMs: 900, string: 2, fret: 7 },
    { correct: true, responseMs: 900, string: 2, fret: 7 },
    { correct: false, responseMs: 900, string: 2, fret: 7 },
  ])
})
afterAll(() => api.close())

const mailsTo = async (address: string, subjectLike: string) =>
  Number(
    (await api.ctx
      .db('captured_mail')
      .whereRaw('? = any(recipients)', [address])
      .whereILike('subject', subjectLike)
      .count({ n: '*' })
      .first())!.n,
  )

/** The newest mail to the address with exactly this subject, once the sink has stored it. */
async function waitForMailWith(address: string, subject: string) {
  for (let i = 0; i < 50; i++) {
    const mail = await api.ctx
      .db('captured_mail')
      .whereRaw('? = any(recipients)', [address])
      .where({ subject })
      .orderBy('id', 'desc')
      .first('subject', 'text_body as text')
    if (mail) return mail as { subject: string; text: string }
    await new Promise((r) => setTimeout(r, 100))
  }
  throw new Error(`no mail "${subject}" reached ${address}`)
}

/** Runs the jobs, then waits until the sink has stored what they sent (or a moment, when nothing). */
async function runJobs(now: Date) {
  const result = await runScheduledJobs(api.ctx, now)
  await new Promise((r) => setTimeout(r, 300))
  return result
}

describe('weekly digest', () => {
  it('when the scheduler runs twice in a week (also from a restarted app), then the teacher gets one digest', async () => {
    const now = new Date()
    if (!digestDue(now)) now.setUTCHours(8) // early on a Monday the digest waits until 07:00 UTC
    await runJobs(now)
    // Other test files may send "digests now" to every teacher meanwhile: take this week's digest.
    const mail = await waitForMailWith(teacher.email, `Your studio this week (${isoWeek(now)})`)
    expect(mail.subject).toBe(`Your studio this week (${isoWeek(now)})`)
    expect(mail.text).toMatch(/Who practised\n- Keen Kim: (< 1|\d+) min, 4 answers, accuracy 25 %/)
    expect(mail.text).toContain('- Quiet Quinn: no practice in the last 7 days')
    expect(mail.text).toContain('Keen Kim: D string, fret 7 (A2), 25 % of 4 answers') // string 2 of E1 A1 D2 G2; D2 + 7 = A2; 1 of 4
    const restarted = await startTestApi()
    try {
      await runScheduledJobs(restarted.ctx, new Date(now.getTime() + 60_000))
    } finally {
      await restarted.close()
    }
    await new Promise((r) => setTimeout(r, 300))
    // Exactly this subject: digests an admin sends now (other test files do) are marked apart.
    expect(await mailsTo(teacher.email, `Your studio this week (${isoWeek(now)})`)).toBe(1)
  })

  it('when an admin sends digests now, then the teacher gets one at once; others get 403', async () => {
    const admin = await signedInAgent(api.app, 'teacher')
    await makeAdmin(api.ctx, admin.user.id)
    const before = (await latestMailTo(api.ctx.db, teacher.email))?.id ?? 0
    const res = await admin.agent.post('/api/admin/digests/send')
    expect(res.status).toBe(200)
    expect(res.body.sent).toBeGreaterThanOrEqual(1)
    expect((await waitForMail(api.ctx, teacher.email, before)).subject).toBe(
      `Your studio this week (${isoWeek(new Date())}), sent on request`,
    )
    expect((await teacher.agent.post('/api/admin/digests/send')).status).toBe(403)
  })
})

describe('due-soon reminders', () => {
  it('when a plan is due within 24 h and unfinished, then the student is reminded once per due date', async () => {
    const now = new Date()
    await createPlan(teacher, {
      title: 'Due tomorrow',
      studentIds: [quiet.user.id],
      dueAt: new Date(now.getTime() + 20 * 3600 * 1000).toISOString(),
    })
    await createPlan(teacher, {
      title: 'Due next week',
      studentIds: [quiet.user.id],
      dueAt: new Date(now.getTime() + 7 * 24 * 3600 * 1000).toISOString(),
    })
    await runJobs(now)
    await runJobs(new Date(now.getTime() + 60_000))
    expect(await mailsTo(quiet.email, 'Due soon: Due tomorrow')).toBe(1)
    expect(await mailsTo(quiet.email, 'Due soon: Due next week')).toBe(0)
  })
})
