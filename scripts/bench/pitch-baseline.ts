// The naive baseline for npm run bench:pitch: the strongest peak of a Hann-windowed, zero-padded
// FFT within the instrument's range (parabolic interpolation between bins), on the same frames.
import type { FrameAnalyser } from '../../src/listen'

/** In-place iterative radix-2 FFT of a power-of-two length. */
function fft(re: Float64Array, im: Float64Array): void {
  const n = re.length
  for (let i = 1, j = 0; i < n; i += 1) {
    let bit = n >> 1
    for (; j & bit; bit >>= 1) j ^= bit
    j ^= bit
    if (i < j) {
      ;[re[i], re[j]] = [re[j]!, re[i]!]
      ;[im[i], im[j]] = [im[j]!, im[i]!]
    }
  }
  for (let size = 2; size <= n; size <<= 1) {
    const step = (-2 * Math.PI) / size
    for (let start = 0; start < n; start += size)
      for (let k = 0; k < size / 2; k += 1) {
        const [c, s] = [Math.cos(step * k), Math.sin(step * k)]
        const [a, b] = [start + k, start + k + size / 2]
        const tr = re[b]! * c - im[b]! * s
        const ti = re[b]! * s + im[b]! * c
        re[b] = re[a]! - tr
        im[b] = im[a]! - ti
        re[a] = re[a]! + tr
        im[a] = im[a]! + ti
      }
  }
}

export function fftPeakAnalyser(
  sampleRate: number,
  limits: { lowHz: number; highHz: number },
): FrameAnalyser {
  return (frame) => {
    const size = 2 ** Math.ceil(Math.log2(frame.length * 2))
    const re = new Float64Array(size)
    const im = new Float64Array(size)
    frame.forEach((v, i) => (re[i] = v * (0.5 - 0.5 * Math.cos((2 * Math.PI * i) / frame.length))))
    fft(re, im)
    const magnitude = (k: number) => Math.hypot(re[k] ?? 0, im[k] ?? 0)
    const from = Math.max(1, Math.floor((limits.lowHz * size) / sampleRate))
    const to = Math.min(size / 2 - 1, Math.ceil((limits.highHz * size) / sampleRate))
    let best = from
    for (let k = from; k <= to; k += 1) if (magnitude(k) > magnitude(best)) best = k
    const [y0, y1, y2] = [magnitude(best - 1), magnitude(best), magnitude(best + 1)]
    const shift = y0 - 2 * y1 + y2 < 0 ? (0.5 * (y0 - y2)) / (y0 - 2 * y1 + y2) : 0
    const frequency = ((best + shift) * sampleRate) / size
    return y1 > 0 ? { frequency, clarity: 1 } : null
  }
}
