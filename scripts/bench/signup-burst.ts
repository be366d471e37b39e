// Sign-up burst benchmark (npm run bench:signup): the API as its own process; 24 sign-ups are sent at
// once while /api/health is asked again and again; prints health latency when idle (the baseline,
// same run) and during the burst, and how many sign-ups were created or refused.
// BENCH_ROOT=<checkout> measures another checkout's server (e.g. before a change), same database
// cluster; SIGNUP_RATE_LIMIT=<n> raises the limit so that every sign-up is hashed.
import { mkdtempSync } from 'node:fs'
import { loadavg, tmpdir } from 'node:os'
import path from 'node:path'
import { randomUUID } from 'node:crypto'
import { createDatabase, dropDatabase, startCluster } from '../db.mjs'
import { databaseUrl, ROOT } from '../lib/paths.mjs'
import { freePort, runOrThrow, startService, stopService } from '../lib/proc.mjs'
import { fmt, quantile } from './bench-app'

const BURST = 24
const DATABASE = 'ambitus_bench_signup'
const root = path.resolve(process.env.BENCH_ROOT ?? ROOT)
const headers = { 'content-type': 'application/json', 'X-Requested-With': 'ambitus' }

async function timedHealth(base: string): Promise<number> {
  const start = performance.now()
  const res = await fetch(`${base}/api/health`)
  await res.arrayBuffer()
  if (!res.ok) throw new Error(`health answered ${res.status}`)
  return performance.now() - start
}

const signUp = (base: string, tag: string, i: number) =>
  fetch(`${base}/api/auth/register`, {
    method: 'POST',
    headers,
    body: JSON.stringify({
      email: `burst-${tag}-${i}@example.test`,
      password: 'a long burst password',
      name: `Burst ${i}`,
      role: 'student',
    }),
  }).then((res) => res.status)

/** Health asked back to back until every sign-up has its answer. */
async function burst(base: string) {
  const tag = randomUUID().slice(0, 8)
  let done = false
  const signUps = Promise.all(Array.from({ length: BURST }, (_, i) => signUp(base, tag, i)))
  void signUps.finally(() => (done = true))
  const started = performance.now()
  const during: number[] = []
  while (!done) during.push(await timedHealth(base))
  const statuses = await signUps
  return { during, statuses, seconds: (performance.now() - started) / 1000 }
}

async function startServer() {
  await startCluster()
  await dropDatabase(DATABASE)
  await createDatabase(DATABASE)
  const port = await freePort()
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl(DATABASE),
    PORT: String(port),
    SMTP_PORT: String(await freePort()),
    LOG_LEVEL: 'silent',
    AMBITUS_DATA_DIR: mkdtempSync(path.join(tmpdir(), 'ambitus-bench-')),
  }
  const tsx = ['--import', 'tsx']
  await runOrThrow(process.execPath, [...tsx, 'scripts/prepare-db.ts', '--no-seed'], {
    cwd: root,
    env,
  })
  const server = startService('bench-api', process.execPath, [...tsx, 'server/index.ts'], {
    cwd: root,
    env,
  })
  const base = `http://127.0.0.1:${port}`
  for (let i = 0; i < 200; i++) {
    if (
      await timedHealth(base).then(
        () => true,
        () => false,
      )
    )
      return { server, base }
    await new Promise((r) => setTimeout(r, 150))
  }
  throw new Error('server did not start')
}

const { server, base } = await startServer()
try {
  const idle: number[] = []
  for (let i = 0; i < 30; i++) idle.push(await timedHealth(base))
  const { during, statuses, seconds } = await burst(base)
  const count = (s: number) => statuses.filter((x) => x === s).length
  console.log(`server code: ${root}`)
  console.log(`load average at the end: ${loadavg()[0]!.toFixed(2)}`)
  console.log('/api/health (ms)          n      p50      p95      max')
  for (const [label, xs] of [
    ['idle (baseline)', idle],
    [`during ${BURST} sign-ups`, during],
  ] as const) {
    const row = [quantile(xs, 0.5), quantile(xs, 0.95), Math.max(...xs)].map(fmt).join(' ')
    console.log(`${label.padEnd(22)} ${String(xs.length).padStart(4)} ${row}`)
  }
  console.log(
    `sign-ups: ${count(201)} created, ${count(429)} refused (429), ` +
      `${statuses.length - count(201) - count(429)} other; burst took ${seconds.toFixed(1)} s`,
  )
} finally {
  await stopService(server)
}
