// The rows of the route × role matrix: for each route, what one call sends (ids from the fixture)
// and the status each of the seven callers must get. The fuzz test reuses the paths and bodies.
import { TEST_PASSWORD, uniqueEmail } from './api'
import { attemptInput } from './attempt-input'
import { BASS, freshId, type Fixture } from './matrix-fixture'
import { LESSON_ROWS, SHARE_ROWS } from './route-rows-lessons'
import { ACCOUNT_ROWS, INVITE_ROWS, MESSAGE_ROWS } from './route-rows-reach'
import { RECORDING_ROWS } from './route-rows-recordings'
import {
  all,
  get,
  only,
  send,
  signedIn,
  studentData,
  students,
  teachers,
  type Row,
} from './route-row-kit'
import { planBody, RECALL_ITEM, wavFile } from './studio'

const progress = (what: string, query = '') =>
  get((f) => `/api/progress/${what}?student=${f.users.student.id}${query}`)
const plan = (f: Fixture) => `/api/plans/${f.planId}`
const prices = (f: Fixture) => `/api/billing/studios/${f.studioId}`
const invoice = (id: (b: Fixture['billing']) => string) => (f: Fixture) =>
  `/api/billing/invoices/${id(f.billing)}`

// Billing: a studio's money is its teacher's; a student reads and pays only their own invoices;
// admins get totals only. The webhook answers everyone without a valid signature with 400.
const BILLING_ROWS: Record<string, Row> = {
  'POST /api/billing/webhook': [
    send(
      () => '/api/billing/webhook',
      () => ({ id: 'evt_x' }),
    ),
    all(400),
  ],
  'GET /api/billing/studios/:studioId': [get(prices), teachers(200)],
  'PUT /api/billing/studios/:studioId': [
    send(prices, () => ({
      currency: 'EUR',
      paymentDays: 14,
      prices: [{ durationMinutes: 45, amountMinor: 4500 }],
    })),
    teachers(200),
  ],
  'POST /api/billing/studios/:studioId/packages': [
    send(
      (f) => `${prices(f)}/packages`,
      () => ({ name: 'Four', lessons: 4, validWeeks: 6, amountMinor: 18000 }),
    ),
    teachers(201),
  ],
  'DELETE /api/billing/packages/:id': [
    get((f) => `/api/billing/packages/${f.billing.packageToRetireId}`),
    teachers(204),
  ],
  'GET /api/billing/invoices': [
    get(() => '/api/billing/invoices'),
    { ...signedIn(200), admin: 403 },
  ],
  'POST /api/billing/invoices': [
    send(
      () => '/api/billing/invoices',
      (f) => ({ studentId: f.users.student.id, packageId: f.billing.packageId }),
    ),
    teachers(201),
  ],
  'POST /api/billing/invoices/:id/issue': [
    get((f) => `${invoice((b) => b.draftInvoiceId)(f)}/issue`),
    teachers(200),
  ],
  'POST /api/billing/invoices/:id/void': [
    get((f) => `${invoice((b) => b.invoiceToVoidId)(f)}/void`),
    teachers(200),
  ],
  'POST /api/billing/invoices/:id/refund': [
    get((f) => `${invoice((b) => b.openInvoiceId)(f)}/refund`),
    teachers(409), // open, not paid: nothing to refund
  ],
  'GET /api/billing/invoices/:id/pdf': [
    get((f) => `${invoice((b) => b.openInvoiceId)(f)}/pdf`),
    only({ student: 200, teacher: 200 }),
  ],
  'POST /api/billing/invoices/:id/checkout': [
    get((f) => `${invoice((b) => b.openInvoiceId)(f)}/checkout`),
    only({ student: 200 }),
  ],
  'DELETE /api/billing/invoices/:id': [get(invoice((b) => b.draftToDeleteId)), teachers(204)],
  'GET /api/billing/ledger': [
    get((f) => `/api/billing/ledger?student=${f.users.student.id}`),
    only({ student: 200, teacher: 200 }),
  ],
  'GET /api/billing/totals': [get(() => '/api/billing/totals'), only({ admin: 200 })],
}
const assignment = (f: Fixture) => `/api/assignments/${f.assignmentId}`

// Rows run in this order; within a row the callers who succeed go last, so a delete is refused to
// everyone else before it succeeds.
export type { Expected, Row, Send } from './route-row-kit'

