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
import { cycleGrader } from './cycle-grader'
import { cycleQuestions, type CycleQuestion } from './cycle-generator'
import { cycleDrill } from './definition'
import { useCycleWindow } from './useCycleWindow'
import { useWindowPicker } from './useWindowPicker'

export function useWindowCycle() {
  const inWindow = (pitch: number): boolean =>
    pitch >= drill.settings.value.low && pitch <= drill.settings.value.high
  const drill = useDrill<'cycle', CycleQuestion, PickedCell>(cycleDrill, {
    ...LOCATE_ANSWERS,
    grader: ({ neck }) => cycleGrader(neck),
    problem: () => cycleWindow.problem.value,
    prepare: ({ settings }) => {
      picker.stop()
      const questions = cycleQuestions(
        cycleWindow.cycle.value.keys,
        settings.scale,
        settings.questionCount,
      )
      // no count = the whole cycle, a known length
      return { questions, limits: { ...limitsOf(settings), openEnded: false } }
    },
    afterStart: ({ settings }) => {
      if (settings.click) drill.sound.startClick(settings.tempo)
    },
    autoAdvanceMs: 400,
    play: {
      passOf: (question) => String(question.keyIndex),
      // played: the key's pitch class in order, in any octave inside the window
      matches: (question, heard): boolean =>
        heard.pitch % 12 === question.expectedPitch % 12 && inWindow(heard.pitch),
      wrongWhy: (question, heard) =>
        heard.pitch % 12 === question.expectedPitch % 12
          ? `${toUnicode(pitchName(heard.pitch))} is outside the window; stay between its ends.`
          : null,
    },
  })

  const { neck, settings, session, sound } = drill
  const cycleWindow = useCycleWindow(settings, neck)
  const picker = useWindowPicker(settings)
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
          ...currentPickMarks(session, neck.value, (q) => toUnicode(q.name)),
          ...drill.take.marks.value,
        ]
      : [...cycleWindow.shading.value, ...picker.marks.value],
  )
  return { ...drill, ...cycleWindow, picker, previous, marks }
}
