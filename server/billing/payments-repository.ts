// The payment side of invoices: the checkout session an invoice waits on, paying it exactly once,
// the webhook events already applied (keyed by the payment service's event id) and reminders sent.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'

export const attachCheckout = (db: Db, id: string, sessionId: string) =>
  db('invoices').where({ id, status: 'open' }).update({ checkout_session_id: sessionId })

/**
 * Records a webhook event once; false when it was seen before (its effect is then already there).
 * Runs in the caller's transaction, so a failed effect forgets the event and a retry applies it.
 */
export async function recordEvent(
  trx: Knex.Transaction,
  event: { id: string; type: string; created: number; invoiceId: string | null },
): Promise<boolean> {
  const rows = await trx('payment_events')
    .insert({
      event_id: event.id,
      type: event.type,
      invoice_id: event.invoiceId,
      created: new Date(event.created * 1000),
    })
    .onConflict('event_id')
    .ignore()
    .returning('event_id')
  return rows.length === 1
}

/** The invoice row locked for this transaction (events for one invoice apply one after another). */
export const lockInvoice = (trx: Knex.Transaction, id: string) =>
  trx('invoices').where({ id }).forUpdate().first('id', 'status', 'payment_intent_id') as Promise<
    { id: string; status: string; payment_intent_id: string | null } | undefined
  >

export const invoiceIdOfPayment = async (db: Db | Knex.Transaction, paymentIntentId: string) =>
  (await db('invoices').where({ payment_intent_id: paymentIntentId }).first('id'))?.id as
    string | undefined

/** Open invoices whose reminder of this kind is due and not yet sent. */
export async function remindersDue(
  db: Db,
  kind: 'before_due' | 'overdue',
  today: string,
  limit: number,
  daysBefore = 3,
) {
  return db('invoices as i')
    .join('users as u', 'u.id', 'i.student_id')
    .join('studios as s', 's.id', 'i.studio_id')
    .where('i.status', 'open')
    .whereNotExists((q) =>
      q.from('invoice_reminders as r').whereRaw('r.invoice_id = i.id').where('r.kind', kind),
    )
    .modify((q) => {
      if (kind === 'before_due')
        q.whereRaw('i.due_on between ?::date and ?::date + ?::int', [today, today, daysBefore])
      else q.whereRaw('i.due_on < ?::date', [today])
    })
    .orderBy('i.due_on')
    .limit(limit)
    .select('i.id', 'i.number', 'i.total_minor', 'i.currency', db.raw('i.due_on::text as due_on'))
    .select('u.email', 'u.name as student_name', 's.name as studio_name') as Promise<
    {
      id: string
      number: number
      total_minor: number
      currency: string
      due_on: string
      email: string
      student_name: string
      studio_name: string
    }[]
  >
}

/** Claims a reminder before it is sent; false when another run already claimed it. */
export async function claimReminder(db: Db, invoiceId: string, kind: string) {
  const rows = await db('invoice_reminders')
    .insert({ invoice_id: invoiceId, kind })
    .onConflict(['invoice_id', 'kind'])
    .ignore()
    .returning('invoice_id')
  return rows.length === 1
}
