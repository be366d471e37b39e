// Listening to the instrument: the public face of src/listen (pure, no Vue, no DOM — it runs in
// Node, in the AudioWorklet and in the browser). Browser wiring lives in src/listen/browser.
export { transcribe, estimateGateDb } from './transcribe'
export type { TranscribedNote, TranscribeOptions } from './transcribe'
export { createNoteDetector } from './note-detector'
export type { DetectorEvent, HeardNote, NoteDetector, NoteDetectorOptions } from './note-detector'
export { createFrameAnalyser, MIN_CLARITY } from './frame-analysis'
export type { FrameAnalyser, FrameReading } from './frame-analysis'
export { analysisWindow, hopSize, resolveRange, DEFAULT_SPAN } from './pitch-range'
export type { ListenRange, PitchLike } from './pitch-range'
export {
  DEFAULT_GATE_DB,
  noiseGate,
  measureLatency,
  QUIET_ROOM_S,
  MIN_MATCHED_CLICKS,
} from './calibration'
export { nearestString, steadyPitch, IN_TUNE_CENTS } from './tuner'
export type { StringReading } from './tuner'
export { shiftEvent, LISTENER_PROCESSOR } from './worklet-messages'
export type { ListenerSetup } from './worklet-messages'
