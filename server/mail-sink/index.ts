// Process entry for the local SMTP sink (started by scripts/start.mjs and scripts/dev.mjs).
import { loadConfig } from '../config'
import { createDb } from '../lib/db'
import { startMailSink } from './mail-sink'

const config = loadConfig()
const db = createDb(config.databaseUrl)
const sink = await startMailSink(db, config.smtpPort, config.smtpHost)
console.log(`SMTP sink listening on ${config.smtpHost}:${sink.port}`)

async function shutdown() {
  await sink.close()
  await db.destroy()
  process.exit(0)
}
process.on('SIGINT', shutdown)
process.on('SIGTERM', shutdown)
