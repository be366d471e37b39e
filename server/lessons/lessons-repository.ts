// The lessons and lesson_notes tables: a teacher's schedule with each student and the notes on it;
// the figures "since the last lesson" and each student's last lesson, for the roster.
import type { Db } from '../lib/db'
import type { Lesson, LessonNote, LessonStatus, SinceLastLesson } from '../../src/contract/lessons'

interface LessonRow {
  id: string
  student_id: string
  student_name: string
  teacher_name: string
  series_id: string | null
  starts_at: Date
  duration_minutes: number
  time_zone: string
  status: LessonStatus
}

export interface NewLesson {
  studioId: string
  teacherId: string
  studentId: string
  seriesId: string | null
  startsAt: Date
  durationMinutes: number
  timeZone: string
}

const toLesson = (r: LessonRow, notes: LessonNote[]): Lesson => ({
  id: r.id,
  studentId: r.student_id,
  studentName: r.student_name,
  teacherName: r.teacher_name,
  seriesId: r.series_id,
  startsAt: r.starts_at.toISOString(),
  durationMinutes: r.duration_minutes,
  timeZone: r.time_zone,
  status: r.status,
  notes,
})

export async function insertLessons(db: Db, lessons: NewLesson[]): Promise<string[]> {
  const rows = await db('lessons')
    .insert(
      lessons.map((l) => ({
        studio_id: l.studioId,
        teacher_id: l.teacherId,
        student_id: l.studentId,
        series_id: l.seriesId,
        starts_at: l.startsAt,
        duration_minutes: l.durationMinutes,
        time_zone: l.timeZone,
      })),
    )
    .returning('id')
  return rows.map((r: { id: string }) => r.id)
}

/** Lessons by teacher and/or student, in time order, with their notes (only shared ones if asked). */
export async function listLessons(
  db: Db,
  filter: { teacherId?: string; studentId?: string; ids?: string[] },
  sharedNotesOnly: boolean,
): Promise<Lesson[]> {
  const rows: LessonRow[] = await db('lessons as l')
    .join('users as s', 's.id', 'l.student_id')
    .join('users as t', 't.id', 'l.teacher_id')
    .modify((q) => {
      if (filter.teacherId) q.where('l.teacher_id', filter.teacherId)
      if (filter.studentId) q.where('l.student_id', filter.studentId)
      if (filter.ids) q.whereIn('l.id', filter.ids)
    })
    .orderBy('l.starts_at')
    .limit(1000)
    .select('l.*', 's.name as student_name', 't.name as teacher_name')
  const notes = rows.length
    ? await db('lesson_notes')
        .whereIn(
          'lesson_id',
          rows.map((r) => r.id),
        )
        .modify((q) => sharedNotesOnly && q.where('shared', true))
        .orderBy('created_at')
    : []
  return rows.map((r) =>
    toLesson(
      r,
      notes
        .filter((n: { lesson_id: string }) => n.lesson_id === r.id)
        .map((n: { id: string; body: string; shared: boolean; created_at: Date }) => ({
          id: n.id,
          body: n.body,
          shared: n.shared,
          createdAt: n.created_at.toISOString(),
        })),
    ),
  )
}

export const findLessonOwner = (db: Db, id: string) =>
  db('lessons').where({ id }).first('id', 'teacher_id', 'student_id') as Promise<
    { id: string; teacher_id: string; student_id: string } | undefined
  >

export async function updateLesson(
  db: Db,
  id: string,
  change: { status?: LessonStatus; startsAt?: Date; durationMinutes?: number; timeZone?: string },
) {
  await db('lessons')
    .where({ id })
    .update({
      ...(change.status ? { status: change.status } : {}),
      ...(change.startsAt ? { starts_at: change.startsAt } : {}),
      ...(change.durationMinutes ? { duration_minutes: change.durationMinutes } : {}),
      ...(change.timeZone ? { time_zone: change.timeZone } : {}),
      updated_at: new Date(),
    })
}

export const deleteLesson = (db: Db, id: string) => db('lessons').where({ id }).delete()

export async function insertNote(
  db: Db,
  note: { lessonId: string; authorId: string; body: string; shared: boolean },
) {
  await db('lesson_notes').insert({
    lesson_id: note.lessonId,
    author_id: note.authorId,
    body: note.body,
    shared: note.shared,
  })
}

export const deleteNote = (db: Db, lessonId: string, noteId: string) =>
  db('lesson_notes').where({ id: noteId, lesson_id: lessonId }).delete()

/** Each student's latest lesson that has begun and was not cancelled (by this teacher). */
export async function lastLessons(
  db: Db,
  teacherId: string,
  studentIds: string[],
  now: Date,
): Promise<Map<string, Date>> {
  const rows: { student_id: string; at: Date }[] = studentIds.length
    ? await db('lessons')
        .where('teacher_id', teacherId)
        .whereIn('student_id', studentIds)
        .whereNot('status', 'cancelled')
        .where('starts_at', '<=', now)
        .groupBy('student_id')
        .select('student_id', db.raw('max(starts_at) as at'))
    : []
  return new Map(rows.map((r) => [r.student_id, r.at]))
}

/** Answers, accuracy, sessions and practice days (local to `timeZone`) since an instant (or ever). */
export async function practiceSince(
  db: Db,
  studentId: string,
  since: Date | null,
  timeZone: string,
): Promise<Omit<SinceLastLesson, 'lessonAt'>> {
  const row = await db('attempts')
    .where('user_id', studentId)
    .modify((q) => since && q.where('created_at', '>', since))
    .first(
      db.raw('count(*)::int as answers'),
      db.raw('sum(correct::int)::int as correct'),
      db.raw('count(distinct session_id)::int as sessions'),
      db.raw('count(distinct (created_at at time zone ?)::date)::int as days', [timeZone]),
    )
  const answers = Number(row?.answers ?? 0)
  return {
    answers,
    accuracy: answers ? Number(row?.correct ?? 0) / answers : null,
    sessions: Number(row?.sessions ?? 0),
    days: Number(row?.days ?? 0),
  }
}
