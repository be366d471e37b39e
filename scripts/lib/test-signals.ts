// Generated test signals for the pitch detector (unit tests and npm run bench:pitch): plucked
// harmonic tones, Karplus–Strong strings, glides, legato lines, white noise and mains hum.
// Frequencies are 12-TET from A4 = 440 Hz (ISO 16): f = 440 · 2^((m − 69) / 12).
import { createRandom } from '../../src/theory/random'

export const hz = (pitch: number, referenceHz = 440) => referenceHz * 2 ** ((pitch - 69) / 12)

export interface ToneOptions {
  sampleRate: number
  durationS: number
  /** Relative strength of the fundamental (1 = like the other partials; a bass often has less). */
  fundamental?: number
  partials?: number
  /** Seconds for the fundamental to fall by 1/e; upper partials fall faster. */
  decayS?: number
  seed?: number
}

/** A plucked note: 3 ms attack, partials 1/h with pluck-position notches, exponential decay. */
export function pluckedTone(pitch: number, options: ToneOptions): Float32Array {
  const { sampleRate, durationS, partials = 10, decayS = 0.8, fundamental = 1 } = options
  const random = createRandom(options.seed ?? pitch)
  const out = new Float32Array(Math.round(durationS * sampleRate))
  const f0 = hz(pitch)
  const pluckAt = 0.15 + 0.1 * random()
  for (let h = 1; h <= partials && h * f0 < sampleRate / 2.2; h += 1) {
    const amplitude = (Math.abs(Math.sin(Math.PI * h * pluckAt)) / h) * (h === 1 ? fundamental : 1)
    const phase = 2 * Math.PI * random()
    const decay = decayS / (1 + 0.4 * (h - 1))
    const step = (2 * Math.PI * h * f0) / sampleRate
    for (let i = 0; i < out.length; i += 1) {
      const t = i / sampleRate
      out[i] = (out[i] ?? 0) + amplitude * Math.sin(step * i + phase) * Math.exp(-t / decay)
    }
  }
  applyAttack(out, sampleRate, 0.003)
  return normalise(out, 0.5)
}

/**
 * A Karplus–Strong string: a noise burst in a delay line with a two-point average in the loop and
 * a first-order all-pass for the fraction of a sample, so the pitch is in tune.
 */
export function karplusStrong(pitch: number, options: ToneOptions): Float32Array {
  const { sampleRate, durationS } = options
  const random = createRandom(options.seed ?? pitch * 7)
  const out = new Float32Array(Math.round(durationS * sampleRate))
  const period = sampleRate / hz(pitch)
  // The average delays by half a sample; the all-pass makes up the rest of the fraction.
  const whole = Math.floor(period - 0.5 - 0.1)
  const fraction = period - 0.5 - whole
  const coefficient = (1 - fraction) / (1 + fraction)
  const line = new Float32Array(whole)
  let smooth = 0
  for (let i = 0; i < line.length; i += 1) {
    smooth = 0.5 * smooth + 0.5 * (random() * 2 - 1) // a softer pluck: low-passed noise
    line[i] = smooth
  }
  // A string has no DC: a short line's burst would otherwise sit on an offset.
  const mean = line.reduce((sum, v) => sum + v, 0) / line.length
  for (let i = 0; i < line.length; i += 1) line[i] = (line[i] ?? 0) - mean
  const loss = Math.exp(-period / (sampleRate * (options.decayS ?? 1.2)))
  let previous = 0
  let apIn = 0
  let apOut = 0
  for (let i = 0; i < out.length; i += 1) {
    const current = line[i % line.length] ?? 0
    const averaged = 0.5 * (current + previous) * loss
    previous = current
    apOut = coefficient * averaged + apIn - coefficient * apOut
    apIn = averaged
    line[i % line.length] = apOut
    out[i] = current
  }
  return normalise(out, 0.5)
}

/** One steady note whose pitch glides from `from` to `to` over `glideS`, starting at `atS`. */
export function glide(
  from: number,
  to: number,
  options: ToneOptions & { atS: number; glideS: number },
): Float32Array {
  return line([from, to], { ...options, switchS: [options.atS], glideS: options.glideS })
}

/**
 * Legato: one continuous tone (no new attack) that changes pitch at `switchS` (abruptly, or over
 * `glideS`), phase-continuous, with a slow decay — a hammer-on line, or a slide with a glide.
 */
