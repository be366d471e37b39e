// Route parameters, queries and multipart fields of /api/recordings (JSON bodies and answers:
// src/contract/recordings.ts). Upload limits: free takes per student, references per teacher.
import { z } from 'zod'
import { RecordingTitleSchema } from '../../src/contract/recordings'
import { TakeLengthSchema } from '../assignments/assignments-schema'

export const MAX_FREE_TAKES = 100
export const MAX_REFERENCES = 200

export const RecordingIdParamsSchema = z.object({ id: z.uuid('Not a valid recording id.') })
export const PinnedCommentParamsSchema = z.object({
  id: z.uuid('Not a valid recording id.'),
  commentId: z.uuid('Not a valid comment id.'),
})
export const RecordingListQuerySchema = z.object({
  student: z.uuid('Not a valid student id.').optional(),
})

/** A student's free take: a title, the browser's length, and the teacher to share it with. */
export const TakeFieldsSchema = z.object({
  title: RecordingTitleSchema.optional(),
  durationMs: TakeLengthSchema,
  shareWith: z.uuid('Choose one of your teachers.').optional(),
})

/** A teacher's reference take: on an item of one of their plans, or for one of their students. */
export const ReferenceFieldsSchema = z
  .object({
    title: RecordingTitleSchema.optional(),
    durationMs: TakeLengthSchema,
    planItemId: z.uuid('Not a valid plan item id.').optional(),
    studentId: z.uuid('Not a valid student id.').optional(),
  })
  .refine((f) => (f.planItemId === undefined) !== (f.studentId === undefined), {
    message: 'Choose a plan item or a student for the reference take (one of them).',
    path: ['planItemId'],
  })
export type ReferenceFields = z.infer<typeof ReferenceFieldsSchema>
