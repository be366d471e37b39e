// Range Run sheets: the run a hand position offers and its fingerings, each as a diagram of the
// region (notes numbered in playing order) beside its TAB going up and coming back down.
import { pitchClassName, pitchName, stringNames, type Fingering } from '../../../src/theory'
import { drawFooter, drawHeader, HEADER_HEIGHT } from '../draw/sheet-header'
import { drawNeck } from '../draw/draw-neck'
import { drawTab, tabHeight } from '../draw/draw-tab'
import { neckLayout } from '../layout/neck-layout'
import { drawText } from '../pdf/rich-text'
import { createSheet, pageFrame, pdfBuffer, type Frame, type Paper } from '../pdf/sheet-document'

export interface RunsSheetInput {
  run: readonly number[]
  names: readonly string[]
  fingerings: readonly Fingering[]
  total: number
  tonic: string
  scaleLabel: string
  lowFret: number
  highFret: number
  tuning: readonly number[]
  frets: number
  paper: Paper
  title: string | null
}

const DIAGRAM_WIDTH = 170
/** String spacing of the fingering diagrams: room for the playing-order numbers. */
const DIAGRAM_GAP = 15

function drawFingering(
  doc: PDFKit.PDFDocument,
  input: RunsSheetInput,
  box: Frame,
  fingering: Fingering,
  number: number,
) {
  const frets = fingering.positions.map((place) => place.fret)
  const from = Math.min(input.lowFret, ...frets)
  const to = Math.max(input.highFret, ...frets, from + 1)
  const first = fingering.positions[0]?.string ?? 0
  const heading = `${number}. ${fingering.pattern} from the ${stringNames(input.tuning)[first] ?? ''} string · ${fingering.shifts} shift${fingering.shifts === 1 ? '' : 's'}`
  drawText(doc, heading, box.x, box.y, { size: 9.5, bold: true })
  const strings = input.tuning.length
  const height = tabHeight(strings)
  const diagram = {
    x: box.x,
    y: box.y + 14,
    width: DIAGRAM_WIDTH,
    height: (strings - 1) * DIAGRAM_GAP,
  }
  const layout = neckLayout(diagram, { strings, from, to, hand: 'right' })
  drawNeck(doc, layout, {
    stringNames: input.tuning.map((pitch) => pitchClassName(pitch)),
    frets: input.frets,
    circles: fingering.positions,
    labels: fingering.positions.map((place, i) => ({ ...place, text: String(i + 1) })),
  })
  const tabBox = { x: box.x + DIAGRAM_WIDTH + 16, width: box.width - DIAGRAM_WIDTH - 16 }
  const up = fingering.positions
  const down = [...up].reverse().slice(1)
  drawTab(doc, { ...tabBox, y: box.y + 14 }, strings, up)
  drawTab(doc, { ...tabBox, y: box.y + 14 + height + 12 }, strings, [...down, {}])
}

/** Builds the PDF: the run's notes, then each listed fingering as diagram + TAB. */
export async function runsSheet(input: RunsSheetInput): Promise<Buffer> {
  const region = `frets ${input.lowFret}–${input.highFret}`
  const title = input.title ?? `Range Run: ${input.tonic} ${input.scaleLabel}, ${region}`
  const doc = createSheet(input.paper, title)
  const frame = pageFrame(input.paper)
  const tuning = input.tuning.map((pitch) => pitchName(pitch)).join(' ')
  const shown = `${input.fingerings.length} of ${input.total} fingerings, fewest shifts first`
  const subtitle = `Tuning ${tuning} · ${input.run.length} notes · ${shown}`
  const strings = input.tuning.length
  const block = 14 + Math.max(2 * tabHeight(strings) + 12, (strings - 1) * DIAGRAM_GAP + 22) + 26
  const perPage = Math.max(1, Math.floor((frame.height - HEADER_HEIGHT - 40) / block))
  for (let start = 0; start < input.fingerings.length; start += perPage) {
    if (start > 0) doc.addPage()
    drawHeader(doc, frame, { title, subtitle })
    const notes = `Run: ${input.names.join('  ')}`
    doc.font('Roboto').fontSize(8.5)
    drawText(doc, notes, frame.x, frame.y + HEADER_HEIGHT, { size: 9 })
    input.fingerings.slice(start, start + perPage).forEach((fingering, i) => {
      const y = frame.y + HEADER_HEIGHT + 26 + block * i
      drawFingering(doc, input, { ...frame, y, height: block }, fingering, start + i + 1)
    })
    drawFooter(doc, frame, 'Ambitus worksheet · Range Runs: play up (top staff), then back down')
  }
  return pdfBuffer(doc)
}
