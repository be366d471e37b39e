// CSV of the roster (with the table's filters and sort), as the table reads: status words, local
// date-times, seconds (results-export.ts has one student's answers).
import { localDay, sheetDateTime } from '../../src/contract/local-time'
import { drillName } from '../../src/contract/drills'
import { ROSTER_STATUS_TEXT, type RosterRow } from '../../src/contract/roster'
import type { AppContext } from '../context'
import { timeZoneOf } from '../users/users-repository'
import { csvFileName, toCsv } from './csv'
import { filterRoster, sortRoster } from './roster-query'
import { rosterRows } from './roster-service'
import type { RosterFilter } from './roster-schema'

const rosterHeader = (timeZone: string) => [
  'Name',
  'E-mail',
  'Studios',
  'Status',
  `Last practice (${timeZone})`,
  'Minutes (7 days)',
  'Answers (7 days)',
  'Accuracy (7 days, %)',
  'Median recall (s, 7 days)',
  'Median recall (s, 7 days before)',
  'Recall trend',
  'Plans assigned',
  'Plans complete',
  'Plans overdue',
  'Targets met',
  'Targets total',
  'Weak spots',
  'Fastest clean tempo (BPM, 7 days)',
  'Fastest clean tempo drill',
]

const pct = (v: number | null) => (v === null ? null : Math.round(v * 1000) / 10)
const seconds = (ms: number | null) => (ms === null ? null : Math.round(ms / 100) / 10)

/** "12 % faster", "steady", or empty without two weeks of figures (as on screen). */
function trendText(recall: RosterRow['recall']): string {
  if (recall.direction === null || recall.change === null) return ''
  if (recall.direction === 'steady') return 'steady'
  return `${Math.round(Math.abs(recall.change) * 100)} % ${recall.direction}`
}

const rosterLine = (r: RosterRow, timeZone: string) => [
  r.name,
  r.email,
  r.studios.map((s) => s.name).join('; '),
  ROSTER_STATUS_TEXT[r.status],
  r.lastPracticeAt ? sheetDateTime(new Date(r.lastPracticeAt), timeZone) : null,
  r.minutesThisWeek,
  r.attemptsThisWeek,
  pct(r.accuracy),
  seconds(r.recall.medianMs),
  seconds(r.recall.previousMedianMs),
  trendText(r.recall),
  r.plans.assigned,
  r.plans.complete,
  r.plans.overdue,
  r.plans.targetsMet,
  r.plans.targetsTotal,
  r.weakSpots.map((w) => `${w.label} ${Math.round(w.accuracy * 100)} %`).join('; '),
  r.fastestTempo?.bpm ?? null,
  r.fastestTempo ? drillName(r.fastestTempo.drill) : null,
]

export async function rosterCsv(ctx: AppContext, teacherId: string, filter: RosterFilter) {
  const rows = sortRoster(
    filterRoster(await rosterRows(ctx, teacherId), filter),
    filter.sortBy,
    filter.sortDesc,
  )
  const timeZone = filter.timeZone ?? (await timeZoneOf(ctx.db, teacherId))
  return {
    fileName: csvFileName('roster', localDay(new Date(), timeZone)),
    csv: toCsv(
      rosterHeader(timeZone),
      rows.map((r) => rosterLine(r, timeZone)),
    ),
  }
}
