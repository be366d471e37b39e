// Request rate limits (express-rate-limit) whose counters live in PostgreSQL, keyed per client
// address or per signed-in account: sign-up and every route that sends e-mail use them.
import { createHash } from 'node:crypto'
import type { Request, RequestHandler } from 'express'
import { ipKeyGenerator, rateLimit, type Options, type Store } from 'express-rate-limit'
import type { AppContext } from '../context'
import type { Db } from './db'
import { rateLimited } from './errors'
import { clear, hit, peek, undo } from './rate-counters'

const HOUR = 60 * 60 * 1000

/** express-rate-limit's store contract over the shared rate_limits table. */
class PgStore implements Store {
  localKeys = false
  private windowMs = HOUR
  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}
  init(options: Options) {
    this.windowMs = options.windowMs
  }
  async get(key: string) {
    const row = await peek(this.db, this.prefix + key)
    return row ? { totalHits: row.hits, resetTime: row.window_ends_at } : undefined
  }
  async increment(key: string) {
    const row = await hit(this.db, this.prefix + key, this.windowMs)
    return { totalHits: row.hits, resetTime: row.window_ends_at }
  }
  decrement = (key: string) => undo(this.db, this.prefix + key)
  resetKey = (key: string) => clear(this.db, this.prefix + key)
}

/** The client's address as Express sees it (X-Forwarded-For only when TRUST_PROXY says so). */
export const clientAddress = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown')

/** The e-mail a body names (lower-cased), for limits per target address. */
export const bodyEmail = (req: Request) => {
  if (typeof req.body?.email !== 'string') return undefined
  const email = req.body.email.trim().toLowerCase()
  // No address is longer than 254 characters (RFC 5321); a longer body still counts, by its hash,
  // so the counter's key stays within the index's row size.
  return email.length > 254 ? `sha256:${createHash('sha256').update(email).digest('hex')}` : email
}

type KeyOf = (req: Request) => string | undefined
export const BY_ADDRESS: KeyOf = clientAddress
export const BY_ACCOUNT: KeyOf = (req) => req.user?.id

export interface LimitRule {
  name: string
  limit: number
  windowMs: number
  keyOf: KeyOf
  skipSuccessfulRequests?: boolean
}

/** One limiter; requests without a key (e.g. no e-mail in the body) pass to the route's 400. */
export function limitRequests(ctx: AppContext, rule: LimitRule): RequestHandler {
  return rateLimit({
    windowMs: rule.windowMs,
    limit: rule.limit,
    skipSuccessfulRequests: rule.skipSuccessfulRequests ?? false,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PgStore(ctx.db, `${ctx.config.rateLimitScope}${rule.name}:`),
    keyGenerator: (req) => rule.keyOf(req) ?? '',
    skip: (req) => rule.keyOf(req) === undefined,
    // X-Forwarded-For is ignored unless TRUST_PROXY is set: that is the point, not a mistake.
    validate: { xForwardedForHeader: false, forwardedHeader: false },
    handler: (_req, _res, next) => next(rateLimited()),
  })
}

/** Runs middleware one after the other as one handler (so a route line stays one token longer). */
export function inSequence(handlers: RequestHandler[]): RequestHandler {
  return (req, res, next) => {
    let index = 0
    const step = (error?: unknown) => {
      const handler = handlers[index++]
      if (error !== undefined || !handler) return next(error)
      void handler(req, res, step)
    }
    step()
  }
}

/**
 * For routes that send e-mail: MAIL_RATE_LIMIT per account and twice that per address, per hour
 * (limiters of the same name share their counts). Use after requireAuth, e.g.
 * `router.post('/x', teacher, mailLimit(ctx, 'comment'), handler)`; `sendsMail` narrows it to the
 * requests that do send.
 */
export function mailLimit(
  ctx: AppContext,
  name: string,
  sendsMail: (req: Request) => boolean = () => true,
): RequestHandler {
  const limit = ctx.config.mailSendsPerHour
  const when =
    (keyOf: KeyOf): KeyOf =>
    (req) =>
      sendsMail(req) ? keyOf(req) : undefined
  return inSequence([
    limitRequests(ctx, {
      name: `mail:${name}:account`,
      limit,
      windowMs: HOUR,
      keyOf: when(BY_ACCOUNT),
    }),
    limitRequests(ctx, {
      name: `mail:${name}:address`,
      limit: limit * 2,
      windowMs: HOUR,
      keyOf: when(BY_ADDRESS),
    }),
  ])
}

/** For routes that create accounts: SIGNUP_RATE_LIMIT per address and 3 per e-mail, per hour. */
export function signUpLimit(ctx: AppContext): RequestHandler {
  return inSequence([
    limitRequests(ctx, {
      name: 'signup:address',
      limit: ctx.config.signupsPerHour,
      windowMs: HOUR,
      keyOf: BY_ADDRESS,
    }),
    limitRequests(ctx, { name: 'signup:email', limit: 3, windowMs: HOUR, keyOf: bodyEmail }),
  ])
}
