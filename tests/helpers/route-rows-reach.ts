// Matrix rows for reaching students: the account's time zone, messages (a teacher writes, the
// student marks read), invitations several at once and open invitation links.
import { uniqueEmail } from './api'
import { type Fixture } from './matrix-fixture'
import { get, only, send, signedIn, teachers, type Row } from './route-row-kit'

const studio = (f: Fixture) => `/api/studio/studios/${f.studioId}`

export const ACCOUNT_ROWS: Record<string, Row> = {
  'GET /api/account/time-zone': [get(() => '/api/account/time-zone'), signedIn(200)],
  'PUT /api/account/time-zone': [
    send(
      () => '/api/account/time-zone',
      () => ({ timeZone: 'Europe/Tallinn', followsBrowser: true }),
    ),
    signedIn(200),
  ],
  'POST /api/account/time-zone/browser': [
    send(
      () => '/api/account/time-zone/browser',
      () => ({ timeZone: 'Europe/Tallinn' }),
    ),
    signedIn(200),
  ],
}

export const MESSAGE_ROWS: Record<string, Row> = {
  'GET /api/messages': [
    get(() => '/api/messages'),
    only({ student: 200, classmate: 200, outsider: 200, teacher: 200, otherTeacher: 200 }),
  ],
  'POST /api/messages': [
    send(
      () => '/api/messages',
      (f) => ({
        to: { kind: 'students', studentIds: [f.users.student.id] },
        subject: 'Matrix',
        body: 'Matrix says hi',
      }),
    ),
    teachers(201),
  ],
  'POST /api/messages/:id/read': [
    get((f) => `/api/messages/${f.messageId}/read`),
    { ...only({ student: 200 }), classmate: 404, outsider: 404 },
  ],
  'DELETE /api/messages/:id': [get((f) => `/api/messages/${f.messageToDeleteId}`), teachers(204)],
}

export const INVITE_ROWS: Record<string, Row> = {
  'POST /api/studio/studios/:id/invitations/batch': [
    send(
      (f) => `${studio(f)}/invitations/batch`,
      () => ({ emails: [uniqueEmail('matrix-a'), uniqueEmail('matrix-b')], message: 'Welcome!' }),
    ),
    teachers(200),
  ],
  'POST /api/studio/studios/:id/invite-links': [
    send(
      (f) => `${studio(f)}/invite-links`,
      () => ({ maxUses: 5, days: 3 }),
    ),
    teachers(201),
  ],
  'GET /api/studio/invite-links': [get(() => '/api/studio/invite-links'), teachers(200, 200)],
  'DELETE /api/studio/invite-links/:id': [
    get((f) => `/api/studio/invite-links/${f.inviteLinkId}`),
    teachers(200),
  ],
}
