// Process entry: load configuration, open the database, listen; stop cleanly on SIGINT/SIGTERM.
import { createApp } from './app'
import { closePasswordPool } from './auth/password'
import { loadConfig } from './config'
import { createDb } from './lib/db'
import { createLogger } from './lib/logger'
import { createMailer } from './lib/mail'
import { startScheduler } from './digests/scheduler'
import { createStatistics } from './statistics/statistics-queue'

const config = loadConfig()
const logger = createLogger(config.logLevel)
const db = createDb(config.databaseUrl)
const mailer = createMailer(config)
const statistics = createStatistics(db, logger)
const app = createApp({ config, db, logger, mailer, statistics })
const scheduler = startScheduler({ config, db, logger, mailer, statistics })
if (config.backgroundDrain) statistics.start({ databaseUrl: config.databaseUrl })
else logger.warn('STATISTICS_DRAIN is off: answers wait for their readers or another process')

const server = app.listen(config.port, config.host, () => {
  logger.info(`Ambitus API listening on http://${config.host}:${config.port}`)
})
// Idle connections stay open longer than clients wait between requests (Node's default is 5 s), so
// a client reusing one never has it closed under its request (seen as ECONNRESET on a busy machine).
server.keepAliveTimeout = 65_000
server.headersTimeout = 66_000

function shutdown(signal: string) {
  logger.info(`${signal}: shutting down`)
  scheduler.stop()
  server.close(async () => {
    mailer.close()
    await statistics.stop()
    await Promise.all([db.destroy(), closePasswordPool()])
    process.exit(0)
  })
  server.closeAllConnections()
  setTimeout(() => process.exit(1), 8000).unref()
}
process.on('SIGINT', () => shutdown('SIGINT'))
process.on('SIGTERM', () => shutdown('SIGTERM'))
