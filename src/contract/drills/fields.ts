// Setting fields several drills share: a key tonic, a scale, a pitch, a fret, a region of the neck
// and how long a session lasts. Every new field gets a default, so saved plans stay valid.
import { z } from 'zod'
import { SCALE_TYPES, TONICS } from '../../theory'

export const Tonic = z
  .string()
  .refine((t) => TONICS.includes(t), 'Choose one of the 18 key tonics (C, G, D … A#).')
export const Scale = z
  .string()
  .refine((s) => SCALE_TYPES.some((t) => t.name === s), 'Choose a known scale.')
export const Pitch = z.number().int().min(0).max(127)
export const Fret = z.number().int().min(0).max(30)

/** How long a session lasts: a number of questions, or minutes (whichever the drill honours first). */
export const Length = z.object({
  questionCount: z.number().int().min(1).max(500).nullable().default(24),
  timeLimitMinutes: z.number().int().min(1).max(60).nullable().default(null),
})
export type SessionLength = z.infer<typeof Length>

export const Region = z
  .object({
    lowString: z.number().int().min(0).max(9),
    highString: z.number().int().min(0).max(9),
    lowFret: Fret,
    highFret: Fret,
  })
  .refine(
    (r) => r.lowString <= r.highString && r.lowFret <= r.highFret,
    'The region ends before it starts.',
  )

/** Short text in an attempt's detail (the attempts API stores at most 64 characters). */
export const DetailText = z.string().max(64)

/** "12 questions, 5 min": the length part of a preset's description ('' when open-ended). */
export function describeLength(length: SessionLength): string {
  const parts = []
  if (length.questionCount !== null) parts.push(`${length.questionCount} questions`)
  if (length.timeLimitMinutes !== null) parts.push(`${length.timeLimitMinutes} min`)
  return parts.join(', ')
}

/** The scale's label as it reads mid-sentence: "natural minor (Aeolian)". */
export function scaleLabel(scale: string): string {
  const label = SCALE_TYPES.find((s) => s.name === scale)?.label ?? scale
  return `${label.charAt(0).toLowerCase()}${label.slice(1)}`
}

/**
 * What an answer played on the instrument adds to any drill's detail: that it was played, the
 * click's tempo, the onset against the beat (ms, negative early), the spread of the take's note
 * gaps, and — on every note of a clean take — the tempo it was clean at, with the settings named.
 */
export const PlayedDetail = {
  played: z.literal(true).optional(),
  tempo: z.number().int().min(20).max(400).optional(),
  beatMs: z.number().int().min(-5000).max(5000).optional(),
  spreadMs: z.number().int().min(0).max(60_000).optional(),
  cleanTempo: z.number().int().min(20).max(400).optional(),
  playedSettings: DetailText.optional(),
}
