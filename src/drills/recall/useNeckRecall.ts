// Neck Recall on the page: settings (remembered, or from a plan item), weak spots, the session and
// the marks on the board.
import { computed, ref } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { toUnicode } from '../../theory'
import { RecallSettingsSchema, type RecallSettings } from '../../contract/drills'
import { useFrameProps } from '../engine/frame-props'
import { saveSettings } from '../engine/remembered-settings'
import { limitsOf } from '../engine/session'
import { useDrillNeck, type DrillNeck } from '../engine/useDrillNeck'
import { attemptContext, useDrillSession } from '../engine/useDrillSession'
import { useDrillSettings } from '../engine/useDrillSettings'
import { useFocus } from '../engine/useFocus'
import { usePlanItem } from '../engine/usePlanItem'
import { recallGrader } from './recall-grader'
import { clipRegion, recallQuestions, type RecallQuestion } from './recall-generator'

export function defaultRecallSettings(neck: DrillNeck): RecallSettings {
  const region = {
    lowString: 0,
    highString: neck.tuning.length - 1,
    lowFret: 0,
    highFret: Math.min(5, neck.frets),
  }
  return RecallSettingsSchema.parse({ region })
}

// Per answered cell, its latest answer: right (the name) or wrong (the right name, to learn it).
function answeredMarks(
  records: readonly { question: RecallQuestion; grade: { correct: boolean } }[],
): CellMark[] {
  const latest = new Map<string, CellMark>()
  for (const { question, grade } of records) {
    latest.set(question.key, {
      ...question.cell,
      kind: grade.correct ? 'correct' : 'wrong',
      label: toUnicode(question.spelled),
    })
  }
  return [...latest.values()]
}

export function useNeckRecall() {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const plan = usePlanItem('recall')
  const focus = useFocus()
  const settings = useDrillSettings({
    drill: 'recall',
    neck,
    ready,
    planItem: plan.item,
    defaults: defaultRecallSettings,
  })
  const region = computed(() =>
    clipRegion(settings.value.region, neck.value.tuning.length, neck.value.frets),
  )
  const keyLabel = computed(() => `${settings.value.keyTonic} ${settings.value.keyScale}`)

  const session = useDrillSession<RecallQuestion, string>({
    drill: 'recall',
    grader: () =>
      recallGrader({
        spellInKey: settings.value.spellInKey,
        keyLabel: keyLabel.value,
        accidentals: neck.value.accidentals,
      }),
    context: attemptContext(neck, plan),
  })
  const starting = ref(false)

  async function begin() {
    starting.value = true
    const chosen = { ...settings.value, region: region.value }
    if (!plan.item.value) saveSettings('recall', chosen)
    const count = chosen.questionCount ?? 24
    const weak = chosen.focus
      ? await focus.weakCells({
          drill: 'recall',
          instrumentId: neck.value.instrumentId,
          n: Math.min(count, 50),
          region: region.value,
        })
      : []
    const seed = Math.floor(Math.random() * 2 ** 31)
    session.start(
      recallQuestions({
        tuning: neck.value.tuning,
        settings: chosen,
        accidentals: neck.value.accidentals,
        seed,
        focus: weak,
      }),
      limitsOf(chosen),
    )
    starting.value = false
  }

  const marks = computed<CellMark[]>(() => {
    const records = session.state.value?.records ?? []
    const current = session.current.value
    const answered = answeredMarks(records)
    if (!current || session.status.value !== 'asking') return answered
    const others = answered.filter(
      (mark) => mark.string !== current.cell.string || mark.fret !== current.cell.fret,
    )
    return [...others, { ...current.cell, kind: 'target', label: '?' }]
  })

  return {
    neck,
    instrumentError,
    settled,
    plan,
    focus,
    settings,
    region,
    keyLabel,
    session,
    starting,
    begin,
    marks,
    frame: useFrameProps(session, neck),
  }
}
