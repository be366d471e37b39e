// Pitch Hunt on the page: a pitch is played (and optionally named), the student finds it on the
// neck; weak spots are asked first.
import { computed } from 'vue'
import { notePitch } from '../drill-format'
import { LOCATE_ANSWERS } from '../engine/heard-pitch'
import { currentPickMarks } from '../engine/locate-marks'
import { useDrill, type DrillContext } from '../engine/useDrill'
import type { useFocus } from '../engine/useFocus'
import { huntDrill } from './definition'
import { huntGrader } from './hunt-grader'
import { huntQuestions, type HuntQuestion } from './hunt-generator'

async function prepare(context: DrillContext<'hunt'> & { focus: ReturnType<typeof useFocus> }) {
  const { neck, focus } = context
  const chosen = {
    ...context.settings,
    highFret: Math.min(context.settings.highFret, neck.frets),
  }
  const region = { lowFret: Math.min(chosen.lowFret, chosen.highFret), highFret: chosen.highFret }
  const n = Math.min(chosen.questionCount ?? 24, 50)
  const instrumentId = neck.instrumentId
  const weak = chosen.focus ? await focus.weakCells({ drill: 'hunt', instrumentId, n, region }) : []
  const seed = Math.floor(Math.random() * 2 ** 31)
  const { tuning, frets } = neck
  const questions = huntQuestions({ tuning, frets, settings: chosen, seed, focus: weak })
  return { questions, remember: chosen }
}

export function usePitchHunt() {
  const drill = useDrill<'hunt', HuntQuestion, ReturnType<typeof LOCATE_ANSWERS.picked>>(
    huntDrill,
    {
      ...LOCATE_ANSWERS,
      grader: ({ neck, settings }) => huntGrader(neck, settings.findAll),
      prepare,
      autoAdvanceMs: 900,
      onQuestion: (question) => drill.sound.play(question.expectedPitch),
    },
  )
  const { session, neck, sound } = drill
  // Without sound the pitch can only be read: show its name whatever the setting says.
  const showName = computed(() => drill.settings.value.showName || !sound.enabled.value)
  const replay = () => {
    const question = session.current.value
    if (question) sound.play(question.expectedPitch)
  }
  const marks = computed(() =>
    currentPickMarks(session, neck.value, (q) =>
      notePitch(q.expectedPitch, neck.value.accidentals),
    ),
  )
  return { ...drill, showName, replay, marks }
}
