import { describe, expect, it } from 'vitest'
import { XMLValidator } from 'fast-xml-parser'
import {
  cycleExercise,
  GUITAR,
  rangeRunExercise,
  scatterExercise,
} from '../../tests/helpers/exercises'
import { midiOf, parseMusicXml, readParts } from '../../tests/helpers/musicxml-reader'
import type { Exercise } from './exercise'
import { toMusicXml } from './musicxml'

// MusicXML 4.0 (W3C Music Notation Community Group, 2021): <transpose><octave-change> is what to
// add to the written pitch to get the sounding one; strings are numbered from 1 = the highest.
function roundTrip(exercise: Exercise) {
  const xml = toMusicXml(exercise, { encodingDate: '2026-01-05' })
  expect(XMLValidator.validate(xml)).toBe(true)
  const [standard, tab] = readParts(xml)
  return { xml, standard: standard!, tab: tab! }
}

function expectEveryNote(exercise: Exercise) {
  const { standard, tab } = roundTrip(exercise)
  expect(standard.notes.map((n) => n.pitch)).toEqual(exercise.notes.map((n) => n.pitch))
  expect(tab.notes.map((n) => n.pitch)).toEqual(exercise.notes.map((n) => n.pitch))
  const strings = exercise.tuning.length
  expect(tab.notes.map((n) => [n.string, n.fret])).toEqual(
    exercise.notes.map((n) => [strings - n.string!, n.fret]),
  )
  // Divisions 4 per quarter: a one-beat note lasts 4 divisions.
  expect(standard.notes.map((n) => n.durations.reduce((a, b) => a + b) / 4)).toEqual(
    exercise.notes.map((n) => n.durationBeats),
  )
  return { standard, tab }
}

describe('toMusicXml round trip (fast-xml-parser)', () => {
  it('a bass range run: every pitch, string and fret; written an octave above sounding', () => {
    const { exercise } = rangeRunExercise()
    const { standard, tab } = expectEveryNote(exercise)
    // Bass parts are written an octave above sounding (common practice): plain bass clef + transpose.
    expect(standard.clef).toEqual({ sign: 'F', line: 4, octaveChange: 0 })
    expect(standard.transposeOctaves).toBe(-1)
    expect(standard.notes[0]!.writtenPitch).toBe(exercise.notes[0]!.pitch + 12)
    // The TAB part sounds as written and lists the open strings lowest first (line 1 = bottom line).
    expect(tab.clef.sign).toBe('TAB')
    expect(tab.transposeOctaves).toBe(0)
    expect(tab.staffTuning).toEqual(exercise.tuning.map((pitch, i) => ({ line: i + 1, pitch })))
  })

  it('a scatter and a window cycle on bass: every pitch, string and fret', () => {
    expectEveryNote(scatterExercise().exercise)
    expectEveryNote(cycleExercise().exercise)
  })

  it('a guitar run: treble clef 8vb at sounding pitch, six TAB strings (E2 … E4)', () => {
    const { exercise } = rangeRunExercise(GUITAR)
    const { standard, tab } = expectEveryNote(exercise)
    expect(standard.clef).toEqual({ sign: 'G', line: 2, octaveChange: -1 })
    expect(standard.transposeOctaves).toBe(0)
    expect(tab.staffTuning.map((t) => t.pitch)).toEqual([40, 45, 50, 55, 59, 64])
  })

  it('spells notes as the exercise does: Cb3 is step C, alter −1, octave 3 (+1 written for bass)', () => {
    const exercise: Exercise = {
      title: 'Spelling <&> check',
      tempo: 90,
      keyFifths: -6,
      mode: 'minor',
      instrument: 'bass',
      tuning: [28, 33, 38, 43],
      beatsPerMeasure: 4,
      notes: [{ pitch: 47, name: 'Cb3', string: 3, fret: 4, durationBeats: 3 }],
    }
    const { xml, standard } = roundTrip(exercise)
    type Tree = { part: { measure: { note: { pitch: unknown }[] }[] }[] }
    const note = (parseMusicXml(xml)['score-partwise'] as Tree).part[0]!.measure[0]!.note[0]!
    expect(note.pitch).toEqual({ step: 'C', alter: -1, octave: 4 })
    expect(midiOf('C', -1, 4) - 12).toBe(47)
    expect(standard.keys).toEqual([-6])
    expect(xml).toContain('<work-title>Spelling &lt;&amp;&gt; check</work-title>')
    // 3 beats = dotted half, then a quarter rest fills 4/4.
    expect(xml).toMatch(/<type>half<\/type>\s*<dot\/>/)
  })

  it('writes the tempo, a key change per window-cycle key and a tie across a barline', () => {
    const { exercise } = cycleExercise()
    const { xml, standard } = roundTrip(exercise)
    expect(xml).toContain('<per-minute>72</per-minute>')
    expect(xml).toContain('<sound tempo="72"/>')
    expect(standard.keys).toEqual([0, -1, -2, -3])
    expect((xml.match(/<words>fold<\/words>/g) ?? []).length).toBe(
      exercise.notes.filter((n) => n.text === 'fold').length,
    )
    const tied = roundTrip({ ...exercise, notes: [{ ...exercise.notes[0]!, durationBeats: 6 }] })
    expect(tied.standard.notes[0]!.durations).toEqual([16, 8])
    expect(tied.standard.measureCount).toBe(2)
  })

  it('refuses an exercise whose name and pitch disagree, naming the note', () => {
    const { exercise } = rangeRunExercise()
    const broken = { ...exercise, notes: [{ ...exercise.notes[0]!, name: 'C2' }] }
    expect(() => toMusicXml(broken)).toThrow(/Note 1: "C2" does not name pitch/)
  })
})
