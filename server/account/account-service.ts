// The signed-in user's own settings: the time zone their dates and e-mails use.
import type { AppContext } from '../context'
import { badRequest } from '../lib/errors'
import * as users from '../users/users-repository'
import type { TimeZoneChoice, TimeZoneSetting } from '../../src/contract/account'

/** PostgreSQL's zone list can differ from the runtime's: a zone it lacks is a 400, not a 500. */
async function assertKnownZone(ctx: AppContext, zone: string) {
  if (!(await users.isKnownTimeZone(ctx.db, zone)))
    throw badRequest('Not a known time zone.', { timeZone: ['Not a known time zone.'] })
}

export const timeZoneSetting = (ctx: AppContext, userId: string): Promise<TimeZoneSetting> =>
  users.timeZoneSetting(ctx.db, userId)

/** Keeps the chosen zone (or follows the browser again, starting with its zone). */
export async function chooseTimeZone(ctx: AppContext, userId: string, choice: TimeZoneChoice) {
  await assertKnownZone(ctx, choice.timeZone)
  await users.chooseTimeZone(ctx.db, userId, choice.timeZone, choice.followsBrowser)
  return users.timeZoneSetting(ctx.db, userId)
}

/** The browser's zone, saved unless the user chose one; answers the zone in force. */
export async function reportBrowserTimeZone(ctx: AppContext, userId: string, zone: string) {
  await assertKnownZone(ctx, zone)
  await users.reportBrowserTimeZone(ctx.db, userId, zone)
  return users.timeZoneSetting(ctx.db, userId)
}
