// The real app in-process against the real test database, with its own SMTP sink on a free port.
import { randomUUID } from 'node:crypto'
import request from 'supertest'
import type { Express } from 'express'
import { createApp } from '../../server/app'
import { loadConfig, type Config } from '../../server/config'
import type { AppContext } from '../../server/context'
import { createDb } from '../../server/lib/db'
import { createLogger } from '../../server/lib/logger'
import { createMailer } from '../../server/lib/mail'
import { startMailSink, type MailSink } from '../../server/mail-sink/mail-sink'
import { latestMailTo } from '../../server/admin/mail-log-repository'

export const TEST_PASSWORD = 'correct horse battery'

export interface TestApi {
  app: Express
  ctx: AppContext
  sink: MailSink
  close(): Promise<void>
}

/** Starts the app and a mail sink for one test file; call close() in afterAll. */
export async function startTestApi(overrides: Partial<Config> = {}, logLines?: string[]): Promise<TestApi> {
  const base = loadConfig(process.env, { logLevel: 'silent', clientDist: '/nonexistent', ...overrides })
  const db = createDb(base.databaseUrl)
  const sink = await startMailSink(db, 0)
  const config = { ...base, smtpPort: sink.port }
  const mailer = createMailer(config)
  const logger = logLines
    ? createLogger('info', { write: (line: string) => void logLines.push(line) })
    : createLogger('silent')
  const ctx: AppContext = { config, db, mailer, logger }
  return {
    app: createApp(ctx),
    ctx,
    sink,
    async close() {
      mailer.close()
      await sink.close()
      await db.destroy()
    },
  }
}

/** A fresh, unique e-mail so tests never collide. */
export const uniqueEmail = (label = 'user') => `${label}-${randomUUID().slice(0, 8)}@example.test`

/** Registers a new account and returns a cookie-keeping agent signed in as it. */
export async function signedInAgent(app: Express, role: 'student' | 'teacher' = 'student', name = 'Test Player') {
  const agent = request.agent(app)
  const email = uniqueEmail(role)
  const res = await agent.post('/api/auth/register').send({ email, password: TEST_PASSWORD, name, role })
  if (res.status !== 201) throw new Error(`register failed: ${res.status} ${JSON.stringify(res.body)}`)
  return { agent, email, user: res.body.user as { id: string; email: string; role: string } }
}

/** Promotes an account to admin directly in the database (no API creates admins). */
export async function makeAdmin(ctx: AppContext, userId: string) {
  await ctx.db('users').where({ id: userId }).update({ role: 'admin' })
}

/** Waits for the newest mail to an address to arrive in the sink. */
export async function waitForMail(ctx: AppContext, address: string, after = 0) {
  for (let i = 0; i < 50; i++) {
    const mail = await latestMailTo(ctx.db, address)
    if (mail && mail.id > after) return mail
    await new Promise((r) => setTimeout(r, 100))
  }
  throw new Error(`no mail reached ${address}`)
}
