// Neck Recall's contract: name every cell of a blank region from memory.
import { z } from 'zod'
import { defineDrillContract } from './drill-contract'
import { DetailText, Length, PlayedDetail, Region, Scale, Tonic } from './fields'

export const RecallSettingsSchema = Length.extend({
  region: Region,
  order: z.enum(['sequential', 'random']).default('random'),
  answerMode: z.enum(['typed', 'picked']).default('typed'),
  /** When on, only the spelling used in the key counts (Eb in Bb major, not D#). */
  spellInKey: z.boolean().default(false),
  keyTonic: Tonic.default('C'),
  keyScale: Scale.default('major'),
  focus: z.boolean().default(true),
})
export type RecallSettings = z.infer<typeof RecallSettingsSchema>

export const RecallDetailSchema = z.strictObject({
  /** Why the focus selector asked this cell. */
  focusReason: DetailText.optional(),
  /** "Show me": the answer was revealed. */
  revealed: z.literal(true).optional(),
  ...PlayedDetail,
})

export const recallContract = defineDrillContract({
  id: 'recall',
  name: 'Neck Recall',
  settings: RecallSettingsSchema,
  detail: RecallDetailSchema,
  focus: { keys: false, regions: false },
  describe: ({ region }) =>
    `strings ${region.lowString + 1}–${region.highString + 1} (lowest = 1), frets ${region.lowFret}–${region.highFret}`,
})
