// Input checks shared by the theory core: each throws a RangeError a student or teacher can read.

/** Lowest MIDI note number (C-1). @example MIDI_MIN // 0 */
export const MIDI_MIN = 0
/** Highest MIDI note number (G9). @example MIDI_MAX // 127 */
export const MIDI_MAX = 127

/**
 * Throws a RangeError unless `value` is a whole number from `min` to `max`; `what` names the value
 * in the message, so the message can be shown to the user as it is.
 *
 * @example
 * assertWhole(25, 'Fret count', 1, 30) // passes
 * assertWhole(31, 'Fret count', 1, 30) // RangeError: Fret count must be a whole number from 1 to 30; got 31.
 */
export function assertWhole(value: number, what: string, min: number, max: number): void {
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(
      `${what} must be a whole number from ${min} to ${max}; got ${String(value)}.`,
    )
  }
}

/**
 * Throws a RangeError unless `pitch` is a MIDI note number (a whole number from 0 to 127).
 *
 * @example
 * assertPitch(60) // passes
 * assertPitch(128) // RangeError: Pitch must be a MIDI note number from 0 to 127; got 128.
 */
export function assertPitch(pitch: number, what = 'Pitch'): void {
  if (!Number.isInteger(pitch) || pitch < MIDI_MIN || pitch > MIDI_MAX) {
    throw new RangeError(
      `${what} must be a MIDI note number from ${MIDI_MIN} to ${MIDI_MAX}; got ${String(pitch)}.`,
    )
  }
}

/**
 * Throws a RangeError unless `value` is a finite number greater than zero.
 *
 * @example
 * assertPositive(34, 'Scale length') // passes
 * assertPositive(0, 'Scale length') // RangeError: Scale length must be a number greater than 0; got 0.
 */
export function assertPositive(value: number, what: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${what} must be a number greater than 0; got ${String(value)}.`)
  }
}
