// Throttling of password checks (OWASP ASVS 2.2.1), counted in PostgreSQL for every process:
// - per client address: LOGIN_RATE_LIMIT failed sign-ins per 15 minutes, then 429 until the window ends;
// - per account, for browsers without its device cookie: LOGIN_ACCOUNT_FREE_FAILURES failures, then an
//   exponential back-off (1 s, 2 s, 4 s … at most 15 min apart), never more than 100 tries an hour;
// - a browser holding the account's device cookie skips that back-off (its own failures are counted
//   on the cookie: 10 an hour, then it counts as unknown), so strangers cannot lock the owner out;
// - changing the password has its own bucket per account.
// Each try takes its slot atomically before the password is checked; a right password gives it back.
// Malformed bodies never get here (they are a 400 first), so they never count.
import type { AppContext } from '../context'
import { rateLimited } from '../lib/errors'
import { take, undo, clear, type CounterRule } from '../lib/rate-counters'
import type { Device } from './device-cookie'

const MINUTE = 60 * 1000
const HOUR = 60 * MINUTE
const DEVICE_RULE: CounterRule = { limit: 10, windowMs: HOUR }
const PASSWORD_CHANGE_RULE: CounterRule = { limit: 5, windowMs: 15 * MINUTE }

const addressRule = (ctx: AppContext): CounterRule => ({
  limit: ctx.config.loginAttemptsPer15Min,
  windowMs: 15 * MINUTE,
})
const accountRule = (ctx: AppContext): CounterRule => ({
  limit: 100,
  windowMs: HOUR,
  freeHits: ctx.config.loginFreeFailuresPerAccount,
  backoffBaseMs: ctx.config.loginBackoffBaseMs,
  backoffCapMs: 15 * MINUTE,
})

const scoped = (ctx: AppContext, key: string) => `${ctx.config.rateLimitScope}${key}`
const accountKey = (ctx: AppContext, email: string) => scoped(ctx, `signin:account:${email}`)

/** A counted try: call succeeded() when the password was right, so the try is given back. */
export interface GuardedTry {
  succeeded(): Promise<void>
}

function counted(ctx: AppContext, keys: string[]): GuardedTry {
  return { succeeded: async () => void (await Promise.all(keys.map((k) => undo(ctx.db, k)))) }
}

/** Takes a sign-in try for an e-mail from a client, or throws 429 with Retry-After. */
export async function guardSignIn(
  ctx: AppContext,
  email: string,
  client: { address: string; device: Device | null; userId: string | null },
): Promise<GuardedTry> {
  const address = scoped(ctx, `signin:address:${client.address}`)
  const byAddress = await take(ctx.db, address, addressRule(ctx))
  if (!byAddress.allowed) {
    throw rateLimited(byAddress.retryAfterMs, 'Too many failed sign-ins from your network.')
  }
  if (client.device && client.userId && client.device.userId === client.userId) {
    const device = scoped(ctx, `signin:device:${client.device.nonce}`)
    if ((await take(ctx.db, device, DEVICE_RULE)).allowed) return counted(ctx, [address, device])
  }
  const account = accountKey(ctx, email)
  const byAccount = await take(ctx.db, account, accountRule(ctx))
  if (!byAccount.allowed) {
    await undo(ctx.db, address) // refused, not checked: not a failure of this address
    throw rateLimited(
      byAccount.retryAfterMs,
      'Too many failed sign-ins for this account. Wait a moment, or reset your password.',
    )
  }
  return counted(ctx, [address, account])
}

/** Takes a password-change try for a signed-in user (its own bucket), or throws 429. */
export async function guardPasswordChange(ctx: AppContext, userId: string): Promise<GuardedTry> {
  const key = scoped(ctx, `password-change:${userId}`)
  const result = await take(ctx.db, key, PASSWORD_CHANGE_RULE)
  if (!result.allowed) throw rateLimited(result.retryAfterMs)
  return counted(ctx, [key])
}

/** A completed password reset proves the owner: strangers' failures no longer slow them down. */
export const clearAccountFailures = (ctx: AppContext, email: string) =>
  clear(ctx.db, accountKey(ctx, email))
