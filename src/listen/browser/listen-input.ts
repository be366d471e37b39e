// The page's view of a microphone: choose an input, open it for listening, hear events. The Web
// Audio implementation (web-audio-input.ts) is loaded lazily; tests replace it (see index.ts).
import type { DetectorEvent } from '../note-detector'
import type { ListenerSetup } from '../worklet-messages'

export interface InputDevice {
  deviceId: string
  /** Empty until the player has allowed the microphone once (browsers hide names before). */
  label: string
}

export type ListenErrorCode = 'denied' | 'no-device' | 'unsupported' | 'failed'

/** Why listening could not start, in words a player can act on. */
export class ListenError extends Error {
  constructor(
    readonly code: ListenErrorCode,
    message: string,
  ) {
    super(message)
    this.name = 'ListenError'
  }
}

export interface ListenSession {
  readonly sampleRate: number
  /** The input that is open and what the browser calls it. */
  readonly deviceId: string
  readonly deviceLabel: string
  /** The audio clock (ms) every event's times are on. */
  now(): number
  /** An audio-clock time as a performance.now() time (to compare with other clocks). */
  toPerformanceMs(contextMs: number): number
  setGate(gateDb: number): void
  setRange(setup: Omit<ListenerSetup, 'gateDb'>): void
  /** Calls `listener` with every event (notes, onsets, level, tuner, silence); returns unsubscribe. */
  subscribe(listener: (event: DetectorEvent) => void): () => void
  /** Plays `count` short clicks `intervalMs` apart from `leadMs` on; returns their audio-clock times. */
  playClicks(
    count: number,
    intervalMs: number,
    options?: { leadMs?: number; volume?: number },
  ): number[]
  close(): Promise<void>
}

export interface ListenInput {
  /** Whether this browser can listen at all (microphone access and AudioWorklet). */
  readonly supported: boolean
  devices(): Promise<InputDevice[]>
  /** Asks for the microphone (echo cancellation, noise suppression, auto gain off) and listens. */
  open(options: ListenerSetup & { deviceId?: string | null }): Promise<ListenSession>
}
