// Fingerings of a range run: every way to spread the run across strings, with the shifts each needs.
import { countBoxFingerings, listBoxFingerings, planBox } from './fingering-box'
import { assertPitch, assertWhole } from './guard'
import type { HandMove, HandSystem } from './hand'
import { assertValidTuning } from './tuning'
import type { Position } from './types'

/**
 * What to finger: the run (ascending MIDI pitches) on a tuning, and the limits of the hand. With
 * a hand position (`lowFret` and `highFret`), every note stays inside it widened by one fret per
 * allowed shift on either side, and the hand system gives the fingers; without one, the whole neck
 * is used and shifts are counted with `handSpan`.
 *
 * @example
 * const options: FingeringOptions = { tuning: [28, 33, 38, 43], frets: 20, run: [33, 35, 36], lowFret: 5, highFret: 8, shifts: 1 }
 */
export interface FingeringOptions {
  tuning: readonly number[]
  frets: number
  run: readonly number[]
  /** Most notes on one string (default 4). */
  maxPerString?: number
  /** Without a hand position: frets the hand covers without shifting (default 4). */
  handSpan?: number
  /** The hand position's lowest fret (the first finger's; fret 0 counts as position I). */
  lowFret?: number
  /** The hand position's highest fret. */
  highFret?: number
  /** Hand shifts allowed, 0–3 (default 1); each widens the position by a fret on either side. */
  shifts?: number
  /** One finger per fret over four frets (default), or fingers 1-2-4 over three frets. */
  handSystem?: HandSystem
}

/**
 * One fingering: where each note is played, notes per string from the first string used, shifts.
 * Inside a hand position it also holds stretches, the finger and move of each note (0 = open
 * string) and the position (the first finger's fret, and as a Roman numeral).
 *
 * @example
 * const fingering: Fingering = { positions: [{ string: 0, fret: 5 }], pattern: '1', shifts: 0, stretches: 0, fingers: [1], moves: ['hand'], position: 5, positionName: 'V' }
 */
export interface Fingering {
  positions: Position[]
  pattern: string
  shifts: number
  stretches?: number
  fingers?: number[]
  moves?: HandMove[]
  position?: number
  positionName?: string
}

interface FingeringPlan {
  fretOf: number[][]
  ways: number[][]
  maxPerString: number
  handSpan: number
}

function assertRun(run: readonly number[]): void {
  if (run.length === 0) throw new RangeError('A run needs at least one note.')
  run.forEach((pitch, index) => {
    assertPitch(pitch, 'Every note of the run')
    if (index > 0 && pitch <= (run[index - 1] ?? pitch)) {
      throw new RangeError('A run must go strictly upwards, lowest note first.')
    }
  })
}

// ways[i][s]: fingerings of notes i.. that start a new string s at note i.
function countWays(fretOf: number[][], strings: number, maxPerString: number): number[][] {
  const total = fretOf.length
  const ways: number[][] = []
  ways[total] = Array<number>(strings + 1).fill(1)
  for (let i = total - 1; i >= 0; i -= 1) {
    ways[i] = Array.from({ length: strings + 1 }, (_, string) => {
      let sum = 0
      for (let count = 1; count <= maxPerString && i + count <= total; count += 1) {
        if ((fretOf[i + count - 1]?.[string] ?? -1) < 0) break
        sum += i + count === total ? 1 : (ways[i + count]?.[string + 1] ?? 0)
      }
      return sum
    })
  }
  return ways
}

function fretsOf(options: FingeringOptions): number[][] {
  const { tuning, frets, run, maxPerString = 4 } = options
  assertValidTuning(tuning, frets)
  assertRun(run)
  assertWhole(maxPerString, 'Notes per string', 1, 24)
  return run.map((pitch) =>
    tuning.map((open) => (pitch - open >= 0 && pitch - open <= frets ? pitch - open : -1)),
  )
}

const inPosition = (options: FingeringOptions) =>
  options.lowFret !== undefined || options.highFret !== undefined

function planFingering(options: FingeringOptions): FingeringPlan {
  const { tuning, maxPerString = 4, handSpan = 4 } = options
  const fretOf = fretsOf(options)
  assertWhole(handSpan, 'The hand span', 1, 12)
  return { fretOf, ways: countWays(fretOf, tuning.length, maxPerString), maxPerString, handSpan }
}

/**
 * Counts the fingerings of a run without listing them (for runs with very many): the same rules as
 * `fingeringsOf`.
 *
 * @example
 * countFingerings({ tuning: [28, 33, 38, 43], frets: 20, run: [31, 33, 35, 36, 38, 40, 42, 43], maxPerString: 3 }) // 9
 */