export function line(
  pitches: number[],
  options: ToneOptions & { switchS: number[]; glideS?: number },
): Float32Array {
  const { sampleRate, durationS, glideS = 0 } = options
  const out = new Float32Array(Math.round(durationS * sampleRate))
  const weights = [1, 0.6, 0.45, 0.3, 0.2, 0.12]
  let phase = 0
  for (let i = 0; i < out.length; i += 1) {
    const t = i / sampleRate
    phase += (2 * Math.PI * hz(pitchAt(pitches, options.switchS, glideS, t))) / sampleRate
    let value = 0
    weights.forEach((w, h) => (value += w * Math.sin((h + 1) * phase)))
    out[i] = value * Math.exp(-t / (options.decayS ?? 3))
  }
  applyAttack(out, sampleRate, 0.003)
  return normalise(out, 0.5)
}

function pitchAt(pitches: number[], switches: number[], glideS: number, t: number): number {
  let pitch = pitches[0] ?? 60
  switches.forEach((at, k) => {
    const next = pitches[k + 1] ?? pitch
    if (t >= at + glideS) pitch = next
    else if (t > at) pitch = pitch + ((next - pitch) * (t - at)) / glideS
  })
  return pitch
}

/** Gaussian white noise with the given RMS (seeded). */
export function whiteNoise(length: number, rmsLevel: number, seed = 1): Float32Array {
  const random = createRandom(seed)
  const out = new Float32Array(length)
  for (let i = 0; i < length; i += 1) {
    const u = Math.max(random(), 1e-12)
    out[i] = rmsLevel * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random())
  }
  return out
}

/** Mains hum at 50 or 60 Hz with its 2nd and 3rd harmonic, at the given RMS. */
export function hum(length: number, sampleRate: number, mainsHz: number, rmsLevel: number) {
  const out = new Float32Array(length)
  const parts = [1, 0.5, 0.3]
  const norm = Math.sqrt(parts.reduce((sum, p) => sum + (p * p) / 2, 0))
  for (let i = 0; i < length; i += 1) {
    let value = 0
    parts.forEach(
      (p, h) => (value += p * Math.sin((2 * Math.PI * (h + 1) * mainsHz * i) / sampleRate)),
    )
    out[i] = (value / norm) * rmsLevel
  }
  return out
}

export function rms(samples: Float32Array, from = 0, to = samples.length): number {
  let sum = 0
  for (let i = from; i < to; i += 1) sum += (samples[i] ?? 0) ** 2
  return Math.sqrt(sum / Math.max(1, to - from))
}

/** Adds `source` × gain into `target` from sample `at` (in place); returns the target. */
export function mixInto(target: Float32Array, source: Float32Array, at = 0, gain = 1) {
  for (let i = 0; i < source.length && at + i < target.length; i += 1)
    target[at + i] = (target[at + i] ?? 0) + (source[i] ?? 0) * gain
  return target
}

/**
 * The signal with white noise at `snrDb` below its RMS over the first half second, plus hum of
 * the same RMS as the noise (a noisy room and an ungrounded cable).
 */
export function withNoise(
  signal: Float32Array,
  sampleRate: number,
  options: { snrDb: number; mainsHz: number; seed: number },
): Float32Array {
  const level =
    rms(signal, 0, Math.min(signal.length, sampleRate / 2)) * 10 ** (-options.snrDb / 20)
  const out = Float32Array.from(signal)
  mixInto(out, whiteNoise(out.length, level, options.seed))
  return mixInto(out, hum(out.length, sampleRate, options.mainsHz, level))
}

/** Silence of a given length followed by the signal (a note that starts later). */
export function delayed(signal: Float32Array, sampleRate: number, delayS: number): Float32Array {
  const out = new Float32Array(Math.round(delayS * sampleRate) + signal.length)
  return mixInto(out, signal, Math.round(delayS * sampleRate))
}

function applyAttack(samples: Float32Array, sampleRate: number, attackS: number) {
  const length = Math.round(attackS * sampleRate)
  for (let i = 0; i < length && i < samples.length; i += 1)
    samples[i] = (samples[i] ?? 0) * (i / length)
}

function normalise(samples: Float32Array, peak: number): Float32Array {
  let max = 0
  for (const v of samples) max = Math.max(max, Math.abs(v))
  if (max > 0)
    for (let i = 0; i < samples.length; i += 1) samples[i] = ((samples[i] ?? 0) / max) * peak
  return samples
}
