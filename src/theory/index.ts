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
  stringNumber,
} from './tuning'
export type { TuningPreset } from './tuning'
export { noteAt, positionsOf, instrumentRange, positionsInRegion } from './fretboard'
export type { FrettedNote } from './fretboard'
export { fretDistances, evenFretDistances, fretMidpoints, inlayFrets } from './geometry'
export type { Inlay } from './geometry'
export { TONICS, MAJOR_KEY_TONICS, MINOR_KEY_TONICS, COMMON_SCALES } from './scale-data'
export {
  tonicName,
  scaleTypeName,
  scalePitchNames,
  scalePitchClasses,
  scaleDegreeOf,
} from './scale'
export { MAX_ACCIDENTALS } from './scale-spelling'
export type { ScaleDirection } from './scale-spelling'
export { CURATED_SCALES, SCALE_GROUPS } from './scale-catalog-data'
export type { CuratedScale, ScaleGroupId, SignatureFamily } from './scale-catalog-data'
export { SCALE_TYPES, scaleCatalog, readableScaleName, signatureFamilyOf } from './scale-catalog'
export type { ScaleTypeInfo, ScaleGroup } from './scale-catalog'
export { keyInfo, keyAlteration, MAX_SIGNATURE } from './key'
export type { KeyInfo, KeyRef } from './key'
export {
  spellInKey,
  accidentalPreferenceOf,
  acceptedNames,
  nameInContext,
  chromaticPitchNames,
} from './spelling'
export type { NamingContext } from './spelling'
export { CYCLES } from './cycle-data'
export type { CycleId, CycleData } from './cycle-data'
export { cycleTonics, customCycle, preferredTonic } from './cycle'
export { octaveChoices, octaveScatter, countOctaveScatters, DEFAULT_MAX_LEAP } from './displacement'
export type { Scatter, ScatterOptions, ScatterPlacement } from './displacement'
export { keyCycleInWindow, missingPitchClasses, windowFromFrets, widenWindow } from './window'
export type { CycleDirection, WindowCycleOptions, WindowKey } from './window'
export { cycleNotes } from './window-session'
export type { CycleNote, CyclePosition } from './window-session'
export { rangeRun, lowestScaleTone } from './range-run'
export type { RangeRunOptions, ScaleTone } from './range-run'
export { fingeringsOf, countFingerings, countShifts } from './fingering'
export type { Fingering, FingeringOptions } from './fingering'
export { MAX_SHIFTS, widenedRegion } from './fingering-box'
export { HAND_FINGERS, handStep, positionName } from './hand'
export type { HandMove, HandStep, HandSystem } from './hand'
export { CONCERT_A, pitchToFrequency, frequencyToPitch, nearestPitch } from './frequency'
export { createRandom, seedFromText, randomInt, shuffled } from './random'
export type { Random } from './random'
export { drawByPitch } from './draw'
export { WRITTEN_TRANSPOSITION, writtenPitch } from './written'
export { CHORD_TYPES } from './chord-data'
export type { ChordGroup, ChordTypeData } from './chord-data'
export { parseChord, invertChord, chordFromBass, chordDegree } from './chord'
export type { ChordInfo, ChordTone } from './chord'
export { chordTonesInWindow, chordTonesInRegion, chordArpeggio } from './chord-place'
export type { PlacedChordTone } from './chord-place'
export { chordOfSize, chordArpeggioInRegion } from './chord-shape'
export type { ChordSize } from './chord-shape'
export { twoFiveOne, twoFiveOneCycle, twelveBarBlues, customProgression } from './progression'
export type { KeyProgression, ProgressionQuality } from './progression'
export { placeOnNeck } from './neck-placement'
