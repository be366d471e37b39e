// invoices and invoice_lines: drafts, issuing with the studio's next number (the counter row is
// locked in the same transaction, so numbers have no gaps), state changes and the lessons to bill.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import type { Invoice, InvoiceLine, InvoiceStatus } from '../../src/contract/billing'

interface InvoiceRow {
  id: string
  studio_id: string
  studio_name: string
  student_id: string
  student_name: string
  number: number | null
  currency: Invoice['currency']
  total_minor: number
  status: InvoiceStatus
  package_lessons: number
  due_on: string | null
  issued_at: Date | null
  paid_at: Date | null
}

const iso = (d: Date | null) => d?.toISOString() ?? null

const toInvoice = (r: InvoiceRow, lines: InvoiceLine[]): Invoice => ({
  id: r.id,
  studioId: r.studio_id,
  studioName: r.studio_name,
  studentId: r.student_id,
  studentName: r.student_name,
  number: r.number,
  currency: r.currency,
  totalMinor: r.total_minor,
  status: r.status,
  packageLessons: r.package_lessons,
  dueOn: r.due_on,
  issuedAt: iso(r.issued_at),
  paidAt: iso(r.paid_at),
  lines,
})

export interface NewInvoice {
  studioId: string
  studentId: string
  currency: string
  packageId: string | null
  packageLessons: number
  packageWeeks: number
  lines: InvoiceLine[]
}

export async function insertDraft(db: Db, invoice: NewInvoice): Promise<string> {
  return db.transaction(async (trx) => {
    const [row] = await trx('invoices')
      .insert({
        studio_id: invoice.studioId,
        student_id: invoice.studentId,
        currency: invoice.currency,
        total_minor: invoice.lines.reduce((sum, l) => sum + l.amountMinor, 0),
        package_id: invoice.packageId,
        package_lessons: invoice.packageLessons,
        package_weeks: invoice.packageWeeks,
      })
      .returning('id')
    await trx('invoice_lines').insert(
      invoice.lines.map((l, position) => ({
        invoice_id: row.id,
        lesson_id: l.lessonId,
        description: l.description,
        position,
        amount_minor: l.amountMinor,
      })),
    )
    return row.id as string
  })
}

export interface InvoiceFilter {
  teacherId?: string
  studentId?: string
  ids?: string[]
  issuedOnly?: boolean
}

export async function listInvoices(db: Db, filter: InvoiceFilter): Promise<Invoice[]> {
  const rows: InvoiceRow[] = await db('invoices as i')
    .join('studios as s', 's.id', 'i.studio_id')
    .join('users as u', 'u.id', 'i.student_id')
    .modify((q) => {
      if (filter.teacherId) q.where('s.teacher_id', filter.teacherId)
      if (filter.studentId) q.where('i.student_id', filter.studentId)
      if (filter.ids) q.whereIn('i.id', filter.ids)
      if (filter.issuedOnly) q.whereNot('i.status', 'draft')
    })
    .orderBy([
      { column: 'i.created_at', order: 'desc' },
      { column: 'i.number', order: 'desc' },
    ])
    .limit(500)
    .select('i.*', 's.name as studio_name', 'u.name as student_name', db.raw('i.due_on::text'))
  const lines = rows.length
    ? await db('invoice_lines')
        .whereIn(
          'invoice_id',
          rows.map((r) => r.id),
        )
        .orderBy('position')
    : []
  return rows.map((r) =>
    toInvoice(
      r,
      lines
        .filter((l) => l.invoice_id === r.id)
        .map((l) => ({
          description: l.description,
          amountMinor: l.amount_minor,
          lessonId: l.lesson_id,
        })),
    ),
  )
}

/** Who an invoice belongs to, for access checks. */
export async function invoiceOwner(db: Db, id: string) {
  const row = await db('invoices as i')
    .join('studios as s', 's.id', 'i.studio_id')
    .where('i.id', id)
    .first('i.id', 'i.status', 'i.student_id', 's.teacher_id', 'i.payment_intent_id')
  return row as
    | {
        id: string
        status: InvoiceStatus
        student_id: string
        teacher_id: string
        payment_intent_id: string | null
      }
    | undefined
}

/**
 * A draft becomes open with the studio's next number. The invoice row and then the counter row are
 * locked, so parallel issues queue and a failed one rolls its number back: no gaps, no doubles.
 */
export async function issueDraft(db: Db, id: string, dueOn: string): Promise<boolean> {
  return db.transaction(async (trx) => {
    const invoice = await trx('invoices').where({ id }).forUpdate().first('status', 'studio_id')
    if (invoice?.status !== 'draft') return false
    const counter = await trx('studio_billing')
      .where({ studio_id: invoice.studio_id })
      .forUpdate()
      .first('next_number')
    await trx('studio_billing')
      .where({ studio_id: invoice.studio_id })
      .update({ next_number: counter.next_number + 1 })
    await trx('invoices').where({ id }).update({
      number: counter.next_number,
      status: 'open',
      issued_at: trx.fn.now(),
      due_on: dueOn,
    })
    return true
  })
}

/** Moves an invoice from one state to the next; false when it was no longer in `from`. */
export async function moveStatus(
  db: Db | Knex.Transaction,
  id: string,
  from: InvoiceStatus,
  to: InvoiceStatus,
  extra: Record<string, unknown> = {},
): Promise<boolean> {
  const closes = to === 'void' || to === 'refunded' ? { closed_at: db.fn.now() } : {}
  const count = await db('invoices')
    .where({ id, status: from })
    .update({ status: to, ...closes, ...extra })
  return count === 1
}

export const deleteDraft = (db: Db, id: string) =>
  db('invoices').where({ id, status: 'draft' }).delete()

/** The teacher's lessons with the student among these ids, with whether a live invoice bills them. */
export async function lessonsToBill(db: Db, teacherId: string, studentId: string, ids: string[]) {
  return db('lessons as l')
    .where({ 'l.teacher_id': teacherId, 'l.student_id': studentId })
    .whereIn('l.id', ids)
    .orderBy('l.starts_at')
    .select('l.id', 'l.studio_id', 'l.starts_at', 'l.duration_minutes', 'l.status', 'l.time_zone')
    .select(
      db.raw(`exists (select 1 from invoice_lines il join invoices i on i.id = il.invoice_id
        where il.lesson_id = l.id and i.status <> 'void') as billed`),
    ) as Promise<
    {
      id: string
      studio_id: string
      starts_at: Date
      duration_minutes: number
      status: string
      time_zone: string
      billed: boolean
    }[]
  >
}
