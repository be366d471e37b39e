// How lessons read: "Tue 8 Dec, 16:30" in the viewer's time zone, status words, "since" figures.
import type { Lesson, SinceLastLesson } from '@/api/lessons'
import type { LessonStatus } from '@/contract/lessons'
import { dateTimeText } from '@/composables/local-dates'

export const LESSON_STATUS: Record<LessonStatus, { text: string; color?: string }> = {
  scheduled: { text: 'Scheduled' },
  attended: { text: 'Attended', color: 'success' },
  cancelled: { text: 'Cancelled', color: 'error' },
}

export const lessonWhen = (lesson: Lesson) =>
  dateTimeText(lesson.startsAt, {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
  })

/** "34 answers in 3 sessions on 2 days, 82 % right" since the last lesson (or ever). */
export function sinceText(since: SinceLastLesson): string {
  if (!since.answers) return 'No practice yet.'
  const right = since.accuracy === null ? '' : `, ${Math.round(since.accuracy * 100)} % right`
  const s = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`
  return `${s(since.answers, 'answer')} in ${s(since.sessions, 'session')} on ${s(since.days, 'day')}${right}.`
}
