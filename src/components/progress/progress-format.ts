// Formatting of progress figures for people: percentages, seconds, days, note names.
import { pitchClassName, toUnicode, type AccidentalPreference } from '@/theory'
import { DRILLS } from '@/drills/registry'
import { type DrillId } from '@/contract/drills'

export const percent = (v: number | null | undefined) =>
  v === null || v === undefined ? '–' : `${Math.round(v * 100)} %`

/** Milliseconds as seconds with one decimal ("1.4 s"). */
export const seconds = (ms: number | null | undefined) =>
  ms === null || ms === undefined ? '–' : `${(ms / 1000).toFixed(1)} s`

export const minutes = (m: number) =>
  m < 60 ? `${Math.round(m)} min` : `${Math.floor(m / 60)} h ${Math.round(m % 60)} min`

/** "3 Mar" for 2026-03-03, in the reader's language. */
export function shortDay(day: string) {
  return new Date(`${day}T12:00:00Z`).toLocaleDateString(undefined, {
    day: 'numeric',
    month: 'short',
    timeZone: 'UTC',
  })
}

/** Every day from `from` to `to` inclusive (YYYY-MM-DD). */
export function daysBetween(from: string, to: string): string[] {
  const days: string[] = []
  for (
    let d = new Date(`${from}T00:00:00Z`);
    d.toISOString().slice(0, 10) <= to;
    d.setUTCDate(d.getUTCDate() + 1)
  ) {
    days.push(d.toISOString().slice(0, 10))
    if (days.length > 1000) break
  }
  return days
}

export const noteName = (pitchClass: number, prefer: AccidentalPreference = 'flat') =>
  toUnicode(pitchClassName(pitchClass, prefer))

export const drillName = (drill: DrillId | 'all') =>
  drill === 'all' ? 'All drills' : DRILLS[drill].name
