// Sign-in use cases: register, sign in, change password, reset a forgotten password.
import { createHash, randomBytes } from 'node:crypto'
import { publicUrl } from '../config'
import type { AppContext } from '../context'
import { AppError, badRequest, conflict, unauthorized } from '../lib/errors'
import {
  findUserByEmail,
  findUserById,
  insertUser,
  toPublicUser,
  updatePassword,
  type UserRecord,
} from '../users/users-repository'
import type { LoginInput, RegisterInput } from './auth-schema'
import type { Device } from './device-cookie'
import { hashPassword, UNKNOWN_USER_HASH, verifyPassword } from './password'
import { consumeReset, insertReset, voidResets } from './password-reset-repository'
import { resetMail } from './auth-mail'
import { endAllSessions } from './sessions'
import { clearAccountFailures, guardPasswordChange, guardSignIn } from './sign-in-guard'

const RESET_TTL_MS = 60 * 60 * 1000
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex')

const taken = () =>
  conflict('An account with this e-mail already exists.', {
    email: ['This e-mail is already registered.'],
  })

export async function register(ctx: AppContext, input: RegisterInput): Promise<UserRecord> {
  if (await findUserByEmail(ctx.db, input.email)) throw taken()
  const passwordHash = await hashPassword(input.password, ctx.config.bcryptCost)
  try {
    return await insertUser(ctx.db, { ...input, passwordHash })
  } catch (error) {
    if ((error as { code?: string }).code === '23505') throw taken()
    throw error
  }
}

/** Checks e-mail and password under the sign-in guard (429 when throttled). */
export async function signIn(
  ctx: AppContext,
  input: LoginInput,
  client: { address: string; device: Device | null },
): Promise<UserRecord> {
  const user = await findUserByEmail(ctx.db, input.email)
  const guarded = await guardSignIn(ctx, input.email, { ...client, userId: user?.id ?? null })
  const matches = await verifyPassword(input.password, user?.passwordHash ?? UNKNOWN_USER_HASH)
  if (!user || !matches) throw unauthorized('E-mail or password is not right.')
  await guarded.succeeded()
  if (user.disabledAt) {
    throw new AppError('account_disabled', 'This account is disabled. Ask an admin.', 403)
  }
  return user
}

/** Changes the password and ends every other session of the user (this one stays signed in). */
export async function changePassword(
  ctx: AppContext,
  session: { userId: string; sessionId?: string },
  input: { currentPassword: string; newPassword: string },
) {
  const user = await findUserById(ctx.db, session.userId)
  if (!user) throw unauthorized()
  const guarded = await guardPasswordChange(ctx, user.id)
  if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
    throw badRequest('Your current password is not right.', {
      currentPassword: ['This is not your current password.'],
    })
  }
  await guarded.succeeded()
  const hash = await hashPassword(input.newPassword, ctx.config.bcryptCost)
  await updatePassword(ctx.db, user.id, hash)
  await endAllSessions(ctx, user.id, session.sessionId)
}

/**
 * Mails a single-use reset link when an enabled account has this e-mail; does nothing otherwise.
 * The route answers before calling this, so the answer never tells which case it was.
 */
export async function requestPasswordReset(ctx: AppContext, email: string) {
  const user = await findUserByEmail(ctx.db, email)
  if (!user || user.disabledAt) return
  const token = randomBytes(32).toString('base64url')
  await insertReset(ctx.db, user.id, sha256(token), new Date(Date.now() + RESET_TTL_MS))
  const link = `${publicUrl(ctx.config)}/reset-password?token=${encodeURIComponent(token)}`
  await ctx.mailer.send(resetMail(toPublicUser(user), link))
}

/** Sets the new password, ends every session and lifts the account's sign-in back-off. */
export async function confirmPasswordReset(ctx: AppContext, token: string, password: string) {
  const userId = await consumeReset(ctx.db, sha256(token))
  const user = userId ? await findUserById(ctx.db, userId) : null
  if (!user) {
    throw new AppError('invalid_token', 'This reset link is expired or was already used.', 400, {
      token: ['Ask for a new reset link.'],
    })
  }
  await updatePassword(ctx.db, user.id, await hashPassword(password, ctx.config.bcryptCost))
  await voidResets(ctx.db, user.id)
  await endAllSessions(ctx, user.id)
  await clearAccountFailures(ctx, user.email)
}