export const ROWS: Record<string, Row> = {
  'GET /api/health': [get(() => '/api/health'), all(200)],
  'POST /api/auth/register': [
    send(
      () => '/api/auth/register',
      () => ({
        email: uniqueEmail('matrix-new'),
        password: TEST_PASSWORD,
        name: 'New',
        role: 'student',
      }),
    ),
    all(201),
  ],
  'POST /api/auth/login': [
    send(
      () => '/api/auth/login',
      (f) => ({ email: f.users.classmate.email, password: TEST_PASSWORD }),
    ),
    all(200),
  ],
  'POST /api/auth/logout': [get(() => '/api/auth/logout'), all(204)],
  'POST /api/auth/logout-everywhere': [get(() => '/api/auth/logout-everywhere'), signedIn(204)],
  'GET /api/auth/me': [get(() => '/api/auth/me'), signedIn(200)],
  'POST /api/auth/password': [
    send(
      () => '/api/auth/password',
      () => ({ currentPassword: TEST_PASSWORD, newPassword: TEST_PASSWORD }),
    ),
    signedIn(204),
  ],
  'POST /api/auth/password-reset': [
    send(
      () => '/api/auth/password-reset',
      () => ({ email: uniqueEmail('nobody') }),
    ),
    all(202),
  ],
  'POST /api/auth/password-reset/confirm': [
    send(
      () => '/api/auth/password-reset/confirm',
      () => ({ token: 'x'.repeat(43), password: TEST_PASSWORD }),
    ),
    all(400),
  ],
  'GET /api/admin/users': [get(() => '/api/admin/users'), only({ admin: 200 })],
  'PATCH /api/admin/users/:id': [
    send(
      (f) => `/api/admin/users/${f.targetUserId}`,
      () => ({ disabled: false }),
    ),
    only({ admin: 200 }),
  ],
  'GET /api/admin/mail': [get(() => '/api/admin/mail'), only({ admin: 200 })],
  'GET /api/admin/mail/:id': [get((f) => `/api/admin/mail/${f.mailId}`), only({ admin: 200 })],
  'POST /api/admin/digests/send': [get(() => '/api/admin/digests/send'), only({ admin: 200 })],
  'GET /api/instruments/presets': [get(() => '/api/instruments/presets'), signedIn(200)],
  'GET /api/instruments': [get(() => '/api/instruments'), signedIn(200)],
  'POST /api/instruments': [
    send(
      () => '/api/instruments',
      () => BASS,
    ),
    signedIn(201),
  ],
  'PATCH /api/instruments/:id': [
    send(
      (f) => `/api/instruments/${f.instrumentId}`,
      () => ({ volume: 0.4 }),
    ),
    only({ student: 200 }, 404),
  ],
  'POST /api/instruments/:id/activate': [
    get((f) => `/api/instruments/${f.instrumentId}/activate`),
    only({ student: 200 }, 404),
  ],
  'POST /api/attempts': [
    send(
      () => '/api/attempts',
      () => ({ attempts: [attemptInput({ id: freshId() })] }),
    ),
    signedIn(201),
  ],
  'GET /api/focus': [get(() => '/api/focus?drill=recall&n=4'), signedIn(200)],
  'GET /api/progress/summary': [progress('summary'), studentData],
  'GET /api/progress/positions': [progress('positions'), studentData],
  'GET /api/progress/notes': [progress('notes'), studentData],
  'GET /api/progress/timeline': [progress('timeline'), studentData],
  'GET /api/progress/fingerings': [
    progress('fingerings', '&tonic=G&scale=major&lowFret=2&highFret=5'),
    studentData,
  ],
  'GET /api/worksheets/neck.pdf': [get(() => '/api/worksheets/neck.pdf'), signedIn(200)],
  'GET /api/worksheets/cycle.pdf': [get(() => '/api/worksheets/cycle.pdf'), signedIn(200)],
  'GET /api/worksheets/scatter.pdf': [get(() => '/api/worksheets/scatter.pdf'), signedIn(200)],
  'GET /api/worksheets/runs.pdf': [get(() => '/api/worksheets/runs.pdf'), signedIn(200)],
  'GET /api/worksheets/chords.pdf': [get(() => '/api/worksheets/chords.pdf'), signedIn(200)],
  'GET /api/progress/chords': [progress('chords'), studentData],
  'GET /api/progress/tempos': [progress('tempos'), studentData],
  'GET /api/progress/cycle-position': [progress('cycle-position', '&scale=major'), studentData],
  ...SHARE_ROWS,
  ...LESSON_ROWS,
  ...ACCOUNT_ROWS,
  ...MESSAGE_ROWS,
  ...INVITE_ROWS,
  ...BILLING_ROWS,
  ...RECORDING_ROWS,
  'GET /api/studio/studios': [get(() => '/api/studio/studios'), teachers(200, 200)],
  'POST /api/studio/studios': [
    send(
      () => '/api/studio/studios',
      () => ({ name: 'Another room' }),
    ),
    teachers(201, 201),
  ],
  'PATCH /api/studio/studios/:id': [
    send(
      (f) => `/api/studio/studios/${f.studioId}`,
      () => ({ name: 'Renamed room' }),
    ),
    teachers(200),
  ],
  'POST /api/studio/studios/:id/invitations': [
    send(
      (f) => `/api/studio/studios/${f.studioId}/invitations`,
      () => ({ email: uniqueEmail('matrix') }),
    ),
    teachers(201),
  ],
  'GET /api/studio/invitations': [get(() => '/api/studio/invitations'), teachers(200, 200)],
  'POST /api/studio/invitations/:id/resend': [
    get((f) => `/api/studio/invitations/${f.invitationId}/resend`),
    teachers(200),
  ],
  'GET /api/invitations/preview': [
    get((f) => `/api/invitations/preview?token=${f.token}`),
    all(200),
  ],
  // Bound to the invited address (none of the cast): signed-in callers are refused, anonymous
  // callers are asked for the new account's name and password.
  'POST /api/invitations/accept': [
    send(
      () => '/api/invitations/accept',
      (f) => ({ token: f.token }),
    ),
    { ...all(403), anonymous: 400 },
  ],
  'GET /api/studio/students': [get(() => '/api/studio/students'), teachers(200, 200)],
  'GET /api/studio/students/:id': [
    get((f) => `/api/studio/students/${f.users.student.id}`),
    teachers(200),
  ],
  'GET /api/studio/students/:id/assignments': [
    get((f) => `/api/studio/students/${f.users.student.id}/assignments`),
    teachers(200),
  ],
  'GET /api/studio/students/:id/results.csv': [
    get((f) => `/api/studio/students/${f.users.student.id}/results.csv`),
    teachers(200),
  ],
  'GET /api/studio/roster': [get(() => '/api/studio/roster'), teachers(200, 200)],
  'GET /api/studio/roster.csv': [get(() => '/api/studio/roster.csv'), teachers(200, 200)],
  'GET /api/studio/memberships': [get(() => '/api/studio/memberships'), students(200)],
  'GET /api/plans': [get(() => '/api/plans'), teachers(200, 200)],
  'GET /api/plans/starters': [get(() => '/api/plans/starters'), teachers(200, 200)],
  'GET /api/plans/assigned': [get(() => '/api/plans/assigned'), students(200)],
  'POST /api/plans': [
    send(
      () => '/api/plans',
      () => planBody(),
    ),
    teachers(201, 201),
  ],
  'GET /api/plans/:id': [get(plan), teachers(200)],
  'PUT /api/plans/:id': [
    send(plan, (f) => planBody({ items: [{ ...RECALL_ITEM, id: f.itemId }] })),
    teachers(200),
  ],
  'POST /api/plans/:id/copy': [get((f) => `${plan(f)}/copy`), teachers(201)],
  'POST /api/plans/:id/assignments': [
    send(
      (f) => `${plan(f)}/assignments`,
      (f) => ({ studentIds: [f.users.student.id] }),
    ),
    teachers(200),
  ],
  'GET /api/plans/items/:id': [
    get((f) => `/api/plans/items/${f.itemId}`),
    only({ student: 200, teacher: 200 }),
  ],
  'GET /api/assignments/:id/comments': [
    get((f) => `${assignment(f)}/comments`),
    only({ student: 200, teacher: 200 }),
  ],
  'POST /api/assignments/:id/comments': [
    send(
      (f) => `${assignment(f)}/comments`,
      () => ({ body: 'Matrix says hi' }),
    ),
    only({ student: 201, teacher: 201 }),
  ],
  'POST /api/assignments/:id/recordings': [
    (f) => ({
      path: `${assignment(f)}/recordings`,
      form: (t) => t.field('planItemId', f.itemId).attach('file', wavFile(200), 'take.wav'),
    }),
    only({ student: 201 }),
  ],
  'GET /api/assignments/:id/recordings/:recordingId/audio': [
    get((f) => `${assignment(f)}/recordings/${f.recordingId}/audio`),
    only({ student: 200, teacher: 200 }),
  ],
  // The deletes: each removes its own row, refused to everyone before the one allowed.
  'DELETE /api/assignments/:id/comments/:commentId': [
    get((f) => `${assignment(f)}/comments/${f.commentId}`),
    only({ student: 204 }),
  ],
  'DELETE /api/assignments/:id/recordings/:recordingId': [
    get((f) => `${assignment(f)}/recordings/${f.recordingToDeleteId}`),
    only({ student: 204 }),
  ],
  'DELETE /api/plans/:id/assignments/:studentId': [
    get((f) => `${plan(f)}/assignments/${f.extraId}`),
    teachers(200),
  ],
  'DELETE /api/plans/:id': [get((f) => `/api/plans/${f.planToDeleteId}`), teachers(204)],
  'DELETE /api/studio/invitations/:id': [
    get((f) => `/api/studio/invitations/${f.invitationToRevokeId}`),
    teachers(200),
  ],
  'DELETE /api/studio/studios/:id/students/:studentId': [
    get((f) => `/api/studio/studios/${f.studioId}/students/${f.removableId}`),
    teachers(204),
  ],
  'DELETE /api/studio/studios/:id': [
    get((f) => `/api/studio/studios/${f.emptyStudioId}`),
    teachers(204),
  ],
  'DELETE /api/studio/memberships/:id': [
    get((f) => `/api/studio/memberships/${f.leavableStudioId}`),
    { ...students(404), student: 204 },
  ],
  'DELETE /api/instruments/:id': [
    get((f) => `/api/instruments/${f.instrumentId}`),
    only({ student: 204 }, 404),
  ],
}
