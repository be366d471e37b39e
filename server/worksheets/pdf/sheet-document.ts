// A worksheet PDF: paper size, margins, the embedded fonts (Roboto + accidentals), and the bytes.
import { readFileSync } from 'node:fs'
import path from 'node:path'
import PDFDocument from 'pdfkit'
import { ACCIDENTAL_FONTS, FONT_DIR, ROBOTO } from './font-files'

export type Paper = 'a4' | 'letter'

/** Page sizes in PDF points (1/72 in): A4 210 × 297 mm (ISO 216), US Letter 8.5 × 11 in. */
export const PAPER_SIZES: Readonly<Record<Paper, { width: number; height: number }>> = {
  a4: { width: 595.28, height: 841.89 },
  letter: { width: 612, height: 792 },
}

/** Space kept free around each page (about 14 mm: safe for any office printer). */
export const MARGIN = 40

/** The printable box of a page. */
export interface Frame {
  x: number
  y: number
  width: number
  height: number
}

export function pageFrame(paper: Paper): Frame {
  const { width, height } = PAPER_SIZES[paper]
  return { x: MARGIN, y: MARGIN, width: width - 2 * MARGIN, height: height - 2 * MARGIN }
}

let fontBytes: Map<string, Buffer> | undefined

function fonts(): Map<string, Buffer> {
  fontBytes ??= new Map([
    ['Roboto', readFileSync(ROBOTO.regular)],
    ['Roboto-Bold', readFileSync(ROBOTO.bold)],
    ...ACCIDENTAL_FONTS.map(
      (font) => [font.name, readFileSync(path.join(FONT_DIR, `${font.file}.woff`))] as const,
    ),
  ])
  return fontBytes
}

/** A new document on the chosen paper with our fonts registered; the first page is added. */
export function createSheet(paper: Paper, title: string): PDFKit.PDFDocument {
  const { width, height } = PAPER_SIZES[paper]
  const doc = new PDFDocument({
    size: [width, height],
    margin: MARGIN,
    info: { Title: title, Creator: 'Ambitus', Producer: 'Ambitus worksheets' },
  })
  for (const [name, bytes] of fonts()) doc.registerFont(name, bytes)
  doc.font('Roboto')
  return doc
}

/** Ends the document and resolves to its bytes. */
export function pdfBuffer(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = []
    doc.on('data', (chunk: Buffer) => chunks.push(chunk))
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
    doc.end()
  })
}
