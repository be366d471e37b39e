// The microphone through Web Audio: getUserMedia with the browser's voice processing off (echo
// cancellation, noise suppression and auto gain would bend and gate a bass note), an AudioContext
// and the listening worklet. Nothing is recorded: the worklet only keeps its analysis window.
import workletUrl from '../listen-worklet.ts?worker&url'
import type { DetectorEvent } from '../note-detector'
import { LISTENER_PROCESSOR, type ListenerSetup, type ToWorklet } from '../worklet-messages'
import { ListenError, type InputDevice, type ListenSession } from './listen-input'

const VOICE_PROCESSING_OFF = {
  echoCancellation: false,
  noiseSuppression: false,
  autoGainControl: false,
  channelCount: 1,
}
const CLICK_HZ = 1500
const CLICK_S = 0.03

export async function listInputs(): Promise<InputDevice[]> {
  const all = await navigator.mediaDevices.enumerateDevices()
  return all
    .filter((device) => device.kind === 'audioinput')
    .map(({ deviceId, label }) => ({ deviceId, label }))
}

async function requestStream(deviceId: string | null | undefined): Promise<MediaStream> {
  const audio = { ...VOICE_PROCESSING_OFF, ...(deviceId ? { deviceId: { exact: deviceId } } : {}) }
  try {
    return await navigator.mediaDevices.getUserMedia({ audio })
  } catch (error) {
    const name = error instanceof DOMException ? error.name : ''
    if (name === 'NotAllowedError' || name === 'SecurityError')
      throw new ListenError(
        'denied',
        'The microphone is blocked for this site. Allow it in the browser (the icon in the address bar), then try again.',
      )
    if (name === 'NotFoundError' || name === 'OverconstrainedError')
      throw new ListenError(
        'no-device',
        'No microphone or audio input was found: plug one in or choose another.',
      )
    throw new ListenError(
      'failed',
      `The microphone could not be opened (${name || String(error)}).`,
    )
  }
}

// Short bright clicks on the same clock as the microphone, for the delay measurement.
function clicks(
  context: AudioContext,
  count: number,
  intervalMs: number,
  leadMs: number,
  volume: number,
) {
  const start = context.currentTime + leadMs / 1000
  return Array.from({ length: count }, (_, k) => {
    const at = start + (k * intervalMs) / 1000
    const tone = context.createOscillator()
    const gain = context.createGain()
    tone.frequency.value = CLICK_HZ
    gain.gain.setValueAtTime(0, at)
    gain.gain.linearRampToValueAtTime(volume, at + 0.001)
    gain.gain.exponentialRampToValueAtTime(0.0001, at + CLICK_S)
    tone.connect(gain).connect(context.destination)
    tone.start(at)
    tone.stop(at + CLICK_S + 0.01)
    return at * 1000
  })
}

async function createContext(stream: MediaStream, setup: ListenerSetup) {
  const context = new AudioContext({ latencyHint: 'interactive' })
  try {
    await context.audioWorklet.addModule(workletUrl)
    await context.resume()
    const node = new AudioWorkletNode(context, LISTENER_PROCESSOR, {
      numberOfInputs: 1,
      numberOfOutputs: 1,
      outputChannelCount: [1],
      processorOptions: setup,
    })
    // The worklet's output is silent; connecting it keeps the graph pulling samples through it.
    const silent = context.createGain()
    silent.gain.value = 0
    context
      .createMediaStreamSource(stream)
      .connect(node)
      .connect(silent)
      .connect(context.destination)
    return { context, node }
  } catch (error) {
    await context.close().catch(() => undefined)
    throw new ListenError('failed', `Listening could not start in this browser (${String(error)}).`)
  }
}

export async function openInput(
  options: ListenerSetup & { deviceId?: string | null },
): Promise<ListenSession> {
  if (typeof AudioWorkletNode === 'undefined')
    throw new ListenError(
      'unsupported',
      'This browser cannot listen to an instrument: use a current Chrome, Edge, Firefox or Safari.',
    )
  const { deviceId, ...setup } = options
  const stream = await requestStream(deviceId)
  const stopTracks = () => stream.getTracks().forEach((track) => track.stop())
  const { context, node } = await createContext(stream, setup).catch((error: unknown) => {
    stopTracks()
    throw error
  })
  const listeners = new Set<(event: DetectorEvent) => void>()
  node.port.onmessage = (message: MessageEvent<DetectorEvent>) =>
    listeners.forEach((listener) => listener(message.data))
  const send = (message: ToWorklet) => node.port.postMessage(message)
  const track = stream.getAudioTracks()[0]
  let gateDb = setup.gateDb
  return {
    sampleRate: context.sampleRate,
    deviceId: track?.getSettings().deviceId ?? deviceId ?? '',
    deviceLabel: track?.label || 'Microphone',
    now: () => context.currentTime * 1000,
    toPerformanceMs(contextMs) {
      const stamp = context.getOutputTimestamp()
      return contextMs + (stamp.performanceTime ?? 0) - (stamp.contextTime ?? 0) * 1000
    },
    setGate(value) {
      gateDb = value
      send({ type: 'gate', gateDb })
    },
    setRange: (range) => send({ type: 'setup', ...range, gateDb }),
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
    playClicks: (count, intervalMs, { leadMs = 300, volume = 0.5 } = {}) =>
      clicks(context, count, intervalMs, leadMs, volume),
    async close() {
      node.port.onmessage = null
      node.disconnect()
      stopTracks()
      await context.close().catch(() => undefined)
    },
  }
}
