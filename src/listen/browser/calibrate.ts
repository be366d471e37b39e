// The two calibrations, run on an open session and timed by the audio clock (so they need no
// timers): the noise gate from QUIET_ROOM_S of a quiet room, and the output→input delay from
// clicks heard back through the microphone (speakers) or answered by muted plucks (headphones).
import { measureLatency, noiseGate, QUIET_ROOM_S } from '../calibration'
import type { DetectorEvent } from '../note-detector'
import { ListenError, type ListenSession } from './listen-input'

export type DelayMethod = 'speakers' | 'taps'

/** Clicks played for the delay measurement, and how far apart (ms). */
export const DELAY_CLICKS = 8
export const DELAY_INTERVAL_MS = 750
/** If the audio clock stops (a suspended tab), give up after this long (ms, wall clock). */
const STALL_MS = 20_000

/** Collects events until `done` says so (judged by the audio clock in the events themselves). */
function collect(
  session: ListenSession,
  done: (event: DetectorEvent) => boolean,
): Promise<DetectorEvent[]> {
  return new Promise((resolve, reject) => {
    const events: DetectorEvent[] = []
    const stall = setTimeout(() => {
      stop()
      reject(new ListenError('failed', 'No sound reached the page: is the input still connected?'))
    }, STALL_MS)
    const stop = session.subscribe((event) => {
      events.push(event)
      if (!done(event)) return
      clearTimeout(stall)
      stop()
      resolve(events)
    })
  })
}

const timeOf = (event: DetectorEvent) => (event.type === 'note' ? event.verdictMs : event.timeMs)

/** Listens to the quiet room for QUIET_ROOM_S and sets the session's gate from it. */
export async function calibrateQuietRoom(session: ListenSession) {
  const until = session.now() + QUIET_ROOM_S * 1000
  const events = await collect(session, (event) => timeOf(event) >= until)
  const result = noiseGate(events.flatMap((e) => (e.type === 'level' ? [e.peakDb] : [])))
  session.setGate(result.gateDb)
  return result
}

/**
 * Plays DELAY_CLICKS clicks and measures how late their onsets arrive: heard through the
 * speakers, or answered by the player plucking a muted string on each click (with headphones).
 * Null when fewer than four clicks were heard.
 */
export async function calibrateDelay(session: ListenSession, method: DelayMethod) {
  const volume = method === 'speakers' ? 0.5 : 0.25
  const clicksMs = session.playClicks(DELAY_CLICKS, DELAY_INTERVAL_MS, { volume })
  const until = (clicksMs.at(-1) ?? session.now()) + DELAY_INTERVAL_MS
  const events = await collect(session, (event) => timeOf(event) >= until)
  const onsets = events.flatMap((e) => (e.type === 'onset' ? [e.timeMs] : []))
  return measureLatency(clicksMs, onsets)
}
