// Invoice use cases: a teacher drafts, issues (numbered, e-mailed with the PDF), voids or deletes
// a draft; teachers read their studios' invoices, students their own issued ones; the ledger.
import type { AppContext } from '../context'
import { badRequest, conflict, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { teacherHasStudent } from '../access/access-repository'
import { findUserById } from '../users/users-repository'
import type { Invoice, InvoiceCreateInput } from '../../src/contract/billing'
import { createDraft } from './invoice-drafts'
import { sendInvoiceMail } from './invoice-mail'
import { invoicePdf } from './invoice-pdf'
import * as invoices from './invoices-repository'
import { ledgerOf } from './ledger-repository'
import * as prices from './prices-repository'

const addDays = (days: number, from = new Date()) =>
  new Date(from.getTime() + days * 864e5).toISOString().slice(0, 10)

export const oneInvoice = async (ctx: AppContext, id: string): Promise<Invoice> =>
  (await invoices.listInvoices(ctx.db, { ids: [id] }))[0]!

/** The invoice when the teacher runs its studio; 404 or 403 otherwise. */
async function teachersInvoice(ctx: AppContext, teacher: PublicUser, id: string) {
  const owner = await invoices.invoiceOwner(ctx.db, id)
  if (!owner) throw notFound('That invoice')
  if (owner.teacher_id !== teacher.id) throw forbidden('This invoice belongs to another studio.')
  return owner
}

/** Any reader's access: the studio's teacher, or the student once it is issued. */
export async function readableInvoice(ctx: AppContext, user: PublicUser, id: string) {
  const owner = await invoices.invoiceOwner(ctx.db, id)
  if (!owner) throw notFound('That invoice')
  const student = user.id === owner.student_id && owner.status !== 'draft'
  if (owner.teacher_id !== user.id && !student) throw forbidden('This invoice is not yours.')
  return oneInvoice(ctx, id)
}

export async function draftInvoice(
  ctx: AppContext,
  teacher: PublicUser,
  input: InvoiceCreateInput,
) {
  return oneInvoice(ctx, await createDraft(ctx, teacher, input))
}

export async function issueInvoice(ctx: AppContext, teacher: PublicUser, id: string) {
  await teachersInvoice(ctx, teacher, id)
  const draft = await oneInvoice(ctx, id)
  const studio = await prices.studioBilling(ctx.db, draft.studioId)
  if (draft.currency !== studio!.currency)
    throw badRequest('The studio changed its currency since this draft; draft it again.')
  if (!(await invoices.issueDraft(ctx.db, id, addDays(studio!.paymentDays))))
    throw conflict('This invoice was already issued.')
  const invoice = await oneInvoice(ctx, id)
  const student = await findUserById(ctx.db, invoice.studentId)
  await sendInvoiceMail(ctx.config, ctx.mailer, student!.email, invoice)
  return invoice
}

export async function voidInvoice(ctx: AppContext, teacher: PublicUser, id: string) {
  await teachersInvoice(ctx, teacher, id)
  if (!(await invoices.moveStatus(ctx.db, id, 'open', 'void')))
    throw conflict('Only an open invoice can be voided (refund a paid one).')
  return oneInvoice(ctx, id)
}

export async function deleteDraft(ctx: AppContext, teacher: PublicUser, id: string) {
  await teachersInvoice(ctx, teacher, id)
  if (!(await invoices.deleteDraft(ctx.db, id)))
    throw conflict('Only a draft can be deleted; void an issued invoice instead.')
}

export async function invoicesFor(ctx: AppContext, user: PublicUser, studentId?: string) {
  if (user.role === 'teacher')
    return invoices.listInvoices(ctx.db, { teacherId: user.id, studentId })
  if (user.role !== 'student') throw forbidden('Admins see billing totals only.')
  if (studentId && studentId !== user.id) throw forbidden('You can only see your own invoices.')
  return invoices.listInvoices(ctx.db, { studentId: user.id, issuedOnly: true })
}

export async function invoicePdfFor(ctx: AppContext, user: PublicUser, id: string) {
  const invoice = await readableInvoice(ctx, user, id)
  return { invoice, pdf: await invoicePdf(invoice) }
}

/** A student's ledger: their own (all studios), or as one of their teachers sees it. */
export async function ledgerFor(ctx: AppContext, user: PublicUser, studentId?: string) {
  if (user.role === 'student') {
    if (studentId && studentId !== user.id) throw forbidden('You can only see your own ledger.')
    return ledgerOf(ctx.db, user.id, null)
  }
  if (user.role !== 'teacher') throw forbidden('Admins see billing totals only.')
  if (!studentId) throw badRequest('Choose a student.', { student: ['Choose a student.'] })
  if (!(await teacherHasStudent(ctx.db, user.id, studentId)))
    throw forbidden('This student is not in your studios.')
  return ledgerOf(ctx.db, studentId, user.id)
}
