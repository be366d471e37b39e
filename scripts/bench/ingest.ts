// Ingest benchmark (npm run bench:ingest): the same kind of rows go straight into a trigger-free copy
// of attempts as 20-row INSERTs (the raw baseline of this run), then autocannon posts batches of 20
// attempts to POST /api/attempts for signed-in students (the API as its own process, on loopback, for
// a bounded time), saturated and paced at half its capacity, while the statistics queue's depth and
// lag are sampled; then saturated again on 1 and on 2 app processes (WEB_CONCURRENCY). Prints
// requests/s, rows/s, p99, the ratios and the queue figures.
import { availableParallelism, loadavg } from 'node:os'
import { randomUUID } from 'node:crypto'
import autocannon from 'autocannon'
import knex from 'knex'
import { knexConfig } from '../../db/knex-config'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import { issueSessionToken } from '../../server/auth/sessions'
import { loadConfig } from '../../server/config'
import { attemptRow } from '../../server/attempts/attempts-repository'
import { queueState } from '../../server/statistics/rollup-queue-repository'
import { findUserById } from '../../server/users/users-repository'
import { localSecret } from '../lib/paths.mjs'
import { freePort, startService, stopService } from '../lib/proc.mjs'
import { BENCH_DATABASE, freshBenchDatabase } from './bench-app'
import { BASS, createBass, createPlayer } from './bench-seed'
import { postgresCpuMs, processCpuMs } from './cpu-time'

const SECONDS = Number(process.env.BENCH_SECONDS ?? 15)
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10)
const PLAYERS = Number(process.env.BENCH_PLAYERS ?? 20)
const BATCH = 20
/** POST /api/attempts before the statistics queue (DEVELOPERS.md, "Benchmarks"): the 3× target. */
const BEFORE_QUEUE_RPS = 185
const SAMPLE_MS = 100
const DRAIN_WAIT_MS = 60_000

interface Player {
  id: string
  instrumentId: string
  cookie: string
}

/** A batch of graded answers as a drill sends it (new ids each time, so every row is stored). */
function batch(player: Player) {
  const sessionId = randomUUID()
  const now = Date.now()
  return Array.from({ length: BATCH }, (_, i) => {
    const string = i % 4
    const fret = (i * 7) % 13
    const correct = i % 7 !== 0
    return {
      id: randomUUID(),
      instrumentId: player.instrumentId,
      tuning: BASS,
      drill: 'recall' as const,
      sessionId,
      string,
      fret,
      expectedPitch: BASS[string]! + fret,
      answer: correct ? 'C' : 'D',
      correct,
      responseMs: 900 + ((i * 131) % 2000),
      createdAt: new Date(now - (BATCH - i) * 3000).toISOString(),
      detail: {},
      planItemId: null,
      outcome: 'answered' as const,
    }
  })
}

const toRow = (playerId: string) => (a: ReturnType<typeof batch>[number]) => attemptRow(playerId, a)

/** autocannon for a bounded time; `overallRate` (req/s over all connections) paces it when set. */
async function apiRun(
  url: string,
  players: Player[],
  { connections = CONNECTIONS, seconds = SECONDS, overallRate = 0 } = {},
) {
  let next = 0
  const result = await autocannon({
    url,
    connections,
    duration: seconds,
    ...(overallRate ? { overallRate } : {}),
    requests: [
      {
        method: 'POST',
        path: '/api/attempts',
        setupRequest: (request) => {
          const player = players[next++ % players.length]!
          return {
            ...request,
            headers: {
              'content-type': 'application/json',
              cookie: player.cookie,
              'x-requested-with': 'ambitus', // the anti-CSRF header the client sends
            },
            body: JSON.stringify({ attempts: batch(player), timeZone: 'Europe/Oslo' }),
          }
        },
      },
    ],
  })
  return {
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    ok: result['2xx'],
    failed: result.non2xx + result.errors,
  }
}

/** The same rows through a plain pg pool: CONNECTIONS workers, one 20-row INSERT after another. */
async function rawRun(url: string, players: Player[], table = 'attempts') {
  const db = knex({ ...knexConfig(url), pool: { min: CONNECTIONS, max: CONNECTIONS } })
  const latencies: number[] = []
  const end = performance.now() + SECONDS * 1000
  let next = 0
  const worker = async () => {
    while (performance.now() < end) {
      const player = players[next++ % players.length]!
      const start = performance.now()
      // The same statement form as the API's insert (one JSON parameter), without the API around it.
      const rows = batch(player).map(toRow(player.id))
      const columns = Object.keys(rows[0]!).join(', ')
      await db.raw(
        `insert into ${table} (${columns}) select ${columns} from json_populate_recordset(null::${table}, ?::json)`,
        [JSON.stringify(rows)],
      )
      latencies.push(performance.now() - start)
    }
  }
  const started = performance.now()
  const cpu = cpuSince()
  await Promise.all(Array.from({ length: CONNECTIONS }, worker))
  const seconds = (performance.now() - started) / 1000
  const cost = cpu(latencies.length) // before the pool closes: a backend's CPU goes with it
  await db.destroy()
  latencies.sort((a, b) => a - b)
  return {
    rps: latencies.length / seconds,
    p99: latencies[Math.floor(latencies.length * 0.99)] ?? NaN,
    postgresCpuMs: cost.postgres,
  }
}

