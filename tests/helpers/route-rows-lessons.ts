// Matrix rows for lessons (the teacher's schedule and notes) and share links (made by anyone signed
// in, read by anyone with the token, revoked by whoever made them).
import { LESSON_BODY, SHARE_BODY, type Fixture } from './matrix-fixture'
import { all, get, only, send, signedIn, studentData, teachers, type Row } from './route-row-kit'

const lesson = (f: Fixture) => `/api/lessons/${f.lessonId}`

export const LESSON_ROWS: Record<string, Row> = {
  'GET /api/lessons': [get(() => '/api/lessons'), signedIn(200)],
  'GET /api/lessons/calendar.ics': [get(() => '/api/lessons/calendar.ics'), signedIn(200)],
  'GET /api/lessons/since-last': [
    get((f) => `/api/lessons/since-last?student=${f.users.student.id}`),
    studentData,
  ],
  'POST /api/lessons': [send(() => '/api/lessons', LESSON_BODY), teachers(201)],
  'PATCH /api/lessons/:id': [send(lesson, () => ({ status: 'attended' })), teachers(200)],
  'POST /api/lessons/:id/notes': [
    send(
      (f) => `${lesson(f)}/notes`,
      () => ({ body: 'Matrix note', shared: true }),
    ),
    teachers(201),
  ],
  'DELETE /api/lessons/:id/notes/:noteId': [
    get((f) => `${lesson(f)}/notes/${f.lessonNoteId}`),
    teachers(200),
  ],
  'DELETE /api/lessons/:id': [get((f) => `/api/lessons/${f.lessonToDeleteId}`), teachers(204)],
}

export const SHARE_ROWS: Record<string, Row> = {
  'POST /api/shares': [
    send(
      () => '/api/shares',
      () => SHARE_BODY,
    ),
    signedIn(201),
  ],
  'GET /api/shares': [get(() => '/api/shares'), signedIn(200)],
  'GET /api/shares/:token': [get((f) => `/api/shares/${f.shareToken}`), all(200)],
  'DELETE /api/shares/:token': [
    get((f) => `/api/shares/${f.shareToRevokeToken}`),
    only({ student: 204, admin: 204 }), // an admin may take a link down; revoking twice is fine
  ],
}
