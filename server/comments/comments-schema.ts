// Comment shapes: one thread per assigned plan (teacher and student).
import { z } from 'zod'

export const CommentInputSchema = z.object({
  body: z
    .string()
    .trim()
    .min(1, 'Write a comment first.')
    .max(4000, 'Use at most 4000 characters.'),
})

export const AssignmentIdParamsSchema = z.object({ id: z.uuid('Not a valid assignment id.') })
export const CommentIdParamsSchema = z.object({
  id: z.uuid('Not a valid assignment id.'),
  commentId: z.uuid('Not a valid comment id.'),
})

export interface PlanComment {
  id: string
  assignmentId: string
  author: { id: string; name: string; role: 'teacher' | 'student' }
  body: string
  createdAt: string
}
