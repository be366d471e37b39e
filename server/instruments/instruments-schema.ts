// Instrument route parameters (the bodies and answers are in src/contract/instruments.ts).
import { z } from 'zod'

export const InstrumentIdParamsSchema = z.object({ id: z.uuid('Not a valid instrument id.') })
