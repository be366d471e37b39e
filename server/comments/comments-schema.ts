// Comment route parameters (the body and the comment shape are in src/contract/assignments.ts).
import { z } from 'zod'

export const AssignmentIdParamsSchema = z.object({ id: z.uuid('Not a valid assignment id.') })
export const CommentIdParamsSchema = z.object({
  id: z.uuid('Not a valid assignment id.'),
  commentId: z.uuid('Not a valid comment id.'),
})
