// Builds the small "Ambitus Accidentals" fonts (npm run fonts): Roboto has no ♯ ♭ ♮, so the web app
// and the PDF worksheets take them from DejaVu Sans (text-style glyphs on the cap height) and the
// double sharp and flat (𝄪 𝄫) from Noto Music, each cut down to those glyphs with harfbuzz
// (subset-font) and written to src/assets/fonts/ with their licences. The output is committed.
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs'
import { createRequire } from 'node:module'
import path from 'node:path'
import subsetFont from 'subset-font'
import { ACCIDENTAL_FONTS } from '../server/worksheets/pdf/font-files'
import { ROOT } from './lib/paths.mjs'

const require = createRequire(import.meta.url)
const OUT = path.join(ROOT, 'src', 'assets', 'fonts')

for (const font of ACCIDENTAL_FONTS) {
  const source = readFileSync(require.resolve(font.source))
  // WOFF2 for browsers; WOFF for the PDFs (fontkit cannot subset a WOFF2's transformed glyphs).
  for (const format of ['woff2', 'woff'] as const) {
    const subset = await subsetFont(source, font.characters, { targetFormat: format })
    const file = `${font.file}.${format}`
    writeFileSync(path.join(OUT, file), subset)
    console.log(`${file}: ${subset.length} bytes (${font.characters})`)
  }
  copyFileSync(require.resolve(font.licence), path.join(OUT, font.licenceFile))
}
