// The "play" input mode of a drill: the click's settings (tempo on a ladder, tolerance), and every
// note heard turned into answers — one note per question, or a whole take (a run, a sequence, a
// key) lined up with its notes when the take ends (its last note, a silence, or "Done").
import { computed, ref, shallowRef, type Ref } from 'vue'
import { pitchName } from '../../theory'
import { savedPlaySettings, savePlaySettings } from './play-settings'
import {
  alignTake,
  beatOffsets,
  isCleanTake,
  nextTempo,
  takeEvenness,
  type BeatGrid,
  type BeatOffset,
  type Evenness,
  type TakeEntry,
  type TakeNote,
} from './play-take'
import { missingGrade, playedGrade, playedMatch, takeMarks, type PlayRules } from './played-grade'
import type { AttemptDetail, DrillGrader, DrillQuestion, Grade } from './types'
import type { DrillNeck } from './useDrillNeck'
import type { DrillSession } from './useDrillSession'

/** A take ends this long after its last note when it is not complete by then. */
export const TAKE_SILENCE_MS = 2500
/** A take ends once this many notes more than asked were heard. */
const MAX_EXTRA_NOTES = 4

export interface GradedTake<Q extends DrillQuestion = DrillQuestion> {
  questions: readonly Q[]
  entries: TakeEntry[]
  evenness: Evenness | null
  /** Each note heard against the beat; null without the click. */
  offsets: BeatOffset[] | null
  clean: boolean
  /** The click's tempo during the take (null without the click); the ladder's next rung follows. */
  bpm: number | null
}

interface PlayTakeOptions<Q extends DrillQuestion, A> {
  session: DrillSession<Q, A>
  rules: PlayRules<Q>
  neck: Ref<DrillNeck>
  heard(pitch: number, question: Q, picks: readonly Grade[]): A | null
  /** The settings in words, stored with a clean take's tempo ("C major, frets 2–5"). */
  settingsLabel(): string
}

/** The click: on or off, its tempo, the tolerance around the beat, its beat grid while it runs. */
export function usePlayClock(drill: string) {
  const saved = savedPlaySettings(drill)
  const clock = {
    click: ref(saved.click),
    bpm: ref(saved.bpm),
    toleranceMs: ref(saved.toleranceMs),
    clickVolume: ref(saved.clickVolume),
    grid: shallowRef<BeatGrid | null>(null),
    /** The fastest tempo of a clean take this visit. */
    fastestClean: ref<number | null>(null),
  }
  const save = () =>
    savePlaySettings(drill, {
      click: clock.click.value,
      bpm: clock.bpm.value,
      toleranceMs: clock.toleranceMs.value,
      clickVolume: clock.clickVolume.value,
    })
  return { ...clock, save }
}
export type PlayClock = ReturnType<typeof usePlayClock>

/** Grading played notes: one note alone, or a take lined up and settled question by question. */
function takeGrading<Q extends DrillQuestion, A>(options: PlayTakeOptions<Q, A>, clock: PlayClock) {
  const { session, rules } = options
  const match = playedMatch(rules)

  const timingOf = (note: TakeNote, spreadMs?: number): AttemptDetail => {
    const grid = clock.grid.value
    if (!grid) return {}
    const [offset] = beatOffsets([note.onsetMs], grid, clock.toleranceMs.value)
    const detail: AttemptDetail = { tempo: clock.bpm.value, beatMs: offset!.offsetMs }
    if (spreadMs !== undefined) detail.spreadMs = spreadMs
    return detail
  }

  const gradeOf =
    (note: TakeNote, previous: TakeNote | null, extra: AttemptDetail) =>
    (grader: DrillGrader<Q, A>, question: Q, picks: readonly Grade[]) =>
      playedGrade({
        ...{ grader, question, picks, note, previous, rules, extra },
        given: options.heard(note.pitch, question, picks),
        accidentals: options.neck.value.accidentals,
      })

  function gradeTake(questions: Q[], heard: TakeNote[]): GradedTake<Q> {
    const entries = alignTake(questions.length, heard, (i, h, p) => match(questions[i]!, h, p))
    const grid = clock.grid.value
    const onsets = heard.map((n) => n.onsetMs)
    const offsets = grid ? beatOffsets(onsets, grid, clock.toleranceMs.value) : null
    const played = entries.flatMap((e) =>
      e.kind === 'right' || e.kind === 'wrong' ? [e.heard.onsetMs] : [],
    )
    const bpm = grid ? clock.bpm.value : null
    const clean = isCleanTake(entries, offsets)
    return { questions, entries, evenness: takeEvenness(played), offsets, clean, bpm }
  }

  function settleMissing(question: Q, at: number | undefined) {
    const name = pitchName(question.expectedPitch, options.neck.value.accidentals)
    session.settle((g, q, picks) => missingGrade(g.reveal(q, picks), name), at)
  }

  function settleTake(take: GradedTake<Q>, heard: TakeNote[]) {
    let at = session.state.value?.shownAt ?? undefined
    const clean: AttemptDetail =
      take.clean && take.bpm !== null
        ? { cleanTempo: take.bpm, playedSettings: options.settingsLabel() }
        : {}
    for (const entry of take.entries) {
      if (entry.kind === 'extra') continue
      const question = take.questions[entry.index]!
      if (entry.kind === 'missing') settleMissing(question, at)
      else {
        const previous = heard[heard.indexOf(entry.heard) - 1] ?? null
        const timing = timingOf(entry.heard, take.evenness?.spreadMs)
        session.settle(gradeOf(entry.heard, previous, { ...timing, ...clean }), entry.heard.onsetMs)
        at = entry.heard.onsetMs
      }
      if (session.current.value === question) session.next(at)
    }
  }

  /** One note answers the current question (drills without passes). */
  const answerNote = (note: TakeNote) =>
    session.settle(gradeOf(note, null, timingOf(note)), note.onsetMs)

  return { match, gradeTake, settleTake, answerNote }
}

