import { describe, expect, it } from 'vitest'
import { Midi, Note } from 'tonal'
import {
  parsePitch,
  pitchClassFromAnswer,
  pitchClassName,
  pitchClassOf,
  pitchName,
  semitonesAboveC,
  spellPitch,
  toAscii,
  toUnicode,
} from './pitch'

const LETTERS = ['C', 'D', 'E', 'F', 'G', 'A', 'B']
const ACCIDENTALS = ['', '#', 'b', '##', 'bb']

describe('parsePitch', () => {
  it.each([
    ['C4', 60, 'MIDI 1.0 spec: middle C = 60'],
    ['A4', 69, 'MIDI 1.0 spec / ISO 16: A4 = 69'],
    ['C-1', 0, 'MIDI 1.0 spec: note 0 is C-1'],
    ['G9', 127, 'MIDI 1.0 spec: note 127 is G9'],
    ['Cb4', 59, 'scientific pitch notation (ASA 1939): octave changes at C, Cb4 = B3'],
    ['B#3', 60, 'scientific pitch notation (ASA 1939): B#3 = C4'],
    ['Cb3', 47, 'PRODUCT.md domain rules: Cb3 = 47'],
    ['Eb1', 27, 'arithmetic: E1 = 28 (bass low E, common practice) − 1'],
    ['E1', 28, 'common practice: 4-string bass low E'],
    ['E4', 64, 'common practice: guitar high E'],
  ])('%s → %i (%s)', (name, pitch) => {
    expect(parsePitch(name)).toBe(pitch)
  })

  // tonal Note.midi (library), every letter × accidental × octave that lands in MIDI 0–127
  it('agrees with tonal Note.midi for every spelled name in MIDI range', () => {
    for (const letter of LETTERS) {
      for (const accidental of ACCIDENTALS) {
        for (let octave = -1; octave <= 9; octave += 1) {
          const name = `${letter}${accidental}${octave}`
          const expected = Note.midi(name)
          if (expected === null) expect(() => parsePitch(name)).toThrow(RangeError)
          else expect(parsePitch(name)).toBe(expected)
        }
      }
    }
  })

  it('accepts a lower-case letter and music glyphs', () => {
    expect(parsePitch('eb1')).toBe(parsePitch('Eb1'))
    expect(parsePitch('E♭1')).toBe(27) // arithmetic: as Eb1
    expect(parsePitch('F𝄪3')).toBe(parsePitch('G3')) // arithmetic: F double sharp = G
  })

  it.each(['E', 'H2', '', ' E1', 'E1 ', 'E#b1', 'C10', 'Cb-1', 'G#9', 'E1.5'])(
    'throws a readable RangeError for %j',
    (name) => {
      expect(() => parsePitch(name)).toThrow(RangeError)
      expect(() => parsePitch(name)).toThrow(/note name|MIDI range/)
    },
  )
})

describe('pitchName', () => {
  // tonal Midi.midiToNoteName (library): flats by default there, sharps with { sharps: true }
  it('names every MIDI pitch as tonal does, with sharps or flats', () => {
    for (let pitch = 0; pitch <= 127; pitch += 1) {
      expect(pitchName(pitch, 'sharp')).toBe(Midi.midiToNoteName(pitch, { sharps: true }))
      expect(pitchName(pitch, 'flat')).toBe(Midi.midiToNoteName(pitch))
    }
  })

  it('uses sharps by default, e.g. F#3 = 54 (arithmetic: F3 = 53)', () => {
    expect(pitchName(54)).toBe('F#3')
  })

  it('round-trips through parsePitch for every MIDI pitch (both spellings)', () => {
    for (let pitch = 0; pitch <= 127; pitch += 1) {
      expect(parsePitch(pitchName(pitch))).toBe(pitch)
      expect(parsePitch(pitchName(pitch, 'flat'))).toBe(pitch)
    }
  })

  it.each([-1, 128, 60.5, Number.NaN])('throws a RangeError for %s', (pitch) => {
    expect(() => pitchName(pitch)).toThrow(RangeError)
  })
})

