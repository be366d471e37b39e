// Shared locations and connection settings for the project's scripts (plain Node, no dependencies).
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')
export const DATA_DIR = process.env.AMBITUS_DATA_DIR ?? path.join(ROOT, '.data')
export const PG_HOST = '127.0.0.1'
export const PG_PORT = Number(process.env.PGPORT ?? 54329)
export const PG_USER = 'ambitus'
export const APP_DATABASE = process.env.AMBITUS_DATABASE ?? 'ambitus'
// AMBITUS_TEST_SUFFIX lets parallel test runs on one machine keep their databases apart.
const TEST_SUFFIX = (process.env.AMBITUS_TEST_SUFFIX ?? '')
  .replace(/[^a-z0-9_]/gi, '')
  .toLowerCase()
export const TEST_API_DATABASE = `ambitus_test_api${TEST_SUFFIX ? `_${TEST_SUFFIX}` : ''}`
export const TEST_E2E_DATABASE = `ambitus_test_e2e${TEST_SUFFIX ? `_${TEST_SUFFIX}` : ''}`
export const TEST_OUTPUT_DIR = path.join(ROOT, '.test-output', TEST_SUFFIX)

/** Reads a secret kept in the git-ignored data folder, creating it on first use. */
export function localSecret(name) {
  mkdirSync(DATA_DIR, { recursive: true, mode: 0o755 })
  const file = path.join(DATA_DIR, `${name}.secret`)
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 })
  return readFileSync(file, 'utf8').trim()
}

/** The connection URL of a database in the project-local cluster (or DATABASE_URL's server). */
export function databaseUrl(database = APP_DATABASE) {
  if (process.env.DATABASE_URL && database === APP_DATABASE) return process.env.DATABASE_URL
  const password = encodeURIComponent(localSecret('postgres'))
  return `postgres://${PG_USER}:${password}@${PG_HOST}:${PG_PORT}/${database}`
}
