// Turns the drawn board into a stand-alone image (SVG, or PNG through a canvas): theme colours
// resolved from the page and written onto each element, a background, interaction-only parts removed.
import { SVG, type Svg } from '@svgdotjs/svg.js'
import roboto400 from '@fontsource/roboto/files/roboto-latin-400-normal.woff2?url'
import roboto700 from '@fontsource/roboto/files/roboto-latin-700-normal.woff2?url'
import accidentalsDejaVu from '@/assets/fonts/accidentals-dejavu-sans.woff2?url'
import accidentalsNoto from '@/assets/fonts/accidentals-noto-music.woff2?url'

export interface ExportOptions {
  format: 'svg' | 'png'
  /** PNG pixels per SVG unit (2 = sharp on most screens and in print). */
  scale?: number
  /** Background colour; defaults to the page's surface colour. */
  background?: string
}

const STYLE_PROPERTIES = [
  'fill',
  'fill-opacity',
  'stroke',
  'stroke-opacity',
  'stroke-width',
  'stroke-dasharray',
  'stroke-linecap',
  'opacity',
  'font-size',
  'font-weight',
  'font-family',
  'text-anchor',
  'dominant-baseline',
]
// Hover and focus aids and the run marker mean nothing in a picture.
const INTERACTIVE_ONLY = '.fb-hit, .fb-focus, .fb-run-marker'

// The page's CSS (theme variables included) does not travel with the file: copy the used values.
function inlineStyles(source: Element, copy: Element) {
  const computed = getComputedStyle(source)
  const style = STYLE_PROPERTIES.map((name) => [name, computed.getPropertyValue(name)] as const)
    .filter(([, value]) => value !== '')
    .map(([name, value]) => `${name}:${value}`)
    .join(';')
  if (style) copy.setAttribute('style', withAccidentalFont(style))
  Array.from(source.children).forEach((child, i) => {
    const copied = copy.children[i]
    if (copied) inlineStyles(child, copied)
  })
}

function surfaceColour(svgElement: SVGSVGElement): string {
  const value = getComputedStyle(svgElement).getPropertyValue('--v-theme-surface').trim()
  return value ? `rgb(${value})` : '#ffffff'
}

// An image drawn from SVG cannot reach the page's fonts: the board's two weights and the ♯ ♭ ♮ 𝄪 𝄫
// glyphs (Roboto has none; see src/styles/accidentals.css) travel inside the file (600 on the board
// resolves to 700, as on the page). Fetched from our own origin, once.
export const ACCIDENTAL_FAMILY = 'Ambitus Accidentals'
interface EmbeddedFace {
  family: string
  weight: number
  url: string
  unicodeRange?: string
}
const FONT_FACES: EmbeddedFace[] = [
  { family: 'Roboto', weight: 400, url: roboto400 },
  { family: 'Roboto', weight: 700, url: roboto700 },
  { family: ACCIDENTAL_FAMILY, weight: 400, url: accidentalsDejaVu, unicodeRange: 'U+266D-266F' },
  { family: ACCIDENTAL_FAMILY, weight: 400, url: accidentalsNoto, unicodeRange: 'U+1D12A-1D12B' },
]
let fontCss: Promise<string> | null = null

/** A copied style whose font list names the accidental font after the text font, as the page does. */
export function withAccidentalFont(style: string): string {
  return style.replace(/font-family:([^;]*)/, (rule, families: string) =>
    families.includes(ACCIDENTAL_FAMILY)
      ? rule
      : `font-family:${families.replace(/,?\s*(sans-serif|serif)\s*$/, '')}, "${ACCIDENTAL_FAMILY}", sans-serif`,
  )
}

