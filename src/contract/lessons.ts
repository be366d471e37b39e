// Lessons: a teacher's schedule with each student (one-off or weekly, in the teacher's time zone),
// notes on a lesson (private to the teacher or shared with the student), and what the student
// practised since the last lesson.
import { z } from 'zod'
import { TimeZoneSchema } from './attempts'

export const LESSON_STATUSES = ['scheduled', 'attended', 'cancelled'] as const
export type LessonStatus = (typeof LESSON_STATUSES)[number]
export const MAX_SERIES_WEEKS = 52

const LocalDate = z.iso.date('Use a date like 2026-01-31.')
const LocalTime = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use a time like 16:30.')
const Minutes = z
  .number('Give the length in minutes.')
  .int('Give whole minutes.')
  .min(5, 'A lesson lasts at least 5 minutes.')
  .max(480, 'A lesson lasts at most 8 hours.')

export const LessonCreateSchema = z.object({
  studentId: z.uuid('Choose a student.'),
  /** The first lesson's local date and time in `timeZone` (the teacher's). */
  date: LocalDate,
  time: LocalTime,
  timeZone: TimeZoneSchema,
  durationMinutes: Minutes.default(45),
  /** 1 = a one-off lesson; more = the same weekday and local time for that many weeks. */
  weeks: z
    .number('Give a number of weeks.')
    .int('Give whole weeks.')
    .min(1, 'At least one lesson.')
    .max(MAX_SERIES_WEEKS, `At most ${MAX_SERIES_WEEKS} weeks at once.`)
    .default(1),
})
export type LessonCreateInput = z.infer<typeof LessonCreateSchema>

export const LessonUpdateSchema = z
  .object({
    status: z.enum(LESSON_STATUSES, 'Choose scheduled, attended or cancelled.').optional(),
    date: LocalDate.optional(),
    time: LocalTime.optional(),
    timeZone: TimeZoneSchema.optional(),
    durationMinutes: Minutes.optional(),
  })
  .refine((v) => (v.date === undefined) === (v.time === undefined), {
    message: 'Give both the date and the time to move a lesson.',
    path: ['time'],
  })
export type LessonUpdateInput = z.infer<typeof LessonUpdateSchema>

export const LessonNoteInputSchema = z.object({
  body: z
    .string()
    .trim()
    .min(1, 'Write the note first.')
    .max(4000, 'Use at most 4,000 characters.'),
  shared: z.boolean('Say whether the student may read it.').default(false),
})
export type LessonNoteInput = z.infer<typeof LessonNoteInputSchema>

export interface LessonNote {
  id: string
  body: string
  /** Shared notes are shown to the student; the others only to the teacher. */
  shared: boolean
  createdAt: string
}

export interface Lesson {
  id: string
  studentId: string
  studentName: string
  teacherName: string
  seriesId: string | null
  startsAt: string
  durationMinutes: number
  timeZone: string
  status: LessonStatus
  notes: LessonNote[]
}

/** What the student practised since their last lesson (all drills and instruments). */
export interface SinceLastLesson {
  lessonAt: string | null
  answers: number
  accuracy: number | null
  sessions: number
  days: number
}
