// Brings a database up to date: runs migrations and installs the live SQL (db/sql), seeds the demo
// scenario once, and rolls up whatever waits in the statistics queue.
// Usage: node --import tsx scripts/prepare-db.ts [--no-seed]   (DATABASE_URL selects the database)
import knex from 'knex'
import path from 'node:path'
import { knexConfig } from '../db/knex-config'
import { migrateToLatest } from '../db/live-sql'
import { drainAll } from '../server/statistics/rollup-drain'
import { databaseUrl, ROOT } from './lib/paths.mjs'

const withSeed = !process.argv.includes('--no-seed')
const db = knex(knexConfig(process.env.DATABASE_URL ?? databaseUrl()))
try {
  const applied = await migrateToLatest(db)
  if (applied.length) console.log(`[db] applied ${applied.length} migration(s)`)
  if (withSeed) {
    await db.seed.run({ directory: path.join(ROOT, 'db', 'seeds'), loadExtensions: ['.ts'] })
  }
  const drained = await drainAll(db)
  if (drained) console.log(`[db] rolled up ${drained} answer(s) into the statistics`)
} finally {
  await db.destroy()
}
