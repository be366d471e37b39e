// Draws a TAB staff: one line per string (the highest on top), fret numbers on their string in
// evenly spaced columns, or empty columns for the student to fill in.
import type { Frame } from '../pdf/sheet-document'
import { drawText, measureText } from '../pdf/rich-text'

export interface TabColumn {
  string?: number
  fret?: number
}

/** Distance between TAB lines. */
export const TAB_GAP = 8

/** The height a TAB staff of `strings` lines takes. */
export const tabHeight = (strings: number) => (strings - 1) * TAB_GAP

/** x of each note column in a TAB staff of this width. */
export function tabColumns(box: Pick<Frame, 'x' | 'width'>, count: number): number[] {
  const start = box.x + 22
  const step = (box.width - 30) / Math.max(count, 1)
  return Array.from({ length: count }, (_, i) => start + step * (i + 0.5))
}

/**
 * Draws the staff at box.y (top line = the highest string) with the given columns; columns without
 * a fret stay empty. Returns the x of every column.
 */
export function drawTab(
  doc: PDFKit.PDFDocument,
  box: Pick<Frame, 'x' | 'y' | 'width'>,
  strings: number,
  columns: readonly TabColumn[],
): number[] {
  const lineY = (string: number) => box.y + (strings - 1 - string) * TAB_GAP
  for (let string = 0; string < strings; string += 1) {
    const y = lineY(string)
    doc
      .moveTo(box.x, y)
      .lineTo(box.x + box.width, y)
      .lineWidth(0.5)
      .strokeColor('#333333')
      .stroke()
  }
  const bottom = lineY(0)
  for (const x of [box.x, box.x + box.width]) {
    doc.moveTo(x, box.y).lineTo(x, bottom).lineWidth(0.8).stroke()
  }
  'TAB'.split('').forEach((letter, i) => {
    const y = box.y + ((bottom - box.y) * (i + 0.5)) / 3 + 3
    drawText(doc, letter, box.x + 9, y, { size: 7, bold: true, align: 'center' })
  })
  const xs = tabColumns(box, columns.length)
  columns.forEach((column, i) => {
    if (column.string === undefined || column.fret === undefined) return
    const x = xs[i] ?? 0
    const y = lineY(column.string)
    const text = String(column.fret)
    const width = measureText(doc, text, { size: 7.5 })
    doc
      .rect(x - width / 2 - 1, y - 4, width + 2, 8)
      .fillColor('#ffffff')
      .fill()
    drawText(doc, text, x, y + 2.7, { size: 7.5, align: 'center' })
  })
  return xs
}
