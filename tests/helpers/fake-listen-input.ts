// A stand-in microphone for client tests (jsdom has no getUserMedia or AudioWorklet): install it
// with setListenInput(fake.input), then emit detector events as the worklet would, on an audio
// clock the test moves by hand.
import type { DetectorEvent } from '../../src/listen'
import {
  ListenError,
  type InputDevice,
  type ListenErrorCode,
  type ListenInput,
  type ListenSession,
} from '../../src/listen/browser'

export function fakeListenInput(
  devices: InputDevice[] = [{ deviceId: 'mic-1', label: 'USB interface' }],
) {
  const listeners = new Set<(event: DetectorEvent) => void>()
  const opened: Parameters<ListenInput['open']>[0][] = []
  const gates: number[] = []
  const ranges: unknown[] = []
  const clicks: number[][] = []
  let clock = 0
  let failure: ListenError | null = null
  let closed = 0

  const session = (deviceId: string): ListenSession => ({
    sampleRate: 48_000,
    deviceId,
    deviceLabel: devices.find((d) => d.deviceId === deviceId)?.label ?? 'Microphone',
    now: () => clock,
    toPerformanceMs: (ms) => ms,
    setGate: (gateDb) => void gates.push(gateDb),
    setRange: (range) => void ranges.push(range),
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
    playClicks(count, intervalMs, options) {
      const times = Array.from(
        { length: count },
        (_, k) => clock + (options?.leadMs ?? 300) + k * intervalMs,
      )
      clicks.push(times)
      return times
    },
    async close() {
      closed += 1
      listeners.clear()
    },
  })

  const input: ListenInput = {
    supported: true,
    devices: async () => devices,
    async open(options) {
      opened.push(options)
      if (options.deviceId && !devices.some((d) => d.deviceId === options.deviceId))
        throw new ListenError('no-device', 'That input is gone.')
      if (failure) throw failure
      return session(options.deviceId ?? devices[0]?.deviceId ?? 'default')
    },
  }

  return {
    input,
    opened,
    gates,
    ranges,
    clicks,
    closed: () => closed,
    listening: () => listeners.size > 0,
    failNextOpen(code: ListenErrorCode, message: string) {
      failure = new ListenError(code, message)
    },
    /** Sends an event to every subscriber, after moving the clock to its time. */
    emit(event: DetectorEvent) {
      clock = Math.max(clock, event.type === 'note' ? event.verdictMs : event.timeMs)
      ;[...listeners].forEach((listener) => listener(event))
    },
    /** Level readings every 50 ms for `ms` from now (what the worklet posts). */
    levels(ms: number, peakDb: number) {
      for (let t = 50; t <= ms; t += 50)
        this.emit({ type: 'level', timeMs: clock + 50, rmsDb: peakDb - 3, peakDb })
    },
  }
}
