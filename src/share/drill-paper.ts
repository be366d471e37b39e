// What each drill puts on paper: its questions for given settings (the shared page, the setup
// preview), the part of a session shown while playing, the settings that make it again, and its PDF.
// A drill joins by adding its entry here (and its id to SHAREABLE_DRILLS for share links).
import type { WorksheetKind, WorksheetParams } from '../api/worksheets'
import type { DrillId, DrillSettings } from '../contract/drills'
import { scaleLabel } from '../contract/drills/fields'
import {
  cycleOptions,
  cycleSession,
  planCycle,
  type CycleQuestion,
} from '../drills/cycle/cycle-generator'
import { chordsSession, type ChordsQuestion } from '../drills/chords/chords-generator'
import type { DrillQuestion } from '../drills/engine/types'
import {
  fingeringId,
  passQuestions,
  runOverview,
  type RunsQuestion,
} from '../drills/runs/runs-generator'
import { scatterQuestions, type ScatterQuestion } from '../drills/scatter/scatter-generator'
import { pitchName } from '../theory'
import type { QuestionReading } from './question-exercise'

/** The instrument an exercise is made for. */
export interface PaperNeck {
  tuning: readonly number[]
  frets: number
}

/** What settings alone do not fix: a run's fingering, a scatter's seed when the settings have none. */
export interface PaperChoice {
  fingering: string | null
  seed: number
}

export type SheetRequest = {
  [K in WorksheetKind]: { kind: K; params: WorksheetParams[K] }
}[WorksheetKind]

export interface DrillPaper<D extends DrillId, Q extends DrillQuestion> extends QuestionReading<Q> {
  questions(settings: DrillSettings[D], neck: PaperNeck, choice: PaperChoice): Q[]
  /** The questions shown around question `index` of a session (a sequence, a pass, the cycle). */
  segment(questions: readonly Q[], index: number): readonly Q[]
  /** Settings and fingering that make the shown questions again (`whole`: the whole session). */
  share(settings: DrillSettings[D], shown: readonly Q[], whole: boolean): SharedChoice<D>
  title(settings: DrillSettings[D], shown: readonly Q[]): string
  /** A word under the preview before a session, when it is only a sample of what a session plays. */
  previewNote?(settings: DrillSettings[D]): string | null
  /** Whether the TAB may show while a session runs (not when the places are what is asked). */
  tabWhilePlaying(settings: DrillSettings[D]): boolean
  sheet(settings: DrillSettings[D], neck: PaperNeck, shown: readonly Q[]): SheetRequest
}

export interface SharedChoice<D extends DrillId> {
  settings: DrillSettings[D]
  fingering: string | null
}

const tuningText = (neck: PaperNeck) => neck.tuning.map((pitch) => pitchName(pitch)).join(',')
const instrument = (neck: PaperNeck) => ({ tuning: tuningText(neck), frets: neck.frets })

/** The questions whose keys share the group (the part before ':') of question `index`. */
function group<Q extends DrillQuestion>(questions: readonly Q[], index: number): readonly Q[] {
  const groupOf = (question: Q | undefined) => question?.key.split(':')[0]
  const at = groupOf(questions[index])
  return questions.filter((question) => groupOf(question) === at)
}

const textKey = (question: DrillQuestion) => ({
  tonic: String(question.detail.tonic),
  scale: String(question.detail.scale),
})

const scatterPaper: DrillPaper<'scatter', ScatterQuestion> = {
  key: textKey,
  name: (question) => question.name,
  questions: (settings, neck, choice) =>
    scatterQuestions(neck, settings, settings.seed ?? choice.seed),
  segment: group,
  previewNote: (settings) =>
    settings.seed === null
      ? 'A sample sequence: every session draws its own. The PDF and a share link keep this one.'
      : null,
  tabWhilePlaying: () => false,
  share: (settings, shown, whole) => ({
    settings: {
      ...settings,
      seed: Number(shown[0]?.detail.seed ?? settings.seed ?? 0),
      questionCount: whole ? settings.questionCount : null,
    },
    fingering: null,
  }),
  title: (settings, shown) =>
    `${settings.tonic} ${scaleLabel(settings.scale)} octave scatter, seed ${String(shown[0]?.detail.seed ?? '')}`,
  sheet: (settings, neck, shown) => {
    const sequences = new Set(shown.map((question) => question.sequence)).size
    const window = settings.low !== null && settings.high !== null
    return {
      kind: 'scatter',
      params: {
        ...instrument(neck),
        tonic: settings.tonic,
        scale: settings.scale,
        ...(window ? { low: pitchName(settings.low!), high: pitchName(settings.high!) } : {}),
        minDisplaced: settings.minDisplaced,
        ...(settings.maxLeap === null ? {} : { maxLeap: settings.maxLeap }),
        seed: Number(shown[0]?.detail.seed ?? 1),
        count: Math.min(12, Math.max(1, sequences)),
        answers: '1',
      },
    }
  },
}

