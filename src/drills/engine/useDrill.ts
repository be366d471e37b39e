// One drill on its page: the instrument it runs on, the plan item it may practise, its sound and
// settings, the session with its frame, and the ways an answer comes in — a pick on the board, or,
// in the "play" input mode, a note played on the instrument (answerPitch). A drill adds what is its
// own: the questions of a session, the grader, and the marks on the board.
import { computed, ref, type ComputedRef, type Ref } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import type { DrillId, DrillSettings } from '../../contract/drills'
import type { Position } from '../../theory'
import type { DrillDefinition } from '../drill-definition'
import { useFrameProps } from './frame-props'
import type { PickedCell } from './locate'
import { saveSettings } from './remembered-settings'
import { limitsOf, type SessionLimits } from './session'
import type { DrillGrader, DrillQuestion, Grade } from './types'
import { useDrillNeck, type DrillNeck } from './useDrillNeck'
import { attemptContext, useDrillSession } from './useDrillSession'
import { useDrillSettings } from './useDrillSettings'
import { silentSound, useDrillSound } from './useDrillSound'
import { useFocus } from './useFocus'
import { usePlanItem } from './usePlanItem'
import type { PlayRules } from './played-grade'
import { usePlayClock, usePlayTake, type PlayClock, type PlayTake } from './usePlayTake'

/**
 * How answers come in: 'tap' on the board (or the keyboard and note buttons), or 'play' on the
 * instrument itself, heard through the microphone. The microphone part (src/listen) switches the
 * mode and hands every detected note to `answerPitch`; the drills already grade such notes.
 */
export type InputMode = 'tap' | 'play'

/** When a played note began (performance.now()), so its response time is the player's, not the detector's. */
export interface NoteTiming {
  onsetMs: number
}

/** The settings and instrument of the moment. */
export interface DrillContext<D extends DrillId> {
  settings: DrillSettings[D]
  neck: DrillNeck
}

export interface PreparedSession<D extends DrillId, Q extends DrillQuestion> {
  questions: readonly Q[]
  /** Default: the question count and time limit of the settings. */
  limits?: SessionLimits
  /** What this browser remembers for the next visit (default: the settings). */
  remember?: DrillSettings[D]
}

/** What a drill adds to useDrill: its own part of a session. */
export interface DrillSetup<D extends DrillId, Q extends DrillQuestion, A, R = void> {
  grader(context: DrillContext<D>): DrillGrader<Q, A>
  /** The questions of a new session; a RangeError's message is shown on the setup card. */
  prepare(
    context: DrillContext<D> & { focus: ReturnType<typeof useFocus> },
    request?: R,
  ): PreparedSession<D, Q> | Promise<PreparedSession<D, Q>>
  /** A note played on the instrument as this drill's answer; null: it answers nothing. */
  heard(
    pitch: number,
    question: Q,
    context: DrillContext<D> & { picks: readonly Grade[] },
  ): A | null
  /** A pick on the board as this drill's answer (the drills answered on the board). */
  picked?(cell: PickedCell): A
  autoAdvanceMs?: number
  /** The cell a question names, shown in its prompt (Neck Recall, Range Runs); default none. */
  promptCell?(question: Q): Position | null
  /** Why these settings cannot start a session (shown on the setup card); null when they can. */
  problem?(context: DrillContext<D>): string | null
  onQuestion?(question: Q): void
  afterStart?(context: DrillContext<D>): void
  /** How notes played on the instrument are heard (default: one note per question, exact pitch). */
  play?: PlayRules<Q>
}

export function useDrill<D extends DrillId, Q extends DrillQuestion, A, R = void>(
  definition: DrillDefinition<D>,
  setup: DrillSetup<D, Q, A, R>,
) {
  const { neck, settled, instrumentError, plan, settings } = useDrillBase(definition)
  const context = (): DrillContext<D> => ({ settings: settings.value, neck: neck.value })
  const session = useDrillSession<Q, A>({
    drill: definition.id as D,
    grader: () => setup.grader(context()),
    context: attemptContext(neck, plan),
    autoAdvanceMs: setup.autoAdvanceMs,
    onQuestion: setup.onQuestion,
  })
  const startProblem = ref<string | null>(null)
  const problem = computed(() => startProblem.value ?? setup.problem?.(context()) ?? null)
  const clock = usePlayClock(definition.id)
  const take = usePlayTake<Q, A>(
    {
      session,
      neck,
      rules: setup.play ?? {},
      heard: (pitch, question, picks) => setup.heard(pitch, question, { ...context(), picks }),
      settingsLabel: () => definition.describe(settings.value as never).slice(0, 64),
    },
    clock,
  )
  const parts = {
    ...{ definition, neck, settled, instrumentError, plan, settings, session, problem },
    ...{ clock, take },
    focus: useFocus(),
    sound: definition.sound ? useDrillSound() : silentSound(),
    frame: useFrameProps(session, neck),
    starting: ref(false),
    startProblem,
    inputMode: ref<InputMode>('tap'),
  }
  return {
    ...parts,
    canStart: computed(() => !problem.value && !plan.isLoading.value),
    /** What every setup form takes: the instrument, and whether a plan item locks the settings. */
    setupProps: computed(() => ({ neck: neck.value, disabled: !!plan.item.value })),
    begin: (request?: R) => begin(parts, setup, context, request),
    /** An answer given on the page (a typed or picked note name); `at` is when it was given. */
    answer: (given: A, at?: number) => answerWith(parts, given, at),
    pick: (cell: PickedCell) => answerWith(parts, setup.picked?.(cell) ?? null, undefined, cell),
    /** A note played on the instrument: graded as the drill's play rules say (alone or in a take). */
    answerPitch: (pitch: number, timing: NoteTiming) =>
      take.hear({ pitch, onsetMs: timing.onsetMs }),
    promptCell: (question: Q) => setup.promptCell?.(question) ?? null,
  }
}

