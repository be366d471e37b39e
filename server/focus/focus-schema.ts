// Focus API query (zod); the answer is in src/contract/focus.ts.
import { z } from 'zod'
import { DrillIdSchema } from '../../src/contract/drills'
import { scaleTypeName } from '../../src/theory'

const Count = (max: number, what: string) =>
  z.coerce.number(`Use a ${what} number.`).int(`Use a whole ${what} number.`).min(0).max(max)
const knownScale = (s: string) => {
  try {
    scaleTypeName(s)
    return true
  } catch {
    return false
  }
}

export const FocusQuerySchema = z
  .strictObject({
    drill: DrillIdSchema,
    instrument: z.uuid('Not a valid instrument id.').optional(),
    n: z.coerce
      .number('Ask for 1 to 100 questions.')
      .int()
      .min(1, 'Ask for 1 to 100 questions.')
      .max(100, 'Ask for 1 to 100 questions.')
      .default(24),
    lowString: Count(9, 'string').optional(),
    highString: Count(9, 'string').optional(),
    lowFret: Count(30, 'fret').optional(),
    highFret: Count(30, 'fret').optional(),
    /** Scale whose keys are ranked for runs, scatter and cycle (default major). */
    scale: z
      .string()
      .max(40)
      .refine(knownScale, 'Choose a known scale.')
      .transform((s) => scaleTypeName(s))
      .default('major'),
    /** Makes the draw reproducible (tests, simulations); random otherwise. */
    seed: z.coerce.number().int().min(0).max(4294967295).optional(),
  })
  .refine(
    (q) => q.lowString === undefined || q.highString === undefined || q.lowString <= q.highString,
    {
      path: ['highString'],
      message: 'The highest string is below the lowest.',
    },
  )
  .refine((q) => q.lowFret === undefined || q.highFret === undefined || q.lowFret <= q.highFret, {
    path: ['highFret'],
    message: 'The region ends before it starts.',
  })
export type FocusQuery = z.infer<typeof FocusQuerySchema>
