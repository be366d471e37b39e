// Route parameters and queries of /api/lessons (bodies and answers: src/contract/lessons.ts).
import { z } from 'zod'

export const LessonIdParamsSchema = z.object({ id: z.uuid('Not a valid lesson id.') })
export const LessonNoteParamsSchema = z.object({
  id: z.uuid('Not a valid lesson id.'),
  noteId: z.uuid('Not a valid note id.'),
})
export const LessonListQuerySchema = z.object({
  student: z.uuid('Not a valid student id.').optional(),
})
export const SinceQuerySchema = z.object({ student: z.uuid('Not a valid student id.') })
