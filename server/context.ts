// What every route factory and service receives: configuration, database, mailer, logger.
import type { Logger } from 'pino'
import type { Config } from './config'
import type { Db } from './lib/db'
import type { Mailer } from './lib/mail'

export interface AppContext {
  config: Config
  db: Db
  mailer: Mailer
  logger: Logger
}