const runsPaper: DrillPaper<'runs', RunsQuestion> = {
  key: textKey,
  name: (question) => question.name,
  questions: (settings, neck, choice) => {
    const overview = runOverview(neck, settings)
    const fingering =
      overview.fingerings.find((candidate) => fingeringId(candidate) === choice.fingering) ??
      overview.fingerings[0]
    if (!fingering)
      throw new RangeError('This run has too many fingerings to list; narrow the region.')
    return passQuestions(overview, fingering, settings, 0)
  },
  segment: group,
  tabWhilePlaying: (settings) => settings.showFingering,
  share: (settings, shown) => ({
    settings: { ...settings, questionCount: null },
    fingering: shown[0]?.pattern ?? null,
  }),
  title: (settings, shown) =>
    `${settings.tonic} ${scaleLabel(settings.scale)} range run, frets ${settings.lowFret}–${settings.highFret}, fingering ${shown[0]?.pattern ?? ''}`,
  sheet: (settings, neck) => ({
    kind: 'runs',
    params: {
      ...instrument(neck),
      tonic: settings.tonic,
      scale: settings.scale,
      lowFret: settings.lowFret,
      highFret: Math.min(settings.highFret, neck.frets),
      maxPerString: settings.maxPerString,
    },
  }),
}

const cyclePaper: DrillPaper<'cycle', CycleQuestion> = {
  key: (question) => ({ tonic: question.tonic, scale: question.scale }),
  name: (question) => question.name,
  questions: (settings) => {
    const plan = planCycle(settings)
    if (plan.error !== null) throw new RangeError(plan.error)
    // From the cycle's start key (a shared exercise does not continue anyone's practice)
    return cycleSession(cycleOptions(settings), null, settings.questionCount).questions
  },
  segment: (questions) => questions,
  tabWhilePlaying: () => false,
  share: (settings) => ({ settings, fingering: null }),
  title: (settings) =>
    `Window Cycle, ${scaleLabel(settings.scale)} in ${settings.cycle}, window ${pitchName(settings.low)}–${pitchName(settings.high)}`,
  sheet: (settings, neck) => ({
    kind: 'cycle',
    params: {
      ...instrument(neck),
      low: pitchName(settings.low),
      high: pitchName(settings.high),
      scale: settings.scale,
      cycle: settings.cycle,
      ...(settings.cycle === 'custom' ? { tonics: settings.customTonics.join(',') } : {}),
    },
  }),
}

const PROGRESSION_TITLES = { 'two-five-one': 'ii–V–I', blues: '12-bar blues', custom: 'own chords' }

const chordsPaper: DrillPaper<'chords', ChordsQuestion> = {
  // The progression's key sets the signature; an own list of chords is written without one.
  key: (question) => question.keyRef ?? { tonic: 'C', scale: 'major' },
  name: (question) => question.name,
  questions: (settings, neck) => chordsSession(settings, neck.tuning).questions,
  // While playing: the arpeggio of the current chord.
  segment: (questions, index) =>
    questions.filter((question) => question.chordIndex === questions[index]?.chordIndex),
  tabWhilePlaying: () => false,
  share: (settings) => ({ settings, fingering: null }),
  title: (settings) =>
    settings.progression === 'custom'
      ? `Chord Tones, ${settings.customChords}`
      : `Chord Tones, ${PROGRESSION_TITLES[settings.progression]} from ${settings.startKey} ${settings.quality}`,
  sheet: (settings, neck) => ({
    kind: 'chords',
    params: {
      ...instrument(neck),
      ...{ progression: settings.progression, quality: settings.quality, cycle: settings.cycle },
      ...{ start: settings.startKey, chords: settings.customChords, size: settings.size },
      inversion: settings.inversion,
      lowFret: settings.lowFret,
      highFret: Math.min(settings.highFret, neck.frets),
      answers: '1',
    },
  }),
}

type PaperOf = { [D in DrillId]?: DrillPaper<D, never> }

/** The drills with notation, exports and share links, by id. */
export const DRILL_PAPER: PaperOf = {
  scatter: scatterPaper as unknown as DrillPaper<'scatter', never>,
  runs: runsPaper as unknown as DrillPaper<'runs', never>,
  cycle: cyclePaper as unknown as DrillPaper<'cycle', never>,
  chords: chordsPaper as unknown as DrillPaper<'chords', never>,
}

/** The paper entry of a drill, loosely typed for pages that hold any drill's questions. */
export function drillPaper(drill: DrillId): DrillPaper<DrillId, DrillQuestion> | null {
  return (DRILL_PAPER[drill] as unknown as DrillPaper<DrillId, DrillQuestion> | undefined) ?? null
}
