// The lesson calendar as iCalendar (RFC 5545) through the `ics` package: one event per lesson that
// is not cancelled, in UTC (each calendar shows it in its owner's zone), with shared notes only.
import { createEvents, type EventAttributes } from 'ics'
import { publicUrl, type Config } from '../config'
import type { Lesson } from '../../src/contract/lessons'

function eventOf(config: Config, lesson: Lesson, viewerIsTeacher: boolean): EventAttributes {
  const shared = lesson.notes.filter((n) => viewerIsTeacher || n.shared)
  return {
    uid: `lesson-${lesson.id}@ambitus`,
    start: Date.parse(lesson.startsAt),
    startInputType: 'utc',
    startOutputType: 'utc',
    duration: { minutes: lesson.durationMinutes },
    title: viewerIsTeacher ? `Lesson: ${lesson.studentName}` : `Lesson with ${lesson.teacherName}`,
    description: shared.map((n) => n.body).join('\n\n') || undefined,
    url: `${publicUrl(config)}/${viewerIsTeacher ? `studio/students/${lesson.studentId}` : 'plans'}`,
    status: 'CONFIRMED',
    productId: 'ambitus/lessons',
    calName: 'Ambitus lessons',
  }
}

/** The calendar text; throws if the library refuses an event (a bug, not user input). */
export function lessonsCalendar(
  config: Config,
  lessons: Lesson[],
  viewerIsTeacher: boolean,
): string {
  const events = lessons
    .filter((l) => l.status !== 'cancelled')
    .map((l) => eventOf(config, l, viewerIsTeacher))
  if (!events.length) return emptyCalendar()
  const { error, value } = createEvents(events)
  if (error || !value) throw error ?? new Error('the calendar could not be written')
  return value
}

// `ics` refuses an empty list; a calendar without events is still valid RFC 5545.
const emptyCalendar = () =>
  [
    'BEGIN:VCALENDAR',
    'VERSION:2.0',
    'PRODID:ambitus/lessons',
    'X-WR-CALNAME:Ambitus lessons',
    'END:VCALENDAR',
    '',
  ].join('\r\n')
