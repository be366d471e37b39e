// Server configuration, read from the environment once and validated at start-up. The launchers
// (npm start, npm run dev, the tests) put the local database URL and session secret there.
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { z } from 'zod'

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..')

/**
 * TRUST_PROXY: off by default (X-Forwarded-* ignored); `true`, a hop count, or Express's list of
 * trusted addresses (`loopback`, `10.0.0.0/8, 127.0.0.1`) when a reverse proxy sits in front.
 */
const TrustProxySchema = z.union([
  z.boolean(),
  z.number().int().min(0),
  z
    .string()
    .trim()
    .transform((v) =>
      /^(false|0|off|)$/i.test(v) ? false : v === 'true' ? true : /^\d+$/.test(v) ? Number(v) : v,
    ),
])

const flag = (value: string | undefined) =>
  value === undefined || value === '' ? undefined : /^(1|true|yes|on)$/i.test(value)

const ConfigSchema = z.object({
  host: z.string().default('127.0.0.1'),
  port: z.coerce.number().int().min(0).max(65535).default(3000),
  databaseUrl: z.string('DATABASE_URL is required (npm start and npm run dev set it).').min(1),
  jwtSecret: z
    .string('JWT_SECRET is required (npm start and npm run dev set it).')
    .min(32, 'JWT_SECRET must be at least 32 characters'),
  appUrl: z.url().optional(),
  smtpHost: z.string().default('127.0.0.1'),
  smtpPort: z.coerce.number().int().min(1).max(65535).default(2525),
  mailFrom: z.string().default('Ambitus <no-reply@ambitus.test>'),
  clientDist: z.string().default(path.join(ROOT, 'dist')),
  dataDir: z.string().default(path.join(ROOT, '.data')),
  logLevel: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  bcryptCost: z.coerce.number().int().min(12).max(15).default(12),
  trustProxy: TrustProxySchema.default(false),
  secureCookies: z.boolean().optional(),
  loginAttemptsPer15Min: z.coerce.number().int().min(1).default(10),
  loginFreeFailuresPerAccount: z.coerce.number().int().min(1).default(5),
  loginBackoffBaseMs: z.coerce.number().int().min(0).default(1000),
  resetRequestsPerHour: z.coerce.number().int().min(1).default(5),
  signupsPerHour: z.coerce.number().int().min(1).default(10),
  mailSendsPerHour: z.coerce.number().int().min(1).default(60),
  uploadsPerUser: z.coerce.number().int().min(1).default(2), // recordings one account sends at once
  // Test files share one database; each app instance may keep its counters apart with a scope.
  rateLimitScope: z.string().default(''),
  // The payment service (Stripe's API, or the local fake our scripts start): keys only from here.
  stripeSecretKey: z.string().min(1).optional(),
  stripeWebhookSecret: z.string().min(1).optional(),
  stripeApiUrl: z.url().optional(),
  // Whether this process rolls up queued answers in the background (STATISTICS_DRAIN=off leaves
  // them to readers and to other processes; bench:ingest uses it to time the request path alone).
  backgroundDrain: z.boolean().default(true),
  // The scheduler of each process (due-soon reminders, digests): first tick, then every interval.
  schedulerFirstRunMs: z.coerce.number().int().min(0).default(60_000),
  schedulerIntervalMs: z.coerce
    .number()
    .int()
    .min(100)
    .default(10 * 60_000),
  // Object storage for recordings: a bucket when S3_BUCKET is set (npm start starts a local one).
  s3: z
    .object({
      endpoint: z.url().optional(),
      bucket: z.string().min(3),
      region: z.string().min(1).default('us-east-1'),
      forcePathStyle: z.boolean(),
      accessKeyId: z.string().min(1, 'AWS_ACCESS_KEY_ID is required with S3_BUCKET'),
      secretAccessKey: z.string().min(1, 'AWS_SECRET_ACCESS_KEY is required with S3_BUCKET'),
      sessionToken: z.string().optional(),
    })
    .optional(),
})

export type Config = z.infer<typeof ConfigSchema>

/** The bucket settings from S3_* and AWS_* variables, or undefined (recordings on local disk). */
function bucketOf(env: NodeJS.ProcessEnv) {
  if (!env.S3_BUCKET) return undefined
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    bucket: env.S3_BUCKET,
    region: env.S3_REGION || undefined,
    forcePathStyle: flag(env.S3_FORCE_PATH_STYLE) ?? Boolean(env.S3_ENDPOINT),
    accessKeyId: env.AWS_ACCESS_KEY_ID ?? '',
    secretAccessKey: env.AWS_SECRET_ACCESS_KEY ?? '',
    sessionToken: env.AWS_SESSION_TOKEN || undefined,
  }
}

/** Builds the configuration from environment variables, with local defaults for development. */
export function loadConfig(
  env: NodeJS.ProcessEnv = process.env,
  overrides: Partial<Config> = {},
): Config {
  const parsed = ConfigSchema.safeParse({
    host: env.HOST,
    port: env.PORT,
    databaseUrl: env.DATABASE_URL,
    jwtSecret: env.JWT_SECRET,
    appUrl: env.APP_URL || undefined,
    smtpHost: env.SMTP_HOST,
    smtpPort: env.SMTP_PORT,
    mailFrom: env.MAIL_FROM,
    clientDist: env.CLIENT_DIST,
    dataDir: env.AMBITUS_DATA_DIR,
    logLevel: env.LOG_LEVEL,
    bcryptCost: env.BCRYPT_COST,
    trustProxy: env.TRUST_PROXY,
    secureCookies: flag(env.COOKIE_SECURE),
    loginAttemptsPer15Min: env.LOGIN_RATE_LIMIT,
    loginFreeFailuresPerAccount: env.LOGIN_ACCOUNT_FREE_FAILURES,
    loginBackoffBaseMs: env.LOGIN_BACKOFF_BASE_MS,
    resetRequestsPerHour: env.RESET_RATE_LIMIT,
    signupsPerHour: env.SIGNUP_RATE_LIMIT,
    mailSendsPerHour: env.MAIL_RATE_LIMIT,
    uploadsPerUser: env.UPLOADS_PER_USER,
    stripeSecretKey: env.STRIPE_SECRET_KEY || undefined,
    stripeWebhookSecret: env.STRIPE_WEBHOOK_SECRET || undefined,
    stripeApiUrl: env.STRIPE_API_URL || undefined,
    backgroundDrain: flag(env.STATISTICS_DRAIN),
    schedulerFirstRunMs: env.SCHEDULER_FIRST_RUN_MS,
    schedulerIntervalMs: env.SCHEDULER_INTERVAL_MS,
    s3: bucketOf(env),
    ...overrides,
  })
  if (!parsed.success) {
    throw new Error(`Invalid configuration:\n${z.prettifyError(parsed.error)}`)
  }
  return parsed.data
}

/** Session cookies are Secure (and __Host- prefixed): COOKIE_SECURE, else when APP_URL is https. */
export const cookiesAreSecure = (config: Config) =>
  config.secureCookies ?? config.appUrl?.startsWith('https:') ?? false

/** The public base URL used in e-mailed links (APP_URL, else the local address). */
export function publicUrl(config: Config): string {
  return (config.appUrl ?? `http://${config.host}:${config.port}`).replace(/\/$/, '')
}
