// The account's own settings: the time zone every date and e-mail of this user is shown in.
import { z } from 'zod'
import { TimeZoneSchema } from './attempts'

/** The user's time zone and whether it follows the browser (else it was chosen in Account). */
export interface TimeZoneSetting {
  timeZone: string
  followsBrowser: boolean
}

/** Account → Time zone: a zone to keep, or follow the browser (then `timeZone` is the browser's). */
export const TimeZoneChoiceSchema = z.strictObject({
  timeZone: TimeZoneSchema,
  followsBrowser: z.boolean('Say whether the zone follows the browser.').default(false),
})
export type TimeZoneChoice = z.infer<typeof TimeZoneChoiceSchema>

/** What a browser reports on sign-in; kept only while the user has not chosen a zone. */
export const BrowserTimeZoneSchema = z.strictObject({ timeZone: TimeZoneSchema })
