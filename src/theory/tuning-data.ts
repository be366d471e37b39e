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

// One row of the table: the open strings as one space-separated string.
const preset = (
  id: string,
  label: string,
  instrument: Instrument,
  notes: string,
  frets: number,
  scaleLengthInches: number,
): TuningPresetData => ({
  id,
  label,
  instrument,
  notes: notes.split(' '),
  frets,
  scaleLengthInches,
})

/**
 * Every preset the app offers, with our own ids and labels, a usual fret count and scale length.
 * Open strings follow common practice (e.g. a 4-string bass is E1 A1 D2 G2).
 *
 * @example
 * TUNING_PRESET_DATA.map((preset) => preset.id) // ['bass-4', 'bass-4-drop-d', ...]
 */
export const TUNING_PRESET_DATA: readonly TuningPresetData[] = [
  preset('bass-4', '4-string bass (E A D G)', 'bass', 'E1 A1 D2 G2', 20, 34),
  preset('bass-4-drop-d', '4-string bass, drop D (D A D G)', 'bass', 'D1 A1 D2 G2', 20, 34),
  preset('bass-5', '5-string bass (B E A D G)', 'bass', 'B0 E1 A1 D2 G2', 24, 35),
  preset('bass-6', '6-string bass (B E A D G C)', 'bass', 'B0 E1 A1 D2 G2 C3', 24, 35),
  preset('guitar-6', '6-string guitar (E A D G B E)', 'guitar', 'E2 A2 D3 G3 B3 E4', 22, 25.5),
  preset(
    'guitar-6-drop-d',
    '6-string guitar, drop D (D A D G B E)',
    'guitar',
    'D2 A2 D3 G3 B3 E4',
    22,
    25.5,
  ),
  preset(
    'guitar-6-half-step-down',
    '6-string guitar, half step down (Eb Ab Db Gb Bb Eb)',
    'guitar',
    'Eb2 Ab2 Db3 Gb3 Bb3 Eb4',
    22,
    25.5,
  ),
  preset('guitar-7', '7-string guitar (B E A D G B E)', 'guitar', 'B1 E2 A2 D3 G3 B3 E4', 24, 25.5),
]
