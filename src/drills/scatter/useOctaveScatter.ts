// Octave Scatter on the page: a seeded, displaced root-to-root scale shown and played; the student
// finds each note at its exact pitch; the summary's seed replays the same session.
import { computed, ref, watch } from 'vue'
import type { ScatterSettings } from '../../contract/drills'
import { instrumentRange, toUnicode, type PitchWindow } from '../../theory'
import { LOCATE_ANSWERS } from '../engine/heard-pitch'
import { keyed, type PickedCell } from '../engine/locate'
import { currentPickMarks } from '../engine/locate-marks'
import { useDrill } from '../engine/useDrill'
import { scatterDrill } from './definition'
import { scatterGrader } from './scatter-grader'
import { newSeed, scatterQuestions, type ScatterQuestion } from './scatter-generator'

export const SEQUENCE_BPM = 90

const octaveOf = (pitch: number) => Math.floor(pitch / 12)
/** The free variant: the asked pitch class, in another octave than the note played before it. */
export const inAnotherOctave = (asked: number, heard: number, previous: number | null) =>
  heard % 12 === asked % 12 && (previous === null || octaveOf(previous) !== octaveOf(heard))

// Settings made for another instrument may reach past this one's range: keep the window inside it.
function fitted(chosen: ScatterSettings, { low, high }: PitchWindow): ScatterSettings {
  const clip = (pitch: number | null) =>
    pitch === null ? null : Math.min(high, Math.max(low, pitch))
  return { ...chosen, low: clip(chosen.low), high: clip(chosen.high) }
}

export function useOctaveScatter() {
  const seed = ref<number | null>(null)
  /** Played freely: the scale in order, every note in another octave than the one before. */
  const freeOctaves = ref(false)
  /** A session starts with a new seed, or, given one, replays that session note for note. */
  const drill = useDrill<'scatter', ScatterQuestion, PickedCell, number>(scatterDrill, {
    ...LOCATE_ANSWERS,
    grader: ({ neck, settings }) => scatterGrader(keyed(neck, settings)),
    prepare: ({ settings, neck }, replaySeed) => {
      const chosen = fitted(settings, instrumentRange(neck.tuning, neck.frets))
      const sessionSeed = replaySeed ?? chosen.seed ?? newSeed()
      const questions = scatterQuestions(neck, chosen, sessionSeed)
      seed.value = sessionSeed
      return { questions, remember: { ...chosen, seed: null } }
    },
    autoAdvanceMs: 500,
    play: {
      passOf: (question) => String(question.sequence),
      matches: (question, heard, previous) =>
        freeOctaves.value
          ? inAnotherOctave(question.expectedPitch, heard.pitch, previous?.pitch ?? null)
          : heard.pitch === question.expectedPitch,
      wrongWhy: (question, heard) =>
        freeOctaves.value && heard.pitch % 12 === question.expectedPitch % 12
          ? 'The same octave as the note before: move each note to another octave.'
          : null,
    },
  })
  const { neck, settings, session, sound, focus } = drill
  const range = computed(() => instrumentRange(neck.value.tuning, neck.value.frets))
  watch(
    () => [neck.value.instrumentId, settings.value.scale] as const,
    ([instrumentId, scale]) =>
      void focus.suggestKeys({ drill: 'scatter', instrumentId, n: 1, scale }),
    { immediate: true },
  )
  /** The sequence the current note belongs to, for showing and playing. */
  const sequence = computed(() => {
    const current = session.current.value
    const questions = session.state.value?.questions ?? []
    return current ? questions.filter((q) => q.sequence === current.sequence) : []
  })
  const playSequence = () =>
    sound.playSequence(
      sequence.value.map((q) => q.expectedPitch),
      SEQUENCE_BPM,
    )
  const marks = computed(() => [
    ...currentPickMarks(session, keyed(neck.value, settings.value), (q) => toUnicode(q.name)),
    ...drill.take.marks.value,
  ])
  return { ...drill, range, seed, freeOctaves, sequence, playSequence, marks }
}
