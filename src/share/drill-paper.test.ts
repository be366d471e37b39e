// Each drill on paper: the exercise of its questions, the settings a share link keeps making the
// same notes, and worksheet requests the server's query schemas accept.
import { describe, expect, it } from 'vitest'
import {
  ChordsSettingsSchema,
  CycleSettingsSchema,
  RunsSettingsSchema,
  ScatterSettingsSchema,
} from '../contract/drills'
import {
  ChordsQuerySchema,
  CycleQuerySchema,
  RunsQuerySchema,
  ScatterQuerySchema,
} from '../contract/worksheets'
import { assertExercise } from '../exchange'
import { fingeringsOf, instrumentRange, octaveScatter, rangeRun } from '../theory'
import { drillPaper } from './drill-paper'
import { exerciseFromQuestions } from './question-exercise'
import { sharedExercise } from './shared-exercise'

// common practice: a 4-string bass is tuned E1 A1 D2 G2 = MIDI 28 33 38 43 (MIDI 1.0 numbering)
const BASS = { tuning: [28, 33, 38, 43], frets: 20 }
const SHARE_BASE = { token: 'x'.repeat(22), title: 't', sharedBy: 'Rowan', createdAt: '' }

const paperOf = (drill: 'scatter' | 'runs' | 'cycle' | 'chords') => drillPaper(drill)!

describe('Octave Scatter on paper', () => {
  const settings = ScatterSettingsSchema.parse({ tonic: 'A', scale: 'minor', questionCount: 20 })
  const paper = paperOf('scatter')
  const questions = paper.questions(settings as never, BASS, { fingering: null, seed: 4711 })

  it('plays the theory core’s scatter for the seed, each note on a string and fret that sound it', () => {
    const range = instrumentRange(BASS.tuning, BASS.frets)
    const first = octaveScatter({
      ...range,
      tonic: 'A',
      scale: 'minor',
      minDisplaced: 2,
      seed: 4711,
    })
    const exercise = exerciseFromQuestions(paper.segment(questions, 0), BASS, paper, 'scatter')
    expect(exercise.notes.map((note) => note.pitch)).toEqual(first.pitches)
    expect(exercise.notes.map((note) => note.name)).toEqual(first.names)
    // arithmetic: open string + fret = sounding pitch
    for (const note of exercise.notes)
      expect(BASS.tuning[note.string!]! + note.fret!).toBe(note.pitch)
    // A minor has no sharps or flats (common practice, no source)
    expect(exercise.keyFifths).toBe(0)
    expect(() => assertExercise(exercise)).not.toThrow()
  })

  it('shares a later sequence of a session by its own seed, and the link makes the same notes', () => {
    const second = paper.segment(questions, questions.length - 1)
    expect(second[0]!.key).not.toBe(questions[0]!.key)
    const made = paper.share(settings as never, second, false)
    const opened = sharedExercise({
      ...SHARE_BASE,
      preset: { drill: 'scatter', settings: made.settings as never },
      fingering: made.fingering,
      instrument: { name: 'bass', ...BASS },
    })
    expect(opened.exercise?.notes.map((note) => note.pitch)).toEqual(
      second.map((q) => q.expectedPitch),
    )
  })

  it('calls the setup preview a sample unless the settings fix the seed', () => {
    expect(paper.previewNote?.(settings as never)).toMatch(/sample/)
    expect(paper.previewNote?.({ ...settings, seed: 5 } as never)).toBeNull()
  })

  it('asks for the worksheet of the shown sequences with their first seed', () => {
    const sheet = paper.sheet(settings as never, BASS, questions)
    const query = ScatterQuerySchema.parse(sheet.params)
    expect(query).toMatchObject({ seed: 4711, tonic: 'A', tuning: BASS.tuning, answers: true })
    expect(query.count).toBe(new Set(questions.map((q) => q.key.split(':')[0])).size)
  })
})

