// Neck sheets: blank necks to fill in by hand (every cell, or a few circled ones), several to a
// page, with an answer key whose note names come from the theory core (open string + fret).
import {
  createRandom,
  pitchClassName,
  pitchName,
  shuffled,
  type AccidentalPreference,
} from '../../../src/theory'
import { drawFooter, drawHeader, HEADER_HEIGHT } from '../draw/sheet-header'
import { drawNeck, type CellText } from '../draw/draw-neck'
import { neckLayout, type NeckCell } from '../layout/neck-layout'
import { createSheet, pageFrame, pdfBuffer, type Frame, type Paper } from '../pdf/sheet-document'

export interface NeckSheetOptions {
  tuning: readonly number[]
  from: number
  to: number
  answers: boolean
  paper: Paper
  perPage: number | null
  pages: number
  /** Circled cells per neck to name (0 = name every cell). */
  quiz: number
  seed: number
  accidentals: AccidentalPreference | 'both'
  octaves: boolean
  hand: 'right' | 'left'
  title: string | null
}

/** Room under a neck for side dots and fret numbers, and between necks. */
const BELOW = 30
const WRITING_GAP = 18

/**
 * The name written in a cell: open string + fret (arithmetic), with sharps, flats or both
 * ("C♯/D♭" on two lines), with the octave when asked.
 *
 * @example
 * noteLabel(28 + 3, { accidentals: 'sharp', octaves: false }) // 'G'
 */
export function noteLabel(
  pitch: number,
  options: Pick<NeckSheetOptions, 'accidentals' | 'octaves'>,
): string {
  const name = (prefer: AccidentalPreference) =>
    options.octaves ? pitchName(pitch, prefer) : pitchClassName(pitch, prefer)
  if (options.accidentals !== 'both') return name(options.accidentals)
  const [sharp, flat] = [name('sharp'), name('flat')]
  return sharp === flat ? sharp : `${sharp}/${flat}`
}

/** How many necks fit a page and the string spacing they get. */
export function neckFit(
  frame: Frame,
  strings: number,
  perPage: number | null,
): { perPage: number; gap: number } {
  const room = frame.height - HEADER_HEIGHT
  const spans = Math.max(1, strings - 1)
  if (perPage === null) {
    const fit = Math.floor(room / (spans * WRITING_GAP + BELOW + 8))
    return { perPage: Math.max(1, Math.min(8, fit)), gap: WRITING_GAP }
  }
  return { perPage, gap: Math.min(WRITING_GAP * 1.4, (room / perPage - BELOW - 8) / spans) }
}

function quizCells(options: NeckSheetOptions, cells: NeckCell[], neck: number): NeckCell[] {
  if (options.quiz === 0) return []
  return shuffled(cells, createRandom(options.seed + neck)).slice(0, options.quiz)
}

function labelsFor(options: NeckSheetOptions, cells: readonly NeckCell[]): CellText[] {
  return cells.map(({ string, fret }) => ({
    string,
    fret,
    text: noteLabel((options.tuning[string] ?? 0) + fret, options),
  }))
}

function describe(options: NeckSheetOptions): string {
  const strings = options.tuning.map((pitch) => pitchName(pitch)).join(' ')
  const task = options.quiz > 0 ? `name the ${options.quiz} circled notes` : 'name every note'
  return `Tuning ${strings} · frets ${options.from}–${options.to} · ${task}`
}

function drawPage(
  doc: PDFKit.PDFDocument,
  options: NeckSheetOptions,
  page: { index: number; answers: boolean; necks: number; gap: number },
): void {
  const frame = pageFrame(options.paper)
  const title = options.title ?? 'Name the notes on the neck'
  drawHeader(doc, frame, {
    title,
    subtitle: describe(options),
    tag: page.answers ? 'Answer key' : undefined,
  })
  const strings = options.tuning.length
  const block = (frame.height - HEADER_HEIGHT) / page.necks
  const names = options.tuning.map((pitch) =>
    pitchClassName(pitch, options.accidentals === 'flat' ? 'flat' : 'sharp'),
  )
  for (let n = 0; n < page.necks; n += 1) {
    const height = (strings - 1) * page.gap
    const top = frame.y + HEADER_HEIGHT + n * block + (block - height - BELOW) / 2
    const layout = neckLayout(
      { x: frame.x, y: top, width: frame.width, height },
      { ...options, strings },
    )
    const neckNumber = page.index * page.necks + n
    const circled = quizCells(options, layout.cells, neckNumber)
    const labelled = options.quiz > 0 ? circled : layout.cells
    drawNeck(doc, layout, {
      stringNames: names,
      frets: Math.max(options.to, 1),
      circles: circled,
      labels: page.answers ? labelsFor(options, labelled) : undefined,
    })
  }
  drawFooter(
    doc,
    frame,
    `Ambitus worksheet · ${page.answers ? 'answers' : 'page'} ${page.index + 1}`,
  )
}

/** Builds the PDF: `pages` sheet pages, then the answer key when asked. */
export async function neckSheet(options: NeckSheetOptions): Promise<Buffer> {
  const doc = createSheet(options.paper, options.title ?? 'Neck worksheet')
  const { perPage, gap } = neckFit(pageFrame(options.paper), options.tuning.length, options.perPage)
  const fit = { necks: perPage, gap }
  const plan: { index: number; answers: boolean; necks: number; gap: number }[] = []
  for (let index = 0; index < options.pages; index += 1)
    plan.push({ index, answers: false, ...fit })
  if (options.answers && options.quiz === 0) {
    // Every neck of a full sheet is the same: one large neck is the whole answer.
    plan.push({ index: 0, answers: true, necks: 1, gap: 30 })
  } else if (options.answers) {
    for (let index = 0; index < options.pages; index += 1)
      plan.push({ index, answers: true, ...fit })
  }
  plan.forEach((page, i) => {
    if (i > 0) doc.addPage()
    drawPage(doc, options, page)
  })
  return pdfBuffer(doc)
}
