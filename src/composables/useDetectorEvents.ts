// What the detector's events mean for a page: the input level, the tuner's steady reading, the
// last note heard and the note listeners. useListener feeds it; it opens nothing itself.
import { ref } from 'vue'
import type { DetectorEvent, HeardNote } from '@/listen/note-detector'
import { steadyPitch } from '@/listen/tuner'

/** Tuner readings older than this (audio clock) no longer count: the string has stopped. */
const READING_LIFETIME_MS = 300
/** Readings the tuner's needle takes the median of. */
const STEADY_READINGS = 5
const SILENT_DB = -120

export function useDetectorEvents() {
  const levelDb = ref(SILENT_DB)
  const peakDb = ref(SILENT_DB)
  /** The tuner's steady reading (fractional MIDI pitch), null when nothing pitched sounds. */
  const pitch = ref<number | null>(null)
  const lastNote = ref<HeardNote | null>(null)
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

  /** Back to silence once the input is closed (the last note stays). */
  function reset() {
    readings = []
    pitch.value = null
    levelDb.value = SILENT_DB
    peakDb.value = SILENT_DB
  }

  /** Calls `listener` with every note heard; returns the function that stops it. */
  function onNote(listener: (note: HeardNote) => void): () => void {
    noteListeners.add(listener)
    return () => noteListeners.delete(listener)
  }

  return { levelDb, peakDb, pitch, lastNote, onEvent, reset, onNote }
}

export type DetectorEvents = ReturnType<typeof useDetectorEvents>
