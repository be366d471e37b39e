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
import { hashPassword, UNKNOWN_USER_HASH, verifyPassword } from './password'
import { consumeReset, insertReset, voidResets } from './password-reset-repository'
import { resetMail } from './auth-mail'

const RESET_TTL_MS = 60 * 60 * 1000
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex')

export async function register(ctx: AppContext, input: RegisterInput): Promise<UserRecord> {
  if (await findUserByEmail(ctx.db, input.email)) {
    throw conflict('An account with this e-mail already exists.', {
      email: ['This e-mail is already registered.'],
    })
  }
  const passwordHash = await hashPassword(input.password, ctx.config.bcryptCost)
  try {
    return await insertUser(ctx.db, { ...input, passwordHash })
  } catch (error) {
    if ((error as { code?: string }).code === '23505') {
      throw conflict('An account with this e-mail already exists.', {
        email: ['This e-mail is already registered.'],
      })
    }
    throw error
  }
}

export async function login(ctx: AppContext, input: LoginInput): Promise<UserRecord> {
  const user = await findUserByEmail(ctx.db, input.email)
  const matches = await verifyPassword(input.password, user?.passwordHash ?? UNKNOWN_USER_HASH)
  if (!user || !matches) throw unauthorized('E-mail or password is not right.')
  return user
}

export async function changePassword(
  ctx: AppContext,
  userId: string,
  input: { currentPassword: string; newPassword: string },
): Promise<UserRecord> {
  const user = await findUserById(ctx.db, userId)
  if (!user) throw unauthorized()
  if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
    throw badRequest('Your current password is not right.', {
      currentPassword: ['This is not your current password.'],
    })
  }
  const changedAt = await updatePassword(
    ctx.db,
    user.id,
    await hashPassword(input.newPassword, ctx.config.bcryptCost),
  )
  return { ...user, passwordChangedAt: changedAt }
}

/** Mails a single-use reset link when the account exists; says nothing either way. */
export async function requestPasswordReset(ctx: AppContext, email: string) {
  const user = await findUserByEmail(ctx.db, email)
  if (!user) return
  const token = randomBytes(32).toString('base64url')
  await insertReset(ctx.db, user.id, sha256(token), new Date(Date.now() + RESET_TTL_MS))
  const link = `${publicUrl(ctx.config)}/reset-password?token=${encodeURIComponent(token)}`
  await ctx.mailer.send(resetMail(toPublicUser(user), link))
}

export async function confirmPasswordReset(ctx: AppContext, token: string, password: string) {
  const userId = await consumeReset(ctx.db, sha256(token))
  if (!userId) {
    throw new AppError('invalid_token', 'This reset link is expired or was already used.', 400, {
      token: ['Ask for a new reset link.'],
    })
  }
  await updatePassword(ctx.db, userId, await hashPassword(password, ctx.config.bcryptCost))
  await voidResets(ctx.db, userId)
}
