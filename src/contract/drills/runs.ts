// Range Runs' contract: a scale from the lowest to the highest note a hand position offers.
import { z } from 'zod'
import { defineDrillContract } from './drill-contract'
import { DetailText, Fret, Length, PlayedDetail, Scale, scaleLabel, Tonic } from './fields'

export const RunsSettingsSchema = Length.extend({
  tonic: Tonic,
  scale: Scale,
  lowFret: Fret,
  highFret: Fret,
  maxPerString: z.number().int().min(1).max(8).default(4),
  handSpan: z.number().int().min(2).max(8).default(4),
  /** Show the chosen fingering's cells on the board while playing (off: from memory). */
  showFingering: z.boolean().default(true),
})
export type RunsSettings = z.infer<typeof RunsSettingsSchema>

export const RunsDetailSchema = z.strictObject({
  tonic: DetailText,
  scale: DetailText,
  lowFret: Fret,
  highFret: Fret,
  /** `<first string>:<notes per string>`, e.g. "0:2-3-3-3". */
  pattern: DetailText,
  direction: z.enum(['up', 'down']),
  /** The pick was the cell the chosen fingering plays. */
  onFingering: z.boolean().optional(),
  revealed: z.literal(true).optional(),
  ...PlayedDetail,
})

export const runsContract = defineDrillContract({
  id: 'runs',
  name: 'Range Runs',
  settings: RunsSettingsSchema,
  detail: RunsDetailSchema,
  focus: { keys: true, regions: true },
  describe: (s) => `${s.tonic} ${scaleLabel(s.scale)}, frets ${s.lowFret}–${s.highFret}`,
})
