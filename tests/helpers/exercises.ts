// Exercises built from today's drill generators, shared by the export tests.
import { runOverview } from '../../src/drills/runs/runs-generator'
import { scatterSequence } from '../../src/drills/scatter/scatter-generator'
import { cycleKeys } from '../../src/contract/drills/cycle'
import { ScatterSettingsSchema } from '../../src/contract/drills/scatter'
import {
  exerciseFromRangeRun,
  exerciseFromScatter,
  exerciseFromWindowCycle,
} from '../../src/exchange'
import { keyCycleInWindow, tuningPreset } from '../../src/theory'

export const BASS = { tuning: tuningPreset('bass-4').pitches, frets: 20 }
export const GUITAR = { tuning: tuningPreset('guitar-6').pitches, frets: 22 }

/** G major in 2nd position (frets 2–5) on a 4-string bass, the first fingering (fewest shifts). */
export function rangeRunExercise(neck = BASS) {
  const key = { tonic: 'G', scale: 'major', lowFret: 2, highFret: 5, maxPerString: 4, handSpan: 4 }
  const overview = runOverview(neck, key)
  const fingering = overview.fingerings[0]!
  return {
    overview,
    fingering,
    exercise: exerciseFromRangeRun({ ...overview, fingering, ...key }, neck),
  }
}

/** Eb minor scattered over the whole range of the instrument, seed 7. */
export function scatterExercise(neck = BASS) {
  const settings = ScatterSettingsSchema.parse({ tonic: 'Eb', scale: 'minor', minDisplaced: 3 })
  const scatter = scatterSequence(neck, settings, 7)
  return { scatter, exercise: exerciseFromScatter(scatter, neck) }
}

/** The first four keys of the cycle of fourths in major, window E1–C3 (frets 0–5 on a bass). */
export function cycleExercise(neck = BASS, low = 28, high = 48) {
  const tonics = cycleKeys({ cycle: 'fourths', customTonics: [], scale: 'major' }).slice(0, 4)
  const keys = keyCycleInWindow({ low, high, tonics, scale: 'major' })
  return { keys, exercise: exerciseFromWindowCycle({ keys, scale: 'major', low, high }, neck) }
}
