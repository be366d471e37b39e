// The five drills, their settings and the targets a teacher can set: one zod contract shared by the
// drill views (client), practice plans (server) and attempts (server). Pure: zod and the theory core only.
import { z } from 'zod'
import { SCALE_TYPES, TONICS } from '../theory'

export const DRILL_IDS = ['recall', 'hunt', 'runs', 'scatter', 'cycle'] as const
export const DrillIdSchema = z.enum(DRILL_IDS)
export type DrillId = z.infer<typeof DrillIdSchema>

/** Display names and the one-line reason each drill helps (shown on the practice page). */
export const DRILLS: Record<DrillId, { name: string; route: string; why: string }> = {
  recall: {
    name: 'Neck Recall',
    route: '/practice/recall',
    why: 'Name every note of a blank stretch of neck from memory, so you stop counting up from the open string.',
  },
  hunt: {
    name: 'Pitch Hunt',
    route: '/practice/hunt',
    why: 'Hear a pitch and find where it lives in the right octave, linking sound to place.',
  },
  runs: {
    name: 'Range Runs',
    route: '/practice/runs',
    why: 'Play a scale from the lowest to the highest note a hand position offers, through every string combination.',
  },
  scatter: {
    name: 'Octave Scatter',
    route: '/practice/scatter',
    why: 'Play a scale whose notes jump octaves, so every note is known all over the neck, not in one box.',
  },
  cycle: {
    name: 'Window Cycle',
    route: '/practice/cycle',
    why: 'Play every key of a cycle inside a fixed low/high window, folding notes back when they leave it.',
  },
}

const Tonic = z
  .string()
  .refine((t) => TONICS.includes(t), 'Choose one of the 18 key tonics (C, G, D … A#).')
const Scale = z
  .string()
  .refine((s) => SCALE_TYPES.some((t) => t.name === s), 'Choose a known scale.')
const Pitch = z.number().int().min(0).max(127)
const Fret = z.number().int().min(0).max(30)

/** How long a session lasts: a number of questions, or minutes (whichever the drill honours first). */
const Length = z.object({
  questionCount: z.number().int().min(1).max(500).nullable().default(24),
  timeLimitMinutes: z.number().int().min(1).max(60).nullable().default(null),
})

const Region = z
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

export const HuntSettingsSchema = Length.extend({
  showName: z.boolean().default(false),
  findAll: z.boolean().default(false),
  /** Lowest and highest fret the hunted pitches are drawn from (within the instrument). */
  lowFret: Fret.default(0),
  highFret: Fret.default(12),
  focus: z.boolean().default(true),
})

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

export const ScatterSettingsSchema = Length.extend({
  tonic: Tonic,
  scale: Scale,
  /** Pitch window for the displaced notes; null = the instrument's whole range. */
  low: Pitch.nullable().default(null),
  high: Pitch.nullable().default(null),
  minDisplaced: z.number().int().min(0).max(12).default(2),
  maxLeap: z.number().int().min(1).max(48).nullable().default(null),
  seed: z.number().int().nullable().default(null),
})

export const CycleSettingsSchema = Length.extend({
  low: Pitch,
  high: Pitch,
  scale: Scale.default('major'),
  cycle: z.enum(['fourths', 'fifths', 'chromatic', 'whole-tone', 'custom']).default('fourths'),
  customTonics: z.array(Tonic).max(24).default([]),
  tempo: z.number().int().min(30).max(240).default(72),
  click: z.boolean().default(false),
}).refine((s) => s.low < s.high, 'The low note must be below the high note.')

export const DRILL_SETTINGS_SCHEMAS = {
  recall: RecallSettingsSchema,
  hunt: HuntSettingsSchema,
  runs: RunsSettingsSchema,
  scatter: ScatterSettingsSchema,
  cycle: CycleSettingsSchema,
} as const

export type RecallSettings = z.infer<typeof RecallSettingsSchema>
export type HuntSettings = z.infer<typeof HuntSettingsSchema>
export type RunsSettings = z.infer<typeof RunsSettingsSchema>
export type ScatterSettings = z.infer<typeof ScatterSettingsSchema>
export type CycleSettings = z.infer<typeof CycleSettingsSchema>
export type DrillSettings = {
  recall: RecallSettings
  hunt: HuntSettings
  runs: RunsSettings
  scatter: ScatterSettings
  cycle: CycleSettings
}

/** A drill with its settings (a "preset"): what a practice plan item or a quick-start link holds. */
export const DrillPresetSchema = z.discriminatedUnion('drill', [
  z.object({ drill: z.literal('recall'), settings: RecallSettingsSchema }),
  z.object({ drill: z.literal('hunt'), settings: HuntSettingsSchema }),
  z.object({ drill: z.literal('runs'), settings: RunsSettingsSchema }),
  z.object({ drill: z.literal('scatter'), settings: ScatterSettingsSchema }),
  z.object({ drill: z.literal('cycle'), settings: CycleSettingsSchema }),
])
export type DrillPreset = z.infer<typeof DrillPresetSchema>

/** What a teacher asks for: accuracy and speed, a number of sessions, or every key of the cycle. */
export const PracticeTargetSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('accuracy'),
    minAccuracy: z.number().min(0).max(1).default(0.95),
    maxMedianMs: z.number().int().min(200).max(60_000).nullable().default(2000),
    minAttempts: z.number().int().min(1).max(5000).default(50),
  }),
  z.object({ kind: z.literal('sessions'), count: z.number().int().min(1).max(100) }),
  z.object({ kind: z.literal('all-keys') }),
])
export type PracticeTarget = z.infer<typeof PracticeTargetSchema>
