// Neck Recall's contract: name every cell of a blank region from memory.
import { z } from 'zod'
import { defineDrillContract } from './drill-contract'
import { DetailText, Length, PlayedDetail, Region, Scale, Tonic } from './fields'
import { describeStringSpan, spanOnInstrument, StringSpanSchema } from '../string-span'

export const RecallSettingsSchema = Length.extend({
  region: Region,
  /**
   * A plan's strings counted from the instrument's lowest or highest string; on the student's
   * instrument they replace region.lowString/highString (recallOnInstrument).
   */
  strings: StringSpanSchema.optional(),
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
  describe: ({ region, strings }) =>
    `${strings ? describeStringSpan(strings) : `strings ${region.lowString + 1}–${region.highString + 1} (lowest = 1)`}, frets ${region.lowFret}–${region.highFret}`,
  onInstrument: (settings, tuning) => recallOnInstrument(settings, tuning.length),
})

/**
 * The settings on an instrument with `stringCount` strings: relative strings become the region's
 * string numbers (see spanOnInstrument).
 */
export function recallOnInstrument(settings: RecallSettings, stringCount: number): RecallSettings {
  const { strings, ...rest } = settings
  if (!strings) return settings
  const { lowString, highString } = spanOnInstrument(strings, stringCount)
  return { ...rest, region: { ...rest.region, lowString, highString } }
}
