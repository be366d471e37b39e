// Draws a neck diagram from its layout: strings, frets, the nut, side dots, fret numbers, string
// names, and optionally circles to write in and note names (answer keys).
import { inlayFrets } from '../../../src/theory'
import type { NeckLayout } from '../layout/neck-layout'
import { drawText, measureText } from '../pdf/rich-text'

const INK = '#222222'
const SOFT = '#8a8a8a'

export interface CellText {
  string: number
  fret: number
  text: string
}

export interface NeckContent {
  stringNames: readonly string[]
  /** Fret count of the instrument, for the side dots (3, 5, 7, 9, 12 …). */
  frets: number
  circles?: readonly { string: number; fret: number }[]
  labels?: readonly CellText[]
  /** Show fret numbers under the neck. */
  fretNumbers?: boolean
}

function drawFrame(doc: PDFKit.PDFDocument, layout: NeckLayout) {
  const top = layout.stringY.at(-1) ?? 0
  const bottom = layout.stringY[0] ?? 0
  for (const wire of layout.wires) {
    doc
      .moveTo(wire.x, top)
      .lineTo(wire.x, bottom)
      .lineWidth(wire.nut ? 2.6 : 0.8)
      .strokeColor(INK)
      .stroke()
  }
  layout.stringY.forEach((y, string) => {
    // Lower strings are drawn a little heavier, as they look on the instrument.
    const weight =
      0.5 + (0.5 * (layout.stringY.length - 1 - string)) / Math.max(1, layout.stringY.length - 1)
    doc.moveTo(layout.left, y).lineTo(layout.right, y).lineWidth(weight).strokeColor(INK).stroke()
  })
}

function drawMarkers(doc: PDFKit.PDFDocument, layout: NeckLayout, content: NeckContent) {
  const bottom = layout.stringY[0] ?? 0
  const dots = new Map(inlayFrets(content.frets).map((inlay) => [inlay.fret, inlay.double]))
  for (const column of layout.columns) {
    const double = dots.get(column.fret)
    if (double !== undefined) {
      const offsets = double ? [-3.2, 3.2] : [0]
      for (const dx of offsets)
        doc
          .circle(column.x + dx, bottom + 6, 1.6)
          .fillColor(SOFT)
          .fill()
    }
    if (content.fretNumbers !== false && column.fret > 0) {
      drawText(doc, String(column.fret), column.x, bottom + 17, {
        size: 7,
        color: SOFT,
        align: 'center',
      })
    }
  }
  content.stringNames.forEach((name, string) => {
    const y = (layout.stringY[string] ?? 0) + 3
    drawText(doc, name, layout.labelX, y, { size: 8, bold: true, align: layout.labelAlign })
  })
}

function cellAt(layout: NeckLayout, string: number, fret: number) {
  return layout.cells.find((cell) => cell.string === string && cell.fret === fret)
}

function drawLabels(doc: PDFKit.PDFDocument, layout: NeckLayout, labels: readonly CellText[]) {
  const size = Math.min(11, layout.gap * 0.5, layout.cellWidth * 0.4)
  for (const label of labels) {
    const cell = cellAt(layout, label.string, label.fret)
    if (!cell) continue
    const lines = label.text.split('/')
    const lineSize = lines.length > 1 ? size * 0.8 : size
    const width = Math.max(...lines.map((line) => measureText(doc, line, { size: lineSize })))
    const height = lineSize * lines.length
    doc
      .rect(cell.x - width / 2 - 1.5, cell.y - height / 2 - 1, width + 3, height + 2)
      .fillColor('#ffffff')
      .fill()
    lines.forEach((line, index) => {
      const baseline = cell.y - height / 2 + lineSize * (index + 0.78)
      drawText(doc, line, cell.x, baseline, { size: lineSize, align: 'center' })
    })
  }
}

/** Draws a neck diagram: the frame, markers and names, then circles and labels on top. */
export function drawNeck(doc: PDFKit.PDFDocument, layout: NeckLayout, content: NeckContent): void {
  drawFrame(doc, layout)
  drawMarkers(doc, layout, content)
  const radius = Math.min(layout.gap * 0.42, layout.cellWidth * 0.4)
  for (const circle of content.circles ?? []) {
    const cell = cellAt(layout, circle.string, circle.fret)
    if (cell) doc.circle(cell.x, cell.y, radius).lineWidth(0.8).fillAndStroke('#ffffff', INK)
  }
  if (content.labels) drawLabels(doc, layout, content.labels)
}
