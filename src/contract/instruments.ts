// A player's instruments: the settings they choose (POST and PATCH bodies) and what the API returns.
import { z } from 'zod'

export const HANDEDNESS = ['right', 'left'] as const
export const ACCIDENTALS = ['sharp', 'flat'] as const
/** Most instruments one player may keep (a guard against runaway clients, not a plan limit). */
export const MAX_INSTRUMENTS_PER_USER = 20

const REFERENCE_MESSAGE = 'Reference pitch between 400 and 480 Hz.'

// Every field without its default, so the PATCH schema can leave untouched fields undefined.
const FIELDS = {
  name: z
    .string()
    .trim()
    .min(1, 'Give the instrument a name.')
    .max(60, 'Use at most 60 characters.'),
  presetId: z.string().max(40).nullable(),
  tuning: z
    .array(z.number().int().min(0).max(127), 'List the open strings as MIDI pitches.')
    .min(1, 'An instrument needs at least one string.')
    .max(10, 'At most 10 strings.'),
  frets: z.number().int().min(1, 'At least 1 fret.').max(30, 'At most 30 frets.'),
  scaleLengthMm: z
    .number()
    .min(300, 'Scale length is at least 300 mm.')
    .max(1000, 'Scale length is at most 1000 mm.'),
  handedness: z.enum(HANDEDNESS),
  accidentals: z.enum(ACCIDENTALS),
  referenceHz: z.number().min(400, REFERENCE_MESSAGE).max(480, REFERENCE_MESSAGE),
  soundOn: z.boolean(),
  volume: z.number().min(0, 'Volume from 0 to 1.').max(1, 'Volume from 0 to 1.'),
}

/** What a player can set on a saved instrument (POST body; PATCH takes any part of it). */
export const InstrumentInputSchema = z.object({
  ...FIELDS,
  presetId: FIELDS.presetId.default(null),
  handedness: FIELDS.handedness.default('right'),
  accidentals: FIELDS.accidentals.default('flat'),
  referenceHz: FIELDS.referenceHz.default(440),
  soundOn: FIELDS.soundOn.default(true),
  volume: FIELDS.volume.default(0.6),
})
export type InstrumentInput = z.infer<typeof InstrumentInputSchema>

/** PATCH body: any subset of the fields (no defaults, so nothing unsent is reset); unknown keys are refused. */
export const InstrumentPatchSchema = z
  .strictObject(FIELDS)
  .partial()
  .refine((patch) => Object.keys(patch).length > 0, 'Send at least one field to change.')
export type InstrumentPatch = z.infer<typeof InstrumentPatchSchema>

/** A saved instrument as the API returns it. */
export interface Instrument extends InstrumentInput {
  id: string
  isActive: boolean
  createdAt: string
}

/** A tuning preset as GET /api/instruments/presets returns it (the theory core's TUNING_PRESETS). */
export interface InstrumentPreset {
  id: string
  label: string
  instrument: 'bass' | 'guitar'
  notes: string[]
  pitches: number[]
  frets: number
  scaleLengthInches: number
  scaleLengthMm: number
}
