// Bundle budget: JavaScript a drill page loads first (gzip), against the 120 kB budget; the landing
// page's first load (the entry alone) is measured in the same run as the baseline.
import { execFileSync } from 'node:child_process'
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { gzipSync } from 'node:zlib'

const OUT = path.resolve('.test-output/bundle-dist')
const BUDGET_KB = 120
const DRILL_PAGES = [
  'src/drills/hunt/PitchHuntView.vue',
  'src/drills/recall/NeckRecallView.vue',
  'src/drills/runs/RangeRunsView.vue',
  'src/drills/scatter/OctaveScatterView.vue',
  'src/drills/cycle/WindowCycleView.vue',
]

interface Chunk {
  file: string
  src?: string
  isEntry?: boolean
  imports?: string[]
}

execFileSync('npx', ['vite', 'build', '--manifest', '--outDir', OUT, '--emptyOutDir'], {
  stdio: ['ignore', 'ignore', 'inherit'],
})
const manifest = JSON.parse(readFileSync(path.join(OUT, '.vite/manifest.json'), 'utf8')) as Record<
  string,
  Chunk
>

/** A chunk and everything it imports statically (what the browser must load before it runs). */
function closure(key: string, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return seen
  seen.add(key)
  for (const next of manifest[key]?.imports ?? []) closure(next, seen)
  return seen
}

const gzipKb = (keys: Iterable<string>) =>
  [...keys]
    .map((key) => manifest[key]!.file)
    .filter((file) => file.endsWith('.js'))
    .reduce(
      (sum, file) => sum + gzipSync(readFileSync(path.join(OUT, file)), { level: 9 }).length,
      0,
    ) / 1024

const entryKey = Object.keys(manifest).find((key) => manifest[key]!.isEntry)!
const entry = closure(entryKey)
console.log(`landing page (entry alone, baseline): ${gzipKb(entry).toFixed(1)} kB gzip`)
for (const page of DRILL_PAGES) {
  if (!manifest[page]) continue
  const first = closure(page, new Set(entry))
  const kb = gzipKb(first)
  const verdict = kb <= BUDGET_KB ? 'within' : 'OVER'
  console.log(
    `${page}: ${kb.toFixed(1)} kB gzip first load (${verdict} the ${BUDGET_KB} kB budget)`,
  )
}
