// Note onsets from the amplitude envelope, so a repeated note counts again. Two envelopes, block by
// block (64 samples): the peak level, and the peak of the sample-to-sample difference, which the
// upper partials of a fresh pluck dominate (they die away first, so a re-pluck of a ringing string
// lifts it well above its recent minimum even when the level barely rises). Each envelope holds
// one period of the sounding note (of the lowest note before one is known), so it has no ripple.

export interface OnsetTrackerOptions {
  sampleRate: number
  /** Lowest frequency that can sound: the envelope holds one of its periods until told otherwise. */
  lowestHz: number
  /** Noise gate as a linear peak amplitude (0–1): quieter is silence. */
  gate: number
}

export interface BlockResult {
  /** Absolute sample index where a note starts, if one started in this block. */
  onset: number | null
  /** Envelope (peak) after this block, linear. */
  envelope: number
  /** True when the envelope has stayed below the gate for QUIET_MS. */
  quiet: boolean
}

export const ONSET_BLOCK = 64
/** Rise (×) of the level over its recent minimum that makes an onset: about +5 dB. */
const RISE = 1.8
/** Rise (×) of the difference envelope that makes an onset: about +8 dB. */
const BRIGHT_RISE = 2.5
/** How far back the recent minimum reaches. */
const LOOKBACK_MS = 40
/** The envelope holds at least this long, so block-to-block noise peaks do not look like rises. */
const MIN_HOLD_MS = 6
/** Two onsets closer than this are one attack. */
const REFRACTORY_MS = 80
const QUIET_MS = 40

export interface OnsetTracker {
  /** Feeds one block of ONSET_BLOCK samples that end at absolute index `end`. */
  block(samples: Float32Array, end: number): BlockResult
  setGate(gate: number): void
  /** The period (samples) of the note sounding now, or null for the lowest note's. */
  follow(period: number | null): void
}

/** A running maximum over the last `hold` blocks and a minimum of that over `lookback` blocks. */
function createEnvelope(maxHold: number, lookback: number) {
  const peaks = new Float32Array(maxHold)
  const history = new Float32Array(lookback)
  let count = 0
  return {
    /** Adds a block peak; returns [envelope, its minimum over the lookback before this block]. */
    add(peak: number, hold: number): [number, number] {
      peaks[count % maxHold] = peak
      let envelope = 0
      for (let k = 0; k < Math.min(hold, count + 1); k += 1)
        envelope = Math.max(envelope, peaks[(count - k + maxHold) % maxHold] ?? 0)
      let floor = count === 0 ? 0 : Infinity
      for (let k = 0; k < Math.min(count, lookback); k += 1)
        floor = Math.min(floor, history[k] ?? 0)
      history[count % lookback] = envelope
      count += 1
      return [envelope, floor]
    },
  }
}

export function createOnsetTracker(options: OnsetTrackerOptions): OnsetTracker {
  const toBlocks = (samples: number) => Math.max(1, Math.ceil(samples / ONSET_BLOCK))
  const msToBlocks = (ms: number) => toBlocks((ms * options.sampleRate) / 1000)
  const lowestHold = toBlocks((1.05 * options.sampleRate) / options.lowestHz)
  const minHold = msToBlocks(MIN_HOLD_MS)
  const lookback = msToBlocks(LOOKBACK_MS)
  const refractory = msToBlocks(REFRACTORY_MS)
  const quietBlocks = msToBlocks(QUIET_MS)
  const level = createEnvelope(lowestHold, lookback)
  const bright = createEnvelope(lowestHold, lookback)
  let hold = lowestHold
  let gate = options.gate
  let count = 0
  let lastOnset = -Infinity
  let quietFor = quietBlocks
  let previous = 0

  // The attack starts at the first sample of this block that rose past the old level.
  function attackStart(samples: Float32Array, end: number, floor: number): number {
    const threshold = Math.max(floor * 1.4, gate * 0.5)
    for (let i = 0; i < samples.length; i += 1)
      if (Math.abs(samples[i] ?? 0) > threshold) return end - samples.length + i
    return end - samples.length
  }

  return {
    setGate: (value) => void (gate = value),
    follow: (period) =>
      void (hold =
        period === null
          ? lowestHold
          : Math.min(lowestHold, Math.max(minHold, toBlocks(1.05 * period)))),
    block(samples, end) {
      let peak = 0
      let brightPeak = 0
      for (const value of samples) {
        peak = Math.max(peak, Math.abs(value))
        brightPeak = Math.max(brightPeak, Math.abs(value - previous))
        previous = value
      }
      const [envelope, floor] = level.add(peak, hold)
      const [brightness, brightFloor] = bright.add(brightPeak, hold)
      const rose = envelope >= RISE * floor || brightness >= BRIGHT_RISE * brightFloor
      let onset: number | null = null
      if (envelope >= gate && rose && count - lastOnset >= refractory) {
        onset = attackStart(samples, end, floor)
        lastOnset = count
      }
      count += 1
      quietFor = envelope < gate ? quietFor + 1 : 0
      return { onset, envelope, quiet: quietFor >= quietBlocks }
    },
  }
}
