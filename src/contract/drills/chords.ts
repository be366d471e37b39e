// Chord Tones' contract: the chord tones of each chord of a progression (ii–V–I or 12-bar blues
// around a cycle, or an own list of chord symbols), in a fret position or inside a pitch window.
import { z } from 'zod'
import {
  chordOfSize,
  customProgression,
  cycleTonics,
  invertChord,
  pitchName,
  toUnicode,
  twelveBarBlues,
  twoFiveOne,
  type ChordInfo,
  type KeyRef,
} from '../../theory'
import { defineDrillContract, type SettingsIssue } from './drill-contract'
import { DetailText, Fret, Length, Pitch, Tonic } from './fields'

export const CHORD_PROGRESSIONS = ['two-five-one', 'blues', 'custom'] as const
/** How each chord is played: as a triad, with major and minor sevenths as sixths, or as written. */
export const CHORD_SIZES = ['triad', 'sixth', 'seventh'] as const
/** Which chord tone starts each arpeggio: root position, an inversion, or the next one each chord. */
export const CHORD_INVERSIONS = ['root', 'first', 'second', 'third', 'rotate'] as const

export const ChordsSettingsSchema = Length.extend({
  progression: z.enum(CHORD_PROGRESSIONS).default('two-five-one'),
  quality: z.enum(['major', 'minor']).default('major'),
  cycle: z.enum(['fourths', 'fifths']).default('fourths'),
  startKey: Tonic.default('C'),
  /** The own list: chord symbols separated by spaces, commas or bar lines ("Am7 | D7 | Gmaj7"). */
  customChords: z.string().max(200).default(''),
  size: z.enum(CHORD_SIZES).default('seventh'),
  inversion: z.enum(CHORD_INVERSIONS).default('root'),
  /** Where the chord tones are played: a hand position (frets) or a low/high pitch window. */
  area: z.enum(['position', 'window']).default('position'),
  /** Five frets: on a neck in fourths they hold every pitch class, so every key has its root. */
  lowFret: Fret.default(2),
  highFret: Fret.default(6),
  low: Pitch.default(28),
  high: Pitch.default(43),
})
  .refine((s) => s.lowFret <= s.highFret, {
    path: ['highFret'],
    message: 'The position ends before it starts.',
  })
  .refine((s) => s.low < s.high, {
    path: ['high'],
    message: 'The low note must be below the high note.',
  })
export type ChordsSettings = z.infer<typeof ChordsSettingsSchema>

export const ChordsDetailSchema = z.strictObject({
  /** The chord symbol as played ("Dm7", "G7/F"). */
  chord: DetailText,
  /** tonal's chord type name ("minor seventh"): statistics are kept per chord type. */
  chordType: DetailText,
  /** The chord tone's degree above the root ("1", "b3", "5", "bb7"). */
  degree: DetailText,
  /** 0 = root position, 1 = third in the bass … */
  inversion: z.number().int().min(0).max(6),
  /** The key of the progression (absent for an own list). */
  key: DetailText.optional(),
  revealed: z.literal(true).optional(),
})

type KeyChoice = Pick<ChordsSettings, 'progression' | 'quality' | 'cycle' | 'startKey'>

/** The keys a ii–V–I or blues preset moves through, in order; none for an own list. */
export function progressionKeys(settings: KeyChoice): string[] {
  if (settings.progression === 'custom') return []
  const scale = settings.quality === 'major' ? 'major' : 'minor'
  return cycleTonics(settings.cycle, { start: settings.startKey, scale })
}

/** One chord of the progression as played, with the key it belongs to (null for an own list). */
export interface PlayedChord {
  chord: ChordInfo
  key: KeyRef | null
}

type ProgressionChoice = KeyChoice & Pick<ChordsSettings, 'customChords'>

/** The chords of the whole progression as written (ii–V–I or blues in every key of the cycle). */
export function progressionChords(settings: ProgressionChoice): PlayedChord[] {
  if (settings.progression === 'custom')
    return customProgression(settings.customChords).map((chord) => ({ chord, key: null }))
  const { quality } = settings
  const scale = quality === 'major' ? 'major' : 'minor'
  return progressionKeys(settings).flatMap((tonic) => {
    const chords =
      settings.progression === 'blues'
        ? twelveBarBlues(tonic, { quality })
        : twoFiveOne(tonic, quality)
    return chords.map((chord) => ({ chord, key: { tonic, scale } }))
  })
}

const INVERSION_INDEX = { root: 0, first: 1, second: 2, third: 3 } as const

/**
 * The chord with the inversion asked for (`index`: its place in the progression, for 'rotate');
 * 'root' keeps a slash chord as written; a triad has no third inversion and stays in root position.
 */
export function invertAsAsked(
  chord: ChordInfo,
  inversion: ChordsSettings['inversion'],
  index: number,
): ChordInfo {
  if (inversion === 'root') return chord
  const size = chord.tones.length
  const wanted = inversion === 'rotate' ? index % size : INVERSION_INDEX[inversion]
  return invertChord(chord, wanted < size ? wanted : 0)
}

/** The progression's chords as the settings play them: in their size and inversion. */
export function playedChords(
  settings: ProgressionChoice & Pick<ChordsSettings, 'size' | 'inversion'>,
): PlayedChord[] {
  return progressionChords(settings).map((played, index) => ({
    ...played,
    chord: invertAsAsked(chordOfSize(played.chord, settings.size), settings.inversion, index),
  }))
}

function keysOf(settings: KeyChoice): string[] {
  try {
    return progressionKeys(settings)
  } catch {
    return []
  }
}

// An own list must parse, so the student never meets an error.
function presetIssues(settings: ChordsSettings): SettingsIssue[] {
  if (settings.progression !== 'custom') return []
  try {
    customProgression(settings.customChords)
    return []
  } catch (error) {
    if (!(error instanceof RangeError)) throw error
    return [{ path: ['customChords'], message: error.message }]
  }
}

const PROGRESSION_WORDS: Record<ChordsSettings['progression'], string> = {
  'two-five-one': 'ii–V–I',
  blues: '12-bar blues',
  custom: 'own chords',
}

const INVERSION_WORDS: Record<ChordsSettings['inversion'], string> = {
  root: '',
  first: '1st inversion',
  second: '2nd inversion',
  third: '3rd inversion',
  rotate: 'inversions in turn',
}

function describe(s: ChordsSettings): string {
  const what =
    s.progression === 'custom'
      ? `chords ${toUnicode(s.customChords.trim())}`
      : `${s.quality} ${PROGRESSION_WORDS[s.progression]} from ${toUnicode(s.startKey)}, cycle of ${s.cycle}`
  const where =
    s.area === 'position'
      ? `frets ${s.lowFret}–${s.highFret}`
      : `window ${pitchName(s.low, 'flat')}–${pitchName(s.high, 'flat')}`
  const size = s.size === 'seventh' ? 'as written' : `${s.size}s`
  return [what, size, INVERSION_WORDS[s.inversion], where].filter(Boolean).join(', ')
}

export const chordsContract = defineDrillContract({
  id: 'chords',
  name: 'Chord Tones',
  settings: ChordsSettingsSchema,
  detail: ChordsDetailSchema,
  focus: { keys: false, regions: false },
  describe,
  keysOf,
  presetIssues,
})
