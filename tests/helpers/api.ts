// The real app in-process against the real test database, with its own SMTP sink on a free port.
import { randomBytes, randomUUID } from 'node:crypto'
import path from 'node:path'
import { TEST_OUTPUT_DIR } from '../../scripts/lib/paths.mjs'
import request from 'supertest'
import express, { type Express } from 'express'
import { createApp } from '../../server/app'
import { loadConfig, type Config } from '../../server/config'
import type { AppContext } from '../../server/context'
import { createDb } from '../../server/lib/db'
import { createLogger } from '../../server/lib/logger'
import { createMailer } from '../../server/lib/mail'
import { startMailSink, type MailSink } from '../../server/mail-sink/mail-sink'
import { latestMailTo } from '../../server/admin/mail-log-repository'
import { hashPassword } from '../../server/auth/password'
import { sessionCookieName } from '../../server/auth/session-token'
import { issueSessionToken } from '../../server/auth/sessions'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { insertUser, toPublicUser } from '../../server/users/users-repository'
import { createStatistics } from '../../server/statistics/statistics-queue'
import { startPaymentsFake, type PaymentsFake } from '../../scripts/fakes/payments-fake.mjs'

export const TEST_PASSWORD = 'correct horse battery'
// One session key per test process (the app under test signs and checks cookies with it).
const TEST_JWT_SECRET = randomBytes(32).toString('hex')

export interface TestApi {
  /** The app as our client calls it: like src/api/http.ts, every request carries the CSRF header. */
  app: Express
  /** The app with nothing added to requests (for the tests of the CSRF check itself). */
  bareApp: Express
  ctx: AppContext
  sink: MailSink
  /** The local payment-service fake this app's Stripe SDK talks to (webhooks: setWebhookUrl). */
  payments: PaymentsFake
  close(): Promise<void>
}

/** Starts the app and a mail sink for one test file; call close() in afterAll. */
export async function startTestApi(
  overrides: Partial<Config> = {},
  logLines?: string[],
): Promise<TestApi> {
  const base = loadConfig(process.env, {
    logLevel: 'silent',
    clientDist: '/nonexistent',
    dataDir: path.join(TEST_OUTPUT_DIR, 'api-data'), // recordings uploaded by tests stay out of .data
    jwtSecret: TEST_JWT_SECRET,
    // Test files share one database: each app counts its rate limits apart, like its own installation.
    rateLimitScope: `${randomUUID()}:`,
    ...overrides,
  })
  const db = createDb(base.databaseUrl)
  const sink = await startMailSink(db, 0)
  const payments = await startPaymentsFake()
  const config = {
    ...base,
    smtpPort: sink.port,
    stripeSecretKey: payments.secretKey,
    stripeWebhookSecret: payments.webhookSecret,
    stripeApiUrl: payments.url,
  }
  const mailer = createMailer(config)
  const logger = logLines
    ? createLogger('info', { write: (line: string) => void logLines.push(line) })
    : createLogger('silent')
  // No background drain: test files share the database, and readers settle their own players.
  const ctx: AppContext = { config, db, mailer, logger, statistics: createStatistics(db, logger) }
  const bareApp = createApp(ctx)
  const app = asOurClient(bareApp)
  contexts.set(app, ctx)
  contexts.set(bareApp, ctx)
  return {
    app,
    bareApp,
    ctx,
    sink,
    payments,
    async close() {
      mailer.close()
      await payments.close()
      await sink.close()
      await db.destroy()
    },
  }
}

/** Wraps the app so each request carries the anti-CSRF header our client always sends. */
function asOurClient(app: Express): Express {
  const client = express()
  client.disable('x-powered-by')
  client.use((req, _res, next) => {
    req.headers[CSRF_HEADER.toLowerCase()] ??= CSRF_VALUE
    next()
  })
  client.use(app)
  return client
}

/** A fresh, unique e-mail so tests never collide. */
export const uniqueEmail = (label = 'user') => `${label}-${randomUUID().slice(0, 8)}@example.test`

// One real bcrypt hash (cost 12) of TEST_PASSWORD per test process: every test account shares it, so
// setting up a user costs no hashing while signing in with TEST_PASSWORD still works for real.
let testPasswordHash: Promise<string> | undefined
const contexts = new WeakMap<Express, AppContext>()

/**
 * A new account and a cookie-keeping agent signed in as it. The account is written straight to the
 * database and its session (row and cookie) made with the app's own code (auth.test.ts covers the register and
 * sign-in routes themselves); everything after that goes through the real middleware.
 */
export async function signedInAgent(
  app: Express,
  role: 'student' | 'teacher' = 'student',
  name = 'Test Player',
) {
  const ctx = contexts.get(app)
  if (!ctx) throw new Error('signedInAgent needs an app from startTestApi()')
  const email = uniqueEmail(role)
  testPasswordHash ??= hashPassword(TEST_PASSWORD, ctx.config.bcryptCost)
  const record = await insertUser(ctx.db, {
    email,
    name,
    role,
    passwordHash: await testPasswordHash,
  })
  const agent = request.agent(app)
  const token = await issueSessionToken(ctx, record.id)
  const cookie = `${sessionCookieName(ctx.config)}=${token}; Path=/; HttpOnly`
  agent.jar.setCookies([cookie], '127.0.0.1', '/')
  const user = toPublicUser(record)
  return { agent, email, user: user as { id: string; email: string; role: string } }
}

/** Promotes an account to admin directly in the database (no API creates admins). */
export async function makeAdmin(ctx: AppContext, userId: string) {
  await ctx.db('users').where({ id: userId }).update({ role: 'admin' })
}

/** A signed-in admin: a new account promoted in the database (sessions read the role per request). */
export async function signedInAdmin(app: Express, name = 'Test Admin') {
  const admin = await signedInAgent(app, 'teacher', name)
  await makeAdmin(contexts.get(app)!, admin.user.id)
  return { ...admin, user: { ...admin.user, role: 'admin' } }
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