describe('Range Runs on paper', () => {
  const settings = RunsSettingsSchema.parse({ tonic: 'G', scale: 'major', lowFret: 5, highFret: 8 })
  const paper = paperOf('runs')
  const run = rangeRun({ tuning: BASS.tuning, lowFret: 5, highFret: 8, tonic: 'G', scale: 'major' })
  const fingerings = fingeringsOf({
    tuning: BASS.tuning,
    frets: BASS.frets,
    run,
    maxPerString: settings.maxPerString,
    // the drill's hand position and its allowed shifts, fingered by its hand system
    lowFret: 5,
    highFret: 8,
    shifts: settings.shifts,
    handSystem: settings.handSystem,
  })

  it('plays the chosen fingering up and back down, each note where the fingering puts it', () => {
    expect(fingerings.length).toBeGreaterThan(1) // so the choice matters
    const chosen = fingerings[1]!
    const id = `${chosen.positions[0]!.string}:${chosen.pattern}`
    const questions = paper.questions(settings as never, BASS, { fingering: id, seed: 0 })
    const exercise = exerciseFromQuestions(questions, BASS, paper, 'run')
    const up = run.map((_, index) => index)
    const order = [...up, ...up.slice(0, -1).reverse()]
    expect(exercise.notes.map((note) => note.pitch)).toEqual(order.map((i) => run[i]))
    expect(exercise.notes.map((note) => ({ string: note.string, fret: note.fret }))).toEqual(
      order.map((i) => chosen.positions[i]),
    )
    // G major has one sharp, F♯ (common practice, no source)
    expect(exercise.keyFifths).toBe(1)
    expect(paper.share(settings as never, questions, false).fingering).toBe(id)
  })

  it('shows the TAB during a session only when the board shows the fingering too', () => {
    expect(paper.tabWhilePlaying(settings as never)).toBe(true)
    expect(paper.tabWhilePlaying({ ...settings, showFingering: false } as never)).toBe(false)
    expect(paperOf('scatter').tabWhilePlaying(settings as never)).toBe(false)
  })

  it('asks for the run sheet of the same region', () => {
    const query = RunsQuerySchema.parse(paper.sheet(settings as never, BASS, []).params)
    expect(query).toMatchObject({ tonic: 'G', lowFret: 5, highFret: 8, frets: 20 })
  })
})

describe('Window Cycle on paper', () => {
  // E1–E2 holds every pitch class, so every key of the cycle fits (12 semitones, ISO 16 / MIDI 1.0)
  const settings = CycleSettingsSchema.parse({
    low: 28,
    high: 40,
    cycle: 'fourths',
    questionCount: null,
  })
  const paper = paperOf('cycle')
  const questions = paper.questions(settings as never, BASS, { fingering: null, seed: 0 })

  it('changes the key signature where the key changes and names the new key over its first note', () => {
    const exercise = exerciseFromQuestions(questions, BASS, paper, 'cycle')
    // the cycle of fourths from C: C, F, B♭ … (common practice, no source); F major has one flat
    expect(exercise.keyFifths).toBe(0)
    const change = exercise.notes.find((note) => note.keyFifths !== undefined)
    expect(change).toMatchObject({ keyFifths: -1, text: 'F major' })
    expect(exercise.notes.filter((note) => note.text).length).toBe(11)
    expect(() => assertExercise(exercise)).not.toThrow()
  })

  it('shows the whole session while playing, and its worksheet takes the same window', () => {
    expect(paper.segment(questions, 5)).toHaveLength(questions.length)
    const query = CycleQuerySchema.parse(paper.sheet(settings as never, BASS, questions).params)
    expect(query).toMatchObject({ low: 28, high: 40, cycle: 'fourths' })
  })

  it('says why when a window cannot hold the keys', () => {
    const narrow = CycleSettingsSchema.parse({ low: 28, high: 31 })
    expect(() => paper.questions(narrow as never, BASS, { fingering: null, seed: 0 })).toThrow(
      RangeError,
    )
  })
})

describe('Chord Tones on paper', () => {
  const settings = ChordsSettingsSchema.parse({ progression: 'two-five-one', startKey: 'C' })
  const paper = paperOf('chords')
  const questions = paper.questions(settings as never, BASS, { fingering: null, seed: 0 })

  it('writes each chord tone the drill asks, in the progression key, and plays one chord at a time', () => {
    const exercise = exerciseFromQuestions(questions, BASS, paper, 'chords')
    expect(exercise.notes.map((note) => note.pitch)).toEqual(questions.map((q) => q.expectedPitch))
    // ii–V–I in C: Dm7 G7 Cmaj7, no sharps or flats in C major (common practice, no source)
    expect(exercise.keyFifths).toBe(0)
    expect(() => assertExercise(exercise)).not.toThrow()
    const first = paper.segment(questions, 0)
    expect(first.length).toBeGreaterThan(2)
    expect(new Set(first.map((q) => (q as unknown as { chord: string }).chord))).toEqual(
      new Set(['Dm7']),
    )
  })

  it('asks for the chord-tone sheet of the same progression and position', () => {
    const query = ChordsQuerySchema.parse(paper.sheet(settings as never, BASS, questions).params)
    expect(query).toMatchObject({
      progression: 'two-five-one',
      start: 'C',
      lowFret: 2,
      highFret: 6,
    })
  })
})
