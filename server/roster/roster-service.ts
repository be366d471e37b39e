// The teacher's roster: each student's practice figures, plan progress, weak spots, a status and
// the reasons to look at them now.
import { assertCanReadStudent } from '../access/student-access'
import type { AppContext } from '../context'
import { assignmentRows } from '../assignments/assignments-service'
import { buildAssignments } from '../plans/assigned-plans'
import type { Assignment } from '../../src/contract/assignments'
import { rosterSummary, type RosterStudent } from './roster-summary'
import { attentionReasons } from './attention'
import { lastLessonsOf } from '../lessons/lessons-service'
import { timeZoneOf } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import type { RosterRow, RosterStatus, StudioStudent, WeakSpot } from '../../src/contract/roster'
import { activeInstruments, listTeacherStudents } from './roster-repository'
import { instrumentOf } from './roster-instrument'

const DAY_MS = 24 * 3600 * 1000

function weakSpotOf(place: RosterStudent['weakestPositions'][number]): WeakSpot {
  const label = `${place.stringName} string, fret ${place.fret} (${place.pitchName})`
  return {
    string: place.string,
    fret: place.fret,
    label,
    accuracy: place.accuracy,
    attempts: place.answers,
  }
}

/** behind: a plan overdue, or due within 48 h with under half its targets met; inactive: no practice in 7 days. */
export function rosterStatus(
  lastPracticeAt: Date | null,
  assignments: Assignment[],
  now: Date,
): RosterStatus {
  const soon = now.getTime() + 2 * DAY_MS
  const behind = assignments.some((a) => {
    if (a.complete || !a.dueAt) return false
    const due = Date.parse(a.dueAt)
    return due < now.getTime() || (due < soon && a.targetsMet < a.items.length / 2)
  })
  if (behind) return 'behind'
  if (!lastPracticeAt || lastPracticeAt.getTime() < now.getTime() - 7 * DAY_MS) return 'inactive'
  return 'on-track'
}

function planSummary(assignments: Assignment[]) {
  const targetsTotal = assignments.reduce((sum, a) => sum + a.items.length, 0)
  const targetsMet = assignments.reduce((sum, a) => sum + a.targetsMet, 0)
  return {
    plans: {
      assigned: assignments.length,
      complete: assignments.filter((a) => a.complete).length,
      overdue: assignments.filter((a) => a.overdue).length,
      targetsMet,
      targetsTotal,
    },
    planCompletion: targetsTotal ? targetsMet / targetsTotal : null,
  }
}

interface RowContext {
  now: Date
  timeZone: string
  lastLessonAt: Date | null
}

function attentionOf(student: RosterStudent, assignments: Assignment[], at: RowContext) {
  const lastPracticeAt = student.lastPracticeAt ? new Date(student.lastPracticeAt) : null
  return attentionReasons(
    {
      lastPracticeAt,
      week: { accuracy: student.accuracy7d, answers: student.attempts7d },
      previousWeek: { accuracy: student.accuracyPrev7d, answers: student.attemptsPrev7d },
      recall: {
        medianMs: student.medianRecallMs7d,
        previousMedianMs: student.medianRecallMsPrev7d,
        ...student.recallTrend,
      },
      assignments,
      timeZone: at.timeZone,
      lastLessonAt: at.lastLessonAt,
      sharesFrom: student.sharesFrom ? new Date(student.sharesFrom) : null,
    },
    at.now,
  )
}

function toRosterRow(student: RosterStudent, assignments: Assignment[], at: RowContext): RosterRow {
  const { now } = at
  const lastPracticeAt = student.lastPracticeAt ? new Date(student.lastPracticeAt) : null
  return {
    id: student.studentId,
    name: student.name,
    email: student.email,
    studios: student.studios,
    lastPracticeAt: student.lastPracticeAt,
    minutesThisWeek: student.minutes7d,
    attemptsThisWeek: student.attempts7d,
    accuracy: student.accuracy7d,
    recall: {
      medianMs: student.medianRecallMs7d,
      previousMedianMs: student.medianRecallMsPrev7d,
      ...student.recallTrend,
    },
    ...planSummary(assignments),
    weakSpots: student.weakestPositions.map(weakSpotOf),
    status: rosterStatus(lastPracticeAt, assignments, now),
    attention: attentionOf(student, assignments, at),
    instrument: student.instrument,
    fastestTempo: student.fastestTempo,
    sharesFrom: student.sharesFrom,
  }
}

/**
 * Every student of the teacher's studios (or just one) with their roster figures, unsorted and
 * unpaged: practice figures from the progress rollups (rosterSummary), plans and status from here.
 */
export async function rosterRows(
  ctx: AppContext,
  teacherId: string,
  now = new Date(),
  only?: string,
): Promise<RosterRow[]> {
  const students = (await rosterSummary(ctx, teacherId)).students.filter(
    (s) => !only || s.studentId === only,
  )
  const ids = students.map((s) => s.studentId)
  const rows = ids.length ? await assignmentRows(ctx, { teacherId, studentIds: ids }) : []
  const [assignments, timeZone, lessons] = await Promise.all([
    buildAssignments(ctx, rows, now),
    timeZoneOf(ctx.db, teacherId),
    lastLessonsOf(ctx, teacherId, ids, now),
  ])
  return students.map((s) =>
    toRosterRow(
      s,
      assignments.filter((a) => a.student.id === s.studentId),
      { now, timeZone, lastLessonAt: lessons.get(s.studentId) ?? null },
    ),
  )
}

/** Every membership of the teacher's studios, with each student's active instrument. */
export async function teacherStudentList(
  ctx: AppContext,
  teacherId: string,
): Promise<StudioStudent[]> {
  const rows = await listTeacherStudents(ctx.db, teacherId)
  const necks = await activeInstruments(ctx.db, [...new Set(rows.map((r) => r.id))])
  const byStudent = new Map(necks.map((n) => [n.user_id, n]))
  return rows.map((r) => ({ ...r, instrument: instrumentOf(byStudent.get(r.id)) }))
}

/** One student's roster row, for the teacher's student page (403 unless in the teacher's studios). */
export async function rosterRowOf(
  ctx: AppContext,
  teacher: PublicUser,
  studentId: string,
): Promise<RosterRow> {
  await assertCanReadStudent(ctx, teacher, studentId)
  const [row] = await rosterRows(ctx, teacher.id, new Date(), studentId)
  if (!row) throw new Error('student row missing after the access check')
  return row
}
