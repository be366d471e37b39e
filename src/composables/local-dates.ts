// Dates as the signed-in user reads them: in the time zone of their account (the browser's until the
// server has answered), reactive so that text re-renders when the zone is changed in Account.
import { ref } from 'vue'

/** The account's zone once known; null = this browser's. Set by the time-zone store. */
export const displayZone = ref<string | null>(null)

/** The zone dates are shown in ("Europe/Tallinn"). */
export const shownZone = () => displayZone.value ?? Intl.DateTimeFormat().resolvedOptions().timeZone

/** "4 Dec 2026" (or other date options) in the account's zone. */
export const dateText = (
  iso: string | Date,
  options: Intl.DateTimeFormatOptions = { dateStyle: 'medium' },
) => new Date(iso).toLocaleDateString(undefined, { ...options, timeZone: shownZone() })

/** "4 Dec 2026, 18:30" (or other options) in the account's zone. */
export const dateTimeText = (
  iso: string | Date,
  options: Intl.DateTimeFormatOptions = { dateStyle: 'medium', timeStyle: 'short' },
) => new Date(iso).toLocaleString(undefined, { ...options, timeZone: shownZone() })
