// Renders the installable app's PNG icons from public/favicon.svg with Debian's Chromium (output is
// committed): 192 and 512 px as drawn, and a 512 px "maskable" one with the mark inside the safe zone.
// Usage: node --import tsx scripts/render-icons.ts
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { chromium } from 'playwright-core'
import { ROOT } from './lib/paths.mjs'

const svg = readFileSync(path.join(ROOT, 'public', 'favicon.svg'), 'utf8')
const inner = svg.replace(/^<svg[^>]*>/, '').replace(/<\/svg>\s*$/, '')
// Maskable: full-bleed background, the mark scaled to 70 % (inside the 80 % safe circle).
const maskable = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" fill="#1E4D6B"/><g transform="translate(4.8 4.8) scale(0.7)">${inner}</g></svg>`

const ICONS = [
  { file: 'icon-192.png', size: 192, source: svg },
  { file: 'icon-512.png', size: 512, source: svg },
  { file: 'maskable-512.png', size: 512, source: maskable },
]

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu'],
})
try {
  for (const { file, size, source } of ICONS) {
    const page = await browser.newPage({ viewport: { width: size, height: size } })
    const sized = source.replace('<svg ', `<svg width="${size}" height="${size}" `)
    await page.setContent(`<body style="margin:0">${sized}</body>`)
    const out = path.join(ROOT, 'public', 'icons', file)
    await page.screenshot({ path: out, omitBackground: true })
    console.log(`[icons] ${path.relative(ROOT, out)}`)
    await page.close()
  }
} finally {
  await browser.close()
}
