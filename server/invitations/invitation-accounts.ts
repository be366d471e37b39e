// What accepting an invitation (by e-mail or by an open link) shares: the new student account
// made on the spot, refusing a non-student account, and the answer.
import { hashPassword } from '../auth/password'
import type { AppContext } from '../context'
import { badRequest, conflict, forbidden } from '../lib/errors'
import { findUserByEmail, type UserRecord } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import type { AcceptInvitationInput } from './invitations-schema'

export interface AcceptResult {
  created: UserRecord | null
  studioId: string
  studioName: string
  alreadyMember: boolean
  /** What the teacher sees of earlier practice (null: all of it, or already a member). */
  sharesFrom: Date | null
}

const signInInstead = () =>
  conflict('An account with this e-mail already exists. Sign in to accept.', {
    email: ['Sign in instead.'],
  })

/** The fields of a new student account with this address (400 names the missing ones). */
export async function newStudentAccount(
  ctx: AppContext,
  email: string | undefined,
  input: AcceptInvitationInput,
) {
  if (!input.name || !input.password || !email) {
    throw badRequest('Sign in, or choose your name and a password to create your account.', {
      ...(input.name ? {} : { name: ['Enter your name.'] }),
      ...(input.password ? {} : { password: ['Choose a password.'] }),
      ...(email ? {} : { email: ['Enter your e-mail address.'] }),
    })
  }
  if (await findUserByEmail(ctx.db, email)) throw signInInstead()
  return {
    email,
    name: input.name,
    role: 'student' as const,
    passwordHash: await hashPassword(input.password, ctx.config.bcryptCost),
  }
}

/** A unique violation on insert: the address got an account a moment ago. */
export function duplicateEmail(error: unknown): never {
  if ((error as { code?: string }).code === '23505') throw signInInstead()
  throw error
}

export function refuseNonStudent(current: PublicUser) {
  if (current.role !== 'student') {
    throw forbidden(
      'Invitations are for student accounts. Sign out and accept with your student account.',
    )
  }
}
