// Octave Scatter on the page: a seeded, displaced root-to-root scale shown and played; the student
// finds each note at its exact pitch; the summary's seed replays the same session.
import { computed, ref, watch } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { instrumentRange, toUnicode } from '../../theory'
import { ScatterSettingsSchema, type ScatterSettings } from '../../contract/drills'
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
import { scatterGrader } from './scatter-grader'
import { newSeed, scatterQuestions, type ScatterQuestion } from './scatter-generator'

export const SEQUENCE_BPM = 90

export function useOctaveScatter() {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const plan = usePlanItem('scatter')
  const focus = useFocus()
  const sound = useDrillSound()
  const settings = useDrillSettings({
    drill: 'scatter',
    neck,
    ready,
    planItem: plan.item,
    defaults: () => ScatterSettingsSchema.parse({ tonic: 'C', scale: 'major' }),
  })
  const range = computed(() => instrumentRange(neck.value.tuning, neck.value.frets))
  const seed = ref<number | null>(null)
  const problem = ref<string | null>(null)

  watch(
    () => [neck.value.instrumentId, settings.value.scale] as const,
    ([instrumentId, scale]) =>
      void focus.suggestKeys({ drill: 'scatter', instrumentId, n: 1, scale }),
    { immediate: true },
  )

  const session = useDrillSession<ScatterQuestion, PickedCell>({
    drill: 'scatter',
    grader: () => scatterGrader(neck.value),
    context: attemptContext(neck, plan),
    autoAdvanceMs: 500,
  })
  const starting = ref(false)

  // Settings made for another instrument may reach past this one's range: keep the window inside it.
  function fitted(chosen: ScatterSettings): ScatterSettings {
    const { low, high } = range.value
    const clip = (pitch: number | null) =>
      pitch === null ? null : Math.min(high, Math.max(low, pitch))
    return { ...chosen, low: clip(chosen.low), high: clip(chosen.high) }
  }

  /** Starts a session; with a seed it replays that session note for note. */
  async function begin(replaySeed?: number) {
    problem.value = null
    const chosen = fitted(settings.value)
    const sessionSeed = replaySeed ?? chosen.seed ?? newSeed()
    let questions: ScatterQuestion[]
    try {
      questions = scatterQuestions(neck.value, chosen, sessionSeed)
    } catch (error) {
      if (!(error instanceof RangeError)) throw error
      problem.value = error.message
      session.reset()
      return
    }
    starting.value = true
    await sound.unlock()
    if (!plan.item.value) saveSettings('scatter', { ...chosen, seed: null })
    seed.value = sessionSeed
    session.start(questions, limitsOf(chosen))
    starting.value = false
  }

  /** The sequence the current note belongs to, for showing and playing. */
  const sequence = computed(() => {
    const state = session.state.value
    const current = session.current.value
    if (!state || !current) return [] as ScatterQuestion[]
    return state.questions.filter((question) => question.sequence === current.sequence)
  })
  const playSequence = () =>
    sound.playSequence(
      sequence.value.map((q) => q.expectedPitch),
      SEQUENCE_BPM,
    )

  function pick(cell: PickedCell) {
    if (session.status.value !== 'asking') return
    sound.play(cell.pitch)
    session.answer(cell)
  }

  const marks = computed<CellMark[]>(() => {
    const question = session.current.value
    if (!question) return []
    return locateMarks({
      tuning: neck.value.tuning,
      accidentals: neck.value.accidentals,
      picks: session.state.value?.picks ?? [],
      answered: session.status.value === 'feedback',
      expectedLabel: toUnicode(question.name),
    })
  })

  return {
    neck,
    instrumentError,
    settled,
    plan,
    focus,
    sound,
    settings,
    range,
    seed,
    problem,
    session,
    starting,
    begin,
    sequence,
    playSequence,
    pick,
    marks,
    frame: useFrameProps(session, neck),
  }
}
