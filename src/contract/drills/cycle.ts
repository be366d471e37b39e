// Window Cycle's contract: every key of a cycle inside a fixed low/high window.
import { z } from 'zod'
import { customCycle, CYCLES, cycleTonics, missingPitchClasses, pitchName } from '../../theory'
import { defineDrillContract, type SettingsIssue } from './drill-contract'
import { DetailText, Length, Pitch, PlayedDetail, Scale, scaleLabel, Tonic } from './fields'

export const CycleSettingsSchema = Length.extend({
  low: Pitch,
  high: Pitch,
  scale: Scale.default('major'),
  cycle: z.enum(['fourths', 'fifths', 'chromatic', 'whole-tone', 'custom']).default('fourths'),
  customTonics: z.array(Tonic).max(24).default([]),
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
  ...PlayedDetail,
})

type CycleChoice = Pick<CycleSettings, 'cycle' | 'customTonics' | 'scale'>

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

function cycleLabel(cycle: string, customTonics: readonly string[]): string {
  if (cycle === 'custom') return `keys ${customTonics.join(' ')}`
  return CYCLES.find((c) => c.id === cycle)?.label.toLowerCase() ?? cycle
}

export const cycleContract = defineDrillContract({
  id: 'cycle',
  name: 'Window Cycle',
  settings: CycleSettingsSchema,
  detail: CycleDetailSchema,
  focus: { keys: true, regions: false },
  describe: (s) =>
    `${scaleLabel(s.scale)}, ${cycleLabel(s.cycle, s.customTonics)}, window ${pitchName(s.low, 'flat')}–${pitchName(s.high, 'flat')}`,
  keysOf,
  presetIssues,
})
