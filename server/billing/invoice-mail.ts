// The e-mails of billing: a new invoice (PDF attached), the receipt once paid (PDF attached),
// and reminders before and after the due date.
import { publicUrl, type Config } from '../config'
import type { Mailer } from '../lib/mail'
import type { Invoice } from '../../src/contract/billing'
import { formatMoney } from '../../src/contract/money'
import { invoicePdf, invoiceTitle } from './invoice-pdf'

const amount = (invoice: Pick<Invoice, 'totalMinor' | 'currency'>) =>
  formatMoney(invoice.totalMinor, invoice.currency)

async function withPdf(invoice: Invoice, kind: 'invoice' | 'receipt') {
  return [
    {
      filename: `${kind}-${invoice.number}.pdf`,
      content: await invoicePdf(invoice),
      contentType: 'application/pdf',
    },
  ]
}

export async function sendInvoiceMail(
  config: Config,
  mailer: Mailer,
  to: string,
  invoice: Invoice,
) {
  await mailer.send({
    to,
    subject: `${invoiceTitle(invoice)} from ${invoice.studioName}: ${amount(invoice)}`,
    text: [
      `Hello ${invoice.studentName},`,
      '',
      `${invoice.studioName} sent you ${invoiceTitle(invoice).toLowerCase()} for ${amount(invoice)}, due ${invoice.dueOn}.`,
      ...invoice.lines.map(
        (l) => `- ${l.description}: ${formatMoney(l.amountMinor, invoice.currency)}`,
      ),
      '',
      `See and pay it under Billing: ${publicUrl(config)}/billing`,
      'The invoice is attached as a PDF.',
    ].join('\n'),
    attachments: await withPdf(invoice, 'invoice'),
  })
}

export async function sendReceiptMail(
  config: Config,
  mailer: Mailer,
  to: string,
  invoice: Invoice,
) {
  await mailer.send({
    to,
    subject: `Receipt: ${invoiceTitle(invoice)} from ${invoice.studioName} is paid`,
    text: [
      `Hello ${invoice.studentName},`,
      '',
      `Thank you: ${amount(invoice)} for ${invoiceTitle(invoice).toLowerCase()} reached ${invoice.studioName}.`,
      invoice.packageLessons
        ? `Your package of ${invoice.packageLessons} lessons is ready to use.`
        : 'Nothing more is owed on this invoice.',
      '',
      `Your invoices and lessons left: ${publicUrl(config)}/billing`,
      'The receipt is attached as a PDF.',
    ].join('\n'),
    attachments: await withPdf(invoice, 'receipt'),
  })
}

export interface ReminderFacts {
  number: number
  totalMinor: number
  currency: Invoice['currency']
  dueOn: string
  studentName: string
  studioName: string
}

export async function sendReminderMail(
  config: Config,
  mailer: Mailer,
  to: string,
  facts: ReminderFacts,
  kind: 'before_due' | 'overdue',
) {
  const when = kind === 'before_due' ? `is due on ${facts.dueOn}` : `was due on ${facts.dueOn}`
  await mailer.send({
    to,
    subject: `Reminder: invoice ${facts.number} from ${facts.studioName} ${when}`,
    text: [
      `Hello ${facts.studentName},`,
      '',
      `Invoice ${facts.number} from ${facts.studioName} for ${amount(facts)} ${when}.`,
      `Pay it under Billing: ${publicUrl(config)}/billing`,
      'If you have paid in the last day, thank you, and please ignore this reminder.',
    ].join('\n'),
  })
}