/** The instrument, the plan item and the settings (the plan item's, remembered, or the defaults). */
function useDrillBase<D extends DrillId>(definition: DrillDefinition<D>) {
  const { neck, ready, settled, error: instrumentError } = useDrillNeck()
  const id = definition.id as D
  const plan = usePlanItem(id)
  const settings = useDrillSettings({
    drill: id,
    neck,
    ready,
    planItem: plan.item,
    defaults: definition.defaults,
    fits: definition.fits,
  })
  return { neck, settled, instrumentError, plan, settings }
}

type Parts<D extends DrillId, Q extends DrillQuestion, A> = {
  definition: DrillDefinition<D>
  plan: ReturnType<typeof usePlanItem<D>>
  settings: Ref<DrillSettings[D]>
  session: ReturnType<typeof useDrillSession<Q, A>>
  focus: ReturnType<typeof useFocus>
  sound: ReturnType<typeof useDrillSound>
  starting: Ref<boolean>
  startProblem: Ref<string | null>
  take: { reset(): void }
}

/** Grades an answer of the current question (a pick is sounded, a played note is not). */
function answerWith<D extends DrillId, Q extends DrillQuestion, A>(
  parts: Parts<D, Q, A>,
  given: A | null,
  at?: number,
  picked?: PickedCell,
) {
  if (given === null || parts.session.status.value !== 'asking') return
  if (picked) parts.sound.play(picked.pitch)
  parts.session.answer(given, at)
}

/** Starts a session: sound unlocked while the questions are prepared, settings remembered (not a
 * plan item's). */
async function begin<D extends DrillId, Q extends DrillQuestion, A, R>(
  parts: Parts<D, Q, A>,
  setup: DrillSetup<D, Q, A, R>,
  context: () => DrillContext<D>,
  request?: R,
) {
  parts.startProblem.value = null
  parts.take.reset()
  if (setup.problem?.(context())) return
  parts.starting.value = true
  try {
    // the sound engine starts while the questions are prepared (most ask the API for weak spots)
    const [, prepared] = await Promise.all([
      parts.sound.unlock(),
      setup.prepare({ ...context(), focus: parts.focus }, request),
    ])
    const { settings } = context()
    if (!parts.plan.item.value) saveSettings(parts.definition.id, prepared.remember ?? settings)
    parts.session.start(prepared.questions, prepared.limits ?? limitsOf(settings))
    setup.afterStart?.(context())
  } catch (error) {
    if (!(error instanceof RangeError)) throw error
    parts.startProblem.value = error.message
    parts.session.reset()
  } finally {
    parts.starting.value = false
  }
}

export type Drill<D extends DrillId, Q extends DrillQuestion, A, R = void> = ReturnType<
  typeof useDrill<D, Q, A, R>
>

/** What the drill page frame needs of a drill (useDrill's result, with the drill's marks). */
export interface DrillPageModel<Q extends DrillQuestion = DrillQuestion> {
  definition: DrillDefinition
  neck: ComputedRef<DrillNeck>
  settled: ComputedRef<boolean>
  instrumentError: ComputedRef<Error | null>
  plan: ReturnType<typeof usePlanItem>
  focus: ReturnType<typeof useFocus>
  sound: ReturnType<typeof useDrillSound>
  session: Pick<ReturnType<typeof useDrillSession<Q, never>>, 'status' | 'current' | 'state'>
  frame: ReturnType<typeof useFrameProps>
  starting: Ref<boolean>
  problem: ComputedRef<string | null>
  canStart: ComputedRef<boolean>
  inputMode: Ref<InputMode>
  clock: PlayClock
  take: PlayTake
  answerPitch(pitch: number, timing: NoteTiming): void
  settings: Ref<{ questionCount?: number | null }>
  begin(): Promise<void>
  pick(cell: PickedCell): void
  promptCell(question: Q): Position | null
  marks: ComputedRef<CellMark[]>
}
