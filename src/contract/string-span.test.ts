// Strings counted from the instrument's ends, so one plan item means the same on every instrument.
// Common practice, no source: "the lowest string" is the lowest-pitched one (B on a 5-string bass,
// low E on a guitar) and "the highest string" the highest-pitched (G on a bass, high E on a guitar);
// players number strings from the highest (string 1), which is why plans name them by pitch instead.
import { describe, expect, it } from 'vitest'
import {
  describeStringSpan,
  spanFromLowest,
  spanOnInstrument,
  stringIndex,
  type StringSpan,
} from './string-span'
import {
  CycleSettingsSchema,
  HuntSettingsSchema,
  recallOnInstrument,
  RecallSettingsSchema,
  settingsOnInstrument,
} from './drills'
import { previewOnInstrument } from './plan-preview'

// Tunings, open strings lowest first (REFERENCES.md, common practice)
const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2
const BASS_5 = [23, 28, 33, 38, 43] // B0 E1 A1 D2 G2
const GUITAR = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4

describe('stringIndex', () => {
  it.each([
    ['lowest', 4, 0],
    ['lowest', 6, 0],
    ['highest', 4, 3],
    ['highest', 5, 4],
    ['highest', 6, 5],
    ['2nd-lowest', 5, 1],
    ['2nd-highest', 6, 4],
    ['3rd-highest', 4, 1],
  ] as const)('%s on %i strings is index %i (0 = lowest-pitched string)', (ref, count, index) => {
    expect(stringIndex(ref, count)).toBe(index)
  })
})

describe('spanOnInstrument', () => {
  const TWO_LOWEST: StringSpan = { from: 'lowest', to: '2nd-lowest' }
  const TWO_HIGHEST: StringSpan = { from: 'highest', to: '2nd-highest' }
  it('takes the two lowest strings on each instrument: E–A, B–E, low E–A', () => {
    for (const tuning of [BASS_4, BASS_5, GUITAR])
      expect(spanOnInstrument(TWO_LOWEST, tuning.length)).toEqual({
        lowString: 0,
        highString: 1,
        cut: false,
      })
  })

  it('takes the two highest strings whatever the count: D–G on both basses, B–high E on a guitar', () => {
    expect(spanOnInstrument(TWO_HIGHEST, 4)).toEqual({ lowString: 2, highString: 3, cut: false })
    expect(spanOnInstrument(TWO_HIGHEST, 5)).toEqual({ lowString: 3, highString: 4, cut: false })
    expect(spanOnInstrument(TWO_HIGHEST, 6)).toEqual({ lowString: 4, highString: 5, cut: false })
  })

  it('keeps what an instrument has of a span longer than its strings, and says it was cut', () => {
    const sixLowest: StringSpan = { from: 'lowest', to: '6th-lowest' }
    expect(spanOnInstrument(sixLowest, 4)).toEqual({ lowString: 0, highString: 3, cut: true })
    expect(spanOnInstrument(sixLowest, 6)).toEqual({ lowString: 0, highString: 5, cut: false })
  })

  it('uses the nearest string when none of the span is on the instrument', () => {
    const far: StringSpan = { from: '6th-lowest', to: '7th-lowest' }
    expect(spanOnInstrument(far, 4)).toEqual({ lowString: 3, highString: 3, cut: true })
  })

  it('refuses a string count no instrument has, with a RangeError', () => {
    expect(() => spanOnInstrument(TWO_LOWEST, 0)).toThrow(RangeError)
  })
})

describe('describeStringSpan', () => {
  it.each([
    [{ from: 'lowest', to: 'highest' }, 'all strings'],
    [{ from: 'highest', to: 'lowest' }, 'all strings'],
    [{ from: 'lowest', to: 'lowest' }, 'the lowest string'],
    [{ from: 'lowest', to: '2nd-lowest' }, 'the 2 lowest strings'],
    [{ from: '3rd-highest', to: 'highest' }, 'the 3 highest strings'],
    [{ from: '2nd-lowest', to: 'highest' }, 'the 2nd lowest to the highest string'],
    [{ from: '2nd-highest', to: 'lowest' }, 'the lowest to the 2nd highest string'],
    [{ from: '2nd-lowest', to: '4th-lowest' }, 'the 2nd lowest to the 4th lowest string'],
  ] as const)('%o reads "%s"', (span, words) => {
    expect(describeStringSpan(span)).toBe(words)
  })
})

describe('plans made before relative strings', () => {
  it('keeps the meaning of string numbers counted from the lowest (0–3 = the 4 lowest)', () => {
    const span = spanFromLowest(0, 3)
    expect(span).toEqual({ from: 'lowest', to: '4th-lowest' })
    expect(spanOnInstrument(span, 5)).toMatchObject({ lowString: 0, highString: 3 })
  })
})

describe('a Neck Recall item on each student instrument', () => {
  const item = RecallSettingsSchema.parse({
    region: { lowString: 0, highString: 3, lowFret: 5, highFret: 8 },
    strings: { from: 'lowest', to: '3rd-lowest' },
  })
  const preset = { drill: 'recall' as const, settings: item }

  it('resolves the region on the instrument and drops the relative strings', () => {
    const onGuitar = recallOnInstrument(item, GUITAR.length)
    expect(onGuitar.region).toMatchObject({ lowString: 0, highString: 2, lowFret: 5 })
    expect(onGuitar.strings).toBeUndefined()
  })

  it('changes only drills that count strings from the ends (a Pitch Hunt item stays as it is)', () => {
    expect(settingsOnInstrument('recall', item, BASS_5).region).toMatchObject({
      lowString: 0,
      highString: 2,
    })
    const hunt = HuntSettingsSchema.parse({})
    expect(settingsOnInstrument('hunt', hunt, BASS_5)).toBe(hunt)
  })

  it('names the strings each student will see: B–A on a 5-string, E–D on a 4-string', () => {
    const neck = (tuning: number[]) => ({ tuning, frets: 24, accidentals: 'flat' as const })
    expect(previewOnInstrument(preset, neck(BASS_5))).toEqual({
      text: 'strings B–A, frets 5–8',
      warnings: [],
    })
    expect(previewOnInstrument(preset, neck(BASS_4)).text).toBe('strings E–D, frets 5–8')
    expect(previewOnInstrument(preset, neck(GUITAR)).text).toBe('strings low E–D, frets 5–8')
  })

  it('warns when frets or a pitch window do not fit the instrument', () => {
    const high = { ...preset, settings: { ...item, region: { ...item.region, highFret: 22 } } }
    expect(previewOnInstrument(high, { tuning: BASS_4, frets: 20, accidentals: 'flat' })).toEqual({
      text: 'strings E–D, frets 5–22',
      warnings: ['frets above 20 are not on this instrument'],
    })
  })

  it('warns when a Window Cycle window reaches below the instrument (B0 under the E1 of a 4-string)', () => {
    const cycle = {
      drill: 'cycle' as const,
      settings: CycleSettingsSchema.parse({ low: 23, high: 35, scale: 'major' }),
    }
    const onBass4 = previewOnInstrument(cycle, { tuning: BASS_4, frets: 20, accidentals: 'flat' })
    expect(onBass4.warnings).toEqual(['B0 is below its lowest note, E1'])
    expect(
      previewOnInstrument(cycle, { tuning: BASS_5, frets: 20, accidentals: 'flat' }).warnings,
    ).toEqual([])
  })
})
