// Query shapes of the admin routes.
import { z } from 'zod'

export const MailListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export type MailListQuery = z.infer<typeof MailListQuerySchema>

export const MailIdParamsSchema = z.object({
  id: z.coerce.number().int().positive('Not a valid message id.'),
})

export type { MailMessage, MailSummary } from '../../src/contract/mail-log'
