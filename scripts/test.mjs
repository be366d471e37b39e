#!/usr/bin/env node
// npm test: all set-up (dependencies, PostgreSQL, Chromium), then type check, lint, and every
// Vitest layer (unit, client, server against PostgreSQL, end-to-end in Chromium). Ends with the
// plain line "N passed, N failed" and a non-zero exit code on any failure.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs'
import { execFileSync } from 'node:child_process'
import path from 'node:path'
import { TEST_OUTPUT_DIR } from './lib/paths.mjs'
import { log, run, runCaptured } from './lib/proc.mjs'
import { ensureDependencies } from './lib/setup.mjs'

const REPORT = path.join(TEST_OUTPUT_DIR, 'vitest.json')
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'

function ensureChromium() {
  if (existsSync(CHROMIUM)) return
  if (process.getuid?.() !== 0)
    throw new Error(`Chromium is missing at ${CHROMIUM}; install Debian's chromium package`)
  log('setup', "installing Debian's Chromium for end-to-end tests (first run only)…")
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' }
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env })
  execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env })
}

function summarise(steps) {
  let passed = 0
  let failed = 0
  if (existsSync(REPORT)) {
    const report = JSON.parse(readFileSync(REPORT, 'utf8'))
    passed = report.numPassedTests ?? 0
    failed =
      (report.numFailedTests ?? 0) + (report.numTodoTests ?? 0) + (report.numPendingTests ?? 0)
  }
  for (const [name, code] of steps) log('test', `${name}: ${code === 0 ? 'ok' : 'FAILED'}`)
  console.log(`${passed} passed, ${failed} failed`)
  const ok = steps.every(([, code]) => code === 0) && failed === 0 && passed > 0
  return ok ? 0 : 1
}

await ensureDependencies()
ensureChromium()
const db = await import('./db.mjs')
const startedDb = await db.startCluster()
mkdirSync(path.dirname(REPORT), { recursive: true })
rmSync(REPORT, { force: true })

const node = process.execPath
// The type check and lint run beside Vitest (whose browser and database waits leave the CPU idle);
// their output is held back and printed after the tests, so the logs do not interleave.
const checks = [
  ['type check (vue-tsc -b)', runCaptured(node, ['node_modules/vue-tsc/bin/vue-tsc.js', '-b'])],
  [
    'lint (eslint)',
    runCaptured(node, ['node_modules/eslint/bin/eslint.js', '.', '--max-warnings=0']),
  ],
]
const vitestArgs = ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${REPORT}`]
const vitestStep = [
  'vitest (unit, client, server, e2e)',
  await run(node, ['node_modules/vitest/vitest.mjs', ...vitestArgs]),
]
const steps = []
for (const [name, pending] of checks) {
  const { code, output } = await pending
  if (output.trim()) console.log(`\n[${name}]\n${output}`)
  steps.push([name, code])
}
steps.push(vitestStep)

if (startedDb) db.stopCluster()
process.exit(summarise(steps))
