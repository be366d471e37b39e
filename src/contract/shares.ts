// Shared exercises: a link that opens one generated exercise (drill, settings, seed or fingering, the
// instrument it was made for) read-only, without an account. The body a sharer sends and the answers.
import { z } from 'zod'
import { DrillPresetSchema, type DrillId, type DrillPreset } from './drills'

/** The drills whose exercises can be shared (the chord-tones drill joins when it lands). */
export const SHAREABLE_DRILLS = [
  'runs',
  'scatter',
  'cycle',
  'chords',
] as const satisfies readonly DrillId[]
/** Links one account may keep open at once (a guard against runaway clients). */
export const MAX_OPEN_SHARES = 200
/** A share token: 22 characters of URL-safe base64 (128 random bits). */
export const ShareTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{22}$/, 'Not a share link.')

export const SharedInstrumentSchema = z.object({
  name: z.string().trim().min(1).max(60, 'Use at most 60 characters.'),
  tuning: z
    .array(z.number().int().min(0).max(127), 'List the open strings as MIDI pitches.')
    .min(1, 'An instrument needs at least one string.')
    .max(10, 'At most 10 strings.'),
  frets: z.number().int().min(1, 'At least 1 fret.').max(30, 'At most 30 frets.'),
})
export type SharedInstrument = z.infer<typeof SharedInstrumentSchema>

type ShareableInput = { drill: (typeof SHAREABLE_DRILLS)[number]; settings: unknown }

/** POST /api/shares: what makes the exercise again (a scatter's seed is in its settings). */
export const ShareCreateSchema = z.object({
  // The drill is checked first, so an unshareable drill is named rather than its settings.
  preset: z
    .object({
      drill: z.enum(SHAREABLE_DRILLS, { error: 'This drill cannot be shared yet.' }),
      settings: z.unknown(),
    })
    .pipe(DrillPresetSchema as unknown as z.ZodType<DrillPreset, ShareableInput>),
  /** Range Runs: the fingering played, "<first string>:<notes per string>" ("0:2-3-3-3"). */
  fingering: z
    .string()
    .regex(/^\d:\d(-\d)*$/, 'Name the fingering as "0:2-3-3-3".')
    .nullable()
    .default(null),
  title: z.string().trim().min(1, 'Give the exercise a title.').max(120, 'At most 120 characters.'),
  instrument: SharedInstrumentSchema,
})
export type ShareCreate = z.infer<typeof ShareCreateSchema>

/** A shared exercise as anyone with the link reads it. */
export interface SharedExercise {
  token: string
  preset: DrillPreset
  fingering: string | null
  title: string
  instrument: SharedInstrument
  /** Who shared it (display name only). */
  sharedBy: string
  createdAt: string
}

/** One of the sharer's own links, with whether it still opens. */
export interface ShareLink extends SharedExercise {
  revokedAt: string | null
}
