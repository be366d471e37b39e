// Listening to the instrument from a page: the chosen input, start/stop, the input level, tuner
// readings, heard notes, and the two calibrations (noise gate, delay), remembered per browser.
// Audio never leaves the browser; nothing is recorded. Drills and the tuner use this.
import { onScopeDispose, ref, shallowRef, toValue, watch, type MaybeRefOrGetter } from 'vue'
import { DEFAULT_GATE_DB } from '@/listen/calibration'
import type { DetectorEvent, HeardNote } from '@/listen/note-detector'
import { steadyPitch } from '@/listen/tuner'
import {
  calibrateDelay,
  calibrateQuietRoom,
  getListenInput,
  ListenError,
  loadListenSettings,
  saveListenSettings,
  type DelayMethod,
  type InputDevice,
  type ListenSession,
} from '@/listen/browser'

/** The pitches to listen for (MIDI) and A4 in Hz. */
export interface ListenerRange {
  lowest: number
  highest: number
  referenceHz: number
}

export type ListenerStatus = 'idle' | 'starting' | 'listening'

/** Tuner readings older than this (audio clock) no longer count: the string has stopped. */
const READING_LIFETIME_MS = 300
/** Readings the tuner's needle takes the median of. */
const STEADY_READINGS = 5

export function useListener(range: MaybeRefOrGetter<ListenerRange | null>) {
  const input = getListenInput()
  const saved = loadListenSettings()
  const status = ref<ListenerStatus>('idle')
  const error = ref('')
  const devices = ref<InputDevice[]>([])
  const deviceId = ref<string | null>(saved.deviceId)
  const deviceLabel = ref('')
  const levelDb = ref(-120)
  const peakDb = ref(-120)
  const gateDb = ref(saved.gateDb ?? DEFAULT_GATE_DB)
  const latencyMs = ref<number | null>(saved.latencyMs)
  const pitch = ref<number | null>(null)
  const lastNote = ref<HeardNote | null>(null)
  const calibrating = ref<'quiet-room' | 'delay' | null>(null)
  const session = shallowRef<ListenSession | null>(null)
  const noteListeners = new Set<(note: HeardNote) => void>()
  let readings: { pitch: number; timeMs: number }[] = []

  function onEvent(event: DetectorEvent) {
    if (event.type === 'level') {
      levelDb.value = event.rmsDb
      peakDb.value = event.peakDb
      readings = readings.filter((r) => event.timeMs - r.timeMs <= READING_LIFETIME_MS)
      pitch.value = steadyPitch(readings.map((r) => r.pitch))
    } else if (event.type === 'tuner') {
      readings = [
        ...readings.slice(1 - STEADY_READINGS),
        { pitch: event.pitch, timeMs: event.timeMs },
      ]
      pitch.value = steadyPitch(readings.map((r) => r.pitch))
    } else if (event.type === 'note') {
      const { pitch: heard, name, cents, onsetMs, verdictMs } = event
      const note: HeardNote = { pitch: heard, name, cents, onsetMs, verdictMs }
      lastNote.value = note
      noteListeners.forEach((listener) => listener(note))
    }
  }

  async function refreshDevices() {
    if (!input.supported) return
    devices.value = await input.devices().catch(() => [])
  }

  // An input remembered from an earlier visit may be gone (unplugged): then the default one.
  async function openInput(wanted: ListenerRange): Promise<ListenSession> {
    const options = { ...wanted, gateDb: gateDb.value }
    try {
      return await input.open({ ...options, deviceId: deviceId.value })
    } catch (e) {
      if (!(e instanceof ListenError && e.code === 'no-device' && deviceId.value)) throw e
      deviceId.value = null
      saveListenSettings({ deviceId: null })
      return input.open({ ...options, deviceId: null })
    }
  }

  async function start() {
    const wanted = toValue(range)
    if (status.value !== 'idle' || !wanted) return
    if (!input.supported) {
      error.value =
        'This browser cannot listen to an instrument: use a current Chrome, Edge, Firefox or Safari.'
      return
    }
    status.value = 'starting'
    error.value = ''
    try {
      const opened = await openInput(wanted)
      opened.subscribe(onEvent)
      session.value = opened
      deviceLabel.value = opened.deviceLabel
      status.value = 'listening'
      await refreshDevices() // names are shown once the microphone is allowed
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
    readings = []
    pitch.value = null
    levelDb.value = -120
    peakDb.value = -120
    await open?.close()
  }

  async function chooseDevice(id: string | null) {
    deviceId.value = id
    saveListenSettings({ deviceId: id })
    if (status.value !== 'listening') return
    await stop()
    await start()
  }

  async function calibrate<T>(
    kind: 'quiet-room' | 'delay',
    work: (open: ListenSession) => Promise<T>,
  ) {
    const open = session.value
    if (!open || calibrating.value) return null
    calibrating.value = kind
    error.value = ''
    try {
      return await work(open)
    } catch (e) {
      error.value = e instanceof Error ? e.message : String(e)
      return null
    } finally {
      calibrating.value = null
    }
  }

  /** Measures 2 s of the quiet room and sets (and remembers) the noise gate from it. */
  const measureQuietRoom = () =>
    calibrate('quiet-room', async (open) => {
      const result = await calibrateQuietRoom(open)
      gateDb.value = result.gateDb
      saveListenSettings({ gateDb: result.gateDb })
      return result
    })

  /** Measures (and remembers) the output→input delay; null result when too few clicks were heard. */
  const measureDelay = (method: DelayMethod) =>
    calibrate('delay', async (open) => {
      const result = await calibrateDelay(open, method)
      if (result) {
        latencyMs.value = Math.round(result.latencyMs)
        saveListenSettings({ latencyMs: latencyMs.value })
      }
      return result
    })

  /** Calls `listener` with every note heard; returns the function that stops it. */
  function onNote(listener: (note: HeardNote) => void): () => void {
    noteListeners.add(listener)
    return () => noteListeners.delete(listener)
  }

  watch(
    () => toValue(range),
    (next) => next && session.value?.setRange(next),
    { deep: true },
  )
  onScopeDispose(() => void stop())

  return {
    supported: input.supported,
    status,
    error,
    devices,
    deviceId,
    deviceLabel,
    levelDb,
    peakDb,
    gateDb,
    latencyMs,
    /** The tuner's steady reading (fractional MIDI pitch), null when nothing pitched sounds. */
    pitch,
    lastNote,
    calibrating,
    session,
    start,
    stop,
    chooseDevice,
    refreshDevices,
    measureQuietRoom,
    measureDelay,
    onNote,
  }
}

export type Listener = ReturnType<typeof useListener>
