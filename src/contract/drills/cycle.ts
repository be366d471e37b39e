// Window Cycle's contract: every key of a cycle inside a fixed low/high window.
import { z } from 'zod'
import { customCycle, CYCLES, cycleTonics, missingPitchClasses, pitchName } from '../../theory'
import { defineDrillContract, type SettingsIssue } from './drill-contract'
import { DetailText, Length, Pitch, PlayedDetail, Scale, scaleLabel, Tonic } from './fields'

/** The ways a window cycle's keys are played (the drill's default: alternate). */
export const CYCLE_DIRECTIONS = ['alternate', 'up', 'down'] as const

export const CycleSettingsSchema = Length.extend({
  low: Pitch,
  high: Pitch,
  scale: Scale.default('major'),
  cycle: z.enum(['fourths', 'fifths', 'chromatic', 'whole-tone', 'custom']).default('fourths'),
  customTonics: z.array(Tonic).max(24).default([]),
  /** Up, down, or alternating (up, down, up …) so a wide window is used from bottom to top. */
  direction: z.enum(CYCLE_DIRECTIONS).default('alternate'),
  /** The key to begin the cycle on; null: its first key (C for fourths and fifths). */
  startTonic: Tonic.nullable().default(null),
  tempo: z.number().int().min(30).max(240).default(72),
  click: z.boolean().default(false),
}).refine((s) => s.low < s.high, 'The low note must be below the high note.')
export type CycleSettings = z.infer<typeof CycleSettingsSchema>

export const CycleDetailSchema = z.strictObject({
  /** The key being played (its tonic, spelled for the scale). */
  key: DetailText,
  scale: DetailText,
  degree: z.number().int().min(1),
  /** The note was folded back an octave to stay inside the window. */
  displaced: z.boolean(),
  /** Where the note is in its key (0 = the first root) and which way the key went: the next
   * session continues after it. */
  noteIndex: z.number().int().min(0).max(12).optional(),
  phase: z.enum(['up', 'down']).optional(),
  revealed: z.literal(true).optional(),
  ...PlayedDetail,
})

type CycleChoice = Pick<CycleSettings, 'cycle' | 'customTonics' | 'scale'>

/** Where the last session stopped: the key of its last note, the note in it and its way. */
export interface CycleStop {
  key: string
  noteIndex: number
  phase: 'up' | 'down'
}

/** GET /api/progress/cycle-position: the last Window Cycle note of a scale (of a plan item). */
export interface CyclePositionAnswer {
  stop: (CycleStop & { at: string }) | null
}

/** The tonics of the chosen cycle (spelled for the scale), starting on C, or the custom list. */
export function cycleKeys(settings: CycleChoice): string[] {
  if (settings.cycle === 'custom') return customCycle(settings.customTonics)
  return cycleTonics(settings.cycle, { scale: settings.scale })
}

/** The keys a preset plays; empty when the cycle cannot be built. */
function keysOf(settings: CycleChoice): string[] {
  try {
    return cycleKeys(settings)
  } catch {
    return []
  }
}

// A cycle preset must name its keys and fit them in its window, so the student never meets an error.
function presetIssues(settings: CycleSettings): SettingsIssue[] {
  const keys = keysOf(settings)
  if (keys.length === 0)
    return [{ path: ['customTonics'], message: 'List at least one key for a custom cycle.' }]
  const { low, high, scale } = settings
  const missing = missingPitchClasses({ low, high, tonics: keys, scale })
  if (!missing.length) return []
  const message = `The window ${pitchName(low)}–${pitchName(high)} is missing ${missing.join(', ')}; widen it.`
  return [{ path: ['high'], message }]
}

function cycleLabel(settings: CycleSettings): string {
  const { cycle, customTonics, startTonic, direction } = settings
  const keys =
    cycle === 'custom'
      ? `keys ${customTonics.join(' ')}`
      : (CYCLES.find((c) => c.id === cycle)?.label.toLowerCase() ?? cycle)
  const from = startTonic && cycle !== 'custom' ? ` from ${startTonic}` : ''
  return `${keys}${from}${direction === 'alternate' ? '' : `, all ${direction}`}`
}

export const cycleContract = defineDrillContract({
  id: 'cycle',
  name: 'Window Cycle',
  settings: CycleSettingsSchema,
  detail: CycleDetailSchema,
  focus: { keys: true, regions: false },
  describe: (s) =>
    `${scaleLabel(s.scale)}, ${cycleLabel(s)}, window ${pitchName(s.low, 'flat')}–${pitchName(s.high, 'flat')}`,
  keysOf,
  presetIssues,
})
