// Lesson use cases: a teacher schedules lessons with a student of their studios (one-off or
// weekly at the same local time in the teacher's zone), marks or moves or cancels them, writes notes
// (private or shared); a student sees their lessons with the shared notes; both read what was
// practised since the last lesson.
import { randomUUID } from 'node:crypto'
import type { AppContext } from '../context'
import { forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { teacherStudents } from '../access/access-repository'
import { assertCanReadStudent } from '../access/student-access'
import { readableSince } from '../access/shared-history'
import { timeZoneOf } from '../users/users-repository'
import { zonedTimeToUtc } from '../../src/contract/local-time'
import type {
  LessonCreateInput,
  LessonNoteInput,
  LessonUpdateInput,
  SinceLastLesson,
} from '../../src/contract/lessons'
import * as repo from './lessons-repository'

const WEEK_DAYS = 7

/** yyyy-mm-dd plus whole days, on the calendar (no clock involved). */
const addDays = (date: string, days: number) =>
  new Date(Date.parse(`${date}T00:00:00Z`) + days * 864e5).toISOString().slice(0, 10)

export async function scheduleLessons(
  ctx: AppContext,
  teacher: PublicUser,
  input: LessonCreateInput,
) {
  const student = (await teacherStudents(ctx.db, teacher.id)).find((s) => s.id === input.studentId)
  if (!student) throw forbidden('Lessons can only be scheduled with students of your studios.')
  const seriesId = input.weeks > 1 ? randomUUID() : null
  const lessons = Array.from({ length: input.weeks }, (_, week) => ({
    studioId: student.studios[0]!.id,
    teacherId: teacher.id,
    studentId: student.id,
    seriesId,
    startsAt: zonedTimeToUtc(addDays(input.date, week * WEEK_DAYS), input.time, input.timeZone),
    durationMinutes: input.durationMinutes,
    timeZone: input.timeZone,
  }))
  const ids = await repo.insertLessons(ctx.db, lessons)
  return repo.listLessons(ctx.db, { ids }, false)
}

/** The teacher's lessons (with one student, or all), or a student's own with shared notes only. */
export async function lessonsFor(ctx: AppContext, user: PublicUser, studentId?: string) {
  if (user.role === 'teacher')
    return repo.listLessons(ctx.db, { teacherId: user.id, studentId }, false)
  if (studentId && studentId !== user.id) await assertCanReadStudent(ctx, user, studentId)
  return repo.listLessons(ctx.db, { studentId: studentId ?? user.id }, true)
}

async function ownLesson(ctx: AppContext, teacher: PublicUser, id: string) {
  const lesson = await repo.findLessonOwner(ctx.db, id)
  if (!lesson) throw notFound('That lesson')
  if (lesson.teacher_id !== teacher.id) throw forbidden('This lesson belongs to another teacher.')
  return lesson
}

const oneLesson = async (ctx: AppContext, id: string) =>
  (await repo.listLessons(ctx.db, { ids: [id] }, false))[0]!

export async function changeLesson(
  ctx: AppContext,
  teacher: PublicUser,
  id: string,
  input: LessonUpdateInput,
) {
  await ownLesson(ctx, teacher, id)
  const current = await oneLesson(ctx, id)
  const timeZone = input.timeZone ?? current.timeZone
  const startsAt =
    input.date && input.time ? zonedTimeToUtc(input.date, input.time, timeZone) : undefined
  await repo.updateLesson(ctx.db, id, { ...input, startsAt, timeZone })
  return oneLesson(ctx, id)
}

export async function removeLesson(ctx: AppContext, teacher: PublicUser, id: string) {
  await ownLesson(ctx, teacher, id)
  await repo.deleteLesson(ctx.db, id)
}

export async function addNote(
  ctx: AppContext,
  teacher: PublicUser,
  id: string,
  input: LessonNoteInput,
) {
  await ownLesson(ctx, teacher, id)
  await repo.insertNote(ctx.db, { lessonId: id, authorId: teacher.id, ...input })
  return oneLesson(ctx, id)
}

export async function removeNote(ctx: AppContext, teacher: PublicUser, id: string, noteId: string) {
  await ownLesson(ctx, teacher, id)
  if (!(await repo.deleteNote(ctx.db, id, noteId))) throw notFound('That note')
  return oneLesson(ctx, id)
}

/** What the student practised since their last lesson that has begun (all time without one). */
export async function sinceLastLesson(
  ctx: AppContext,
  viewer: PublicUser,
  studentId: string,
  now = new Date(),
): Promise<SinceLastLesson> {
  const shared = await readableSince(ctx, viewer, studentId)
  const lessons = await lessonsFor(ctx, viewer, studentId)
  const last = lessons
    .filter((l) => l.status !== 'cancelled' && Date.parse(l.startsAt) <= now.getTime())
    .at(-1)
  const lessonAt = last ? new Date(last.startsAt) : null
  // practice from before what the student shared with this teacher stays hidden
  const since = shared && (!lessonAt || shared > lessonAt) ? shared : lessonAt
  const figures = await repo.practiceSince(
    ctx.db,
    studentId,
    since,
    await timeZoneOf(ctx.db, studentId),
  )
  return { lessonAt: lessonAt?.toISOString() ?? null, ...figures }
}

/** Each student's last lesson with this teacher, for the roster's "no practice since". */
export const lastLessonsOf = (ctx: AppContext, teacherId: string, ids: string[], now: Date) =>
  repo.lastLessons(ctx.db, teacherId, ids, now)
