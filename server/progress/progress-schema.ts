// Progress API queries (zod, validated at the boundary); the answers are in src/contract/progress.ts.
import { z } from 'zod'
import { DrillIdSchema } from '../../src/contract/drills'
import { scaleTypeName, tonicName } from '../../src/theory'

/** Longest date range one timeline request may cover. */
export const MAX_RANGE_DAYS = 800
const DAY_MS = 24 * 3600 * 1000

const accepts = (check: (v: string) => unknown) => (value: string) => {
  try {
    check(value)
    return true
  } catch {
    return false
  }
}

const Day = z.iso.date('Use a date like 2026-03-01.')
const Fret = z.coerce.number('Use a fret number.').int('Use a whole fret number.').min(0).max(30)

/** Whose data, which instrument, which drill: every progress read takes these. */
export const ProgressScopeSchema = z.strictObject({
  student: z.uuid('Not a valid student id.').optional(),
  instrument: z.uuid('Not a valid instrument id.').optional(),
  drill: DrillIdSchema.optional(),
})

export const RangeQuerySchema = ProgressScopeSchema.extend({
  from: Day.optional(),
  to: Day.optional(),
})
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ['to'],
    message: 'The range ends before it starts.',
  })
  .refine(
    (q) => !q.from || !q.to || (Date.parse(q.to) - Date.parse(q.from)) / DAY_MS <= MAX_RANGE_DAYS,
    {
      path: ['from'],
      message: `Choose at most ${MAX_RANGE_DAYS} days.`,
    },
  )
export type ProgressScope = z.infer<typeof ProgressScopeSchema>
export type RangeQuery = z.infer<typeof RangeQuerySchema>

export const FingeringsQuerySchema = z
  .strictObject({
    student: z.uuid('Not a valid student id.').optional(),
    instrument: z.uuid('Not a valid instrument id.').optional(),
    tonic: z
      .string()
      .max(8)
      .refine(accepts(tonicName), 'Choose one of the 18 key tonics.')
      .transform((t) => tonicName(t)),
    scale: z
      .string()
      .max(40)
      .refine(accepts(scaleTypeName), 'Choose a known scale.')
      .transform((s) => scaleTypeName(s)),
    lowFret: Fret,
    highFret: Fret,
  })
  .refine((q) => q.lowFret <= q.highFret, {
    path: ['highFret'],
    message: 'The region ends before it starts.',
  })
export type FingeringsQuery = z.infer<typeof FingeringsQuerySchema>

/** GET /progress/cycle-position: a scale, and the plan item being practised (if any). */
export const CyclePositionQuerySchema = z.strictObject({
  student: z.uuid('Not a valid student id.').optional(),
  scale: z
    .string()
    .max(40)
    .refine(accepts(scaleTypeName), 'Choose a known scale.')
    .transform((s) => scaleTypeName(s)),
  planItem: z.uuid('Not a valid plan item id.').optional(),
})
export type CyclePositionQuery = z.infer<typeof CyclePositionQuerySchema>
/** Whose Chord Tones figures, on which instrument (default: every instrument). */
export const ChordTonesQuerySchema = z.strictObject({
  student: z.uuid('Not a valid student id.').optional(),
  instrument: z.uuid('Not a valid instrument id.').optional(),
})
export type ChordTonesQuery = z.infer<typeof ChordTonesQuerySchema>
