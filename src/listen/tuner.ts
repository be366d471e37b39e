// The tuner's arithmetic (pure): which open string a reading is nearest to and how far off it is,
// and a steadier reading from the last few frames.

/** A string is in tune within ±5 cents (about the smallest difference most players hear). */
export const IN_TUNE_CENTS = 5

export interface StringReading {
  /** Index into the tuning (0 = the lowest string). */
  string: number
  /** The open string's MIDI pitch. */
  target: number
  /** Cents from the open string's pitch (negative = flat); tuning pitches are 12-TET. */
  cents: number
  inTune: boolean
}

/**
 * The open string a reading (fractional MIDI pitch) is nearest to, and how many cents off; the
 * lower string on a tie. Null for an empty tuning.
 * @example nearestString([28, 33, 38, 43], 33.04) // { string: 1, target: 33, cents: 4, inTune: true }
 */
export function nearestString(tuning: readonly number[], pitch: number): StringReading | null {
  let best: number | null = null
  tuning.forEach((open, index) => {
    const distance = Math.abs(pitch - open)
    if (best === null || distance < Math.abs(pitch - (tuning[best] ?? 0))) best = index
  })
  if (best === null) return null
  const target = tuning[best] ?? 0
  const cents = (pitch - target) * 100
  return { string: best, target, cents, inTune: Math.abs(cents) <= IN_TUNE_CENTS }
}

/**
 * The median of recent readings (fractional MIDI pitches): one stray frame does not move the
 * needle. Null when there are none.
 * @example steadyPitch([33.01, 33.02, 45.0]) // 33.02
 */
export function steadyPitch(readings: readonly number[]): number | null {
  if (readings.length === 0) return null
  const sorted = [...readings].sort((a, b) => a - b)
  const middle = sorted.length >> 1
  return sorted.length % 2
    ? (sorted[middle] ?? null)
    : ((sorted[middle - 1] ?? 0) + (sorted[middle] ?? 0)) / 2
}
