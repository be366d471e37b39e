// Listening to the instrument from a page: the chosen input, start/stop, the input level, tuner
// readings, heard notes, and the two calibrations (noise gate, delay), remembered per browser.
// Audio never leaves the browser; nothing is recorded. Drills and the tuner use this.
import { onScopeDispose, ref, shallowRef, toValue, watch, type MaybeRefOrGetter } from 'vue'
import {
  getListenInput,
  ListenError,
  loadListenSettings,
  type ListenInput,
  type ListenSession,
} from '@/listen/browser'
import { useDetectorEvents, type DetectorEvents } from './useDetectorEvents'
import { useInputDevices, type InputDevices } from './useInputDevices'
import { useListenCalibration } from './useListenCalibration'

/** The pitches to listen for (MIDI) and A4 in Hz. */
export interface ListenerRange {
  lowest: number
  highest: number
  referenceHz: number
}

export type ListenerStatus = 'idle' | 'starting' | 'listening'

const UNSUPPORTED =
  'This browser cannot listen to an instrument: use a current Chrome, Edge, Firefox or Safari.'

/** Opening and closing the input: the status, the open session and why it could not start. */
function useListenSession(input: ListenInput, inputs: InputDevices, heard: DetectorEvents) {
  const status = ref<ListenerStatus>('idle')
  const error = ref('')
  const session = shallowRef<ListenSession | null>(null)

  async function start(wanted: ListenerRange | null, gateDb: number) {
    if (status.value !== 'idle' || !wanted) return
    if (!input.supported) {
      error.value = UNSUPPORTED
      return
    }
    status.value = 'starting'
    error.value = ''
    try {
      const opened = await inputs.open({ ...wanted, gateDb })
      opened.subscribe(heard.onEvent)
      session.value = opened
      inputs.deviceLabel.value = opened.deviceLabel
      status.value = 'listening'
      await inputs.refresh() // names are shown once the microphone is allowed
    } catch (e) {
      status.value = 'idle'
      error.value =
        e instanceof ListenError ? e.message : `Listening could not start (${String(e)}).`
    }
  }

  async function stop() {
    const open = session.value
    session.value = null
    status.value = 'idle'
    heard.reset()
    await open?.close()
  }

  return { status, error, session, start, stop }
}

export function useListener(range: MaybeRefOrGetter<ListenerRange | null>) {
  const input = getListenInput()
  const saved = loadListenSettings()
  const heard = useDetectorEvents()
  const inputs = useInputDevices(input, saved.deviceId)
  const listening = useListenSession(input, inputs, heard)
  const calibration = useListenCalibration(listening.session, listening.error, saved)
  const start = () => listening.start(toValue(range), calibration.gateDb.value)
  const { stop } = listening

  async function chooseDevice(id: string | null) {
    inputs.choose(id)
    if (listening.status.value !== 'listening') return
    await stop()
    await start()
  }

  watch(
    () => toValue(range),
    (next) => next && listening.session.value?.setRange(next),
    { deep: true },
  )
  onScopeDispose(() => void stop())

  return {
    supported: input.supported,
    status: listening.status,
    error: listening.error,
    devices: inputs.devices,
    deviceId: inputs.deviceId,
    deviceLabel: inputs.deviceLabel,
    levelDb: heard.levelDb,
    peakDb: heard.peakDb,
    gateDb: calibration.gateDb,
    latencyMs: calibration.latencyMs,
    /** The tuner's steady reading (fractional MIDI pitch), null when nothing pitched sounds. */
    pitch: heard.pitch,
    lastNote: heard.lastNote,
    calibrating: calibration.calibrating,
    session: listening.session,
    start,
    stop,
    chooseDevice,
    refreshDevices: inputs.refresh,
    measureQuietRoom: calibration.measureQuietRoom,
    measureDelay: calibration.measureDelay,
    onNote: heard.onNote,
  }
}

export type Listener = ReturnType<typeof useListener>
