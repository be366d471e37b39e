// Window Cycle on the page: the window (by name or two taps on the neck), the cycle, the metronome,
// widening the window, and each key's lowest tone on this instrument.
import { computed, onBeforeUnmount, watch } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { pitchName, toUnicode } from '../../theory'
import { LOCATE_ANSWERS } from '../engine/heard-pitch'
import type { PickedCell } from '../engine/locate'
import { currentPickMarks } from '../engine/locate-marks'
import { limitsOf } from '../engine/session'
import { useDrill } from '../engine/useDrill'
import { cycleGrader, questionKeyed } from './cycle-grader'
import { cycleOptions, cycleSession, positionAfter, type CycleQuestion } from './cycle-generator'
import { useCycleStop } from './useCycleStop'
import { cycleDrill } from './definition'
import type { PlayRules } from '../engine/played-grade'
import { useCycleWindow } from './useCycleWindow'
import { useWindowPicker } from './useWindowPicker'

/** Played: each key's pitch classes in order, in any octave inside the window. */
function playRules(window: () => { low: number; high: number }): PlayRules<CycleQuestion> {
  const inWindow = (pitch: number) => pitch >= window().low && pitch <= window().high
  const samePitchClass = (question: CycleQuestion, pitch: number) =>
    pitch % 12 === question.expectedPitch % 12
  return {
    passOf: (question: CycleQuestion) => String(question.keyIndex),
    matches: (question: CycleQuestion, heard: { pitch: number }): boolean =>
      samePitchClass(question, heard.pitch) && inWindow(heard.pitch),
    wrongWhy: (question: CycleQuestion, heard: { pitch: number }) =>
      samePitchClass(question, heard.pitch)
        ? `${toUnicode(pitchName(heard.pitch))} is outside the window; stay between its ends.`
        : null,
  }
}

export function useWindowCycle() {
  const windowOf = (): { low: number; high: number } => drill.settings.value
  const drill = useDrill<'cycle', CycleQuestion, PickedCell>(cycleDrill, {
    ...LOCATE_ANSWERS,
    grader: ({ neck }) => cycleGrader(neck),
    problem: () => cycleWindow.problem.value,
    prepare: async ({ settings }) => {
      picker.stop()
      const options = cycleOptions(settings)
      const from = positionAfter(options, await stops.lastStop())
      const { questions } = cycleSession(options, from, settings.questionCount)
      // no count = a whole round of the cycle, a known length
      return { questions, limits: { ...limitsOf(settings), openEnded: false } }
    },
    afterStart: ({ settings }) => {
      if (settings.click) drill.sound.startClick(settings.tempo)
    },
    autoAdvanceMs: 400,
    play: playRules(windowOf),
  })

  const { neck, settings, session, sound } = drill
  const cycleWindow = useCycleWindow(settings, neck)
  const picker = useWindowPicker(settings)
  const records = computed(() => session.state.value?.records)
  const stops = useCycleStop(settings, drill.plan.planItemId, records)
  watch(session.status, (status) => {
    if (status === 'finished' || status === 'ready') sound.stopClick()
  })
  onBeforeUnmount(() => sound.stopClick())
  const previous = computed(() => {
    const state = session.state.value
    return !state || state.index === 0 ? null : (state.questions[state.index - 1] ?? null)
  })
  const marks = computed<CellMark[]>(() =>
    session.current.value
      ? [
          ...cycleWindow.shading.value,
          ...currentPickMarks(session, questionKeyed(neck.value, session.current.value), (q) =>
            toUnicode(q.name),
          ),
          ...drill.take.marks.value,
        ]
      : [...cycleWindow.shading.value, ...picker.marks.value],
  )
  /** "F major, note 3": where the next session continues, when not at the start key's first note. */
  const continuesAt = computed(() => {
    const options = cycleWindow.cycle.value.error ? null : cycleOptions(settings.value)
    const from = options && positionAfter(options, stops.current.value)
    if (!options || !from) return null
    const tonic = toUnicode(options.tonics[from.keyIndex] ?? '')
    const note = from.noteIndex === 0 ? '' : `, note ${from.noteIndex + 1}`
    return `${tonic} ${settings.value.scale}${note}`
  })
  return { ...drill, ...cycleWindow, picker, previous, marks, stops, continuesAt }
}
