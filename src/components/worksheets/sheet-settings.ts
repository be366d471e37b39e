// The Print & export page's settings: defaults from the player's instrument, the query each PDF
// takes, and the exercise (notation, MusicXML, MIDI) the same settings give through the drills.
import { defaultWindow, planCycle } from '@/drills/cycle/cycle-generator'
import { ScatterSettingsSchema } from '@/contract/drills/scatter'
import { runOverview } from '@/drills/runs/runs-generator'
import { scatterSequence } from '@/drills/scatter/scatter-generator'
import type { DrillNeck } from '@/drills/engine/useDrillNeck'
import {
  exerciseFromRangeRun,
  exerciseFromScatter,
  exerciseFromWindowCycle,
  type Exercise,
} from '@/exchange'
import { pitchName } from '@/theory'
import type { WorksheetKind, WorksheetParams } from '@/api/worksheets'

export interface SheetSettings {
  kind: WorksheetKind
  paper: 'a4' | 'letter'
  from: number
  to: number
  answers: boolean
  quiz: number
  accidentals: 'sharp' | 'flat' | 'both'
  /** Window of the cycle sheet (MIDI). */
  low: number
  high: number
  scale: string
  cycle: 'fourths' | 'fifths' | 'chromatic' | 'whole-tone'
  tonic: string
  count: number
  seed: number
  lowFret: number
  highFret: number
  /** Chord Tones sheets: the progression, from `tonic` round the cycle of fourths, and a
   * five-fret position (it holds every pitch class on a neck in fourths, so every key has a root). */
  progression: 'two-five-one' | 'blues'
  chordLowFret: number
  chordHighFret: number
}

/** Settings that suit the instrument: its accidentals, a first window, a position it has. */
export function defaultSettings(neck: DrillNeck): SheetSettings {
  const window = defaultWindow(neck)
  return {
    kind: 'neck',
    paper: 'a4',
    from: 0,
    to: Math.min(12, neck.frets),
    answers: true,
    quiz: 0,
    accidentals: neck.accidentals,
    low: window.low,
    high: window.high,
    scale: 'major',
    cycle: 'fourths',
    tonic: 'G',
    count: 6,
    seed: 1,
    lowFret: Math.min(2, neck.frets - 3),
    highFret: Math.min(5, neck.frets),
    progression: 'two-five-one',
    chordLowFret: Math.min(2, neck.frets - 4),
    chordHighFret: Math.min(6, neck.frets),
  }
}

const tuningText = (neck: DrillNeck) => neck.tuning.map((pitch) => pitchName(pitch)).join(',')

/** The query string of the chosen sheet for this instrument. */
export function sheetParams(
  settings: SheetSettings,
  neck: DrillNeck,
): WorksheetParams[WorksheetKind] {
  const instrument = { tuning: tuningText(neck), paper: settings.paper }
  const frets = neck.frets
  const answers = settings.answers ? '1' : '0'
  switch (settings.kind) {
    case 'neck': {
      const { from, to, quiz, accidentals } = settings
      return {
        ...instrument,
        from,
        to,
        quiz,
        accidentals,
        answers,
        hand: neck.leftHanded ? 'left' : 'right',
      }
    }
    case 'cycle':
      return {
        ...instrument,
        frets,
        low: pitchName(settings.low),
        high: pitchName(settings.high),
        scale: settings.scale,
        cycle: settings.cycle,
      }
    case 'scatter': {
      const { tonic, scale, count, seed } = settings
      return { ...instrument, frets, tonic, scale, count, seed, answers }
    }
    case 'runs': {
      const { tonic, scale, lowFret, highFret, count } = settings
      return { ...instrument, frets, tonic, scale, lowFret, highFret, count }
    }
    case 'chords': {
      const { tonic: start, progression, chordLowFret: lowFret, chordHighFret: highFret } = settings
      return { ...instrument, frets, start, progression, lowFret, highFret, answers }
    }
  }
}

export type SheetExercise = { exercise: Exercise | null; error: string | null }

function cycleExercise(settings: SheetSettings, neck: DrillNeck): Exercise {
  const window = { low: settings.low, high: settings.high }
  const plan = planCycle({
    ...window,
    scale: settings.scale,
    cycle: settings.cycle,
    customTonics: [],
  })
  if (plan.error !== null) throw new RangeError(plan.error)
  return exerciseFromWindowCycle({ keys: plan.keys, scale: settings.scale, ...window }, neck)
}

function scatterExercise(settings: SheetSettings, neck: DrillNeck): Exercise {
  const scatter = ScatterSettingsSchema.parse({ tonic: settings.tonic, scale: settings.scale })
  return exerciseFromScatter(scatterSequence(neck, scatter, settings.seed), neck)
}

function runsExercise(settings: SheetSettings, neck: DrillNeck): Exercise {
  const key = { ...settings, maxPerString: 4, handSpan: 4 }
  const overview = runOverview(neck, key)
  const fingering = overview.fingerings[0]
  if (!fingering)
    throw new RangeError('This run has too many fingerings to list; narrow the region.')
  return exerciseFromRangeRun({ ...overview, fingering, ...key }, neck)
}

/**
 * The exercise the settings describe (the first sequence, fingering or the whole cycle), or the
 * theory core's message when the settings cannot make one. Neck sheets have none.
 */
export function sheetExercise(settings: SheetSettings, neck: DrillNeck): SheetExercise {
  const build = {
    neck: null,
    cycle: cycleExercise,
    scatter: scatterExercise,
    runs: runsExercise,
    chords: null,
  }[settings.kind]
  if (!build) return { exercise: null, error: null }
  try {
    return { exercise: build(settings, neck), error: null }
  } catch (error) {
    if (error instanceof RangeError) return { exercise: null, error: error.message }
    throw error
  }
}
