// Calibration arithmetic (pure): the noise gate from a quiet room, and the output→input latency
// from clicks played against the onsets heard back (through the speakers, or tapped along).

/** The noise gate (dBFS, peak) before a quiet room has been measured. */
export const DEFAULT_GATE_DB = -60
/** Seconds of quiet room the noise gate is measured from. */
export const QUIET_ROOM_S = 2
/** The gate sits this far above the loudest noise heard. */
const GATE_HEADROOM_DB = 6
export const GATE_FLOOR_DB = -70
/** Above this the room (or the input gain) is too loud to play in. */
export const GATE_CEILING_DB = -20

/**
 * The noise gate (dBFS, peak) from the peak levels read in a quiet room: the 95th percentile plus
 * 6 dB, no lower than −70 dBFS. `tooLoud` when it would be above −20 dBFS.
 * @example noiseGate([-62, -60, -61]) // { gateDb: -54, tooLoud: false }
 */
export function noiseGate(peaksDb: readonly number[]): { gateDb: number; tooLoud: boolean } {
  if (peaksDb.length === 0) throw new RangeError('No level was read: is the input working?')
  const sorted = [...peaksDb].sort((a, b) => a - b)
  const loud = sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.95))] ?? -120
  const gateDb = Math.max(GATE_FLOOR_DB, loud + GATE_HEADROOM_DB)
  return { gateDb: Math.min(gateDb, GATE_CEILING_DB), tooLoud: gateDb > GATE_CEILING_DB }
}

/** Onsets further than this from every click are something else (a cough, a bump). */
const MAX_LATENCY_MS = 400
/** A tap along may land a little before the click it answers. */
const EARLY_MS = 100
/** Fewer matched clicks than this is no measurement. */
export const MIN_MATCHED_CLICKS = 4

/**
 * Output→input latency: each click is matched with the first onset from 100 ms before it to 400 ms
 * after it (and before the next click); the latency is the median distance (never below 0). Null
 * when fewer than four clicks were heard. Times in ms on one clock (the audio context's).
 * @example measureLatency([0, 500, 1000, 1500], [41, 540, 1043, 1538]) // { latencyMs: 40.5, matched: 4, spreadMs: 5 }
 */
export function measureLatency(
  clicksMs: readonly number[],
  onsetsMs: readonly number[],
): { latencyMs: number; matched: number; spreadMs: number } | null {
  const distances: number[] = []
  clicksMs.forEach((click, k) => {
    const next = clicksMs[k + 1] ?? Infinity
    const last = Math.min(next - EARLY_MS, click + MAX_LATENCY_MS)
    const heard = onsetsMs.find((onset) => onset >= click - EARLY_MS && onset < last)
    if (heard !== undefined) distances.push(heard - click)
  })
  if (distances.length < MIN_MATCHED_CLICKS) return null
  distances.sort((a, b) => a - b)
  const middle = distances.length / 2
  const median =
    distances.length % 2
      ? (distances[Math.floor(middle)] ?? 0)
      : ((distances[middle - 1] ?? 0) + (distances[middle] ?? 0)) / 2
  const spreadMs = (distances.at(-1) ?? 0) - (distances[0] ?? 0)
  return { latencyMs: Math.max(0, median), matched: distances.length, spreadMs }
}
