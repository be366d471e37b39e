// Messages: a teacher writes to one student, a group of chosen students or a whole studio, in the
// app and (unless turned off) by e-mail; each recipient's read state is shown to the teacher.
import { z } from 'zod'

export const MESSAGE_SUBJECT_MAX = 120
export const MESSAGE_BODY_MAX = 4000
export const MESSAGE_GROUP_MAX = 200

const To = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({
      kind: z.literal('students'),
      studentIds: z
        .array(z.uuid('Not a valid student id.'))
        .min(1, 'Choose at least one student.')
        .max(MESSAGE_GROUP_MAX, `At most ${MESSAGE_GROUP_MAX} students at once.`),
    }),
    z.strictObject({ kind: z.literal('studio'), studioId: z.uuid('Choose a studio.') }),
  ],
  'Choose the students or the studio to write to.',
)

export const MessageCreateSchema = z.strictObject({
  to: To,
  subject: z
    .string('Give the message a subject.')
    .trim()
    .min(1, 'Give the message a subject.')
    .max(MESSAGE_SUBJECT_MAX, `Use at most ${MESSAGE_SUBJECT_MAX} characters.`),
  body: z
    .string('Write the message first.')
    .trim()
    .min(1, 'Write the message first.')
    .max(MESSAGE_BODY_MAX, `Use at most ${MESSAGE_BODY_MAX.toLocaleString('en')} characters.`),
  /** Also send it by e-mail (default); the app always shows it. */
  email: z.boolean('Say whether to send it by e-mail too.').default(true),
})
export type MessageCreateInput = z.input<typeof MessageCreateSchema>
export type MessageCreate = z.infer<typeof MessageCreateSchema>

/** One recipient of a sent message and when they read it (null: not yet). */
export interface MessageRecipient {
  studentId: string
  name: string
  readAt: string | null
}

/** A message as its teacher sees it: who it went to and who has read it. */
export interface SentMessage {
  id: string
  subject: string
  body: string
  /** "Whole studio: Cedar Hollow" or the students' names. */
  audience: 'students' | 'studio'
  studioName: string | null
  emailed: boolean
  createdAt: string
  recipients: MessageRecipient[]
}

/** A message as a student sees it. */
export interface ReceivedMessage {
  id: string
  subject: string
  body: string
  teacherName: string
  studioName: string | null
  createdAt: string
  readAt: string | null
}
