// /api/lessons: the lesson schedule, its notes, "since the last lesson" and the calendar file.
import type {
  Lesson,
  LessonCreateInput,
  LessonNoteInput,
  LessonUpdateInput,
  SinceLastLesson,
} from '../contract/lessons'
import { http } from './http'

export type { Lesson, LessonCreateInput, SinceLastLesson }

export const listLessons = (student?: string) =>
  http.get<{ lessons: Lesson[] }>('/lessons', { query: student ? { student } : {} })
export const scheduleLessons = (input: LessonCreateInput) =>
  http.post<{ lessons: Lesson[] }>('/lessons', input)
export const updateLesson = (id: string, change: LessonUpdateInput) =>
  http.patch<{ lesson: Lesson }>(`/lessons/${id}`, change)
export const deleteLesson = (id: string) => http.delete<void>(`/lessons/${id}`)
export const addLessonNote = (id: string, note: LessonNoteInput) =>
  http.post<{ lesson: Lesson }>(`/lessons/${id}/notes`, note)
export const sinceLastLesson = (student: string) =>
  http.get<{ since: SinceLastLesson }>('/lessons/since-last', { query: { student } })

/** The signed-in user's lessons as an iCalendar file (a plain link carries the session cookie). */
export const lessonsCalendarUrl = '/api/lessons/calendar.ics'
