// Pitch and frequency in 12-tone equal temperament: f = reference · 2^((m − 69) / 12).
import { assertPositive, MIDI_MAX, MIDI_MIN } from './guard'

/** Concert pitch: A4 = 440 Hz (ISO 16). @example CONCERT_A // 440 */
export const CONCERT_A = 440
const A4 = 69

function assertFinite(value: number, what: string): void {
  if (!Number.isFinite(value))
    throw new RangeError(`${what} must be a number; got ${String(value)}.`)
}

/**
 * The frequency in hertz of a MIDI pitch (fractions allowed, for cents) with A4 at `reference` Hz
 * (440 by default).
 *
 * @example
 * pitchToFrequency(69) // 440
 * pitchToFrequency(28) // 41.2034... (E1, the open low string of a bass)
 */
export function pitchToFrequency(pitch: number, reference = CONCERT_A): number {
  assertFinite(pitch, 'Pitch')
  assertPositive(reference, 'The reference frequency')
  return reference * 2 ** ((pitch - A4) / 12)
}

/**
 * The MIDI pitch of a frequency, as a fractional number (69.5 is a quarter tone above A4), with A4
 * at `reference` Hz (440 by default).
 *
 * @example
 * frequencyToPitch(55) // 33 (A1)
 */
export function frequencyToPitch(frequency: number, reference = CONCERT_A): number {
  assertPositive(frequency, 'Frequency')
  assertPositive(reference, 'The reference frequency')
  return A4 + 12 * Math.log2(frequency / reference)
}

/**
 * The nearest MIDI pitch to a frequency and how far off it is in cents (−50 to +50), e.g. to grade
 * a note heard through the microphone.
 *
 * @example
 * nearestPitch(446) // { pitch: 69, cents: 23.45... }
 */
export function nearestPitch(
  frequency: number,
  reference = CONCERT_A,
): { pitch: number; cents: number } {
  const exact = frequencyToPitch(frequency, reference)
  const pitch = Math.round(exact)
  if (pitch < MIDI_MIN || pitch > MIDI_MAX) {
    throw new RangeError(`${frequency} Hz is outside the MIDI range (about 8 Hz to 12.5 kHz).`)
  }
  return { pitch, cents: (exact - pitch) * 100 }
}
