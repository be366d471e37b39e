// A take played on the instrument (the "play" input mode), graded as a whole: the notes heard lined
// up with the notes asked (right, wrong, missing, extra), the evenness of time between them, each
// onset against the click's beat, and the tempo ladder. Pure: times are passed in.

/** A note heard, with its onset (performance.now() ms, the delay of the input already taken off). */
export interface TakeNote {
  pitch: number
  onsetMs: number
}

/** One line of a graded take: an asked note (right, wrong or missing) or a note nobody asked for. */
export type TakeEntry =
  | { kind: 'right' | 'wrong'; index: number; heard: TakeNote }
  | { kind: 'missing'; index: number }
  | { kind: 'extra'; heard: TakeNote }

/** Whether the note heard answers the asked note at `index` (the previous note heard is given). */
export type TakeMatch = (index: number, heard: TakeNote, previous: TakeNote | null) => boolean

// Costs of the alignment: a wrong note in place of a right one is cheaper than a missing note plus
// an extra one, so "one wrong note" reads as exactly that.
const GAP = 1
const WRONG = 1.5

/**
 * Lines up the notes heard with the `count` notes asked (edit distance, Needleman–Wunsch): every
 * asked note is right, wrong or missing, and every other note heard is extra.
 * @example alignTake(3, [{pitch:40,onsetMs:0},{pitch:45,onsetMs:500}], (i,h) => h.pitch === [40,43,45][i])
 *   // → right 0, missing 1, right 2
 */
export function alignTake(
  count: number,
  heard: readonly TakeNote[],
  match: TakeMatch,
): TakeEntry[] {
  const cost = costTable(count, heard, match)
  const entries: TakeEntry[] = []
  let i = count
  let j = heard.length
  while (i > 0 || j > 0) {
    const note = heard[j - 1] as TakeNote
    const here = cost[i]![j]!
    if (i > 0 && j > 0 && here === cost[i - 1]![j - 1]! + step(match, i - 1, heard, j - 1)) {
      const right = match(i - 1, note, heard[j - 2] ?? null)
      entries.push({ kind: right ? 'right' : 'wrong', index: i - 1, heard: note })
      i -= 1
      j -= 1
    } else if (i > 0 && here === cost[i - 1]![j]! + GAP) {
      entries.push({ kind: 'missing', index: i - 1 })
      i -= 1
    } else {
      entries.push({ kind: 'extra', heard: note })
      j -= 1
    }
  }
  return entries.reverse()
}

const step = (match: TakeMatch, i: number, heard: readonly TakeNote[], j: number) =>
  match(i, heard[j] as TakeNote, heard[j - 1] ?? null) ? 0 : WRONG

function costTable(count: number, heard: readonly TakeNote[], match: TakeMatch): number[][] {
  const cost = Array.from({ length: count + 1 }, (_, i) =>
    Array.from({ length: heard.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0) * GAP),
  )
  for (let i = 1; i <= count; i++)
    for (let j = 1; j <= heard.length; j++)
      cost[i]![j] = Math.min(
        cost[i - 1]![j - 1]! + step(match, i - 1, heard, j - 1),
        cost[i - 1]![j]! + GAP,
        cost[i]![j - 1]! + GAP,
      )
  return cost
}

/** How even the time between the notes was: the mean gap and how far gaps strayed from it (ms). */
export interface Evenness {
  meanGapMs: number
  /** The standard deviation of the gaps (ms): 0 is a machine, a few tens a steady player. */
  spreadMs: number
}

/**
 * The evenness of a line of onsets (at least three notes), else null.
 * @example takeEvenness([0, 500, 1000, 1600]) // → { meanGapMs: 533, spreadMs: 47 }
 */
export function takeEvenness(onsetsMs: readonly number[]): Evenness | null {
  if (onsetsMs.length < 3) return null
  const gaps = onsetsMs.slice(1).map((onset, k) => onset - (onsetsMs[k] as number))
  const mean = gaps.reduce((sum, gap) => sum + gap, 0) / gaps.length
  const variance = gaps.reduce((sum, gap) => sum + (gap - mean) ** 2, 0) / gaps.length
  return { meanGapMs: Math.round(mean), spreadMs: Math.round(Math.sqrt(variance)) }
}

/** The click: its first beat (performance.now() ms) and the time between beats. */
export interface BeatGrid {
  firstBeatMs: number
  intervalMs: number
}

/** A note's onset against the nearest beat: negative is early; `onBeat` within the tolerance. */
export interface BeatOffset {
  offsetMs: number
  onBeat: boolean
}

/**
 * Each onset against the nearest beat of the grid, early (negative) or late, in ms.
 * @example beatOffsets([990, 1540], { firstBeatMs: 0, intervalMs: 500 }, 30)
 *   // → [{ offsetMs: -10, onBeat: true }, { offsetMs: 40, onBeat: false }]
 */
export function beatOffsets(
  onsetsMs: readonly number[],
  grid: BeatGrid,
  toleranceMs: number,
): BeatOffset[] {
  return onsetsMs.map((onset) => {
    const beats = Math.round((onset - grid.firstBeatMs) / grid.intervalMs)
    const offsetMs = Math.round(onset - (grid.firstBeatMs + beats * grid.intervalMs))
    return { offsetMs, onBeat: Math.abs(offsetMs) <= toleranceMs }
  })
}

/** The tempo ladder's rungs (quarter notes per minute). */
export interface TempoLadder {
  step: number
  min: number
  max: number
}

export const TEMPO_LADDER: TempoLadder = { step: 4, min: 40, max: 240 }

/**
 * The next tempo: a step up after a clean take, a step down after a sloppy one, within the ladder.
 * @example nextTempo(80, true) // → 84
 */
export function nextTempo(bpm: number, clean: boolean, ladder: TempoLadder = TEMPO_LADDER): number {
  const next = bpm + (clean ? ladder.step : -ladder.step)
  return Math.min(ladder.max, Math.max(ladder.min, next))
}

/** A take is clean when every asked note was right, nothing extra was played and all were on the beat. */
export function isCleanTake(entries: readonly TakeEntry[], offsets: readonly BeatOffset[] | null) {
  const notesRight = entries.every((entry) => entry.kind === 'right')
  return notesRight && (offsets ?? []).every((offset) => offset.onBeat)
}
