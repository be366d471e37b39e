// Range Runs' contract: a scale from the lowest to the highest note a hand position offers.
import { z } from 'zod'
import { MAX_SHIFTS } from '../../theory'
import { defineDrillContract } from './drill-contract'
import { DetailText, Fret, Length, PlayedDetail, Scale, scaleLabel, Tonic } from './fields'

/** The hand systems a run may be fingered with (the theory core's names). */
export const HAND_SYSTEMS = ['one-finger-per-fret', 'three-fret'] as const

export const RunsSettingsSchema = Length.extend({
  tonic: Tonic,
  scale: Scale,
  lowFret: Fret,
  highFret: Fret,
  maxPerString: z.number().int().min(1).max(8).default(4),
  /** Hand shifts a fingering may use; each widens the position by a fret on either side. */
  shifts: z.number().int().min(0).max(MAX_SHIFTS).default(1),
  /** One finger per fret over four frets, or fingers 1-2-4 over three (low register on bass). */
  handSystem: z.enum(HAND_SYSTEMS).default('one-finger-per-fret'),
  /** Show the chosen fingering's cells on the board while playing (off: from memory). */
  showFingering: z.boolean().default(true),
})
export type RunsSettings = z.infer<typeof RunsSettingsSchema>

/** "no shift", "1 shift", "2 shifts". */
export const describeShifts = (shifts: number) =>
  shifts === 0 ? 'no shift' : `${shifts} shift${shifts === 1 ? '' : 's'}`

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
  describe: (s) =>
    `${s.tonic} ${scaleLabel(s.scale)}, frets ${s.lowFret}–${s.highFret}, ${describeShifts(s.shifts)}`,
})
