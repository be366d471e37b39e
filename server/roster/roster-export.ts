// CSV exports: the roster (with the table's filters and sort) and one student's graded answers.
import { drillName } from '../../src/contract/drills'
import { pitchName } from '../../src/theory'
import type { AppContext } from '../context'
import { findUserById } from '../users/users-repository'
import { badRequest } from '../lib/errors'
import { assertCanReadStudent } from '../access/student-access'
import type { PublicUser } from '../users/users-schema'
import { csvFileName, toCsv } from './csv'
import { studentResults } from './results-repository'
import { filterRoster, sortRoster } from './roster-query'
import { rosterRows } from './roster-service'
import type { RosterFilter } from './roster-schema'

const ROSTER_HEADER = [
  'Name',
  'E-mail',
  'Studios',
  'Status',
  'Last practice',
  'Minutes (7 days)',
  'Answers (7 days)',
  'Accuracy (7 days, %)',
  'Median recall (ms, 7 days)',
  'Median recall (ms, 7 days before)',
  'Recall trend',
  'Plans assigned',
  'Plans complete',
  'Plans overdue',
  'Targets met',
  'Targets total',
  'Weak spots',
]

const pct = (v: number | null) => (v === null ? null : Math.round(v * 1000) / 10)
const ms = (v: number | null) => (v === null ? null : Math.round(v))

export async function rosterCsv(ctx: AppContext, teacherId: string, filter: RosterFilter) {
  const rows = sortRoster(
    filterRoster(await rosterRows(ctx, teacherId), filter),
    filter.sortBy,
    filter.sortDesc,
  )
  const body = rows.map((r) => [
    r.name,
    r.email,
    r.studios.map((s) => s.name).join('; '),
    r.status,
    r.lastPracticeAt,
    r.minutesThisWeek,
    r.attemptsThisWeek,
    pct(r.accuracy),
    ms(r.recall.medianMs),
    ms(r.recall.previousMedianMs),
    r.recall.direction,
    r.plans.assigned,
    r.plans.complete,
    r.plans.overdue,
    r.plans.targetsMet,
    r.plans.targetsTotal,
    r.weakSpots.map((w) => `${w.label} ${Math.round(w.accuracy * 100)} %`).join('; '),
  ])
  return {
    fileName: csvFileName('roster', new Date().toISOString().slice(0, 10)),
    csv: toCsv(ROSTER_HEADER, body),
  }
}

const RESULTS_HEADER = [
  'Answered at (UTC)',
  'Drill',
  'String (1 = lowest)',
  'Fret',
  'Expected',
  'Answer',
  'Correct',
  'Response (ms)',
  'Session',
  'Plan',
]
const DAY_MS = 24 * 3600 * 1000

/** The answers from `from` to `to` (whole days, UTC; the last 90 days by default). */
export async function resultsCsv(
  ctx: AppContext,
  teacher: PublicUser,
  studentId: string,
  range: { from?: string; to?: string },
) {
  await assertCanReadStudent(ctx, teacher, studentId)
  const to = range.to ? new Date(Date.parse(range.to) + DAY_MS) : new Date()
  const from = range.from ? new Date(range.from) : new Date(to.getTime() - 90 * DAY_MS)
  if (from >= to)
    throw badRequest('The start date is after the end date.', {
      from: ['Pick a start before the end.'],
    })
  const student = (await findUserById(ctx.db, studentId))!
  const rows = await studentResults(ctx.db, studentId, teacher.id, from, to)
  const body = rows.map((r) => [
    r.created_at.toISOString(),
    drillName(r.drill),
    r.string === null ? null : r.string + 1,
    r.fret,
    pitchName(r.expected_pitch, 'flat'),
    r.answer,
    r.correct,
    r.response_ms,
    r.session_id,
    r.plan_title,
  ])
  return { fileName: csvFileName(student.name, 'results'), csv: toCsv(RESULTS_HEADER, body) }
}
