// Plan route parameters (the bodies and answers are in src/contract/plans.ts).
import { z } from 'zod'

export const PlanIdParamsSchema = z.object({ id: z.uuid('Not a valid plan id.') })
export const PlanItemIdParamsSchema = z.object({ id: z.uuid('Not a valid plan item id.') })
export const PlanStudentParamsSchema = z.object({
  id: z.uuid('Not a valid plan id.'),
  studentId: z.uuid('Not a valid student id.'),
})
