// Chord Tones on the page: the progression's chords as arpeggios, the area (position or window)
// shaded on the board, a played note answered at its place, and sessions that continue the
// progression where the last one stopped.
import { computed } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import type { ChordsSettings } from '../../contract/drills'
import { toUnicode } from '../../theory'
import { foundCells, placeOfPitch } from '../engine/heard-pitch'
import type { PickedCell } from '../engine/locate'
import { currentPickMarks } from '../engine/locate-marks'
import { useDrill } from '../engine/useDrill'
import type { DrillNeck } from '../engine/useDrillNeck'
import { chordsGrader } from './chords-grader'
import { chordsSession, type ChordsQuestion } from './chords-generator'
import { chordsDrill } from './definition'
import { nextChordOf, saveNextChord } from './progression-place'

// Every place on the neck inside the position or the window.
export function areaMarks(neck: DrillNeck, settings: ChordsSettings): CellMark[] {
  const inside = (pitch: number, fret: number) =>
    settings.area === 'position'
      ? fret >= settings.lowFret && fret <= settings.highFret
      : pitch >= settings.low && pitch <= settings.high
  return neck.tuning.flatMap((open, string) =>
    Array.from({ length: neck.frets + 1 }, (_, fret) => ({ string, fret }))
      .filter(({ fret }) => inside(open + fret, fret))
      .map(({ string, fret }): CellMark => ({ string, fret, kind: 'highlight' })),
  )
}

// Why the whole progression cannot be played here (a chord without its bass tone), or null.
function planProblem(settings: ChordsSettings, neck: DrillNeck): string | null {
  if (settings.area === 'position' && settings.highFret > neck.frets)
    return `This instrument has ${neck.frets} frets; choose a position up to fret ${neck.frets}.`
  try {
    chordsSession({ ...settings, questionCount: null }, neck.tuning)
    return null
  } catch (error) {
    if (error instanceof RangeError) return error.message
    throw error
  }
}

export function useChordTones() {
  const drill = useDrill<'chords', ChordsQuestion, PickedCell>(chordsDrill, {
    picked: (cell) => cell,
    // A microphone hears the pitch, not the string: place it nearest the position.
    heard: (pitch, _question, { neck, settings, picks }) =>
      placeOfPitch(neck, pitch, { string: 0, fret: settings.lowFret }, foundCells(picks)),
    grader: ({ neck }) => chordsGrader(neck),
    problem: ({ settings, neck }) => planProblem(settings, neck),
    prepare: ({ settings, neck }) => {
      const plan = chordsSession(settings, neck.tuning, nextChordOf(settings))
      saveNextChord(settings, plan.next)
      return { questions: plan.questions }
    },
    autoAdvanceMs: 400,
  })
  const { neck, settings, session } = drill
  const shading = computed(() => areaMarks(neck.value, settings.value))
  const marks = computed<CellMark[]>(() => [
    ...shading.value,
    ...currentPickMarks(session, neck.value, (q) => toUnicode(q.name)),
    ...drill.take.marks.value,
  ])
  /** The current chord's arpeggio and where the player is in it. */
  const arpeggio = computed(() => {
    const current = session.current.value
    return current ? { names: current.arpeggio, at: current.toneIndex } : { names: [], at: 0 }
  })
  /** The chord after the current one, so the player can look ahead as on a lead sheet. */
  const nextChord = computed(() => {
    const current = session.current.value
    const questions = session.state.value?.questions ?? []
    if (!current) return null
    return questions.find((q) => q.chordIndex === current.chordIndex + 1)?.chord ?? null
  })
  return { ...drill, shading, marks, arpeggio, nextChord }
}
