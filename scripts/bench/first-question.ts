// First question interactive: the built app in Chromium, the signed-in demo student opens a drill
// link that starts a session (?start=1) with a cold cache; time from navigation to the first question
// with a selectable fretboard cell, with the CPU throttled ×4 (target 1.2 s) and unthrottled as the
// baseline of the same run. BENCH_RUNS=<n> runs per figure (median); BENCH_DRILLS=hunt,runs picks;
// BENCH_DIST=<dir> times another build.
import { randomBytes } from 'node:crypto'
import { loadavg } from 'node:os'
import path from 'node:path'
import { chromium, type Browser, type BrowserContextOptions } from 'playwright-core'
import { startCluster } from '../db.mjs'
import { databaseUrl, ROOT } from '../lib/paths.mjs'
import { freePort, startService, stopService } from '../lib/proc.mjs'
import { ensureClientBuild, prepareDatabase } from '../lib/setup.mjs'

// BENCH_DIST=<dir> times a build made elsewhere (e.g. of another commit) as it is.
const OUT = process.env.BENCH_DIST ?? path.join(ROOT, '.test-output/bench-dist')
const DATABASE = 'ambitus_bench_first'
const TARGET_MS = 1200
const THROTTLE = 4
const RUNS = Number(process.env.BENCH_RUNS ?? 5)
const DRILLS = (process.env.BENCH_DRILLS ?? 'hunt,recall,runs,scatter,cycle').split(',')
const STUDENT = 'student@cedarhollow.test'
/** In the page: the time since navigation once a question shows and a board cell can be picked. */
function firstQuestionReady() {
  // Typed by hand: this script is type-checked without the DOM library.
  const page = globalThis as unknown as { document: { querySelector(css: string): unknown } }
  const asked = page.document.querySelector('[data-testid="question"]')
  const cell = page.document.querySelector(
    '[data-testid="fretboard"] [data-fret]:not([aria-disabled="true"])',
  )
  return asked && cell ? performance.now() : null
}

async function startServer(): Promise<{ url: string; stop: () => Promise<void> }> {
  const [port, smtpPort] = [await freePort(), await freePort()]
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl(DATABASE),
    PORT: String(port),
    SMTP_PORT: String(smtpPort),
    CLIENT_DIST: OUT,
    AMBITUS_DATA_DIR: path.join(ROOT, '.test-output/bench-data'),
    JWT_SECRET: randomBytes(32).toString('hex'),
    // No mail sink runs here: a scheduled mail's failure is not this benchmark's business.
    LOG_LEVEL: 'fatal',
    APP_URL: `http://127.0.0.1:${port}`,
  }
  const child = startService(
    'bench-api',
    process.execPath,
    ['--import', 'tsx', 'server/index.ts'],
    {
      env,
    },
  )
  const url = `http://127.0.0.1:${port}`
  for (let i = 0; i < 200; i++) {
    const ok = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    )
    if (ok) return { url, stop: () => stopService(child) }
    await new Promise((r) => setTimeout(r, 150))
  }
  throw new Error(`the API did not become healthy at ${url}`)
}

/** Signs the demo student in through the form once; later contexts reuse the session cookie. */
async function signIn(browser: Browser, baseURL: string): Promise<BrowserContextOptions> {
  const context = await browser.newContext({ baseURL, serviceWorkers: 'block' })
  const page = await context.newPage()
  await page.goto('/sign-in')
  await page.getByLabel('E-mail').fill(STUDENT)
  await page.getByLabel('Password', { exact: true }).fill('ambitus-demo')
  await page.getByRole('button', { name: 'Sign in' }).click()
  await page.waitForURL('**/practice')
  const storageState = await context.storageState()
  await context.close()
  return { baseURL, serviceWorkers: 'block', storageState }
}

/** Milliseconds from navigation until the first question can be answered (cold cache), with when
 * the last script and API answer arrived. */
async function firstQuestionMs(
  browser: Browser,
  options: BrowserContextOptions,
  drill: string,
  rate: number,
) {
  const context = await browser.newContext(options)
  const page = await context.newPage()
  const cdp = await context.newCDPSession(page)
  await cdp.send('Emulation.setCPUThrottlingRate', { rate })
  await page.goto(`/practice/${drill}?start=1`, { waitUntil: 'commit' })
  // A function, not a string: the app's CSP refuses eval.
  const handle = await page.waitForFunction(firstQuestionReady, undefined, {
    timeout: 60_000,
    polling: 'raf',
  })
  const ready = (await handle.jsonValue()) as number
  const { scripts, api } = await page.evaluate(lastResponses)
  await context.close()
  return { ready, scripts, api }
}

/** In the page: when the last script and the last API answer had arrived (ms since navigation). */
function lastResponses() {
  // No inner named functions: tsx would wrap them in a helper the page does not have.
  const entries = performance.getEntriesByType('resource') as unknown as {
    name: string
    responseEnd: number
  }[]
  let scripts = 0
  let api = 0
  for (const { name, responseEnd } of entries) {
    if (name.endsWith('.js')) scripts = Math.max(scripts, responseEnd)
    if (name.includes('/api/')) api = Math.max(api, responseEnd)
  }
  return { scripts, api }
}

type Timing = Awaited<ReturnType<typeof firstQuestionMs>>
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!

async function main() {
  await startCluster()
  await prepareDatabase(DATABASE)
  if (!process.env.BENCH_DIST) await ensureClientBuild(OUT)
  const server = await startServer()
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-sync'],
  })
  try {
    const options = await signIn(browser, server.url)
    console.log(
      `load average at start: ${loadavg()
        .map((x) => x.toFixed(2))
        .join(' ')}`,
    )
    for (const drill of DRILLS) {
      const figures: Record<number, Timing[]> = { 1: [], [THROTTLE]: [] }
      for (let run = 0; run < RUNS; run++)
        for (const rate of [1, THROTTLE])
          figures[rate]!.push(await firstQuestionMs(browser, options, drill, rate))
      const at = (rate: number, key: keyof Timing) => median(figures[rate]!.map((t) => t[key]))
      const slow = at(THROTTLE, 'ready')
      const verdict = slow <= TARGET_MS ? 'within' : 'OVER'
      console.log(
        `/practice/${drill}: first question interactive ${slow.toFixed(0)} ms at CPU ×${THROTTLE} ` +
          `(${verdict} the ${TARGET_MS} ms target; unthrottled baseline ${at(1, 'ready').toFixed(0)} ms; ` +
          `median of ${RUNS}, cold cache); at ×${THROTTLE} the last script arrived at ` +
          `${at(THROTTLE, 'scripts').toFixed(0)} ms, the last API answer at ${at(THROTTLE, 'api').toFixed(0)} ms`,
      )
    }
    console.log(
      `load average at end: ${loadavg()
        .map((x) => x.toFixed(2))
        .join(' ')}`,
    )
  } finally {
    await browser.close()
    await server.stop()
  }
}

await main()
