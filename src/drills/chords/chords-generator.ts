// Chord Tones: the chords of a progression as played (the contract's playedChords) and, for each,
// its arpeggio from the lowest bass tone up through the position or window: a session's questions.
import {
  chordArpeggio,
  chordArpeggioInRegion,
  type ChordInfo,
  type KeyRef,
  type PlacedChordTone,
} from '../../theory'
import { playedChords, type ChordsSettings, type PlayedChord } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

export interface ChordsQuestion extends DrillQuestion {
  /** The chord symbol as played ("Dm7", "C6/E"). */
  chord: string
  chordType: string
  /** The degree above the root ("b3"). */
  degree: string
  /** Spelled as the chord spells it, with octave ("F2"). */
  name: string
  /** The progression's key (null for an own list). */
  keyRef: KeyRef | null
  /** Which chord of the session (0-based) and which note of its arpeggio. */
  chordIndex: number
  toneIndex: number
  /** The arpeggio's names (pitch classes) for the prompt, and the chord's tones. */
  arpeggio: string[]
  tones: { name: string; degree: string; pitchClass: number }[]
}

type Area = Pick<ChordsSettings, 'area' | 'lowFret' | 'highFret' | 'low' | 'high'>

/** The arpeggio of one chord: from its lowest bass tone up through the position or window. */
export function arpeggioIn(
  chord: ChordInfo,
  area: Area,
  tuning: readonly number[],
): PlacedChordTone[] {
  if (area.area === 'window') return chordArpeggio(chord, { low: area.low, high: area.high })
  return chordArpeggioInRegion(chord, { tuning, lowFret: area.lowFret, highFret: area.highFret })
}

function chordQuestions(played: PlayedChord, chordIndex: number, arpeggio: PlacedChordTone[]) {
  const { chord, key } = played
  const names = arpeggio.map((tone) => tone.tone.name)
  const tones = chord.tones.map(({ name, degree, pitchClass }) => ({ name, degree, pitchClass }))
  return arpeggio.map((tone, toneIndex): ChordsQuestion => ({
    key: `${chordIndex}:${toneIndex}`,
    expectedPitch: tone.pitch,
    cell: null,
    chord: chord.symbol,
    chordType: chord.type,
    degree: tone.degree,
    name: tone.name,
    keyRef: key,
    chordIndex,
    toneIndex,
    arpeggio: names,
    tones,
    detail: {
      chord: chord.symbol,
      chordType: chord.type,
      degree: tone.degree,
      inversion: chord.inversion,
      ...(key ? { key: key.tonic } : {}),
    },
  }))
}

export interface ChordsSessionPlan {
  questions: ChordsQuestion[]
  /** The chord of the progression the next session starts from. */
  next: number
}

/**
 * A session's questions: whole chords of the progression from chord `from` (wrapping round) until
 * at least `questionCount` notes, or every chord once when the count is null.
 */
export function chordsSession(
  settings: ChordsSettings,
  tuning: readonly number[],
  from = 0,
): ChordsSessionPlan {
  const chords = playedChords(settings)
  const questions: ChordsQuestion[] = []
  const start = ((from % chords.length) + chords.length) % chords.length
  let index = start
  for (let count = 0; count < chords.length; count += 1) {
    if (settings.questionCount !== null && questions.length >= settings.questionCount) break
    const played = chords[index] as PlayedChord
    questions.push(...chordQuestions(played, count, arpeggioIn(played.chord, settings, tuning)))
    index = (index + 1) % chords.length
  }
  return { questions, next: index }
}
