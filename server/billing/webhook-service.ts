// Webhooks from the payment service: the signature is checked on the raw body with the SDK's own
// scheme; each event id is applied once (payment_events, in the same transaction as its effect);
// events may come in any order and an invoice is paid at most once.
import type Stripe from 'stripe'
import type { Knex } from 'knex'
import type { AppContext } from '../context'
import { AppError } from '../lib/errors'
import { findUserById } from '../users/users-repository'
import { sendReceiptMail } from './invoice-mail'
import { moveStatus } from './invoices-repository'
import { oneInvoice } from './invoices-service'
import * as payments from './payments-repository'
import { paymentsClient } from './payments-client'

/** The event, or a 400 when the signature does not match this body (nothing is changed). */
export function verifiedEvent(ctx: AppContext, body: Buffer, signature: string | undefined) {
  const stripe = paymentsClient(ctx.config)
  try {
    return stripe.webhooks.constructEvent(body, signature ?? '', ctx.config.stripeWebhookSecret!)
  } catch {
    throw new AppError('bad_signature', 'The webhook signature does not match.', 400)
  }
}

const metadataInvoice = (object: { metadata?: Stripe.Metadata | null }) =>
  object.metadata?.invoiceId ?? null

type Effect = 'paid' | 'refunded' | null

/** Paid from open (never twice); a refund seen first closes the open invoice as refunded. */
async function applyEffect(
  trx: Knex.Transaction,
  event: Stripe.Event,
  invoiceId: string,
): Promise<Effect> {
  const invoice = await payments.lockInvoice(trx, invoiceId)
  if (!invoice) return null
  if (event.type === 'checkout.session.completed') {
    const session = event.data.object
    if (session.payment_status !== 'paid') return null
    const intent = typeof session.payment_intent === 'string' ? session.payment_intent : null
    const paid = await moveStatus(trx, invoiceId, 'open', 'paid', {
      paid_at: new Date(event.created * 1000),
      payment_intent_id: intent,
    })
    return paid ? 'paid' : null
  }
  if (event.type === 'charge.refunded') {
    const charge = event.data.object
    const intent = typeof charge.payment_intent === 'string' ? charge.payment_intent : null
    if (await moveStatus(trx, invoiceId, 'paid', 'refunded')) return 'refunded'
    // The refund overtook the payment's own event: close the invoice so the late one pays nothing.
    const closed = await moveStatus(trx, invoiceId, 'open', 'refunded', {
      payment_intent_id: invoice.payment_intent_id ?? intent,
      paid_at: new Date(event.created * 1000),
    })
    return closed ? 'refunded' : null
  }
  return null
}

async function invoiceOf(ctx: AppContext, event: Stripe.Event): Promise<string | null> {
  if (event.type === 'checkout.session.completed' || event.type === 'checkout.session.expired')
    return metadataInvoice(event.data.object) ?? event.data.object.client_reference_id ?? null
  if (event.type === 'charge.refunded') {
    const charge = event.data.object
    const intent = typeof charge.payment_intent === 'string' ? charge.payment_intent : null
    return (
      metadataInvoice(charge) ??
      ((intent && (await payments.invoiceIdOfPayment(ctx.db, intent))) || null)
    )
  }
  return null
}

/** Applies one verified event; answers whether it was new. Sends the receipt after a payment. */
export async function applyEvent(ctx: AppContext, event: Stripe.Event) {
  const invoiceId = await invoiceOf(ctx, event)
  const known = invoiceId ? await ctx.db('invoices').where({ id: invoiceId }).first('id') : null
  const { fresh, effect } = await ctx.db.transaction(async (trx) => {
    const recorded = { id: event.id, type: event.type, created: event.created }
    const fresh = await payments.recordEvent(trx, {
      ...recorded,
      invoiceId: known ? invoiceId : null,
    })
    if (!fresh || !known) return { fresh, effect: null }
    return { fresh, effect: await applyEffect(trx, event, invoiceId!) }
  })
  if (effect === 'paid') await sendReceipt(ctx, invoiceId!)
  return { received: true, duplicate: !fresh, effect }
}

async function sendReceipt(ctx: AppContext, invoiceId: string) {
  const invoice = await oneInvoice(ctx, invoiceId)
  const student = await findUserById(ctx.db, invoice.studentId)
  try {
    await sendReceiptMail(ctx.config, ctx.mailer, student!.email, invoice)
  } catch (error) {
    // The payment stands; a lost receipt is logged, never answered as a failed webhook.
    ctx.logger.error({ err: error, invoiceId }, 'receipt mail failed')
  }
}
