// End-to-end tests: a throwaway seeded database, a fresh client build, the SMTP sink and the API
// server as real processes on free loopback ports. Tests read the URL with inject('baseUrl').
import type { ChildProcess } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import path from 'node:path'
import type { TestProject } from 'vitest/node'
import { createDatabase, dropDatabase, startCluster } from '../../scripts/db.mjs'
import { databaseUrl, TEST_E2E_DATABASE, TEST_OUTPUT_DIR } from '../../scripts/lib/paths.mjs'
import { freePort, startService, stopService } from '../../scripts/lib/proc.mjs'
import { ensureObjectStore } from '../../scripts/fakes/s3.mjs'
import { ensureClientBuild, prepareDatabase } from '../../scripts/lib/setup.mjs'
import { startLocalPayments } from '../../scripts/fakes/payments-fake.mjs'

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string
    e2eDatabaseUrl: string
  }
}

const DIST = path.join(TEST_OUTPUT_DIR, 'dist')

async function waitForHealth(url: string) {
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(url)).ok) return
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150))
  }
  throw new Error(`server did not become healthy at ${url}`)
}

export default async function setup(project: TestProject) {
  await startCluster()
  await dropDatabase(TEST_E2E_DATABASE)
  await createDatabase(TEST_E2E_DATABASE)
  await prepareDatabase(TEST_E2E_DATABASE)
  await ensureClientBuild(DIST)

  const [port, smtpPort] = [await freePort(), await freePort()]
  const payments = await startLocalPayments(`http://127.0.0.1:${port}`, {})
  const objectStore = await ensureObjectStore(path.join(TEST_OUTPUT_DIR, 'data'))
  const env = {
    ...objectStore.env,
    ...payments.env,
    DATABASE_URL: databaseUrl(TEST_E2E_DATABASE),
    PORT: String(port),
    SMTP_PORT: String(smtpPort),
    CLIENT_DIST: DIST,
    // Recordings of the e2e server stay in the test output folder; its session secret is per run.
    AMBITUS_DATA_DIR: path.join(TEST_OUTPUT_DIR, 'data'),
    JWT_SECRET: randomBytes(32).toString('hex'),
    LOG_LEVEL: 'warn',
    APP_URL: `http://127.0.0.1:${port}`,
    // Every e2e browser signs up and signs in from 127.0.0.1; the per-address limits have their own
    // server tests (security-signup, security-sign-in).
    SIGNUP_RATE_LIMIT: '10000',
    LOGIN_RATE_LIMIT: '10000',
  }
  const tsx = ['--import', 'tsx']
  const children: ChildProcess[] = [
    startService('e2e-mail', process.execPath, [...tsx, 'server/mail-sink/index.ts'], { env }),
    startService('e2e-api', process.execPath, [...tsx, 'server/index.ts'], { env }),
  ]
  await waitForHealth(`http://127.0.0.1:${port}/api/health`)
  project.provide('baseUrl', `http://127.0.0.1:${port}`)
  project.provide('e2eDatabaseUrl', env.DATABASE_URL)

  return async () => {
    await Promise.all(children.map((child) => stopService(child)))
    await payments.close()
    await objectStore.close()
  }
}
