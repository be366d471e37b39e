// What the listening AudioWorklet and the page say to each other (pure: both sides import it).
import type { DetectorEvent } from './note-detector'

/** The name the processor is registered under. */
export const LISTENER_PROCESSOR = 'ambitus-listener'

/** What the processor is created with (processorOptions) and what a 'setup' message changes. */
export interface ListenerSetup {
  lowest: number
  highest: number
  referenceHz: number
  gateDb: number
}

export type ToWorklet = { type: 'gate'; gateDb: number } | ({ type: 'setup' } & ListenerSetup)

/** Tuner readings are posted at most this often (the page draws at about 30 frames a second). */
export const TUNER_EVERY_MS = 30

/**
 * An event with its times moved by `offsetMs`: the detector counts from its first sample, the
 * page wants the audio context's clock.
 * @example shiftEvent({ type: 'silence', timeMs: 10 }, 1000) // { type: 'silence', timeMs: 1010 }
 */
export function shiftEvent(event: DetectorEvent, offsetMs: number): DetectorEvent {
  if (event.type === 'note')
    return { ...event, onsetMs: event.onsetMs + offsetMs, verdictMs: event.verdictMs + offsetMs }
  return { ...event, timeMs: event.timeMs + offsetMs }
}
