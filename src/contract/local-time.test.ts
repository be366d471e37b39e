// Calendar days and local date-times (issue 16: "today" for yesterday evening; e-mails in UTC).
// Offsets from the IANA time zone database (Europe/Tallinn UTC+2 in winter, America/Chicago UTC−6).
import { describe, expect, it } from 'vitest'
import {
  calendarDaysBetween,
  isTimeZone,
  localDateTime,
  localDay,
  mailDateTime,
  sheetDateTime,
  zonedTimeToUtc,
} from './local-time'

describe('local time', () => {
  it('counts calendar days in the viewer’s zone, not 24-hour blocks', () => {
    const evening = new Date('2026-12-02T21:00:00Z') // 23:00 in Tallinn
    const morning = new Date('2026-12-03T05:00:00Z') // 07:00 the next day in Tallinn, 23:00 in Chicago
    expect(calendarDaysBetween(evening, morning, 'Europe/Tallinn')).toBe(1)
    expect(calendarDaysBetween(evening, morning, 'America/Chicago')).toBe(0) // both on 2 Dec there
    expect(localDay(morning, 'America/Chicago')).toBe('2026-12-02')
  })

  it('writes e-mail and spreadsheet date-times in the given zone', () => {
    const at = new Date('2026-12-04T16:30:00Z')
    expect(mailDateTime(at, 'Europe/Tallinn')).toBe('Fri, 4 Dec 2026, 18:30 (Europe/Tallinn)')
    expect(sheetDateTime(at, 'America/Chicago')).toBe('2026-12-04 10:30:00')
  })

  it('knows IANA names and refuses made-up ones', () => {
    expect(isTimeZone('Europe/Tallinn')).toBe(true)
    expect(isTimeZone('Mars/Olympus')).toBe(false)
  })
})

describe('zonedTimeToUtc', () => {
  // IANA tz database: Tallinn UTC+2 in winter, UTC+3 in summer (from 29 Mar 2026, 03:00 local)
  it('turns a wall-clock time in a zone into the instant', () => {
    expect(zonedTimeToUtc('2026-12-08', '16:30', 'Europe/Tallinn').toISOString()).toBe(
      '2026-12-08T14:30:00.000Z',
    )
    expect(zonedTimeToUtc('2026-07-07', '16:30', 'Europe/Tallinn').toISOString()).toBe(
      '2026-07-07T13:30:00.000Z',
    )
    expect(zonedTimeToUtc('2026-12-08', '09:00', 'America/Chicago').toISOString()).toBe(
      '2026-12-08T15:00:00.000Z',
    )
  })
  it('keeps the wall-clock time across a daylight-saving change, and reads back', () => {
    const before = zonedTimeToUtc('2026-03-24', '17:00', 'Europe/Tallinn')
    const after = zonedTimeToUtc('2026-03-31', '17:00', 'Europe/Tallinn')
    expect(after.getTime() - before.getTime()).toBe(7 * 864e5 - 3600e3)
    expect(localDateTime(after, 'Europe/Tallinn')).toEqual({ date: '2026-03-31', time: '17:00' })
  })
})
