// Pure arithmetic over rollup rows: merged figures per place and note, totals, timeline, streaks.
import { percentile } from './percentile'
import type { DayRow, ItemRow } from './progress-repository'
import type {
  ItemFigures,
  PositionFigures,
  PracticeTotals,
  Streak,
  TimelinePoint,
} from '../../src/contract/progress'

const round1 = (x: number) => Math.round(x * 10) / 10
const ratio = (part: number, whole: number) => (whole > 0 ? part / whole : null)

/** Figures of several rollup rows taken together (e.g. every place of one pitch class). */
export function figuresOf(rows: readonly ItemRow[]): ItemFigures {
  const recentCorrect = rows.flatMap((r) => r.recentCorrect)
  const recentMs = rows.flatMap((r) => r.recentMs)
  const attempts = rows.reduce((n, r) => n + r.attempts, 0)
  const correct = rows.reduce((n, r) => n + r.correct, 0)
  const shown = rows.reduce((n, r) => n + r.shown, 0)
  const last = rows.reduce<Date | null>((at, r) => (at && at > r.lastAt ? at : r.lastAt), null)
  return {
    attempts,
    correct,
    shown,
    accuracy: ratio(correct, attempts),
    recentAnswers: recentCorrect.length,
    recentAccuracy: ratio(recentCorrect.filter(Boolean).length, recentCorrect.length),
    medianMs: percentile(recentMs, 0.5),
    p90Ms: percentile(recentMs, 0.9),
    lastSeenAt: last ? last.toISOString() : null,
  }
}

function groupBy<K, T>(items: readonly T[], key: (item: T) => K): Map<K, T[]> {
  const groups = new Map<K, T[]>()
  for (const item of items) {
    const k = key(item)
    groups.set(k, [...(groups.get(k) ?? []), item])
  }
  return groups
}

/** One entry per practised place (string, fret), whatever pitch it held when answered. */
export function positionsFrom(rows: readonly ItemRow[]): PositionFigures[] {
  const placed = rows.filter((r) => r.string >= 0)
  return [...groupBy(placed, (r) => `${r.string}:${r.fret}`).values()]
    .map((group) => ({ string: group[0]!.string, fret: group[0]!.fret, ...figuresOf(group) }))
    .sort((a, b) => a.string - b.string || a.fret - b.fret)
}

/** The 12 pitch classes (0 = C), each with the figures of every row of that class. */
export function pitchClassFigures(rows: readonly ItemRow[]) {
  const byClass = groupBy(rows, (r) => r.pitch % 12)
  return Array.from({ length: 12 }, (_, pitchClass) => ({
    pitchClass,
    ...figuresOf(byClass.get(pitchClass) ?? []),
  }))
}

/** Every practised pitch with its figures, lowest first. */
export function pitchFigures(rows: readonly ItemRow[]) {
  return [...groupBy(rows, (r) => r.pitch).entries()]
    .map(([pitch, group]) => ({ pitch, ...figuresOf(group) }))
    .sort((a, b) => a.pitch - b.pitch)
}

/** Per string 0..strings−1, the 12 pitch classes answered on it. */
export function stringFigures(rows: readonly ItemRow[], strings: number) {
  const byString = groupBy(
    rows.filter((r) => r.string >= 0),
    (r) => r.string,
  )
  return Array.from({ length: strings }, (_, string) => ({
    string,
    pitchClasses: pitchClassFigures(byString.get(string) ?? []),
  }))
}

/** Totals of day rows of one drill key; `sessions` comes from the session rollup. */
export function totalsOf(days: readonly DayRow[], sessions: number): PracticeTotals {
  const attempts = days.reduce((n, d) => n + d.attempts, 0)
  const correct = days.reduce((n, d) => n + d.correct, 0)
  const shown = days.reduce((n, d) => n + d.shown, 0)
  const activeMs = days.reduce((n, d) => n + d.activeMs, 0)
  return {
    attempts,
    correct,
    shown,
    accuracy: ratio(correct, attempts),
    minutes: round1(activeMs / 60000),
    days: days.length,
    sessions,
  }
}

export const toPoint = (d: DayRow): TimelinePoint => ({
  day: d.day,
  attempts: d.attempts,
  correct: d.correct,
  shown: d.shown,
  accuracy: d.correct / d.attempts,
  medianMs: d.medianMs,
  p90Ms: d.p90Ms,
  minutes: round1(d.activeMs / 60000),
})

/** The calendar day (YYYY-MM-DD) of an instant in a time zone. */
export function localDay(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).format(at)
}

/** A calendar day moved by whole days. */
export function addDays(day: string, days: number): string {
  const d = new Date(`${day}T00:00:00Z`)
  d.setUTCDate(d.getUTCDate() + days)
  return d.toISOString().slice(0, 10)
}

/** Current and longest run of consecutive practice days; `days` are distinct and ascending. */
export function streakOf(days: readonly string[], today: string): Streak {
  let longest = 0
  let run = 0
  let previous: string | null = null
  for (const day of days) {
    run = previous !== null && addDays(previous, 1) === day ? run + 1 : 1
    longest = Math.max(longest, run)
    previous = day
  }
  const practisedToday = previous === today
  const current = previous === today || previous === addDays(today, -1) ? run : 0
  return { current, longest, practisedToday }
}
