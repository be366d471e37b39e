// How a moment of a take reads: minutes, seconds and tenths ("1:05.3"), and where a pinned moment
// sits along the waveform (a share of the take's length, kept inside it).

/** "m:ss.t" for a moment in ms (tenths shown so close pins differ). */
export function momentText(ms: number): string {
  const tenths = Math.floor(Math.max(0, ms) / 100)
  const seconds = Math.floor(tenths / 10)
  return `${Math.floor(seconds / 60)}:${String(seconds % 60).padStart(2, '0')}.${tenths % 10}`
}

/** "m:ss" for a take's length in ms (rounded to the second). */
export function lengthText(ms: number): string {
  const seconds = Math.round(ms / 1000)
  return `${Math.floor(seconds / 60)}:${String(seconds % 60).padStart(2, '0')}`
}

/** The marker's place along the waveform as a CSS percentage (0–100). */
export function markerLeft(atMs: number, lengthMs: number): string {
  if (!(lengthMs > 0)) return '0%'
  return `${Math.min(100, Math.max(0, (atMs / lengthMs) * 100)).toFixed(2)}%`
}
