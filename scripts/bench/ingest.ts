// Ingest benchmark (npm run bench:ingest): autocannon posts batches of 20 attempts to POST
// /api/attempts for signed-in students (the API as its own process, on loopback, for a bounded
// time), then the same kind of rows go straight into PostgreSQL as 20-row INSERTs with the same
// concurrency — the raw rate, measured in the same run. Prints requests/s, rows/s, p99 and the ratio.
import { availableParallelism, loadavg } from 'node:os'
import { randomUUID } from 'node:crypto'
import autocannon from 'autocannon'
import knex from 'knex'
import { knexConfig } from '../../db/knex-config'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import { issueSessionToken } from '../../server/auth/sessions'
import { loadConfig } from '../../server/config'
import { attemptRow } from '../../server/attempts/attempts-repository'
import { findUserById } from '../../server/users/users-repository'
import { localSecret } from '../lib/paths.mjs'
import { freePort, startService, stopService } from '../lib/proc.mjs'
import { BENCH_DATABASE, freshBenchDatabase } from './bench-app'
import { BASS, createBass, createPlayer } from './bench-seed'

const SECONDS = Number(process.env.BENCH_SECONDS ?? 15)
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10)
const PLAYERS = 20
const BATCH = 20

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
  await Promise.all(Array.from({ length: CONNECTIONS }, worker))
  const seconds = (performance.now() - started) / 1000
  await db.destroy()
  latencies.sort((a, b) => a - b)
  return {
    rps: latencies.length / seconds,
    p99: latencies[Math.floor(latencies.length * 0.99)] ?? NaN,
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
const server = startService('bench-api', process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  env,
})
try {
  for (let i = 0; i < 100; i++) {
    if (
      await fetch(`http://127.0.0.1:${port}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      break
    await new Promise((r) => setTimeout(r, 150))
  }
  console.log(
    `machine load: ${loadavg()[0]!.toFixed(1)} (1-min average) on ${availableParallelism()} cores`,
  )
  console.log(
    `ingest benchmark: ${SECONDS} s per run, ${CONNECTIONS} concurrent connections, batches of ${BATCH}, ${PLAYERS} signed-in students`,
  )
  const api = await apiRun(`http://127.0.0.1:${port}`, players)
  const single = await apiRun(`http://127.0.0.1:${port}`, players, { connections: 1, seconds: 5 })
  // Half the measured capacity, paced: the latency a studio sees while the server is busy but not
  // saturated (at saturation every request also waits behind the nine others, so p99 ≈ queue time).
  const halfRate = Math.max(1, Math.round(api.rps / 2))
  const paced = await apiRun(`http://127.0.0.1:${port}`, players, { overallRate: halfRate })
  const raw = await rawRun(url, players)
  const plain = await rawRun(url, players, 'attempts_plain')
  const row = (name: string, rps: number, p99: number) =>
    console.log(
      `  ${name.padEnd(52)} ${rps.toFixed(0).padStart(6)} req/s ${(rps * BATCH).toFixed(0).padStart(7)} rows/s   p99 ${p99.toFixed(1)} ms`,
    )
  row('POST /api/attempts (autocannon)', api.rps, api.p99)
  row('raw INSERT into attempts (statistics trigger on)', raw.rps, raw.p99)
  row('raw INSERT into a copy without trigger (information)', plain.rps, plain.p99)
  console.log(`  API responses: ${api.ok} ok, ${api.failed} failed; API p50 ${api.p50} ms`)
  console.log(
    `  one connection (no queueing): ${single.rps.toFixed(0)} req/s, p50 ${single.p50} ms, p99 ${single.p99} ms`,
  )
  console.log(
    `  paced at ${halfRate} req/s (half the capacity): ${paced.rps.toFixed(0)} req/s, p50 ${paced.p50} ms, p99 ${paced.p99} ms, ${paced.failed} failed`,
  )
  console.log(
    `ingest: api/raw=${(api.rps / raw.rps).toFixed(2)} (target ≥ 0.50) p99=${api.p99.toFixed(1)}ms saturated, ${paced.p99.toFixed(1)}ms at half load (target < 50 ms)`,
  )
} finally {
  await stopService(server)
}
