// The one audio interface the app uses; the Tone.js implementation is loaded lazily and tests
// replace it with setPitchPlayer(fake).

export interface PitchPlayer {
  /** Unlocks audio; call from a user gesture (click, key press). */
  start(): Promise<void>
  /** Plays one MIDI pitch now (or after `delayS`), for `durationS` seconds. */
  play(pitch: number, options?: { durationS?: number; delayS?: number; velocity?: number }): void
  /** Plays pitches one after another at `bpm` quarter notes per minute. */
  playSequence(pitches: number[], bpm: number): void
  /** Starts or stops a metronome click at `bpm` (Tone.Transport). */
  startClick(bpm: number): void
  stopClick(): void
  /** The click's own volume (0..1), apart from the notes'. Optional. */
  setClickVolume?(volume: number): void
  setVolume(volume: number): void
  setReferenceHz(hz: number): void
  /** Picks the voice for an instrument (bass or guitar samples) from its open strings. Optional. */
  setTuning?(tuning: number[]): void
  /** Which voice is in use: rendered samples, or the synthesized fallback. */
  readonly voice: 'samples' | 'synth' | 'silent'
}
