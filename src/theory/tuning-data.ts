// Tuning presets offered in the app: open strings lowest-pitched first, in ASCII note names.

/**
 * The kind of instrument a preset is for.
 *
 * @example
 * const instrument: Instrument = 'bass'
 */
export type Instrument = 'bass' | 'guitar'

/**
 * A named preset as stored in the data table (note names; `tuningPreset` adds MIDI pitches).
 *
 * @example
 * TUNING_PRESET_DATA[0]?.notes // ['E1', 'A1', 'D2', 'G2']
 */
export interface TuningPresetData {
  id: string
  label: string
  instrument: Instrument
  notes: readonly string[]
  frets: number
  scaleLengthInches: number
}

/**
 * Every preset the app offers, with our own ids and labels, a usual fret count and scale length.
 * Open strings follow common practice (e.g. a 4-string bass is E1 A1 D2 G2).
 *
 * @example
 * TUNING_PRESET_DATA.map((preset) => preset.id) // ['bass-4', 'bass-4-drop-d', ...]
 */
export const TUNING_PRESET_DATA: readonly TuningPresetData[] = [
  {
    id: 'bass-4',
    label: '4-string bass (E A D G)',
    instrument: 'bass',
    notes: ['E1', 'A1', 'D2', 'G2'],
    frets: 20,
    scaleLengthInches: 34,
  },
  {
    id: 'bass-4-drop-d',
    label: '4-string bass, drop D (D A D G)',
    instrument: 'bass',
    notes: ['D1', 'A1', 'D2', 'G2'],
    frets: 20,
    scaleLengthInches: 34,
  },
  {
    id: 'bass-5',
    label: '5-string bass (B E A D G)',
    instrument: 'bass',
    notes: ['B0', 'E1', 'A1', 'D2', 'G2'],
    frets: 24,
    scaleLengthInches: 35,
  },
  {
    id: 'bass-6',
    label: '6-string bass (B E A D G C)',
    instrument: 'bass',
    notes: ['B0', 'E1', 'A1', 'D2', 'G2', 'C3'],
    frets: 24,
    scaleLengthInches: 35,
  },
  {
    id: 'guitar-6',
    label: '6-string guitar (E A D G B E)',
    instrument: 'guitar',
    notes: ['E2', 'A2', 'D3', 'G3', 'B3', 'E4'],
    frets: 22,
    scaleLengthInches: 25.5,
  },
  {
    id: 'guitar-6-drop-d',
    label: '6-string guitar, drop D (D A D G B E)',
    instrument: 'guitar',
    notes: ['D2', 'A2', 'D3', 'G3', 'B3', 'E4'],
    frets: 22,
    scaleLengthInches: 25.5,
  },
  {
    id: 'guitar-6-half-step-down',
    label: '6-string guitar, half step down (Eb Ab Db Gb Bb Eb)',
    instrument: 'guitar',
    notes: ['Eb2', 'Ab2', 'Db3', 'Gb3', 'Bb3', 'Eb4'],
    frets: 22,
    scaleLengthInches: 25.5,
  },
  {
    id: 'guitar-7',
    label: '7-string guitar (B E A D G B E)',
    instrument: 'guitar',
    notes: ['B1', 'E2', 'A2', 'D3', 'G3', 'B3', 'E4'],
    frets: 24,
    scaleLengthInches: 25.5,
  },
]
