// Route parameters and queries of /api/billing (bodies and answers: src/contract/billing.ts).
import { z } from 'zod'

export const StudioParamsSchema = z.object({ studioId: z.uuid('Not a valid studio id.') })
export const IdParamsSchema = z.object({ id: z.uuid('Not a valid id.') })
export const StudentQuerySchema = z.object({
  student: z.uuid('Not a valid student id.').optional(),
})
