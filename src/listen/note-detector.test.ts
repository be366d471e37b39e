// The streaming detector (the AudioWorklet's code path): chunk sizes do not change what it hears,
// and it reports onsets, verdicts, level and tuner readings. Times are counted in samples, so no
// test here depends on the machine's speed. 12-TET from A4 = 440 Hz (ISO 16).
import { describe, expect, it } from 'vitest'
import { delayed, pluckedTone } from '../../scripts/lib/test-signals'
import { createNoteDetector, type DetectorEvent } from './index'

const RATE = 48_000

function listen(samples: Float32Array, chunk: number, lowest = 'E1') {
  const detector = createNoteDetector({ sampleRate: RATE, lowest, highest: 'G4', gateDb: -60 })
  const events: DetectorEvent[] = []
  for (let at = 0; at < samples.length; at += chunk)
    events.push(...detector.push(samples.subarray(at, at + chunk)))
  return events
}

const notesOf = (events: DetectorEvent[]) => events.filter((e) => e.type === 'note')

describe('createNoteDetector', () => {
  const take = delayed(pluckedTone(33, { sampleRate: RATE, durationS: 0.6 }), RATE, 0.1) // A1, 55 Hz

  it('hears the same notes in 128-sample render quanta as in one block', () => {
    const quanta = notesOf(listen(take, 128))
    expect(quanta).toEqual(notesOf(listen(take, take.length)))
    expect(quanta.map((n) => n.name)).toEqual(['A1'])
  })

  it('reports the onset first, then the verdict within 120 ms of audio (E1 window)', () => {
    const events = listen(take, 128).filter((e) => e.type === 'onset' || e.type === 'note')
    expect(events.map((e) => e.type)).toEqual(['onset', 'note'])
    const note = notesOf(events)[0]!
    expect(note.verdictMs - note.onsetMs).toBeGreaterThan(2 * (1000 / 55)) // two periods at least
    expect(note.verdictMs - note.onsetMs).toBeLessThan(120)
  })

  it('reports the input level every 50 ms and tuner readings while the note sounds', () => {
    const events = listen(take, 128)
    const levels = events.filter((e) => e.type === 'level')
    expect(levels).toHaveLength(Math.floor(take.length / (0.05 * RATE)))
    expect(levels[0]!.peakDb).toBe(-120) // the 100 ms of silence before the note
    expect(Math.max(...levels.map((l) => l.peakDb))).toBeGreaterThan(-10)
    const tuner = events.flatMap((e) => (e.type === 'tuner' ? [e.pitch] : []))
    expect(tuner.length).toBeGreaterThan(50)
    tuner.forEach((pitch) => expect(Math.abs(pitch - 33)).toBeLessThan(0.05))
  })

  it('reports silence once the note has stopped, and not before', () => {
    const thenQuiet = new Float32Array(take.length + RATE / 2)
    thenQuiet.set(take)
    const events = listen(thenQuiet, 128).filter((e) => e.type === 'silence')
    expect(events).toHaveLength(1)
    const end = (1000 * take.length) / RATE
    expect(events[0]!.timeMs).toBeGreaterThan(end)
    expect(events[0]!.timeMs).toBeLessThan(end + 100)
  })

  it('hears nothing under its noise gate', () => {
    const quiet = take.map((v) => v * 0.0005) // peaks near −72 dBFS, under a −60 dBFS gate
    expect(notesOf(listen(quiet, 128))).toEqual([])
  })
})
