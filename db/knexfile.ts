// Knex configuration: one PostgreSQL connection from DATABASE_URL (scripts/db.mjs builds it locally).
import type { Knex } from 'knex'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { databaseUrl } from '../scripts/lib/paths.mjs'

const DB_DIR = path.dirname(fileURLToPath(import.meta.url))

/** Knex settings for a connection URL; migrations are the TypeScript files in db/migrations. */
export function knexConfig(connection: string = databaseUrl()): Knex.Config {
  return {
    client: 'pg',
    connection,
    pool: { min: 0, max: 10 },
    migrations: {
      directory: path.join(DB_DIR, 'migrations'),
      extension: 'ts',
      loadExtensions: ['.ts'],
      tableName: 'knex_migrations',
    },
  }
}

export default knexConfig()
