// CSV of one student's graded answers, laid out to open cleanly in a spreadsheet: the student's
// name, local date-times, labels as on screen, seconds, strings and frets counted from 1 and 0, and
// sessions numbered per student.
import { drillName } from '../../src/contract/drills'
import { sheetDateTime } from '../../src/contract/local-time'
import { pitchName } from '../../src/theory'
import type { AppContext } from '../context'
import { findUserById, timeZoneOf } from '../users/users-repository'
import { badRequest } from '../lib/errors'
import { readableSince } from '../access/shared-history'
import type { PublicUser } from '../users/users-schema'
import { csvFileName, toCsv } from './csv'
import { studentResults, type ResultRow } from './results-repository'

const DAY_MS = 24 * 3600 * 1000

const resultsHeader = (timeZone: string) => [
  'Student',
  `Answered at (${timeZone})`,
  'Session',
  'Drill',
  'String (1 = lowest)',
  'Fret (0 = open)',
  'Expected',
  'Answer',
  'Correct',
  'Response (s)',
  'Plan',
]

/** "2:5" (a cell as the drills send it, lowest string 0) reads "string 3, fret 5"; notes stay. */
export function answerText(answer: string): string {
  const cell = /^(\d+):(\d+)$/.exec(answer)
  return cell ? `string ${Number(cell[1]) + 1}, fret ${cell[2]}` : answer
}

const seconds = (ms: number) => Math.round(ms / 10) / 100

function resultLine(name: string, timeZone: string, r: ResultRow) {
  return [
    name,
    sheetDateTime(r.created_at, timeZone),
    r.session_number,
    drillName(r.drill),
    r.string === null ? null : r.string + 1,
    r.fret,
    pitchName(r.expected_pitch, r.accidentals ?? 'flat'),
    answerText(r.answer),
    r.correct,
    seconds(r.response_ms),
    r.plan_title,
  ]
}

/** The answers from `from` to `to` (whole days; the last 90 days by default), newest first. */
export async function resultsCsv(
  ctx: AppContext,
  teacher: PublicUser,
  studentId: string,
  range: { from?: string; to?: string; timeZone?: string },
) {
  const since = await readableSince(ctx, teacher, studentId)
  const to = range.to ? new Date(Date.parse(range.to) + DAY_MS) : new Date()
  const from = range.from ? new Date(range.from) : new Date(to.getTime() - 90 * DAY_MS)
  if (from >= to)
    throw badRequest('The start date is after the end date.', {
      from: ['Pick a start before the end.'],
    })
  const timeZone = range.timeZone ?? (await timeZoneOf(ctx.db, teacher.id))
  const student = (await findUserById(ctx.db, studentId))!
  const rows = await studentResults(ctx.db, studentId, teacher.id, { from, to, since })
  return {
    fileName: csvFileName(student.name, 'results'),
    csv: toCsv(
      resultsHeader(timeZone),
      rows.map((r) => resultLine(student.name, timeZone, r)),
    ),
  }
}
