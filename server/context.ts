// What every route factory and service receives: configuration, database, mailer, logger, and the
// statistics queue.
import type { Logger } from 'pino'
import type { Config } from './config'
import type { Db } from './lib/db'
import type { Mailer } from './lib/mail'

/** Answers wait in the statistics queue until its drain rolls them up (server/statistics). */
export interface StatisticsQueue {
  /** Rolls up what waits for these players now; resolves to how many of their answers still wait. */
  settle(userIds: readonly string[]): Promise<number>
  /** New answers were queued: drain them soon (a no-op without the background drain). */
  nudge(): void
}

export interface AppContext {
  config: Config
  db: Db
  mailer: Mailer
  logger: Logger
  statistics: StatisticsQueue
}
