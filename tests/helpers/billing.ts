// Billing set-ups shared by the billing tests and the route matrix: prices and a package for a
// studio, lessons to bill, an issued invoice, and webhook events signed as the payment service does.
import Stripe from 'stripe'
import request from 'supertest'
import type { TestApi } from './api'
import type { Agent } from './studio'

export async function priceStudio(teacher: Agent & { studioId: string }, currency = 'EUR') {
  const settings = await teacher.agent
    .put(`/api/billing/studios/${teacher.studioId}`)
    .send({ currency, paymentDays: 14, prices: [{ durationMinutes: 45, amountMinor: 4500 }] })
  const pkg = await teacher.agent
    .post(`/api/billing/studios/${teacher.studioId}/packages`)
    .send({ name: 'Ten lessons', lessons: 10, validWeeks: 16, amountMinor: 40000 })
  return { settings: settings.body.settings, packageId: pkg.body.package.id as string }
}

/** Schedules weekly 45-minute lessons and answers their ids. */
export async function lessonsWith(teacher: Agent, studentId: string, weeks = 2) {
  const res = await teacher.agent.post('/api/lessons').send({
    studentId,
    date: '2026-11-02',
    time: '16:30',
    timeZone: 'Europe/Tallinn',
    durationMinutes: 45,
    weeks,
  })
  return (res.body.lessons as { id: string }[]).map((l) => l.id)
}

/** A package invoice, drafted and issued; answers the invoice. */
export async function issuedPackageInvoice(teacher: Agent, studentId: string, packageId: string) {
  const draft = await teacher.agent.post('/api/billing/invoices').send({ studentId, packageId })
  const issued = await teacher.agent.post(`/api/billing/invoices/${draft.body.invoice.id}/issue`)
  return issued.body.invoice as { id: string; number: number; totalMinor: number }
}

const stripe = new Stripe('sk_test_only_for_signing')

/** A webhook event as the payment service would send it, with a valid signature for `secret`. */
export function signedEvent(secret: string, type: string, object: object, eventId?: string) {
  const payload = JSON.stringify({
    id: eventId ?? `evt_test_${Math.random().toString(36).slice(2)}`,
    object: 'event',
    created: Math.floor(Date.now() / 1000),
    type,
    data: { object },
  })
  const header = stripe.webhooks.generateTestHeaderString({ payload, secret })
  return { payload, header }
}

/** Posts an event to the webhook as the payment service does (no cookie, no CSRF header). */
export function postEvent(api: TestApi, event: { payload: string; header: string }) {
  return request(api.bareApp)
    .post('/api/billing/webhook')
    .set('Content-Type', 'application/json')
    .set('Stripe-Signature', event.header)
    .send(event.payload)
}

/** What the route matrix bills: a package to retire, drafts to issue and delete, open invoices. */
export async function billingFixture(teacher: Agent & { studioId: string }, studentId: string) {
  const { packageId } = await priceStudio(teacher)
  const spare = await teacher.agent
    .post(`/api/billing/studios/${teacher.studioId}/packages`)
    .send({ name: 'Spare', lessons: 4, validWeeks: 6, amountMinor: 18000 })
  const draft = async () =>
    (await teacher.agent.post('/api/billing/invoices').send({ studentId, packageId })).body.invoice
      .id as string
  return {
    packageId,
    packageToRetireId: spare.body.package.id as string,
    draftInvoiceId: await draft(),
    draftToDeleteId: await draft(),
    openInvoiceId: (await issuedPackageInvoice(teacher, studentId, packageId)).id,
    invoiceToVoidId: (await issuedPackageInvoice(teacher, studentId, packageId)).id,
  }
}
