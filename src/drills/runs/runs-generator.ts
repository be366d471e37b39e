// Range Runs: the run a hand position offers, its fingerings, and the questions of a session.
import {
  countFingerings,
  fingeringsOf,
  pitchName,
  rangeRun,
  spellInKey,
  type Fingering,
  type HandMove,
  type Position,
} from '../../theory'
import type { RunsSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

/** Above this many fingerings only the count is shown (listing them all would stall the page). */
export const MAX_LISTED_FINGERINGS = 20_000
/** How many fingerings the setup lists (fewest shifts first). */
export const SHOWN_FINGERINGS = 6

export interface RunsQuestion extends DrillQuestion {
  /** Where the chosen fingering plays this note. */
  cell: Position
  /** The note as the key spells it, with octave ("Eb2"). */
  name: string
  /** The finger the fingering plays it with (0 = open string), when it has finger numbers. */
  finger: number | null
  /** How the hand reaches it: in the hand, a stretch, a shift, an open string. */
  move: HandMove | null
  direction: 'up' | 'down'
  pattern: string
}

export interface RunNeck {
  tuning: readonly number[]
  frets: number
}

/** The settings a run depends on; the hand system and shifts default to the drill's defaults. */
export type RunKey = Pick<
  RunsSettings,
  'tonic' | 'scale' | 'lowFret' | 'highFret' | 'maxPerString'
> &
  Partial<Pick<RunsSettings, 'shifts' | 'handSystem'>>

export interface RunOverview {
  run: number[]
  names: string[]
  fingerings: Fingering[]
  /** Every fingering there is (may be more than are listed). */
  total: number
  /** True when there were too many to list in full (the list then holds none). */
  tooMany: boolean
}

/** A fingering's stable name: its first string and its notes-per-string pattern ("1:3-3-2"). */
export const fingeringId = (fingering: Fingering) =>
  `${fingering.positions[0]?.string ?? 0}:${fingering.pattern}`

/** The run, lowest to highest, its spelled names and its fingerings (fewest shifts first). */
export function runOverview(neck: RunNeck, key: RunKey): RunOverview {
  const highFret = Math.min(key.highFret, neck.frets)
  const run = rangeRun({
    tuning: neck.tuning,
    lowFret: Math.min(key.lowFret, highFret),
    highFret,
    tonic: key.tonic,
    scale: key.scale,
  })
  if (run.length === 0) throw new RangeError('This region holds no note of the scale; widen it.')
  const names = run.map((pitch) => spellInKey(pitch, key.tonic, key.scale))
  // Inside the hand position widened by the allowed shifts, fingered by the chosen hand system.
  const options = {
    tuning: neck.tuning,
    frets: neck.frets,
    run,
    maxPerString: key.maxPerString,
    lowFret: Math.min(key.lowFret, highFret),
    highFret,
    shifts: key.shifts ?? 1,
    handSystem: key.handSystem ?? 'one-finger-per-fret',
  }
  const total = countFingerings(options)
  const tooMany = total > MAX_LISTED_FINGERINGS
  return { run, names, fingerings: tooMany ? [] : fingeringsOf(options), total, tooMany }
}

export interface PatternPractice {
  pattern: string
  sessions: number
  lastPractisedAt: string | null
}

/**
 * Fingerings in the order to practise them: fewest sessions first, then longest since practised,
 * then fewest shifts (the list's own order), so no combination is neglected.
 */
export function rotation(
  fingerings: readonly Fingering[],
  practice: readonly PatternPractice[],
): Fingering[] {
  const byId = new Map(practice.map((item) => [item.pattern, item]))
  const rank = (fingering: Fingering) => byId.get(fingeringId(fingering))
  return fingerings
    .map((fingering, order) => ({ fingering, order, seen: rank(fingering) }))
    .sort(
      (a, b) =>
        (a.seen?.sessions ?? 0) - (b.seen?.sessions ?? 0) ||
        (a.seen?.lastPractisedAt ?? '').localeCompare(b.seen?.lastPractisedAt ?? '') ||
        a.order - b.order,
    )
    .map((item) => item.fingering)
}

/** One pass of a fingering: up from the lowest note to the highest and back down. */
export function passQuestions(
  overview: Pick<RunOverview, 'run' | 'names'>,
  fingering: Fingering,
  key: RunKey,
  pass: number,
): RunsQuestion[] {
  const up = overview.run.map((_, index) => index)
  const down = up.slice(0, -1).reverse()
  const pattern = fingeringId(fingering)
  return [...up, ...down].map((index, step) => {
    const direction = step < up.length ? 'up' : 'down'
    return {
      key: `${pass}:${step}`,
      expectedPitch: overview.run[index] ?? 0,
      cell: fingering.positions[index] ?? { string: 0, fret: 0 },
      name: overview.names[index] ?? pitchName(overview.run[index] ?? 0),
      finger: fingering.fingers?.[index] ?? null,
      move: fingering.moves?.[index] ?? null,
      direction,
      pattern,
      detail: {
        tonic: key.tonic,
        scale: key.scale,
        lowFret: key.lowFret,
        highFret: key.highFret,
        pattern,
        direction,
      },
    }
  })
}

/**
 * The questions of a session: whole passes, first with the chosen fingering, then with the next ones
 * of the rotation, until at least `questionCount` notes (one pass when the count is null).
 */
export function runsQuestions(
  overview: Pick<RunOverview, 'run' | 'names'>,
  order: readonly Fingering[],
  key: RunKey,
  questionCount: number | null,
): RunsQuestion[] {
  const questions: RunsQuestion[] = []
  for (
    let pass = 0;
    order.length > 0 && (pass === 0 || questions.length < (questionCount ?? 0));
    pass += 1
  ) {
    questions.push(...passQuestions(overview, order[pass % order.length] as Fingering, key, pass))
  }
  return questions
}
