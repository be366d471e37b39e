// Window Cycle on the page: the window (by name or two taps on the neck), the cycle, the metronome,
// widening the window, and each key's lowest tone on this instrument.
import { computed, onBeforeUnmount, ref, watch } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { instrumentRange, toUnicode, widenWindow } from '../../theory'
import { CycleSettingsSchema } from '../../contract/drills'
import { useFrameProps } from '../engine/frame-props'
import type { PickedCell } from '../engine/locate'
import { locateMarks } from '../engine/locate-marks'
import { saveSettings } from '../engine/remembered-settings'
import { limitsOf } from '../engine/session'
import { useDrillNeck } from '../engine/useDrillNeck'
import { attemptContext, useDrillSession } from '../engine/useDrillSession'
import { useDrillSettings } from '../engine/useDrillSettings'
import { useDrillSound } from '../engine/useDrillSound'
import { usePlanItem } from '../engine/usePlanItem'
import { cycleGrader } from './cycle-grader'
import {
  cycleQuestions,
  defaultWindow,
  lowestToneOf,
  planCycle,
  type CycleQuestion,
} from './cycle-generator'
import { useWindowPicker } from './useWindowPicker'

export function useWindowCycle() {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const plan = usePlanItem('cycle')
  const sound = useDrillSound()
  const settings = useDrillSettings({
    drill: 'cycle',
    neck,
    ready,
    planItem: plan.item,
    defaults: (n) => CycleSettingsSchema.parse({ ...defaultWindow(n), questionCount: null }),
    fits: (s, n) => {
      const { low, high } = instrumentRange(n.tuning, n.frets)
      return s.low >= low && s.high <= high
    },
  })
  const range = computed(() => instrumentRange(neck.value.tuning, neck.value.frets))
  const cycle = computed(() => planCycle(settings.value))
  const outside = computed(
    () => settings.value.low < range.value.low || settings.value.high > range.value.high,
  )
  const problem = computed(() =>
    outside.value
      ? "The window reaches past this instrument's range; choose notes it can play."
      : cycle.value.error,
  )
  const picker = useWindowPicker(settings)
  const widenStep = ref(2)

  const session = useDrillSession<CycleQuestion, PickedCell>({
    drill: 'cycle',
    grader: () => cycleGrader(neck.value),
    context: attemptContext(neck, plan),
    autoAdvanceMs: 400,
  })
  const starting = ref(false)

  async function begin() {
    if (problem.value) return
    starting.value = true
    picker.stop()
    await sound.unlock()
    if (!plan.item.value) saveSettings('cycle', settings.value)
    session.start(
      cycleQuestions(cycle.value.keys, settings.value.scale, settings.value.questionCount),
      { ...limitsOf(settings.value), openEnded: false }, // no count = the whole cycle, a known length
    )
    if (settings.value.click) sound.startClick(settings.value.tempo)
    starting.value = false
  }
  watch(session.status, (status) => {
    if (status === 'finished' || status === 'ready') sound.stopClick()
  })
  onBeforeUnmount(() => sound.stopClick())

  /** Widens the window a step below or above; false at the edge of the instrument's range. */
  function widen(direction: 'above' | 'below'): boolean {
    const wider = widenWindow({
      low: settings.value.low,
      high: settings.value.high,
      direction,
      range: range.value,
      step: widenStep.value,
    })
    if (!wider) return false
    settings.value = { ...settings.value, ...wider }
    return true
  }
  const canWiden = (direction: 'above' | 'below') =>
    !outside.value &&
    (direction === 'above'
      ? settings.value.high < range.value.high
      : settings.value.low > range.value.low)

  function pick(cell: PickedCell) {
    if (session.status.value !== 'asking') return
    sound.play(cell.pitch)
    session.answer(cell)
  }

  /** Every key of the cycle with its lowest tone on this instrument (degree 1 unless the key is awkward). */
  const keyTable = computed(() =>
    cycle.value.keys.map((key) => ({
      tonic: key.tonic,
      start: key.names[0] ?? '',
      lowest: lowestToneOf(neck.value, key.tonic, settings.value.scale),
    })),
  )
  const previous = computed(() => {
    const state = session.state.value
    if (!state || state.index === 0) return null
    return state.questions[state.index - 1] ?? null
  })

  const windowMarks = computed<CellMark[]>(() =>
    neck.value.tuning.flatMap((open, string) =>
      Array.from({ length: neck.value.frets + 1 }, (_, fret) => ({
        string,
        fret,
        pitch: open + fret,
      }))
        .filter(({ pitch }) => pitch >= settings.value.low && pitch <= settings.value.high)
        .map(({ string, fret }): CellMark => ({ string, fret, kind: 'highlight' })),
    ),
  )
  const marks = computed<CellMark[]>(() => {
    const question = session.current.value
    if (!question) return [...windowMarks.value, ...picker.marks.value]
    const picks = locateMarks({
      tuning: neck.value.tuning,
      accidentals: neck.value.accidentals,
      picks: session.state.value?.picks ?? [],
      answered: session.status.value === 'feedback',
      expectedLabel: toUnicode(question.name),
    })
    return [...windowMarks.value, ...picks]
  })

  return {
    neck,
    instrumentError,
    settled,
    plan,
    sound,
    settings,
    range,
    cycle,
    problem,
    picker,
    widenStep,
    session,
    starting,
    begin,
    widen,
    canWiden,
    pick,
    keyTable,
    previous,
    marks,
    frame: useFrameProps(session, neck),
  }
}
