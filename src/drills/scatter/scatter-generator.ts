// Octave Scatter: root-to-root scales whose notes land in random octaves, reproducible from a seed.
import { instrumentRange, octaveScatter, type PitchWindow, type Scatter } from '../../theory'
import type { ScatterSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

export interface ScatterQuestion extends DrillQuestion {
  /** Spelled in the scale, with octave ("Bb2"). */
  name: string
  displaced: boolean
  /** Which sequence of the session (0-based) and which note of it. */
  sequence: number
  index: number
}

export interface ScatterNeck {
  tuning: readonly number[]
  frets: number
}

/** The pitch window of the settings, or the instrument's whole range where they leave it open. */
export function scatterWindow(
  neck: ScatterNeck,
  settings: Pick<ScatterSettings, 'low' | 'high'>,
): PitchWindow {
  const range = instrumentRange(neck.tuning, neck.frets)
  return { low: settings.low ?? range.low, high: settings.high ?? range.high }
}

/** A fresh seed for a new session (shown in the summary so the session can be replayed). */
export const newSeed = (random: () => number = Math.random) => Math.floor(random() * 1_000_000)

/** The seed of sequence k of a session: the session's seed, then the next numbers. */
export const sequenceSeed = (seed: number, sequence: number) => (seed + sequence) % 2 ** 32

export function scatterSequence(
  neck: ScatterNeck,
  settings: ScatterSettings,
  seed: number,
): Scatter {
  const window = scatterWindow(neck, settings)
  return octaveScatter({
    ...window,
    tonic: settings.tonic,
    scale: settings.scale,
    minDisplaced: settings.minDisplaced,
    maxLeap: settings.maxLeap,
    placement: settings.placement,
    seed,
  })
}

/**
 * The questions of a session from its seed: whole sequences (root to root) until at least
 * `questionCount` notes (one sequence when the count is null). The same seed gives the same
 * session note for note.
 */
export function scatterQuestions(
  neck: ScatterNeck,
  settings: ScatterSettings,
  seed: number,
): ScatterQuestion[] {
  const questions: ScatterQuestion[] = []
  for (
    let sequence = 0;
    sequence === 0 || questions.length < (settings.questionCount ?? 0);
    sequence += 1
  ) {
    const scatter = scatterSequence(neck, settings, sequenceSeed(seed, sequence))
    scatter.pitches.forEach((pitch, index) => {
      questions.push({
        key: `${sequence}:${index}`,
        expectedPitch: pitch,
        cell: null,
        name: scatter.names[index] ?? '',
        displaced: scatter.displaced[index] ?? false,
        sequence,
        index,
        detail: {
          tonic: settings.tonic,
          scale: settings.scale,
          seed: sequenceSeed(seed, sequence),
          index,
        },
      })
    })
  }
  return questions
}
