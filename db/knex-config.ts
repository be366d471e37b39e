// Knex settings for one PostgreSQL connection URL; migrations are the TypeScript files in db/migrations.
import type { Knex } from 'knex'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

const DB_DIR = path.dirname(fileURLToPath(import.meta.url))

export function knexConfig(connection: string): Knex.Config {
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
