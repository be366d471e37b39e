// Window Cycle sheets: every key in order with its starting note and its notes root to octave,
// folded notes marked, for the window and tuning chosen.
import { pitchName, scaleTypeName, type WindowKey } from '../../../src/theory'
import { drawFooter, drawHeader, HEADER_HEIGHT } from '../draw/sheet-header'
import { drawText } from '../pdf/rich-text'
import { createSheet, pageFrame, pdfBuffer, type Frame, type Paper } from '../pdf/sheet-document'

export interface CycleSheetInput {
  keys: readonly WindowKey[]
  scale: string
  low: number
  high: number
  tuning: readonly number[]
  cycleName: string
  paper: Paper
  title: string | null
}

const ROW = 24
const KEY_COLUMN = 96
const START_COLUMN = 62

function drawColumnsHead(doc: PDFKit.PDFDocument, frame: Frame, y: number, notes: number) {
  const style = { size: 8, bold: true, color: '#555555' }
  drawText(doc, 'Key', frame.x + 20, y, style)
  drawText(doc, 'Starts on', frame.x + KEY_COLUMN, y, style)
  const cell = (frame.width - KEY_COLUMN - START_COLUMN) / notes
  for (let i = 0; i < notes; i += 1) {
    const x = frame.x + KEY_COLUMN + START_COLUMN + cell * (i + 0.5)
    drawText(doc, i === notes - 1 ? 'octave' : String(i + 1), x, y, { ...style, align: 'center' })
  }
}

// A folded note: a shaded cell with a small downward triangle (Roboto has no arrow glyphs).
function drawFold(doc: PDFKit.PDFDocument, x: number, y: number, cell: number) {
  doc
    .rect(x + 1, y - 13, cell - 2, 18)
    .fillColor('#ece6da')
    .fill()
  const tip = { x: x + cell - 6, y: y - 2 }
  doc
    .polygon([tip.x - 3.5, tip.y - 6], [tip.x + 3.5, tip.y - 6], [tip.x, tip.y])
    .fillColor('#8A5A00')
    .fill()
}

function drawKeyRow(
  doc: PDFKit.PDFDocument,
  frame: Frame,
  y: number,
  key: WindowKey,
  number: number,
) {
  const cell = (frame.width - KEY_COLUMN - START_COLUMN) / key.pitches.length
  drawText(doc, `${number}.`, frame.x + 14, y, { size: 9, color: '#777777', align: 'right' })
  drawText(doc, key.tonic, frame.x + 20, y, { size: 11, bold: true })
  drawText(doc, key.names[0] ?? '', frame.x + KEY_COLUMN, y, { size: 10 })
  key.names.forEach((name, i) => {
    const x = frame.x + KEY_COLUMN + START_COLUMN + cell * i
    if (key.displaced[i]) drawFold(doc, x, y, cell)
    drawText(doc, name, x + cell / 2, y, { size: 10, align: 'center' })
  })
  doc
    .moveTo(frame.x, y + 8)
    .lineTo(frame.x + frame.width, y + 8)
    .lineWidth(0.3)
    .strokeColor('#cccccc')
    .stroke()
}

/** Builds the PDF: a header, then one row per key, as many pages as the keys need. */
export async function cycleSheet(input: CycleSheetInput): Promise<Buffer> {
  const title = input.title ?? `Window Cycle: ${scaleTypeName(input.scale)} in ${input.cycleName}`
  const doc = createSheet(input.paper, title)
  const frame = pageFrame(input.paper)
  const window = `${pitchName(input.low)}–${pitchName(input.high)}`
  const tuning = input.tuning.map((pitch) => pitchName(pitch)).join(' ')
  const subtitle = `Window ${window} · tuning ${tuning} · ${input.keys.length} keys`
  const perPage = Math.floor((frame.height - HEADER_HEIGHT - 60) / ROW)
  const notes = Math.max(...input.keys.map((key) => key.pitches.length))
  for (let first = 0; first < input.keys.length; first += perPage) {
    if (first > 0) doc.addPage()
    drawHeader(doc, frame, { title, subtitle })
    const legend =
      'Play each key from its starting note up to the octave, staying inside the window. A shaded note with a small triangle would leave the window: play it an octave lower (a fold).'
    doc.font('Roboto').fontSize(8.5).fillColor('#444444')
    doc.text(legend, frame.x, frame.y + HEADER_HEIGHT - 8, { width: frame.width })
    const top = frame.y + HEADER_HEIGHT + 30
    drawColumnsHead(doc, frame, top, notes)
    input.keys.slice(first, first + perPage).forEach((key, i) => {
      drawKeyRow(doc, frame, top + ROW * (i + 1), key, first + i + 1)
    })
    drawFooter(doc, frame, `Ambitus worksheet · Window Cycle · page ${first / perPage + 1}`)
  }
  return pdfBuffer(doc)
}
