// Octave displacement: the octaves a pitch can take in a range, and the Octave Scatter exercise.
import { assertPitch, assertWhole, MIDI_MAX } from './guard'
import { pitchClassOf, pitchName } from './pitch'
import { createRandom, type Random } from './random'
import { resolveScale, spellScaleTone, type ScaleInfo } from './scale'
import type { PitchWindow } from './types'

/**
 * How freely notes are placed: `any` octave, or `each-moved` — every note in another octave than a
 * plain step up from the note before would give (D3 then E4 or E2, never E3).
 *
 * @example
 * const placement: ScatterPlacement = 'each-moved'
 */
export type ScatterPlacement = 'any' | 'each-moved'

/** Default largest leap between neighbouring notes: two octaves. @example DEFAULT_MAX_LEAP // 24 */
export const DEFAULT_MAX_LEAP = 24

/**
 * Options of an Octave Scatter: range, key, and how scattered the notes must be.
 *
 * @example
 * const options: ScatterOptions = { low: 28, high: 67, tonic: 'A', scale: 'minor', minDisplaced: 3, maxLeap: 19 }
 */
export interface ScatterOptions extends PitchWindow {
  tonic: string
  scale: string
  /** Fewest notes away from where a plain ascending scale from the first note would put them. */
  minDisplaced?: number
  /** Largest leap between neighbouring notes, in semitones (default 24, two octaves). */
  maxLeap?: number
  /** `each-moved`: no note a plain step up from the note before (default `any`). */
  placement?: ScatterPlacement
}

/**
 * A generated Octave Scatter: root to root, each note in one of its octaves.
 *
 * @example
 * octaveScatter({ low: 28, high: 67, tonic: 'A', scale: 'minor', seed: 1 }).names.length // 8
 */
export interface Scatter {
  tonic: string
  scale: string
  pitches: number[]
  names: string[]
  displaced: boolean[]
  /** Per note, true when it is not a plain step up from the note before (false for the first). */
  moved: boolean[]
}

/**
 * Every pitch of the same pitch class as `pitch` inside the inclusive range [low, high], ascending.
 *
 * @example
 * octaveChoices(45, 28, 67) // [33, 45, 57] (A1, A2, A3 on a 24-fret 4-string bass)
 */
export function octaveChoices(pitch: number, low: number, high: number): number[] {
  assertWindow(low, high)
  assertPitch(pitch)
  const first = low + ((((pitch - low) % 12) + 12) % 12)
  return Array.from(
    { length: first > high ? 0 : Math.floor((high - first) / 12) + 1 },
    (_, k) => first + 12 * k,
  )
}

/**
 * Throws a RangeError unless [low, high] is a pitch window inside MIDI 0–127 with low ≤ high.
 *
 * @example
 * assertWindow(36, 48) // passes
 */
export function assertWindow(low: number, high: number): void {
  assertPitch(low, 'The low end')
  assertPitch(high, 'The high end')
  if (low > high)
    throw new RangeError(
      `The low end (${pitchName(low)}) is above the high end (${pitchName(high)}).`,
    )
}

interface ScatterPlan {
  info: ScaleInfo
  steps: number[]
  choices: number[][]
  minDisplaced: number
  maxLeap: number
  eachMoved: boolean
}

// The nearest pitch above `previous` with the pitch class of `pitch`: a plain step up.
const plainStepUp = (previous: number, pitch: number) =>
  previous + ((pitch - previous + 1200) % 12 || 12)

/**
 * Whether a next note may follow the previous one: within the leap limit and, when every note must
 * move, not a plain step up from it.
 */
function allowedStep(plan: ScatterPlan, previous: number, next: number): boolean {
  if (Math.abs(next - previous) > plan.maxLeap) return false
  return !plan.eachMoved || next !== plainStepUp(previous, next)
}

function planScatter(options: ScatterOptions): ScatterPlan {
  assertWindow(options.low, options.high)
  const info = resolveScale(options.tonic, options.scale)
  const steps = [...info.steps, 12]
  const minDisplaced = options.minDisplaced ?? 0
  const maxLeap = options.maxLeap ?? DEFAULT_MAX_LEAP
  assertWhole(minDisplaced, 'Fewest displaced notes', 0, steps.length - 1)
  assertWhole(maxLeap, 'Largest leap', 1, MIDI_MAX)
  const placement = options.placement ?? 'any'
  if (placement !== 'any' && placement !== 'each-moved') {
    throw new RangeError(`"${String(placement)}" is not a placement; use any or each-moved.`)
  }
  const root = pitchClassOf(info.tonic)
  const choices = steps.map((step) => octaveChoices(root + step, options.low, options.high))
  return { info, steps, choices, minDisplaced, maxLeap, eachMoved: placement === 'each-moved' }
}

// ways[i][j][d]: placements of notes after i, with note i at choices[i][j] and d displaced so far.
function completions(plan: ScatterPlan, first: number): number[][][] {
  const { steps, choices, minDisplaced } = plan
  const last = choices.length - 1
  const ways: number[][][] = []
  ways[last] = (choices[last] ?? []).map(() =>
    Array.from({ length: minDisplaced + 1 }, (_, d) => (d === minDisplaced ? 1 : 0)),
  )
  for (let i = last - 1; i >= 0; i -= 1) {
    const next = choices[i + 1] ?? []
    const home = first + (steps[i + 1] ?? 0)
    ways[i] = (choices[i] ?? []).map((pitch) =>
      Array.from({ length: minDisplaced + 1 }, (_, d) =>
        next.reduce((sum, candidate, k) => {
          if (!allowedStep(plan, pitch, candidate)) return sum
          const moved = Math.min(minDisplaced, d + (candidate === home ? 0 : 1))
          return sum + (ways[i + 1]?.[k]?.[moved] ?? 0)
        }, 0),
      ),
    )
  }
  return ways
}

