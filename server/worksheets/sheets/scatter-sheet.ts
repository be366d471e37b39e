// Octave Scatter sheets: sequences of a scale whose notes jump octaves, each with a blank TAB staff
// to write where to play them; the answer key fills the TAB where the hand moves least.
import { pitchName, type Scatter } from '../../../src/theory'
import { placeOnNeck } from '../../../src/theory'
import { drawFooter, drawHeader, HEADER_HEIGHT } from '../draw/sheet-header'
import { drawTab, tabColumns, tabHeight } from '../draw/draw-tab'
import { drawText } from '../pdf/rich-text'
import { createSheet, pageFrame, pdfBuffer, type Frame, type Paper } from '../pdf/sheet-document'

export interface ScatterSheetInput {
  sequences: readonly { seed: number; scatter: Scatter }[]
  tuning: readonly number[]
  frets: number
  answers: boolean
  paper: Paper
  title: string | null
}

function drawSequence(
  doc: PDFKit.PDFDocument,
  input: ScatterSheetInput,
  box: Pick<Frame, 'x' | 'y' | 'width'>,
  item: { number: number; seed: number; scatter: Scatter; answers: boolean },
) {
  const { scatter } = item
  drawText(doc, `${item.number}.`, box.x, box.y, { size: 10, bold: true })
  drawText(doc, `seed ${item.seed}`, box.x + box.width, box.y, {
    size: 7.5,
    color: '#777777',
    align: 'right',
  })
  const xs = tabColumns(box, scatter.pitches.length)
  scatter.names.forEach((name, i) => {
    drawText(doc, name, xs[i] ?? 0, box.y + 16, { size: 10, align: 'center' })
  })
  const places = item.answers ? placeOnNeck(scatter.pitches, input.tuning, input.frets) : []
  drawTab(
    doc,
    { ...box, y: box.y + 28 },
    input.tuning.length,
    scatter.pitches.map((_, i) => places[i] ?? {}),
  )
}

/** Builds the PDF: the sequences with blank TAB, then (when asked) the same with the TAB filled. */
export async function scatterSheet(input: ScatterSheetInput): Promise<Buffer> {
  const first = input.sequences[0]?.scatter
  const title = input.title ?? `Octave Scatter: ${first?.tonic ?? ''} ${first?.scale ?? ''}`
  const doc = createSheet(input.paper, title)
  const frame = pageFrame(input.paper)
  const tuning = input.tuning.map((pitch) => pitchName(pitch)).join(' ')
  const subtitle = `Tuning ${tuning} · each note in the octave shown · write the string and fret in the TAB`
  const block = 28 + tabHeight(input.tuning.length) + 30
  const perPage = Math.max(1, Math.floor((frame.height - HEADER_HEIGHT - 10) / block))
  const passes = input.answers ? [false, true] : [false]
  passes.forEach((answers, pass) => {
    for (let start = 0; start < input.sequences.length; start += perPage) {
      if (pass > 0 || start > 0) doc.addPage()
      drawHeader(doc, frame, { title, subtitle, tag: answers ? 'Answer key' : undefined })
      input.sequences.slice(start, start + perPage).forEach((sequence, i) => {
        const y = frame.y + HEADER_HEIGHT + 14 + block * i
        const box = { x: frame.x, y, width: frame.width }
        drawSequence(doc, input, box, { ...sequence, number: start + i + 1, answers })
      })
      drawFooter(doc, frame, `Ambitus worksheet · Octave Scatter${answers ? ' · answers' : ''}`)
    }
  })
  return pdfBuffer(doc)
}
