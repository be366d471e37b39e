// Text with music accidentals: Roboto for letters and digits, the accidental fonts for ♯ ♭ ♮ 𝄪 𝄫,
// measured and drawn run by run on a baseline.
import { toUnicode } from '../../../src/theory'
import { fontForCharacter } from './font-files'

export interface TextStyle {
  size: number
  bold?: boolean
  color?: string
  align?: 'left' | 'center' | 'right'
}

interface Run {
  font: string
  text: string
}

/**
 * Splits text into runs of one font each; ASCII note names ("F#3", "Eb") get their glyphs first.
 *
 * @example
 * textRuns('F#3', { size: 10 }) // [{ font: 'Roboto', text: 'F' }, { font: 'Accidentals', text: '♯' }, { font: 'Roboto', text: '3' }]
 */
export function textRuns(text: string, style: Pick<TextStyle, 'bold'>): Run[] {
  const runs: Run[] = []
  for (const character of toUnicode(text)) {
    const kind = fontForCharacter(character)
    const font = kind === 'text' ? (style.bold ? 'Roboto-Bold' : 'Roboto') : kind
    const last = runs.at(-1)
    if (last?.font === font) last.text += character
    else runs.push({ font, text: character })
  }
  return runs
}

/** The width of a text in points. */
export function measureText(doc: PDFKit.PDFDocument, text: string, style: TextStyle): number {
  return textRuns(text, style).reduce(
    (width, run) => width + doc.font(run.font).fontSize(style.size).widthOfString(run.text),
    0,
  )
}

/**
 * Draws text with its baseline at y; `align` places it from, around or up to x.
 *
 * @example
 * drawText(doc, 'Bb2', 100, 200, { size: 9, align: 'center' })
 */
export function drawText(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  style: TextStyle,
): number {
  const width = measureText(doc, text, style)
  let at = style.align === 'center' ? x - width / 2 : style.align === 'right' ? x - width : x
  doc.fillColor(style.color ?? '#000000')
  for (const run of textRuns(text, style)) {
    doc.font(run.font).fontSize(style.size)
    doc.text(run.text, at, y, { baseline: 'alphabetic', lineBreak: false })
    at += doc.widthOfString(run.text)
  }
  return width
}
