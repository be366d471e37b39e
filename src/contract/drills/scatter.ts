// Octave Scatter's contract: a scale whose notes jump octaves, found at their exact pitch.
import { z } from 'zod'
import { DEFAULT_MAX_LEAP, pitchName } from '../../theory'
import { defineDrillContract } from './drill-contract'
import { DetailText, Length, Pitch, PlayedDetail, Scale, scaleLabel, Tonic } from './fields'

export const ScatterSettingsSchema = Length.extend({
  tonic: Tonic,
  scale: Scale,
  /** Pitch window for the displaced notes; null = the instrument's whole range. */
  low: Pitch.nullable().default(null),
  high: Pitch.nullable().default(null),
  minDisplaced: z.number().int().min(0).max(12).default(2),
  /** Largest leap between neighbouring notes (semitones); plans saved with none get the default. */
  maxLeap: z
    .number()
    .int()
    .min(1)
    .max(48)
    .nullable()
    .default(DEFAULT_MAX_LEAP)
    .transform((leap) => leap ?? DEFAULT_MAX_LEAP),
  /** `each-moved`: every note in a different octave from a plain step up from the one before. */
  placement: z.enum(['any', 'each-moved']).default('any'),
  seed: z.number().int().nullable().default(null),
})
export type ScatterSettings = z.infer<typeof ScatterSettingsSchema>

export const ScatterDetailSchema = z.strictObject({
  tonic: DetailText,
  scale: DetailText,
  /** The sequence's seed: the same seed replays the same notes. */
  seed: z.number().int(),
  index: z.number().int().min(0),
  /** The note was moved to another octave. */
  displaced: z.boolean().optional(),
  revealed: z.literal(true).optional(),
  ...PlayedDetail,
})

const windowText = (low: number | null, high: number | null) =>
  low !== null && high !== null ? `, ${pitchName(low, 'flat')}–${pitchName(high, 'flat')}` : ''

export const scatterContract = defineDrillContract({
  id: 'scatter',
  name: 'Octave Scatter',
  settings: ScatterSettingsSchema,
  detail: ScatterDetailSchema,
  focus: { keys: true, regions: false },
  describe: (s) => `${s.tonic} ${scaleLabel(s.scale)}${windowText(s.low, s.high)}`,
})
