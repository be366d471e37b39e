// What a teacher asks of a plan item (accuracy and speed, a number of sessions, every key), the
// progress toward it, and how a target reads in words.
import { z } from 'zod'
import { DRILL_IDS, drillContract, type DrillContract, type DrillPreset } from './drills'

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
export type TargetKind = PracticeTarget['kind']

interface Progress {
  met: boolean
  /** 0–1: how far along the slowest criterion is (1 when met). */
  ratio: number
}

/** Progress toward a plan item's target, computed on read from the student's attempts. */
export type TargetProgress =
  | (Progress & {
      kind: 'accuracy'
      attempts: number
      needed: number
      accuracy: number | null
      medianMs: number | null
    })
  | (Progress & { kind: 'sessions'; sessions: number; needed: number })
  | (Progress & { kind: 'all-keys'; keysPlayed: string[]; keysMissing: string[] })

/** The keys a preset plays, in order (drills that play keys); empty for the others. */
export function presetKeys(preset: DrillPreset): string[] {
  const contract = drillContract(preset.drill) as DrillContract
  return contract.keysOf?.(preset.settings) ?? []
}

/** Whether a drill offers the "every key" target (it plays keys). */
export const offersAllKeys = (drill: DrillPreset['drill']) =>
  Boolean((drillContract(drill) as DrillContract).keysOf)

/** The names of the drills that offer "every key" ("Window Cycle"). */
export const allKeysDrillNames = () =>
  DRILL_IDS.filter(offersAllKeys)
    .map((id) => drillContract(id).name)
    .join(' or ')

const percent = (value: number) => `${Math.round(value * 100)} %`
const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`

/** A session counts toward a sessions target once it holds this many answers (a quick look does not). */
export const SESSION_MIN_ANSWERS = 10

/** "accuracy ≥ 90 % and median ≤ 2.5 s over the last 60 answers", "3 sessions", "every key of the cycle". */
export function describeTarget(target: PracticeTarget): string {
  if (target.kind === 'sessions')
    return `${target.count} practice session${target.count === 1 ? '' : 's'} of ${SESSION_MIN_ANSWERS}+ answers`
  if (target.kind === 'all-keys') return 'every key of the cycle played correctly'
  const speed =
    target.maxMedianMs === null ? '' : ` and median answer ≤ ${seconds(target.maxMedianMs)}`
  return `accuracy ≥ ${percent(target.minAccuracy)}${speed} over the last ${target.minAttempts} answers`
}
