// An admin changes an account: its role (a promoted student leaves every roster; a former teacher's
// studios pause) or whether it is disabled. Either change ends the account's sessions, in the same
// transaction.
import { deleteUserSessions } from '../auth/sessions-repository'
import type { AppContext } from '../context'
import { badRequest, notFound } from '../lib/errors'
import {
  findUserById,
  toAdminUser,
  updateDisabled,
  updateRole,
  type UserRecord,
} from '../users/users-repository'
import type { AdminUser, UserChange } from '../users/users-schema'
import { notify } from '../notifications/notify'
import { endStudioMemberships, pauseStudios } from './admin-users-repository'
import { studioPausedMail } from './studio-paused-mail'

type Trx = Parameters<typeof findUserById>[0]
type Paused = Awaited<ReturnType<typeof pauseStudios>>

/** A new role: a promoted student leaves every roster; a former teacher's studios pause. */
async function applyRole(trx: Trx, user: UserRecord, role: UserRecord['role']) {
  const changed = (await updateRole(trx, user.id, role))!
  if (role !== 'student') await endStudioMemberships(trx, user.id)
  const paused = user.role === 'teacher' ? await pauseStudios(trx, user.id) : []
  return { user: changed, paused }
}

export async function changeUser(
  ctx: AppContext,
  adminId: string,
  userId: string,
  change: UserChange,
): Promise<AdminUser> {
  if (userId === adminId) {
    const field = change.role !== undefined ? 'role' : 'disabled'
    throw badRequest('You cannot change your own role or disable yourself.', {
      [field]: ['Ask another admin.'],
    })
  }
  const { user, paused } = await ctx.db.transaction(async (trx) => {
    let user: UserRecord | null = await findUserById(trx, userId)
    if (!user) throw notFound('That user')
    let endSessions = false
    let paused: Paused = []
    if (change.role !== undefined && change.role !== user.role) {
      ;({ user, paused } = await applyRole(trx, user, change.role))
      endSessions = true
    }
    if (change.disabled !== undefined && change.disabled !== Boolean(user.disabledAt)) {
      user = (await updateDisabled(trx, userId, change.disabled))!
      endSessions ||= change.disabled
    }
    if (endSessions) await deleteUserSessions(trx, userId)
    return { user, paused }
  })
  await notify(
    ctx,
    paused.map((student) => studioPausedMail(ctx.config, student, user.name)),
  )
  return toAdminUser(user)
}