/** Samples the statistics queue while `work` runs: the deepest queue and the longest wait seen. */
async function sampledQueue<T>(url: string, work: Promise<T>) {
  const db = knex({ ...knexConfig(url), pool: { min: 1, max: 1 } })
  let done = false
  let maxDepth = 0
  let maxLagMs = 0
  const sampling = (async () => {
    while (!done) {
      const state = await queueState(db)
      maxDepth = Math.max(maxDepth, state.depth)
      maxLagMs = Math.max(maxLagMs, state.lagMs)
      await new Promise((resolve) => setTimeout(resolve, SAMPLE_MS))
    }
  })()
  const result = await work.finally(() => (done = true))
  await sampling
  const after = performance.now()
  // bounded: a drain that does not keep up shows as a time past the limit, not as a hung benchmark
  while ((await queueState(db)).depth > 0 && performance.now() - after < DRAIN_WAIT_MS)
    await new Promise((r) => setTimeout(r, SAMPLE_MS))
  const drainMs = performance.now() - after
  await db.destroy()
  return { result, maxDepth, maxLagMs, drainMs }
}

/** CPU ms per request of the app process (when given) and of PostgreSQL from now until the call. */
function cpuSince(appPid?: number) {
  const app0 = appPid ? processCpuMs(appPid) : 0
  const pg0 = postgresCpuMs()
  return (requests: number) => ({
    app: appPid ? (processCpuMs(appPid) - app0) / requests : 0,
    postgres: (postgresCpuMs() - pg0) / requests,
  })
}

/** Waits until the API on the port answers (bounded: a dead server fails the runs instead). */
async function healthy(port: number) {
  for (let i = 0; i < 200; i++) {
    const ok = await fetch(`http://127.0.0.1:${port}/api/health`).then(
      (r) => r.ok,
      () => false,
    )
    if (ok) return
    await new Promise((r) => setTimeout(r, 150))
  }
}

/** The saturated API run against WEB_CONCURRENCY app processes (node:cluster) sharing one port. */
async function processesRun(env: NodeJS.ProcessEnv, processes: number, drain = true) {
  const port = await freePort()
  const cluster = startService(
    `bench-api×${processes}`,
    process.execPath,
    ['--import', 'tsx', 'server/cluster.ts'],
    {
      env: {
        ...env,
        PORT: String(port),
        WEB_CONCURRENCY: String(processes),
        STATISTICS_DRAIN: drain ? 'on' : 'off',
      },
    },
  )
  try {
    await healthy(port)
    return await apiRun(`http://127.0.0.1:${port}`, players)
  } finally {
    await stopService(cluster)
  }
}

const url = await freshBenchDatabase(`${BENCH_DATABASE}_ingest`)
const config = loadConfig({ ...process.env, DATABASE_URL: url, JWT_SECRET: localSecret('jwt') })
const db = knex(knexConfig(url))
const players: Player[] = []
for (let i = 0; i < PLAYERS; i++) {
  const id = await createPlayer(db, 'student', `ingest-${i}`)
  const user = (await findUserById(db, id))!
  players.push({
    id,
    instrumentId: await createBass(db, id),
    cookie: `${SESSION_COOKIE}=${await issueSessionToken({ db, config }, user.id)}`,
  })
}
await db.raw('create table attempts_plain (like attempts including defaults)')
await db.destroy()

