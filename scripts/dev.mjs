#!/usr/bin/env node
// npm run dev: the same set-up as npm start (without the build), then Vite with HMR on :5173 and
// the API in watch mode on :${API_PORT:-3000}; Vite proxies /api to it.
import { ensureDependencies, prepareDatabase } from './lib/setup.mjs'
import { log, startService, stopService } from './lib/proc.mjs'
import { ensureObjectStore } from './fakes/s3.mjs'
import { APP_DATABASE, DATA_DIR, databaseUrl, localSecret } from './lib/paths.mjs'
import { startLocalPayments } from './fakes/payments-fake.mjs'

const API_PORT = Number(process.env.API_PORT ?? 3000)
const VITE_PORT = Number(process.env.VITE_PORT ?? 5173)

await ensureDependencies()
const db = await import('./db.mjs')
const startedDb = await db.startCluster()
await prepareDatabase(APP_DATABASE)
const objectStore = await ensureObjectStore(DATA_DIR)

const payments = await startLocalPayments(`http://127.0.0.1:${API_PORT}`)
const env = {
  ...objectStore.env,
  ...payments.env,
  DATABASE_URL: databaseUrl(APP_DATABASE),
  JWT_SECRET: process.env.JWT_SECRET ?? localSecret('jwt'),
  AMBITUS_DATA_DIR: DATA_DIR,
  PORT: String(API_PORT),
  API_PORT: String(API_PORT),
  APP_URL: process.env.APP_URL ?? `http://127.0.0.1:${VITE_PORT}`,
}
const node = process.execPath
const children = [
  startService('mail', node, ['--import', 'tsx', 'server/mail-sink/index.ts'], { env }),
  startService(
    'api',
    node,
    ['--watch-path=server', '--watch-path=src/theory', '--import', 'tsx', 'server/index.ts'],
    { env },
  ),
  startService(
    'vite',
    node,
    ['node_modules/vite/bin/vite.js', '--port', String(VITE_PORT), '--strictPort'],
    { env },
  ),
]
log('dev', `open http://127.0.0.1:${VITE_PORT} (API on :${API_PORT}); Ctrl-C stops everything`)

async function stopAll() {
  await Promise.all(children.map((child) => stopService(child)))
  await objectStore.close()
  if (startedDb) db.stopCluster()
  process.exit(0)
}
process.on('SIGINT', stopAll)
process.on('SIGTERM', stopAll)
