// An invoice (or a receipt, once paid) as a PDF with the app's embedded fonts: studio, student,
// number, dates, one line per lesson or package, the total in the studio's currency.
import { createSheet, pdfBuffer } from '../worksheets/pdf/sheet-document'
import type { Invoice } from '../../src/contract/billing'
import { formatMoney } from '../../src/contract/money'

const STATUS_WORDS: Record<Invoice['status'], string> = {
  draft: 'Draft — not issued',
  open: 'Open',
  paid: 'Paid — receipt',
  void: 'Void',
  refunded: 'Refunded',
}

export const invoiceTitle = (invoice: Invoice) =>
  invoice.number === null ? 'Invoice draft' : `Invoice ${invoice.number}`

function header(doc: PDFKit.PDFDocument, invoice: Invoice) {
  doc
    .font('Roboto-Bold')
    .fontSize(20)
    .text(`${invoiceTitle(invoice)} · ${invoice.studioName}`)
  doc.moveDown(0.5).font('Roboto').fontSize(11)
  doc.text(`Billed to: ${invoice.studentName}`)
  doc.text(`Status: ${STATUS_WORDS[invoice.status]}`)
  if (invoice.issuedAt) doc.text(`Issued: ${invoice.issuedAt.slice(0, 10)}`)
  if (invoice.dueOn) doc.text(`Due: ${invoice.dueOn}`)
  if (invoice.paidAt) doc.text(`Paid: ${invoice.paidAt.slice(0, 10)}`)
  doc.moveDown()
}

function lines(doc: PDFKit.PDFDocument, invoice: Invoice) {
  const left = doc.page.margins.left
  const width = doc.page.width - left - doc.page.margins.right
  for (const line of invoice.lines) {
    const y = doc.y
    doc.text(line.description, left, y, { width: width - 120 })
    const after = doc.y
    doc.text(formatMoney(line.amountMinor, invoice.currency), left, y, { width, align: 'right' })
    doc.y = Math.max(after, doc.y) + 4
  }
  doc
    .moveTo(left, doc.y)
    .lineTo(left + width, doc.y)
    .stroke()
  doc.moveDown(0.5).font('Roboto-Bold')
  doc.text(`Total ${formatMoney(invoice.totalMinor, invoice.currency)}`, left, doc.y, {
    width,
    align: 'right',
  })
}

/** The PDF bytes of an invoice in its current state. */
export function invoicePdf(invoice: Invoice): Promise<Buffer> {
  const doc = createSheet('a4', `${invoiceTitle(invoice)} — ${invoice.studioName}`)
  header(doc, invoice)
  lines(doc, invoice)
  return pdfBuffer(doc)
}
