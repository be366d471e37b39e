// Card payments (issue 18) through the official Stripe SDK against our local fake: hosted checkout,
// signed webhooks (forged → 400, nothing changes), duplicates and reordered events, refunds, and
// the receipt mail; an invoice is never paid twice.
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, waitForMail, type TestApi } from '../helpers/api'
import { issuedPackageInvoice, postEvent, priceStudio, signedEvent } from '../helpers/billing'
import { studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let server: http.Server
let teacher: Agent & { studioId: string }
let student: Agent
let packageId: string
beforeAll(async () => {
  api = await startTestApi({ mailSendsPerHour: 1000 })
  // The fake delivers webhooks over HTTP, so this app listens on a free loopback port.
  server = http.createServer(api.bareApp).listen(0, '127.0.0.1')
  await new Promise((r) => server.once('listening', r))
  const { port } = server.address() as AddressInfo
  api.payments.setWebhookUrl(`http://127.0.0.1:${port}/api/billing/webhook`)
  teacher = await teacherWithStudio(api.app, 'Paid Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Paying Student')
  packageId = (await priceStudio(teacher)).packageId
})
afterAll(async () => {
  await new Promise((r) => server.close(r))
  await api.close()
})

const statusOf = async (id: string) =>
  (await api.ctx.db('invoices').where({ id }).first('status')).status as string

/** Opens the checkout as the student and presses Pay on the fake's hosted page. */
async function payByCard(invoiceId: string) {
  const checkout = await student.agent.post(`/api/billing/invoices/${invoiceId}/checkout`)
  expect(checkout.status).toBe(200)
  const page = await fetch(checkout.body.url)
  expect(await page.text()).toContain('€400.00')
  const paid = await fetch(`${checkout.body.url}/pay`, { method: 'POST', redirect: 'manual' })
  expect(paid.status).toBe(303)
  return api.payments.events.at(-1)!
}

describe('checkout', () => {
  it('when the student pays through the hosted page, then the invoice is paid, the ledger counts the package and a receipt is mailed', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const event = await payByCard(invoice.id)
    expect(event.type).toBe('checkout.session.completed')
    expect(await statusOf(invoice.id)).toBe('paid')
    const receipt = await waitForMail(api.ctx, student.email)
    expect(receipt.subject).toContain(`Receipt: Invoice ${invoice.number}`)
    const ledger = await student.agent.get('/api/billing/ledger')
    expect(ledger.body.ledger[0]).toMatchObject({ lessonsLeft: 10, paidMinor: 40000 })
  })

  it('when the same event is delivered again, then it is answered as a duplicate and nothing changes', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const event = await payByCard(invoice.id)
    const before = await api.ctx.db('invoices').where({ id: invoice.id }).first()
    const res = await fetch(`${api.payments.url}/_fake/events/${event.id}/resend`, {
      method: 'POST',
    })
    expect((await res.json()).status).toBe(200)
    const replay = signedEvent(
      api.ctx.config.stripeWebhookSecret!,
      event.type,
      event.data.object,
      event.id,
    )
    const answer = await postEvent(api, replay)
    expect(answer.body).toMatchObject({ duplicate: true, effect: null })
    expect(await api.ctx.db('invoices').where({ id: invoice.id }).first()).toEqual(before)
  })

  it('when a second payment event for a paid invoice comes, then it is not paid twice', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const event = await payByCard(invoice.id)
    const paidAt = (await api.ctx.db('invoices').where({ id: invoice.id }).first()).paid_at
    const other = signedEvent(api.ctx.config.stripeWebhookSecret!, event.type, {
      ...event.data.object,
      payment_intent: 'pi_test_second',
    })
    const answer = await postEvent(api, other)
    expect(answer.body).toMatchObject({ duplicate: false, effect: null })
    const row = await api.ctx.db('invoices').where({ id: invoice.id }).first()
    expect([row.status, row.paid_at, row.payment_intent_id]).toEqual([
      'paid',
      paidAt,
      event.data.object.payment_intent,
    ])
  })
})

describe('signatures', () => {
  it('when a payment event is forged, then 400 and the invoice stays open', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const object = {
      object: 'checkout.session',
      payment_status: 'paid',
      payment_intent: 'pi_forged',
      metadata: { invoiceId: invoice.id },
    }
    const forged = signedEvent('whsec_not_ours', 'checkout.session.completed', object)
    const genuine = signedEvent(
      api.ctx.config.stripeWebhookSecret!,
      'checkout.session.completed',
      object,
    )
    const tampered = {
      payload: genuine.payload.replace('"paid"', '"paid" '),
      header: genuine.header,
    }
    for (const event of [forged, tampered, { payload: genuine.payload, header: '' }]) {
      const res = await postEvent(api, event)
      expect(res.status).toBe(400)
      expect(res.body.error.code).toBe('bad_signature')
    }
    expect(await statusOf(invoice.id)).toBe('open')
    expect(await api.ctx.db('payment_events').where({ invoice_id: invoice.id })).toEqual([])
  })
})

describe('refunds', () => {
  it('when the teacher refunds a paid invoice, then it is refunded once and the refund event changes nothing more', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    await payByCard(invoice.id)
    const res = await teacher.agent.post(`/api/billing/invoices/${invoice.id}/refund`)
    expect(res.status).toBe(200)
    expect(res.body.invoice.status).toBe('refunded')
    const refundEvent = api.payments.events.at(-1)!
    expect(refundEvent.type).toBe('charge.refunded')
    expect(await statusOf(invoice.id)).toBe('refunded')
    const again = await teacher.agent.post(`/api/billing/invoices/${invoice.id}/refund`)
    expect(again.status).toBe(409)
  })

  it('when the refund event overtakes the payment event, then the late payment does not reopen or pay the invoice', async () => {
    const invoice = await issuedPackageInvoice(teacher, student.user.id, packageId)
    const secret = api.ctx.config.stripeWebhookSecret!
    const intent = `pi_test_${invoice.id.slice(0, 8)}`
    const refunded = signedEvent(secret, 'charge.refunded', {
      object: 'charge',
      payment_intent: intent,
      refunded: true,
      metadata: { invoiceId: invoice.id },
    })
    const completed = signedEvent(secret, 'checkout.session.completed', {
      object: 'checkout.session',
      payment_status: 'paid',
      payment_intent: intent,
      metadata: { invoiceId: invoice.id },
    })
    expect((await postEvent(api, refunded)).body.effect).toBe('refunded')
    expect((await postEvent(api, completed)).body.effect).toBe(null)
    expect(await statusOf(invoice.id)).toBe('refunded')
  })
})
