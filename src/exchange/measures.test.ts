import { describe, expect, it } from 'vitest'
import { layoutMeasures, splitBeats } from './measures'

const note = (durationBeats: number) => ({ pitch: 28, name: 'E1', durationBeats })
const lengths = (events: { value: { beats: number } }[]) => events.map((e) => e.value.beats)

describe('layoutMeasures', () => {
  it('eight quarter notes fill two 4/4 measures exactly, with no rests (arithmetic: 8 = 2 × 4)', () => {
    const measures = layoutMeasures(
      Array.from({ length: 8 }, () => note(1)),
      4,
    )
    expect(measures.map((m) => m.number)).toEqual([1, 2])
    expect(measures.flatMap((m) => m.events).every((e) => e.kind === 'note')).toBe(true)
  })

  it('a note crossing the barline is split and tied; the last bar is filled with rests', () => {
    // 3 + 2 beats in 4/4: the second note takes 1 beat in bar 1 and 1 in bar 2, then a dotted half rest (3 beats).
    const [first, second] = layoutMeasures([note(3), note(2)], 4)
    expect(lengths(first!.events)).toEqual([3, 1])
    expect(first!.events[1]).toMatchObject({
      kind: 'note',
      noteIndex: 1,
      tieStart: true,
      tieStop: false,
    })
    expect(second!.events[0]).toMatchObject({
      kind: 'note',
      noteIndex: 1,
      tieStart: false,
      tieStop: true,
    })
    expect(second!.events.slice(1).map((e) => e.kind)).toEqual(['rest'])
    expect(lengths(second!.events)).toEqual([1, 3])
  })

  it('no notes give one measure of rest', () => {
    const measures = layoutMeasures([], 3)
    expect(measures).toHaveLength(1)
    expect(measures[0]!.events).toEqual([
      { kind: 'rest', value: expect.objectContaining({ beats: 3 }) },
    ])
  })
})

describe('splitBeats', () => {
  // Note values (common practice): whole 4, dotted half 3, half 2, dotted quarter 1.5, quarter 1.
  it.each([
    [4, [4]],
    [2.5, [2, 0.5]],
    [3.75, [3, 0.75]],
    [0.25, [0.25]],
  ])('%f beats are written as %j', (beats, values) => {
    expect(splitBeats(beats).map((value) => value.beats)).toEqual(values)
  })
})