const port = await freePort()
const env = {
  ...process.env,
  DATABASE_URL: url,
  JWT_SECRET: config.jwtSecret,
  PORT: String(port),
  LOG_LEVEL: 'silent',
  SMTP_PORT: String(await freePort()),
}
// BENCH_PROFILE=<dir> writes a CPU profile of the API process there (open it in Chrome DevTools).
const profile = process.env.BENCH_PROFILE
  ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_PROFILE}`]
  : []
const server = startService(
  'bench-api',
  process.execPath,
  [...profile, '--import', 'tsx', 'server/index.ts'],
  {
    env,
  },
)
try {
  await healthy(port)
  console.log(
    `machine load: ${loadavg()[0]!.toFixed(1)} (1-min average) on ${availableParallelism()} cores`,
  )
  console.log(
    `ingest benchmark: ${SECONDS} s per run, ${CONNECTIONS} concurrent connections, batches of ${BATCH}, ${PLAYERS} signed-in students`,
  )
  const apiUrl = `http://127.0.0.1:${port}`
  const plain = await rawRun(url, players, 'attempts_plain')
  const apiCpu = cpuSince(server.pid!)
  const saturated = await sampledQueue(url, apiRun(apiUrl, players))
  const api = saturated.result
  const apiCost = apiCpu(api.ok)
  const single = await apiRun(apiUrl, players, { connections: 1, seconds: 5 })
  // Half the measured capacity, paced: the latency a studio sees while the server is busy but not
  // saturated (at saturation every request also waits behind the nine others, so p99 ≈ queue time).
  const halfRate = Math.max(1, Math.round(api.rps / 2))
  const half = await sampledQueue(url, apiRun(apiUrl, players, { overallRate: halfRate }))
  const paced = half.result
  const queued = await sampledQueue(url, rawRun(url, players))
  const row = (name: string, rps: number, p99: number) =>
    console.log(
      `  ${name.padEnd(56)} ${rps.toFixed(0).padStart(6)} req/s ${(rps * BATCH).toFixed(0).padStart(7)} rows/s   p99 ${p99.toFixed(1)} ms`,
    )
  const queueLine = (name: string, q: Awaited<ReturnType<typeof sampledQueue>>) =>
    console.log(
      `  statistics queue ${name}: deepest ${q.maxDepth} answers, longest wait ${q.maxLagMs.toFixed(0)} ms, empty ${q.drainMs.toFixed(0)} ms after the load`,
    )
  row('raw INSERT into a copy without triggers (baseline)', plain.rps, plain.p99)
  row('POST /api/attempts (autocannon, saturated)', api.rps, api.p99)
  row(
    'raw INSERT into attempts (queue trigger on; information)',
    queued.result.rps,
    queued.result.p99,
  )
  console.log(`  API responses: ${api.ok} ok, ${api.failed} failed; API p50 ${api.p50} ms`)
  console.log(
    `  CPU per request, saturated (with the drain of its answers): API process ${apiCost.app.toFixed(2)} ms, PostgreSQL ${apiCost.postgres.toFixed(2)} ms; raw INSERT baseline: PostgreSQL ${plain.postgresCpuMs.toFixed(2)} ms`,
  )
  console.log(
    `  one connection (no queueing): ${single.rps.toFixed(0)} req/s, p50 ${single.p50} ms, p99 ${single.p99} ms`,
  )
  console.log(
    `  paced at ${halfRate} req/s (half the capacity): ${paced.rps.toFixed(0)} req/s, p50 ${paced.p50} ms, p99 ${paced.p99} ms, ${paced.failed} failed`,
  )
  queueLine('at half capacity', half)
  queueLine('saturated', saturated)
  queueLine('under the raw INSERTs', queued)
  const met = (ok: boolean) => (ok ? 'met' : 'NOT met')
  const ratio = api.rps / plain.rps
  console.log(
    `ingest: api=${api.rps.toFixed(0)} req/s (${(api.rps / BEFORE_QUEUE_RPS).toFixed(1)}× the ${BEFORE_QUEUE_RPS} before, target ≥ 3×: ${met(api.rps >= 3 * BEFORE_QUEUE_RPS)})` +
      ` api/raw=${ratio.toFixed(2)} (target ≥ 0.35: ${met(ratio >= 0.35)})` +
      ` p99=${paced.p99.toFixed(1)}ms at half load (target < 50 ms: ${met(paced.p99 < 50)})` +
      ` queue at half load: ≤ ${half.maxDepth} answers, lag ≤ ${half.maxLagMs.toFixed(0)} ms (target ≤ 2000 ms: ${met(half.maxLagMs <= 2000)})`,
  )
} finally {
  await stopService(server)
}
// Scale-out: the same saturated load on 1 and on 2 app processes (one port, node:cluster). On a
// machine of 2 shared cores PostgreSQL and autocannon compete with the second process.
const one = await processesRun(env, 1)
const two = await processesRun(env, 2)
console.log(
  `ingest processes: 1 process ${one.rps.toFixed(0)} req/s (p99 ${one.p99} ms), 2 processes ${two.rps.toFixed(0)} req/s (p99 ${two.p99} ms), ratio 2/1 = ${(two.rps / one.rps).toFixed(2)}; ${one.failed + two.failed} failed`,
)
// The request path alone: one process whose background drain is off, so no rollup shares the cores
// (its answers stay queued; the bench database is thrown away). The ceiling of the API on this
// machine whatever the statistics cost, beside the raw INSERT baseline measured the same way.
const requestPath = await processesRun(env, 1, false)
const rawAgain = await rawRun(url, players, 'attempts_plain')
console.log(
  `ingest request path alone (background drain off; information): ${requestPath.rps.toFixed(0)} req/s, p99 ${requestPath.p99} ms; raw INSERT baseline now ${rawAgain.rps.toFixed(0)} req/s; ratio ${(requestPath.rps / rawAgain.rps).toFixed(2)}`,
)
