// An admin changes an account: its role (a promoted student leaves every roster) or whether it is
// disabled. Either change ends the account's sessions, in the same transaction.
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
import { endStudioMemberships } from './admin-users-repository'

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
  return ctx.db.transaction(async (trx) => {
    let user: UserRecord | null = await findUserById(trx, userId)
    if (!user) throw notFound('That user')
    let endSessions = false
    if (change.role !== undefined && change.role !== user.role) {
      user = (await updateRole(trx, userId, change.role))!
      if (user.role !== 'student') await endStudioMemberships(trx, userId)
      endSessions = true
    }
    if (change.disabled !== undefined && change.disabled !== Boolean(user.disabledAt)) {
      user = (await updateDisabled(trx, userId, change.disabled))!
      endSessions ||= change.disabled
    }
    if (endSessions) await deleteUserSessions(trx, userId)
    return toAdminUser(user)
  })
}
