// Matrix rows for recordings worth reviewing: free takes (a student's own, shared with their
// teacher), reference takes (teachers), titles, audio and comments pinned to a moment.
import { type Fixture } from './matrix-fixture'
import { get, only, send, students, type Row } from './route-row-kit'
import { wavFile } from './studio'

const take = (f: Fixture) => `/api/recordings/${f.freeTakeId}`
/** Students and teachers (each of their own recordings); admins see none of them. */
const players = (status: number) =>
  only({ ...students(status), teacher: status, otherTeacher: status })

export const RECORDING_ROWS: Record<string, Row> = {
  'GET /api/recordings': [get(() => '/api/recordings'), players(200)],
  'GET /api/recordings/teachers': [get(() => '/api/recordings/teachers'), students(200)],
  'POST /api/recordings': [
    () => ({
      path: '/api/recordings',
      form: (t) => t.field('title', 'Matrix take').attach('file', wavFile(200), 'take.wav'),
    }),
    students(201),
  ],
  'POST /api/recordings/references': [
    (f) => ({
      path: '/api/recordings/references',
      form: (t) =>
        t.field('studentId', f.users.student.id).attach('file', wavFile(200), 'reference.wav'),
    }),
    only({ teacher: 201 }),
  ],
  'PATCH /api/recordings/:id': [
    send(take, () => ({ title: 'Matrix title' })),
    only({ student: 200, teacher: 200 }),
  ],
  'GET /api/recordings/:id/audio': [
    get((f) => `${take(f)}/audio`),
    only({ student: 200, teacher: 200 }),
  ],
  'GET /api/recordings/:id/comments': [
    get((f) => `${take(f)}/comments`),
    only({ student: 200, teacher: 200 }),
  ],
  'POST /api/recordings/:id/comments': [
    send(
      (f) => `${take(f)}/comments`,
      () => ({ atMs: 10, body: 'Matrix pin' }),
    ),
    only({ student: 201, teacher: 201 }),
  ],
  // The deletes: each removes its own row, refused to everyone before the one allowed.
  'DELETE /api/recordings/:id/comments/:commentId': [
    get((f) => `${take(f)}/comments/${f.pinnedCommentId}`),
    only({ student: 204 }),
  ],
  'DELETE /api/recordings/:id': [
    get((f) => `/api/recordings/${f.freeTakeToDeleteId}`),
    only({ student: 204 }),
  ],
}
