// Pitch Hunt's contract: hear a pitch and find where it lives, in the right octave.
import { z } from 'zod'
import { defineDrillContract } from './drill-contract'
import { DetailText, Fret, Length, PlayedDetail } from './fields'

export const HuntSettingsSchema = Length.extend({
  showName: z.boolean().default(false),
  findAll: z.boolean().default(false),
  /** Lowest and highest fret the hunted pitches are drawn from (within the instrument). */
  lowFret: Fret.default(0),
  highFret: Fret.default(12),
  focus: z.boolean().default(true),
})
export type HuntSettings = z.infer<typeof HuntSettingsSchema>

const Count = z.number().int().min(0)

export const HuntDetailSchema = z.strictObject({
  focusReason: DetailText.optional(),
  /** "Find every place": how many places were found so far, of how many. */
  findAll: z.literal(true).optional(),
  found: Count.optional(),
  places: Count.optional(),
  revealed: z.literal(true).optional(),
  ...PlayedDetail,
})

export const huntContract = defineDrillContract({
  id: 'hunt',
  name: 'Pitch Hunt',
  settings: HuntSettingsSchema,
  detail: HuntDetailSchema,
  focus: { keys: false, regions: false },
  describe: (s) => `frets ${s.lowFret}–${s.highFret}${s.findAll ? ', find every place' : ''}`,
})
