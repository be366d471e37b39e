// The microphone for the whole app: the Web Audio input, imported on first use (its worklet module
// is fetched only then); tests replace it with setListenInput(fake).
import type { ListenInput } from './listen-input'

export type { InputDevice, ListenInput, ListenSession, ListenErrorCode } from './listen-input'
export { ListenError } from './listen-input'
export { loadListenSettings, saveListenSettings, type ListenSettings } from './listen-settings'

let replaced: ListenInput | null = null

const canListen = () =>
  typeof window !== 'undefined' &&
  Boolean(navigator.mediaDevices?.getUserMedia) &&
  typeof AudioWorkletNode !== 'undefined'

const webAudioInput: ListenInput = {
  get supported() {
    return canListen()
  },
  devices: async () => (await import('./web-audio-input')).listInputs(),
  open: async (options) => (await import('./web-audio-input')).openInput(options),
}

/** The app-wide microphone input. */
export function getListenInput(): ListenInput {
  return replaced ?? webAudioInput
}

/** Replaces the input (tests: a fake that emits events); null restores the Web Audio one. */
export function setListenInput(fake: ListenInput | null): void {
  replaced = fake
}
export { calibrateQuietRoom, calibrateDelay, DELAY_CLICKS, type DelayMethod } from './calibrate'
