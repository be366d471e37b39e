// Chord symbols (via tonal's chord types): spelled chord tones with degrees, and inversions.
import { ChordType, Interval, Note } from 'tonal'
import { CHORD_SUFFIX_GLYPHS, CHORD_TYPES } from './chord-data'
import { pitchClassOf, toAscii } from './pitch'
import { accidentalsIn, MAX_ACCIDENTALS } from './scale-spelling'

/**
 * One tone of a chord: spelled pitch-class name, degree above the root ("1", "b3", "bb7", "#5"),
 * tonal's interval name and pitch class.
 *
 * @example
 * const third: ChordTone = { name: 'Eb', degree: 'b3', interval: '3m', pitchClass: 3 }
 */
export interface ChordTone {
  name: string
  degree: string
  interval: string
  pitchClass: number
}

/**
 * A parsed chord symbol: the root, the suffix as written on lead sheets, tonal's type name, its
 * tones from the root up (root position), and the bass tone with the inversion it makes (0 = root
 * position, 1 = third in the bass …).
 *
 * @example
 * parseChord('Am7/G') // { symbol: 'Am7/G', root: 'A', suffix: 'm7', type: 'minor seventh', tones: [...], bass: { name: 'G', degree: 'b7', ... }, inversion: 3 }
 */
export interface ChordInfo {
  symbol: string
  root: string
  suffix: string
  type: string
  tones: ChordTone[]
  bass: ChordTone
  inversion: number
}

const SYMBOL_PATTERN = /^([A-Ga-g])([#b]?)([^/]*?)(?:\/([A-Ga-g][#b]?))?$/

/**
 * The degree a chord interval names above the root: its number (an octave counts as 1), flats for
 * a minor or diminished interval, sharps for an augmented one ("3m" → "b3", "7d" → "bb7").
 *
 * @example
 * chordDegree('5d') // 'b5'
 * chordDegree('9M') // '9'
 */
export function chordDegree(interval: string): string {
  const { num, alt } = Interval.get(interval)
  const number = num === 8 ? 1 : num
  return `${(alt < 0 ? 'b' : '#').repeat(Math.abs(alt))}${number}`
}

function chordTypeOf(suffix: string, symbol: string) {
  const written = CHORD_SUFFIX_GLYPHS[suffix] ?? suffix
  const type = ChordType.get(written)
  if (type.empty) {
    throw new RangeError(`"${symbol}" is not a chord symbol; try C, Cm, C7, Cmaj7, Cm7b5 or Cdim7.`)
  }
  const known = CHORD_TYPES.find((entry) => entry.tonal === type.name)
  return { type, suffix: known?.suffix ?? written }
}

function tonesOf(root: string, intervals: readonly string[], symbol: string): ChordTone[] {
  return intervals.map((interval) => {
    const name = Note.transpose(root, interval)
    if (accidentalsIn(name) > MAX_ACCIDENTALS) {
      const other = Note.enharmonic(root)
      throw new RangeError(
        `${symbol} would need ${name}, more than a double accidental; write it on ${other} instead.`,
      )
    }
    return { name, degree: chordDegree(interval), interval, pitchClass: pitchClassOf(name) }
  })
}

/**
 * Parses a chord symbol — a root (letter with at most one ♯/♭), a suffix tonal knows (or Δ7, ⦰7)
 * and an optional slash bass that is one of the chord's tones — into spelled tones with degrees.
 * Throws a RangeError for an unknown symbol, a bass outside the chord, or a chord whose spelling
 * would need a triple accidental.
 *
 * @example
 * parseChord('Bbm7b5').tones.map((tone) => tone.name) // ['Bb', 'Db', 'Fb', 'Ab']
 * parseChord('Cdim7').tones.map((tone) => tone.degree) // ['1', 'b3', 'b5', 'bb7']
 * parseChord('C/E').inversion // 1
 */
export function parseChord(symbol: string): ChordInfo {
  const match = SYMBOL_PATTERN.exec(toAscii(symbol.trim()))
  if (!match) {
    throw new RangeError(`"${symbol}" is not a chord symbol; try C, Cm, C7, Cmaj7, Cm7b5 or Cdim7.`)
  }
  const [, letter = 'C', accidental = '', written = '', bassName] = match
  const root = `${letter.toUpperCase()}${accidental}`
  const { type, suffix } = chordTypeOf(written, symbol)
  const tones = tonesOf(root, type.intervals, symbol)
  const inversion = bassName === undefined ? 0 : bassIndex(tones, bassName, symbol)
  const bass = tones[inversion] ?? (tones[0] as ChordTone)
  const slash = inversion === 0 ? '' : `/${bass.name}`
  return {
    symbol: `${root}${suffix}${slash}`,
    root,
    suffix,
    type: type.name,
    tones,
    bass,
    inversion,
  }
}

function bassIndex(tones: readonly ChordTone[], bassName: string, symbol: string): number {
  const wanted = `${bassName.charAt(0).toUpperCase()}${bassName.slice(1)}`
  const index = tones.findIndex((tone) => tone.name === wanted)
  if (index === -1) {
    const names = tones.map((tone) => tone.name).join(' ')
    throw new RangeError(`In ${symbol} the bass ${wanted} is not a chord tone (${names}).`)
  }
  return index
}

/**
 * A chord with another of its tones in the bass: inversion 0 is root position, 1 puts the third
 * in the bass, 2 the fifth, 3 the seventh (common practice). Throws a RangeError past the last tone.
 *
 * @example
 * invertChord('G7', 3).symbol // 'G7/F'
 * chordFromBass(invertChord('G7', 3)).map((tone) => tone.name) // ['F', 'G', 'B', 'D']
 */
export function invertChord(chord: string | ChordInfo, inversion: number): ChordInfo {
  const info = typeof chord === 'string' ? parseChord(chord) : chord
  const bass = info.tones[inversion]
  if (!Number.isInteger(inversion) || bass === undefined) {
    throw new RangeError(
      `${info.symbol} has inversions 0 to ${info.tones.length - 1}; got ${String(inversion)}.`,
    )
  }
  const base = `${info.root}${info.suffix}`
  return { ...info, symbol: inversion === 0 ? base : `${base}/${bass.name}`, bass, inversion }
}

/**
 * The chord's tones from the bass up (the inversion's order).
 *
 * @example
 * chordFromBass(parseChord('C/G')).map((tone) => tone.degree) // ['5', '1', '3']
 */
export function chordFromBass(chord: ChordInfo): ChordTone[] {
  return [...chord.tones.slice(chord.inversion), ...chord.tones.slice(0, chord.inversion)]
}
