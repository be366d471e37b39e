// Route parameters of /api/messages (bodies and answers: src/contract/messages.ts).
import { z } from 'zod'

export const MessageIdParamsSchema = z.object({ id: z.uuid('Not a valid message id.') })