export function countFingerings(options: FingeringOptions): number {
  if (inPosition(options)) return countBoxFingerings(planBox(options, fretsOf(options)))
  const { ways } = planFingering(options)
  return (ways[0] ?? []).reduce((sum, count) => sum + count, 0)
}

/**
 * Counts the hand shifts a sequence of positions needs: the hand covers `handSpan` frets, open
 * strings need no finger, and each fretted note that does not fit with the notes played since the
 * last shift starts a new hand position (last finger to first finger when going up a string).
 *
 * @example
 * countShifts([{ string: 0, fret: 3 }, { string: 0, fret: 5 }, { string: 0, fret: 7 }], 4) // 1
 */
export function countShifts(positions: readonly Position[], handSpan: number): number {
  let shifts = 0
  let lowest = Infinity
  let highest = -Infinity
  for (const { fret } of positions) {
    if (fret === 0) continue
    lowest = Math.min(lowest, fret)
    highest = Math.max(highest, fret)
    if (highest - lowest >= handSpan) {
      shifts += 1
      lowest = fret
      highest = fret
    }
  }
  return shifts
}

interface Found {
  fingering: Fingering
  counts: number[]
}

function toFingering(strings: readonly number[], counts: number[], plan: FingeringPlan): Found {
  const positions = strings.map((string, i) => ({ string, fret: plan.fretOf[i]?.[string] ?? 0 }))
  const shifts = countShifts(positions, plan.handSpan)
  return { fingering: { positions, pattern: counts.join('-'), shifts }, counts }
}

// Fewest shifts, fewest stretches, then the lower first string, then more notes on lower strings.
function byFewestShifts(a: Found, b: Found): number {
  const shifts = a.fingering.shifts - b.fingering.shifts
  const stretches = (a.fingering.stretches ?? 0) - (b.fingering.stretches ?? 0)
  const first = (a.fingering.positions[0]?.string ?? 0) - (b.fingering.positions[0]?.string ?? 0)
  const differ = a.counts.findIndex((count, index) => count !== b.counts[index])
  const lower = differ === -1 ? 0 : (b.counts[differ] ?? 0) - (a.counts[differ] ?? 0)
  return shifts || stretches || first || lower
}

/**
 * Every fingering of an ascending run: each note on a string where it is playable, strings never
 * going back, consecutive strings each carrying 1..maxPerString notes; with the per-string pattern
 * and the shift count. In a hand position (`lowFret`/`highFret`), notes stay inside the position
 * widened by the allowed `shifts`, the hand starts with its first finger on `lowFret`, each note
 * gets its finger (hand system) and its move (in the hand, a stretch one fret beyond it, or a
 * shift), and fingerings needing more shifts than allowed are left out; otherwise shifts follow
 * `countShifts`. Sorted by fewest shifts, fewest stretches, lower first string, then more notes on
 * the lower strings, so the order is always the same.
 *
 * @example
 * fingeringsOf({ tuning: [28, 33, 38, 43], frets: 20, run: [31, 33, 35, 36, 38, 40, 42, 43], maxPerString: 3 })[0]
 * // { pattern: '2-3-3', shifts: 0, positions: [{ string: 0, fret: 3 }, { string: 0, fret: 5 }, { string: 1, fret: 2 }, ...] }
 * fingeringsOf({ tuning: [28, 33, 38, 43], frets: 20, run: [33, 35, 36, 38], lowFret: 5, highFret: 8 })[0]?.fingers // [1, 3, 4, 1]
 */
export function fingeringsOf(options: FingeringOptions): Fingering[] {
  if (inPosition(options)) {
    const found = listBoxFingerings(planBox(options, fretsOf(options)))
    return found.sort(byFewestShifts).map((item) => item.fingering)
  }
  const plan = planFingering(options)
  const total = plan.fretOf.length
  const found: Found[] = []
  const walk = (i: number, string: number, strings: number[], counts: number[]): void => {
    for (let count = 1; count <= plan.maxPerString && i + count <= total; count += 1) {
      if ((plan.fretOf[i + count - 1]?.[string] ?? -1) < 0) return
      const next = [...strings, ...Array<number>(count).fill(string)]
      if (i + count === total) found.push(toFingering(next, [...counts, count], plan))
      else if ((plan.ways[i + count]?.[string + 1] ?? 0) > 0) {
        walk(i + count, string + 1, next, [...counts, count])
      }
    }
  }
  plan.fretOf[0]?.forEach((_, string) => {
    if ((plan.ways[0]?.[string] ?? 0) > 0) walk(0, string, [], [])
  })
  return found.sort(byFewestShifts).map((item) => item.fingering)
}
