// Property-based fuzzing of every JSON route (POST, PUT, PATCH reading a body, from the app's route
// table): 300 hostile bodies in all (FUZZ_BODIES; `npm run test:fuzz` sends 10,000), each sent by a caller the route lets in, so the body reaches
// its parser and its service. The property: no answer is a 5xx. Prints the seed, the total and the 5xx count.
import fc from 'fast-check'
import { mkdtempSync, rmSync } from 'node:fs'
import type { Server } from 'node:http'
import type { AddressInfo } from 'node:net'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { startTestApi, type TestApi } from '../helpers/api'
import { hostileBodies } from '../helpers/fuzz-bodies'
import { buildFixture, cookieFor, type Fixture, type Role } from '../helpers/matrix-fixture'
import { ROWS, type Row } from '../helpers/route-rows'
import { routeKey, routeTable } from '../helpers/route-table'

const TOTAL_BODIES = Number(process.env.FUZZ_BODIES ?? 300)
const ROUTES_AT_ONCE = 6
// The caller each route is fuzzed as: the first of these it lets in (else anonymous).
const PREFERRED: Role[] = ['student', 'teacher', 'admin', 'classmate', 'outsider', 'otherTeacher']

let api: TestApi
let server: Server
let dataDir: string
let f: Fixture

beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-fuzz-'))
  api = await startTestApi({ dataDir })
  f = await buildFixture(api)
  server = await new Promise<Server>((ready) => {
    const listening = api.bareApp.listen(0, '127.0.0.1', () => ready(listening))
  })
  // Longer than any answer on a loaded machine, so the client never reuses a socket as it closes.
  server.keepAliveTimeout = 120_000
})
afterAll(async () => {
  await new Promise((r) => server.close(r))
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

interface Outcome {
  key: string
  sent: number
  serverErrors: { status: number; body: string; sample: string }[]
  unanswered: { error: string; length: number; sample: string }[]
  /** 503 + Retry-After: the machine's load (database or hashing pool full), not the body. */
  busy: number
}

const callerOf = ([, expected]: Row): Role =>
  PREFERRED.find((role) => expected[role] < 300) ?? 'anonymous'

/** Sends each body to one route in turn; a fresh session when a body signed the caller out. */
async function fuzzRoute(key: string, row: Row, bodies: string[]): Promise<Outcome> {
  const [method] = key.split(' ') as [string]
  const role = callerOf(row)
  const { path: routePath } = row[0](f)
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}${routePath}`
  let cookie = await cookieFor(api, f, role)
  const started = Date.now()
  const outcome: Outcome = { key, sent: 0, serverErrors: [], unanswered: [], busy: 0 }
  for (const body of bodies) {
    const send = () =>
      fetch(url, {
        method,
        headers: {
          'content-type': 'application/json',
          [CSRF_HEADER]: CSRF_VALUE,
          ...(cookie ? { cookie } : {}),
        },
        body,
        signal: AbortSignal.timeout(120_000), // an answer that never comes fails, never hangs
      }).catch((error: Error) => error)
    // One retry on a network error (a socket the server was closing); twice is a failure.
    let res = await send()
    if (res instanceof Error) res = await send()
    if (res instanceof Error) {
      outcome.sent += 1
      outcome.unanswered.push({
        error: String(res.cause ?? res),
        length: body.length,
        sample: body.slice(0, 100),
      })
      continue
    }
    const text = await res.text()
    outcome.sent += 1
    if (res.status === 503 && res.headers.has('retry-after')) outcome.busy += 1
    else if (res.status >= 500)
      outcome.serverErrors.push({ status: res.status, body: text, sample: body.slice(0, 300) })
    if (res.status === 401 && role !== 'anonymous') cookie = await cookieFor(api, f, role)
  }
  if (process.env.FUZZ_TIMING) console.log(`${key}: ${outcome.sent} in ${Date.now() - started} ms`)
  return outcome
}

/** Runs the routes a few at a time. */
async function inPool<T>(jobs: (() => Promise<T>)[], width: number): Promise<T[]> {
  const results: T[] = []
  let next = 0
  const worker = async () => {
    while (next < jobs.length) {
      const job = jobs[next++]!
      results.push(await job())
    }
  }
  await Promise.all(Array.from({ length: width }, worker))
  return results
}

it(
  `when ${TOTAL_BODIES.toLocaleString('en')} hostile bodies reach every JSON route, then none is answered with a 5xx`,
  { timeout: 3_600_000 },
  async () => {
    const jsonRoutes = routeTable(api.bareApp)
      .filter((r) => ['POST', 'PUT', 'PATCH'].includes(r.method))
      .map(routeKey)
      .filter((key) => ROWS[key]?.[0](f).body) // routes that read a JSON body (uploads: own tests)
    const seed = Date.now() % 2 ** 31
    const share = (i: number) =>
      Math.floor(TOTAL_BODIES / jsonRoutes.length) + (i < TOTAL_BODIES % jsonRoutes.length ? 1 : 0)
    const jobs = jsonRoutes.map((key, i) => () => {
      const row = ROWS[key]!
      const bodies = fc.sample(hostileBodies(row[0](f).body), { numRuns: share(i), seed: seed + i })
      return fuzzRoute(key, row, bodies)
    })

    const outcomes = await inPool(jobs, ROUTES_AT_ONCE)

    const sent = outcomes.reduce((n, o) => n + o.sent, 0)
    const failures = outcomes.flatMap((o) => o.serverErrors.map((e) => ({ route: o.key, ...e })))
    const busy = outcomes.reduce((n, o) => n + o.busy, 0)
    const unanswered = outcomes.flatMap((o) => o.unanswered.map((e) => ({ route: o.key, ...e })))
    console.log(
      `fuzz: ${sent} bodies to ${jsonRoutes.length} JSON routes, ${failures.length} answered 5xx, ${unanswered.length} unanswered, ${busy} told to retry (503 busy) (seed ${seed})`,
    )
    expect(failures.slice(0, 5)).toEqual([])
    expect(unanswered.slice(0, 5)).toEqual([])
    expect(sent).toBe(TOTAL_BODIES)
  },
)
