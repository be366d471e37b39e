import { describe, expect, it } from 'vitest'
import { Key } from 'tonal'
import { customProgression, twelveBarBlues, twoFiveOne, twoFiveOneCycle } from './progression'

const symbols = (chords: { symbol: string }[]) => chords.map((chord) => chord.symbol)

describe('ii–V–I (jazz harmony, common practice; tonal Key, library)', () => {
  it('Db major: Ebm7 Ab7 Dbmaj7; C minor: Dm7b5 G7 Cm7', () => {
    expect(symbols(twoFiveOne('Db'))).toEqual(['Ebm7', 'Ab7', 'Dbmaj7'])
    expect(symbols(twoFiveOne('C', 'minor'))).toEqual(['Dm7b5', 'G7', 'Cm7'])
  })

  it('around the cycle of fourths, every major key as tonal Key.majorKey builds ii7 V7 Imaj7', () => {
    const cycle = twoFiveOneCycle()
    expect(cycle.map((key) => key.key)).toEqual('C F Bb Eb Ab Db Gb B E A D G'.split(' '))
    for (const { key, chords } of cycle) {
      const diatonic = Key.majorKey(key).chords // tonal (library): I7 ii7 iii7 IV7 V7 vi7 vii7
      expect(symbols(chords)).toEqual([diatonic[1], diatonic[4], diatonic[0]])
    }
  })

  it('minor keys are the cycle’s minor keys (G# not Ab) and match tonal Key.minorKey', () => {
    const cycle = twoFiveOneCycle({ quality: 'minor' })
    expect(cycle.map((key) => key.key)).toContain('G#')
    for (const { key, chords } of cycle) {
      const minor = Key.minorKey(key) // tonal: iiø7 from natural minor, V7 from harmonic minor
      expect(symbols(chords)).toEqual([
        minor.natural.chords[1],
        minor.harmonic.chords[4],
        minor.natural.chords[0],
      ])
    }
  })

  it('refuses an unknown quality or key', () => {
    expect(() => twoFiveOne('C', 'dorian' as never)).toThrow(/not a progression quality/)
    expect(() => twoFiveOne('Fb')).toThrow(/not a key tonic/)
  })
})

describe('12-bar blues (common practice: I7 ×4 | IV7 IV7 I7 I7 | V7 IV7 I7 V7)', () => {
  it('in F, and with the quick change in bar 2', () => {
    expect(symbols(twelveBarBlues('F')).join(' ')).toBe('F7 F7 F7 F7 Bb7 Bb7 F7 F7 C7 Bb7 F7 C7')
    expect(symbols(twelveBarBlues('F', { quickChange: true }))[1]).toBe('Bb7')
  })

  it('minor blues in C: i m7 and iv m7, V7', () => {
    expect(symbols(twelveBarBlues('C', { quality: 'minor' })).join(' ')).toBe(
      'Cm7 Cm7 Cm7 Cm7 Fm7 Fm7 Cm7 Cm7 G7 Fm7 Cm7 G7',
    )
  })

  it('spells roots in the key: Gb blues has Cb7, not B7 (Gb major: Gb Ab Bb Cb Db Eb F, Gardner)', () => {
    expect(symbols(twelveBarBlues('Gb'))[4]).toBe('Cb7')
  })
})

describe('customProgression', () => {
  it('takes a list or a text with spaces, commas or bar lines', () => {
    expect(symbols(customProgression(['Am7', 'D7', 'Gmaj7']))).toEqual(['Am7', 'D7', 'Gmaj7'])
    expect(symbols(customProgression('Am7 | D7,  Gmaj7 |'))).toEqual(['Am7', 'D7', 'Gmaj7'])
  })

  it('names the first symbol that does not parse, and refuses an empty list', () => {
    expect(() => customProgression('Am7 D7 Gxx9')).toThrow(
      'Chord 3 of the progression: "Gxx9" is not a chord symbol',
    )
    expect(() => customProgression(' | ')).toThrow('A progression needs at least one chord.')
  })
})
