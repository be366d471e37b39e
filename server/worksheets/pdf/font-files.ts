// The fonts worksheets embed: the app's own Roboto (@fontsource, latin subset) and the accidental
// glyphs Roboto lacks (built by `npm run fonts` into src/assets/fonts, shared with the web app).
import { createRequire } from 'node:module'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

const require = createRequire(import.meta.url)
export const FONT_DIR = path.join(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../../src/assets/fonts',
)

/** A glyph font cut from a bigger one: where it comes from, what it keeps, where it goes. */
export interface AccidentalFont {
  /** The PDF font name the worksheets register it under. */
  name: string
  source: string
  licence: string
  characters: string
  /** File name without extension: `.woff2` for browsers, `.woff` for the PDFs. */
  file: string
  licenceFile: string
}

export const ACCIDENTAL_FONTS: readonly AccidentalFont[] = [
  {
    name: 'Accidentals',
    source: '@fontsource/dejavu-sans/files/dejavu-sans-latin-400-normal.woff',
    licence: '@fontsource/dejavu-sans/LICENSE',
    characters: '♯♭♮',
    file: 'accidentals-dejavu-sans',
    licenceFile: 'LICENSE-DejaVu.txt',
  },
  {
    name: 'DoubleAccidentals',
    source: '@fontsource/noto-music/files/noto-music-music-400-normal.woff',
    licence: '@fontsource/noto-music/LICENSE',
    characters: '𝄪𝄫',
    file: 'accidentals-noto-music',
    licenceFile: 'LICENSE-NotoMusic.txt',
  },
]

/** Roboto as the app ships it (latin subset, regular and bold). */
export const ROBOTO = {
  regular: require.resolve('@fontsource/roboto/files/roboto-latin-400-normal.woff'),
  bold: require.resolve('@fontsource/roboto/files/roboto-latin-700-normal.woff'),
}

/** Which font draws a character: the accidental fonts for their glyphs, Roboto for the rest. */
export function fontForCharacter(character: string): 'text' | 'Accidentals' | 'DoubleAccidentals' {
  if ('♯♭♮'.includes(character)) return 'Accidentals'
  if (character === '𝄪' || character === '𝄫') return 'DoubleAccidentals'
  return 'text'
}
