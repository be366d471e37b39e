// The newcomer's first question, what they play: the instrument and tuning choices (as tuning
// presets), and whether this player still has to answer it.
import type { Instrument } from '@/api/instruments'

export interface FirstRunChoice {
  id: string
  label: string
  /** Tuning choices: preset ids with a short label; the first is standard tuning. */
  tunings: { presetId: string; label: string }[]
}

export const FIRST_RUN_CHOICES: FirstRunChoice[] = [
  {
    id: 'bass-4',
    label: '4-string bass',
    tunings: [
      { presetId: 'bass-4', label: 'Standard E A D G' },
      { presetId: 'bass-4-drop-d', label: 'Drop D' },
    ],
  },
  { id: 'bass-5', label: '5-string bass', tunings: [{ presetId: 'bass-5', label: 'B E A D G' }] },
  { id: 'bass-6', label: '6-string bass', tunings: [{ presetId: 'bass-6', label: 'B E A D G C' }] },
  {
    id: 'guitar-6',
    label: 'Guitar',
    tunings: [
      { presetId: 'guitar-6', label: 'Standard E A D G B E' },
      { presetId: 'guitar-6-drop-d', label: 'Drop D' },
      { presetId: 'guitar-6-half-step-down', label: 'Half step down' },
    ],
  },
  {
    id: 'guitar-7',
    label: '7-string guitar',
    tunings: [{ presetId: 'guitar-7', label: 'B E A D G B E' }],
  },
]

const STORAGE_PREFIX = 'ambitus.instrument-chosen.'

/** The instrument the server gives a newcomer, not yet touched by them. */
function isUntouchedDefault(instrument: Instrument) {
  return (
    instrument.presetId === 'bass-4' &&
    instrument.name === '4-string bass' &&
    instrument.handedness === 'right'
  )
}

/** Whether to ask this player what they play: only the untouched default, and not answered here. */
export function needsInstrumentChoice(userId: string, instruments: readonly Instrument[]) {
  if (instruments.length !== 1 || !isUntouchedDefault(instruments[0]!)) return false
  try {
    return localStorage.getItem(STORAGE_PREFIX + userId) === null
  } catch {
    return true
  }
}

/** Remembers that this player has answered (kept in the browser; a changed instrument also tells). */
export function rememberInstrumentChosen(userId: string) {
  try {
    localStorage.setItem(STORAGE_PREFIX + userId, new Date().toISOString())
  } catch {
    // private mode without storage: the changed instrument is enough unless they kept the default
  }
}