describe('pitch classes', () => {
  // tonal Note.chroma (library)
  it('pitchClassOf agrees with tonal Note.chroma, with or without an octave', () => {
    for (const letter of LETTERS) {
      for (const accidental of ACCIDENTALS) {
        const name = `${letter}${accidental}`
        expect(pitchClassOf(name)).toBe(Note.chroma(name))
        expect(pitchClassOf(`${name}3`)).toBe(Note.chroma(name))
      }
    }
  })

  it('pitchClassName wraps and spells', () => {
    expect(pitchClassName(6)).toBe('F#') // common practice: F# = Gb, pitch class 6
    expect(pitchClassName(6, 'flat')).toBe('Gb')
    expect(pitchClassName(-1)).toBe('B') // arithmetic: −1 ≡ 11
    expect(() => pitchClassName(1.5)).toThrow(RangeError)
  })

  it('pitchClassOf throws a RangeError for non-names', () => {
    expect(() => pitchClassOf('H')).toThrow(RangeError)
  })
})

describe('spellPitch and semitonesAboveC', () => {
  it.each([
    [47, 'Cb', 'Cb3'], // PRODUCT.md: Cb3 = 47
    [60, 'B#', 'B#3'], // REFERENCES (SPN): B#3 = C4 = 60
    [59, 'Cb', 'Cb4'], // REFERENCES (SPN): Cb4 = B3 = 59
    [65, 'E#', 'E#4'], // arithmetic: F4 = 65 = E#4
    [57, 'Bbb', 'Bbb3'], // tonal Note.midi('Bbb3') = 57 (library)
  ])('spells %i as %s → %s', (pitch, pitchClass, expected) => {
    expect(spellPitch(pitch, pitchClass)).toBe(expected)
    expect(Note.midi(expected)).toBe(pitch) // tonal agrees (library)
  })

  it('refuses a spelling of another pitch class', () => {
    expect(() => spellPitch(60, 'Db')).toThrow(/cannot be spelled/)
  })

  it('semitonesAboveC does not wrap (SPN: Cb belongs to the octave of its C)', () => {
    expect(semitonesAboveC('Cb')).toBe(-1)
    expect(semitonesAboveC('B#')).toBe(12)
    expect(semitonesAboveC('Eb')).toBe(3)
  })
})

describe('pitchClassFromAnswer', () => {
  // arithmetic: letter chroma (C0 D2 E4 F5 G7 A9 B11) ± accidentals
  it.each([
    ['c#', 1],
    ['C#', 1],
    ['Db', 1],
    ['db', 1],
    ['DB', 1],
    [' bb ', 10],
    ['b', 11],
    ['e#', 5],
    ['cb', 11],
    ['F♯', 6],
    ['g##', 9],
  ])('%j → %i', (answer, pitchClass) => {
    expect(pitchClassFromAnswer(answer)).toBe(pitchClass)
  })

  it.each(['', 'h', 'c#4', 'do', 'c#b'])('rejects %j with a hint', (answer) => {
    expect(() => pitchClassFromAnswer(answer)).toThrow(/type a letter A–G/)
  })
})

describe('unicode rendering', () => {
  it.each([
    ['F#3', 'F♯3'],
    ['Eb minor', 'E♭ minor'],
    ['Bbb', 'B𝄫'],
    ['F##3', 'F𝄪3'],
    ['F###', 'F𝄪♯'],
    ['Abstract B', 'Abstract B'],
  ])('toUnicode(%j) = %j', (ascii, unicode) => {
    expect(toUnicode(ascii)).toBe(unicode)
  })

  it('toAscii undoes toUnicode', () => {
    for (const name of ['F#3', 'Eb1', 'Bbb', 'F##3', 'F###', 'Cb3 and B#3']) {
      expect(toAscii(toUnicode(name))).toBe(name)
    }
  })
})
