// Range Runs on the page: the run of a hand position, its fingerings (least practised offered
// first), the run shown up and back down, then played note by note.
import { computed, ref, watch } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { toUnicode, type Fingering } from '../../theory'
import { RunsSettingsSchema, type RunsSettings } from '../../contract/drills'
import { useFrameProps } from '../engine/frame-props'
import type { PickedCell } from '../engine/locate'
import { locateMarks } from '../engine/locate-marks'
import { saveSettings } from '../engine/remembered-settings'
import { limitsOf } from '../engine/session'
import { useDrillNeck } from '../engine/useDrillNeck'
import { attemptContext, useDrillSession } from '../engine/useDrillSession'
import { useDrillSettings } from '../engine/useDrillSettings'
import { useDrillSound } from '../engine/useDrillSound'
import { useFocus } from '../engine/useFocus'
import { usePlanItem } from '../engine/usePlanItem'
import { runsGrader } from './runs-grader'
import {
  fingeringId,
  rotation,
  runOverview,
  runsQuestions,
  type RunOverview,
  type RunsQuestion,
} from './runs-generator'
import { useFingeringPractice } from './useFingeringPractice'

export const RUN_BPM = 120

function defaults(frets: number): RunsSettings {
  return RunsSettingsSchema.parse({
    tonic: 'C',
    scale: 'major',
    lowFret: Math.min(2, frets),
    highFret: Math.min(5, frets),
  })
}

export function useRangeRuns() {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const plan = usePlanItem('runs')
  const focus = useFocus()
  const sound = useDrillSound()
  const settings = useDrillSettings({
    drill: 'runs',
    neck,
    ready,
    planItem: plan.item,
    defaults: (n) => defaults(n.frets),
  })

  const overview = computed<{ value: RunOverview | null; error: string | null }>(() => {
    try {
      return { value: runOverview(neck.value, settings.value), error: null }
    } catch (error) {
      return {
        value: null,
        error: error instanceof RangeError ? error.message : 'This run cannot be built.',
      }
    }
  })
  const practice = useFingeringPractice(neck, settings)
  const order = computed<Fingering[]>(() =>
    rotation(overview.value.value?.fingerings ?? [], practice.patterns.value),
  )
  // The student's own pick of fingering; null means the offered one (practised least).
  const pickedId = ref<string | null>(null)
  watch(
    () => [
      neck.value.tuning.join(),
      settings.value.tonic,
      settings.value.scale,
      settings.value.lowFret,
      settings.value.highFret,
      settings.value.maxPerString,
      settings.value.handSpan,
    ],
    () => (pickedId.value = null),
  )
  const chosen = computed(
    () => order.value.find((f) => fingeringId(f) === pickedId.value) ?? order.value[0] ?? null,
  )
  const chosenId = computed<string | null>({
    get: () => (chosen.value ? fingeringId(chosen.value) : null),
    set: (id) => (pickedId.value = id),
  })
  const problem = computed(
    () =>
      overview.value.error ??
      noFingeringProblem(overview.value.value, settings.value, neck.value.tuning.length),
  )

  watch(
    () => [neck.value.instrumentId, settings.value.scale] as const,
    ([instrumentId, scale]) => void focus.suggestKeys({ drill: 'runs', instrumentId, n: 1, scale }),
    { immediate: true },
  )

  const session = useDrillSession<RunsQuestion, PickedCell>({
    drill: 'runs',
    grader: () => runsGrader(neck.value),
    context: attemptContext(neck, plan),
    autoAdvanceMs: 250,
  })
  const starting = ref(false)

  async function begin() {
    const view = overview.value.value
    const first = chosen.value
    if (!view || !first) return
    starting.value = true
    await sound.unlock()
    if (!plan.item.value) saveSettings('runs', settings.value)
    const rest = order.value.filter((f) => f !== first)
    session.start(
      runsQuestions(view, [first, ...rest], settings.value, settings.value.questionCount),
      limitsOf(settings.value),
    )
    starting.value = false
  }

  function pick(cell: PickedCell) {
    if (session.status.value !== 'asking') return
    sound.play(cell.pitch)
    session.answer(cell)
  }

  /** The run of the chosen fingering, up and back down, as board cells (for animateRun). */
  const runCells = computed(() => {
    const positions = chosen.value?.positions ?? []
    return [...positions, ...positions.slice(0, -1).reverse()]
  })
  const playRun = () => {
    const run = overview.value.value?.run ?? []
    sound.playSequence([...run, ...run.slice(0, -1).reverse()], RUN_BPM)
  }

  const fingeringMarks = computed<CellMark[]>(() =>
    (chosenForSession.value?.positions ?? []).map((cell, index) => ({
      ...cell,
      kind: 'hint',
      label: toUnicode(overview.value.value?.names[index]?.replace(/-?\d+$/, '') ?? ''),
    })),
  )
  // During a session, the fingering of the pass being played.
  const chosenForSession = computed(() => {
    const question = session.current.value
    if (!question) return chosen.value
    return order.value.find((f) => fingeringId(f) === question.pattern) ?? chosen.value
  })
  // The notes already played in this pass, where they were played.
  const trailMarks = computed<CellMark[]>(() => {
    const state = session.state.value
    const question = session.current.value
    if (!state || !question) return []
    const pass = question.key.split(':')[0]
    return state.records
      .filter(
        (r) =>
          r.questionIndex < state.index && r.question.key.split(':')[0] === pass && r.grade.pick,
      )
      .map((r): CellMark => ({
        ...(r.grade.pick as { string: number; fret: number }),
        kind: r.grade.correct ? 'correct' : 'wrong',
      }))
  })
  const marks = computed<CellMark[]>(() => {
    const question = session.current.value
    if (!question) return fingeringMarks.value
    const trail = locateMarks({
      tuning: neck.value.tuning,
      accidentals: neck.value.accidentals,
      picks: session.state.value?.picks ?? [],
      answered: session.status.value === 'feedback',
      expectedLabel: toUnicode(question.name),
    })
    const hints = settings.value.showFingering
      ? [...fingeringMarks.value, ...trailMarks.value]
      : trailMarks.value
    const target: CellMark[] = settings.value.showFingering
      ? [{ ...question.cell, kind: 'target' }]
      : []
    return [...hints, ...target, ...trail]
  })

  return {
    neck,
    instrumentError,
    settled,
    plan,
    focus,
    sound,
    settings,
    overview,
    practice,
    order,
    chosenId,
    chosen,
    problem,
    session,
    starting,
    begin,
    pick,
    runCells,
    playRun,
    marks,
    frame: useFrameProps(session, neck),
  }
}

// Why no fingering fits, in words (the run is longer than the strings can hold at this many per string).
function noFingeringProblem(
  view: RunOverview | null,
  settings: RunsSettings,
  strings: number,
): string | null {
  if (!view) return null
  if (view.tooMany)
    return `This region offers ${view.total.toLocaleString()} fingerings, too many to list: narrow the frets or allow fewer notes per string.`
  if (view.total > 0) return null
  const room = strings * settings.maxPerString
  if (view.run.length > room) {
    return `The run has ${view.run.length} notes, but ${strings} strings × ${settings.maxPerString} notes per string hold only ${room}: allow more notes per string or narrow the frets.`
  }
  return 'No fingering fits these settings: allow more notes per string or narrow the frets.'
}