/** The questions of the pass now asked (from the current one to the pass's end). */
function passQuestions<Q extends DrillQuestion>(
  session: DrillSession<Q, unknown>,
  passOf: ((question: Q) => string) | undefined,
): Q[] {
  const state = session.state.value
  const first = session.current.value
  if (!state || !first || !passOf) return []
  const rest = state.questions.slice(state.index)
  const end = rest.findIndex((q) => passOf(q) !== passOf(first))
  return end < 0 ? [...rest] : rest.slice(0, end)
}

/** Whether the notes heard so far end the take: its last note played, or too many extra. */
function takeEnded<Q extends DrillQuestion>(
  questions: readonly Q[],
  heard: readonly TakeNote[],
  match: (question: Q, heard: TakeNote, previous: TakeNote | null) => boolean,
) {
  const last = questions[questions.length - 1]
  const note = heard[heard.length - 1]
  if (heard.length >= questions.length + MAX_EXTRA_NOTES) return true
  return (
    heard.length >= questions.length &&
    !!last &&
    !!note &&
    match(last, note, heard[heard.length - 2] ?? null)
  )
}

export function usePlayTake<Q extends DrillQuestion, A>(
  options: PlayTakeOptions<Q, A>,
  clock: PlayClock,
) {
  const notes = ref<TakeNote[]>([])
  const last = shallowRef<GradedTake<Q> | null>(null)
  let silence: ReturnType<typeof setTimeout> | undefined
  const { session, rules } = options
  const grading = takeGrading(options, clock)
  const pass = () => passQuestions(session as DrillSession<Q, unknown>, rules.passOf)

  function finish() {
    clearTimeout(silence)
    const questions = pass()
    const heard = notes.value
    notes.value = []
    if (questions.length === 0 || session.status.value !== 'asking') return
    const take = grading.gradeTake(questions, heard)
    grading.settleTake(take, heard)
    last.value = take
    if (take.bpm !== null) climbLadder(clock, take)
  }

  /** A note heard in the "play" mode (ignored outside a question). */
  function hear(note: TakeNote) {
    if (session.status.value !== 'asking') return
    if (!rules.passOf) return grading.answerNote(note)
    notes.value = [...notes.value, note]
    clearTimeout(silence)
    if (takeEnded(pass(), notes.value, grading.match)) finish()
    else silence = setTimeout(finish, TAKE_SILENCE_MS)
  }

  const marks = computed(() => {
    const take = last.value
    return take && notes.value.length === 0
      ? takeMarks(take.entries, take.questions, options.neck.value)
      : []
  })
  const reset = () => {
    clearTimeout(silence)
    notes.value = []
    last.value = null
  }
  return { notes, last, hear, finish, marks, reset, takes: !!rules.passOf }
}
export type PlayTake = ReturnType<typeof usePlayTake>

/** The tempo ladder after a take with the click: a step up when clean, down when not. */
function climbLadder(clock: PlayClock, take: GradedTake) {
  if (take.clean) clock.fastestClean.value = Math.max(clock.fastestClean.value ?? 0, take.bpm ?? 0)
  clock.bpm.value = nextTempo(clock.bpm.value, take.clean)
  clock.save()
}
