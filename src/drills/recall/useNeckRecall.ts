// Neck Recall on the page: weak spots asked first (focus), the region clipped to the instrument,
// and the board's marks (each answered cell named, the asked one ringed).
import { computed } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import type { RecallSettings } from '../../contract/drills'
import { scaleLabel } from '../../contract/drills/fields'
import { nameInContext, toUnicode, type AccidentalPreference } from '../../theory'
import { useDrill, type DrillContext } from '../engine/useDrill'
import type { DrillNeck } from '../engine/useDrillNeck'
import type { useFocus } from '../engine/useFocus'
import { recallDrill } from './definition'
import { recallGrader } from './recall-grader'
import { clipRegion, recallQuestions, type RecallQuestion } from './recall-generator'

const regionOn = (settings: RecallSettings, neck: DrillNeck) =>
  clipRegion(settings.region, neck.tuning.length, neck.frets)

async function prepare(context: DrillContext<'recall'> & { focus: ReturnType<typeof useFocus> }) {
  const { neck, focus } = context
  const region = regionOn(context.settings, neck)
  const chosen = { ...context.settings, region }
  const weak = chosen.focus
    ? await focus.weakCells({
        drill: 'recall',
        instrumentId: neck.instrumentId,
        n: Math.min(chosen.questionCount ?? 24, 50),
        region,
      })
    : []
  const seed = Math.floor(Math.random() * 2 ** 31)
  const { tuning, accidentals } = neck
  const questions = recallQuestions({ tuning, settings: chosen, accidentals, seed, focus: weak })
  return { questions, remember: chosen }
}

/** A note played on the instrument names the asked cell when it has the cell's pitch class. */
function heardName(pitch: number, question: RecallQuestion, accidentals: AccidentalPreference) {
  const pitchClass = pitch % 12
  return pitchClass === question.expectedPitch % 12
    ? question.spelled
    : nameInContext(pitch, { prefer: accidentals, withOctave: false })
}

// Per answered cell, its latest answer: right (the name) or wrong (the right name, to learn it).
function answeredMarks(
  records: readonly { question: RecallQuestion; grade: { correct: boolean } }[],
) {
  const latest = new Map<string, CellMark>()
  for (const { question, grade } of records) {
    const kind = grade.correct ? 'correct' : 'wrong'
    latest.set(question.key, { ...question.cell, kind, label: toUnicode(question.spelled) })
  }
  return [...latest.values()]
}

export function useNeckRecall() {
  const drill = useDrill<'recall', RecallQuestion, string>(recallDrill, {
    grader: ({ settings, neck }) =>
      recallGrader({
        key: settings.spellInKey ? { tonic: settings.keyTonic, scale: settings.keyScale } : null,
        keyLabel: `${settings.keyTonic} ${scaleLabel(settings.keyScale)}`,
        accidentals: neck.accidentals,
      }),
    prepare,
    heard: (pitch, question, { neck }) => heardName(pitch, question, neck.accidentals),
    promptCell: (question) => question.cell,
  })
  const { session } = drill
  const marks = computed<CellMark[]>(() => {
    const answered = answeredMarks(session.state.value?.records ?? [])
    const current = session.current.value
    if (!current || session.status.value !== 'asking') return answered
    const { string, fret } = current.cell
    const others = answered.filter((mark) => mark.string !== string || mark.fret !== fret)
    return [...others, { ...current.cell, kind: 'target', label: '?' }]
  })
  const region = computed(() => regionOn(drill.settings.value, drill.neck.value))
  return { ...drill, region, marks }
}
