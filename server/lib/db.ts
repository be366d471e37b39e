// The Knex instance for the configured database (the only place server code opens a pool).
import knex, { type Knex } from 'knex'
import { knexConfig } from '../../db/knex-config'

export type Db = Knex

/** Opens a connection pool to the given database URL. */
export function createDb(databaseUrl: string): Db {
  return knex(knexConfig(databaseUrl))
}
