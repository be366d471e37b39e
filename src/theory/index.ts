// Public API of the theory core: pure functions and data for pitches, tunings, scales and drills.
export { MIDI_MAX, MIDI_MIN } from './guard'
export {
  parsePitch,
  pitchName,
  pitchClassOf,
  pitchClassName,
  spellPitch,
  semitonesAboveC,
  pitchClassFromAnswer,
  toUnicode,
  toAscii,
} from './pitch'
export type { AccidentalPreference, PitchWindow, Position } from './types'
export { TUNING_PRESET_DATA } from './tuning-data'
export type { Instrument, TuningPresetData } from './tuning-data'
export {
  MIN_STRINGS,
  MAX_STRINGS,
  MIN_FRETS,
  MAX_FRETS,
  TUNING_PRESETS,
  tuningPreset,
  tuningErrors,
  assertValidTuning,
  parseTuning,
  stringNames,
} from './tuning'
export type { TuningPreset } from './tuning'
export { noteAt, positionsOf, instrumentRange, positionsInRegion } from './fretboard'
export type { FrettedNote } from './fretboard'
export { fretDistances, evenFretDistances, fretMidpoints, inlayFrets } from './geometry'
export type { Inlay } from './geometry'
export { TONICS, MAJOR_KEY_TONICS, MINOR_KEY_TONICS, COMMON_SCALES } from './scale-data'
export {
  SCALE_TYPES,
  tonicName,
  scaleTypeName,
  scalePitchNames,
  scalePitchClasses,
  scaleDegreeOf,
} from './scale'
export type { ScaleTypeInfo } from './scale'
export { spellInKey, accidentalPreferenceOf } from './spelling'
export { CYCLES } from './cycle-data'
export type { CycleId, CycleData } from './cycle-data'
export { cycleTonics, customCycle, preferredTonic } from './cycle'
export { octaveChoices, octaveScatter, countOctaveScatters } from './displacement'
export type { Scatter, ScatterOptions } from './displacement'
export { keyCycleInWindow, missingPitchClasses, windowFromFrets, widenWindow } from './window'
export type { WindowCycleOptions, WindowKey } from './window'
export { rangeRun, lowestScaleTone } from './range-run'
export type { RangeRunOptions, ScaleTone } from './range-run'
export { fingeringsOf, countFingerings, countShifts } from './fingering'
export type { Fingering, FingeringOptions } from './fingering'
export { CONCERT_A, pitchToFrequency, frequencyToPitch, nearestPitch } from './frequency'
export { createRandom, seedFromText, randomInt, shuffled } from './random'
export type { Random } from './random'
