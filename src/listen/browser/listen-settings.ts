// What this browser remembers about listening: the chosen input, the noise gate from the quiet-room
// calibration and the measured output→input delay. Kept in localStorage: it belongs to this
// browser and its sound hardware, not to the player's account.
const KEY = 'ambitus.listen.v1'

export interface ListenSettings {
  deviceId: string | null
  /** Noise gate in dBFS, from the quiet-room calibration. */
  gateDb: number | null
  /** Output→input delay in ms, subtracted from onsets when timing against a click. */
  latencyMs: number | null
}

const EMPTY: ListenSettings = { deviceId: null, gateDb: null, latencyMs: null }

const numberIn = (value: unknown, low: number, high: number) =>
  typeof value === 'number' && value >= low && value <= high ? value : null

export function loadListenSettings(): ListenSettings {
  try {
    const raw = JSON.parse(localStorage.getItem(KEY) ?? '{}') as Record<string, unknown>
    return {
      deviceId: typeof raw.deviceId === 'string' ? raw.deviceId : null,
      gateDb: numberIn(raw.gateDb, -120, 0),
      latencyMs: numberIn(raw.latencyMs, 0, 1000),
    }
  } catch {
    return { ...EMPTY }
  }
}

export function saveListenSettings(patch: Partial<ListenSettings>): ListenSettings {
  const next = { ...loadListenSettings(), ...patch }
  try {
    localStorage.setItem(KEY, JSON.stringify(next))
  } catch {
    // private browsing without storage: the settings last for this page only
  }
  return next
}
