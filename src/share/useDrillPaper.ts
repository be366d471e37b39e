// The exercise a drill page shows on paper: before a session the one its settings make (a sample
// seed for Octave Scatter), while playing the part being played with the current note, and after it
// the whole session; with its PDF request and the body of a share link that makes it again.
import { computed, ref, type Ref } from 'vue'
import type { NewShare } from '../api/shares'
import type { DrillId } from '../contract/drills'
import type { DrillPageModel } from '../drills/engine/useDrill'
import type { DrillQuestion } from '../drills/engine/types'
import { newSeed } from '../drills/scatter/scatter-generator'
import { drillPaper, type DrillPaper, type SheetRequest } from './drill-paper'
import { exerciseFromQuestions } from './question-exercise'

type Shown =
  | { questions: readonly DrillQuestion[]; current: number | null; whole: boolean; error: null }
  | { questions: []; current: null; whole: false; error: string }

/** Every drill page's model carries its settings (useDrill's result); the frame's type leaves them out. */
type WithSettings = DrillPageModel & { settings?: Ref<never> }

/** Which questions are on paper now: the settings' (before), the part played (during), all (after). */
function shownOf(
  drill: DrillPageModel,
  paper: DrillPaper<DrillId, DrillQuestion> | null,
  settings: never,
  seed: number,
): Shown {
  const state = drill.session.state.value
  const status = drill.session.status.value
  if (!paper) return { questions: [], current: null, whole: false, error: 'No notation here.' }
  if (state && status !== 'ready' && status !== 'finished') {
    const questions = paper.segment(state.questions, state.index)
    const current = questions.indexOf(state.questions[state.index] as DrillQuestion)
    return { questions, current: current < 0 ? null : current, whole: false, error: null }
  }
  if (state && status === 'finished')
    return { questions: state.questions, current: null, whole: true, error: null }
  try {
    const questions = paper.questions(settings, drill.neck.value, { fingering: null, seed })
    return { questions, current: null, whole: true, error: null }
  } catch (error) {
    if (!(error instanceof RangeError)) throw error
    return { questions: [], current: null, whole: false, error: error.message }
  }
}

export function useDrillPaper(drill: DrillPageModel) {
  const paper = drillPaper(drill.definition.id as DrillId)
  const sampleSeed = ref(newSeed())
  const settings = computed(() => (drill as WithSettings).settings?.value as never)

  const shown = computed(() => shownOf(drill, paper, settings.value, sampleSeed.value))

  const title = computed(() => paper?.title(settings.value, shown.value.questions) ?? '')
  const exercise = computed(() => {
    const { questions } = shown.value
    if (!paper || questions.length === 0) return null
    return exerciseFromQuestions(questions, drill.neck.value, paper, title.value)
  })
  const sheet = computed((): SheetRequest | null =>
    paper && exercise.value
      ? paper.sheet(settings.value, drill.neck.value, shown.value.questions)
      : null,
  )
  const share = computed((): NewShare | null => {
    if (!paper || !exercise.value) return null
    const made = paper.share(settings.value, shown.value.questions, shown.value.whole)
    const { name, tuning, frets } = drill.neck.value
    return {
      preset: { drill: drill.definition.id, settings: made.settings } as NewShare['preset'],
      fingering: made.fingering,
      title: title.value.slice(0, 120),
      instrument: { name: name.slice(0, 60), tuning: [...tuning], frets },
    }
  })
  // While a session asks where notes are, the TAB would give the answers away.
  const showTab = computed(() => {
    const running = ['asking', 'feedback'].includes(drill.session.status.value)
    return !running || (paper?.tabWhilePlaying(settings.value) ?? true)
  })
  return {
    available: paper !== null,
    showTab,
    previewNote: computed(() =>
      drill.session.status.value === 'ready'
        ? (paper?.previewNote?.(settings.value) ?? null)
        : null,
    ),
    exercise,
    currentIndex: computed(() => shown.value.current),
    problem: computed(() => shown.value.error),
    sheet,
    share,
    /** A new sample sequence before a session (Octave Scatter draws one per session). */
    resample: () => (sampleSeed.value = newSeed()),
  }
}
