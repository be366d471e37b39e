#!/usr/bin/env node
// npm start: all set-up (dependencies, PostgreSQL, migrations, demo data, client build, the local
// object store unless S3_ENDPOINT is set), then the SMTP sink and WEB_CONCURRENCY app processes on
// http://127.0.0.1:${PORT:-3000}. Ctrl-C stops everything cleanly.
import { ensureClientBuild, ensureDependencies, prepareDatabase } from './lib/setup.mjs'
import { log, runOrThrow, startService, stopService } from './lib/proc.mjs'
import { ensureObjectStore } from './fakes/s3.mjs'
import { APP_DATABASE, DATA_DIR, databaseUrl, localSecret } from './lib/paths.mjs'
import { startLocalPayments } from './fakes/payments-fake.mjs'

const PORT = Number(process.env.PORT ?? 3000)
const SMTP_PORT = Number(process.env.SMTP_PORT ?? 2525)

await ensureDependencies()
const db = await import('./db.mjs')
const startedDb = await db.startCluster()
const children = []
let stopping = false
let objectStore

async function stopAll(code = 0) {
  if (stopping) return
  stopping = true
  log('start', 'stopping…')
  await Promise.all(children.map((child) => stopService(child)))
  await objectStore?.close()
  if (startedDb) db.stopCluster()
  process.exit(code)
}
process.on('SIGINT', () => stopAll(0))
process.on('SIGTERM', () => stopAll(0))

try {
  await prepareDatabase(APP_DATABASE)
  await ensureClientBuild()
  objectStore = await ensureObjectStore(DATA_DIR)
} catch (error) {
  console.error(error.message)
  await stopAll(1)
}

// The payment-service fake (keys made up now) unless STRIPE_SECRET_KEY names a real account.
const payments = await startLocalPayments(`http://127.0.0.1:${PORT}`)
const env = {
  ...objectStore.env,
  ...payments.env,
  DATABASE_URL: databaseUrl(APP_DATABASE),
  JWT_SECRET: process.env.JWT_SECRET ?? localSecret('jwt'),
  AMBITUS_DATA_DIR: DATA_DIR,
  PORT: String(PORT),
  SMTP_PORT: String(SMTP_PORT),
}
const tsx = ['--import', 'tsx']
children.push(
  startService('mail', process.execPath, [...tsx, 'server/mail-sink/index.ts'], { env }),
)
await runOrThrow(process.execPath, [...tsx, 'scripts/recordings-to-bucket.ts'], { env })
const api = startService('api', process.execPath, [...tsx, 'server/cluster.ts'], { env })
children.push(api)
for (const child of children) child.on('exit', (code) => !stopping && stopAll(code ?? 1))

await waitForHealth(`http://127.0.0.1:${PORT}/api/health`)
console.log(`
  Ambitus is running at http://127.0.0.1:${PORT}

  Demo accounts (password: ambitus-demo)
    student  student@cedarhollow.test   Noor Halvorsen, 4-string bass
    teacher  teacher@cedarhollow.test   Marta Ilves, Cedar Hollow Music Collective
    admin    admin@cedarhollow.test     Ivo Renn
    more students: tobiah@ (5-string), lucia@ (guitar), rafe@ (drop D), signe@ (left-handed)

  Mail sent by the app is captured on 127.0.0.1:${SMTP_PORT}; admins read it under Admin → Mail log.
  Press Ctrl-C to stop.
`)

async function waitForHealth(url) {
  for (let i = 0; i < 120 && !stopping; i++) {
    try {
      if ((await fetch(url)).ok) return
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250))
  }
}
