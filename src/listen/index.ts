// Listening to the instrument: the public face of src/listen (pure, no Vue, no DOM — it runs in
// Node, in the AudioWorklet and in the browser). Browser wiring lives in src/listen/browser.
export * from './transcribe'
export * from './note-detector'
export * from './frame-analysis'
export * from './pitch-range'
export * from './calibration'
export * from './tuner'
export * from './worklet-messages'
