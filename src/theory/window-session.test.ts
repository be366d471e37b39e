import { describe, expect, it } from 'vitest'
import { parsePitch } from './pitch'
import { keyCycleInWindow } from './window'
import { cycleNotes, type CyclePosition } from './window-session'

// PRODUCT.md "Window cycle": sessions continue the cycle where the last one stopped; widening the
// window keeps the position. Worked with the fourths order (PRODUCT.md) and arithmetic.
const FOURTHS = ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G']
const C2_C3 = { low: 36, high: 48, tonics: FOURTHS, scale: 'major' }

function sessions(options: Parameters<typeof cycleNotes>[0], counts: number[]) {
  let position: CyclePosition | undefined
  return counts.map((count) => {
    const session = cycleNotes(options, { fromPosition: position, count })
    position = session.nextPosition
    return session
  })
}

describe('cycleNotes: sessions that continue the cycle', () => {
  it('sessions of 8 notes play C, F, Bb, Eb … in turn, not C every time', () => {
    const played = sessions(C2_C3, [8, 8, 8, 8]).map((session) => session.notes[0]?.tonic)
    expect(played).toEqual(['C', 'F', 'Bb', 'Eb'])
  })

  it('sessions of 24 reach every key of the cycle in four sessions', () => {
    const tonics = sessions(C2_C3, [24, 24, 24, 24]).flatMap((session) =>
      session.notes.map((note) => note.tonic),
    )
    expect(new Set(tonics)).toEqual(new Set(FOURTHS))
  })

  it('joined sessions play exactly what one uninterrupted cycle plays, even split mid-key', () => {
    const whole = keyCycleInWindow(C2_C3).flatMap((key) => key.names)
    const split = sessions(C2_C3, [5, 3, 17, 40, 31]).flatMap((session) =>
      session.notes.map((note) => note.name),
    )
    expect(split).toEqual(whole)
  })

  it('goes round again after the last key and reports the position to continue from', () => {
    const [first, second] = sessions(C2_C3, [96, 10])
    expect(first?.nextPosition).toEqual({ keyIndex: 0, noteIndex: 0, phase: 'up' })
    expect(second?.notes.map((note) => note.name).slice(0, 8)).toEqual(
      keyCycleInWindow(C2_C3)[0]?.names,
    )
    expect(second?.nextPosition).toEqual({ keyIndex: 1, noteIndex: 2, phase: 'up' })
  })

  it('widening the window keeps the place in the cycle', () => {
    const [narrow] = sessions(C2_C3, [20])
    const wide = cycleNotes(
      { ...C2_C3, low: parsePitch('E1'), high: parsePitch('B2') },
      { fromPosition: narrow?.nextPosition, count: 4 },
    )
    expect(narrow?.nextPosition).toEqual({ keyIndex: 2, noteIndex: 4, phase: 'up' })
    expect(wide.notes.map((note) => [note.keyIndex, note.noteIndex])).toEqual([
      [2, 4],
      [2, 5],
      [2, 6],
      [2, 7],
    ])
  })

  it('alternate keeps its phase across sessions, also round an odd cycle', () => {
    const options = { ...C2_C3, tonics: ['C', 'F', 'Bb'], direction: 'alternate' as const }
    const runs = sessions(options, [8, 8, 8, 8]).map((session) => session.notes[0])
    expect(runs.map((note) => `${note?.tonic} ${note?.direction}`)).toEqual([
      'C up',
      'F down',
      'Bb up',
      'C down', // three keys: the second round starts the other way
    ])
  })

  it('marks a fold onto the start pitch as a fold, not the octave; degrees run back going down', () => {
    // Db major in C2–C3 (worked example): Db3 (49) folds to Db2, the pitch the key started on
    const db = cycleNotes({ ...C2_C3, startTonic: 'Db' }, { count: 8 }).notes
    expect(db.at(-1)).toMatchObject({ name: 'Db2', degree: 1, displaced: true, octave: false })
    const c = cycleNotes({ ...C2_C3, direction: 'down' }, { count: 8 }).notes
    expect(c.map((note) => note.degree)).toEqual([1, 7, 6, 5, 4, 3, 2, 1])
    expect(c.at(-1)).toMatchObject({ name: 'C2', octave: true, displaced: false })
  })

  it('with wholeKeys, finishes the key it is in', () => {
    const { notes, nextPosition } = cycleNotes(C2_C3, { count: 10, wholeKeys: true })
    expect(notes).toHaveLength(16)
    expect(nextPosition).toEqual({ keyIndex: 2, noteIndex: 0, phase: 'up' })
  })

  it('throws a RangeError for a position outside the cycle or a bad count', () => {
    const position = { keyIndex: 12, noteIndex: 0, phase: 'up' as const }
    expect(() => cycleNotes(C2_C3, { fromPosition: position, count: 8 })).toThrow(/key index/)
    expect(() => cycleNotes(C2_C3, { count: -1 })).toThrow(/note count/)
    const phase = { keyIndex: 0, noteIndex: 0, phase: 'left' as never }
    expect(() => cycleNotes(C2_C3, { fromPosition: phase, count: 1 })).toThrow(/not a phase/)
  })
})
