// The top of every worksheet page: a title, a line about the instrument and exercise, and blanks
// for the student's name and the date.
import type { Frame } from '../pdf/sheet-document'
import { drawText, measureText } from '../pdf/rich-text'

/** Height the header takes from the top of the page frame. */
export const HEADER_HEIGHT = 58

export function drawHeader(
  doc: PDFKit.PDFDocument,
  frame: Frame,
  header: { title: string; subtitle: string; tag?: string },
): void {
  // Long titles shrink (down to 10 pt) to leave room for the tag and the name and date blanks.
  const room = frame.width - 230 - (header.tag ? 90 : 0)
  const natural = measureText(doc, header.title, { size: 15, bold: true })
  const size = Math.max(10, Math.min(15, (15 * room) / natural))
  const titleWidth = drawText(doc, header.title, frame.x, frame.y + 14, { size, bold: true })
  if (header.tag) {
    const tag = { size: 10, bold: true, color: '#1E4D6B' }
    drawText(doc, header.tag, frame.x + titleWidth + 12, frame.y + 14, tag)
  }
  const blanks = 'Name ____________________   Date __________'
  drawText(doc, blanks, frame.x + frame.width, frame.y + 14, {
    size: 9,
    color: '#444444',
    align: 'right',
  })
  drawText(doc, header.subtitle, frame.x, frame.y + 32, { size: 9.5, color: '#444444' })
  doc
    .moveTo(frame.x, frame.y + 42)
    .lineTo(frame.x + frame.width, frame.y + 42)
    .lineWidth(0.5)
    .strokeColor('#bbbbbb')
    .stroke()
}

/** A small line at the bottom of the page: what the sheet is and which page. */
export function drawFooter(doc: PDFKit.PDFDocument, frame: Frame, text: string): void {
  drawText(doc, text, frame.x + frame.width / 2, frame.y + frame.height + 14, {
    size: 7.5,
    color: '#777777',
    align: 'center',
  })
}
