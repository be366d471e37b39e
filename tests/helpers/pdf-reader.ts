// Reads a PDF back for tests: pages (size, text items with positions and fonts) via pdf.js (legacy
// build for Node), and the embedded font names straight from the file's font dictionaries.
export interface TextItem {
  text: string
  x: number
  y: number
  width: number
}

export interface PdfPage {
  width: number
  height: number
  items: TextItem[]
  /** All text of the page, items joined in reading order with spaces. */
  text: string
}

export async function readPdf(bytes: Uint8Array): Promise<PdfPage[]> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs')
  const pdf = await pdfjs.getDocument({ data: new Uint8Array(bytes), verbosity: 0 }).promise
  const pages: PdfPage[] = []
  for (let n = 1; n <= pdf.numPages; n += 1) {
    const page = await pdf.getPage(n)
    const [, , width = 0, height = 0] = page.view
    const content = await page.getTextContent()
    const items = content.items.flatMap((item) =>
      'str' in item && item.str !== ''
        ? [
            {
              text: item.str,
              x: item.transform[4] as number,
              y: item.transform[5] as number,
              width: item.width,
            },
          ]
        : [],
    )
    pages.push({ width, height, items, text: tokenRows(items).flat().join(' ') })
  }
  await pdf.destroy()
  return pages
}

/**
 * Text rows from top to bottom, each a list of words: items on one baseline that touch (a letter
 * and its ♯ drawn in another font) are one word.
 */
export function tokenRows(items: readonly TextItem[]): string[][] {
  const byRow = new Map<number, TextItem[]>()
  for (const item of items) {
    const y = Math.round(item.y * 2) / 2
    byRow.set(y, [...(byRow.get(y) ?? []), item])
  }
  return [...byRow.entries()]
    .sort(([a], [b]) => b - a)
    .map(([, row]) => {
      const sorted = [...row].sort((a, b) => a.x - b.x)
      const words: string[] = []
      let end = -Infinity
      for (const item of sorted) {
        if (item.x - end < 0.6 && words.length > 0) words[words.length - 1] += item.text
        else words.push(item.text)
        end = item.x + item.width
      }
      return words.flatMap((word) => word.split(/\s+/)).filter(Boolean)
    })
}

/** The BaseFont names of the embedded fonts ("ABCDEF+Roboto-Regular" → "Roboto-Regular"). */
export function embeddedFonts(bytes: Uint8Array): { names: string[]; fontFiles: number } {
  const text = Buffer.from(bytes).toString('latin1')
  const names = [...text.matchAll(/\/BaseFont\s*\/(?:[A-Z]{6}\+)?([\w-]+)/g)].map((m) => m[1] ?? '')
  return { names: [...new Set(names)], fontFiles: (text.match(/\/FontFile2\b/g) ?? []).length }
}

/** supertest parser that keeps a binary body as a Buffer. */
export function binary(res: unknown, done: (error: Error | null, body: unknown) => void) {
  const stream = res as NodeJS.ReadableStream
  const chunks: Buffer[] = []
  stream.on('data', (chunk: Buffer) => chunks.push(chunk))
  stream.on('end', () => done(null, Buffer.concat(chunks)))
}
