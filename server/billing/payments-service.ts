// Card payments through the payment service: a student opens its hosted checkout for an open
// invoice; a teacher refunds a paid one. What happened comes back by webhook (webhook-service.ts).
import type { AppContext } from '../context'
import { publicUrl } from '../config'
import { AppError, conflict, forbidden } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { minorToDecimal } from '../../src/contract/money'
import { invoiceTitle } from './invoice-pdf'
import * as invoices from './invoices-repository'
import { oneInvoice, readableInvoice } from './invoices-service'
import { attachCheckout } from './payments-repository'
import { paymentsClient } from './payments-client'

/** Wraps a call to the payment service: its refusals and outages are a 502, never a 500. */
async function paymentService<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call()
  } catch (error) {
    if (error instanceof AppError) throw error
    const message = (error as { message?: string }).message ?? 'no answer'
    throw new AppError('payment_service', `The payment service refused: ${message}`, 502)
  }
}

export async function startCheckout(ctx: AppContext, student: PublicUser, id: string) {
  const invoice = await readableInvoice(ctx, student, id)
  if (invoice.studentId !== student.id) throw forbidden('Only the student pays their invoice.')
  if (invoice.status !== 'open')
    throw conflict(`This invoice is ${invoice.status}; nothing to pay.`)
  const stripe = paymentsClient(ctx.config)
  const back = `${publicUrl(ctx.config)}/billing`
  const session = await paymentService(() =>
    stripe.checkout.sessions.create({
      mode: 'payment',
      client_reference_id: invoice.id,
      customer_email: student.email,
      metadata: { invoiceId: invoice.id },
      payment_intent_data: { metadata: { invoiceId: invoice.id } },
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: invoice.currency.toLowerCase(),
            unit_amount: invoice.totalMinor,
            product_data: { name: `${invoiceTitle(invoice)} · ${invoice.studioName}` },
          },
        },
      ],
      success_url: `${back}?paid=${invoice.id}`,
      cancel_url: `${back}?cancelled=${invoice.id}`,
    }),
  )
  await attachCheckout(ctx.db, invoice.id, session.id)
  ctx.logger.info(
    { invoiceId: invoice.id, amount: minorToDecimal(invoice.totalMinor, invoice.currency) },
    'checkout started',
  )
  return { url: session.url! }
}

/** Refunds a paid invoice in full; the refund's webhook later finds it already refunded. */
export async function refundInvoice(ctx: AppContext, teacher: PublicUser, id: string) {
  const owner = await invoices.invoiceOwner(ctx.db, id)
  const invoice = await readableInvoice(ctx, teacher, id)
  if (owner!.teacher_id !== teacher.id) throw forbidden('Only the studio refunds its invoices.')
  if (invoice.status !== 'paid' || !owner!.payment_intent_id)
    throw conflict('Only an invoice paid by card can be refunded.')
  const stripe = paymentsClient(ctx.config)
  await paymentService(() =>
    stripe.refunds.create(
      { payment_intent: owner!.payment_intent_id!, metadata: { invoiceId: id } },
      { idempotencyKey: `refund-${id}` },
    ),
  )
  await invoices.moveStatus(ctx.db, id, 'paid', 'refunded')
  return oneInvoice(ctx, id)
}
