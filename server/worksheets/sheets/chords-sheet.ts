// Chord Tones sheets: one row per chord of the progression with its tones and degrees, and a cell
// per note of its arpeggio in the position — blank to fill in, or, as the answer key, the note
// with the string and fret that play it there.
import type { PlacedChordTone } from '../../../src/theory'
import { drawFooter, drawHeader, HEADER_HEIGHT } from '../draw/sheet-header'
import { drawText } from '../pdf/rich-text'
import { createSheet, pageFrame, pdfBuffer, type Frame, type Paper } from '../pdf/sheet-document'

/** One chord as the sheet shows it: symbol, tones with degrees, its arpeggio and where each note is. */
export interface ChordRow {
  symbol: string
  tones: string
  arpeggio: readonly PlacedChordTone[]
  /** Where each note of the arpeggio is played in the position ("D 3": D string, fret 3). */
  places: readonly string[]
}

export interface ChordsSheetInput {
  rows: readonly ChordRow[]
  title: string
  subtitle: string
  answers: boolean
  paper: Paper
}

const ROW = 34

/** A chord degree with music glyphs: "b3" → "♭3". */
export const degreeGlyphs = (degree: string) => degree.replace(/b/g, '♭').replace(/#/g, '♯')
const CHORD_COLUMN = 70
const TONES_COLUMN = 150

function drawChordRow(
  doc: PDFKit.PDFDocument,
  frame: Frame,
  y: number,
  row: ChordRow,
  n: number,
  answers: boolean,
) {
  drawText(doc, `${n}.`, frame.x + 14, y, { size: 9, color: '#777777', align: 'right' })
  drawText(doc, row.symbol, frame.x + 20, y, { size: 11, bold: true })
  drawText(doc, row.tones, frame.x + CHORD_COLUMN, y, { size: 8.5, color: '#444444' })
  const left = frame.x + CHORD_COLUMN + TONES_COLUMN
  const cell = Math.min(
    60,
    (frame.width - CHORD_COLUMN - TONES_COLUMN) / Math.max(1, row.arpeggio.length),
  )
  row.arpeggio.forEach((tone, i) => {
    const x = left + cell * (i + 0.5)
    drawText(doc, degreeGlyphs(tone.degree), x, y - 10, {
      size: 7,
      color: '#777777',
      align: 'center',
    })
    if (answers) {
      drawText(doc, tone.name, x, y + 2, { size: 10, align: 'center' })
      drawText(doc, row.places[i] ?? '', x, y + 12, { size: 7, color: '#555555', align: 'center' })
    } else {
      doc
        .moveTo(x - cell / 2 + 5, y + 8)
        .lineTo(x + cell / 2 - 5, y + 8)
        .lineWidth(0.5)
        .strokeColor('#999999')
        .stroke()
    }
  })
  doc
    .moveTo(frame.x, y + 18)
    .lineTo(frame.x + frame.width, y + 18)
    .lineWidth(0.3)
    .strokeColor('#cccccc')
    .stroke()
}

const LEGEND =
  'Play each chord as an arpeggio: from the lowest bass note the position holds, every chord tone up to the top of the position. Write each note with its octave under its degree.'
const ANSWER_LEGEND =
  'Answer key: each note with the string and fret that play it in the position (D 3 = D string, fret 3).'

/** Builds the PDF: a header, then one row per chord, as many pages as the chords need. */
export async function chordsSheet(input: ChordsSheetInput): Promise<Buffer> {
  const doc = createSheet(input.paper, input.title)
  const frame = pageFrame(input.paper)
  const perPage = Math.floor((frame.height - HEADER_HEIGHT - 70) / ROW)
  for (let first = 0; first < input.rows.length; first += perPage) {
    if (first > 0) doc.addPage()
    drawHeader(doc, frame, {
      title: input.title,
      subtitle: input.subtitle,
      ...(input.answers ? { tag: 'Answer key' } : {}),
    })
    doc.font('Roboto').fontSize(8.5).fillColor('#444444')
    doc.text(input.answers ? ANSWER_LEGEND : LEGEND, frame.x, frame.y + HEADER_HEIGHT - 8, {
      width: frame.width,
    })
    const top = frame.y + HEADER_HEIGHT + 40
    input.rows.slice(first, first + perPage).forEach((row, i) => {
      drawChordRow(doc, frame, top + ROW * i, row, first + i + 1, input.answers)
    })
    drawFooter(doc, frame, `Ambitus worksheet · Chord Tones · page ${first / perPage + 1}`)
  }
  return pdfBuffer(doc)
}
