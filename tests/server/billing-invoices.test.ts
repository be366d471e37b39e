// Lesson billing (issue 18): prices and packages, invoices from lessons or a package, numbers per
// studio without gaps under concurrency, states, PDF and mail, the ledger, and who sees what.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAdmin, startTestApi, waitForMail, type TestApi } from '../helpers/api'
import { issuedPackageInvoice, lessonsWith, priceStudio } from '../helpers/billing'
import { studentIn, teacherWithStudio, type Agent } from '../helpers/studio'
import { sendInvoiceReminders } from '../../server/billing/reminders-service'
import { binary, embeddedFonts, readPdf } from '../helpers/pdf-reader'

let api: TestApi
let teacher: Agent & { studioId: string }
let other: Agent & { studioId: string }
let student: Agent
let packageId: string
beforeAll(async () => {
  api = await startTestApi({ mailSendsPerHour: 1000 })
  teacher = await teacherWithStudio(api.app, 'Billing Teacher')
  other = await teacherWithStudio(api.app, 'Other Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Billing Student')
  packageId = (await priceStudio(teacher)).packageId
})
afterAll(() => api.close())

describe('prices', () => {
  it('when a teacher sets prices in KWD, then they come back in minor units with the currency', async () => {
    const own = await teacherWithStudio(api.app, 'Dinar Teacher')
    const res = await own.agent.put(`/api/billing/studios/${own.studioId}`).send({
      currency: 'KWD',
      paymentDays: 7,
      prices: [{ durationMinutes: 60, amountMinor: 12500 }],
    })
    expect(res.status).toBe(200)
    expect(res.body.settings).toMatchObject({
      currency: 'KWD',
      paymentDays: 7,
      prices: [{ durationMinutes: 60, amountMinor: 12500 }],
    })
  })

  it('when a price is a fraction or the currency unknown, then 400 names the fields', async () => {
    const res = await teacher.agent.put(`/api/billing/studios/${teacher.studioId}`).send({
      currency: 'XXX',
      paymentDays: 14,
      prices: [{ durationMinutes: 45, amountMinor: 45.5 }],
    })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['currency', 'prices.0.amountMinor'])
  })

  it("when another teacher reads or sets this studio's prices, then 403", async () => {
    const read = await other.agent.get(`/api/billing/studios/${teacher.studioId}`)
    const write = await other.agent
      .post(`/api/billing/studios/${teacher.studioId}/packages`)
      .send({ name: 'Mine', lessons: 4, validWeeks: 4, amountMinor: 100 })
    expect([read.status, write.status]).toEqual([403, 403])
  })
})

describe('invoices', () => {
  it('when lessons are invoiced, then each is priced by its length and billed once', async () => {
    const ids = await lessonsWith(teacher, student.user.id, 2)
    const draft = await teacher.agent
      .post('/api/billing/invoices')
      .send({ studentId: student.user.id, lessonIds: ids })
    expect(draft.status).toBe(201)
    expect(draft.body.invoice).toMatchObject({ status: 'draft', number: null, totalMinor: 9000 })
    expect(draft.body.invoice.lines).toHaveLength(2)
    const again = await teacher.agent
      .post('/api/billing/invoices')
      .send({ studentId: student.user.id, lessonIds: [ids[0]] })
    expect(again.status).toBe(409)
    expect(again.body.error.fields.lessonIds).toBeDefined()
  })

  it('when a lesson length has no price, then 400 says which', async () => {
    const res = await teacher.agent.post('/api/lessons').send({
      studentId: student.user.id,
      date: '2026-11-20',
      time: '10:00',
      timeZone: 'Europe/Tallinn',
      durationMinutes: 30,
    })
    const draft = await teacher.agent
      .post('/api/billing/invoices')
      .send({ studentId: student.user.id, lessonIds: [res.body.lessons[0].id] })
    expect(draft.status).toBe(400)
    expect(draft.body.error.fields.lessonIds[0]).toContain('30-minute')
  })

  it('when 12 drafts are issued at once, then they get the numbers 1… without gaps or doubles', async () => {
    const own = await teacherWithStudio(api.app, 'Busy Teacher')
    const pupil = await studentIn(api.app, api.ctx, own.studioId, 'Busy Student')
    const { packageId: pkg } = await priceStudio(own)
    const drafts = await Promise.all(
      Array.from({ length: 12 }, () =>
        own.agent.post('/api/billing/invoices').send({ studentId: pupil.user.id, packageId: pkg }),
      ),
    )
    const ids = drafts.map((d) => d.body.invoice.id as string)
    // The first draft is issued twice at once: one 200, one 409, one number.
    const issued = await Promise.all(
      [...ids, ids[0]].map((id) => own.agent.post(`/api/billing/invoices/${id}/issue`)),
    )
    expect(issued.filter((r) => r.status === 409)).toHaveLength(1)
    const numbers = issued.filter((r) => r.status === 200).map((r) => r.body.invoice.number)
    expect(numbers.sort((a, b) => a - b)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1))
  })

  it('when an invoice is issued, then the student gets it by mail and reads it, PDF included', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const mail = await waitForMail(api.ctx, student.email)
    expect(mail.subject).toContain(`Invoice ${invoice.number}`)
    expect(mail.text).toContain('€400.00')
    const list = await student.agent.get('/api/billing/invoices')
    expect(list.body.invoices.map((i: { id: string }) => i.id)).toContain(invoice.id)
    const pdf = await student.agent
      .get(`/api/billing/invoices/${invoice.id}/pdf`)
      .buffer(true)
      .parse(binary)
    expect(pdf.headers['content-type']).toBe('application/pdf')
    const [page] = await readPdf(pdf.body as Buffer)
    expect(page!.text).toContain(`Invoice ${invoice.number}`)
    expect(page!.text).toContain('€400.00')
    expect(embeddedFonts(pdf.body as Buffer).names).toContain('Roboto-Regular')
  })

  it('when a draft exists, then the student does not see it and another teacher cannot touch it', async () => {
    const draft = await teacher.agent
      .post('/api/billing/invoices')
      .send({ studentId: student.user.id, packageId })
    const id = draft.body.invoice.id
    expect((await student.agent.get(`/api/billing/invoices/${id}/pdf`)).status).toBe(403)
    expect((await other.agent.post(`/api/billing/invoices/${id}/issue`)).status).toBe(403)
    expect((await teacher.agent.delete(`/api/billing/invoices/${id}`)).status).toBe(204)
  })

  it('when an open invoice is voided, then it cannot be paid or voided again', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    expect((await teacher.agent.post(`/api/billing/invoices/${invoice.id}/void`)).status).toBe(200)
    expect((await teacher.agent.post(`/api/billing/invoices/${invoice.id}/void`)).status).toBe(409)
    const pay = await student.agent.post(`/api/billing/invoices/${invoice.id}/checkout`)
    expect(pay.status).toBe(409)
  })
})

