// Range Runs on the page: the run of a hand position, its fingerings (least practised offered
// first), the run shown up and back down, then played note by note.
import { computed, ref, watch } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { toUnicode } from '../../theory'
import { LOCATE_ANSWERS } from '../engine/heard-pitch'
import type { PickedCell } from '../engine/locate'
import { keyed } from '../engine/locate'
import { currentPickMarks } from '../engine/locate-marks'
import { useDrill } from '../engine/useDrill'
import { runsDrill } from './definition'
import { fingeringMarks, fingerMarks, passOf, trailMarks } from './run-marks'
import { runsGrader } from './runs-grader'
import { fingeringId, runsQuestions, type RunsQuestion } from './runs-generator'
import { useRunChoice } from './useRunChoice'

export const RUN_BPM = 120

export function useRangeRuns() {
  const drill = useDrill<'runs', RunsQuestion, PickedCell>(runsDrill, {
    ...LOCATE_ANSWERS,
    grader: ({ neck, settings }) => runsGrader(keyed(neck, settings)),
    problem: () => choice.problem.value ?? (choice.chosen.value ? null : 'Choose a fingering.'),
    prepare: ({ settings }) => {
      const view = choice.overview.value.value
      const first = choice.chosen.value
      if (!view || !first) throw new RangeError('This run cannot be built.')
      const rest = choice.order.value.filter((f) => f !== first)
      return { questions: runsQuestions(view, [first, ...rest], settings, settings.questionCount) }
    },
    promptCell: (question) => question.cell,
    autoAdvanceMs: 250,
    play: { passOf }, // played: the whole run up and back down, each note at its exact pitch
  })
  const { neck, settings, session, sound, focus } = drill
  const choice = useRunChoice(neck, settings)
  watch(
    () => [neck.value.instrumentId, settings.value.scale] as const,
    ([instrumentId, scale]) => void focus.suggestKeys({ drill: 'runs', instrumentId, n: 1, scale }),
    { immediate: true },
  )
  /** The run of the chosen fingering, up and back down, as board cells (for animateRun). */
  const runCells = computed(() => {
    const positions = choice.chosen.value?.positions ?? []
    return [...positions, ...positions.slice(0, -1).reverse()]
  })
  const playRun = () => {
    const run = choice.overview.value.value?.run ?? []
    sound.playSequence([...run, ...run.slice(0, -1).reverse()], RUN_BPM)
  }
  /** What the fingering's cells show: finger numbers (default) or note names. */
  const boardLabels = ref<'fingers' | 'notes'>('fingers')
  // During a session, the fingering of the pass being played.
  const shown = computed(() => {
    const question = session.current.value
    const playing = question && choice.order.value.find((f) => fingeringId(f) === question.pattern)
    const fingering = playing ?? choice.chosen.value
    return boardLabels.value === 'fingers'
      ? fingerMarks(fingering)
      : fingeringMarks(fingering, choice.overview.value.value?.names ?? [])
  })
  // the board: the fingering, this pass's trail and picks, and the last take played on the instrument
  const marks = computed<CellMark[]>(() => {
    const question = session.current.value
    const state = session.state.value
    const played = drill.take.marks.value
    if (!question || !state) return [...shown.value, ...played]
    const picks = currentPickMarks(session, keyed(neck.value, settings.value), (q) =>
      toUnicode(q.name),
    )
    const trail = trailMarks(state, question)
    if (!settings.value.showFingering) return [...trail, ...picks, ...played]
    return [...shown.value, ...trail, { ...question.cell, kind: 'target' }, ...picks, ...played]
  })
  return { ...drill, ...choice, runCells, playRun, marks, boardLabels }
}
