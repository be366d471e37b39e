// A chord reduced to its triad or played as a sixth chord, and its arpeggio inside a fret position.
import { parseChord, type ChordInfo } from './chord'
import { chordArpeggio, chordTonesInRegion, type PlacedChordTone } from './chord-place'

/**
 * How a chord is played in an arpeggio drill: its triad, major and minor chords as sixth chords,
 * or as written (sevenths).
 *
 * @example
 * const size: ChordSize = 'triad'
 */
export type ChordSize = 'triad' | 'sixth' | 'seventh'

// The triad inside a chord, by its third and fifth above the root (common practice).
const TRIAD_SUFFIXES: Readonly<Record<string, string>> = {
  '1P 3M 5P': '',
  '1P 3m 5P': 'm',
  '1P 3m 5d': 'dim',
  '1P 3M 5A': 'aug',
  '1P 2M 5P': 'sus2',
  '1P 4P 5P': 'sus4',
}
// Major and minor chords as sixth chords (C6 for Cmaj7, Cm6 for Cm7), common practice.
const SIXTH_SUFFIXES: Readonly<Record<string, string>> = {
  major: '6',
  'major seventh': '6',
  minor: 'm6',
  'minor seventh': 'm6',
  'minor/major seventh': 'm6',
}

/**
 * The chord in the size asked for: 'triad' keeps root, third and fifth (Dm7 → Dm, Bm7b5 → Bdim),
 * 'sixth' plays major and minor chords as sixth chords (Cmaj7 → C6, Dm7 → Dm6; dominant and
 * diminished chords stay as written), 'seventh' keeps the chord. A chord without such a form is
 * returned as it is.
 *
 * @example
 * chordOfSize(parseChord('Bm7b5'), 'triad').symbol // 'Bdim'
 * chordOfSize(parseChord('Cmaj7'), 'sixth').tones.map((tone) => tone.name) // ['C', 'E', 'G', 'A']
 */
export function chordOfSize(chord: ChordInfo, size: ChordSize): ChordInfo {
  const intervals = chord.tones.map((tone) => tone.interval)
  const suffix =
    size === 'triad'
      ? TRIAD_SUFFIXES[intervals.slice(0, 3).join(' ')]
      : size === 'sixth'
        ? SIXTH_SUFFIXES[chord.type]
        : undefined
  return suffix === undefined ? chord : parseChord(`${chord.root}${suffix}`)
}

/**
 * A chord's arpeggio in a fret position: from the lowest pitch of its bass tone that the frets
 * [lowFret, highFret] hold, every chord-tone pitch they hold, ascending (a chord tone the position
 * does not hold is skipped). Throws a RangeError when the position holds no bass tone.
 *
 * @example
 * chordArpeggioInRegion(parseChord('Dm7'), { tuning: [28, 33, 38, 43], lowFret: 2, highFret: 6 }).map((tone) => tone.name) // ['D2', 'F2', 'A2', 'C3']
 */
export function chordArpeggioInRegion(
  chord: ChordInfo,
  region: { tuning: readonly number[]; lowFret: number; highFret: number },
): PlacedChordTone[] {
  const cells = chordTonesInRegion(chord, region)
  const pitches = [...new Set(cells.map((cell) => cell.pitch))].sort((a, b) => a - b)
  const start = pitches.find((pitch) => pitch % 12 === chord.bass.pitchClass)
  if (start === undefined) {
    throw new RangeError(
      `Frets ${region.lowFret}–${region.highFret} hold no ${chord.bass.name} to start ${chord.symbol} from; move or widen the position.`,
    )
  }
  const top = pitches.at(-1) ?? start
  return chordArpeggio(chord, { low: start, high: top }).filter((tone) =>
    pitches.includes(tone.pitch),
  )
}
