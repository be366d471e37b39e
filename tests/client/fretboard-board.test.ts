// FretboardBoard: cells per tuning and span, mirroring, 12-TET geometry, names, keyboard, typing.
import { mount } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'
import type { FretboardProps } from '../../src/components/fretboard/fretboard-types'
import { noteAt } from '../../src/theory'

// Open strings as MIDI numbers (MIDI 1.0; scientific pitch notation, REFERENCES.md)
const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2
const GUITAR_6 = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4
const EIGHT = [30, 35, 40, 45, 50, 55, 59, 64] // F#1 B1 E2 A2 D3 G3 B3 E4

function board(props: Partial<FretboardProps> = {}) {
  return mount(FretboardBoard, { props: { tuning: BASS_4, ...props }, attachTo: document.body })
}
const cellsOf = (wrapper: ReturnType<typeof board>) => wrapper.findAll('[data-string][data-fret]')
const cell = (wrapper: ReturnType<typeof board>, string: number, fret: number) =>
  wrapper.find(`[data-string="${string}"][data-fret="${fret}"]`)
const wireX = (wrapper: ReturnType<typeof board>, fret: number) =>
  Number(wrapper.find(`[data-fret-wire="${fret}"]`).attributes('x1'))

afterEach(() => {
  document.body.innerHTML = ''
  vi.useRealTimers()
})

describe('cells', () => {
  it.each([
    ['4-string, frets 0–12', BASS_4, 0, 12, 4 * 13],
    ['8-string, frets 0–24', EIGHT, 0, 24, 8 * 25],
    ['6-string, frets 5–9', GUITAR_6, 5, 9, 6 * 5],
    ['4-string, frets 5–9', BASS_4, 5, 9, 4 * 5],
  ])(
    '%s has strings × frets cells, each with data-string and data-fret',
    (_, tuning, fretStart, fretEnd, count) => {
      const wrapper = board({ tuning, fretStart, fretEnd })
      const cells = cellsOf(wrapper)
      expect(cells).toHaveLength(count)
      const frets = new Set(cells.map((c) => Number(c.attributes('data-fret'))))
      expect(Math.min(...frets)).toBe(fretStart)
      expect(Math.max(...frets)).toBe(fretEnd)
      expect(wrapper.find('[data-testid="fretboard"]').exists()).toBe(true)
    },
  )

  it('accepts 1 and 10 strings and a span past 24 without breaking (clamped to 24)', () => {
    expect(cellsOf(board({ tuning: [40], fretStart: 0, fretEnd: 30 }))).toHaveLength(25)
    const ten = [23, 28, 33, 38, 43, 48, 53, 58, 63, 68]
    expect(cellsOf(board({ tuning: ten, fretStart: 0, fretEnd: 3 }))).toHaveLength(40)
  })

  it('draws the nut only when fret 0 is shown', () => {
    expect(board({ fretStart: 0 }).find('.fb-nut').exists()).toBe(true)
    expect(board({ fretStart: 5, fretEnd: 9 }).find('.fb-nut').exists()).toBe(false)
  })

  it('draws the lowest string at the bottom and thicker than the highest', () => {
    const wrapper = board()
    const y = (s: number) => Number(wrapper.find(`[data-string-line="${s}"]`).attributes('y1'))
    const w = (s: number) =>
      Number(wrapper.find(`[data-string-line="${s}"]`).attributes('stroke-width'))
    expect(y(0)).toBeGreaterThan(y(3))
    expect(w(0)).toBeGreaterThan(w(3))
  })
})

