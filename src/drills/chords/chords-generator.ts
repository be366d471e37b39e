// Chord Tones: the chords of a progression (shaped as triads, sixths or sevenths, inverted as asked)
// and, for each, its arpeggio from the lowest bass tone up through the position or window.
import {
  chordArpeggio,
  chordTonesInRegion,
  customProgression,
  invertChord,
  parseChord,
  twelveBarBlues,
  twoFiveOne,
  type ChordInfo,
  type KeyRef,
  type PlacedChordTone,
} from '../../theory'
import { progressionKeys, type ChordsSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

/** One chord of the progression as played, with the key it belongs to (null for an own list). */
export interface PlayedChord {
  chord: ChordInfo
  key: KeyRef | null
}

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

const keyRef = (key: string, quality: ChordsSettings['quality']): KeyRef => ({
  tonic: key,
  scale: quality === 'major' ? 'major' : 'minor',
})

/** The chords of the whole progression, in order (ii–V–I or blues in every key of the cycle). */
export function progressionChords(
  settings: Pick<ChordsSettings, 'progression' | 'quality' | 'cycle' | 'startKey' | 'customChords'>,
): PlayedChord[] {
  if (settings.progression === 'custom')
    return customProgression(settings.customChords).map((chord) => ({ chord, key: null }))
  const { quality } = settings
  return progressionKeys(settings).flatMap((key) => {
    const chords =
      settings.progression === 'blues' ? twelveBarBlues(key, { quality }) : twoFiveOne(key, quality)
    return chords.map((chord) => ({ chord, key: keyRef(key, quality) }))
  })
}

// The triad inside a chord, by its third and fifth above the root (common practice).
const TRIAD_SUFFIXES: Record<string, string> = {
  '1P 3M 5P': '',
  '1P 3m 5P': 'm',
  '1P 3m 5d': 'dim',
  '1P 3M 5A': 'aug',
  '1P 2M 5P': 'sus2',
  '1P 4P 5P': 'sus4',
}
// Major and minor chords played as sixth chords (C6 for Cmaj7, Cm6 for Cm7), common practice.
const SIXTH_SUFFIXES: Record<string, string> = {
  major: '6',
  'major seventh': '6',
  minor: 'm6',
  'minor seventh': 'm6',
  'minor/major seventh': 'm6',
}

/** The chord in the size asked for: its triad, sixth-chord form, or as written. */
export function shapeChord(chord: ChordInfo, size: ChordsSettings['size']): ChordInfo {
  const intervals = chord.tones.map((tone) => tone.interval)
  const suffix =
    size === 'triad'
      ? TRIAD_SUFFIXES[intervals.slice(0, 3).join(' ')]
      : size === 'sixth'
        ? SIXTH_SUFFIXES[chord.type]
        : undefined
  return suffix === undefined ? chord : parseChord(`${chord.root}${suffix}`)
}

const INVERSION_INDEX = { root: 0, first: 1, second: 2, third: 3 } as const

/** The chord with the inversion asked for; 'root' keeps a slash chord as written. */
export function invertAsAsked(
  chord: ChordInfo,
  inversion: ChordsSettings['inversion'],
  chordIndex: number,
): ChordInfo {
  if (inversion === 'root') return chord
  const size = chord.tones.length
  const wanted = inversion === 'rotate' ? chordIndex % size : INVERSION_INDEX[inversion]
  // A triad has no third inversion: it is played in root position.
  return invertChord(chord, wanted < size ? wanted : 0)
}

type Area = Pick<ChordsSettings, 'area' | 'lowFret' | 'highFret' | 'low' | 'high'>

/** The arpeggio of one chord: from its lowest bass tone up through the position or window. */
export function arpeggioIn(
  chord: ChordInfo,
  area: Area,
  tuning: readonly number[],
): PlacedChordTone[] {
  if (area.area === 'window') return chordArpeggio(chord, { low: area.low, high: area.high })
  const cells = chordTonesInRegion(chord, {
    tuning,
    lowFret: area.lowFret,
    highFret: area.highFret,
  })
  const pitches = [...new Set(cells.map((cell) => cell.pitch))].sort((a, b) => a - b)
  const start = pitches.findIndex((pitch) => pitch % 12 === chord.bass.pitchClass)
  if (start === -1) {
    throw new RangeError(
      `Frets ${area.lowFret}–${area.highFret} hold no ${chord.bass.name} to start ${chord.symbol} from; move or widen the position.`,
    )
  }
  return chordArpeggio(chord, { low: pitches[start] ?? 0, high: pitches.at(-1) ?? 0 }).filter(
    (tone) => pitches.includes(tone.pitch),
  )
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
  const chords = progressionChords(settings)
  const questions: ChordsQuestion[] = []
  const start = ((from % chords.length) + chords.length) % chords.length
  let index = start
  for (let count = 0; count < chords.length; count += 1) {
    if (settings.questionCount !== null && questions.length >= settings.questionCount) break
    const played = chords[index] as PlayedChord
    const chord = invertAsAsked(shapeChord(played.chord, settings.size), settings.inversion, index)
    questions.push(
      ...chordQuestions({ ...played, chord }, count, arpeggioIn(chord, settings, tuning)),
    )
    index = (index + 1) % chords.length
  }
  return { questions, next: index }
}