/**
 * Counts every valid Octave Scatter placement: each note of the root-to-root scale at one of its
 * octaves in [low, high], with at least `minDisplaced` displaced notes, no leap above `maxLeap`
 * (default 24) and, with `placement: 'each-moved'`, no plain step up from the note before.
 *
 * @example
 * countOctaveScatters({ low: 36, high: 59, tonic: 'C', scale: 'major' }) // 2 ** 8 (two octaves for each of 8 notes)
 */
export function countOctaveScatters(options: ScatterOptions): number {
  const plan = planScatter(options)
  const firsts = plan.choices[0] ?? []
  return firsts.reduce(
    (sum, first, index) => sum + (completions(plan, first)[0]?.[index]?.[0] ?? 0),
    0,
  )
}

function drawWeighted(weights: readonly number[], random: Random): number {
  let target = random() * weights.reduce((sum, weight) => sum + weight, 0)
  let chosen = -1
  for (const [index, weight] of weights.entries()) {
    if (weight <= 0) continue
    chosen = index // the last positive weight catches rounding at the very end
    if (target < weight) return index
    target -= weight
  }
  return chosen
}

function explainEmpty(plan: ScatterPlan, options: ScatterOptions): never {
  const missing = plan.info.names.filter((_, degree) => plan.choices[degree]?.length === 0)
  const range = `${pitchName(options.low)}–${pitchName(options.high)}`
  if (missing.length > 0) {
    throw new RangeError(
      `The range ${range} has no ${missing.join(', ')} for ${plan.info.tonic} ${plan.info.scale}.`,
    )
  }
  throw new RangeError(
    `No placement in ${range} meets these options; allow larger leaps, fewer displaced notes or a wider range.`,
  )
}

// Weight of each candidate for note i: the placements that remain if it is chosen.
function nextWeights(
  plan: ScatterPlan,
  ways: number[][][],
  i: number,
  previous: number,
  home: number,
  displaced: number,
): number[] {
  return (plan.choices[i] ?? []).map((pitch, k) => {
    if (!allowedStep(plan, previous, pitch)) return 0
    const moved = Math.min(plan.minDisplaced, displaced + (pitch === home ? 0 : 1))
    return ways[i]?.[k]?.[moved] ?? 0
  })
}

function drawPlacement(
  plan: ScatterPlan,
  first: number,
  ways: number[][][],
  random: Random,
): number[] {
  const pitches = [first]
  let displaced = 0
  for (let i = 1; i < plan.choices.length; i += 1) {
    const home = first + (plan.steps[i] ?? 0)
    const weights = nextWeights(plan, ways, i, pitches[i - 1] ?? first, home, displaced)
    const pitch = plan.choices[i]?.[drawWeighted(weights, random)] ?? home
    displaced += pitch === home ? 0 : 1
    pitches.push(pitch)
  }
  return pitches
}

/**
 * Generates an Octave Scatter: the scale from root to root with each note in a random octave of
 * the range, drawn uniformly from every placement that meets the options, reproducibly from `seed`.
 * A note counts as displaced when it is not where a plain ascending scale from the first note would
 * put it, as moved when it is not a plain step up from the note before. Leaps are at most two
 * octaves unless `maxLeap` says otherwise. Throws a RangeError when no placement exists.
 *
 * @example
 * octaveScatter({ low: 28, high: 67, tonic: 'A', scale: 'minor', seed: 1, minDisplaced: 3 })
 * // { tonic: 'A', scale: 'minor', pitches: [57, 35, 48, 62, 64, 41, 43, 57],
 * //   names: ['A3', 'B1', 'C3', 'D4', 'E4', 'F2', 'G2', 'A3'],
 * //   displaced: [false, true, true, false, false, true, true, true],
 * //   moved: [false, true, true, true, false, true, false, true] }
 */
export function octaveScatter(options: ScatterOptions & { seed: number }): Scatter {
  const plan = planScatter(options)
  const random = createRandom(options.seed)
  const firsts = plan.choices[0] ?? []
  const tables = firsts.map((first) => completions(plan, first))
  const totals = tables.map((ways, index) => ways[0]?.[index]?.[0] ?? 0)
  if (totals.every((total) => total === 0)) explainEmpty(plan, options)
  const index = drawWeighted(totals, random)
  return describeScatter(plan, drawPlacement(plan, firsts[index] ?? 0, tables[index] ?? [], random))
}

function describeScatter(plan: ScatterPlan, pitches: number[]): Scatter {
  const { info, steps } = plan
  const first = pitches[0] ?? 0
  return {
    tonic: info.tonic,
    scale: info.scale,
    pitches,
    names: pitches.map((pitch, i) => spellScaleTone(info, i, pitch)),
    displaced: pitches.map((pitch, i) => pitch !== first + (steps[i] ?? 0)),
    moved: pitches.map((pitch, i) => i > 0 && pitch !== plainStepUp(pitches[i - 1] ?? 0, pitch)),
  }
}