describe('geometry', () => {
  // Mottola 2017 (American Lutherie #130), REFERENCES.md: d(n) = L·(1 − 2^(−n/12)), d(12) = L/2, d(24) = 3L/4
  it('places fret 12 at half the scale length and fret 24 at three quarters (true 12-TET)', () => {
    const wrapper = board({ tuning: EIGHT, fretEnd: 24, scaleLengthMm: 864 })
    const nut = wireX(wrapper, 0)
    const at = (fret: number) => wireX(wrapper, fret) - nut
    expect(at(12) / at(24)).toBeCloseTo(0.5 / 0.75, 6)
    // d(1)/d(12) = (1 − 2^(−1/12)) / 0.5 = 0.112246 (arithmetic)
    expect(at(1) / at(12)).toBeCloseTo((1 - 2 ** (-1 / 12)) / 0.5, 6)
  })

  it('with even spacing, every fret is the same width', () => {
    const wrapper = board({ fretEnd: 12, evenSpacing: true })
    const widths = Array.from({ length: 12 }, (_, i) => wireX(wrapper, i + 1) - wireX(wrapper, i))
    for (const width of widths) expect(width).toBeCloseTo(widths[0]!, 6)
    const trueSpacing = board({ fretEnd: 12 })
    expect(wireX(trueSpacing, 1) - wireX(trueSpacing, 0)).toBeGreaterThan(
      wireX(trueSpacing, 12) - wireX(trueSpacing, 11),
    )
  })

  it('mirrors a left-handed board: every x reflected across the board width', () => {
    const right = board({ fretEnd: 12 })
    const left = board({ fretEnd: 12, leftHanded: true })
    const width = Number(right.find('svg').attributes('viewBox')!.split(' ')[2])
    for (const fret of [0, 1, 5, 12]) {
      expect(wireX(left, fret)).toBeCloseTo(width - wireX(right, fret), 6)
    }
    const cx = (w: ReturnType<typeof board>, f: number) =>
      Number(cell(w, 1, f).find('.fb-hit').attributes('x'))
    expect(cx(right, 1)).toBeLessThan(cx(right, 5))
    expect(cx(left, 1)).toBeGreaterThan(cx(left, 5))
  })
})

describe('accessible names and labels', () => {
  it('names each cell by its string and fret', () => {
    const wrapper = board()
    expect(cell(wrapper, 1, 5).attributes('aria-label')).toBe('A string, fret 5')
    expect(cell(wrapper, 0, 0).attributes('aria-label')).toBe('E string, fret 0')
    expect(wrapper.find('svg').attributes('aria-label')).toContain('4 strings')
  })

  it('tells the two E strings of a guitar apart', () => {
    const wrapper = board({ tuning: GUITAR_6 })
    expect(cell(wrapper, 0, 3).attributes('aria-label')).toBe('low E string, fret 3')
    expect(cell(wrapper, 5, 3).attributes('aria-label')).toBe('high E string, fret 3')
  })

  it('labels notes spelled in the key with glyphs, and degrees when asked', () => {
    // E-flat major spells pitch class 3 as E♭ and 10 as B♭ (theory texts; tonal agrees)
    const names = board({ labelMode: 'names', keyTonic: 'Eb', keyScale: 'major' })
    expect(cell(names, 1, 1).find('.fb-label').text()).toBe('B♭')
    expect(cell(names, 1, 1).attributes('aria-label')).toBe('A string, fret 1, B♭')
    const sharps = board({ labelMode: 'names', accidentals: 'sharp' })
    expect(cell(sharps, 1, 1).find('.fb-label').text()).toBe('A♯')
    // A string fret 5 = D2; D is degree 2 of C major
    const degrees = board({ labelMode: 'degrees', keyTonic: 'C', keyScale: 'major' })
    expect(cell(degrees, 1, 5).find('.fb-label').text()).toBe('2')
    expect(cell(degrees, 1, 1).find('.fb-label').exists()).toBe(false)
    expect(
      cell(board({ labelMode: 'none' }), 1, 5)
        .find('.fb-label')
        .exists(),
    ).toBe(false)
  })
})

describe('selecting', () => {
  it('emits select with the pitch from noteAt when a cell is clicked', async () => {
    const wrapper = board()
    await cell(wrapper, 2, 7).trigger('click')
    expect(wrapper.emitted('select')).toEqual([
      [{ string: 2, fret: 7, pitch: noteAt(BASS_4, 2, 7) }],
    ])
  })

  it('ignores cells that are not selectable', async () => {
    const wrapper = board({ selectable: (c) => c.fret <= 3 })
    await cell(wrapper, 0, 5).trigger('click')
    expect(wrapper.emitted('select')).toBeUndefined()
    expect(cell(wrapper, 0, 5).attributes('aria-disabled')).toBe('true')
  })
})
