// Studio inputs: a studio's name and the route parameters (answers: src/contract/studios.ts).
import { z } from 'zod'

export const StudioInputSchema = z.object({
  name: z.string().trim().min(1, 'Give the studio a name.').max(80, 'Use at most 80 characters.'),
})

export const StudioIdParamsSchema = z.object({ id: z.uuid('Not a valid studio id.') })
export const StudioStudentParamsSchema = z.object({
  id: z.uuid('Not a valid studio id.'),
  studentId: z.uuid('Not a valid student id.'),
})
