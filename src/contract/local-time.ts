// Dates as a person reads them where they live: calendar days and date-times in an IANA time zone
// (the viewer's in the app, the recipient's in e-mails), never 24-hour blocks or UTC.

/** Is this an IANA time zone name the runtime knows ("Europe/Tallinn", "UTC")? */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: name })
    return true
  } catch {
    return false
  }
}

/** The calendar day of an instant in a time zone, as YYYY-MM-DD. */
export function localDay(at: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).formatToParts(at)
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? ''
  return `${part('year')}-${part('month')}-${part('day')}`
}

/** Whole calendar days from `then` to `now` in the time zone (yesterday 23:00 → today 08:00 = 1). */
export function calendarDaysBetween(then: Date, now: Date, timeZone: string): number {
  const day = (d: Date) => Date.parse(`${localDay(d, timeZone)}T00:00:00Z`)
  return Math.round((day(now) - day(then)) / (24 * 3600 * 1000))
}

/** "Fri, 4 Dec 2026, 18:30 (Europe/Tallinn)": a date-time for an e-mail, in the recipient's zone. */
export function mailDateTime(at: Date, timeZone: string): string {
  const text = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).format(at)
  return `${text} (${timeZone})`
}

/** "2026-12-04 18:30": a local date-time a spreadsheet reads as one, in the given zone. */
export function sheetDateTime(at: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(at)
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? ''
  return `${localDay(at, timeZone)} ${part('hour')}:${part('minute')}:${part('second')}`
}

/** Minutes a zone is ahead of UTC at an instant (Tallinn in winter: 120). */
function offsetMinutes(at: Date, timeZone: string): number {
  const [date, time] = sheetDateTime(at, timeZone).split(' ') as [string, string]
  return Math.round(
    (Date.parse(`${date}T${time}Z`) - Math.floor(at.getTime() / 1000) * 1000) / 60000,
  )
}

/**
 * The instant of a wall-clock date and time in a zone ("2026-12-08", "16:30", "Europe/Tallinn" →
 * 14:30 UTC); across a daylight-saving change the offset of that day is used.
 */
export function zonedTimeToUtc(date: string, time: string, timeZone: string): Date {
  const wall = Date.parse(`${date}T${time}:00Z`)
  const first = wall - offsetMinutes(new Date(wall), timeZone) * 60000
  return new Date(wall - offsetMinutes(new Date(first), timeZone) * 60000)
}

/** The local date and time of an instant in a zone: { date: "2026-12-08", time: "16:30" }. */
export function localDateTime(at: Date, timeZone: string): { date: string; time: string } {
  const [date, time] = sheetDateTime(at, timeZone).split(' ') as [string, string]
  return { date, time: time.slice(0, 5) }
}
