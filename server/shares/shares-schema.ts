// Route parameters of /api/shares (the body and answers are in src/contract/shares.ts).
import { z } from 'zod'
import { ShareTokenSchema } from '../../src/contract/shares'

export const ShareParamsSchema = z.object({ token: ShareTokenSchema })