async function dataUrl(url: string): Promise<string> {
  // Small fonts arrive inlined by the build; fetching a data: URL is refused by our CSP (connect-src)
  if (url.startsWith('data:')) return url.replace(/^data:[^;,]*;/, 'data:font/woff2;')
  const blob = await (await fetch(url)).blob()
  return new Promise((resolve, reject) => {
    const reader = new FileReader()
    reader.onload = () => resolve(String(reader.result).replace(/^data:[^;]*;/, 'data:font/woff2;'))
    reader.onerror = () => reject(reader.error)
    reader.readAsDataURL(blob)
  })
}

const faceRule = async (face: EmbeddedFace) =>
  `@font-face{font-family:'${face.family}';font-style:normal;font-weight:${face.weight};` +
  (face.unicodeRange ? `unicode-range:${face.unicodeRange};` : '') +
  `src:url(${await dataUrl(face.url)}) format('woff2')}`

/** @font-face rules for Roboto and the accidentals, fonts inlined ('' when unreadable: system font). */
export function embeddedFontCss(): Promise<string> {
  fontCss ??= Promise.all(FONT_FACES.map(faceRule))
    .then((rules) => rules.join('') + `text{font-family:Roboto,"${ACCIDENTAL_FAMILY}",sans-serif}`)
    .catch((error: unknown) => {
      console.warn('Board export: fonts could not be embedded, a system font will show.', error)
      fontCss = null
      return ''
    })
  return fontCss
}

/**
 * A copy of the board as SVG markup with everything it needs to look the same on its own; `fontCss`
 * (see embeddedFontCss) goes into a style element so the labels keep their typeface.
 */
export function boardSvgMarkup(
  svgElement: SVGSVGElement,
  background?: string,
  fontCss = '',
): string {
  const copy = svgElement.cloneNode(true) as SVGSVGElement
  inlineStyles(svgElement, copy)
  copy.querySelectorAll(INTERACTIVE_ONLY).forEach((element) => element.remove())
  const [, , width = 0, height = 0] = (copy.getAttribute('viewBox') ?? '').split(' ').map(Number)
  const board = SVG(copy) as Svg
  board.attr({ width, height, style: null, role: null, 'aria-label': null })
  board
    .rect(width, height)
    .fill(background ?? surfaceColour(svgElement))
    .back()
  if (fontCss) board.element('style').words(fontCss).back()
  return board.svg()
}

function svgToPng(markup: string, width: number, height: number, scale: number): Promise<Blob> {
  return new Promise((resolve, reject) => {
    const image = new Image()
    const url = URL.createObjectURL(new Blob([markup], { type: 'image/svg+xml' }))
    image.onload = () => {
      const canvas = document.createElement('canvas')
      canvas.width = Math.round(width * scale)
      canvas.height = Math.round(height * scale)
      canvas.getContext('2d')?.drawImage(image, 0, 0, canvas.width, canvas.height)
      URL.revokeObjectURL(url)
      canvas.toBlob(
        (blob) => (blob ? resolve(blob) : reject(new Error('PNG export failed.'))),
        'image/png',
      )
    }
    image.onerror = () => {
      URL.revokeObjectURL(url)
      reject(new Error('The board could not be turned into a picture.'))
    }
    image.src = url
  })
}

/** The current board as a downloadable image (SVG markup, or PNG drawn through a canvas). */
export async function exportBoardImage(
  svgElement: SVGSVGElement,
  options: ExportOptions,
): Promise<Blob> {
  const markup = boardSvgMarkup(svgElement, options.background, await embeddedFontCss())
  if (options.format === 'svg') return new Blob([markup], { type: 'image/svg+xml' })
  const [, , width = 0, height = 0] = (svgElement.getAttribute('viewBox') ?? '')
    .split(' ')
    .map(Number)
  return svgToPng(markup, width, height, options.scale ?? 2)
}

/** Saves a blob under a file name through a temporary link (what "Export image" does). */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob)
  const link = document.createElement('a')
  link.href = url
  link.download = fileName
  document.body.appendChild(link)
  link.click()
  link.remove()
  setTimeout(() => URL.revokeObjectURL(url), 1000)
}
