// Pitch Hunt on the page: a pitch is played (and optionally named), the student finds it on the neck.
import { computed, ref } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { HuntSettingsSchema } from '../../contract/drills'
import { notePitch } from '../drill-format'
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
import { huntGrader } from './hunt-grader'
import { huntQuestions, type HuntQuestion } from './hunt-generator'

export function usePitchHunt() {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const plan = usePlanItem('hunt')
  const focus = useFocus()
  const sound = useDrillSound()
  const settings = useDrillSettings({
    drill: 'hunt',
    neck,
    ready,
    planItem: plan.item,
    defaults: () => HuntSettingsSchema.parse({}),
  })
  // Without sound the pitch can only be read: show its name whatever the setting says.
  const showName = computed(() => settings.value.showName || !sound.enabled.value)

  const session = useDrillSession<HuntQuestion, PickedCell>({
    drill: 'hunt',
    grader: () => huntGrader(neck.value, settings.value.findAll),
    context: attemptContext(neck, plan),
    autoAdvanceMs: 900,
    onQuestion: (question) => sound.play(question.expectedPitch),
  })
  const starting = ref(false)

  async function begin() {
    starting.value = true
    await sound.unlock()
    const chosen = {
      ...settings.value,
      highFret: Math.min(settings.value.highFret, neck.value.frets),
    }
    if (!plan.item.value) saveSettings('hunt', chosen)
    const count = chosen.questionCount ?? 24
    const region = { lowFret: Math.min(chosen.lowFret, chosen.highFret), highFret: chosen.highFret }
    const weak = chosen.focus
      ? await focus.weakCells({
          drill: 'hunt',
          instrumentId: neck.value.instrumentId,
          n: Math.min(count, 50),
          region,
        })
      : []
    const seed = Math.floor(Math.random() * 2 ** 31)
    session.start(
      huntQuestions({
        tuning: neck.value.tuning,
        frets: neck.value.frets,
        settings: chosen,
        seed,
        focus: weak,
      }),
      limitsOf(chosen),
    )
    starting.value = false
  }

  function pick(cell: PickedCell) {
    if (session.status.value !== 'asking') return
    sound.play(cell.pitch)
    session.answer(cell)
  }

  const replay = () => {
    const question = session.current.value
    if (question) sound.play(question.expectedPitch)
  }

  const marks = computed<CellMark[]>(() => {
    const question = session.current.value
    if (!question) return []
    return locateMarks({
      tuning: neck.value.tuning,
      accidentals: neck.value.accidentals,
      picks: session.state.value?.picks ?? [],
      answered: session.status.value === 'feedback',
      expectedLabel: notePitch(question.expectedPitch, neck.value.accidentals),
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
    showName,
    session,
    starting,
    begin,
    pick,
    replay,
    marks,
    frame: useFrameProps(session, neck),
  }
}
