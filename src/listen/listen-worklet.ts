// The listening AudioWorklet: runs the streaming note detector on the microphone's render quanta,
// off the main thread, and posts its events with times on the audio context's clock (ms). Nothing
// is stored or sent anywhere: the samples live only in the detector's analysis window.
import { createNoteDetector, type DetectorEvent, type NoteDetector } from './note-detector'
import {
  LISTENER_PROCESSOR,
  shiftEvent,
  TUNER_EVERY_MS,
  type ListenerSetup,
  type ToWorklet,
} from './worklet-messages'

// The AudioWorkletGlobalScope, which TypeScript's DOM library does not describe.
declare const sampleRate: number
declare const currentFrame: number
declare class AudioWorkletProcessor {
  readonly port: MessagePort
}
declare function registerProcessor(
  name: string,
  processor: new (options: { processorOptions: ListenerSetup }) => AudioWorkletProcessor,
): void

class ListenerProcessor extends AudioWorkletProcessor {
  private detector: NoteDetector
  private originMs: number | null = null
  private lastTunerMs = -Infinity
  private mono = new Float32Array(128)

  constructor(options: { processorOptions: ListenerSetup }) {
    super()
    this.detector = this.create(options.processorOptions)
    this.port.onmessage = (event: MessageEvent<ToWorklet>) => this.receive(event.data)
  }

  private create(setup: ListenerSetup): NoteDetector {
    this.originMs = null
    return createNoteDetector({ sampleRate, ...setup })
  }

  private receive(message: ToWorklet) {
    if (message.type === 'gate') this.detector.setGate(message.gateDb)
    else this.detector = this.create(message)
  }

  private post(event: DetectorEvent) {
    const shifted = shiftEvent(event, this.originMs ?? 0)
    if (shifted.type === 'tuner') {
      if (shifted.timeMs - this.lastTunerMs < TUNER_EVERY_MS) return
      this.lastTunerMs = shifted.timeMs
    }
    this.port.postMessage(shifted)
  }

  // A stereo input is mixed down to one channel.
  private channel(input: Float32Array[] | undefined): Float32Array | null {
    const [left, right] = input ?? []
    if (!left || !right) return left ?? null
    if (this.mono.length !== left.length) this.mono = new Float32Array(left.length)
    for (let i = 0; i < left.length; i += 1) this.mono[i] = ((left[i] ?? 0) + (right[i] ?? 0)) / 2
    return this.mono
  }

  process(inputs: Float32Array[][]): boolean {
    const samples = this.channel(inputs[0])
    if (!samples) return true
    this.originMs ??= (currentFrame * 1000) / sampleRate
    for (const event of this.detector.push(samples)) this.post(event)
    return true
  }
}

registerProcessor(LISTENER_PROCESSOR, ListenerProcessor)
