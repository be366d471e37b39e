// Fingerings inside a hand position: the region widened by the allowed shifts, with finger numbers.
import { assertHandSystem, handStep, positionName, type HandStep, type HandSystem } from './hand'
import { assertWhole } from './guard'
import type { Fingering, FingeringOptions } from './fingering'

/** Most hand shifts a fingering may be allowed. @example MAX_SHIFTS // 3 */
export const MAX_SHIFTS = 3

interface BoxPlan {
  fretOf: number[][]
  strings: number
  maxPerString: number
  system: HandSystem
  maxShifts: number
  home: number
  memo: Map<number, number>
}

/**
 * The frets a fingering may use: the region [lowFret, highFret] widened by one fret per allowed
 * shift on either side, within the neck (open strings only when that reaches fret 0).
 *
 * @example
 * widenedRegion({ lowFret: 5, highFret: 8, shifts: 1, frets: 20 }) // { low: 4, high: 9 }
 */
export function widenedRegion(options: {
  lowFret: number
  highFret: number
  shifts: number
  frets: number
}): { low: number; high: number } {
  return {
    low: Math.max(0, options.lowFret - options.shifts),
    high: Math.min(options.frets, options.highFret + options.shifts),
  }
}

/**
 * Checks the hand-position options and builds what the count and the listing share: the frets
 * each note may take inside the widened region, the hand system and the home position. Throws a
 * RangeError for a region outside the neck, only one of lowFret/highFret, a shift count outside
 * 0–3 or an unknown hand system.
 *
 * @example
 * planBox({ tuning: [28], frets: 20, run: [33], lowFret: 5, highFret: 8 }, [[5]]).home // 5
 */
export function planBox(options: FingeringOptions, fretOf: number[][]): BoxPlan {
  const { frets, lowFret, highFret, shifts = 1, handSystem = 'one-finger-per-fret' } = options
  if (lowFret === undefined || highFret === undefined) {
    throw new RangeError('A hand position needs both its lowest and its highest fret.')
  }
  assertWhole(lowFret, 'The lowest fret', 0, frets)
  assertWhole(highFret, 'The highest fret', lowFret, frets)
  assertWhole(shifts, 'Shifts', 0, MAX_SHIFTS)
  assertHandSystem(handSystem)
  const region = widenedRegion({ lowFret, highFret, shifts, frets })
  const inRegion = (fret: number) => fret >= region.low && fret <= region.high
  return {
    fretOf: fretOf.map((row) => row.map((fret) => (fret >= 0 && inRegion(fret) ? fret : -1))),
    strings: options.tuning.length,
    maxPerString: options.maxPerString ?? 4,
    system: handSystem,
    maxShifts: shifts,
    home: Math.max(1, lowFret),
    memo: new Map(),
  }
}

interface Placed {
  count: number
  /** The moves on this string so far, the last one played last. */
  steps: HandStep[]
  shifts: number
}

// Notes i, i+1 … played one after another on string s while they fit, the hand carried along.
function* onString(plan: BoxPlan, i: number, s: number, handAt: number, used: number) {
  const steps: HandStep[] = []
  let shifts = used
  for (let count = 1; count <= plan.maxPerString && i + count <= plan.fretOf.length; count += 1) {
    const fret = plan.fretOf[i + count - 1]?.[s] ?? -1
    if (fret < 0) return
    const step = handStep(steps.at(-1)?.handAt ?? handAt, fret, plan.system)
    shifts += step.move === 'shift' ? 1 : 0
    if (shifts > plan.maxShifts) return
    steps.push(step)
    yield { count, steps, shifts } satisfies Placed
  }
}

// Fingerings of notes i.. that start string s at note i, the hand at handAt after `used` shifts.
function waysFrom(plan: BoxPlan, i: number, s: number, handAt: number, used: number): number {
  const total = plan.fretOf.length
  if (s >= plan.strings) return 0
  const key = ((i * plan.strings + s) * 64 + handAt) * (MAX_SHIFTS + 1) + used
  const known = plan.memo.get(key)
  if (known !== undefined) return known
  let sum = 0
  for (const { count, steps, shifts } of onString(plan, i, s, handAt, used)) {
    const hand = steps.at(-1)?.handAt ?? handAt
    sum += i + count === total ? 1 : waysFrom(plan, i + count, s + 1, hand, shifts)
  }
  plan.memo.set(key, sum)
  return sum
}

/**
 * Counts the fingerings of a run inside the widened hand position without listing them.
 *
 * @example
 * countBoxFingerings(planBox({ tuning: [28, 33], frets: 20, run: [33, 35], lowFret: 5, highFret: 8 }, [[5, 0], [7, 2]])) // 1 (both on the E string)
 */
export function countBoxFingerings(plan: BoxPlan): number {
  let sum = 0
  for (let s = 0; s < plan.strings; s += 1) sum += waysFrom(plan, 0, s, plan.home, 0)
  return sum
}

function toFingering(plan: BoxPlan, strings: number[], steps: HandStep[]) {
  const counts = [...new Set(strings)].map((s) => strings.filter((t) => t === s).length)
  const positions = strings.map((string, i) => ({ string, fret: plan.fretOf[i]?.[string] ?? 0 }))
  const fingering: Fingering = {
    positions,
    pattern: counts.join('-'),
    shifts: steps.filter((step) => step.move === 'shift').length,
    stretches: steps.filter((step) => step.move === 'stretch').length,
    fingers: steps.map((step) => step.finger),
    moves: steps.map((step) => step.move),
    position: plan.home,
    positionName: positionName(plan.home),
  }
  return { fingering, counts }
}

/**
 * Lists every fingering of a run inside the widened hand position, each note with its finger and
 * move, pruned by the counts so no dead end is walked.
 *
 * @example
 * listBoxFingerings(planBox({ tuning: [28, 33], frets: 20, run: [33, 35], lowFret: 5, highFret: 8 }, [[5, 0], [7, 2]]))[0]?.fingering.fingers // [1, 3]
 */
export function listBoxFingerings(plan: BoxPlan): { fingering: Fingering; counts: number[] }[] {
  const total = plan.fretOf.length
  const found: { fingering: Fingering; counts: number[] }[] = []
  const walk = (i: number, s: number, prefix: { strings: number[]; steps: HandStep[] }) => {
    const hand = prefix.steps.at(-1)?.handAt ?? plan.home
    const used = prefix.steps.filter((step) => step.move === 'shift').length
    for (const { count, steps, shifts } of onString(plan, i, s, hand, used)) {
      const next = {
        strings: [...prefix.strings, ...Array<number>(count).fill(s)],
        steps: [...prefix.steps, ...steps],
      }
      if (i + count === total) found.push(toFingering(plan, next.strings, next.steps))
      else if (waysFrom(plan, i + count, s + 1, steps.at(-1)?.handAt ?? hand, shifts) > 0) {
        walk(i + count, s + 1, next)
      }
    }
  }
  for (let s = 0; s < plan.strings; s += 1) {
    if (waysFrom(plan, 0, s, plan.home, 0) > 0) walk(0, s, { strings: [], steps: [] })
  }
  return found
}
