// Shared set-up of the database benchmarks: a dedicated database in the local cluster (recreated and
// migrated), the real app listening on a free loopback port, session cookies, and timing figures.
import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import knex from 'knex'
import { knexConfig } from '../../db/knex-config'
import { migrateToLatest } from '../../db/live-sql'
import { createApp } from '../../server/app'
import { createStatistics } from '../../server/statistics/statistics-queue'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import { issueSessionToken } from '../../server/auth/sessions'
import { loadConfig } from '../../server/config'
import { createDb, type Db } from '../../server/lib/db'
import { createLogger } from '../../server/lib/logger'
import { createMailer } from '../../server/lib/mail'
import { findUserById } from '../../server/users/users-repository'
import { createDatabase, dropDatabase, startCluster } from '../db.mjs'
import { databaseUrl, localSecret } from '../lib/paths.mjs'

export const BENCH_DATABASE = process.env.BENCH_DATABASE ?? 'ambitus_bench'

/** Drops and recreates a bench database, then runs every migration on it. */
export async function freshBenchDatabase(name = BENCH_DATABASE): Promise<string> {
  await startCluster()
  await dropDatabase(name)
  await createDatabase(name)
  const url = databaseUrl(name)
  const db = knex(knexConfig(url))
  await migrateToLatest(db)
  await db.destroy()
  return url
}

export interface BenchApp {
  url: string
  db: Db
  cookieFor(userId: string): Promise<string>
  close(): Promise<void>
}

/** The real app (logging off) on a free port against the given database. */
export async function startBenchApp(databaseUrl: string, poolMax = 10): Promise<BenchApp> {
  const config = loadConfig(process.env, {
    databaseUrl,
    jwtSecret: localSecret('jwt'),
    logLevel: 'silent',
    clientDist: '/nonexistent',
  })
  const db = createDb(databaseUrl)
  db.client.pool.max = poolMax
  const logger = createLogger('silent')
  const app = createApp({
    config,
    db,
    mailer: createMailer(config),
    logger,
    statistics: createStatistics(db, logger),
  })
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s))
  })
  const { port } = server.address() as AddressInfo
  return {
    url: `http://127.0.0.1:${port}`,
    db,
    async cookieFor(userId) {
      const user = await findUserById(db, userId)
      if (!user) throw new Error(`no user ${userId}`)
      return `${SESSION_COOKIE}=${await issueSessionToken({ db, config }, user.id)}`
    },
    async close() {
      server.closeAllConnections()
      await new Promise((resolve) => server.close(resolve))
      await db.destroy()
    },
  }
}

export function quantile(samples: number[], q: number): number {
  const sorted = [...samples].sort((a, b) => a - b)
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN
}

/** p50 and p95 of `runs` sequential timings (ms) after `warmUp` untimed runs. */
export async function timeIt(task: () => Promise<unknown>, runs: number, warmUp = 3) {
  for (let i = 0; i < warmUp; i++) await task()
  const samples: number[] = []
  for (let i = 0; i < runs; i++) {
    const start = performance.now()
    await task()
    samples.push(performance.now() - start)
  }
  return { p50: quantile(samples, 0.5), p95: quantile(samples, 0.95) }
}

export const fmt = (ms: number) => (ms < 10 ? ms.toFixed(2) : ms.toFixed(1)).padStart(8)
