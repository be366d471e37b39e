// What each drill puts in an attempt's `detail` is what its contract says (a strict schema per
// drill), for a right answer, a wrong one and "show me". Answers are computed from the theory core.
import { describe, expect, it } from 'vitest'
import {
  ChordsSettingsSchema,
  CycleSettingsSchema,
  drillContract,
  HuntSettingsSchema,
  RecallSettingsSchema,
  RunsSettingsSchema,
  ScatterSettingsSchema,
  type DrillId,
} from '../contract/drills'
import { noteAt, positionsOf } from '../theory'
import { cycleOptions, cycleSession } from './cycle/cycle-generator'
import { chordsSession } from './chords/chords-generator'
import { chordsGrader } from './chords/chords-grader'
import { cycleGrader } from './cycle/cycle-grader'
import { toAttempt } from './engine/to-attempt'
import type { PickedCell } from './engine/locate'
import type { DrillGrader, DrillQuestion } from './engine/types'
import { huntQuestions } from './hunt/hunt-generator'
import { huntGrader } from './hunt/hunt-grader'
import { recallQuestions } from './recall/recall-generator'
import { recallGrader } from './recall/recall-grader'
import { runOverview, runsQuestions } from './runs/runs-generator'
import { runsGrader } from './runs/runs-grader'
import { scatterQuestions } from './scatter/scatter-generator'
import { scatterGrader } from './scatter/scatter-grader'

const NECK = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' as const } // E1 A1 D2 G2
const CONTEXT = { instrumentId: null, tuning: NECK.tuning, planItemId: null }
const SESSION = '00000000-0000-4000-8000-000000000001'

/** A cell sounding the pitch (right) and one a semitone off (wrong), from the theory core. */
function picks(pitch: number): [PickedCell, PickedCell] {
  const [right] = positionsOf(NECK.tuning, NECK.frets, pitch)
  const cell = right ?? { string: 0, fret: 0 }
  const wrongFret = cell.fret > 0 ? cell.fret - 1 : cell.fret + 1
  const wrong = { string: cell.string, fret: wrongFret }
  return [
    { ...cell, pitch: noteAt(NECK.tuning, cell.string, cell.fret) },
    { ...wrong, pitch: noteAt(NECK.tuning, wrong.string, wrong.fret) },
  ]
}

function detailsOf<Q extends DrillQuestion, A>(
  drill: DrillId,
  question: Q,
  grader: DrillGrader<Q, A>,
  answers: A[],
) {
  const grades = [...answers.map((a) => grader.grade(question, a, [])), grader.reveal(question, [])]
  return grades.map(
    (grade) =>
      toAttempt(drill, SESSION, { question, questionIndex: 0, grade, responseMs: 900 }, CONTEXT)
        .detail,
  )
}

const locate = <Q extends DrillQuestion>(q: Q) => picks(q.expectedPitch)

const CASES: [DrillId, () => Record<string, unknown>[]][] = [
  [
    'recall',
    () => {
      const settings = RecallSettingsSchema.parse({
        region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 },
      })
      const [q] = recallQuestions({ ...NECK, settings, seed: 1, focus: [] })
      const grader = recallGrader({ key: null, keyLabel: 'C major', accidentals: 'flat' })
      return detailsOf('recall', q!, grader, [q!.spelled, 'x#'])
    },
  ],
  [
    'hunt',
    () => {
      const settings = HuntSettingsSchema.parse({ findAll: true })
      const [q] = huntQuestions({ ...NECK, settings, seed: 2, focus: [] })
      return detailsOf('hunt', q!, huntGrader(NECK, true), locate(q!))
    },
  ],
  [
    'runs',
    () => {
      const settings = RunsSettingsSchema.parse({
        tonic: 'C',
        scale: 'major',
        lowFret: 2,
        highFret: 5,
      })
      const view = runOverview(NECK, settings)
      const [q] = runsQuestions(view, view.fingerings.slice(0, 1), settings, null)
      return detailsOf('runs', q!, runsGrader(NECK), locate(q!))
    },
  ],
  [
    'scatter',
    () => {
      const settings = ScatterSettingsSchema.parse({ tonic: 'C', scale: 'major' })
      const [q] = scatterQuestions(NECK, settings, 7)
      return detailsOf('scatter', q!, scatterGrader(NECK), locate(q!))
    },
  ],
  [
    'cycle',
    () => {
      const settings = CycleSettingsSchema.parse({ low: 28, high: 47 })
      const [q] = cycleSession(cycleOptions(settings), null, null).questions
      return detailsOf('cycle', q!, cycleGrader(NECK), locate(q!))
    },
  ],
  [
    'chords',
    () => {
      const settings = ChordsSettingsSchema.parse({ inversion: 'first' })
      const [q] = chordsSession(settings, NECK.tuning).questions
      return detailsOf('chords', q!, chordsGrader(NECK), locate(q!))
    },
  ],
]

describe("each drill's attempt detail", () => {
  it.each(CASES)('%s: right, wrong and revealed answers fit its contract', (drill, details) => {
    const schema = drillContract(drill).detail
    const checked = details().map((detail) => schema.safeParse(detail))
    expect(checked.map((c) => (c.success ? 'ok' : c.error.message))).toEqual(['ok', 'ok', 'ok'])
  })

  it('a detail with a field the contract does not name is refused (so the check above can fail)', () => {
    expect(drillContract('recall').detail.safeParse({ tonic: 'C' }).success).toBe(false)
  })
})