describe('ledger and totals', () => {
  it('when the teacher and the student read the ledger, then both see the open balance', async () => {
    const mine = await student.agent.get('/api/billing/ledger')
    const theirs = await teacher.agent.get(`/api/billing/ledger?student=${student.user.id}`)
    expect(mine.body.ledger[0]).toMatchObject({ currency: 'EUR', lessonsLeft: 0 })
    expect(mine.body.ledger[0].balanceMinor).toBeGreaterThanOrEqual(40000)
    expect(theirs.body.ledger).toEqual(mine.body.ledger)
    const stranger = await other.agent.get(`/api/billing/ledger?student=${student.user.id}`)
    expect(stranger.status).toBe(403)
  })

  it('when an admin asks, then totals per currency come without names; invoices are refused', async () => {
    const admin = await signedInAdmin(api.app)
    const totals = await admin.agent.get('/api/billing/totals')
    expect(totals.status).toBe(200)
    const eur = totals.body.totals.find(
      (t: { currency: string; status: string }) => t.currency === 'EUR' && t.status === 'open',
    )
    expect(eur.totalMinor).toBeGreaterThan(0)
    expect(JSON.stringify(totals.body)).not.toContain('Billing Student')
    expect((await admin.agent.get('/api/billing/invoices')).status).toBe(403)
  })
})

describe('reminders', () => {
  const remindersTo = async (email: string) =>
    (
      await api.ctx
        .db('captured_mail')
        .whereRaw('? = any(recipients)', [email])
        .where('subject', 'like', 'Reminder:%')
        .orderBy('id')
        .select('subject')
    ).map((m) => m.subject as string)

  it('when an open invoice nears and passes its due date, then one reminder each, however often the job runs', async () => {
    const pupil = await studentIn(api.app, api.ctx, teacher.studioId, 'Late Student')
    const invoice = await issuedPackageInvoice(teacher, pupil.user.id, packageId)
    const now = new Date('2030-05-10T09:00:00Z')
    await api.ctx.db('invoices').where({ id: invoice.id }).update({ due_on: '2030-05-12' })
    await sendInvoiceReminders(api.ctx, now)
    await sendInvoiceReminders(api.ctx, now)
    await api.ctx.db('invoices').where({ id: invoice.id }).update({ due_on: '2030-05-09' })
    await sendInvoiceReminders(api.ctx, now)
    await sendInvoiceReminders(api.ctx, now)
    for (let i = 0; i < 50 && (await remindersTo(pupil.email)).length < 2; i++)
      await new Promise((r) => setTimeout(r, 100))
    await new Promise((r) => setTimeout(r, 300)) // a third, wrongly sent one would be in by now
    expect(await remindersTo(pupil.email)).toEqual([
      `Reminder: invoice ${invoice.number} from Studio of Billing Teacher is due on 2030-05-12`,
      `Reminder: invoice ${invoice.number} from Studio of Billing Teacher was due on 2030-05-09`,
    ])
  })
})
