// Chord progressions to practise arpeggios through: ii–V–I around a cycle, 12-bar blues, own lists.
import { parseChord, type ChordInfo } from './chord'
import { cycleTonics } from './cycle'
import type { CycleId } from './cycle-data'
import { resolveScale } from './scale'

/**
 * Major (ii–V–I with maj7) or minor (iiø–V–i) progressions.
 *
 * @example
 * const quality: ProgressionQuality = 'minor'
 */
export type ProgressionQuality = 'major' | 'minor'

/**
 * One key's progression within a longer plan (e.g. one key of a ii–V–I cycle).
 *
 * @example
 * twoFiveOneCycle()[1] // { key: 'F', quality: 'major', chords: [Gm7, C7, Fmaj7] }
 */
export interface KeyProgression {
  key: string
  quality: ProgressionQuality
  chords: ChordInfo[]
}

function assertQuality(quality: string): void {
  if (quality !== 'major' && quality !== 'minor') {
    throw new RangeError(`"${quality}" is not a progression quality; use major or minor.`)
  }
}

// The key's scale degrees (1-based) as roots, spelled in the key.
function degreeRoots(key: string, quality: ProgressionQuality, degrees: readonly number[]) {
  const { names } = resolveScale(key, quality === 'major' ? 'major' : 'minor')
  return degrees.map((degree) => names[degree - 1] ?? '')
}

/**
 * The ii–V–I of a key with roots spelled in the key: major ii m7, V 7, I maj7; minor ii m7b5, V 7,
 * i m7 (common practice in jazz harmony).
 *
 * @example
 * twoFiveOne('Db').map((chord) => chord.symbol) // ['Ebm7', 'Ab7', 'Dbmaj7']
 * twoFiveOne('C', 'minor').map((chord) => chord.symbol) // ['Dm7b5', 'G7', 'Cm7']
 */
export function twoFiveOne(key: string, quality: ProgressionQuality = 'major'): ChordInfo[] {
  assertQuality(quality)
  const [two = '', five = '', one = ''] = degreeRoots(key, quality, [2, 5, 1])
  const suffixes = quality === 'major' ? ['m7', '7', 'maj7'] : ['m7b5', '7', 'm7']
  return [two, five, one].map((root, index) => parseChord(`${root}${suffixes[index] ?? ''}`))
}

/**
 * A ii–V–I in every key of a cycle (fourths by default, from C), each key spelled as the cycle
 * spells it for a major or a minor key (G# minor, not Ab minor).
 *
 * @example
 * twoFiveOneCycle({ quality: 'major' }).map((key) => key.key) // ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G']
 */
export function twoFiveOneCycle(
  options: { cycle?: CycleId; start?: string; quality?: ProgressionQuality } = {},
): KeyProgression[] {
  const quality = options.quality ?? 'major'
  assertQuality(quality)
  const keys = cycleTonics(options.cycle ?? 'fourths', {
    ...(options.start === undefined ? {} : { start: options.start }),
    scale: quality === 'major' ? 'major' : 'minor',
  })
  return keys.map((key) => ({ key, quality, chords: twoFiveOne(key, quality) }))
}

// Bars of the 12-bar blues as scale degrees: I I I I | IV IV I I | V IV I V (common practice).
const BLUES_BARS = [1, 1, 1, 1, 4, 4, 1, 1, 5, 4, 1, 5]

/**
 * A 12-bar blues in a key, one chord per bar: I7 I7 I7 I7 | IV7 IV7 I7 I7 | V7 IV7 I7 V7, with the
 * quick change (IV7 in bar 2) when asked; the minor blues uses i m7 and iv m7 (common practice).
 *
 * @example
 * twelveBarBlues('F').map((chord) => chord.symbol).join(' ') // 'F7 F7 F7 F7 Bb7 Bb7 F7 F7 C7 Bb7 F7 C7'
 */
export function twelveBarBlues(
  key: string,
  options: { quickChange?: boolean; quality?: ProgressionQuality } = {},
): ChordInfo[] {
  const quality = options.quality ?? 'major'
  assertQuality(quality)
  const bars = BLUES_BARS.map((degree, bar) => (bar === 1 && options.quickChange ? 4 : degree))
  const roots = degreeRoots(key, quality, [1, 4, 5])
  const suffix = (degree: number) => (quality === 'minor' && degree !== 5 ? 'm7' : '7')
  return bars.map((degree) => {
    const root = roots[[1, 4, 5].indexOf(degree)] ?? ''
    return parseChord(`${root}${suffix(degree)}`)
  })
}

/**
 * A teacher's own progression: chord symbols as a list or one text separated by spaces, commas or
 * bar lines. Throws a RangeError naming the first symbol that does not parse, or for an empty list.
 *
 * @example
 * customProgression('Am7 | D7 | Gmaj7').map((chord) => chord.root) // ['A', 'D', 'G']
 */
export function customProgression(symbols: readonly string[] | string): ChordInfo[] {
  const list = typeof symbols === 'string' ? symbols.split(/[\s,|]+/) : symbols
  const written = list.map((symbol) => symbol.trim()).filter((symbol) => symbol.length > 0)
  if (written.length === 0) throw new RangeError('A progression needs at least one chord.')
  return written.map((symbol, index) => {
    try {
      return parseChord(symbol)
    } catch (error) {
      if (!(error instanceof RangeError)) throw error
      throw new RangeError(`Chord ${index + 1} of the progression: ${error.message}`)
    }
  })
}
